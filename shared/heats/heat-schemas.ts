import { z } from 'zod';
import {
  CAUTION_IDS,
  CHARGE_KINDS,
  DomainInputError,
  FLUX_KINDS,
  HUMIDITY_RISK_LEVELS,
  MOLD_MATERIALS,
  defectKindIdSchema,
  heatConditionsInputSchema,
  heatConditionsSchema,
  pourYield,
} from '../domain/index.ts';
import { CRUCIBLE_MATERIALS, CRUCIBLE_STATUSES } from './crucible-life.ts';
import {
  CRUCIBLE_SHOCKS,
  FURNACE_KINDS,
  alloyDesignationSchema,
  calendarDateSchema,
  workshopIdParamsSchema,
} from './equipment-schemas.ts';

// One heat (one melt), its charge lines and its castings (one pour each).
// Temperatures are °C, masses g, times ISO 8601 in UTC.

export const DEGASSING_METHODS = ['none', 'argon_lance', 'nitrogen_lance', 'rotary', 'tablet', 'other'] as const;
export type DegassingMethod = (typeof DEGASSING_METHODS)[number];
export const DEGASSING_LABELS: Record<DegassingMethod, string> = {
  none: 'none',
  argon_lance: 'argon lance',
  nitrogen_lance: 'nitrogen lance',
  rotary: 'rotary degasser',
  tablet: 'degassing tablet',
  other: 'other',
};

/** A flux from the trade core's list, or none at all. */
export const HEAT_FLUX_KINDS = ['none', ...FLUX_KINDS] as const;
export type HeatFluxKind = (typeof HEAT_FLUX_KINDS)[number];

export const QUENCH_MEDIA = ['none', 'water', 'other'] as const;
export type QuenchMedium = (typeof QUENCH_MEDIA)[number];

/** The three ticks of the pre-pour checklist. */
export const SAFETY_CHECKS = ['dryTools', 'ppe', 'clearFloor'] as const;
export type SafetyCheck = (typeof SAFETY_CHECKS)[number];
export const SAFETY_CHECK_LABELS: Record<SafetyCheck, string> = {
  dryTools: 'tools dry',
  ppe: 'protective equipment on',
  clearFloor: 'floor clear',
};

/** Longest plausible hold; beyond it the times are a typo (the trade core's hold-time bound). */
export const MAX_HOLD_MIN = heatConditionsSchema.shape.holdTimeMin.maxValue ?? 1440;

/** An instant with its offset, normalised to UTC ("2026-11-28T18:30:00.000Z"). */
export const timestampSchema = z.iso
  .datetime({ offset: true, error: 'Use a date and time with its offset, e.g. 2026-11-28T18:30:00Z' })
  .transform((v) => new Date(v).toISOString());

