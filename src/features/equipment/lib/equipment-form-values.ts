import { findAlloy, formatMass } from '#shared/domain/index.ts';
import type { MassUnit, MoldMaterial } from '#shared/domain/index.ts';
import type { CrucibleMaterial } from '#shared/heats/crucible-life.ts';
import {
  crucibleCreateSchema,
  furnaceCreateSchema,
  mouldCreateSchema,
  type Crucible,
  type CrucibleCreateInput,
  type Furnace,
  type FurnaceCreateInput,
  type FurnaceKind,
  type Mould,
  type MouldCreateInput,
} from '#shared/heats/equipment-schemas.ts';
import { boundMessage, formSchemaFor, type ApiIssue, type FormPath } from '#src/lib/form-schema.ts';
import { massFromInput, massToInput, parseDecimal, type Units } from '#src/lib/unit-input.ts';

// Equipment forms hold text in the user's units; these turn it into the
// API's inputs (grams) and check them with the API's own schemas.

const NOT_A_NUMBER = 'Enter a number, like 1200';
const capacityPath = (path: readonly PropertyKey[]): FormPath =>
  path.map((p) => (p === 'capacityG' ? 'capacity' : typeof p === 'number' ? p : String(p)));
const capacityMessage = (massUnit: MassUnit) => (issue: ApiIssue) =>
  issue.path[0] === 'capacityG' ? (boundMessage(issue, (g) => formatMass(g, massUnit)) ?? issue.message) : issue.message;

function capacityOf(text: string, massUnit: MassUnit, issue: (path: FormPath, message: string) => void): number | null | undefined {
  const n = parseDecimal(text);
  if (n === 'invalid') {
    issue(['capacity'], NOT_A_NUMBER);
    return undefined;
  }
  return n === null ? null : massFromInput(n, massUnit);
}

// ── furnaces ────────────────────────────────────────────────────────────────

export type FurnaceFormValues = { name: string; kind: FurnaceKind; notes: string };

export const furnaceFormValues = (f?: Furnace): FurnaceFormValues => ({ name: f?.name ?? '', kind: f?.kind ?? 'electric', notes: f?.notes ?? '' });

export const furnaceFormSchema = () =>
  formSchemaFor<FurnaceFormValues, FurnaceCreateInput>({ toDraft: (v) => ({ ...v }), schema: furnaceCreateSchema });

// ── crucibles ───────────────────────────────────────────────────────────────

export type CrucibleFormValues = { name: string; material: CrucibleMaterial; capacity: string; inServiceSince: string };

export const crucibleFormValues = (c: Crucible | undefined, units: Units): CrucibleFormValues => ({
  name: c?.name ?? '',
  material: c?.material ?? 'clay_graphite',
  capacity: massToInput(c?.capacityG, units.massUnit),
  inServiceSince: c?.inServiceSince ?? '',
});

export const crucibleFormSchema = (massUnit: MassUnit) =>
  formSchemaFor<CrucibleFormValues, CrucibleCreateInput>({
    toDraft: (v, issue) => ({
      name: v.name,
      material: v.material,
      capacityG: capacityOf(v.capacity, massUnit, issue),
      inServiceSince: v.inServiceSince || null,
    }),
    schema: crucibleCreateSchema,
    formPathOf: capacityPath,
    messageOf: capacityMessage(massUnit),
  });

// ── moulds ──────────────────────────────────────────────────────────────────

export type MouldFormValues = {
  name: string;
  material: MoldMaterial;
  capacity: string;
  capacityAlloy: string;
  hasRiser: boolean;
  coating: string;
  notes: string;
};

export const mouldFormValues = (m: Mould | undefined, units: Units): MouldFormValues => ({
  name: m?.name ?? '',
  material: m?.material ?? 'green_sand',
  capacity: massToInput(m?.capacityG, units.massUnit),
  capacityAlloy: m?.capacityAlloy ?? '',
  hasRiser: m?.hasRiser ?? false,
  coating: m?.coating ?? '',
  notes: m?.notes ?? '',
});

export const mouldFormSchema = (massUnit: MassUnit) =>
  formSchemaFor<MouldFormValues, MouldCreateInput>({
    toDraft: (v, issue) => {
      return {
        name: v.name,
        material: v.material,
        capacityG: capacityOf(v.capacity, massUnit, issue),
        capacityAlloy: v.capacityAlloy ? (findAlloy(v.capacityAlloy)?.designation ?? v.capacityAlloy) : null,
        hasRiser: v.hasRiser,
        coating: v.coating,
        notes: v.notes,
      };
    },
    schema: mouldCreateSchema,
    formPathOf: capacityPath,
    messageOf: capacityMessage(massUnit),
  });

/**
 * Only what an edit touched, keyed for the API, so a capacity shown rounded
 * in ounces is never written back over the stored grams.
 */
export function changedFields<TOut extends object>(saved: TOut, dirty: Record<string, unknown>): Partial<TOut> {
  const out: Partial<TOut> = {};
  for (const [formKey, flag] of Object.entries(dirty)) {
    if (!flag) continue;
    const apiKey = (formKey === 'capacity' ? 'capacityG' : formKey) as keyof TOut;
    if (apiKey in saved) out[apiKey] = saved[apiKey];
  }
  return out;
}
