import { z } from 'zod';
import { QUENCH_MEDIA, heatTreatmentStepSchema, sourceNoteSchema, temperSchema } from '../domain/index.ts';
import { alloyDesignationSchema, workshopIdParamsSchema } from '../heats/equipment-schemas.ts';
import { timestampSchema } from '../heats/heat-schemas.ts';

// A heat-treatment plan (the trade core's schedule for an alloy and temper,
// frozen when the plan is made) for one caster's castings, and the record of
// what the oven and the quench tank actually did, with hardness afterwards.
// Temperatures °C, durations min, quench delay s, instants ISO 8601 UTC.

export const HEAT_TREATMENT_STATES = ['planned', 'in_progress', 'done'] as const;
export type HeatTreatmentState = (typeof HEAT_TREATMENT_STATES)[number];
export const HEAT_TREATMENT_STATE_LABELS: Record<HeatTreatmentState, string> = {
  planned: 'Planned',
  in_progress: 'In progress',
  done: 'Done',
};

/** What the casting actually went into; "other" for anything the schedule vocabulary lacks. */
export const ACTUAL_QUENCH_MEDIA = [...QUENCH_MEDIA, 'other'] as const;
export type ActualQuenchMedium = (typeof ACTUAL_QUENCH_MEDIA)[number];

export const HARDNESS_SCALES = ['HB', 'HRB', 'HRE', 'HV', 'webster_b'] as const;
export type HardnessScale = (typeof HARDNESS_SCALES)[number];

/**
 * Each scale's label and the range a reading on it can take, to catch a
 * typo or a reading entered on the wrong scale. Bounds from memory of the
 * scales' ranges (Rockwell B/E dials read to about 100–130; the Webster B
 * pliers read 0–20), not re-checked.
 */
export const HARDNESS_SCALE_INFO: Record<HardnessScale, { label: string; min: number; max: number }> = {
  HB: { label: 'Brinell (HB)', min: 1, max: 700 },
  HRB: { label: 'Rockwell B (HRB)', min: 0, max: 130 },
  HRE: { label: 'Rockwell E (HRE)', min: 0, max: 130 },
  HV: { label: 'Vickers (HV)', min: 1, max: 2000 },
  webster_b: { label: 'Webster B', min: 0, max: 20 },
};

/** The most castings one plan holds: an oven load in a small shop. */
export const MAX_CASTINGS_PER_PLAN = 50;
/** The most steps a schedule has (the trade core's have at most three). */
export const MAX_STEPS = 10;

