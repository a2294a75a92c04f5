import { z } from 'zod';
import {
  CAUTION_IDS,
  HEAT_CONDITION_LABELS,
  defectKindIdSchema,
  heatConditionsInputSchema,
  heatConditionsSchema,
  meltVariableIdSchema,
} from '../domain/index.ts';
import type { Cause, HeatConditionField, MeltVariableId } from '../domain/index.ts';
import { alloyDesignationSchema } from '../heats/equipment-schemas.ts';

// What the diagnosis routes take and give. Causes are the trade core's, passed
// through unchanged (evidence, fixes, sources, status, missing, prior); the
// response adds the input it was built from, which fields are not recorded,
// and which rule set ranked it.

export const severitySchema = z.union([z.literal(1), z.literal(2), z.literal(3)], { error: 'Severity is 1, 2 or 3' });

export const diagnosisDefectSchema = z.object({ kind: defectKindIdSchema, severity: severitySchema }).strict();

const heatConditionFieldSchema = heatConditionsSchema.keyof();

/** POST /diagnosis: a what-if. Unknown condition names are refused so a typo does not pass as "not recorded". */
export const diagnosisRequestSchema = z
  .object({
    alloy: alloyDesignationSchema.optional(),
    defects: z.array(diagnosisDefectSchema).max(40, 'At most 40 defects'),
    conditions: heatConditionsInputSchema.strict().default({}),
  })
  .strict();
export type DiagnosisRequest = z.output<typeof diagnosisRequestSchema>;

export const diagnosisInputSchema = z.object({
  /** The alloy's designation as the library spells it; null when none was given. */
  alloy: z.string().nullable(),
  defects: z.array(diagnosisDefectSchema),
  conditions: heatConditionsInputSchema,
});
export type DiagnosisInput = z.infer<typeof diagnosisInputSchema>;

export const causeSchema = z.object({
  variable: meltVariableIdSchema,
  score: z.number(),
  status: z.enum(['confirmed', 'suspected', 'normal']),
  confirmed: z.boolean(),
  evidence: z.array(z.string()),
  findings: z.array(
    z.object({
      ruleId: z.string(),
      defects: z.array(defectKindIdSchema),
      outcome: z.enum(['fired', 'normal', 'unknown']),
      text: z.string().optional(),
    }),
  ),
  fixes: z.array(z.string()),
  sources: z.array(z.string()),
  missing: z.array(heatConditionFieldSchema),
  missingAlloy: z.boolean(),
  prior: z.object({ confirmedCount: z.number().int(), resolvedCount: z.number().int(), explanation: z.string() }).optional(),
}) satisfies z.ZodType<Cause>;

export const diagnosisCautionSchema = z.object({
  id: z.enum(CAUTION_IDS),
  title: z.string(),
  text: z.string(),
  source: z.string(),
});

/** A HeatConditions field no cause could check, with the causes that wait on it. */
export const missingFieldSchema = z.object({
  field: heatConditionFieldSchema,
  label: z.string(),
  variables: z.array(meltVariableIdSchema),
});
export type MissingField = z.infer<typeof missingFieldSchema>;

export const ruleSetStampSchema = z.object({
  /** Changes whenever the workshop's effective rules change. */
  hash: z.string(),
  /** Whether the workshop has changed or added rules. */
  custom: z.boolean(),
});
export type RuleSetStamp = z.infer<typeof ruleSetStampSchema>;

export const diagnosisSchema = z.object({
  input: diagnosisInputSchema,
  causes: z.array(causeSchema),
  cautions: z.array(diagnosisCautionSchema),
  /** What the workshop's history contributed, in words; null when it had nothing for these defects. */
  priorsNote: z.string().nullable(),
  missing: z.array(missingFieldSchema),
  ruleSet: ruleSetStampSchema,
});
export type Diagnosis = z.infer<typeof diagnosisSchema>;

/** A diagnosis kept with a report at submit time. */
export const diagnosisSnapshotSchema = diagnosisSchema.extend({ diagnosedAt: z.string() });
export type DiagnosisSnapshot = z.infer<typeof diagnosisSnapshotSchema>;

/**
 * Every field some cause lists as missing, in form order, with the causes
 * waiting on it: the "not recorded" list a diagnosis screen shows.
 */
export function missingFieldsOf(causes: readonly Pick<Cause, 'variable' | 'missing'>[]): MissingField[] {
  const byField = new Map<HeatConditionField, MeltVariableId[]>();
  for (const cause of causes) {
    for (const field of cause.missing) {
      const list = byField.get(field) ?? [];
      if (!list.includes(cause.variable)) list.push(cause.variable);
      byField.set(field, list);
    }
  }
  const order = heatConditionFieldSchema.options;
  return [...byField.entries()]
    .sort(([a], [b]) => order.indexOf(a) - order.indexOf(b))
    .map(([field, variables]) => ({ field, label: HEAT_CONDITION_LABELS[field], variables }));
}

/** The ranking as a comparable key: which variables, in which order, with which status. */
export function rankingKey(causes: readonly Pick<Cause, 'variable' | 'status'>[]): string {
  return causes.map((c) => `${c.variable}:${c.status}`).join('|');
}

// ── quick check ─────────────────────────────────────────────────────────────

export const quickCheckCreateSchema = z
  .object({
    /** The caster's last heat's alloy when left out. */
    alloy: alloyDesignationSchema.optional(),
    title: z.string().trim().max(120, 'At most 120 characters').optional(),
  })
  .strict();
export type QuickCheckCreateInput = z.output<typeof quickCheckCreateSchema>;

export const quickCheckSchema = z.object({ heatId: z.uuid(), castingId: z.uuid() });
export type QuickCheck = z.infer<typeof quickCheckSchema>;

/** `?kinds=gas_porosity,rounded_edges` or `?kinds=gas_porosity&kinds=rounded_edges`. */
export const quickCheckQuestionsQuerySchema = z.object({
  kinds: z.preprocess(
    (v) => (typeof v === 'string' ? v.split(',').map((s) => s.trim()).filter(Boolean) : v),
    z.array(defectKindIdSchema).min(1, 'Name at least one defect kind').max(10, 'At most 10 defect kinds'),
  ),
});

export const quickCheckQuestionSchema = z.object({
  /** The HeatConditions fields this question fills in (dew point needs two). */
  fields: z.array(heatConditionFieldSchema),
  label: z.string(),
  /** Summed weight of the rules that read these fields for the defects asked about. */
  weight: z.number(),
  variables: z.array(meltVariableIdSchema),
});
export type QuickCheckQuestion = z.infer<typeof quickCheckQuestionSchema>;

export const quickCheckQuestionsSchema = z.object({
  kinds: z.array(defectKindIdSchema),
  questions: z.array(quickCheckQuestionSchema),
  /** Every field of the questions, in their order. */
  fields: z.array(heatConditionFieldSchema),
});
export type QuickCheckQuestions = z.infer<typeof quickCheckQuestionsSchema>;
