import {
  formatNumber,
  formatTemperature,
  gToOz,
  inToCm,
  type Alloy,
  type AlloySources,
  type MassUnit,
  type Range,
  type SourceGrade,
  type TemperatureUnit,
} from '#shared/domain/index.ts';
import { temperatureInUnit } from '#src/lib/unit-input.ts';

// How the library's values read on screen, in the user's units.

/** A pouring range, "675–790 °C" / "1247–1454 °F"; a dash when the alloy has none. */
export function formatTemperatureRange(range: Range | undefined, unit: TemperatureUnit): string {
  if (!range) return '—';
  if (range.min === range.max) return formatTemperature(range.min, unit);
  return `${formatNumber(temperatureInUnit(range.min, unit))}–${formatTemperature(range.max, unit)}`;
}

/** cm³ in one cubic inch (exact: 1 in = 2.54 cm). */
const CM3_PER_IN3 = inToCm(1) ** 3;

/**
 * Density in the user's mass unit: g/cm³ as alloy tables print it, or
 * oz/in³ for those who weigh in ounces; the other one comes second.
 */
export function formatDensity(gPerCm3: number, unit: MassUnit): { primary: string; secondary: string } {
  const metric = `${formatNumber(gPerCm3, 3)} g/cm³`;
  const imperial = `${formatNumber(gToOz(gPerCm3 * CM3_PER_IN3), 3)} oz/in³`;
  return unit === 'g' ? { primary: metric, secondary: imperial } : { primary: imperial, secondary: metric };
}

/** A percentage range, "4–5 %"; a dash when not known. */
export function formatPercentRange(range: Range | undefined): string {
  if (!range) return '—';
  const fmt = (v: number) => formatNumber(v, Number.isInteger(v) ? 0 : 1);
  return range.min === range.max ? `${fmt(range.min)} %` : `${fmt(range.min)}–${fmt(range.max)} %`;
}

/** A patternmaker's allowance as % and as inches per foot (how shrink rules are sold). */
export function formatPatternAllowance(pct: number | undefined): { primary: string; secondary: string } | null {
  if (pct === undefined) return null;
  return { primary: `${formatNumber(pct, 2)} %`, secondary: `${formatNumber((pct / 100) * 12, 3)} in/ft` };
}

export const SOURCE_GRADE_LABELS: Record<SourceGrade, string> = {
  primary: 'read in the source',
  secondary: 'secondary source',
  memory: 'from memory',
  practice: 'common practice',
  heuristic: 'app heuristic',
};

/** The library's citations, one per stored property, in table order. */
export const SOURCE_FIELDS: readonly { key: keyof AlloySources; label: string; present: (a: Alloy) => boolean }[] = [
  { key: 'solidusLiquidus', label: 'Solidus and liquidus', present: () => true },
  { key: 'pourRange', label: 'Pouring ranges', present: (a) => Boolean(a.pourRangeC.sand || a.pourRangeC.permanentMould) },
  { key: 'density', label: 'Density', present: () => true },
  { key: 'liquidDensity', label: 'Liquid density', present: (a) => a.liquidDensityGcm3 !== undefined },
  { key: 'volumetricShrinkage', label: 'Volumetric shrinkage', present: (a) => a.volumetricShrinkagePct !== undefined },
  { key: 'patternShrink', label: 'Pattern allowance', present: (a) => a.patternShrinkPct !== undefined },
  { key: 'traits', label: 'Casting traits', present: (a) => a.traits.length > 0 },
];

export const FAMILY_LABELS: Record<Alloy['family'], string> = {
  aluminium: 'Aluminium',
  copper: 'Copper (brass, bronze)',
  zinc: 'Zinc',
  iron: 'Iron',
  tin: 'Tin (pewter)',
};
