import { describe, expect, test } from 'vitest';
import type { AlloyEntry } from '#shared/alloys/alloy-schemas.ts';
import { ALLOYS } from '#shared/domain/index.ts';
import { searchAlloyEntries, sortAlloyEntries } from './alloy-table.ts';

const entries: AlloyEntry[] = ALLOYS.map((alloy) => ({
  origin: 'library',
  id: null,
  alloy,
  createdBy: null,
  createdByName: null,
  createdAt: null,
  updatedAt: null,
}));
const names = (rows: AlloyEntry[]) => rows.map((r) => r.alloy.designation);

describe('sortAlloyEntries', () => {
  test('when sorted by liquidus, then pure tin comes first ascending and grey iron first descending', () => {
    expect(names(sortAlloyEntries(entries, { key: 'liquidus', direction: 'ascending' }))[0]).toBe('Pure Sn');
    expect(names(sortAlloyEntries(entries, { key: 'liquidus', direction: 'descending' }))[0]).toBe('Grey iron');
  });

  test('when sorted by permanent-mould range, then alloys without one go last in both directions', () => {
    const withoutPm = ALLOYS.filter((a) => !a.pourRangeC.permanentMould).length;
    for (const direction of ['ascending', 'descending'] as const) {
      const sorted = sortAlloyEntries(entries, { key: 'pourPermanentMould', direction });
      expect(sorted.slice(-withoutPm).every((e) => e.alloy.pourRangeC.permanentMould === undefined)).toBe(true);
    }
  });
});

describe('searchAlloyEntries', () => {
  test.each([
    ['a356', 'A356.0'],
    ['za27', 'ZA-27'],
    ['tenzalloy', '713.0'],
    ['navy g', 'C90300'],
    ['85-5-5-5', 'C83600'],
  ])('when someone searches "%s", then %s comes first', (query, designation) => {
    expect(names(searchAlloyEntries(entries, query))[0]).toBe(designation);
  });

  test('when someone searches "bronze", then every bronze is found', () => {
    expect(names(searchAlloyEntries(entries, 'bronze'))).toEqual(expect.arrayContaining(['C90300', 'C93200', 'C95400']));
  });
});
