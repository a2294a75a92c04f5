import { describe, expect, test } from 'vitest';
import { DEFECT_KINDS } from '../defect-kinds.ts';
import { DEFAULT_HUMIDITY_BANDS } from '../humidity.ts';
import { MELT_VARIABLE_IDS } from '../melt-variables.ts';
import { DEFAULT_RULES } from './default-rules.ts';
import { ruleSetSchema } from './rule-schemas.ts';
import type { Condition } from './rule-schemas.ts';

const thresholdsOn = (field: string, condition: Condition): number[] => {
  if ('all' in condition) return condition.all.flatMap((c) => thresholdsOn(field, c));
  if ('any' in condition) return condition.any.flatMap((c) => thresholdsOn(field, c));
  if ('not' in condition) return thresholdsOn(field, condition.not);
  return condition.field === field && typeof condition.value === 'number' ? [condition.value] : [];
};

describe('DEFAULT_RULES', () => {
  test('when the shipped rules are validated with ruleSetSchema, then they pass unchanged', () => {
    expect(ruleSetSchema.parse(DEFAULT_RULES)).toEqual(DEFAULT_RULES);
  });

  test.each(DEFECT_KINDS.map((k) => k.id))('when %s is looked up, then at least two rules can explain it', (id) => {
    expect(DEFAULT_RULES.filter((r) => r.defects.includes(id)).length).toBeGreaterThanOrEqual(2);
  });

  test('when the rules are read, then every melt variable is reachable from some rule', () => {
    const used = new Set(DEFAULT_RULES.map((r) => r.variable));
    for (const id of MELT_VARIABLE_IDS) expect(used, id).toContain(id);
  });

  test('when a rule compares with a fixed number, then its source says where the number comes from', () => {
    const numbers = (c: Condition): number[] =>
      'all' in c ? c.all.flatMap(numbers) : 'any' in c ? c.any.flatMap(numbers) : 'not' in c ? numbers(c.not) : typeof c.value === 'number' ? [c.value] : [];
    for (const r of DEFAULT_RULES) {
      expect(r.source.length, r.id).toBeGreaterThan(10);
      if (numbers(r.when).length > 0) expect(r.source, r.id).toMatch(/app heuristic|secondary|from memory|common practice/);
    }
  });

  test('when the humidity rules are read, then their dew-point thresholds are the default risk bands (app heuristic)', () => {
    const dew = DEFAULT_RULES.flatMap((r) => thresholdsOn('dewPointC', r.when)).sort((a, b) => a - b);
    expect(dew).toEqual([DEFAULT_HUMIDITY_BANDS.moderateFromC, DEFAULT_HUMIDITY_BANDS.highAboveC]);
  });

  test('when the shipped array is touched, then it is frozen so the validation cache stays true', () => {
    expect(Object.isFrozen(DEFAULT_RULES)).toBe(true);
  });
});
