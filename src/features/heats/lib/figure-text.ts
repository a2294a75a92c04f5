import {
  DEFAULT_HUMIDITY_BANDS,
  formatMass,
  formatNumber,
  formatTemperature,
  formatTemperatureDifference,
} from '#shared/domain/index.ts';
import type { HumidityRisk, MouldKind, Range, TemperatureUnit } from '#shared/domain/index.ts';
import type { HeatFigures } from '#shared/heats/heat-schemas.ts';
import type { Units } from '#src/lib/unit-input.ts';

// Words for the figures, shared by the form's live readouts and the heat
// page, so both say the same thing in the user's units.

export const MOULD_KIND_WORDS: Record<MouldKind | 'any', string> = {
  sand: 'in sand',
  permanentMould: 'in a metal mould',
  any: 'in sand or metal moulds',
};

export const HUMIDITY_RISK_WORDS: Record<HumidityRisk, string> = {
  low: 'low risk of hydrogen pick-up from the air',
  moderate: 'moderate risk of hydrogen pick-up: keep the melt covered and the hold short',
  high: 'high risk of hydrogen pick-up: degas, and keep the charge and tools bone dry',
};

/** The dew-point bands in the user's unit, so the band word is never a bare verdict. */
export function humidityBandsText(unit: TemperatureUnit): string {
  const { moderateFromC, highAboveC } = DEFAULT_HUMIDITY_BANDS;
  return `Below ${formatTemperature(moderateFromC, unit)} low, up to ${formatTemperature(highAboveC, unit)} moderate, above that high (this app’s rule of thumb; no published threshold).`;
}

export const percent = (value: number) => `${formatNumber(value, 0)} %`;

/** Where a pour temperature sits against the alloy's range, in words with the gap in the user's unit. */
export function rangePositionText(pourC: number | null, range: Range, unit: TemperatureUnit): string | null {
  if (pourC === null) return null;
  if (pourC < range.min) return `${formatTemperatureDifference(range.min - pourC, unit)} below the range: expect misruns and cold shuts`;
  if (pourC > range.max) return `${formatTemperatureDifference(pourC - range.max, unit)} above the range: more gas and oxide`;
  return 'within the range';
}

export function rangeText(range: Range, unit: TemperatureUnit): string {
  return `${formatTemperature(range.min, unit)} to ${formatTemperature(range.max, unit)}`;
}

export function superheatText(figures: Pick<HeatFigures, 'superheatC' | 'liquidusC'>, alloyName: string, unit: TemperatureUnit) {
  if (figures.superheatC === null || figures.liquidusC === null) return null;
  const side = figures.superheatC >= 0 ? 'above' : 'below';
  const warning = figures.superheatC < 0 ? ': the metal starts to freeze' : '';
  return `${side} the liquidus of ${alloyName}, ${formatTemperature(figures.liquidusC, unit)}${warning}`;
}

export function hydrogenText(hydrogen: NonNullable<HeatFigures['hydrogen']>, unit: TemperatureUnit): string {
  return `${formatNumber(hydrogen.ratio, 1)} × what it holds just above melting (${formatTemperature(hydrogen.meltingPointC, unit)}): the hotter the pour, the more gas it can pick up.`;
}

export const hydrogenValue = (hydrogen: NonNullable<HeatFigures['hydrogen']>) => `${formatNumber(hydrogen.atPourMlPer100g, 2)} mL/100 g`;

export function remainderText(figures: Pick<HeatFigures, 'remainderG'>, units: Units): string | null {
  if (figures.remainderG === null) return null;
  return `remainder ${formatMass(figures.remainderG, units.massUnit)}: gating, risers and what stayed in the crucible`;
}
