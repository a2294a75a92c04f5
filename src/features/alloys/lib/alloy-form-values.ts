import { z } from 'zod';
import {
  workshopAlloyCreateSchema,
  workshopAlloyUpdateSchema,
  type WorkshopAlloyCreateInput,
  type WorkshopAlloyUpdateInput,
} from '#shared/alloys/alloy-schemas.ts';
import { composeWorkshopAlloy, updateWorkshopAlloy } from '#shared/alloys/workshop-alloy.ts';
import { findAlloy, formatTemperature, type Alloy } from '#shared/domain/index.ts';
import { boundMessage, formSchemaFor, type ApiIssue, type FormPath } from '#src/lib/form-schema.ts';
import { numberToInput, parseDecimal, temperatureFromInput, temperatureToInput, type Units } from '#src/lib/unit-input.ts';

// The workshop-alloy form holds text in the user's units. This file turns it
// into the API's input (°C) and back, and checks it with the same shared
// schemas and composition the server runs, so the form accepts exactly what
// the server would.

export type AlloyFormValues = {
  designation: string;
  /** A library designation, or '' for an alloy entered from scratch. */
  basedOn: string;
  commonName: string;
  family: string;
  solidusC: string;
  liquidusC: string;
  sandMin: string;
  sandMax: string;
  permanentMouldMin: string;
  permanentMouldMax: string;
  densityGcm3: string;
  shrinkageMin: string;
  shrinkageMax: string;
  patternShrinkPct: string;
  source: string;
};

export const ALLOY_FORM_FIELDS = [
  'designation',
  'basedOn',
  'commonName',
  'family',
  'solidusC',
  'liquidusC',
  'sandMin',
  'sandMax',
  'permanentMouldMin',
  'permanentMouldMax',
  'densityGcm3',
  'shrinkageMin',
  'shrinkageMax',
  'patternShrinkPct',
  'source',
] as const satisfies readonly (keyof AlloyFormValues)[];

/** The value fields a base alloy can fill in (not the name, base or note). */
const VALUE_FIELDS = ALLOY_FORM_FIELDS.filter((f) => !['designation', 'basedOn', 'commonName', 'source'].includes(f));

export const EMPTY_ALLOY_FORM: AlloyFormValues = Object.fromEntries(ALLOY_FORM_FIELDS.map((f) => [f, ''])) as AlloyFormValues;

/** An alloy's values as form text in the user's units. */
export function formValuesOf(alloy: Alloy, units: Units): AlloyFormValues {
  const t = (c: number | undefined) => temperatureToInput(c, units.temperatureUnit);
  return {
    designation: alloy.designation,
    basedOn: alloy.basedOn ?? '',
    commonName: alloy.commonName,
    family: alloy.family,
    solidusC: t(alloy.solidusC),
    liquidusC: t(alloy.liquidusC),
    sandMin: t(alloy.pourRangeC.sand?.min),
    sandMax: t(alloy.pourRangeC.sand?.max),
    permanentMouldMin: t(alloy.pourRangeC.permanentMould?.min),
    permanentMouldMax: t(alloy.pourRangeC.permanentMould?.max),
    densityGcm3: numberToInput(alloy.densityGcm3, 3),
    shrinkageMin: numberToInput(alloy.volumetricShrinkagePct?.min, 2),
    shrinkageMax: numberToInput(alloy.volumetricShrinkagePct?.max, 2),
    patternShrinkPct: numberToInput(alloy.patternShrinkPct, 2),
    source: alloy.source ?? '',
  };
}

/** The form a base alloy gives: its values, nothing of its name or note. */
export function formValuesFromBase(base: Alloy, units: Units, keep: AlloyFormValues): AlloyFormValues {
  const fromBase = formValuesOf(base, units);
  const next = { ...keep, basedOn: base.designation };
  for (const f of VALUE_FIELDS) next[f] = fromBase[f];
  return next;
}

type Issue = (path: FormPath, message: string) => void;
type Draft = Record<string, unknown>;

/**
 * The API draft from the form. `reference` is the form as it stood before
 * the caster touched it (the base alloy's values, or the stored alloy's):
 * a field left as it was is not sent, so the base's citation for it stays;
 * a field emptied that had a value is sent as null (cleared).
 */