const text = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters`)
    .nullable()
    .optional()
    .transform((v) => (v ? v : null));

// ── params ──────────────────────────────────────────────────────────────────

export const heatTreatmentParamsSchema = workshopIdParamsSchema.extend({
  heatTreatmentId: z.uuid('Unknown heat-treatment plan'),
});
export const hardnessParamsSchema = heatTreatmentParamsSchema.extend({ readingId: z.uuid('Unknown hardness reading') });
export const heatTreatmentPhotoParamsSchema = heatTreatmentParamsSchema.extend({ photoId: z.uuid('Unknown photo') });

// ── the stored plan ─────────────────────────────────────────────────────────

/** heatTreatmentPlan()'s result as stored: the schedule is frozen when the plan is made. */
export const heatTreatmentPlanSchema = z.object({
  designation: z.string(),
  temper: temperSchema,
  description: z.string(),
  steps: z.array(heatTreatmentStepSchema).min(1),
  sources: z.array(sourceNoteSchema),
  inheritedFrom: z.string().optional(),
});
export type StoredHeatTreatmentPlan = z.infer<typeof heatTreatmentPlanSchema>;

// ── requests ────────────────────────────────────────────────────────────────

export const heatTreatmentCreateSchema = z.object({
  alloy: alloyDesignationSchema,
  temper: temperSchema,
  castingIds: z
    .array(z.uuid('Unknown casting'))
    .min(1, 'Pick at least one casting')
    .max(MAX_CASTINGS_PER_PLAN, `At most ${MAX_CASTINGS_PER_PLAN} castings in one plan`)
    .refine((ids) => new Set(ids).size === ids.length, 'Each casting once'),
  oven: z.string().trim().min(1, 'Name the oven or kiln').max(80, 'At most 80 characters'),
  notes: text(4000),
});
export type HeatTreatmentCreateInput = z.output<typeof heatTreatmentCreateSchema>;
export type HeatTreatmentCreateDraft = z.input<typeof heatTreatmentCreateSchema>;

export const heatTreatmentUpdateSchema = z
  .object({
    state: z.enum(HEAT_TREATMENT_STATES),
    oven: z.string().trim().min(1, 'Name the oven or kiln').max(80, 'At most 80 characters'),
    notes: text(4000),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type HeatTreatmentUpdateInput = z.output<typeof heatTreatmentUpdateSchema>;

/**
 * What happened in one step of the plan. `temperatureC` is the oven reading
 * for solution and ageing steps and the quench bath's temperature for a
 * quench. A field left out keeps its value; null clears it.
 */
export const stepActualInputSchema = z
  .object({
    stepIndex: z.number().int().min(0).max(MAX_STEPS - 1),
    startedAt: timestampSchema.nullable().optional(),
    endedAt: timestampSchema.nullable().optional(),
    temperatureC: z.number().min(-50, 'At least −50 °C').max(1000, 'At most 1000 °C').nullable().optional(),
    quenchMedium: z.enum(ACTUAL_QUENCH_MEDIA).nullable().optional(),
    quenchDelayS: z.number().min(0, 'Must not be negative').max(3600, 'At most an hour').nullable().optional(),
    notes: text(2000),
  })
  .superRefine((s, ctx) => {
    if (s.startedAt && s.endedAt && s.endedAt < s.startedAt) {
      ctx.addIssue({ code: 'custom', path: ['endedAt'], message: 'The step ends before it starts' });
    }
  });
export type StepActualInput = z.output<typeof stepActualInputSchema>;

export const stepsActualUpdateSchema = z.object({
  steps: z
    .array(stepActualInputSchema)
    .min(1, 'Record at least one step')
    .max(MAX_STEPS)
    .refine((steps) => new Set(steps.map((s) => s.stepIndex)).size === steps.length, 'Each step once'),
});
export type StepsActualUpdateInput = z.output<typeof stepsActualUpdateSchema>;

export const hardnessCreateSchema = z
  .object({
    scale: z.enum(HARDNESS_SCALES),
    value: z.number(),
    castingId: z.uuid('Unknown casting').nullable().optional(),
    locationNote: text(200),
    measuredAt: timestampSchema.optional(),
  })
  .superRefine((h, ctx) => {
    const { label, min, max } = HARDNESS_SCALE_INFO[h.scale];
    if (h.value < min || h.value > max) {
      ctx.addIssue({ code: 'custom', path: ['value'], message: `${label} reads ${min}–${max}` });
    }
  });
export type HardnessCreateInput = z.output<typeof hardnessCreateSchema>;

export const heatTreatmentPhotoCreateSchema = z.object({ photoId: z.uuid('Unknown photo') });

export const candidateQuerySchema = z.object({
  alloy: z.preprocess((v) => (v === '' ? undefined : v), alloyDesignationSchema.optional()),
});

// ── answers ─────────────────────────────────────────────────────────────────

export const stepActualSchema = z.object({
  stepIndex: z.number().int(),
  startedAt: z.string().nullable(),
  endedAt: z.string().nullable(),
  temperatureC: z.number().nullable(),
  quenchMedium: z.enum(ACTUAL_QUENCH_MEDIA).nullable(),
  quenchDelayS: z.number().nullable(),
  notes: z.string().nullable(),
});
export type StepActual = z.infer<typeof stepActualSchema>;

export const hardnessReadingSchema = z.object({
  id: z.uuid(),
  castingId: z.uuid().nullable(),
  scale: z.enum(HARDNESS_SCALES),
  value: z.number(),
  locationNote: z.string().nullable(),
  measuredAt: z.string(),
  createdBy: z.uuid().nullable(),
});
export type HardnessReading = z.infer<typeof hardnessReadingSchema>;

export const treatedCastingSchema = z.object({
  id: z.uuid(),
  heatId: z.uuid(),
  heatPouredAt: z.string(),
  heatAlloy: z.string(),
  /** 1-based position in its heat, as the casting page numbers it. */
  number: z.number().int(),
  massG: z.number().nullable(),
  mouldName: z.string().nullable(),
});
export type TreatedCasting = z.infer<typeof treatedCastingSchema>;

export const heatTreatmentSummarySchema = z.object({
  id: z.uuid(),
  casterId: z.uuid(),
  casterName: z.string(),
  createdBy: z.uuid().nullable(),
  alloy: z.string(),
  temper: temperSchema,
  oven: z.string(),
  state: z.enum(HEAT_TREATMENT_STATES),
  castingCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type HeatTreatmentSummary = z.infer<typeof heatTreatmentSummarySchema>;

export const DEVIATION_CODES = [
  'temperature_below_plan',
  'temperature_above_plan',
  'at_or_above_solidus',
  'duration_short',
  'duration_long',
  'quench_delay_over_max',
  'quench_medium_differs',
] as const;
export type DeviationCode = (typeof DEVIATION_CODES)[number];

export const STEP_KINDS = ['solution', 'quench', 'artificial_age', 'natural_age'] as const;
export type StepKind = (typeof STEP_KINDS)[number];

export const deviationSchema = z.object({
  stepIndex: z.number().int(),
  stepKind: z.enum(STEP_KINDS),
  code: z.enum(DEVIATION_CODES),
  /** danger: the part can be ruined or hurt someone (incipient melting); caution: properties may fall short. */
  level: z.enum(['danger', 'caution']),
  /** The recorded value: °C, min or s by code; the medium for quench_medium_differs. */
  actual: z.union([z.number(), z.string()]),
  /** What the plan allows: a range (°C or min), a maximum (s), a limit (°C) or the planned medium. */
  expected: z.object({ min: z.number().optional(), max: z.number().optional(), medium: z.string().optional() }),
  /** Tolerance applied around a single published temperature, °C. */
  toleranceC: z.number().optional(),
});
export type Deviation = z.infer<typeof deviationSchema>;

export const STEP_STATUSES = ['not_recorded', 'as_planned', 'deviates'] as const;
export type StepStatus = (typeof STEP_STATUSES)[number];
export const MISSING_FIELDS = ['times', 'temperature', 'quench_medium', 'quench_delay'] as const;
export type MissingField = (typeof MISSING_FIELDS)[number];

export const stepComparisonSchema = z.object({
  index: z.number().int(),
  kind: z.enum(STEP_KINDS),
  planned: heatTreatmentStepSchema,
  actual: stepActualSchema.nullable(),
  /** ended − started, minutes, when both are recorded. */
  durationMin: z.number().nullable(),
  status: z.enum(STEP_STATUSES),
  deviations: z.array(deviationSchema),
  /** Values the plan calls for that the record does not have yet. */
  missing: z.array(z.enum(MISSING_FIELDS)),
});
export type StepComparison = z.infer<typeof stepComparisonSchema>;

export const planComparisonSchema = z.object({
  steps: z.array(stepComparisonSchema),
  deviations: z.array(deviationSchema),
  worst: z.enum(['danger', 'caution']).nullable(),
});
export type PlanComparison = z.infer<typeof planComparisonSchema>;

export const heatTreatmentDetailSchema = heatTreatmentSummarySchema.extend({
  workshopId: z.uuid(),
  plan: heatTreatmentPlanSchema,
  notes: z.string().nullable(),
  castings: z.array(treatedCastingSchema),
  comparison: planComparisonSchema,
  hardness: z.array(hardnessReadingSchema),
  photos: z.array(z.object({ id: z.uuid(), castingId: z.uuid(), thumbUrl: z.string() })),
});
export type HeatTreatmentDetail = z.infer<typeof heatTreatmentDetailSchema>;

/** A casting the actor could put into a plan. */
export const candidateCastingSchema = treatedCastingSchema.extend({
  casterId: z.uuid(),
  casterName: z.string(),
  /** Plans that already hold it and are not done, so it is not treated twice by mistake. */
  openPlanIds: z.array(z.uuid()),
});
export type CandidateCasting = z.infer<typeof candidateCastingSchema>;

export const heatTreatmentListQuerySchema = z.object({
  state: z.preprocess((v) => (v === '' ? undefined : v), z.enum(HEAT_TREATMENT_STATES).optional()),
});
export type HeatTreatmentListQuery = z.output<typeof heatTreatmentListQuerySchema>;
