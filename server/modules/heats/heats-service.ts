import { z } from 'zod';
import { accessFor, can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { chargeFor, median, suggestSetpoint } from '../../../shared/domain/index.ts';
import type { CrucibleCycleLimits, CrucibleMaterial } from '../../../shared/heats/crucible-life.ts';
import { heatConditionsOf } from '../../../shared/heats/heat-conditions-of.ts';
import {
  castingYieldPct,
  castingsTotalG,
  cavityMassG,
  chargeTotalG,
  heatCautionsOf,
  heatFiguresOf,
} from '../../../shared/heats/heat-figures.ts';
import {
  CHARGE_PLAN_HISTORY_HEATS,
  DEFAULT_EXPECTED_YIELD_PCT,
  HEAT_SORTS,
  SETPOINT_HISTORY_HEATS,
  SORT_DIRECTIONS,
  heatConsistencyIssues,
} from '../../../shared/heats/heat-schemas.ts';
import type {
  Casting,
  CastingCreateInput,
  CastingUpdateInput,
  ChargePlan,
  ChargePlanQuery,
  HeatCreateInput,
  HeatDefaults,
  HeatDetail,
  HeatFilter,
  HeatListQuery,
  HeatPage,
  HeatRow,
  HeatSort,
  HeatUpdateInput,
  SetpointAdvice,
  SortDirection,
} from '../../../shared/heats/heat-schemas.ts';
import { withTransaction, type Tx } from '../../db/sequelize.ts';
import { AppError, forbidden, notFound } from '../../lib/app-error.ts';
import * as equipmentService from '../equipment/equipment-service.ts';
import type { CrucibleStanding } from '../equipment/equipment-service.ts';
import * as workshopsService from '../workshops/workshops-service.ts';
import * as repo from './heats-repository.ts';
import type { HeatListRecord, HeatRecord, HeatVisibility, HeatWrite, KeysetPosition } from './heats-repository.ts';

// A heat the actor may not read answers exactly like a missing one, so ids
// of other people's heats reveal nothing. Reading but not changing (a mentor
// on a mentee's heat) is a 403.

export type Issue = { path: (string | number)[]; message: string };

/** A 400 naming the fields, in the same shape as a schema failure. */
export function invalid(issues: readonly Issue[]): never {
  throw new z.ZodError(issues.map((i) => ({ code: 'custom' as const, path: i.path, message: i.message, input: undefined })));
}

const heatNotFound = () => notFound('Heat', 'heat-not-found');

export function visibilityOf(actor: Actor): HeatVisibility {
  return { access: accessFor(actor, 'read', 'heat'), actorId: actor.id };
}

async function ownerOf(workshopId: string, casterId: string) {
  return { ownerId: casterId, ownerMentorIds: await workshopsService.mentorIdsOf(workshopId, casterId) };
}

/** The heat's owner when the actor may read the heat; otherwise the same 404 as a missing heat. */
async function readableOwner(actor: Actor, workshopId: string, heatId: string) {
  const heat = await repo.heatOwner(workshopId, heatId);
  if (!heat) throw heatNotFound();
  const owner = await ownerOf(workshopId, heat.casterId);
  if (!can(actor, 'read', 'heat', owner)) throw heatNotFound();
  return owner;
}

async function loadOne(workshopId: string, heatId: string, tx?: Tx): Promise<HeatRecord> {
  const [record] = await repo.loadHeats(workshopId, [heatId], tx);
  if (!record) throw heatNotFound();
  return record;
}

// ── reading ─────────────────────────────────────────────────────────────────

/** A stored heat with every figure, caution and the HeatConditions mapping. */
export function toHeatDetail(record: HeatRecord, crucible: CrucibleStanding | null): HeatDetail {
  const { crucibleCycle, ...heat } = record;
  const chargeG = chargeTotalG(heat.chargeLines);
  const castingsG = castingsTotalG(heat.castings);
  const mapped = { ...heat, crucibleCycle };
  const conditions = heatConditionsOf(mapped);
  const castings: Casting[] = heat.castings.map((k) => ({
    ...k,
    yieldPct: castingYieldPct(chargeG, k.massG),
    conditions: heatConditionsOf(mapped, k),
  }));
  return {
    ...heat,
    crucible: crucible && {
      id: crucible.id,
      name: crucible.name,
      material: crucible.material,
      cycleCount: crucible.cycleCount,
      warnAt: crucible.warnAt,
      limitAt: crucible.limitAt,
      status: crucible.status,
    },
    castings,
    figures: heatFiguresOf({ ...mapped, chargeG, castingsG }),
    cautions: heatCautionsOf({
      ...heat,
      conditions: [conditions, ...castings.map((k) => k.conditions)],
      crucibleLimits: crucible && { warnAt: crucible.warnAt, limitAt: crucible.limitAt },
    }),
    conditions,
  };
}

export async function detailOf(workshopId: string, record: HeatRecord): Promise<HeatDetail> {
  const crucible = record.crucibleId ? await equipmentService.crucibleStanding(workshopId, record.crucibleId) : null;
  return toHeatDetail(record, crucible);
}

export async function getHeat(actor: Actor, workshopId: string, heatId: string): Promise<HeatDetail> {
  await readableOwner(actor, workshopId, heatId);
  return detailOf(workshopId, await loadOne(workshopId, heatId));
}

function toHeatRow(r: HeatListRecord, limits: Record<CrucibleMaterial, CrucibleCycleLimits>): HeatRow {
  const castingsG = r.castingCount > 0 && r.weighedCount === r.castingCount ? r.castingsG : null;
  const f = heatFiguresOf({ ...r, chargeG: r.chargeG, castingsG });
  return {
    id: r.id,
    casterId: r.casterId,
    casterName: r.casterName,
    meltStartedAt: r.meltStartedAt,
    pouredAt: r.pouredAt,
    alloy: r.alloy,
    furnaceId: r.furnaceId,
    furnaceName: r.furnaceName,
    crucibleId: r.crucibleId,
    crucibleName: r.crucibleName,
    setpointC: r.setpointC,
    pourTempC: r.pourTempC,
    castingCount: r.castingCount,
    figures: {
      chargeG: f.chargeG,
      castingsG: f.castingsG,
      yieldPct: f.yieldPct,
      remainderG: f.remainderG,
      superheatC: f.superheatC,
      holdTimeMin: f.holdTimeMin,
    },
    cautionIds: heatCautionsOf({
      ...r,
      conditions: [heatConditionsOf({ ...r, chargeLines: r.chargeKinds.map((kind) => ({ kind })) })],
      crucibleLimits: r.crucibleMaterial ? limits[r.crucibleMaterial] : null,
    }).map((c) => c.id),
  };
}

// The cursor carries the sort it was made for, the last row's sort value and
// id; base64url JSON so clients treat it as opaque.
const cursorSchema = z.object({
  s: z.enum(HEAT_SORTS),
  d: z.enum(SORT_DIRECTIONS),
  v: z.union([z.iso.datetime(), z.number(), z.null()]),
  id: z.uuid(),
});

function encodeCursor(sort: HeatSort, dir: SortDirection, row: HeatListRecord): string {
  return Buffer.from(JSON.stringify({ s: sort, d: dir, v: row.sortValue, id: row.id })).toString('base64url');
}

function decodeCursor(cursor: string, sort: HeatSort, dir: SortDirection): KeysetPosition {
  let parsed: z.infer<typeof cursorSchema>;
  try {
    parsed = cursorSchema.parse(JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')));
  } catch {
    return invalid([{ path: ['cursor'], message: 'This cursor is not valid; start again from the first page' }]);
  }
  if (parsed.s !== sort || parsed.d !== dir) {
    invalid([{ path: ['cursor'], message: 'This cursor belongs to another sort order; start again from the first page' }]);
  }
  const timeSort = sort === 'pouredAt' || sort === 'meltStartedAt';
  if (parsed.v !== null && timeSort !== (typeof parsed.v === 'string')) {
    invalid([{ path: ['cursor'], message: 'This cursor is not valid; start again from the first page' }]);
  }
  return { value: parsed.v, id: parsed.id };
}

export async function listHeats(actor: Actor, workshopId: string, query: HeatListQuery): Promise<HeatPage> {
  const after = query.cursor ? decodeCursor(query.cursor, query.sort, query.dir) : undefined;
  const [rows, limits] = await Promise.all([
    repo.listHeatRows(workshopId, visibilityOf(actor), query, { limit: query.limit + 1, after }),
    equipmentService.cycleLimitsOf(workshopId),
  ]);
  const page = rows.slice(0, query.limit);
  const more = rows.length > query.limit;
  return {
    items: page.map((r) => toHeatRow(r, limits)),
    nextCursor: more ? encodeCursor(query.sort, query.dir, page[page.length - 1]) : null,
  };
}

/** A bound on one export, far above a small shop's log; filter by dates beyond it. */
const EXPORT_MAX_HEATS = 50_000;

/** Every heat the actor may read that matches, in the list's order, with full detail (for the CSV export). */
export async function heatsForExport(actor: Actor, workshopId: string, filter: HeatFilter): Promise<HeatDetail[]> {
  const rows = await repo.listHeatRows(workshopId, visibilityOf(actor), filter, { limit: EXPORT_MAX_HEATS });
  const [records, equipment] = await Promise.all([
    repo.loadHeats(workshopId, rows.map((r) => r.id)),
    equipmentService.equipmentOf(workshopId),
  ]);
  const crucibles = new Map(equipment.crucibles.map((c) => [c.id, c]));
  return records.map((r) => toHeatDetail(r, r.crucibleId ? (crucibles.get(r.crucibleId) ?? null) : null));
}

// ── checking a heat before it is written ────────────────────────────────────

type Equipment = Awaited<ReturnType<typeof equipmentService.equipmentOf>>;

/** References to equipment must name this workshop's furnaces, crucibles and moulds. */
export function referenceIssues(
  heat: { furnaceId?: string | null; crucibleId?: string | null; castings?: readonly { mouldId?: string | null }[] },
  equipment: Equipment,
  castingPath: (i: number) => (string | number)[] = (i) => ['castings', i, 'mouldId'],
): Issue[] {
  const issues: Issue[] = [];
  if (heat.furnaceId && !equipment.furnaces.some((f) => f.id === heat.furnaceId)) {
    issues.push({ path: ['furnaceId'], message: 'No such furnace in this workshop' });
  }
  if (heat.crucibleId && !equipment.crucibles.some((c) => c.id === heat.crucibleId)) {
    issues.push({ path: ['crucibleId'], message: 'No such crucible in this workshop' });
  }
  heat.castings?.forEach((k, i) => {
    if (k.mouldId && !equipment.moulds.some((m) => m.id === k.mouldId)) {
      issues.push({ path: castingPath(i), message: 'No such mould in this workshop' });
    }
  });
  return issues;
}

/**
 * Whether the actor may log (or move) a heat as `casterId`'s: their own
 * always; someone else's only with the right to change that person's heats
 * (admins). The caster must be a member.
 */
export async function casterIssue(actor: Actor, workshopId: string, casterId: string): Promise<Issue | 'forbidden' | null> {
  if (casterId === actor.id) return null;
  const role = await workshopsService.findRole(workshopId, casterId);
  if (!role) return { path: ['casterId'], message: 'That person is not a member of this workshop' };
  if (!can(actor, 'update', 'heat', await ownerOf(workshopId, casterId))) return 'forbidden';
  return null;
}

const othersHeatsForbidden = () => forbidden('Only admins log heats for other members');

// ── writing ─────────────────────────────────────────────────────────────────

export async function createHeat(actor: Actor, workshopId: string, input: HeatCreateInput): Promise<HeatDetail> {
  if (!can(actor, 'create', 'heat')) throw forbidden();
  const casterId = input.casterId ?? actor.id;
  const caster = await casterIssue(actor, workshopId, casterId);
  if (caster === 'forbidden') throw othersHeatsForbidden();
  const issues = [...(caster ? [caster] : []), ...referenceIssues(input, await equipmentService.equipmentOf(workshopId))];
  if (issues.length) invalid(issues);
  const id = await withTransaction((tx) => repo.insertHeat(workshopId, { ...input, casterId }, tx));
  return detailOf(workshopId, await loadOne(workshopId, id));
}

/** Inserts already-checked heats in one transaction (the CSV import). */
export async function insertCheckedHeats(workshopId: string, heats: readonly HeatWrite[]): Promise<string[]> {
  return withTransaction(async (tx) => {
    const ids: string[] = [];
    for (const heat of heats) ids.push(await repo.insertHeat(workshopId, heat, tx));
    return ids;
  });
}

async function changeableOwner(actor: Actor, workshopId: string, heatId: string, action: 'update' | 'delete') {
  const owner = await readableOwner(actor, workshopId, heatId);
  if (!can(actor, action, 'heat', owner)) {
    throw forbidden(action === 'update' ? 'You can read this heat but not change it' : 'You can read this heat but not delete it');
  }
  return owner;
}

export async function updateHeat(actor: Actor, workshopId: string, heatId: string, input: HeatUpdateInput): Promise<HeatDetail> {
  const owner = await changeableOwner(actor, workshopId, heatId, 'update');
  if (input.casterId && input.casterId !== owner.ownerId) {
    const caster = await casterIssue(actor, workshopId, input.casterId);
    if (caster === 'forbidden') throw forbidden('Only admins move heats to other members');
    if (caster) invalid([caster]);
  }
  const refs = referenceIssues(input, await equipmentService.equipmentOf(workshopId));
  if (refs.length) invalid(refs);
  await withTransaction(async (tx) => {
    if (!(await repo.lockHeat(workshopId, heatId, tx))) throw heatNotFound();
    const current = await loadOne(workshopId, heatId, tx);
    const issues = heatConsistencyIssues({
      meltStartedAt: input.meltStartedAt !== undefined ? input.meltStartedAt : current.meltStartedAt,
      pouredAt: input.pouredAt ?? current.pouredAt,
      chargeLines: input.chargeLines ?? current.chargeLines,
      castings: current.castings,
    });
    if (issues.length) invalid(issues.map((i) => (i.path[0] === 'castings' && input.chargeLines ? { ...i, path: ['chargeLines'] } : i)));
    const { safety, ...rest } = input;
    await repo.updateHeat(workshopId, heatId, { ...rest, safety: safety && { ...current.safety, ...safety } }, tx);
  });
  return detailOf(workshopId, await loadOne(workshopId, heatId));
}

export async function deleteHeat(actor: Actor, workshopId: string, heatId: string): Promise<void> {
  await changeableOwner(actor, workshopId, heatId, 'delete');
  await repo.deleteHeat(workshopId, heatId);
}

// ── castings (permissions follow the heat) ──────────────────────────────────

async function castingDetail(workshopId: string, heatId: string, castingId: string): Promise<Casting> {
  const detail = await detailOf(workshopId, await loadOne(workshopId, heatId));
  return detail.castings.find((k) => k.id === castingId)!;
}

function castingIssues(current: HeatRecord, castings: readonly { massG?: number | null }[], path: (string | number)[]): Issue[] {
  return heatConsistencyIssues({ ...current, castings }).map((i) => ({ ...i, path }));
}

export async function addCasting(actor: Actor, workshopId: string, heatId: string, input: CastingCreateInput): Promise<Casting> {
  await changeableOwner(actor, workshopId, heatId, 'update');
  const refs = referenceIssues({ castings: [input] }, await equipmentService.equipmentOf(workshopId), () => ['mouldId']);
  if (refs.length) invalid(refs);
  const castingId = await withTransaction(async (tx) => {
    if (!(await repo.lockHeat(workshopId, heatId, tx))) throw heatNotFound();
    const current = await loadOne(workshopId, heatId, tx);
    const issues = castingIssues(current, [...current.castings, input], ['massG']);
    if (issues.length) invalid(issues);
    return repo.insertCasting(workshopId, heatId, input, tx);
  });
  return castingDetail(workshopId, heatId, castingId);
}

/** The heat a casting belongs to, when the actor may change it; an unreadable heat hides the casting too. */
async function changeableCastingHeat(actor: Actor, workshopId: string, castingId: string): Promise<string> {
  const casting = await repo.castingHeat(workshopId, castingId);
  const heat = casting && (await repo.heatOwner(workshopId, casting.heatId));
  if (!casting || !heat) throw notFound('Casting', 'casting-not-found');
  const owner = await ownerOf(workshopId, heat.casterId);
  if (!can(actor, 'read', 'heat', owner)) throw notFound('Casting', 'casting-not-found');
  // A casting is part of its heat: changing or removing one changes the heat.
  if (!can(actor, 'update', 'heat', owner)) throw forbidden('You can read this heat but not change it');
  return casting.heatId;
}

export async function updateCasting(actor: Actor, workshopId: string, castingId: string, input: CastingUpdateInput): Promise<Casting> {
  const heatId = await changeableCastingHeat(actor, workshopId, castingId);
  const refs = referenceIssues({ castings: [input] }, await equipmentService.equipmentOf(workshopId), () => ['mouldId']);
  if (refs.length) invalid(refs);
  await withTransaction(async (tx) => {
    await repo.lockHeat(workshopId, heatId, tx);
    const current = await loadOne(workshopId, heatId, tx);
    const castings = current.castings.map((k) => (k.id === castingId ? { ...k, ...input } : k));
    const issues = castingIssues(current, castings, ['massG']);
    if (issues.length) invalid(issues);
    await repo.updateCasting(workshopId, castingId, input, tx);
  });
  return castingDetail(workshopId, heatId, castingId);
}

export async function deleteCasting(actor: Actor, workshopId: string, castingId: string): Promise<void> {
  await changeableCastingHeat(actor, workshopId, castingId);
  await withTransaction((tx) => repo.deleteCasting(workshopId, castingId, tx));
}

// ── suggestions from the log ────────────────────────────────────────────────

/** The caster's last heat's choices, to start a new heat form from. */
export async function lastDefaults(actor: Actor, workshopId: string, casterId = actor.id): Promise<HeatDefaults> {
  if (casterId !== actor.id && !can(actor, 'read', 'heat', await ownerOf(workshopId, casterId))) {
    throw forbidden('You cannot see that member’s heats');
  }
  const last = await repo.lastHeatOf(workshopId, casterId);
  const record = last ? (await repo.loadHeats(workshopId, [last.heatId]))[0] : undefined;
  if (!last || !record) {
    return {
      basedOnHeatId: null,
      alloy: null,
      furnaceId: null,
      crucibleId: null,
      setpointC: null,
      fluxKind: null,
      fluxAmountG: null,
      degassing: null,
      mouldId: null,
    };
  }
  const crucible = record.crucibleId ? await equipmentService.crucibleStanding(workshopId, record.crucibleId) : null;
  return {
    basedOnHeatId: record.id,
    alloy: record.alloy,
    furnaceId: record.furnaceId,
    // A crucible retired since the last heat must not be offered again.
    crucibleId: crucible && !crucible.retired ? crucible.id : null,
    setpointC: record.setpointC,
    fluxKind: record.fluxKind,
    fluxAmountG: record.fluxAmountG,
    degassing: record.degassing,
    mouldId: last.mouldId,
  };
}

/**
 * The setpoint that should bring this furnace's metal to `targetC`, from its
 * newest heats with both readings. The offset is a property of the furnace,
 * so every member's heats on it count; only the aggregate is returned.
 */
export async function setpointAdvice(actor: Actor, workshopId: string, furnaceId: string, targetC: number): Promise<SetpointAdvice> {
  await equipmentService.getFurnace(actor, workshopId, furnaceId);
  const history = await repo.setpointHistory(workshopId, furnaceId, SETPOINT_HISTORY_HEATS);
  return { furnaceId, targetC, ...suggestSetpoint({ targetC, history }) };
}

/** Grams to weigh out for one pour into a mould, at the caster's usual yield. */
export async function chargePlan(actor: Actor, workshopId: string, mouldId: string, query: ChargePlanQuery): Promise<ChargePlan> {
  const mould = await equipmentService.getMould(actor, workshopId, mouldId);
  const casterId = query.casterId ?? actor.id;
  if (casterId !== actor.id && !can(actor, 'read', 'heat', await ownerOf(workshopId, casterId))) {
    throw forbidden('You cannot see that member’s heats');
  }
  if (mould.capacityG === null) {
    throw new AppError('mould-capacity-unknown', `Record what ${mould.name} holds (capacity in g) to plan a charge for it`, 422);
  }
  const alloy = query.alloy ?? mould.capacityAlloy;
  const castingG = cavityMassG({ capacityG: mould.capacityG, capacityAlloy: mould.capacityAlloy }, alloy);
  const yields = (await repo.yieldHistory(workshopId, casterId, CHARGE_PLAN_HISTORY_HEATS))
    .map((h) => castingYieldPct(h.chargeG, h.castingsG))
    .filter((y): y is number => y !== null && y > 0);
  const expectedYieldPct = yields.length ? median(yields) : DEFAULT_EXPECTED_YIELD_PCT;
  return {
    mouldId,
    casterId,
    alloy,
    castingG,
    expectedYieldPct,
    marginPct: query.marginPct,
    chargeG: chargeFor({ castingG, expectedYieldPct, marginPct: query.marginPct }),
    basis: yields.length ? 'caster-median' : 'default',
    samples: yields.length,
  };
}