const gramsSchema = z.number().positive('Must be above 0 g').max(1_000_000, 'At most 1000 kg');
const gramsOrZeroSchema = z.number().min(0, 'Must not be negative').max(1_000_000, 'At most 1000 kg');
const textSchema = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters`)
    .nullable()
    .optional()
    .transform((v) => (v ? v : null));
/** Temperatures share the trade core's bounds, so a logged heat always maps onto HeatConditions. */
const c = heatConditionsSchema.shape;

export const heatParamsSchema = workshopIdParamsSchema.extend({ heatId: z.uuid('Unknown heat') });
export const castingParamsSchema = workshopIdParamsSchema.extend({ castingId: z.uuid('Unknown casting') });

export const chargeLineInputSchema = z.object({
  kind: z.enum(CHARGE_KINDS),
  /** What it was, e.g. "wheel offcuts". */
  description: textSchema(200),
  massG: gramsSchema,
});
export type ChargeLineInput = z.output<typeof chargeLineInputSchema>;

const castingShape = {
  mouldId: z.uuid('Unknown mould').nullable().optional(),
  mouldPreheatC: c.moldTempC.nullable().optional(),
  coated: z.boolean().nullable().optional(),
  vented: z.boolean().nullable().optional(),
  pourHeightCm: c.pourHeightCm.nullable().optional(),
  sectionThicknessMm: c.sectionThicknessMm.nullable().optional(),
  /** The casting as weighed; leave empty until it is. */
  massG: gramsSchema.nullable().optional(),
  /** Minutes in air before the quench. */
  airCoolMin: c.quenchDelayMin.nullable().optional(),
  quenchMedium: z.enum(QUENCH_MEDIA).optional(),
  notes: textSchema(4000),
};

export const castingCreateSchema = z.object({ ...castingShape, quenchMedium: z.enum(QUENCH_MEDIA).default('none') });
export type CastingCreateInput = z.output<typeof castingCreateSchema>;
export const castingUpdateSchema = z.object(castingShape);
export type CastingUpdateInput = z.output<typeof castingUpdateSchema>;

const safetyShape = { dryTools: z.boolean(), ppe: z.boolean(), clearFloor: z.boolean() };

// Fields without defaults: PATCH must leave out what it does not change
// (zod applies defaults inside .partial(), so the create schema adds its own).
const heatShape = {
  /** Whose heat it is; the actor when left out. Only admins log for others. */
  casterId: z.uuid('Unknown member').optional(),
  meltStartedAt: timestampSchema.nullable().optional(),
  pouredAt: timestampSchema,
  alloy: alloyDesignationSchema,
  chargeLines: z.array(chargeLineInputSchema).min(1, 'Add at least one charge line').max(50),
  furnaceId: z.uuid('Unknown furnace').nullable().optional(),
  crucibleId: z.uuid('Unknown crucible').nullable().optional(),
  setpointC: z.number().min(0).max(1800).nullable().optional(),
  peakTempC: c.peakTempC.nullable().optional(),
  pourTempC: c.pourTempC.nullable().optional(),
  fluxKind: z.enum(HEAT_FLUX_KINDS),
  fluxAmountG: gramsOrZeroSchema.nullable().optional(),
  degassing: z.enum(DEGASSING_METHODS),
  skimmed: z.boolean().nullable().optional(),
  toolsPreheated: z.boolean().nullable().optional(),
  ambientTempC: c.ambientTempC.nullable().optional(),
  relativeHumidityPct: c.relativeHumidityPct.nullable().optional(),
  /** Metal left in the crucible after the last pour, g. */
  crucibleRemainderG: gramsOrZeroSchema.nullable().optional(),
  notes: textSchema(4000),
  crucibleShock: z.enum(CRUCIBLE_SHOCKS),
};

export type HeatConsistencyInput = {
  meltStartedAt?: string | null;
  pouredAt: string;
  chargeLines: readonly { massG: number }[];
  castings: readonly { massG?: number | null }[];
};

/**
 * Checks across fields, shared by the create schema and by the server after
 * it merges a PATCH: times in order, and castings that do not outweigh the
 * metal charged (the trade core's pourYield refuses that).
 */
export function heatConsistencyIssues(h: HeatConsistencyInput): { path: (string | number)[]; message: string }[] {
  const issues: { path: (string | number)[]; message: string }[] = [];
  if (h.meltStartedAt) {
    const holdMin = (Date.parse(h.pouredAt) - Date.parse(h.meltStartedAt)) / 60_000;
    if (holdMin < 0) issues.push({ path: ['meltStartedAt'], message: 'The melt must start before the pour' });
    else if (holdMin > MAX_HOLD_MIN) issues.push({ path: ['meltStartedAt'], message: 'The melt started more than a day before the pour' });
  }
  const chargeG = h.chargeLines.reduce((sum, l) => sum + l.massG, 0);
  const castingG = h.castings.reduce((sum, k) => sum + (k.massG ?? 0), 0);
  if (chargeG > 0) {
    try {
      pourYield({ chargeG, castingG });
    } catch (error) {
      if (!(error instanceof DomainInputError)) throw error;
      issues.push({ path: ['castings'], message: 'The castings weigh more than the metal charged' });
    }
  }
  return issues;
}

export const heatCreateSchema = z
  .object({
    ...heatShape,
    fluxKind: heatShape.fluxKind.default('none'),
    degassing: heatShape.degassing.default('none'),
    crucibleShock: heatShape.crucibleShock.default('none'),
    safety: z
      .object({
        dryTools: safetyShape.dryTools.default(false),
        ppe: safetyShape.ppe.default(false),
        clearFloor: safetyShape.clearFloor.default(false),
      })
      .default({ dryTools: false, ppe: false, clearFloor: false }),
    castings: z.array(castingCreateSchema).max(50).default([]),
  })
  .superRefine((h, ctx) => {
    for (const issue of heatConsistencyIssues(h)) ctx.addIssue({ code: 'custom', ...issue });
  });
export type HeatCreateInput = z.output<typeof heatCreateSchema>;
/** What a form or an import hands in, before defaults. */
export type HeatCreateDraft = z.input<typeof heatCreateSchema>;

/** PATCH /heats/:heatId: any field; `chargeLines` replaces every line when given. */
export const heatUpdateSchema = z.object({ ...heatShape, safety: z.object(safetyShape).partial() }).partial();
export type HeatUpdateInput = z.output<typeof heatUpdateSchema>;

// ── list, export ────────────────────────────────────────────────────────────

export const HEAT_SORTS = ['pouredAt', 'meltStartedAt', 'pourTempC', 'yieldPct'] as const;
export type HeatSort = (typeof HEAT_SORTS)[number];
export const SORT_DIRECTIONS = ['asc', 'desc'] as const;
export type SortDirection = (typeof SORT_DIRECTIONS)[number];
export const HEAT_PAGE_MAX = 100;

/** A day (the whole UTC day) or an exact instant. */
const dayOrInstantSchema = z.union([calendarDateSchema, timestampSchema]);

export const heatFilterSchema = z.object({
  alloy: alloyDesignationSchema.optional(),
  casterId: z.uuid('Unknown member').optional(),
  furnaceId: z.uuid('Unknown furnace').optional(),
  crucibleId: z.uuid('Unknown crucible').optional(),
  /** Poured on or after this day or instant. */
  from: dayOrInstantSchema.optional(),
  /** Poured on or before this day (inclusive) or before this instant. */
  to: dayOrInstantSchema.optional(),
  /** Heats with a casting whose photos carry a mark of this defect kind. */
  defect: defectKindIdSchema.optional(),
  sort: z.enum(HEAT_SORTS).default('pouredAt'),
  dir: z.enum(SORT_DIRECTIONS).default('desc'),
});
export type HeatFilter = z.output<typeof heatFilterSchema>;

export const heatListQuerySchema = heatFilterSchema.extend({
  limit: z.coerce.number().int().min(1).max(HEAT_PAGE_MAX, `At most ${HEAT_PAGE_MAX} a page`).default(25),
  /** Opaque: the `nextCursor` of the previous page, with the same sort. */
  cursor: z.string().max(500).optional(),
});
export type HeatListQuery = z.output<typeof heatListQuerySchema>;

// ── responses ───────────────────────────────────────────────────────────────

/** Cautions only the heat log can raise; the rest are the trade core's cautionsFor. */
export const HEAT_LOG_CAUTION_IDS = ['crucible_shock', 'safety_checklist_incomplete'] as const;
export const HEAT_CAUTION_IDS = [...HEAT_LOG_CAUTION_IDS, ...CAUTION_IDS] as const;

/** The trade core's Caution shape, with the heat log's own ids added. */
export const cautionSchema = z.object({
  id: z.enum(HEAT_CAUTION_IDS),
  title: z.string(),
  text: z.string(),
  source: z.string(),
});
export type HeatCaution = z.infer<typeof cautionSchema>;
export type HeatCautionId = HeatCaution['id'];

export const heatFiguresSchema = z.object({
  chargeG: z.number(),
  /** Sum of the weighed castings; null while any casting is unweighed or there is none. */
  castingsG: z.number().nullable(),
  /** pourYield of castings over charge; null when castingsG is. */
  yieldPct: z.number().nullable(),
  /** Charge minus castings: gating, risers and what stayed in the crucible. */
  remainderG: z.number().nullable(),
  superheatC: z.number().nullable(),
  liquidusC: z.number().nullable(),
  holdTimeMin: z.number().nullable(),
  dewPointC: z.number().nullable(),
  humidityRisk: z.enum(HUMIDITY_RISK_LEVELS).nullable(),
  /** Aluminium-family alloys only: liquid solubility at the pour beside that at the melting point. */
  hydrogen: z
    .object({
      atPourMlPer100g: z.number(),
      atMeltingPointMlPer100g: z.number(),
      meltingPointC: z.number(),
      /** How many times more hydrogen the melt can hold at the pour than just above melting. */
      ratio: z.number(),
    })
    .nullable(),
  /** The crucible's heat number at this heat, this one included. */
  crucibleCycle: z.number().int().nullable(),
});
export type HeatFigures = z.infer<typeof heatFiguresSchema>;

export const chargeLineSchema = z.object({
  kind: z.enum(CHARGE_KINDS),
  description: z.string().nullable(),
  massG: z.number(),
});
export type ChargeLine = z.infer<typeof chargeLineSchema>;

export const mouldSummarySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  material: z.enum(MOLD_MATERIALS),
  hasRiser: z.boolean(),
});
export type MouldSummary = z.infer<typeof mouldSummarySchema>;

export const castingSchema = z.object({
  id: z.uuid(),
  heatId: z.uuid(),
  mouldId: z.uuid().nullable(),
  mould: mouldSummarySchema.nullable(),
  mouldPreheatC: z.number().nullable(),
  coated: z.boolean().nullable(),
  vented: z.boolean().nullable(),
  pourHeightCm: z.number().nullable(),
  sectionThicknessMm: z.number().nullable(),
  massG: z.number().nullable(),
  airCoolMin: z.number().nullable(),
  quenchMedium: z.enum(QUENCH_MEDIA),
  notes: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  /** This casting's share of the charge (pourYield of its mass over the charge). */
  yieldPct: z.number().nullable(),
  /** The heat and this pour as the trade core's HeatConditions. */
  conditions: heatConditionsInputSchema,
});
export type Casting = z.infer<typeof castingSchema>;

export const heatDetailSchema = z.object({
  id: z.uuid(),
  workshopId: z.uuid(),
  casterId: z.uuid(),
  casterName: z.string(),
  meltStartedAt: z.string().nullable(),
  pouredAt: z.string(),
  alloy: z.string(),
  workshopAlloyId: z.uuid().nullable(),
  chargeLines: z.array(chargeLineSchema),
  furnaceId: z.uuid().nullable(),
  furnace: z.object({ id: z.uuid(), name: z.string(), kind: z.enum(FURNACE_KINDS) }).nullable(),
  crucibleId: z.uuid().nullable(),
  crucible: z
    .object({
      id: z.uuid(),
      name: z.string(),
      material: z.enum(CRUCIBLE_MATERIALS),
      cycleCount: z.number().int(),
      warnAt: z.number().int(),
      limitAt: z.number().int(),
      status: z.enum(CRUCIBLE_STATUSES),
    })
    .nullable(),
  setpointC: z.number().nullable(),
  peakTempC: z.number().nullable(),
  pourTempC: z.number().nullable(),
  fluxKind: z.enum(HEAT_FLUX_KINDS),
  fluxAmountG: z.number().nullable(),
  degassing: z.enum(DEGASSING_METHODS),
  skimmed: z.boolean().nullable(),
  toolsPreheated: z.boolean().nullable(),
  ambientTempC: z.number().nullable(),
  relativeHumidityPct: z.number().nullable(),
  crucibleRemainderG: z.number().nullable(),
  notes: z.string().nullable(),
  safety: z.object(safetyShape),
  crucibleShock: z.enum(CRUCIBLE_SHOCKS),
  castings: z.array(castingSchema),
  createdAt: z.string(),
  updatedAt: z.string(),
  figures: heatFiguresSchema,
  cautions: z.array(cautionSchema),
  /** The heat alone (no pour-specific fields) as HeatConditions; each casting carries its own. */
  conditions: heatConditionsInputSchema,
});
export type HeatDetail = z.infer<typeof heatDetailSchema>;

/** One row of GET /heats: the heat without its lines and castings, and the headline figures. */
export const heatRowSchema = z.object({
  id: z.uuid(),
  casterId: z.uuid(),
  casterName: z.string(),
  meltStartedAt: z.string().nullable(),
  pouredAt: z.string(),
  alloy: z.string(),
  furnaceId: z.uuid().nullable(),
  furnaceName: z.string().nullable(),
  crucibleId: z.uuid().nullable(),
  crucibleName: z.string().nullable(),
  setpointC: z.number().nullable(),
  pourTempC: z.number().nullable(),
  castingCount: z.number().int(),
  figures: heatFiguresSchema.pick({
    chargeG: true,
    castingsG: true,
    yieldPct: true,
    remainderG: true,
    superheatC: true,
    holdTimeMin: true,
  }),
  /** Cautions of the heat as a whole; pour-specific ones (cold mould, early quench) are on the heat read. */
  cautionIds: z.array(cautionSchema.shape.id),
});
export type HeatRow = z.infer<typeof heatRowSchema>;

export const heatPageSchema = z.object({ items: z.array(heatRowSchema), nextCursor: z.string().nullable() });
export type HeatPage = z.infer<typeof heatPageSchema>;

/** GET /heats/last-defaults: what the caster used last, to start a new heat form from. */
export const heatDefaultsQuerySchema = z.object({ casterId: z.uuid('Unknown member').optional() });
export const heatDefaultsSchema = z.object({
  basedOnHeatId: z.uuid().nullable(),
  alloy: z.string().nullable(),
  furnaceId: z.uuid().nullable(),
  /** Left empty when the last crucible has been retired since. */
  crucibleId: z.uuid().nullable(),
  setpointC: z.number().nullable(),
  fluxKind: z.enum(HEAT_FLUX_KINDS).nullable(),
  fluxAmountG: z.number().nullable(),
  degassing: z.enum(DEGASSING_METHODS).nullable(),
  mouldId: z.uuid().nullable(),
});
export type HeatDefaults = z.infer<typeof heatDefaultsSchema>;

// ── furnace setpoint and charge plan ────────────────────────────────────────

/** How many of a furnace's newest heats teach its setpoint offset. */
export const SETPOINT_HISTORY_HEATS = 30;

export const setpointQuerySchema = z.object({
  targetC: z.coerce.number().min(0).max(1800),
});
export const setpointAdviceSchema = z.object({
  furnaceId: z.uuid(),
  targetC: z.number(),
  setpointC: z.number(),
  offsetC: z.number(),
  spreadC: z.number(),
  samples: z.number().int(),
  basis: z.enum(['history', 'no-history']),
});
export type SetpointAdvice = z.infer<typeof setpointAdviceSchema>;

/** How many of a caster's newest heats with castings set their usual yield. */
export const CHARGE_PLAN_HISTORY_HEATS = 20;
/**
 * Used when the caster has no weighed castings yet: a middling figure for small
 * gravity castings with their gating and risers (from memory, not checked).
 */
export const DEFAULT_EXPECTED_YIELD_PCT = 50;
export const DEFAULT_CHARGE_MARGIN_PCT = 10;

export const chargePlanQuerySchema = z.object({
  casterId: z.uuid('Unknown member').optional(),
  /** The alloy to pour; the mould's capacity alloy when left out. */
  alloy: alloyDesignationSchema.optional(),
  marginPct: z.coerce.number().min(0).max(100).default(DEFAULT_CHARGE_MARGIN_PCT),
});
export type ChargePlanQuery = z.output<typeof chargePlanQuerySchema>;

export const chargePlanSchema = z.object({
  mouldId: z.uuid(),
  casterId: z.uuid(),
  alloy: z.string().nullable(),
  /** The cavity's metal in `alloy`, g. */
  castingG: z.number(),
  expectedYieldPct: z.number(),
  marginPct: z.number(),
  /** Weigh out this much. */
  chargeG: z.number(),
  basis: z.enum(['caster-median', 'default']),
  /** Heats the caster's median was taken over (0 with the default). */
  samples: z.number().int(),
});
export type ChargePlan = z.infer<typeof chargePlanSchema>;
