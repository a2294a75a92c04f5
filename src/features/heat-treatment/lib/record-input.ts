import { fToC, type TemperatureUnit } from '#shared/domain/index.ts';
import { inUnit } from './plan-text.ts';

// Form text ↔ API values for the record. Times are typed as local date and
// time (the oven clock) and sent as UTC instants; temperatures in the
// reader's unit and sent as °C.

/** A number typed into a field: '' is not recorded (null); a comma works as the decimal mark. */
export function parseNumber(text: string): number | null | 'invalid' {
  const t = text.trim().replace(',', '.');
  if (t === '') return null;
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(t) ? Number(t) : 'invalid';
}

const pad = (n: number) => String(n).padStart(2, '0');

/** An instant as a datetime-local value in the browser's time zone. */
export function toLocalInput(iso: string | null): string {
  if (!iso) return '';
  const d = new Date(iso);
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** A datetime-local value as a UTC instant, or null when empty. */
export function fromLocalInput(value: string): string | null {
  if (!value) return null;
  const d = new Date(value);
  return Number.isNaN(d.getTime()) ? null : d.toISOString();
}

export function temperatureText(c: number | null, unit: TemperatureUnit): string {
  return c === null ? '' : String(Math.round(inUnit(c, unit) * 10) / 10);
}

export function temperatureFromText(value: number, unit: TemperatureUnit): number {
  return unit === 'C' ? value : Math.round(fToC(value) * 100) / 100;
}
