import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { ALLOYS } from '../alloys.ts';
import { DEFECT_KIND_IDS } from '../defect-kinds.ts';
import { CHARGE_KINDS, FLUX_KINDS, MOLD_MATERIALS } from '../heat-conditions.ts';
import { MELT_VARIABLE_IDS } from '../melt-variables.ts';
import { diagnose } from './diagnose.ts';
import type { DiagnoseInput } from './diagnose.ts';

// Values include NaN and out-of-range numbers on purpose: a heat log typed in
// at the furnace is not always clean, and the ranking must survive it.
const messyNumber = (min: number, max: number) =>
  fc.oneof(fc.double({ min, max, noNaN: true }), fc.constant(Number.NaN), fc.constant(Number.POSITIVE_INFINITY));

const conditionsArb = fc.record(
  {
    pourTempC: messyNumber(300, 1600),
    peakTempC: messyNumber(300, 1600),
    holdTimeMin: messyNumber(0, 300),
    chargeKind: fc.constantFrom(...CHARGE_KINDS),
    degassed: fc.boolean(),
    fluxed: fc.boolean(),
    fluxKind: fc.constantFrom(...FLUX_KINDS),
    skimmed: fc.boolean(),
    toolsPreheated: fc.boolean(),
    ambientTempC: messyNumber(-20, 45),
    relativeHumidityPct: messyNumber(0, 100),
    moldMaterial: fc.constantFrom(...MOLD_MATERIALS),
    moldTempC: messyNumber(-10, 600),
    moldCoated: fc.boolean(),
    moldVented: fc.boolean(),
    riser: fc.boolean(),
    pourHeightCm: messyNumber(0, 100),
    sectionThicknessMm: messyNumber(0.5, 200),
    quenchDelayMin: messyNumber(0, 120),
    crucibleCycles: fc.integer({ min: 0, max: 60 }),
  },
  { requiredKeys: [] },
);

const inputArb: fc.Arbitrary<DiagnoseInput> = fc.record({
  alloy: fc.option(fc.constantFrom(...ALLOYS), { nil: undefined }),
  defects: fc.array(fc.record({ kind: fc.constantFrom(...DEFECT_KIND_IDS), severity: fc.constantFrom(1 as const, 2 as const, 3 as const) }), {
    maxLength: 4,
  }),
  conditions: conditionsArb,
});

const priorsArb = fc.array(
  fc
    .record({
      defectKind: fc.constantFrom(...DEFECT_KIND_IDS),
      variable: fc.constantFrom(...MELT_VARIABLE_IDS),
      resolvedCount: fc.integer({ min: 0, max: 30 }),
      confirmedFraction: fc.double({ min: 0, max: 1, noNaN: true }),
    })
    .map(({ confirmedFraction, resolvedCount, ...rest }) => ({
      ...rest,
      resolvedCount,
      confirmedCount: Math.floor(confirmedFraction * resolvedCount),
    })),
  { maxLength: 5 },
);

describe('diagnose (properties)', () => {
  test('when any heat is diagnosed, then scores lie in 0..1, are never NaN and come sorted with ties by id', () => {
    fc.assert(
      fc.property(inputArb, priorsArb, fc.double({ min: 0, max: 1, noNaN: true }), (input, priors, priorWeight) => {
        const { causes } = diagnose(input, { priors, priorWeight });
        for (const [i, c] of causes.entries()) {
          expect(Number.isNaN(c.score)).toBe(false);
          expect(c.score).toBeGreaterThanOrEqual(0);
          expect(c.score).toBeLessThanOrEqual(1);
          if (i > 0) {
            const prev = causes[i - 1];
            expect(prev.score > c.score || (prev.score === c.score && prev.variable < c.variable)).toBe(true);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  test('when the same heat is diagnosed twice, then the answer is identical', () => {
    fc.assert(
      fc.property(inputArb, priorsArb, (input, priors) => {
        expect(diagnose(input, { priors })).toEqual(diagnose(structuredClone(input), { priors: structuredClone(priors) }));
      }),
      { numRuns: 150 },
    );
  });

  test('when any heat is diagnosed, then out-of-range variables outrank suspects, which outrank normal ones', () => {
    const tier = { confirmed: 2, suspected: 1, normal: 0 } as const;
    fc.assert(
      fc.property(inputArb, priorsArb, (input, priors) => {
        const { causes } = diagnose(input, { priors });
        for (let i = 1; i < causes.length; i++) expect(tier[causes[i - 1].status]).toBeGreaterThanOrEqual(tier[causes[i].status]);
        for (const c of causes) expect(c.confirmed).toBe(c.status === 'confirmed');
      }),
      { numRuns: 300 },
    );
  });

  test('when evidence is rendered, then no placeholder is left and numbers never print as NaN', () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        for (const c of diagnose(input).causes) {
          for (const text of c.evidence) {
            expect(text).not.toMatch(/[{}]|NaN|Infinity|undefined/);
          }
        }
      }),
      { numRuns: 300 },
    );
  });
});
