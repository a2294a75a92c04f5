import { z } from 'zod';
import { requireFinite, requireInRange } from './errors.ts';
import { PUBLICATIONS, appHeuristic, secondary } from './sources.ts';
import type { SourceNote } from './sources.ts';

// Water vapour is the main hydrogen source for aluminium melts
// (2Al + 3H₂O → Al₂O₃ + 6[H]); what matters is the absolute amount of
// vapour, i.e. the dew point, not the relative humidity.

/** Magnus coefficients over water, valid about −40…60 °C. */
export const MAGNUS = { a: 17.625, b: 243.04, e0Hpa: 6.1094 } as const;
export const MAGNUS_SOURCE: SourceNote = secondary(
  `${PUBLICATIONS.alduchovEskridge1996} coefficients a = 17.625, b = 243.04 °C, as quoted by a dew-point calculator page`,
);

/** Saturation vapour pressure over water, hPa (Magnus form). */
export function saturationVapourPressureHpa(tempC: number): number {
  const t = requireFinite('tempC', tempC);
  return MAGNUS.e0Hpa * Math.exp((MAGNUS.a * t) / (t + MAGNUS.b));
}

/** Actual water-vapour pressure, hPa, from temperature and relative humidity. */
export function vapourPressureHpa(input: { tempC: number; relativeHumidityPct: number }): number {
  const rh = requireInRange('relativeHumidityPct', input.relativeHumidityPct, { min: 0, max: 100 });
  return (rh / 100) * saturationVapourPressureHpa(input.tempC);
}

/**
 * Dew point, °C, by the Magnus form:
 * γ = ln(RH/100) + a·T/(b + T); Td = b·γ/(a − γ).
 * @param input.relativeHumidityPct in (0, 100]
 */
export function dewPointC(input: { tempC: number; relativeHumidityPct: number }): number {
  const t = requireFinite('tempC', input.tempC);
  const rh = requireInRange('relativeHumidityPct', input.relativeHumidityPct, { min: 0, max: 100, minExclusive: true });
  // A vanishing humidity would make ln(0) = −∞; the floor keeps the dew point finite.
  const gamma = Math.log(Math.max(rh / 100, Number.MIN_VALUE)) + (MAGNUS.a * t) / (MAGNUS.b + t);
  return (MAGNUS.b * gamma) / (MAGNUS.a - gamma);
}

export const HUMIDITY_RISK_LEVELS = ['low', 'moderate', 'high'] as const;
export type HumidityRisk = (typeof HUMIDITY_RISK_LEVELS)[number];

export const humidityBandsSchema = z
  .object({ moderateFromC: z.number(), highAboveC: z.number() })
  .refine((b) => b.moderateFromC <= b.highAboveC, { message: 'moderateFromC must not exceed highAboveC' });
export type HumidityBands = z.infer<typeof humidityBandsSchema>;

/**
 * Default dew-point bands: below 5 °C low, 5–15 °C moderate, above 15 °C high.
 * No published threshold exists; these are this app's heuristic and each
 * workshop may set its own.
 */
export const DEFAULT_HUMIDITY_BANDS: HumidityBands = { moderateFromC: 5, highAboveC: 15 };
export const HUMIDITY_BANDS_SOURCE: SourceNote = appHeuristic(
  'dew-point bands for hydrogen pick-up risk; no published single threshold was found',
);

/**
 * Hydrogen pick-up risk from the air, by dew point. An app heuristic, not a
 * published threshold.
 */
export function humidityRisk(dewPoint: number, bands: HumidityBands = DEFAULT_HUMIDITY_BANDS): HumidityRisk {
  const td = requireFinite('dewPointC', dewPoint);
  if (td > bands.highAboveC) return 'high';
  if (td >= bands.moderateFromC) return 'moderate';
  return 'low';
}
