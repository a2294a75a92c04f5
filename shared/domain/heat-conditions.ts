import { z } from 'zod';
import type { MouldKind } from './alloys.ts';

// What a caster records about one heat and its pour. A real heat log is
// always partial (diagnose takes a Partial and heat logs parse with the input
// schema); the full type keeps the field names in one place for `missing`
// lists and form labels.

export const CHARGE_KINDS = ['ingot', 'clean_scrap', 'dirty_scrap'] as const;
export type ChargeKind = (typeof CHARGE_KINDS)[number];

export const FLUX_KINDS = ['cover', 'drossing', 'cleaning', 'borax', 'other'] as const;
export type FluxKind = (typeof FLUX_KINDS)[number];

export const MOLD_MATERIALS = ['graphite', 'steel', 'cast_iron', 'green_sand', 'bonded_sand', 'investment', 'plaster'] as const;
export type MoldMaterial = (typeof MOLD_MATERIALS)[number];

/**
 * Reusable, conductive moulds poured preheated. Graphite is not a metal but
 * behaves as one here: alloy tables give it the permanent-mould range.
 */
export const METAL_MOLD_MATERIALS = ['graphite', 'steel', 'cast_iron'] as const satisfies readonly MoldMaterial[];

/** Expendable moulds made of sand or a refractory slurry. */
export const SAND_MOLD_MATERIALS = ['green_sand', 'bonded_sand'] as const satisfies readonly MoldMaterial[];

/** Whether a mould material counts as a metal (permanent) mould. */
export function isMetalMold(material: MoldMaterial): boolean {
  return (METAL_MOLD_MATERIALS as readonly MoldMaterial[]).includes(material);
}

/** Which alloy-table pouring range applies to a mould material. */
export function mouldKindOf(material: MoldMaterial): MouldKind {
  return isMetalMold(material) ? 'permanentMould' : 'sand';
}

/** Every field required, each within sensible bounds (no 120 % humidity, no 5000 °C pour). */
export const heatConditionsSchema = z.object({
  pourTempC: z.number().min(0).max(1800),
  /** Hottest the melt got in the furnace. */
  peakTempC: z.number().min(0).max(1800),
  /** Minutes the melt was held liquid before pouring. */
  holdTimeMin: z.number().min(0).max(1440),
  chargeKind: z.enum(CHARGE_KINDS),
  degassed: z.boolean(),
  fluxed: z.boolean(),
  fluxKind: z.enum(FLUX_KINDS),
  skimmed: z.boolean(),
  toolsPreheated: z.boolean(),
  ambientTempC: z.number().min(-40).max(60),
  relativeHumidityPct: z.number().min(0).max(100),
  moldMaterial: z.enum(MOLD_MATERIALS),
  moldTempC: z.number().min(-40).max(1200),
  moldCoated: z.boolean(),
  moldVented: z.boolean(),
  riser: z.boolean(),
  /** Free fall of the stream from crucible lip to sprue or mould, cm. */
  pourHeightCm: z.number().min(0).max(300),
  /** Heaviest section of the casting, mm. */
  sectionThicknessMm: z.number().positive().max(1000),
  /** Minutes from pouring until the casting went into water; absent when it was not water-quenched. */
  quenchDelayMin: z.number().min(0).max(10080),
  /** Heats this crucible has seen, including this one. */
  crucibleCycles: z.number().int().min(0).max(10000),
});

export type HeatConditions = z.infer<typeof heatConditionsSchema>;
export type HeatConditionField = keyof HeatConditions;

/** A heat log as recorded, and what `diagnose` accepts: any subset of the fields, same bounds. */
export const heatConditionsInputSchema = heatConditionsSchema.partial();

/** Field names in form order; `missing` lists follow it. */
export const HEAT_CONDITION_FIELDS = Object.keys(heatConditionsSchema.shape) as HeatConditionField[];

/** Plain words for each field, used in evidence sentences. */
export const HEAT_CONDITION_LABELS: Record<HeatConditionField, string> = {
  pourTempC: 'pour temperature',
  peakTempC: 'peak melt temperature',
  holdTimeMin: 'hold time',
  chargeKind: 'charge',
  degassed: 'degassing',
  fluxed: 'fluxing',
  fluxKind: 'flux type',
  skimmed: 'skimming',
  toolsPreheated: 'tool preheat',
  ambientTempC: 'air temperature',
  relativeHumidityPct: 'relative humidity',
  moldMaterial: 'mould material',
  moldTempC: 'mould temperature',
  moldCoated: 'mould coating',
  moldVented: 'mould venting',
  riser: 'riser',
  pourHeightCm: 'pour height',
  sectionThicknessMm: 'section thickness',
  quenchDelayMin: 'time before quench',
  crucibleCycles: 'crucible heat count',
};

export const CHARGE_KIND_LABELS: Record<ChargeKind, string> = {
  ingot: 'ingot',
  clean_scrap: 'clean scrap',
  dirty_scrap: 'dirty scrap',
};

export const FLUX_KIND_LABELS: Record<FluxKind, string> = {
  cover: 'cover flux',
  drossing: 'drossing flux',
  cleaning: 'cleaning flux',
  borax: 'borax',
  other: 'other flux',
};

export const MOLD_MATERIAL_LABELS: Record<MoldMaterial, string> = {
  graphite: 'graphite',
  steel: 'steel',
  cast_iron: 'cast iron',
  green_sand: 'green sand',
  bonded_sand: 'bonded sand',
  investment: 'investment',
  plaster: 'plaster',
};
