import { cToF, fToC, gToOz, ozToG } from '#shared/domain/index.ts';
import type { MassUnit, TemperatureUnit } from '#shared/domain/index.ts';

// The API speaks °C and grams; people type in their own unit. These helpers
// are the edge where form text becomes API numbers and back. The arithmetic
// is the trade core's (cToF, fToC, gToOz, ozToG), never redone here.

export type Units = { temperatureUnit: TemperatureUnit; massUnit: MassUnit };

/**
 * A number typed into a field: '' is "not recorded" (null); a comma works as
 * the decimal mark, since many phone keypads offer only that; anything else
 * that is not a plain decimal is 'invalid'.
 */
export function parseDecimal(text: string): number | null | 'invalid' {
  const t = text.trim().replace(',', '.');
  if (t === '') return null;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)$/.test(t)) return 'invalid';
  return Number(t);
}

/** A figure as field text: at most `decimals` places, no trailing zeros, so 1328.0 shows as 1328. */
export function numberToInput(value: number | null | undefined, decimals = 2): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  return String(Number(value.toFixed(decimals)));
}

/** °C from the API as text in the user's unit. */
export function temperatureToInput(c: number | null | undefined, unit: TemperatureUnit): string {
  if (c === null || c === undefined) return '';
  return numberToInput(unit === 'C' ? c : cToF(c), 1);
}

/** A typed temperature in the user's unit as °C for the API. */
export function temperatureFromInput(value: number, unit: TemperatureUnit): number {
  return unit === 'C' ? value : fToC(value);
}

/** °C in the user's unit, as a number (for charts and comparisons; formatTemperature for text). */
export function temperatureInUnit(c: number, unit: TemperatureUnit): number {
  return unit === 'C' ? c : cToF(c);
}

/**
 * A temperature difference in the user's unit, as a number. A difference
 * scales without the 32 °F offset, which cToF(d) − cToF(0) gives exactly.
 */
export function temperatureDifferenceInUnit(deltaC: number, unit: TemperatureUnit): number {
  return unit === 'C' ? deltaC : cToF(deltaC) - cToF(0);
}

/** Grams from the API as text in the user's unit. */
export function massToInput(g: number | null | undefined, unit: MassUnit): string {
  if (g === null || g === undefined) return '';
  return unit === 'g' ? numberToInput(g, 1) : numberToInput(gToOz(g), 2);
}

/** A typed mass in the user's unit as grams for the API. */
export function massFromInput(value: number, unit: MassUnit): number {
  return unit === 'g' ? value : ozToG(value);
}

/** The unit's symbol as it follows a number: "°C", "°F", "g", "oz". */
export const temperatureSymbol = (unit: TemperatureUnit) => `°${unit}`;
export const massSymbol = (unit: MassUnit) => unit;
