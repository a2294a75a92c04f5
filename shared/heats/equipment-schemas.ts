import { z } from 'zod';
import { MOLD_MATERIALS, findAlloy } from '../domain/index.ts';
import { CRUCIBLE_MATERIALS, CRUCIBLE_STATUSES } from './crucible-life.ts';

// Furnaces, crucibles and moulds: the workshop's equipment. Masses are grams
// and temperatures °C everywhere; the client converts for display.

export const FURNACE_KINDS = ['electric', 'gas', 'induction', 'other'] as const;
export type FurnaceKind = (typeof FURNACE_KINDS)[number];
export const FURNACE_KIND_LABELS: Record<FurnaceKind, string> = {
  electric: 'electric resistance',
  gas: 'gas',
  induction: 'induction',
  other: 'other',
};

/** A calendar day, YYYY-MM-DD. */
export const calendarDateSchema = z.iso.date('Use a date like 2026-12-01');

const nameSchema = z.string().trim().min(1, 'Give it a name').max(80, 'A name has at most 80 characters');
const notesSchema = z.string().trim().max(4000, 'Notes have at most 4000 characters');
/** Optional free text: empty strings are stored as null. */
const optionalText = (schema: z.ZodString) =>
  z
    .union([schema, z.null()])
    .optional()
    .transform((v) => (v === '' ? null : v));

/**
 * An alloy designation the library knows, stored in its canonical spelling
 * ("a356" → "A356.0") so filters and exports compare equal.
 */
export const alloyDesignationSchema = z
  .string()
  .trim()
  .min(1, 'Pick an alloy')
  .max(60)
  .transform((d, ctx) => {
    const alloy = findAlloy(d);
    if (!alloy) {
      ctx.addIssue({ code: 'custom', message: `"${d}" is not an alloy in the library` });
      return z.NEVER;
    }
    return alloy.designation;
  });

// ── params ──────────────────────────────────────────────────────────────────

/** The same check as require-member's, kept here so shared/heats needs only zod and the trade core. */
export const workshopIdParamsSchema = z.object({ workshopId: z.uuid('Unknown workshop') });

export const furnaceParamsSchema = workshopIdParamsSchema.extend({ furnaceId: z.uuid('Unknown furnace') });
export const crucibleParamsSchema = workshopIdParamsSchema.extend({ crucibleId: z.uuid('Unknown crucible') });
export const mouldParamsSchema = workshopIdParamsSchema.extend({ mouldId: z.uuid('Unknown mould') });

// ── furnaces ────────────────────────────────────────────────────────────────

export const furnaceCreateSchema = z.object({
  name: nameSchema,
  kind: z.enum(FURNACE_KINDS),
  notes: optionalText(notesSchema),
});
export type FurnaceCreateInput = z.output<typeof furnaceCreateSchema>;

export const furnaceUpdateSchema = z.object({
  name: nameSchema.optional(),
  kind: z.enum(FURNACE_KINDS).optional(),
  notes: optionalText(notesSchema),
});
export type FurnaceUpdateInput = z.output<typeof furnaceUpdateSchema>;

export const furnaceSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  kind: z.enum(FURNACE_KINDS),
  notes: z.string().nullable(),
  /** Heats logged on this furnace. */
  heatCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Furnace = z.infer<typeof furnaceSchema>;

// ── crucibles ───────────────────────────────────────────────────────────────

export const crucibleCreateSchema = z.object({
  name: nameSchema,
  material: z.enum(CRUCIBLE_MATERIALS),
  /** Grams of aluminium it holds. */
  capacityG: z.number().positive('Capacity must be above 0 g').max(1_000_000).nullable().optional(),
  inServiceSince: calendarDateSchema.nullable().optional(),
  retired: z.boolean().optional(),
  retiredOn: calendarDateSchema.nullable().optional(),
});
export type CrucibleCreateInput = z.output<typeof crucibleCreateSchema>;

export const crucibleUpdateSchema = crucibleCreateSchema.partial();
export type CrucibleUpdateInput = z.output<typeof crucibleUpdateSchema>;

export const crucibleNoteCreateSchema = z.object({
  note: z.string().trim().min(1, 'Write what you saw').max(2000),
  /** The day the condition was seen; today when left out. */
  notedOn: calendarDateSchema.optional(),
});
export type CrucibleNoteCreateInput = z.output<typeof crucibleNoteCreateSchema>;

