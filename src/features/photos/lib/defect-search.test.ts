import { describe, expect, test } from 'vitest';
import { DEFECT_KINDS } from '#shared/domain/index.ts';
import { searchDefectKinds } from './defect-search.ts';

const top = (query: string, n = 3) => searchDefectKinds(query).slice(0, n).map((k) => k.id);

describe('searchDefectKinds', () => {
  test('when someone types "bubles" (misspelt everyday word), then gas porosity or pinholes is among the first matches', () => {
    expect(top('bubles').some((id) => id === 'gas_porosity' || id === 'pinholes')).toBe(true);
  });

  test('when someone types "divot", then the shrinkage sink comes first (its everyday words include it)', () => {
    expect(DEFECT_KINDS.find((k) => k.id === 'shrinkage_sink')?.synonyms).toContain('divot');
    expect(top('divot', 1)).toEqual(['shrinkage_sink']);
  });

  test.each([
    ['gass porosty', 'gas_porosity'],
    ['cold shutt', 'cold_shut'],
    ['hot tare', 'hot_tear'],
    ['pin hole', 'pinholes'],
  ])('when someone types "%s", then %s comes first', (query, id) => {
    expect(top(query, 1)).toEqual([id]);
  });

  test('when the search is empty, then every kind is offered in catalogue order', () => {
    expect(searchDefectKinds('  ')).toEqual(DEFECT_KINDS);
  });
});
