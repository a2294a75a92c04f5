import { describe, expect, test } from 'vitest';
import {
  CHARGE_KINDS,
  FLUX_KINDS,
  HEAT_CONDITION_FIELDS,
  HEAT_CONDITION_LABELS,
  MOLD_MATERIALS,
  heatConditionsInputSchema,
  heatConditionsSchema,
  isMetalMold,
  mouldKindOf,
} from './heat-conditions.ts';

const full = {
  pourTempC: 720,
  peakTempC: 740,
  holdTimeMin: 20,
  chargeKind: 'ingot',
  degassed: true,
  fluxed: true,
  fluxKind: 'cover',
  skimmed: true,
  toolsPreheated: true,
  ambientTempC: 18,
  relativeHumidityPct: 55,
  moldMaterial: 'green_sand',
  moldTempC: 20,
  moldCoated: false,
  moldVented: true,
  riser: true,
  pourHeightCm: 8,
  sectionThicknessMm: 12,
  quenchDelayMin: 30,
  crucibleCycles: 4,
} as const;

describe('heatConditionsSchema', () => {
  test('when a complete heat is parsed, then it passes and every field has a label', () => {
    expect(heatConditionsSchema.parse(full)).toEqual(full);
    expect(heatConditionsInputSchema.parse(full)).toEqual(full);
    expect(Object.keys(HEAT_CONDITION_LABELS).sort()).toEqual([...HEAT_CONDITION_FIELDS].sort());
    expect(HEAT_CONDITION_FIELDS).toHaveLength(20);
  });

  test.each([
    ['relative humidity above 100 %', { relativeHumidityPct: 120 }],
    ['a pour hotter than any foundry melt', { pourTempC: 5000 }],
    ['a negative hold', { holdTimeMin: -1 }],
    ['a fractional crucible count', { crucibleCycles: 2.5 }],
    ['an unknown mould material', { moldMaterial: 'cardboard' }],
    ['a zero section', { sectionThicknessMm: 0 }],
  ])('when a heat has %s, then it is rejected', (_, patch) => {
    expect(heatConditionsSchema.safeParse({ ...full, ...patch }).success).toBe(false);
  });

  test('when a partial heat log is parsed, then missing fields are fine unless a complete record is asked for', () => {
    expect(heatConditionsInputSchema.parse({ pourTempC: 700 })).toEqual({ pourTempC: 700 });
    expect(heatConditionsInputSchema.safeParse({ relativeHumidityPct: 150 }).success).toBe(false);
    expect(heatConditionsSchema.safeParse({ pourTempC: 700 }).success).toBe(false);
  });
});

describe('option lists', () => {
  test('when the options are listed, then they are the ones heat logs offer', () => {
    expect(CHARGE_KINDS).toEqual(['ingot', 'clean_scrap', 'dirty_scrap']);
    expect(FLUX_KINDS).toEqual(['cover', 'drossing', 'cleaning', 'borax', 'other']);
    expect(MOLD_MATERIALS).toEqual(['graphite', 'steel', 'cast_iron', 'green_sand', 'bonded_sand', 'investment', 'plaster']);
  });

  test.each([
    ['graphite', true, 'permanentMould'],
    ['steel', true, 'permanentMould'],
    ['cast_iron', true, 'permanentMould'],
    ['green_sand', false, 'sand'],
    ['bonded_sand', false, 'sand'],
    ['investment', false, 'sand'],
    ['plaster', false, 'sand'],
  ] as const)('when the mould is %s, then metal mould is %s and the %s range applies', (m, metal, kind) => {
    expect(isMetalMold(m)).toBe(metal);
    expect(mouldKindOf(m)).toBe(kind);
  });
});
