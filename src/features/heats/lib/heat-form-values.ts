import { CHARGE_KINDS, formatMass, formatNumber, formatTemperature } from '#shared/domain/index.ts';
import type { ChargeKind } from '#shared/domain/index.ts';
import type { CrucibleShock } from '#shared/heats/equipment-schemas.ts';
import { heatCreateSchema } from '#shared/heats/heat-schemas.ts';
import type {
  CastingCreateInput,
  CastingUpdateInput,
  DegassingMethod,
  HeatCreateDraft,
  HeatCreateInput,
  HeatDefaults,
  HeatDetail,
  HeatFluxKind,
  HeatUpdateInput,
  QuenchMedium,
} from '#shared/heats/heat-schemas.ts';
import { boundMessage, formSchemaFor, type ApiIssue, type FormPath } from '#src/lib/form-schema.ts';
import {
  massFromInput,
  massToInput,
  numberToInput,
  parseDecimal,
  temperatureFromInput,
  temperatureToInput,
  type Units,
} from '#src/lib/unit-input.ts';
import { isoOfLocalInput, localInputOf } from './local-time.ts';

// The heat form holds what the caster typed, as text in their own units.
// This file is the one place that turns it into the API's heat (°C, g, UTC)
// and back, so the form, its live figures and its saves agree.

/** A yes/no the caster may also leave unrecorded. */
export type TriState = '' | 'yes' | 'no';

export type ChargeLineValues = { kind: ChargeKind; description: string; mass: string };

export type CastingValues = {
  /** The stored casting this row edits; absent for a new one. (Not `id`: field arrays use that key.) */
  castingId?: string;
  mouldId: string;
  mouldPreheat: string;
  coated: TriState;
  vented: TriState;
  pourHeightCm: string;
  sectionThicknessMm: string;
  mass: string;
  airCoolMin: string;
  quenchMedium: QuenchMedium;
  notes: string;
};

export type HeatFormValues = {
  /** '' is the signed-in member; only admins log for someone else. */
  casterId: string;
  alloy: string;
  /** datetime-local text. */
  meltStartedAt: string;
  pouredAt: string;
  furnaceId: string;
  crucibleId: string;
  /** The pour temperature aimed for; only asks the furnace for a setpoint, never saved. */
  targetPourTemp: string;
  setpoint: string;
  peakTemp: string;
  pourTemp: string;
  fluxKind: HeatFluxKind;
  fluxAmount: string;
  degassing: DegassingMethod;
  skimmed: TriState;
  toolsPreheated: TriState;
  ambientTemp: string;
  relativeHumidityPct: string;
  crucibleRemainder: string;
  crucibleShock: CrucibleShock;
  notes: string;
  chargeLines: ChargeLineValues[];
  castings: CastingValues[];
  safety: { dryTools: boolean; ppe: boolean; clearFloor: boolean };
};

/** API field → form field, where the form's name drops the unit (the value is in the user's). */
const FORM_NAME_OF: Record<string, string> = {
  setpointC: 'setpoint',
  peakTempC: 'peakTemp',
  pourTempC: 'pourTemp',
  ambientTempC: 'ambientTemp',
  fluxAmountG: 'fluxAmount',
  crucibleRemainderG: 'crucibleRemainder',
  massG: 'mass',
  mouldPreheatC: 'mouldPreheat',
};
const API_NAME_OF: Record<string, string> = Object.fromEntries(Object.entries(FORM_NAME_OF).map(([api, form]) => [form, api]));

const TEMPERATURE_FIELDS = new Set(['setpointC', 'peakTempC', 'pourTempC', 'ambientTempC', 'mouldPreheatC']);
const MASS_FIELDS = new Set(['fluxAmountG', 'crucibleRemainderG', 'massG']);
const OTHER_UNITS: Record<string, string> = { relativeHumidityPct: '%', pourHeightCm: 'cm', sectionThicknessMm: 'mm', airCoolMin: 'min' };

/** Where an API issue sits in the form: chargeLines.0.massG → chargeLines.0.mass. */
export function formPathOf(apiPath: readonly PropertyKey[]): FormPath {
  return apiPath.map((p) => (typeof p === 'number' ? p : (FORM_NAME_OF[String(p)] ?? String(p))));
}

/** A schema message with bounds in the user's units ("At most 3272 °F"). */
export function heatIssueMessage(issue: ApiIssue, units: Units): string {
  const field = [...issue.path].reverse().find((p) => typeof p === 'string');
  const name = typeof field === 'string' ? field : '';
  if (TEMPERATURE_FIELDS.has(name)) return boundMessage(issue, (c) => formatTemperature(c, units.temperatureUnit)) ?? issue.message;
  if (MASS_FIELDS.has(name)) return boundMessage(issue, (g) => formatMass(g, units.massUnit)) ?? issue.message;
  if (name in OTHER_UNITS) return boundMessage(issue, (v) => `${formatNumber(v, 0)} ${OTHER_UNITS[name]}`) ?? issue.message;
  return issue.message;
}

