import { describe, expect, test } from 'vitest';
import { findAlloy } from './alloys.ts';
import type { Alloy } from './alloys.ts';
import { cautionsFor } from './cautions.ts';

const alloy = (d: string) => findAlloy(d) as Alloy;
const ids = (input: Parameters<typeof cautionsFor>[0], options?: Parameters<typeof cautionsFor>[1]) =>
  cautionsFor(input, options).map((c) => c.id);

describe('cautionsFor', () => {
  test('when borax is used on aluminium, then it cautions, citing the salt-flux review (Metals 13 (2023) 832)', () => {
    const [caution] = cautionsFor({ alloy: alloy('A356.0'), conditions: { fluxKind: 'borax' } });
    expect(caution.id).toBe('borax_on_aluminium');
    expect(caution.source).toContain('Metals 13 (2023) 832');
  });

  test('when borax is used on bronze, then it does not caution (borax is a copper-alloy flux)', () => {
    expect(ids({ alloy: alloy('C90300'), conditions: { fluxKind: 'borax' } })).not.toContain('borax_on_aluminium');
  });

  test('when a high-magnesium alloy is fluxed, then it asks for a sodium-free flux (flux supplier note, secondary)', () => {
    const caution = cautionsFor({ alloy: alloy('535.0'), conditions: { fluxed: true } }).find((c) => c.id === 'sodium_flux_high_magnesium');
    expect(caution?.source).toContain('secondary');
  });

  test('when tools were not preheated or the charge is dirty scrap, then it cites the UK HSE molten-metal guidance', () => {
    const cautions = cautionsFor({ conditions: { toolsPreheated: false, chargeKind: 'dirty_scrap' } });
    expect(cautions.map((c) => c.id)).toEqual(['tools_not_preheated', 'wet_or_dirty_scrap']);
    for (const c of cautions) expect(c.source).toContain('HSE');
  });

  test.each([
    [14, []],
    [15, ['crucible_near_limit']],
    [19, ['crucible_near_limit']],
    [20, ['crucible_past_limit']],
  ] as const)('when a clay-graphite crucible has seen %d heats, then it says %j (common practice: warn at 15, ~20 life)', (cycles, expected) => {
    expect(ids({ conditions: { crucibleCycles: cycles } })).toEqual(expected);
  });

  test('when a workshop sets its own crucible limits, then they are used', () => {
    expect(ids({ conditions: { crucibleCycles: 30 } }, { crucibleWarnCycles: 40, crucibleLimitCycles: 50 })).toEqual([]);
  });

  test('when a casting is quenched in water soon after pouring, then it cautions', () => {
    expect(ids({ conditions: { quenchDelayMin: 2 } })).toEqual(['early_water_quench']);
    expect(ids({ conditions: { quenchDelayMin: 30 } })).toEqual([]);
  });

  test('when a metal mould is below 100 °C, then it cautions; a sand mould at room temperature does not', () => {
    expect(ids({ conditions: { moldMaterial: 'steel', moldTempC: 25 } })).toEqual(['cold_metal_mould']);
    expect(ids({ conditions: { moldMaterial: 'green_sand', moldTempC: 25 } })).toEqual([]);
  });

  test('when a leaded bronze or yellow brass is melted, then it warns about fume', () => {
    expect(ids({ alloy: alloy('C93200'), conditions: {} })).toEqual(['lead_fume']);
    expect(ids({ alloy: alloy('C85400'), conditions: {} })).toEqual(['zinc_fume']);
  });

  test('when the heat is clean and nothing is recorded, then there is no caution', () => {
    expect(ids({ alloy: alloy('A356.0'), conditions: {} })).toEqual([]);
  });
});
