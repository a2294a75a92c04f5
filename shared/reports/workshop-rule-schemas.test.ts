import { describe, expect, test } from 'vitest';
import { DEFAULT_RULES, ruleSetSchema } from '../domain/index.ts';
import type { Rule } from '../domain/index.ts';
import { buildRuleSet, rulePreviewRequestSchema, ruleOverrideSchema } from './workshop-rule-schemas.ts';
import type { StoredWorkshopRule } from './workshop-rule-schemas.ts';

const at = '2026-12-01T12:00:00.000Z';
const own: Rule = {
  id: 'wet-ladle-gas',
  defects: ['gas_porosity'],
  when: { field: 'toolsPreheated', op: 'eq', value: false },
  variable: 'tool_preheat',
  weight: 0.7,
  evidence: 'the ladle went in cold and wet',
  fixes: ['Dry the ladle on the furnace lid first.'],
  source: 'workshop experience',
};

describe('buildRuleSet', () => {
  test('when nothing is stored, then the shipped rules come back unchanged and frozen', () => {
    const { rules, listing } = buildRuleSet(DEFAULT_RULES, []);

    expect(rules).toEqual(DEFAULT_RULES);
    expect(Object.isFrozen(rules)).toBe(true);
    expect(listing.every((r) => r.enabled && !r.overridden && r.origin === 'default')).toBe(true);
  });

  test('when a shipped rule is switched off and another reweighted, then the set leaves one out and changes the other', () => {
    const [first, second] = DEFAULT_RULES;
    const stored: StoredWorkshopRule[] = [
      { ruleId: first.id, origin: 'default', rule: null, enabled: false, weight: null, updatedAt: at },
      { ruleId: second.id, origin: 'default', rule: null, enabled: null, weight: 0.9, updatedAt: at },
    ];

    const { rules, listing } = buildRuleSet(DEFAULT_RULES, stored);

    expect(rules.find((r) => r.id === first.id)).toBeUndefined();
    expect(rules.find((r) => r.id === second.id)?.weight).toBe(0.9);
    expect(Object.isFrozen(rules.find((r) => r.id === second.id))).toBe(true);
    expect(listing.find((r) => r.rule.id === second.id)).toMatchObject({ overridden: true, defaultWeight: second.weight });
    expect(ruleSetSchema.safeParse(rules).success).toBe(true);
  });

  test('when the workshop added a rule, then it follows the shipped ones', () => {
    const { rules, listing } = buildRuleSet(DEFAULT_RULES, [
      { ruleId: own.id, origin: 'workshop', rule: own, enabled: true, weight: null, updatedAt: at },
    ]);

    expect(rules[rules.length - 1]).toEqual(own);
    expect(listing[listing.length - 1]).toMatchObject({ origin: 'workshop', defaultWeight: null });
  });
});

describe('ruleOverrideSchema and rulePreviewRequestSchema', () => {
  test.each([
    [{}, false],
    [{ enabled: false }, true],
    [{ weight: 1.2 }, false],
    [{ weight: null }, true],
    [{ enabled: true, colour: 'red' }, false],
  ])('when an override is %j, then it is accepted: %s', (body, ok) => {
    expect(ruleOverrideSchema.safeParse(body).success).toBe(ok);
  });

  test('when a preview names a rule or an override, then either parses, and neither alone is refused', () => {
    expect(rulePreviewRequestSchema.safeParse({ rule: own }).success).toBe(true);
    expect(rulePreviewRequestSchema.safeParse({ override: { ruleId: 'hot-pour-gas', enabled: false } }).success).toBe(true);
    expect(rulePreviewRequestSchema.safeParse({}).success).toBe(false);
  });
});
