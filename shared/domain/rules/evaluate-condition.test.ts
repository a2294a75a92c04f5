import { describe, expect, test } from 'vitest';
import { findAlloy } from '../alloys.ts';
import type { Alloy } from '../alloys.ts';
import type { HeatConditions } from '../heat-conditions.ts';
import { buildContext, evaluateCondition } from './evaluate-condition.ts';
import type { Condition } from './rule-schemas.ts';

const a356 = findAlloy('A356.0') as Alloy;
const hot: Condition = { field: 'pourTempC', op: 'gt', value: { alloy: 'pourMax' } };
const undegassed: Condition = { field: 'degassed', op: 'eq', value: false };
const outcome = (c: Condition, conditions: Partial<HeatConditions>, alloy: Alloy | undefined = a356) =>
  evaluateCondition(c, buildContext(conditions, alloy)).outcome;

describe('evaluateCondition', () => {
  test.each([
    // three-valued logic: undefined = not decidable with the data given
    ['all, one false one missing', { all: [hot, undegassed] }, { pourTempC: 700 }, false],
    ['all, one true one missing', { all: [hot, undegassed] }, { pourTempC: 800 }, undefined],
    ['all, both true', { all: [hot, undegassed] }, { pourTempC: 800, degassed: false }, true],
    ['any, one true one missing', { any: [hot, undegassed] }, { pourTempC: 800 }, true],
    ['any, one false one missing', { any: [hot, undegassed] }, { pourTempC: 700 }, undefined],
    ['any, both false', { any: [hot, undegassed] }, { pourTempC: 700, degassed: true }, false],
    ['not of missing', { not: undegassed }, {}, undefined],
    ['not of true', { not: undegassed }, { degassed: false }, false],
  ] as const)('when %s, then the outcome is %s', (_, condition, conditions, expected) => {
    expect(outcome(condition as Condition, conditions)).toBe(expected);
  });

  test('when the mould is metal or sand, then the pour limit is the permanent-mould or sand one', () => {
    const custom = { ...a356, pourRangeC: { sand: { min: 700, max: 760 }, permanentMould: { min: 680, max: 740 } } };
    expect(outcome(hot, { pourTempC: 750, moldMaterial: 'graphite' }, custom)).toBe(true);
    expect(outcome(hot, { pourTempC: 750, moldMaterial: 'green_sand' }, custom)).toBe(false);
  });

  test('when no alloy is chosen, then an alloy threshold is undecided and says the alloy is missing', () => {
    const result = evaluateCondition(hot, buildContext({ pourTempC: 900 }));
    expect(result).toMatchObject({ outcome: undefined, missingAlloy: true });
  });

  test('when a value is NaN or of the wrong type, then it counts as not recorded', () => {
    const result = evaluateCondition(hot, buildContext({ pourTempC: Number.NaN }, a356));
    expect(result).toMatchObject({ outcome: undefined, missing: ['pourTempC'] });
    expect(outcome(undegassed, { degassed: 'no' as unknown as boolean })).toBeUndefined();
  });

  test('when air temperature and humidity are recorded, then the dew point is derived (Magnus, Alduchov & Eskridge 1996)', () => {
    const ctx = buildContext({ ambientTempC: 30, relativeHumidityPct: 80 });
    expect(ctx.values.dewPointC).toBeCloseTo(26.17, 2);
    const missing = evaluateCondition({ field: 'dewPointC', op: 'gt', value: 15 }, buildContext({ ambientTempC: 30 }));
    expect(missing.missing).toEqual(['ambientTempC', 'relativeHumidityPct']);
  });

  test('when a comparison decides, then it reports the value and the resolved threshold', () => {
    const result = evaluateCondition(hot, buildContext({ pourTempC: 812, moldMaterial: 'graphite' }, a356));
    expect(result.deciding).toEqual({ field: 'pourTempC', value: 812, threshold: 790 });
  });
});
