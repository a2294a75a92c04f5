import { formatNumber, inToCm, type TemperatureUnit } from '#shared/domain/index.ts';

// The preferences hold only °C/°F and g/oz. Lengths follow a toggle on the
// calculators that need them, starting from inches for those who chose °F.

export const LENGTH_UNITS = ['mm', 'in'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

export const defaultLengthUnit = (temperatureUnit: TemperatureUnit): LengthUnit => (temperatureUnit === 'F' ? 'in' : 'mm');

/** A typed length in the chosen unit, as centimetres (the trade core's unit for shapes). */
export const lengthToCm = (value: number, unit: LengthUnit) => (unit === 'mm' ? value / 10 : inToCm(value));
/** A typed length as millimetres (the trade core's unit for pattern dimensions). */
export const lengthToMm = (value: number, unit: LengthUnit) => lengthToCm(value, unit) * 10;
/** Centimetres in the chosen unit. */
export const cmInUnit = (cm: number, unit: LengthUnit) => (unit === 'mm' ? cm * 10 : cm / inToCm(1));

const otherLength = (unit: LengthUnit): LengthUnit => (unit === 'mm' ? 'in' : 'mm');

/** A length in cm as text in `unit` ("51.9 mm", "2.04 in"). */
export function formatLength(cm: number, unit: LengthUnit, decimals = unit === 'mm' ? 1 : 3): string {
  return `${formatNumber(cmInUnit(cm, unit), decimals)} ${unit}`;
}

/** The same length in the other unit, for small type beside the result. */
export const formatLengthOther = (cm: number, unit: LengthUnit) => formatLength(cm, otherLength(unit));

/** An area in cm² as text: cm² beside mm lengths, in² beside inches. */
export function formatArea(cm2: number, unit: LengthUnit): string {
  return unit === 'mm' ? `${formatNumber(cm2, 1)} cm²` : `${formatNumber(cm2 / inToCm(1) ** 2, 2)} in²`;
}

/** A volume in cm³ as text: cm³ beside mm lengths, in³ beside inches. */
export function formatVolume(cm3: number, unit: LengthUnit): string {
  return unit === 'mm' ? `${formatNumber(cm3, 1)} cm³` : `${formatNumber(cm3 / inToCm(1) ** 3, 2)} in³`;
}
