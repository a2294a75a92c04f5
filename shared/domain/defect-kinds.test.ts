import { describe, expect, test } from 'vitest';
import {
  CIATF_GROUPS,
  CIATF_GROUPS_SOURCE,
  DEFECT_GROUPS,
  DEFECT_GROUP_IDS,
  DEFECT_KINDS,
  DEFECT_KIND_IDS,
  defectGroup,
  defectKindIdSchema,
  findDefectKind,
} from './defect-kinds.ts';

const REQUIRED = [
  'gas_porosity', 'pinholes', 'blowholes', 'shrinkage_porosity', 'shrinkage_sink', 'cold_shut', 'misrun',
  'rounded_edges', 'oxide_inclusions', 'dross_inclusions', 'rough_surface', 'hot_tear', 'cold_crack', 'flash',
  'warpage', 'sand_inclusions', 'metal_penetration',
];

describe('DEFECT_KINDS', () => {
  test.each(REQUIRED)('when the vocabulary is searched for %s, then it is there', (id) => {
    expect(findDefectKind(id)?.id).toBe(id);
  });

  test('when the ids are listed, then the catalogue and the id list agree one to one', () => {
    expect(DEFECT_KINDS.map((k) => k.id)).toEqual([...DEFECT_KIND_IDS]);
  });

  test.each(DEFECT_KINDS.map((k) => [k.id, k] as const))('when %s is read, then it is complete and labels fit a photo mark', (_, kind) => {
    expect(kind.shortName.length).toBeLessThanOrEqual(14);
    expect(DEFECT_GROUP_IDS).toContain(kind.group);
    expect(kind.recognise.length).toBeGreaterThan(20);
    expect(kind.where.length).toBeGreaterThan(10);
    expect(kind.synonyms.length).toBeGreaterThanOrEqual(3);
    expect(kind.source.citation.length).toBeGreaterThan(5);
  });

  test('when everyday words are searched, then bubbles, holes, divot, dent, crack and wrinkle all map to a kind', () => {
    const words = new Set(DEFECT_KINDS.flatMap((k) => k.synonyms));
    for (const w of ['bubbles', 'holes', 'divot', 'dent', 'crack', 'wrinkle']) expect(words).toContain(w);
  });

  test.each([
    // International Atlas of Casting Defects letter groups per ASM Handbook Vol. 15,
    // "Common Defects in Various Casting Processes" (abstract).
    ['flash', 'A'],
    ['gas_porosity', 'B'],
    ['shrinkage_porosity', 'B'],
    ['cold_shut', 'C'],
    ['hot_tear', 'C'],
    ['rough_surface', 'D'],
    ['misrun', 'E'],
    ['warpage', 'F'],
    ['oxide_inclusions', 'G'],
    ['sand_inclusions', 'G'],
  ] as const)('when %s is read, then its atlas group is %s', (id, letter) => {
    expect(findDefectKind(id)?.ciatfGroup).toBe(letter);
  });

  test('when the atlas groups are listed, then there are seven, A to G, with their source', () => {
    expect(Object.keys(CIATF_GROUPS)).toEqual(['A', 'B', 'C', 'D', 'E', 'F', 'G']);
    expect(CIATF_GROUPS.B).toBe('Cavities');
    expect(CIATF_GROUPS_SOURCE.citation).toContain('ASM Handbook Vol. 15');
  });
});

describe('DEFECT_GROUPS', () => {
  test('when the groups are listed, then each has its own letter and its own shape', () => {
    expect(DEFECT_GROUPS.map((g) => g.id)).toEqual([...DEFECT_GROUP_IDS]);
    expect(new Set(DEFECT_GROUPS.map((g) => g.code)).size).toBe(DEFECT_GROUPS.length);
    expect(new Set(DEFECT_GROUPS.map((g) => g.shape)).size).toBe(DEFECT_GROUPS.length);
    expect(defectGroup('gas')).toMatchObject({ code: 'G', shape: 'circle' });
  });
});

describe('defectKindIdSchema / findDefectKind', () => {
  test('when an unknown id is given, then the schema rejects it and the lookup returns undefined', () => {
    expect(defectKindIdSchema.safeParse('gas_porosity').success).toBe(true);
    expect(defectKindIdSchema.safeParse('bubbles').success).toBe(false);
    expect(findDefectKind('bubbles')).toBeUndefined();
  });
});
