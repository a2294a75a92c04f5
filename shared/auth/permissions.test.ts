import { describe, expect, test } from 'vitest';
import { accessFor, can } from './permissions.ts';
import type { Role } from './roles.ts';

const me = (role: Role) => ({ id: 'me', role });
const mine = { ownerId: 'me' };
const menteeOfMine = { ownerId: 'student-1', ownerMentorIds: ['me'] };
const someoneElses = { ownerId: 'other', ownerMentorIds: ['mentor-2'] };

describe('can', () => {
  test.each([
    // role, action, entity, resource, expected
    ['student', 'update', 'heat', mine, true],
    ['student', 'read', 'heat', someoneElses, false],
    ['caster', 'read', 'heat', someoneElses, false],
    ['mentor', 'read', 'heat', menteeOfMine, true],
    ['mentor', 'read', 'heat', someoneElses, false],
    ['mentor', 'update', 'heat', menteeOfMine, false],
    ['admin', 'update', 'heat', someoneElses, true],
    ['admin', 'manage', 'member', undefined, true],
    ['mentor', 'manage', 'member', undefined, false],
    ['caster', 'update', 'equipment', undefined, true],
    ['student', 'update', 'equipment', undefined, false],
  ] as const)('when a %s tries %s:%s, then the answer follows the grant table', (role, action, entity, resource, expected) => {
    expect(can(me(role), action, entity, resource)).toBe(expected);
  });

  test('when an "own" check forgets the resource, then it fails closed', () => {
    expect(can(me('student'), 'update', 'heat')).toBe(false);
    expect(can(me('student'), 'create', 'heat')).toBe(true);
  });
});

describe('accessFor', () => {
  test('when building a list filter, then each role gets its widest reach', () => {
    expect(accessFor(me('admin'), 'read', 'heat')).toEqual(['any']);
    expect(accessFor(me('mentor'), 'read', 'heat')).toEqual(['own', 'mentee']);
    expect(accessFor(me('student'), 'read', 'heat')).toEqual(['own']);
  });
});
