import { CHARGE_KINDS, CHARGE_KIND_LABELS, FLUX_KIND_LABELS, cToF, fToC } from '#shared/domain/index.ts';
import type { HeatConditionField, TemperatureUnit } from '#shared/domain/index.ts';
import { DEGASSING_LABELS, DEGASSING_METHODS, HEAT_FLUX_KINDS } from '#shared/heats/heat-schemas.ts';

// How each "not recorded" field of a diagnosis is filled in on the spot: what
// the caster types or picks, and which heat or casting field that becomes
// (the reverse of shared/heats/heat-conditions-of.ts). Fields that need a
// piece of equipment picked (mould, crucible) send the caster to the heat form.

export type ConditionPatch = { target: 'heat' | 'casting'; values: Record<string, unknown> };

export type ConditionInput =
  | { kind: 'temperature'; min: number; max: number; toPatch: (c: number) => ConditionPatch }
  | { kind: 'number'; unit: string; min: number; max: number; integer?: boolean; toPatch: (n: number, ctx: RecordContext) => ConditionPatch }
  | { kind: 'yes-no'; toPatch: (yes: boolean) => ConditionPatch }
  | { kind: 'choice'; options: readonly { value: string; label: string }[]; toPatch: (value: string) => ConditionPatch }
  | { kind: 'charge'; toPatch: (kind: string, massG: number) => ConditionPatch }
  | { kind: 'heat-form' };

/** What a value needs from the heat as recorded (the pour stamp, for a hold time). */
export type RecordContext = { pouredAt: string | null };

const heat = (values: Record<string, unknown>): ConditionPatch => ({ target: 'heat', values });
const casting = (values: Record<string, unknown>): ConditionPatch => ({ target: 'casting', values });

export const CONDITION_INPUTS: Record<HeatConditionField, ConditionInput> = {
  pourTempC: { kind: 'temperature', min: 0, max: 1800, toPatch: (c) => heat({ pourTempC: c }) },
  peakTempC: { kind: 'temperature', min: 0, max: 1800, toPatch: (c) => heat({ peakTempC: c }) },
  holdTimeMin: {
    kind: 'number',
    unit: 'min',
    min: 0,
    max: 1440,
    // The heat log keeps the hold as two stamps; the melt started that many minutes before the pour.
    toPatch: (min, ctx) =>
      heat({ meltStartedAt: new Date(Date.parse(ctx.pouredAt ?? new Date().toISOString()) - min * 60_000).toISOString() }),
  },
  chargeKind: { kind: 'charge', toPatch: (kind, massG) => heat({ chargeLines: [{ kind, massG }] }) },
  degassed: {
    kind: 'choice',
    options: DEGASSING_METHODS.map((m) => ({ value: m, label: m === 'none' ? 'not degassed' : DEGASSING_LABELS[m] })),
    toPatch: (value) => heat({ degassing: value }),
  },
  fluxed: {
    kind: 'choice',
    options: HEAT_FLUX_KINDS.map((f) => ({ value: f, label: f === 'none' ? 'no flux' : FLUX_KIND_LABELS[f] })),
    toPatch: (value) => heat({ fluxKind: value }),
  },
  fluxKind: {
    kind: 'choice',
    options: HEAT_FLUX_KINDS.map((f) => ({ value: f, label: f === 'none' ? 'no flux' : FLUX_KIND_LABELS[f] })),
    toPatch: (value) => heat({ fluxKind: value }),
  },
  skimmed: { kind: 'yes-no', toPatch: (yes) => heat({ skimmed: yes }) },
  toolsPreheated: { kind: 'yes-no', toPatch: (yes) => heat({ toolsPreheated: yes }) },
  ambientTempC: { kind: 'temperature', min: -40, max: 60, toPatch: (c) => heat({ ambientTempC: c }) },
  relativeHumidityPct: { kind: 'number', unit: '%', min: 0, max: 100, toPatch: (n) => heat({ relativeHumidityPct: n }) },
  moldMaterial: { kind: 'heat-form' },
  riser: { kind: 'heat-form' },
  crucibleCycles: { kind: 'heat-form' },
  moldTempC: { kind: 'temperature', min: -40, max: 1200, toPatch: (c) => casting({ mouldPreheatC: c }) },
  moldCoated: { kind: 'yes-no', toPatch: (yes) => casting({ coated: yes }) },
  moldVented: { kind: 'yes-no', toPatch: (yes) => casting({ vented: yes }) },
  pourHeightCm: { kind: 'number', unit: 'cm', min: 0, max: 300, toPatch: (n) => casting({ pourHeightCm: n }) },
  sectionThicknessMm: { kind: 'number', unit: 'mm', min: 0.1, max: 1000, toPatch: (n) => casting({ sectionThicknessMm: n }) },
  quenchDelayMin: {
    kind: 'number',
    unit: 'min',
    min: 0,
    max: 10080,
    // Only a water quench has a delay in the trade core's sense (heat-conditions-of.ts).
    toPatch: (n) => casting({ airCoolMin: n, quenchMedium: 'water' }),
  },
};

export const CHARGE_OPTIONS = CHARGE_KINDS.map((k) => ({ value: k, label: CHARGE_KIND_LABELS[k] }));

/** A typed temperature in the user's unit, as °C. */
export function toCelsius(value: number, unit: TemperatureUnit): number {
  return unit === 'C' ? value : Math.round(fToC(value) * 10) / 10;
}

/** A °C value in the user's unit, for an input's starting value. */
export function fromCelsius(c: number, unit: TemperatureUnit): number {
  return unit === 'C' ? c : Math.round(cToF(c));
}

const CELSIUS_IN_TEXT = /(-?\d+(?:[.,]\d+)?)[\s\u00a0\u202f]?°C/g;

/**
 * Evidence sentences come from the server in °C. For a °F user each
 * temperature gets its °F value beside it, so the caster's own number is
 * still there to compare with the thermometer.
 */
export function withFahrenheit(text: string, unit: TemperatureUnit): string {
  if (unit === 'C') return text;
  return text.replace(CELSIUS_IN_TEXT, (whole, n: string) => {
    const c = Number(n.replace(',', '.'));
    if (!Number.isFinite(c)) return whole;
    // A "15 °C band" is a difference, not a reading; both read the same way here (×9/5 only).
    return `${whole} (${Math.round(cToF(c))} °F)`;
  });
}