const triToBool = (v: TriState): boolean | null => (v === 'yes' ? true : v === 'no' ? false : null);
const boolToTri = (v: boolean | null | undefined): TriState => (v === true ? 'yes' : v === false ? 'no' : '');
const NOT_A_NUMBER = 'Enter a number, like 720 or 720.5';

type ChargeLineDraft = HeatCreateDraft['chargeLines'][number];
/** An API heat draft whose charge lines may still lack a mass (the schema then refuses it). */
export type HeatDraft = Omit<HeatCreateDraft, 'chargeLines'> & {
  chargeLines: (Omit<ChargeLineDraft, 'massG'> & { massG: number | undefined })[];
};

/**
 * The form's values as an API heat draft (°C, g, UTC). Text that is not a
 * number or a time is reported through `issue` and left out, so the schema
 * then sees it as missing.
 */
export function toHeatDraft(values: HeatFormValues, units: Units, issue: (path: FormPath, message: string) => void = () => {}): HeatDraft {
  const number = (path: FormPath, text: string, convert: (n: number) => number = (n) => n): number | null | undefined => {
    const parsed = parseDecimal(text);
    if (parsed === 'invalid') {
      issue(path, NOT_A_NUMBER);
      return undefined;
    }
    return parsed === null ? null : convert(parsed);
  };
  const temperature = (path: FormPath, text: string) => number(path, text, (n) => temperatureFromInput(n, units.temperatureUnit));
  const mass = (path: FormPath, text: string) => number(path, text, (n) => massFromInput(n, units.massUnit));

  const pouredAt = isoOfLocalInput(values.pouredAt);
  if (!pouredAt) issue(['pouredAt'], values.pouredAt.trim() ? 'Enter a date and time' : 'Press “Poured”, or enter when you poured');
  const meltStartedAt = isoOfLocalInput(values.meltStartedAt);
  if (values.meltStartedAt.trim() && !meltStartedAt) issue(['meltStartedAt'], 'Enter a date and time');

  return {
    ...(values.casterId ? { casterId: values.casterId } : {}),
    alloy: values.alloy,
    meltStartedAt,
    pouredAt: pouredAt ?? '',
    furnaceId: values.furnaceId || null,
    crucibleId: values.crucibleId || null,
    setpointC: temperature(['setpoint'], values.setpoint),
    peakTempC: temperature(['peakTemp'], values.peakTemp),
    pourTempC: temperature(['pourTemp'], values.pourTemp),
    fluxKind: values.fluxKind,
    fluxAmountG: values.fluxKind === 'none' ? null : mass(['fluxAmount'], values.fluxAmount),
    degassing: values.degassing,
    skimmed: triToBool(values.skimmed),
    toolsPreheated: triToBool(values.toolsPreheated),
    ambientTempC: temperature(['ambientTemp'], values.ambientTemp),
    relativeHumidityPct: number(['relativeHumidityPct'], values.relativeHumidityPct),
    crucibleRemainderG: mass(['crucibleRemainder'], values.crucibleRemainder),
    crucibleShock: values.crucibleShock,
    notes: values.notes,
    safety: { ...values.safety },
    chargeLines: values.chargeLines.map((line, i) => {
      if (!line.mass.trim()) issue(['chargeLines', i, 'mass'], 'Enter what this line weighed');
      return {
        kind: line.kind,
        description: line.description,
        massG: mass(['chargeLines', i, 'mass'], line.mass) ?? undefined,
      };
    }),
    castings: values.castings.map((k, i) => ({
      mouldId: k.mouldId || null,
      mouldPreheatC: temperature(['castings', i, 'mouldPreheat'], k.mouldPreheat),
      coated: triToBool(k.coated),
      vented: triToBool(k.vented),
      pourHeightCm: number(['castings', i, 'pourHeightCm'], k.pourHeightCm),
      sectionThicknessMm: number(['castings', i, 'sectionThicknessMm'], k.sectionThicknessMm),
      massG: mass(['castings', i, 'mass'], k.mass),
      airCoolMin: number(['castings', i, 'airCoolMin'], k.airCoolMin),
      quenchMedium: k.quenchMedium,
      notes: k.notes,
    })),
  };
}

/** The resolver schema: form text → API heat, checked by the API's own heatCreateSchema. */
export function heatFormSchema(units: Units) {
  return formSchemaFor<HeatFormValues, HeatCreateInput>({
    toDraft: (values, issue) => toHeatDraft(values, units, issue),
    schema: heatCreateSchema,
    formPathOf,
    messageOf: (issue) => heatIssueMessage(issue, units),
  });
}

export const emptyChargeLine = (kind: ChargeKind = CHARGE_KINDS[0]): ChargeLineValues => ({ kind, description: '', mass: '' });

export const emptyCasting = (mouldId = ''): CastingValues => ({
  mouldId,
  mouldPreheat: '',
  coated: '',
  vented: '',
  pourHeightCm: '',
  sectionThicknessMm: '',
  mass: '',
  airCoolMin: '',
  quenchMedium: 'none',
  notes: '',
});

