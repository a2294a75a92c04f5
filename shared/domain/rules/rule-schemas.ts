import { z } from 'zod';
import { defectKindIdSchema } from '../defect-kinds.ts';
import { meltVariableIdSchema } from '../melt-variables.ts';
import { FIELD_SPECS, TEMPLATE_EXTRAS, conditionFieldSchema } from './condition-fields.ts';
import type { ConditionField } from './condition-fields.ts';

// Rules are plain JSON so a workshop can store, edit and tune its own: no
// formula strings, no code. A condition compares one field with a value, and
// conditions combine with all / any / not.

/** Alloy properties a threshold may refer to; pour limits follow the mould material. */
export const ALLOY_THRESHOLD_PROPERTIES = ['liquidus', 'solidus', 'pourMin', 'pourMax'] as const;
export type AlloyThresholdProperty = (typeof ALLOY_THRESHOLD_PROPERTIES)[number];

export const alloyThresholdSchema = z
  .object({ alloy: z.enum(ALLOY_THRESHOLD_PROPERTIES), offset: z.number().optional() })
  .strict();
export type AlloyThreshold = z.infer<typeof alloyThresholdSchema>;

export const COMPARISON_OPS = ['gt', 'gte', 'lt', 'lte', 'eq', 'neq', 'in', 'notIn', 'has'] as const;
export type ComparisonOp = (typeof COMPARISON_OPS)[number];

const NUMBER_OPS: readonly ComparisonOp[] = ['gt', 'gte', 'lt', 'lte', 'eq', 'neq'];

export const comparisonSchema = z
  .object({
    field: conditionFieldSchema,
    op: z.enum(COMPARISON_OPS),
    value: z.union([z.number(), z.boolean(), z.string(), z.array(z.string()).min(1), alloyThresholdSchema]),
  })
  .strict()
  .superRefine((c, ctx) => {
    const problem = comparisonProblem(c.field, c.op, c.value);
    if (problem) ctx.addIssue({ code: 'custom', message: `${c.field} ${c.op}: ${problem}` });
  });

export type Comparison = z.infer<typeof comparisonSchema>;

export type Condition = Comparison | { all: Condition[] } | { any: Condition[] } | { not: Condition };

export const conditionSchema: z.ZodType<Condition> = z.lazy(() =>
  z.union([
    comparisonSchema,
    z.object({ all: z.array(conditionSchema).min(1) }).strict(),
    z.object({ any: z.array(conditionSchema).min(1) }).strict(),
    z.object({ not: conditionSchema }).strict(),
  ]),
);

// Why a comparison cannot work, or undefined when it can.
function comparisonProblem(field: ConditionField, op: ComparisonOp, value: Comparison['value']): string | undefined {
  const spec = FIELD_SPECS[field];
  const isThreshold = typeof value === 'object' && !Array.isArray(value);
  switch (spec.kind) {
    case 'number':
      if (!NUMBER_OPS.includes(op)) return 'numeric fields take gt, gte, lt, lte, eq or neq';
      if (typeof value === 'number') return Number.isFinite(value) ? undefined : 'value must be finite';
      if (isThreshold) return spec.unit === 'C' ? undefined : 'only temperature fields may compare with an alloy property';
      return 'value must be a number or an alloy property';
    case 'boolean':
      return (op === 'eq' || op === 'neq') && typeof value === 'boolean' ? undefined : 'yes/no fields take eq or neq with true or false';
    case 'enum': {
      const values = Array.isArray(value) ? value : typeof value === 'string' ? [value] : undefined;
      if (!values) return 'value must be one of the options or a list of them';
      if ((op === 'eq' || op === 'neq') !== (typeof value === 'string') || !['eq', 'neq', 'in', 'notIn'].includes(op)) {
        return 'use eq/neq with one option, in/notIn with a list';
      }
      const unknown = values.filter((v) => !spec.options.includes(v));
      return unknown.length ? `unknown option ${unknown.join(', ')}` : undefined;
    }
    case 'set': {
      const values = Array.isArray(value) ? value : typeof value === 'string' ? [value] : undefined;
      if (op !== 'has' || !values) return 'trait fields take has with one trait or a list (any of them)';
      const unknown = values.filter((v) => !spec.options.includes(v));
      return unknown.length ? `unknown option ${unknown.join(', ')}` : undefined;
    }
  }
}

const PLACEHOLDER = /\{([A-Za-z]+)\}/g;
const KNOWN_PLACEHOLDERS: ReadonlySet<string> = new Set([...Object.keys(FIELD_SPECS), ...TEMPLATE_EXTRAS]);

/**
 * An evidence sentence with `{placeholders}` for recorded values ({pourTempC}),
 * derived values ({superheatC}, {dewPointC}) and the comparison that decided
 * the rule ({threshold}, {excess}), plus {alloy}, {mouldKind} and {range}.
 */
export const evidenceTemplateSchema = z
  .string()
  .min(3)
  .max(400)
  .superRefine((text, ctx) => {
    for (const [, name] of text.matchAll(PLACEHOLDER)) {
      if (!KNOWN_PLACEHOLDERS.has(name)) ctx.addIssue({ code: 'custom', message: `unknown placeholder {${name}}` });
    }
  });

export const ruleSchema = z
  .object({
    id: z
      .string()
      .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'rule ids are kebab-case')
      .max(80),
    /** Defect kinds this rule can explain. */
    defects: z.array(defectKindIdSchema).min(1),
    /**
     * Scope: when this is false the rule does not apply (a metal-mould rule on a
     * sand mould). When it cannot be decided, the rule still counts as a suspect.
     */
    appliesWhen: conditionSchema.optional(),
    /** The abnormal value that implicates the variable. */
    when: conditionSchema,
    variable: meltVariableIdSchema,
    /** How strongly a firing rule implicates the variable, 0..1 (a ranking heuristic). */
    weight: z.number().min(0).max(1),
    /** Sentence shown when the rule fires. */
    evidence: evidenceTemplateSchema,
    /** Sentence shown when the recorded value is normal. */
    normalEvidence: evidenceTemplateSchema.optional(),
    fixes: z.array(z.string().min(3).max(300)).min(1),
    source: z.string().min(3).max(600),
  })
  .strict();

export type Rule = z.infer<typeof ruleSchema>;

export const ruleSetSchema = z.array(ruleSchema).superRefine((rules, ctx) => {
  const seen = new Set<string>();
  for (const rule of rules) {
    if (seen.has(rule.id)) ctx.addIssue({ code: 'custom', message: `duplicate rule id ${rule.id}` });
    seen.add(rule.id);
  }
});