function draftOf(values: AlloyFormValues, reference: AlloyFormValues | null, units: Units, issue: Issue): Draft {
  const draft: Draft = {};
  const changed = (f: keyof AlloyFormValues) => reference === null || values[f].trim() !== reference[f].trim();
  const had = (f: keyof AlloyFormValues) => reference !== null && reference[f].trim() !== '';

  const number = (f: keyof AlloyFormValues, convert: (n: number) => number = (n) => n): number | null | undefined => {
    const parsed = parseDecimal(values[f]);
    if (parsed === 'invalid') {
      issue([f], 'Enter a number');
      return undefined;
    }
    return parsed === null ? null : convert(parsed);
  };
  const toC = (n: number) => temperatureFromInput(n, units.temperatureUnit);

  for (const f of ['designation', 'commonName', 'source'] as const) {
    if (changed(f) && values[f].trim() !== '') draft[f] = values[f];
  }
  if (values.family && changed('family')) draft.family = values.family;

  for (const [f, key, convert] of [
    ['solidusC', 'solidusC', toC],
    ['liquidusC', 'liquidusC', toC],
    ['densityGcm3', 'densityGcm3', undefined],
    ['patternShrinkPct', 'patternShrinkPct', undefined],
  ] as const) {
    if (!changed(f)) continue;
    const n = number(f, convert);
    if (typeof n === 'number') draft[key] = n;
    else if (n === null && had(f)) {
      if (key === 'patternShrinkPct') draft[key] = null;
      else issue([f], 'This value cannot be left empty');
    }
  }

  const range = (minField: keyof AlloyFormValues, maxField: keyof AlloyFormValues, convert?: (n: number) => number) => {
    if (!changed(minField) && !changed(maxField)) return undefined;
    const min = number(minField, convert);
    const max = number(maxField, convert);
    if (min === undefined || max === undefined) return undefined;
    if (min === null && max === null) return had(minField) || had(maxField) ? null : undefined;
    if (min === null) {
      issue([minField], 'Enter both ends of the range');
      return undefined;
    }
    if (max === null) {
      issue([maxField], 'Enter both ends of the range');
      return undefined;
    }
    return { min, max };
  };

  const sand = range('sandMin', 'sandMax', toC);
  const permanentMould = range('permanentMouldMin', 'permanentMouldMax', toC);
  if (sand !== undefined || permanentMould !== undefined) {
    draft.pourRangeC = {
      ...(sand !== undefined ? { sand } : {}),
      ...(permanentMould !== undefined ? { permanentMould } : {}),
    };
  }
  const shrinkage = range('shrinkageMin', 'shrinkageMax');
  if (shrinkage !== undefined) draft.volumetricShrinkagePct = shrinkage;
  return draft;
}

/** Where an API path sits in the form. */
function formPathOf(path: readonly PropertyKey[]): FormPath {
  const [head, mould, end] = path.map(String);
  if (head === 'pourRangeC') {
    if (mould === 'permanentMould') return [end === 'max' ? 'permanentMouldMax' : 'permanentMouldMin'];
    return [end === 'max' ? 'sandMax' : 'sandMin'];
  }
  if (head === 'volumetricShrinkagePct') return [mould === 'max' ? 'shrinkageMax' : 'shrinkageMin'];
  return [head ?? 'designation'];
}

const TEMPERATURE_PATHS = new Set(['solidusC', 'liquidusC', 'pourRangeC']);

function messageIn(units: Units) {
  return (issue: ApiIssue): string => {
    if (TEMPERATURE_PATHS.has(String(issue.path[0]))) {
      return boundMessage(issue, (c) => formatTemperature(c, units.temperatureUnit)) ?? issue.message;
    }
    return issue.message;
  };
}

/** Runs the trade core's own checks (solidus ≤ liquidus, pours above the liquidus) as schema issues. */
function withSoundness<T>(schema: z.ZodType<T>, compose: (input: T) => unknown) {
  return schema.superRefine((input, ctx) => {
    try {
      compose(input);
    } catch (error) {
      if (!(error instanceof z.ZodError)) throw error;
      for (const issue of error.issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
    }
  });
}

/** The resolver schema for a new workshop alloy; its output is the POST body. */
export function alloyCreateFormSchema(units: Units) {
  return formSchemaFor<AlloyFormValues, WorkshopAlloyCreateInput>({
    toDraft: (values, issue) => {
      const base = values.basedOn ? findAlloy(values.basedOn) : undefined;
      const reference = base ? formValuesOf(base, units) : null;
      return { ...draftOf(values, reference, units, issue), designation: values.designation, source: values.source, ...(base ? { basedOn: base.designation } : {}) };
    },
    schema: withSoundness(workshopAlloyCreateSchema, composeWorkshopAlloy),
    formPathOf,
    messageOf: messageIn(units),
  });
}

/** The resolver schema for an edit of `current`; its output is the PATCH body (changed fields only). */
export function alloyUpdateFormSchema(units: Units, current: Alloy) {
  return formSchemaFor<AlloyFormValues, WorkshopAlloyUpdateInput>({
    toDraft: (values, issue) => draftOf(values, formValuesOf(current, units), units, issue),
    schema: withSoundness(workshopAlloyUpdateSchema, (input) => updateWorkshopAlloy(current, input)),
    formPathOf,
    messageOf: messageIn(units),
  });
}

/** A server 400's path ("pourRangeC.sand.min") as the form field it belongs to. */
export function formFieldOfApiPath(path: string): keyof AlloyFormValues {
  const field = formPathOf(path.split('.'))[0] as keyof AlloyFormValues;
  return ALLOY_FORM_FIELDS.includes(field) ? field : 'designation';
}
