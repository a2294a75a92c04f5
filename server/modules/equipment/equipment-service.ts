import { can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { CRUCIBLE_MATERIALS, crucibleStatusOf, cycleLimitsFor } from '../../../shared/heats/crucible-life.ts';
import type { CrucibleCycleLimits, CrucibleMaterial, CrucibleStatus } from '../../../shared/heats/crucible-life.ts';
import type {
  Crucible,
  CrucibleCreateInput,
  CrucibleDetail,
  CrucibleLimitRow,
  CrucibleLimitsUpdateInput,
  CrucibleNote,
  CrucibleNoteCreateInput,
  CrucibleUpdateInput,
  Furnace,
  FurnaceCreateInput,
  FurnaceUpdateInput,
  Mould,
  MouldCreateInput,
  MouldUpdateInput,
} from '../../../shared/heats/equipment-schemas.ts';
import { withTransaction } from '../../db/sequelize.ts';
import { AppError, forbidden, notFound } from '../../lib/app-error.ts';
import * as repo from './equipment-repository.ts';
import type { CrucibleRecord, CycleLimitRecord } from './equipment-repository.ts';

// Every member reads the equipment; casters and admins keep it. Equipment a
// heat or casting names is never deleted: the history it carries (setpoint
// offsets, cycle counts) would silently change. A worn crucible is retired.

const today = () => new Date().toISOString().slice(0, 10);

function mayRead(actor: Actor) {
  if (!can(actor, 'read', 'equipment')) throw forbidden();
}
function mayChange(actor: Actor, action: 'create' | 'update' | 'delete') {
  if (!can(actor, action, 'equipment')) throw forbidden('Only casters and admins look after the equipment');
}
const inUse = (message: string) => new AppError('equipment-in-use', message, 409);

// ── furnaces ────────────────────────────────────────────────────────────────

export async function listFurnaces(actor: Actor, workshopId: string): Promise<Furnace[]> {
  mayRead(actor);
  return repo.listFurnaces(workshopId);
}

export async function getFurnace(actor: Actor, workshopId: string, furnaceId: string): Promise<Furnace> {
  mayRead(actor);
  const furnace = await repo.findFurnace(workshopId, furnaceId);
  if (!furnace) throw notFound('Furnace', 'furnace-not-found');
  return furnace;
}

export async function createFurnace(actor: Actor, workshopId: string, input: FurnaceCreateInput): Promise<Furnace> {
  mayChange(actor, 'create');
  const id = await repo.createFurnace(workshopId, input);
  return (await repo.findFurnace(workshopId, id))!;
}

export async function updateFurnace(actor: Actor, workshopId: string, furnaceId: string, input: FurnaceUpdateInput): Promise<Furnace> {
  await getFurnace(actor, workshopId, furnaceId);
  mayChange(actor, 'update');
  await repo.updateFurnace(workshopId, furnaceId, input);
  return (await repo.findFurnace(workshopId, furnaceId))!;
}

export async function deleteFurnace(actor: Actor, workshopId: string, furnaceId: string): Promise<void> {
  const furnace = await getFurnace(actor, workshopId, furnaceId);
  mayChange(actor, 'delete');
  if (furnace.heatCount > 0) {
    throw inUse(
      `${furnace.name} has ${furnace.heatCount} heat${furnace.heatCount === 1 ? '' : 's'} in the log, which teach its setpoint offset; it can only be deleted while unused. Rename it or note in it that it is gone.`,
    );
  }
  await repo.deleteFurnace(workshopId, furnaceId);
}

// ── crucibles ───────────────────────────────────────────────────────────────

function withStanding(c: CrucibleRecord, limits: readonly CycleLimitRecord[]): Crucible {
  const { warnAt, limitAt } = cycleLimitsFor(c.material, limits);
  return { ...c, warnAt, limitAt, status: crucibleStatusOf(c, { warnAt, limitAt }) };
}

export async function listCrucibles(actor: Actor, workshopId: string): Promise<Crucible[]> {
  mayRead(actor);
  const [crucibles, limits] = await Promise.all([repo.listCrucibles(workshopId), repo.listCycleLimits(workshopId)]);
  return crucibles.map((c) => withStanding(c, limits));
}

async function crucibleOrNotFound(actor: Actor, workshopId: string, crucibleId: string): Promise<Crucible> {
  mayRead(actor);
  const [crucible, limits] = await Promise.all([repo.findCrucible(workshopId, crucibleId), repo.listCycleLimits(workshopId)]);
  if (!crucible) throw notFound('Crucible', 'crucible-not-found');
  return withStanding(crucible, limits);
}

export async function getCrucible(actor: Actor, workshopId: string, crucibleId: string): Promise<CrucibleDetail> {
  const crucible = await crucibleOrNotFound(actor, workshopId, crucibleId);
  return { ...crucible, notes: await repo.listCrucibleNotes(crucibleId) };
}

/** Retiring stamps the day unless one is given; bringing a crucible back clears it. */
function retirement(input: { retired?: boolean; retiredOn?: string | null }, current?: { retired: boolean; retiredOn: string | null }) {
  const retired = input.retired ?? (input.retiredOn ? true : (current?.retired ?? false));
  if (!retired) return { retired: false, retiredOn: null };
  return { retired: true, retiredOn: input.retiredOn ?? current?.retiredOn ?? today() };
}

export async function createCrucible(actor: Actor, workshopId: string, input: CrucibleCreateInput): Promise<CrucibleDetail> {
  mayChange(actor, 'create');
  const id = await repo.createCrucible(workshopId, { ...input, ...retirement(input) });
  return getCrucible(actor, workshopId, id);
}

export async function updateCrucible(
  actor: Actor,
  workshopId: string,
  crucibleId: string,
  input: CrucibleUpdateInput,
): Promise<CrucibleDetail> {
  const current = await crucibleOrNotFound(actor, workshopId, crucibleId);
  mayChange(actor, 'update');
  const touchesRetirement = input.retired !== undefined || input.retiredOn !== undefined;
  await repo.updateCrucible(workshopId, crucibleId, touchesRetirement ? { ...input, ...retirement(input, current) } : input);
  return getCrucible(actor, workshopId, crucibleId);
}

export async function deleteCrucible(actor: Actor, workshopId: string, crucibleId: string): Promise<void> {
  const crucible = await crucibleOrNotFound(actor, workshopId, crucibleId);
  mayChange(actor, 'delete');
  if (crucible.cycleCount > 0) {
    throw inUse(
      `${crucible.name} has been through ${crucible.cycleCount} heat${crucible.cycleCount === 1 ? '' : 's'}; retire it instead (PATCH retired: true) so its heats keep their crucible.`,
    );
  }
  await repo.deleteCrucible(workshopId, crucibleId);
}

/**
 * Anyone who melts in the workshop may record what they saw on a crucible:
 * a crack spotted by a student matters as much as one spotted by a caster.
 */
export async function addCrucibleNote(
  actor: Actor,
  workshopId: string,
  crucibleId: string,
  input: CrucibleNoteCreateInput,
): Promise<CrucibleNote> {
  await crucibleOrNotFound(actor, workshopId, crucibleId);
  if (!can(actor, 'create', 'heat')) throw forbidden('Only members who log heats add crucible notes');
  const id = await repo.addCrucibleNote({ crucibleId, notedOn: input.notedOn ?? today(), note: input.note, authorId: actor.id });
  return (await repo.listCrucibleNotes(crucibleId)).find((n) => n.id === id)!;
}

function limitRows(limits: readonly CycleLimitRecord[]): CrucibleLimitRow[] {
  return CRUCIBLE_MATERIALS.map((material) => ({ material, ...cycleLimitsFor(material, limits) }));
}

export async function getCrucibleLimits(actor: Actor, workshopId: string): Promise<CrucibleLimitRow[]> {
  mayRead(actor);
  return limitRows(await repo.listCycleLimits(workshopId));
}

export async function putCrucibleLimits(
  actor: Actor,
  workshopId: string,
  input: CrucibleLimitsUpdateInput,
): Promise<CrucibleLimitRow[]> {
  mayChange(actor, 'update');
  await withTransaction((tx) => repo.replaceCycleLimits(workshopId, input.limits, tx));
  return limitRows(await repo.listCycleLimits(workshopId));
}

// ── moulds ──────────────────────────────────────────────────────────────────

export async function listMoulds(actor: Actor, workshopId: string): Promise<Mould[]> {
  mayRead(actor);
  return repo.listMoulds(workshopId);
}

export async function getMould(actor: Actor, workshopId: string, mouldId: string): Promise<Mould> {
  mayRead(actor);
  const mould = await repo.findMould(workshopId, mouldId);
  if (!mould) throw notFound('Mould', 'mould-not-found');
  return mould;
}

export async function createMould(actor: Actor, workshopId: string, input: MouldCreateInput): Promise<Mould> {
  mayChange(actor, 'create');
  const id = await repo.createMould(workshopId, input);
  return (await repo.findMould(workshopId, id))!;
}

export async function updateMould(actor: Actor, workshopId: string, mouldId: string, input: MouldUpdateInput): Promise<Mould> {
  await getMould(actor, workshopId, mouldId);
  mayChange(actor, 'update');
  await repo.updateMould(workshopId, mouldId, input);
  return (await repo.findMould(workshopId, mouldId))!;
}

export async function deleteMould(actor: Actor, workshopId: string, mouldId: string): Promise<void> {
  const mould = await getMould(actor, workshopId, mouldId);
  mayChange(actor, 'delete');
  if (mould.castingCount > 0) {
    throw inUse(
      `${mould.name} has ${mould.castingCount} casting${mould.castingCount === 1 ? '' : 's'} in the log; it can only be deleted while unused.`,
    );
  }
  await repo.deleteMould(workshopId, mouldId);
}

// ── for the heat log (no permission check: the caller has made its own) ─────

export type CrucibleStanding = {
  id: string;
  name: string;
  material: CrucibleMaterial;
  retired: boolean;
  cycleCount: number;
  warnAt: number;
  limitAt: number;
  status: CrucibleStatus;
};

/** The workshop's furnaces, crucibles and moulds, to check and resolve references in heats. */
export async function equipmentOf(workshopId: string) {
  const [furnaces, crucibles, moulds, limits] = await Promise.all([
    repo.listFurnaces(workshopId),
    repo.listCrucibles(workshopId),
    repo.listMoulds(workshopId),
    repo.listCycleLimits(workshopId),
  ]);
  return { furnaces, crucibles: crucibles.map((c) => withStanding(c, limits)), moulds };
}

export async function crucibleStanding(workshopId: string, crucibleId: string): Promise<CrucibleStanding | null> {
  const [crucible, limits] = await Promise.all([repo.findCrucible(workshopId, crucibleId), repo.listCycleLimits(workshopId)]);
  if (!crucible) return null;
  const { id, name, material, retired, cycleCount } = crucible;
  const s = withStanding(crucible, limits);
  return { id, name, material, retired, cycleCount, warnAt: s.warnAt, limitAt: s.limitAt, status: s.status };
}

/** Cycle limits per material for this workshop, defaults filled in. */
export async function cycleLimitsOf(workshopId: string): Promise<Record<CrucibleMaterial, CrucibleCycleLimits>> {
  const limits = await repo.listCycleLimits(workshopId);
  const byMaterial = {} as Record<CrucibleMaterial, CrucibleCycleLimits>;
  for (const m of CRUCIBLE_MATERIALS) byMaterial[m] = cycleLimitsFor(m, limits);
  return byMaterial;
}
