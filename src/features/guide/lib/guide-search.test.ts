import { describe, expect, test } from 'vitest';
import { DEFECT_KINDS } from '#shared/domain/index.ts';
import { buildGuideIndex, searchGuide } from './guide-search.ts';

const index = buildGuideIndex();
const top = (query: string, n = 3) => searchGuide(index, query).slice(0, n).map((k) => k.id);

describe('searchGuide', () => {
  test('when someone types "bubbles", then the gas kinds lead: gas porosity, blowholes and pinholes', () => {
    expect(top('bubbles')[0]).toBe('gas_porosity');
    expect(top('bubbles').sort()).toEqual(['blowholes', 'gas_porosity', 'pinholes']);
  });

  test('when "bubbles" is misspelt "bubbels", then gas porosity and blowholes still come first', () => {
    expect(top('bubbels', 2).sort()).toEqual(['blowholes', 'gas_porosity']);
  });

  test('when someone types "divot", then the shrinkage sink comes first (its everyday words include it)', () => {
    expect(DEFECT_KINDS.find((k) => k.id === 'shrinkage_sink')?.synonyms).toContain('divot');
    expect(top('divot')[0]).toBe('shrinkage_sink');
  });

  test.each([
    ['coldshut', 'cold_shut'],
    ['cold shut', 'cold_shut'],
    ['hottear', 'hot_tear'],
    ['ratail', 'rat_tail'],
    ['pinhole', 'pinholes'],
    ['swiss cheese', 'gas_porosity'],
    ['warp', 'warpage'],
    ['dent', 'shrinkage_sink'],
    ['ripples', 'laps'],
    ['burn-on', 'metal_penetration'],
  ])('when someone types "%s", then %s comes first', (query, expected) => {
    expect(top(query, 1)).toEqual([expected]);
  });

  test('when the query is empty, then every kind comes back in catalogue order', () => {
    expect(searchGuide(index, '  ').map((k) => k.id)).toEqual(DEFECT_KINDS.map((k) => k.id));
  });

  test('when someone types a group name, then the kinds of that group lead', () => {
    const shrinkage = DEFECT_KINDS.filter((k) => k.group === 'shrinkage').map((k) => k.id);
    expect(top('shrinkage', shrinkage.length).sort()).toEqual([...shrinkage].sort());
  });

  test('when the query matches nothing, then nothing comes back', () => {
    expect(searchGuide(index, 'qqqxz')).toEqual([]);
  });
});
