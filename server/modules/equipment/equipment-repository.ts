import { QueryTypes } from 'sequelize';
import type { MoldMaterial } from '../../../shared/domain/index.ts';
import type { CrucibleMaterial } from '../../../shared/heats/crucible-life.ts';
import type {
  CrucibleCreateInput,
  CrucibleNote,
  CrucibleShock,
  CrucibleUpdateInput,
  Furnace,
  FurnaceCreateInput,
  FurnaceUpdateInput,
  Mould,
  MouldCreateInput,
  MouldUpdateInput,
} from '../../../shared/heats/equipment-schemas.ts';
import { sequelize, type Tx } from '../../db/sequelize.ts';
import { CrucibleCycleLimitModel, CrucibleModel, CrucibleNoteModel } from './crucible-model.ts';
import { FurnaceModel } from './furnace-model.ts';
import { MouldModel } from './mould-model.ts';

// Usage counts (heats per furnace, cycles per crucible, castings per mould)
// are read from the heat log's tables in SQL: they are derived, never stored,
// and reading them here keeps the equipment module free of the heats module.

const num = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));
const iso = (d: Date | string) => new Date(d).toISOString();
/** Keys of an update that were given; undefined means "leave as is". */
const given = <T extends object>(values: T): Partial<T> =>
  Object.fromEntries(Object.entries(values).filter(([, v]) => v !== undefined)) as Partial<T>;

// ── furnaces ────────────────────────────────────────────────────────────────

type FurnaceRow = Omit<Furnace, 'createdAt' | 'updatedAt'> & { createdAt: Date; updatedAt: Date };

export async function listFurnaces(workshopId: string, furnaceId?: string): Promise<Furnace[]> {
  const rows = await sequelize.query<FurnaceRow>(
    `SELECT f.id, f.name, f.kind, f.notes, f.created_at AS "createdAt", f.updated_at AS "updatedAt",
            (SELECT count(*)::int FROM heats h WHERE h.furnace_id = f.id) AS "heatCount"
       FROM furnaces f
      WHERE f.workshop_id = :workshopId ${furnaceId ? 'AND f.id = :furnaceId' : ''}
      ORDER BY lower(f.name), f.id`,
    { replacements: { workshopId, furnaceId: furnaceId ?? null }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, createdAt: iso(r.createdAt), updatedAt: iso(r.updatedAt) }));
}

export async function findFurnace(workshopId: string, furnaceId: string): Promise<Furnace | null> {
  return (await listFurnaces(workshopId, furnaceId))[0] ?? null;
}

export async function createFurnace(workshopId: string, input: FurnaceCreateInput): Promise<string> {
  const f = await FurnaceModel.create({ workshopId, name: input.name, kind: input.kind, notes: input.notes ?? null });
  return f.id;
}

export async function updateFurnace(workshopId: string, furnaceId: string, input: FurnaceUpdateInput): Promise<void> {
  await FurnaceModel.update(given(input), { where: { workshopId, id: furnaceId } });
}

export async function deleteFurnace(workshopId: string, furnaceId: string): Promise<void> {
  await FurnaceModel.destroy({ where: { workshopId, id: furnaceId } });
}

// ── crucibles ───────────────────────────────────────────────────────────────

/** A crucible as stored plus its derived cycle count and latest shock; limits and status are the service's. */
export type CrucibleRecord = {
  id: string;
  name: string;
  material: CrucibleMaterial;
  capacityG: number | null;
  inServiceSince: string | null;
  retired: boolean;
  retiredOn: string | null;
  cycleCount: number;
  lastShock: { heatId: string; kind: CrucibleShock; pouredAt: string } | null;
  createdAt: string;
  updatedAt: string;
};

type CrucibleRow = Omit<CrucibleRecord, 'lastShock' | 'createdAt' | 'updatedAt'> & {
  shockHeatId: string | null;
  shockKind: CrucibleShock | null;
  shockPouredAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
};

export async function listCrucibles(workshopId: string, crucibleId?: string): Promise<CrucibleRecord[]> {
  const rows = await sequelize.query<CrucibleRow>(
    `SELECT c.id, c.name, c.material, c.capacity_g AS "capacityG",
            to_char(c.in_service_since, 'YYYY-MM-DD') AS "inServiceSince",
            c.retired, to_char(c.retired_on, 'YYYY-MM-DD') AS "retiredOn",
            c.created_at AS "createdAt", c.updated_at AS "updatedAt",
            (SELECT count(*)::int FROM heats h WHERE h.crucible_id = c.id) AS "cycleCount",
            s.id AS "shockHeatId", s.crucible_shock AS "shockKind", s.poured_at AS "shockPouredAt"
       FROM crucibles c
       LEFT JOIN LATERAL (
              SELECT h.id, h.crucible_shock, h.poured_at FROM heats h
               WHERE h.crucible_id = c.id AND h.crucible_shock <> 'none'
               ORDER BY h.poured_at DESC, h.id DESC LIMIT 1) s ON true
      WHERE c.workshop_id = :workshopId ${crucibleId ? 'AND c.id = :crucibleId' : ''}
      ORDER BY c.retired, lower(c.name), c.id`,
    { replacements: { workshopId, crucibleId: crucibleId ?? null }, type: QueryTypes.SELECT },
  );
  return rows.map(({ shockHeatId, shockKind, shockPouredAt, ...r }) => ({
    ...r,
    capacityG: num(r.capacityG),
    lastShock: shockHeatId && shockKind && shockPouredAt ? { heatId: shockHeatId, kind: shockKind, pouredAt: iso(shockPouredAt) } : null,
    createdAt: iso(r.createdAt),
    updatedAt: iso(r.updatedAt),
  }));
}

