import { describe, expect, test } from 'vitest';
import { buildIndexItem } from '#src/testing/photo-data.ts';
import { galleryViewToParams, listQueryString, matchesFilters, parseGalleryView } from './gallery-filters.ts';

describe('parseGalleryView', () => {
  test('when the URL carries valid filters and a search, then the view holds them', () => {
    const params = new URLSearchParams('kind=cold_shut&alloy=A356.0&mouldMaterial=green_sand&from=2026-11-01&to=2026-11-30&q=crack');
    expect(parseGalleryView(params)).toEqual({
      kind: 'cold_shut',
      alloy: 'A356.0',
      mouldMaterial: 'green_sand',
      from: '2026-11-01',
      to: '2026-11-30',
      q: 'crack',
    });
  });

  test('when a value does not parse (an old or edited link), then it is dropped and the rest kept', () => {
    const params = new URLSearchParams('kind=bubbles&casterId=not-a-uuid&from=yesterday&alloy=A356.0');
    expect(parseGalleryView(params)).toEqual({ alloy: 'A356.0' });
  });
});

describe('galleryViewToParams', () => {
  test('when a field is emptied, then it leaves the URL and other params stay', () => {
    const next = galleryViewToParams({ kind: 'misrun', alloy: undefined, q: '' }, new URLSearchParams('alloy=A356.0&tab=x'));
    expect(next.toString()).toBe('tab=x&kind=misrun');
  });
});

describe('listQueryString', () => {
  test('when filters and a cursor are given, then they form the query of GET /photos', () => {
    expect(listQueryString({ kind: 'gas_porosity', cursor: 'abc', limit: 40 })).toBe('?kind=gas_porosity&cursor=abc&limit=40');
    expect(listQueryString({})).toBe('');
  });
});

describe('matchesFilters', () => {
  const item = buildIndexItem({ kinds: ['gas_porosity'], alloy: 'A356.0', casterName: 'Ray Dunmore', createdAt: '2026-11-28T23:30:00.000Z' });
  const names = new Map([['00000000-0000-4000-8000-00000000abcd', 'Ray Dunmore']]);

  test('when every filter fits the photo, then it passes', () => {
    expect(
      matchesFilters(item, { kind: 'gas_porosity', alloy: 'a356.0', casterId: '00000000-0000-4000-8000-00000000abcd', from: '2026-11-28', to: '2026-11-28' }, names),
    ).toBe(true);
  });

  test.each([
    [{ kind: 'cold_shut' as const }],
    [{ mouldMaterial: 'plaster' as const }],
    [{ from: '2026-11-29' }],
    [{ to: '2026-11-27' }],
  ])('when a filter does not fit (%o), then it is left out', (filters) => {
    expect(matchesFilters(item, filters, names)).toBe(false);
  });
});
