import { z } from 'zod';
import { ALLOY_FAMILIES, ALLOY_TRAITS } from '../alloys.ts';
import {
  CHARGE_KINDS,
  CHARGE_KIND_LABELS,
  FLUX_KINDS,
  FLUX_KIND_LABELS,
  HEAT_CONDITION_LABELS,
  MOLD_MATERIALS,
  MOLD_MATERIAL_LABELS,
  heatConditionsSchema,
} from '../heat-conditions.ts';
import type { HeatConditionField } from '../heat-conditions.ts';

// What a rule condition may look at: the recorded heat fields plus values the
// engine derives from them and from the alloy. Each field declares its kind
// (so the rule schema can reject `pourTempC eq true`), its unit (so evidence
// prints "812 °C", not "812"), and which heat fields it needs (so an unknown
// outcome can say what to record).

export const DERIVED_FIELDS = [
  'superheatC',
  'peakSuperheatC',
  'dewPointC',
  'moldIsMetal',
  'alloyFamily',
  'alloyTraits',
  'freezingRangeC',
  'streamVelocityMs',
] as const;
export type DerivedField = (typeof DERIVED_FIELDS)[number];

export type ConditionField = HeatConditionField | DerivedField;
export const conditionFieldSchema = z.union([heatConditionsSchema.keyof(), z.enum(DERIVED_FIELDS)]);

/** Units for printing numeric values; `deltaC` is a temperature difference. */
export type NumberUnit = 'C' | 'deltaC' | 'min' | 'pct' | 'cm' | 'mm' | 'count' | 'mPerS';

export type FieldSpec = {
  label: string;
  /** Heat fields this value is read or derived from. */
  needs: readonly HeatConditionField[];
  /** Whether the value also needs the alloy. */
  needsAlloy: boolean;
} & (
  | { kind: 'number'; unit: NumberUnit }
  | { kind: 'boolean' }
  | { kind: 'enum'; options: readonly string[]; optionLabels?: Readonly<Record<string, string>> }
  | { kind: 'set'; options: readonly string[] }
);

const heat = (field: HeatConditionField) => ({ label: HEAT_CONDITION_LABELS[field], needs: [field], needsAlloy: false });

export const FIELD_SPECS: Readonly<Record<ConditionField, FieldSpec>> = {
  pourTempC: { ...heat('pourTempC'), kind: 'number', unit: 'C' },
  peakTempC: { ...heat('peakTempC'), kind: 'number', unit: 'C' },
  holdTimeMin: { ...heat('holdTimeMin'), kind: 'number', unit: 'min' },
  chargeKind: { ...heat('chargeKind'), kind: 'enum', options: CHARGE_KINDS, optionLabels: CHARGE_KIND_LABELS },
  degassed: { ...heat('degassed'), kind: 'boolean' },
  fluxed: { ...heat('fluxed'), kind: 'boolean' },
  fluxKind: { ...heat('fluxKind'), kind: 'enum', options: FLUX_KINDS, optionLabels: FLUX_KIND_LABELS },
  skimmed: { ...heat('skimmed'), kind: 'boolean' },
  toolsPreheated: { ...heat('toolsPreheated'), kind: 'boolean' },
  ambientTempC: { ...heat('ambientTempC'), kind: 'number', unit: 'C' },
  relativeHumidityPct: { ...heat('relativeHumidityPct'), kind: 'number', unit: 'pct' },
  moldMaterial: { ...heat('moldMaterial'), kind: 'enum', options: MOLD_MATERIALS, optionLabels: MOLD_MATERIAL_LABELS },
  moldTempC: { ...heat('moldTempC'), kind: 'number', unit: 'C' },
  moldCoated: { ...heat('moldCoated'), kind: 'boolean' },
  moldVented: { ...heat('moldVented'), kind: 'boolean' },
  riser: { ...heat('riser'), kind: 'boolean' },
  pourHeightCm: { ...heat('pourHeightCm'), kind: 'number', unit: 'cm' },
  sectionThicknessMm: { ...heat('sectionThicknessMm'), kind: 'number', unit: 'mm' },
  quenchDelayMin: { ...heat('quenchDelayMin'), kind: 'number', unit: 'min' },
  crucibleCycles: { ...heat('crucibleCycles'), kind: 'number', unit: 'count' },
  superheatC: { label: 'superheat', needs: ['pourTempC'], needsAlloy: true, kind: 'number', unit: 'deltaC' },
  peakSuperheatC: { label: 'peak superheat', needs: ['peakTempC'], needsAlloy: true, kind: 'number', unit: 'deltaC' },
  dewPointC: { label: 'dew point', needs: ['ambientTempC', 'relativeHumidityPct'], needsAlloy: false, kind: 'number', unit: 'C' },
  moldIsMetal: { label: 'metal mould', needs: ['moldMaterial'], needsAlloy: false, kind: 'boolean' },
  alloyFamily: { label: 'alloy family', needs: [], needsAlloy: true, kind: 'enum', options: ALLOY_FAMILIES },
  alloyTraits: { label: 'alloy traits', needs: [], needsAlloy: true, kind: 'set', options: ALLOY_TRAITS },
  freezingRangeC: { label: 'freezing range', needs: [], needsAlloy: true, kind: 'number', unit: 'deltaC' },
  streamVelocityMs: { label: 'stream velocity', needs: ['pourHeightCm'], needsAlloy: false, kind: 'number', unit: 'mPerS' },
};

/** Placeholders a template may use besides the condition fields. */
export const TEMPLATE_EXTRAS = ['threshold', 'excess', 'alloy', 'mouldKind', 'range'] as const;
export type TemplateExtra = (typeof TEMPLATE_EXTRAS)[number];
