import { describe, expect, test } from 'vitest';
import { paths, safeNextPath, switchWorkshopPath } from './paths.ts';

describe('safeNextPath', () => {
  test.each([
    ['/w/abc/heats?x=1', '/w/abc/heats?x=1'],
    ['https://elsewhere.example/', '/'],
    ['//elsewhere.example/', '/'],
    ['/\\elsewhere.example', '/'],
    [null, '/'],
  ])('when next is %s, then it navigates to %s', (next, expected) => {
    expect(safeNextPath(next)).toBe(expected);
  });
});

describe('switchWorkshopPath', () => {
  test('when inside a workshop, then the same section of the other workshop', () => {
    expect(switchWorkshopPath('/w/one/gallery', 'two')).toBe('/w/two/gallery');
  });
  test('when outside any workshop, then the other workshop’s heats', () => {
    expect(switchWorkshopPath('/settings', 'two')).toBe('/w/two/heats');
  });
});

describe('paths', () => {
  test('sign-in keeps where to go next', () => {
    expect(paths.signIn.getHref('/invitations/abc')).toBe('/sign-in?next=%2Finvitations%2Fabc');
    expect(paths.signIn.getHref('/')).toBe('/sign-in');
  });
});
