import { describe, expect, test } from 'vitest';
import { conditionSchema, ruleSchema, ruleSetSchema } from './rule-schemas.ts';
import type { Rule } from './rule-schemas.ts';

const rule: Rule = {
  id: 'workshop-hot-pour',
  defects: ['gas_porosity'],
  when: { field: 'pourTempC', op: 'gt', value: { alloy: 'pourMax', offset: 0 } },
  variable: 'pour_temperature',
  weight: 0.5,
  evidence: 'pour {pourTempC} is {excess} above {threshold} for {alloy}',
  fixes: ['Pour cooler.'],
  source: 'workshop experience',
};

describe('conditionSchema', () => {
  test.each([
    ['an alloy threshold', { field: 'pourTempC', op: 'gt', value: { alloy: 'pourMax', offset: 0 } }],
    ['a number', { field: 'dewPointC', op: 'gt', value: 15 }],
    ['a yes/no', { field: 'degassed', op: 'eq', value: false }],
    ['an option list', { field: 'moldMaterial', op: 'in', value: ['graphite', 'steel'] }],
    ['a trait', { field: 'alloyTraits', op: 'has', value: 'hot_tear_prone' }],
    ['nested combinators', { all: [{ any: [{ field: 'riser', op: 'eq', value: false }] }, { not: { field: 'holdTimeMin', op: 'lt', value: 5 } }] }],
  ])('when a condition uses %s, then it is valid', (_, condition) => {
    expect(conditionSchema.safeParse(condition).success).toBe(true);
  });

  test.each([
    ['a number field compared with true', { field: 'pourTempC', op: 'eq', value: true }],
    ['a yes/no field with gt', { field: 'degassed', op: 'gt', value: 1 }],
    ['an unknown option', { field: 'moldMaterial', op: 'eq', value: 'cardboard' }],
    ['in with a single string', { field: 'moldMaterial', op: 'in', value: 'graphite' }],
    ['an alloy property on a non-temperature field', { field: 'holdTimeMin', op: 'gt', value: { alloy: 'liquidus' } }],
    ['an unknown alloy property', { field: 'pourTempC', op: 'gt', value: { alloy: 'boilingPoint' } }],
    ['an unknown field', { field: 'moonPhase', op: 'eq', value: 'full' }],
    ['an empty all', { all: [] }],
    ['a formula string', { field: 'pourTempC', op: 'gt', value: 'liquidus + 50' }],
    ['an unknown trait', { field: 'alloyTraits', op: 'has', value: 'shiny' }],
  ])('when a condition has %s, then it is rejected', (_, condition) => {
    expect(conditionSchema.safeParse(condition).success).toBe(false);
  });
});

describe('ruleSchema', () => {
  test('when a workshop rule is well formed, then it parses unchanged', () => {
    expect(ruleSchema.parse(rule)).toEqual(rule);
  });

  test.each([
    ['an unknown placeholder', { evidence: 'pour {pourTemp}' }],
    ['a weight above 1', { weight: 1.5 }],
    ['a non-kebab id', { id: 'Hot_Pour' }],
    ['no defects', { defects: [] }],
    ['an unknown defect', { defects: ['gremlins'] }],
    ['an unknown variable', { variable: 'luck' }],
    ['no fixes', { fixes: [] }],
    ['an extra key', { script: 'alert(1)' }],
  ])('when a rule has %s, then it is rejected', (_, patch) => {
    expect(ruleSchema.safeParse({ ...rule, ...patch }).success).toBe(false);
  });
});

describe('ruleSetSchema', () => {
  test('when two rules share an id, then the set is rejected', () => {
    expect(ruleSetSchema.safeParse([rule, rule]).success).toBe(false);
    expect(ruleSetSchema.safeParse([rule, { ...rule, id: 'other' }]).success).toBe(true);
  });
});
