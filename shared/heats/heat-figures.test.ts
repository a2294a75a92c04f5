import { describe, expect, test } from 'vitest';
import { cautionsFor, dewPointC, findAlloy, humidityRisk, pourYield, superheatC } from '../domain/index.ts';
import type { HeatConditions } from '../domain/index.ts';
import { crucibleStatusOf, cycleLimitsFor, DEFAULT_CRUCIBLE_CYCLE_LIMITS } from './crucible-life.ts';
import { castingsTotalG, cavityMassG, heatCautionsOf, heatFiguresOf } from './heat-figures.ts';

const readings = {
  alloy: 'A356.0',
  meltStartedAt: '2026-11-20T17:00:00Z',
  pouredAt: '2026-11-20T18:00:00Z',
  pourTempC: 730,
  ambientTempC: 20,
  relativeHumidityPct: 50,
  crucibleCycle: 3,
  chargeG: 1000,
  castingsG: 550,
};

describe('heatFiguresOf', () => {
  test('when a heat is fully recorded, then every figure is the trade core’s', () => {
    const f = heatFiguresOf(readings);
    const dp = dewPointC({ tempC: 20, relativeHumidityPct: 50 });

    expect(f).toMatchObject({
      chargeG: 1000,
      castingsG: 550,
      yieldPct: pourYield({ chargeG: 1000, castingG: 550 }).yieldPct,
      remainderG: 450,
      superheatC: superheatC(730, findAlloy('A356.0')!),
      holdTimeMin: 60,
      dewPointC: dp,
      humidityRisk: humidityRisk(dp),
      crucibleCycle: 3,
    });
    expect(f.hydrogen!.ratio).toBeGreaterThan(1);
  });

  test('when readings are missing or impossible, then those figures are null instead of an error', () => {
    const f = heatFiguresOf({ ...readings, pourTempC: null, relativeHumidityPct: 0, castingsG: 1500, alloy: 'C83600' });

    expect(f).toMatchObject({ superheatC: null, dewPointC: null, humidityRisk: null, yieldPct: null, remainderG: null, hydrogen: null });
  });

  test('when a casting is unweighed or there is none, then the castings total is unknown', () => {
    expect(castingsTotalG([{ massG: 300 }, { massG: null }])).toBeNull();
    expect(castingsTotalG([])).toBeNull();
    expect(castingsTotalG([{ massG: 300 }, { massG: 200 }])).toBe(500);
  });
});

describe('heatCautionsOf', () => {
  const calm = {
    alloy: 'A356.0',
    safety: { dryTools: true, ppe: true, clearFloor: true },
    crucibleShock: 'none' as const,
    conditions: [{ fluxKind: 'cover', toolsPreheated: true, chargeKind: 'ingot' }] as Partial<HeatConditions>[],
  };

  test('when nothing is amiss, then there are no cautions', () => {
    expect(heatCautionsOf(calm)).toEqual([]);
  });

  test('when the crucible was heated up fast or quenched, then the heat log’s own caution says which', () => {
    const [fast] = heatCautionsOf({ ...calm, crucibleShock: 'fast_heat_up' });
    const [quenched] = heatCautionsOf({ ...calm, crucibleShock: 'quenched' });

    expect(fast).toMatchObject({ id: 'crucible_shock', title: expect.stringMatching(/fast/) });
    expect(quenched).toMatchObject({ id: 'crucible_shock', title: expect.stringMatching(/quenched/) });
    expect(fast.source).toMatch(/^common practice/);
  });

  test('when ticks are missing, then the checklist caution names them', () => {
    const [caution] = heatCautionsOf({ ...calm, safety: { dryTools: false, ppe: true, clearFloor: false } });

    expect(caution).toMatchObject({ id: 'safety_checklist_incomplete', text: 'Not ticked: tools dry, floor clear.' });
  });

  test('when the trade core flags a heat or one of its pours, then its cautions come through once each', () => {
    const heat = { fluxKind: 'borax', toolsPreheated: false, chargeKind: 'ingot' } as const;
    const conditions = [heat, { ...heat, moldMaterial: 'steel', moldTempC: 40 }, { ...heat, moldMaterial: 'steel', moldTempC: 30 }] as const;

    const cautions = heatCautionsOf({ ...calm, conditions: [...conditions] });

    expect(cautions).toEqual([
      ...cautionsFor({ alloy: findAlloy('A356.0'), conditions: conditions[1] }),
    ]);
    expect(cautions.map((c) => c.id)).toEqual(['borax_on_aluminium', 'tools_not_preheated', 'cold_metal_mould']);
  });

  test('when the workshop’s crucible limits are given, then the trade core warns and stops at them', () => {
    const limits = { warnAt: 2, limitAt: 3 };
    const at = (crucibleCycles: number) =>
      heatCautionsOf({ ...calm, conditions: [{ crucibleCycles }], crucibleLimits: limits }).map((c) => c.id);

    expect(at(1)).toEqual([]);
    expect(at(2)).toEqual(['crucible_near_limit']);
    expect(at(3)).toEqual(['crucible_past_limit']);
  });
});

describe('crucible life', () => {
  test.each([
    [0, false, 'ok'],
    [14, false, 'ok'],
    [15, false, 'near-limit'],
    [20, false, 'past-limit'],
    [25, false, 'past-limit'],
    [3, true, 'retired'],
  ] as const)('when a crucible has %i cycles (retired: %s), then its status is %s under the defaults', (cycleCount, retired, status) => {
    expect(crucibleStatusOf({ cycleCount, retired }, DEFAULT_CRUCIBLE_CYCLE_LIMITS)).toBe(status);
  });

  test('when the workshop set limits for a material, then those apply and others keep the defaults', () => {
    const own = [{ material: 'silicon_carbide' as const, warnAt: 40, limitAt: 50 }];

    expect(cycleLimitsFor('silicon_carbide', own)).toEqual({ warnAt: 40, limitAt: 50, isDefault: false });
    expect(cycleLimitsFor('clay_graphite', own)).toEqual({ warnAt: 15, limitAt: 20, isDefault: true });
  });
});

describe('cavityMassG', () => {
  test('when the alloy differs from the one the cavity was measured in, then the mass scales by density', () => {
    const bronze = findAlloy('C83600')!;
    const a356 = findAlloy('A356.0')!;

    expect(cavityMassG({ capacityG: 450, capacityAlloy: 'A356.0' }, 'C83600')).toBeCloseTo((450 * bronze.densityGcm3) / a356.densityGcm3, 9);
    expect(cavityMassG({ capacityG: 450, capacityAlloy: 'A356.0' }, 'A356.0')).toBe(450);
    expect(cavityMassG({ capacityG: 450, capacityAlloy: null }, 'C83600')).toBe(450);
  });
});
