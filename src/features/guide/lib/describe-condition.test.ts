import { describe, expect, test } from 'vitest';
import { DEFAULT_RULES, MELT_VARIABLES, type Condition } from '#shared/domain/index.ts';
import { causesOf } from './causes-of.ts';
import { describeCondition } from './describe-condition.ts';

describe('describeCondition', () => {
  test.each([
    [{ field: 'pourTempC', op: 'gt', value: { alloy: 'pourMax' } }, 'C', 'pour temperature above the alloy’s upper pouring limit'],
    [{ field: 'degassed', op: 'eq', value: false }, 'C', 'degassing: no'],
    [{ field: 'dewPointC', op: 'gt', value: 15 }, 'C', 'dew point above 15 °C'],
    [{ field: 'dewPointC', op: 'gt', value: 15 }, 'F', 'dew point above 59 °F'],
    [{ field: 'holdTimeMin', op: 'gt', value: 45 }, 'C', 'hold time above 45 min'],
    [{ field: 'chargeKind', op: 'eq', value: 'dirty_scrap' }, 'C', 'charge: dirty scrap'],
    [{ all: [{ field: 'riser', op: 'eq', value: false }, { field: 'sectionThicknessMm', op: 'gt', value: 25 }] }, 'C', 'riser: no and section thickness above 25 mm'],
  ] as const)('when a rule tests %j in °%s, then it reads "%s"', (condition, unit, expected) => {
    expect(describeCondition(condition as Condition, unit)).toBe(expected);
  });

  test('when every shipped rule is described, then none prints a raw field name or "undefined"', () => {
    for (const rule of DEFAULT_RULES) {
      const text = describeCondition(rule.when, 'C');
      expect(text).not.toMatch(/undefined|[a-z][A-Z]/);
    }
  });
});

describe('causesOf', () => {
  test('when the guide asks for gas porosity, then its rules come grouped by melt variable, each rule once', () => {
    const groups = causesOf('gas_porosity');
    const ids = groups.flatMap((g) => g.rules.map((r) => r.id));
    const expected = DEFAULT_RULES.filter((r) => r.defects.includes('gas_porosity')).map((r) => r.id);

    expect([...ids].sort()).toEqual([...expected].sort());
    for (const g of groups) {
      expect(MELT_VARIABLES).toContain(g.variable);
      expect(g.rules.every((r) => r.variable === g.variable.id)).toBe(true);
    }
    expect(groups.map((g) => g.variable.id)).toContain('degassing');
  });
});
