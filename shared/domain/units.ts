import { z } from 'zod';

// Conversions live here, at the edge: everything else in the trade core
// works in °C, grams, centimetres and minutes. The factors are exact by
// definition (NIST SP 811, Appendix B; the 1959 international pound).

export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
export const temperatureUnitSchema = z.enum(TEMPERATURE_UNITS);

export const MASS_UNITS = ['g', 'oz'] as const;
export type MassUnit = (typeof MASS_UNITS)[number];
export const massUnitSchema = z.enum(MASS_UNITS);

/** Grams in one avoirdupois ounce (exact: 1 lb = 0.45359237 kg, 16 oz to the pound). */
export const GRAMS_PER_OUNCE = 28.349523125;
/** Kilograms in one avoirdupois pound (exact by the 1959 definition). */
export const KILOGRAMS_PER_POUND = 0.45359237;
/** Offset between the Celsius and Kelvin scales. */
export const KELVIN_OFFSET = 273.15;
/** Standard acceleration of free fall, m/s² (exact by definition). */
export const STANDARD_GRAVITY = 9.80665;

/**
 * One plain space between number and unit. A narrow no-break space is nicer
 * typography, but it breaks copy-paste into spreadsheets and exact string
 * checks; the client keeps the pair together with CSS instead.
 */
export const UNIT_SPACE = ' ';

/** Degrees Celsius to degrees Fahrenheit. */
export function cToF(c: number): number {
  return (c * 9) / 5 + 32;
}

/** Degrees Fahrenheit to degrees Celsius. */
export function fToC(f: number): number {
  return ((f - 32) * 5) / 9;
}

/** Degrees Celsius to kelvin. */
export function cToK(c: number): number {
  return c + KELVIN_OFFSET;
}

/** Kelvin to degrees Celsius. */
export function kToC(k: number): number {
  return k - KELVIN_OFFSET;
}

/** Grams to avoirdupois ounces. */
export function gToOz(g: number): number {
  return g / GRAMS_PER_OUNCE;
}

/** Avoirdupois ounces to grams. */
export function ozToG(oz: number): number {
  return oz * GRAMS_PER_OUNCE;
}

/** Kilograms to avoirdupois pounds. */
export function kgToLb(kg: number): number {
  return kg / KILOGRAMS_PER_POUND;
}

/** Avoirdupois pounds to kilograms. */
export function lbToKg(lb: number): number {
  return lb * KILOGRAMS_PER_POUND;
}

/** Inches to centimetres (1 in = 2.54 cm exactly). */
export function inToCm(inches: number): number {
  return inches * 2.54;
}

/** Density in lb/in³ (how US alloy tables print it) to g/cm³. */
export function lbPerIn3ToGPerCm3(lbPerIn3: number): number {
  return (lbPerIn3 * KILOGRAMS_PER_POUND * 1000) / inToCm(1) ** 3;
}

/**
 * Fixed-decimal text with no "-0": a reading that rounds to zero prints as 0.
 * @param decimals digits after the point
 */
export function formatNumber(value: number, decimals = 0): string {
  const text = value.toFixed(decimals);
  return Number(text) === 0 ? (0).toFixed(decimals) : text;
}

/**
 * A temperature in the user's unit, e.g. `formatTemperature(720, 'F')` → "1328 °F".
 * @param c temperature in °C
 * @param pref the user's unit preference
 * @param decimals digits after the point (default whole degrees, as thermocouples read)
 */
export function formatTemperature(c: number, pref: TemperatureUnit, decimals = 0): string {
  const value = pref === 'C' ? c : cToF(c);
  return `${formatNumber(value, decimals)}${UNIT_SPACE}°${pref}`;
}

/**
 * A temperature difference (superheat, an excess over a limit) in the user's
 * unit. Differences scale by 9/5 without the 32 °F offset.
 * @param deltaC difference in kelvin / °C
 */
export function formatTemperatureDifference(deltaC: number, pref: TemperatureUnit, decimals = 0): string {
  const value = pref === 'C' ? deltaC : (deltaC * 9) / 5;
  return `${formatNumber(value, decimals)}${UNIT_SPACE}°${pref}`;
}

/**
 * A mass in the user's unit: whole grams, or ounces to one decimal by default.
 * @param g mass in grams
 */
export function formatMass(g: number, pref: MassUnit, decimals?: number): string {
  if (pref === 'g') return `${formatNumber(g, decimals ?? 0)}${UNIT_SPACE}g`;
  return `${formatNumber(gToOz(g), decimals ?? 1)}${UNIT_SPACE}oz`;
}
