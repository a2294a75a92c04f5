import { z } from 'zod';
import { meltVariableIdSchema, ruleSchema } from '../domain/index.ts';
import type { Rule } from '../domain/index.ts';
import { ruleSetStampSchema } from './diagnosis-schemas.ts';

// A workshop tunes the shipped rules (switch one off, change its weight) and
// adds its own. Added rules are the trade core's plain-JSON rules, checked by
// the core's own schema.

export const RULE_ORIGINS = ['default', 'workshop'] as const;
export type RuleOrigin = (typeof RULE_ORIGINS)[number];

export const ruleIdSchema = z
  .string()
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'Rule ids are kebab-case, like cold-ladle-gas')
  .max(80);

export const ruleParamsSchema = z.object({ workshopId: z.uuid('Unknown workshop'), ruleId: ruleIdSchema });

/** PATCH /rules/:ruleId. `weight: null` puts a shipped rule back to its own weight. */
export const ruleOverrideSchema = z
  .object({
    enabled: z.boolean().optional(),
    weight: z.number().min(0, 'Weights run from 0 to 1').max(1, 'Weights run from 0 to 1').nullable().optional(),
  })
  .strict()
  .refine((v) => v.enabled !== undefined || v.weight !== undefined, 'Change enabled or weight');
export type RuleOverrideInput = z.infer<typeof ruleOverrideSchema>;

/** POST /rules: a whole rule in the trade core's format. */
export const ruleCreateSchema = ruleSchema;

/** A rule as the workshop sees it: the effective rule (weight applied) and where it came from. */
export const workshopRuleSchema = z.object({
  rule: ruleSchema,
  origin: z.enum(RULE_ORIGINS),
  enabled: z.boolean(),
  /** The shipped weight of a default rule; null for the workshop's own. */
  defaultWeight: z.number().nullable(),
  /** Whether the workshop changed a shipped rule. */
  overridden: z.boolean(),
  updatedAt: z.string().nullable(),
});
export type WorkshopRule = z.infer<typeof workshopRuleSchema>;

export const workshopRulesSchema = z.object({ rules: z.array(workshopRuleSchema), ruleSet: ruleSetStampSchema });
export type WorkshopRules = z.infer<typeof workshopRulesSchema>;

/** POST /rules/preview: a candidate rule (new, or replacing one with the same id) or an override of one rule. */
export const rulePreviewRequestSchema = z.union([
  z.object({ rule: ruleSchema }).strict(),
  z.object({ override: z.object({ ruleId: ruleIdSchema, enabled: z.boolean().optional(), weight: z.number().min(0).max(1).nullable().optional() }).strict() }).strict(),
]);
export type RulePreviewRequest = z.infer<typeof rulePreviewRequestSchema>;

/** How many resolved reports a preview replays. */
export const RULE_PREVIEW_REPORTS = 20;
/** How many top causes a preview shows per report. */
export const RULE_PREVIEW_TOP = 3;

const rankedCauseSchema = z.object({ variable: meltVariableIdSchema, score: z.number(), status: z.enum(['confirmed', 'suspected', 'normal']) });

export const rulePreviewItemSchema = z.object({
  reportId: z.uuid(),
  title: z.string(),
  resolvedAt: z.string().nullable(),
  /** What the reviewer confirmed. */
  confirmedCauses: z.array(meltVariableIdSchema),
  before: z.array(rankedCauseSchema),
  after: z.array(rankedCauseSchema),
  /** Best (1-based) rank of any confirmed cause; null when none is ranked. */
  bestConfirmedRankBefore: z.number().int().nullable(),
  bestConfirmedRankAfter: z.number().int().nullable(),
});
export type RulePreviewItem = z.infer<typeof rulePreviewItemSchema>;

export const rulePreviewSchema = z.object({
  reports: z.array(rulePreviewItemSchema),
  /** How many reports ranked a confirmed cause higher, lower or the same with the change. */
  summary: z.object({ improved: z.number().int(), worsened: z.number().int(), unchanged: z.number().int() }),
});
export type RulePreview = z.infer<typeof rulePreviewSchema>;

/** One stored row: an override of a shipped rule, or a rule the workshop added. */
export type StoredWorkshopRule = {
  ruleId: string;
  origin: RuleOrigin;
  /** The added rule; null for an override. */
  rule: Rule | null;
  enabled: boolean | null;
  weight: number | null;
  updatedAt: string;
};

/**
 * The workshop's rule set: shipped rules with its overrides applied, then
 * its own rules, leaving out what is switched off. The array and every rule
 * in it are frozen, so the trade core may cache its validation by identity.
 */
export function buildRuleSet(defaults: readonly Rule[], stored: readonly StoredWorkshopRule[]): { rules: readonly Rule[]; listing: WorkshopRule[] } {
  const overrides = new Map(stored.filter((s) => s.origin === 'default').map((s) => [s.ruleId, s]));
  const listing: WorkshopRule[] = [];
  const rules: Rule[] = [];
  for (const rule of defaults) {
    const o = overrides.get(rule.id);
    const weight = o?.weight ?? rule.weight;
    const enabled = o?.enabled ?? true;
    const effective = weight === rule.weight ? rule : Object.freeze({ ...rule, weight });
    listing.push({
      rule: effective,
      origin: 'default',
      enabled,
      defaultWeight: rule.weight,
      overridden: Boolean(o && (o.enabled === false || (o.weight !== null && o.weight !== rule.weight))),
      updatedAt: o?.updatedAt ?? null,
    });
    if (enabled) rules.push(effective);
  }
  for (const s of stored) {
    if (s.origin !== 'workshop' || !s.rule) continue;
    const effective = Object.freeze({ ...s.rule, weight: s.weight ?? s.rule.weight });
    const enabled = s.enabled ?? true;
    listing.push({ rule: effective, origin: 'workshop', enabled, defaultWeight: null, overridden: false, updatedAt: s.updatedAt });
    if (enabled) rules.push(effective);
  }
  return { rules: Object.freeze(rules), listing };
}