/** A new heat's form, started from what this caster used last (GET /heats/last-defaults). */
export function valuesFromDefaults(defaults: HeatDefaults, units: Units): HeatFormValues {
  return {
    casterId: '',
    alloy: defaults.alloy ?? '',
    meltStartedAt: '',
    pouredAt: '',
    furnaceId: defaults.furnaceId ?? '',
    crucibleId: defaults.crucibleId ?? '',
    targetPourTemp: '',
    setpoint: temperatureToInput(defaults.setpointC, units.temperatureUnit),
    peakTemp: '',
    pourTemp: '',
    fluxKind: defaults.fluxKind ?? 'none',
    fluxAmount: massToInput(defaults.fluxAmountG, units.massUnit),
    degassing: defaults.degassing ?? 'none',
    skimmed: '',
    toolsPreheated: '',
    ambientTemp: '',
    relativeHumidityPct: '',
    crucibleRemainder: '',
    crucibleShock: 'none',
    notes: '',
    chargeLines: [emptyChargeLine()],
    castings: [],
    safety: { dryTools: false, ppe: false, clearFloor: false },
  };
}

/** A stored heat as form values in the user's units, for editing. */
export function valuesFromHeat(heat: HeatDetail, units: Units): HeatFormValues {
  const t = (c: number | null) => temperatureToInput(c, units.temperatureUnit);
  const m = (g: number | null) => massToInput(g, units.massUnit);
  return {
    casterId: heat.casterId,
    alloy: heat.alloy,
    meltStartedAt: localInputOf(heat.meltStartedAt),
    pouredAt: localInputOf(heat.pouredAt),
    furnaceId: heat.furnaceId ?? '',
    crucibleId: heat.crucibleId ?? '',
    targetPourTemp: '',
    setpoint: t(heat.setpointC),
    peakTemp: t(heat.peakTempC),
    pourTemp: t(heat.pourTempC),
    fluxKind: heat.fluxKind,
    fluxAmount: m(heat.fluxAmountG),
    degassing: heat.degassing,
    skimmed: boolToTri(heat.skimmed),
    toolsPreheated: boolToTri(heat.toolsPreheated),
    ambientTemp: t(heat.ambientTempC),
    relativeHumidityPct: numberToInput(heat.relativeHumidityPct, 1),
    crucibleRemainder: m(heat.crucibleRemainderG),
    crucibleShock: heat.crucibleShock,
    notes: heat.notes ?? '',
    chargeLines: heat.chargeLines.map((l) => ({ kind: l.kind, description: l.description ?? '', mass: m(l.massG) })),
    castings: heat.castings.map((k) => ({
      castingId: k.id,
      mouldId: k.mouldId ?? '',
      mouldPreheat: t(k.mouldPreheatC),
      coated: boolToTri(k.coated),
      vented: boolToTri(k.vented),
      pourHeightCm: numberToInput(k.pourHeightCm, 1),
      sectionThicknessMm: numberToInput(k.sectionThicknessMm, 1),
      mass: m(k.massG),
      airCoolMin: numberToInput(k.airCoolMin, 1),
      quenchMedium: k.quenchMedium,
      notes: k.notes ?? '',
    })),
    safety: { ...heat.safety },
  };
}

/** react-hook-form's dirty flags, loosely typed: `true` or a nested object/array of them. */
type Dirty = boolean | { [key: string]: Dirty | undefined } | (Dirty | undefined)[] | undefined;
const isDirty = (d: Dirty): boolean =>
  d === true || (Array.isArray(d) ? d.some((x) => isDirty(x)) : typeof d === 'object' && d !== null && Object.values(d).some((x) => isDirty(x)));

/**
 * What an edit changed, as the API's PATCH and casting calls. Only touched
 * fields are sent, so a value the form shows rounded in °F is never written
 * back over the stored °C figure it came from.
 */
export function heatChangesOf(
  saved: HeatCreateInput,
  values: HeatFormValues,
  dirty: Record<string, Dirty>,
  original: HeatDetail,
): { heat: HeatUpdateInput; castings: { remove: string[]; update: { id: string; input: CastingUpdateInput }[]; create: CastingCreateInput[] } } {
  const heat: Record<string, unknown> = {};
  for (const [formKey, flag] of Object.entries(dirty)) {
    if (!isDirty(flag) || formKey === 'castings' || formKey === 'targetPourTemp') continue;
    const apiKey = API_NAME_OF[formKey] ?? formKey;
    if (apiKey in saved) heat[apiKey] = saved[apiKey as keyof HeatCreateInput];
  }
  if ('casterId' in heat && heat.casterId === original.casterId) delete heat.casterId;

  const dirtyCastings = Array.isArray(dirty.castings) ? dirty.castings : [];
  const kept = new Set(values.castings.map((k) => k.castingId).filter(Boolean));
  const castings = {
    remove: original.castings.filter((k) => !kept.has(k.id)).map((k) => k.id),
    update: [] as { id: string; input: CastingUpdateInput }[],
    create: [] as CastingCreateInput[],
  };
  values.castings.forEach((k, i) => {
    if (!k.castingId) castings.create.push(saved.castings[i]);
    else if (isDirty(dirtyCastings[i])) castings.update.push({ id: k.castingId, input: saved.castings[i] });
  });
  return { heat: heat as HeatUpdateInput, castings };
}
