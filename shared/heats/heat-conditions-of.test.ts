import { describe, expect, test } from 'vitest';
import { heatConditionsInputSchema, heatConditionsSchema } from '../domain/index.ts';
import { heatConditionsOf, holdTimeMinOf } from './heat-conditions-of.ts';
import type { HeatConditionsCasting, HeatConditionsHeat } from './heat-conditions-of.ts';

const heat: HeatConditionsHeat = {
  meltStartedAt: '2026-11-20T17:15:00.000Z',
  pouredAt: '2026-11-20T18:00:00.000Z',
  pourTempC: 720,
  peakTempC: 745,
  chargeLines: [{ kind: 'ingot' }, { kind: 'clean_scrap' }],
  degassing: 'rotary',
  fluxKind: 'cover',
  skimmed: true,
  toolsPreheated: false,
  ambientTempC: 21,
  relativeHumidityPct: 60,
  crucibleCycle: 7,
};
const casting: HeatConditionsCasting = {
  mould: { material: 'green_sand', hasRiser: true },
  mouldPreheatC: 20,
  coated: false,
  vented: true,
  pourHeightCm: 15,
  sectionThicknessMm: 10,
  airCoolMin: 5,
  quenchMedium: 'water',
};

describe('heatConditionsOf', () => {
  test('when a heat and a pour are fully recorded, then every HeatConditions field is mapped', () => {
    const conditions = heatConditionsOf(heat, casting);

    expect(heatConditionsSchema.parse(conditions)).toEqual({
      pourTempC: 720,
      peakTempC: 745,
      holdTimeMin: 45,
      chargeKind: 'clean_scrap',
      degassed: true,
      fluxed: true,
      fluxKind: 'cover',
      skimmed: true,
      toolsPreheated: false,
      ambientTempC: 21,
      relativeHumidityPct: 60,
      moldMaterial: 'green_sand',
      moldTempC: 20,
      moldCoated: false,
      moldVented: true,
      riser: true,
      pourHeightCm: 15,
      sectionThicknessMm: 10,
      quenchDelayMin: 5,
      crucibleCycles: 7,
    });
  });

  test('when only the heat is given, then no mould or pour fields appear', () => {
    const conditions = heatConditionsOf(heat);

    expect(Object.keys(conditions)).not.toContain('moldMaterial');
    expect(Object.keys(conditions)).not.toContain('quenchDelayMin');
    expect(heatConditionsInputSchema.safeParse(conditions).success).toBe(true);
  });

  test.each([
    [['ingot', 'ingot'], 'ingot'],
    [['ingot', 'dirty_scrap', 'clean_scrap'], 'dirty_scrap'],
    [['clean_scrap'], 'clean_scrap'],
  ] as const)('when the charge is %j, then the worst kind present, %s, describes it', (kinds, expected) => {
    expect(heatConditionsOf({ chargeLines: kinds.map((kind) => ({ kind })) }).chargeKind).toBe(expected);
  });

  test('when no flux and no degassing were used, then fluxed and degassed are false and no flux kind is given', () => {
    const conditions = heatConditionsOf({ fluxKind: 'none', degassing: 'none' });

    expect(conditions).toEqual({ fluxed: false, degassed: false });
  });

  test('when the casting cooled in air or was quenched in something else, then there is no water-quench delay', () => {
    expect(heatConditionsOf(heat, { ...casting, quenchMedium: 'none' }).quenchDelayMin).toBeUndefined();
    expect(heatConditionsOf(heat, { ...casting, quenchMedium: 'other' }).quenchDelayMin).toBeUndefined();
  });

  test('when values are unknown or outside the trade core’s ranges, then they are left out rather than guessed', () => {
    const conditions = heatConditionsOf(
      { pourTempC: null, peakTempC: 5000, skimmed: null, chargeLines: [], meltStartedAt: null, pouredAt: '2026-11-20T18:00:00Z' },
      { mould: null, mouldPreheatC: 2000 },
    );

    expect(conditions).toEqual({});
  });
});

describe('holdTimeMinOf', () => {
  test('when the melt start is missing or after the pour, then the hold time is unknown', () => {
    expect(holdTimeMinOf({ meltStartedAt: null, pouredAt: '2026-11-20T18:00:00Z' })).toBeNull();
    expect(holdTimeMinOf({ meltStartedAt: '2026-11-20T19:00:00Z', pouredAt: '2026-11-20T18:00:00Z' })).toBeNull();
    expect(holdTimeMinOf({ meltStartedAt: '2026-11-20T17:30:00Z', pouredAt: '2026-11-20T18:00:00Z' })).toBe(30);
  });
});