export const crucibleNoteSchema = z.object({
  id: z.uuid(),
  notedOn: z.string(),
  note: z.string(),
  authorId: z.uuid().nullable(),
  authorName: z.string().nullable(),
  createdAt: z.string(),
});
export type CrucibleNote = z.infer<typeof crucibleNoteSchema>;

export const CRUCIBLE_SHOCKS = ['none', 'fast_heat_up', 'quenched'] as const;
export type CrucibleShock = (typeof CRUCIBLE_SHOCKS)[number];
export const CRUCIBLE_SHOCK_LABELS: Record<CrucibleShock, string> = {
  none: 'none',
  fast_heat_up: 'fast heat-up',
  quenched: 'quenched',
};

export const crucibleSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  material: z.enum(CRUCIBLE_MATERIALS),
  capacityG: z.number().nullable(),
  inServiceSince: z.string().nullable(),
  retired: z.boolean(),
  retiredOn: z.string().nullable(),
  /** Heats that used it: derived from the heat log, never stored. */
  cycleCount: z.number().int(),
  warnAt: z.number().int(),
  limitAt: z.number().int(),
  status: z.enum(CRUCIBLE_STATUSES),
  /** The newest heat logged as a fast heat-up or a quench of this crucible. */
  lastShock: z
    .object({ heatId: z.uuid(), kind: z.enum(CRUCIBLE_SHOCKS), pouredAt: z.string() })
    .nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Crucible = z.infer<typeof crucibleSchema>;

/** A crucible with its condition notes, newest first (GET /crucibles/:crucibleId). */
export const crucibleDetailSchema = crucibleSchema.extend({ notes: z.array(crucibleNoteSchema) });
export type CrucibleDetail = z.infer<typeof crucibleDetailSchema>;

export const crucibleLimitSchema = z
  .object({
    material: z.enum(CRUCIBLE_MATERIALS),
    warnAt: z.number().int().min(1).max(10_000),
    limitAt: z.number().int().min(1).max(10_000),
  })
  .refine((l) => l.warnAt <= l.limitAt, { message: 'Warn at or before the limit', path: ['warnAt'] });

/**
 * PUT /crucible-limits replaces the workshop's own limits: materials left out
 * go back to the defaults.
 */
export const crucibleLimitsUpdateSchema = z.object({
  limits: z
    .array(crucibleLimitSchema)
    .max(CRUCIBLE_MATERIALS.length)
    .refine((ls) => new Set(ls.map((l) => l.material)).size === ls.length, { message: 'Each material once' }),
});
export type CrucibleLimitsUpdateInput = z.output<typeof crucibleLimitsUpdateSchema>;

export const crucibleLimitRowSchema = z.object({
  material: z.enum(CRUCIBLE_MATERIALS),
  warnAt: z.number().int(),
  limitAt: z.number().int(),
  /** True when the workshop has not set its own figures for this material. */
  isDefault: z.boolean(),
});
export type CrucibleLimitRow = z.infer<typeof crucibleLimitRowSchema>;

// ── moulds ──────────────────────────────────────────────────────────────────

export const mouldCreateSchema = z.object({
  name: nameSchema,
  material: z.enum(MOLD_MATERIALS),
  /** What the casting cavity holds, in grams of `capacityAlloy` (gating and risers are the yield's business). */
  capacityG: z.number().positive('Capacity must be above 0 g').max(1_000_000).nullable().optional(),
  capacityAlloy: alloyDesignationSchema.nullable().optional(),
  hasRiser: z.boolean().optional(),
  coating: optionalText(z.string().trim().max(200)),
  notes: optionalText(notesSchema),
});
export type MouldCreateInput = z.output<typeof mouldCreateSchema>;

export const mouldUpdateSchema = mouldCreateSchema.partial();
export type MouldUpdateInput = z.output<typeof mouldUpdateSchema>;

export const mouldSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  material: z.enum(MOLD_MATERIALS),
  capacityG: z.number().nullable(),
  capacityAlloy: z.string().nullable(),
  hasRiser: z.boolean(),
  coating: z.string().nullable(),
  notes: z.string().nullable(),
  /** Castings poured in this mould. */
  castingCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Mould = z.infer<typeof mouldSchema>;
