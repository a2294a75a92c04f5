import { z } from 'zod';
import { DEFECT_GROUP_IDS, defectKindIdSchema } from '../domain/index.ts';
import { CRUCIBLE_MATERIALS } from '../heats/crucible-life.ts';
import { FURNACE_KINDS, alloyDesignationSchema, calendarDateSchema, workshopIdParamsSchema } from '../heats/equipment-schemas.ts';

// Insights read the heat log, the castings and the marks on their photos.
// Every figure is scoped to the heats the asker may read, and every time axis
// is the heat's pouring time in UTC, the same axis as the heat log's from/to
// filters, so a bar's "open these heats" link shows exactly the heats counted.

export const INSIGHT_NAMES = [
  'defect-frequency',
  'defect-rate-by-pour-band',
  'defect-rate-by-mould-preheat-band',
  'yield-trend',
  'crucible-cycles',
  'furnace-offset',
] as const;
export type InsightName = (typeof INSIGHT_NAMES)[number];

/** Width of a pour-temperature band, °C (20 °C keeps a shop's usual 680–760 °C window to four or five bars). */
export const POUR_BAND_WIDTH_C = 20;
/** Width of a mould-preheat band, °C (preheats spread wider, from cold to ~400 °C for metal moulds). */
export const MOULD_PREHEAT_BAND_WIDTH_C = 50;

/** A URL field left empty (`?alloy=`) means "no filter", not a mistake. */
const optional = <T extends z.ZodType>(schema: T) =>
  z.preprocess((v) => (v === '' || v === null ? undefined : v), schema.optional());

const filterShape = {
  /** Poured on or after this day (UTC). */
  from: optional(calendarDateSchema),
  /** Poured on or before this day (UTC, inclusive). */
  to: optional(calendarDateSchema),
  casterId: optional(z.uuid('Unknown member')),
  alloy: optional(alloyDesignationSchema),
};

function datesInOrder(v: { from?: string; to?: string }, ctx: z.RefinementCtx) {
  if (v.from && v.to && v.from > v.to) {
    ctx.addIssue({ code: 'custom', path: ['to'], message: 'The end date comes before the start date' });
  }
}

/** The filters every insight takes: date range, caster, alloy. */
export const insightFilterSchema = z.object(filterShape).superRefine(datesInOrder);
export type InsightFilter = z.output<typeof insightFilterSchema>;

/** Defect rate by pour band: one alloy (pouring ranges differ by alloy), optionally one defect kind. */
export const pourBandQuerySchema = z
  .object({ ...filterShape, alloy: alloyDesignationSchema, kind: optional(defectKindIdSchema) })
  .superRefine(datesInOrder);
export type PourBandQuery = z.output<typeof pourBandQuerySchema>;

export const mouldPreheatBandQuerySchema = z
  .object({ ...filterShape, kind: optional(defectKindIdSchema) })
  .superRefine(datesInOrder);
export type MouldPreheatBandQuery = z.output<typeof mouldPreheatBandQuerySchema>;

export const insightParamsSchema = workshopIdParamsSchema;

// ── answers ─────────────────────────────────────────────────────────────────

const count = z.number().int().nonnegative();
/** A calendar month, "2026-11". */
export const monthSchema = z.string().regex(/^\d{4}-\d{2}$/);

export const defectFrequencySchema = z.object({
  months: z.array(
    z.object({
      month: monthSchema,
      /** Castings poured that month (in scope), marked or not. */
      castings: count,
      kinds: z.array(z.object({ kind: defectKindIdSchema, castings: count, marks: count })),
    }),
  ),
  /** Kinds that occur, most marks first. */
  kinds: z.array(defectKindIdSchema),
});
export type DefectFrequency = z.infer<typeof defectFrequencySchema>;

export const rateKeySchema = z.union([z.enum(DEFECT_GROUP_IDS), defectKindIdSchema]);
export type RateKey = z.infer<typeof rateKeySchema>;

export const bandSchema = z.object({
  /** The band is [fromC, toC). */
  fromC: z.number(),
  toC: z.number(),
  heats: count,
  castings: count,
  rates: z.array(
    z.object({
      key: rateKeySchema,
      /** Castings in the band with at least one mark of the group or kind. */
      castings: count,
      /** castings / band castings, 0–1. */
      share: z.number().min(0).max(1),
    }),
  ),
});
export type Band = z.infer<typeof bandSchema>;

export const defectRateByBandSchema = z.object({
  alloy: z.string().nullable(),
  bandWidthC: z.number().positive(),
  /** "group": one rate per defect group; "kind": one rate, for the chosen kind. */
  by: z.enum(['group', 'kind']),
  keys: z.array(rateKeySchema),
  bands: z.array(bandSchema),
  /** Castings in scope left out because the banded value was not recorded. */
  unrecorded: z.object({ castings: count }),
});
export type DefectRateByBand = z.infer<typeof defectRateByBandSchema>;

export const yieldTrendSchema = z.object({
  months: z.array(
    z.object({
      month: monthSchema,
      /** Heats whose castings are all weighed. */
      heats: count,
      medianPct: z.number().nullable(),
      meanPct: z.number().nullable(),
    }),
  ),
  /** Heats in scope left out: no castings, or a casting not weighed. */
  excluded: count,
  /** The yield definition used (the trade core's pourYield). */
  source: z.string(),
});
export type YieldTrend = z.infer<typeof yieldTrendSchema>;

export const crucibleCyclesSchema = z.object({
  crucibles: z.array(
    z.object({
      id: z.uuid(),
      name: z.string(),
      material: z.enum(CRUCIBLE_MATERIALS),
      /** Every heat that used it, anyone's: the crucible's wear. */
      cycleCount: count,
      warnAt: count,
      limitAt: count,
      inServiceSince: z.string().nullable(),
      retiredOn: z.string().nullable(),
      /** The heats in scope, each with the crucible's cycle number at that heat. */
      points: z.array(z.object({ heatId: z.uuid(), pouredAt: z.string(), cycle: count })),
      notes: z.array(z.object({ id: z.uuid(), notedOn: z.string(), note: z.string() })),
    }),
  ),
});
export type CrucibleCycles = z.infer<typeof crucibleCyclesSchema>;

export const furnaceOffsetSchema = z.object({
  furnaces: z.array(
    z.object({
      id: z.uuid(),
      name: z.string(),
      kind: z.enum(FURNACE_KINDS),
      /** Median of pour − setpoint over the points; null without points. */
      medianOffsetC: z.number().nullable(),
      points: z.array(
        z.object({
          heatId: z.uuid(),
          pouredAt: z.string(),
          setpointC: z.number(),
          pourTempC: z.number(),
          offsetC: z.number(),
        }),
      ),
    }),
  ),
});
export type FurnaceOffset = z.infer<typeof furnaceOffsetSchema>;