export async function findCrucible(workshopId: string, crucibleId: string): Promise<CrucibleRecord | null> {
  return (await listCrucibles(workshopId, crucibleId))[0] ?? null;
}

export async function createCrucible(
  workshopId: string,
  input: CrucibleCreateInput & { retired: boolean; retiredOn: string | null },
): Promise<string> {
  const c = await CrucibleModel.create({
    workshopId,
    name: input.name,
    material: input.material,
    capacityG: input.capacityG ?? null,
    inServiceSince: input.inServiceSince ?? null,
    retired: input.retired,
    retiredOn: input.retiredOn,
  });
  return c.id;
}

export async function updateCrucible(workshopId: string, crucibleId: string, input: CrucibleUpdateInput): Promise<void> {
  await CrucibleModel.update(given(input), { where: { workshopId, id: crucibleId } });
}

export async function deleteCrucible(workshopId: string, crucibleId: string): Promise<void> {
  await CrucibleModel.destroy({ where: { workshopId, id: crucibleId } });
}

export async function listCrucibleNotes(crucibleId: string): Promise<CrucibleNote[]> {
  const rows = await sequelize.query<Omit<CrucibleNote, 'createdAt'> & { createdAt: Date }>(
    `SELECT n.id, to_char(n.noted_on, 'YYYY-MM-DD') AS "notedOn", n.note, n.author_id AS "authorId",
            u.display_name AS "authorName", n.created_at AS "createdAt"
       FROM crucible_notes n LEFT JOIN users u ON u.id = n.author_id
      WHERE n.crucible_id = :crucibleId
      ORDER BY n.noted_on DESC, n.created_at DESC, n.id`,
    { replacements: { crucibleId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, createdAt: iso(r.createdAt) }));
}

export async function addCrucibleNote(values: { crucibleId: string; notedOn: string; note: string; authorId: string }): Promise<string> {
  const n = await CrucibleNoteModel.create(values);
  return n.id;
}

export type CycleLimitRecord = { material: CrucibleMaterial; warnAt: number; limitAt: number };

export async function listCycleLimits(workshopId: string): Promise<CycleLimitRecord[]> {
  return CrucibleCycleLimitModel.findAll({
    where: { workshopId },
    attributes: ['material', 'warnAt', 'limitAt'],
    order: [['material', 'ASC']],
    raw: true,
  });
}

export async function replaceCycleLimits(workshopId: string, limits: readonly CycleLimitRecord[], tx: Tx): Promise<void> {
  await CrucibleCycleLimitModel.destroy({ where: { workshopId }, transaction: tx });
  if (limits.length) {
    await CrucibleCycleLimitModel.bulkCreate(
      limits.map((l) => ({ workshopId, material: l.material, warnAt: l.warnAt, limitAt: l.limitAt })),
      { transaction: tx },
    );
  }
}

// ── moulds ──────────────────────────────────────────────────────────────────

type MouldRow = Omit<Mould, 'createdAt' | 'updatedAt'> & { createdAt: Date; updatedAt: Date };

export async function listMoulds(workshopId: string, mouldId?: string): Promise<Mould[]> {
  const rows = await sequelize.query<MouldRow>(
    `SELECT m.id, m.name, m.material, m.capacity_g AS "capacityG", m.capacity_alloy AS "capacityAlloy",
            m.has_riser AS "hasRiser", m.coating, m.notes, m.created_at AS "createdAt", m.updated_at AS "updatedAt",
            (SELECT count(*)::int FROM castings k WHERE k.mould_id = m.id) AS "castingCount"
       FROM moulds m
      WHERE m.workshop_id = :workshopId ${mouldId ? 'AND m.id = :mouldId' : ''}
      ORDER BY lower(m.name), m.id`,
    { replacements: { workshopId, mouldId: mouldId ?? null }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, capacityG: num(r.capacityG), createdAt: iso(r.createdAt), updatedAt: iso(r.updatedAt) }));
}

export async function findMould(workshopId: string, mouldId: string): Promise<Mould | null> {
  return (await listMoulds(workshopId, mouldId))[0] ?? null;
}

export async function createMould(workshopId: string, input: MouldCreateInput & { material: MoldMaterial }): Promise<string> {
  const m = await MouldModel.create({
    workshopId,
    name: input.name,
    material: input.material,
    capacityG: input.capacityG ?? null,
    capacityAlloy: input.capacityAlloy ?? null,
    hasRiser: input.hasRiser ?? false,
    coating: input.coating ?? null,
    notes: input.notes ?? null,
  });
  return m.id;
}

export async function updateMould(workshopId: string, mouldId: string, input: MouldUpdateInput): Promise<void> {
  await MouldModel.update(given(input), { where: { workshopId, id: mouldId } });
}

export async function deleteMould(workshopId: string, mouldId: string): Promise<void> {
  await MouldModel.destroy({ where: { workshopId, id: mouldId } });
}
