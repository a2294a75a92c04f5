import { heatVisibilitySql, type HeatVisibility } from '../../db/heat-visibility.ts';
import { QueryTypes } from 'sequelize';
import type { ChargeKind } from '../../../shared/domain/index.ts';
import type { CrucibleMaterial } from '../../../shared/heats/crucible-life.ts';
import type { CrucibleShock, FurnaceKind } from '../../../shared/heats/equipment-schemas.ts';
import type {
  Casting,
  CastingCreateInput,
  CastingUpdateInput,
  ChargeLineInput,
  HeatCreateInput,
  HeatDetail,
  HeatFilter,
  HeatFluxKind,
  HeatSort,
  HeatUpdateInput,
  SortDirection,
} from '../../../shared/heats/heat-schemas.ts';
import { sequelize, type Tx } from '../../db/sequelize.ts';
import { CastingModel, HeatChargeLineModel, HeatModel } from './heat-model.ts';

const num = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));
const iso = (d: Date | string | null): string | null => (d === null ? null : new Date(d).toISOString());
const toDate = (s: string | null | undefined): Date | null => (s ? new Date(s) : null);
const given = <T extends object>(values: T): Partial<T> =>
  Object.fromEntries(Object.entries(values).filter(([, v]) => v !== undefined)) as Partial<T>;

/** Which heats the actor may see: the reach from accessFor plus who they are. */
export type { HeatVisibility } from '../../db/heat-visibility.ts';

/** A heat as stored, with its lines, castings and the crucible's heat number at it. */
export type HeatRecord = Omit<HeatDetail, 'castings' | 'crucible' | 'figures' | 'cautions' | 'conditions'> & {
  castings: CastingRecord[];
  crucibleCycle: number | null;
};
export type CastingRecord = Omit<Casting, 'yieldPct' | 'conditions'>;

/** A heat to write: the create input with its caster and references settled. */
export type HeatWrite = Omit<HeatCreateInput, 'casterId'> & { casterId: string };

// ── visibility and filters ──────────────────────────────────────────────────


const nextDay = (day: string) => new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000).toISOString();
const isDay = (v: string) => /^\d{4}-\d{2}-\d{2}$/.test(v);

function filterSql(f: Partial<HeatFilter>, replacements: Record<string, unknown>): string[] {
  const where: string[] = [];
  if (f.alloy) {
    where.push('h.alloy = :alloy');
    replacements.alloy = f.alloy;
  }
  if (f.casterId) {
    where.push('h.caster_id = :casterId');
    replacements.casterId = f.casterId;
  }
  if (f.furnaceId) {
    where.push('h.furnace_id = :furnaceId');
    replacements.furnaceId = f.furnaceId;
  }
  if (f.crucibleId) {
    where.push('h.crucible_id = :crucibleId');
    replacements.crucibleId = f.crucibleId;
  }
  if (f.defect) {
    where.push(`EXISTS (SELECT 1 FROM castings dc JOIN photos dp ON dp.casting_id = dc.id
                  JOIN marks dm ON dm.photo_id = dp.id WHERE dc.heat_id = h.id AND dm.defect_kind = :defect)`);
    replacements.defect = f.defect;
  }
  if (f.from) {
    where.push('h.poured_at >= :from');
    replacements.from = isDay(f.from) ? `${f.from}T00:00:00.000Z` : f.from;
  }
  if (f.to) {
    // A day is inclusive: everything before the next midnight (UTC).
    where.push('h.poured_at < :to');
    replacements.to = isDay(f.to) ? nextDay(f.to) : f.to;
  }
  return where;
}

// ── list rows ───────────────────────────────────────────────────────────────

export type HeatListRecord = {
  id: string;
  casterId: string;
  casterName: string;
  meltStartedAt: string | null;
  pouredAt: string;
  alloy: string;
  furnaceId: string | null;
  furnaceName: string | null;
  crucibleId: string | null;
  crucibleName: string | null;
  crucibleMaterial: CrucibleMaterial | null;
  setpointC: number | null;
  pourTempC: number | null;
  ambientTempC: number | null;
  relativeHumidityPct: number | null;
  fluxKind: HeatFluxKind;
  toolsPreheated: boolean | null;
  safety: { dryTools: boolean; ppe: boolean; clearFloor: boolean };
  crucibleShock: CrucibleShock;
  chargeG: number;
  /** The kinds among the charge lines, for the heat's cautions. */
  chargeKinds: ChargeKind[];
  castingCount: number;
  weighedCount: number;
  castingsG: number;
  crucibleCycle: number | null;
  /** The value the page is ordered by, for the next cursor. */
  sortValue: string | number | null;
};

/** Where the previous page ended. */
export type KeysetPosition = { value: string | number | null; id: string };

// Ordering by yield happens in SQL on the castings/charge ratio so pages can
// be cut with a keyset; the yield figure shown is still the trade core's.
// Numerics are compared as float8 so the cursor's JSON number matches exactly.
const SORT_SQL: Record<HeatSort, { expr: string; cast: string }> = {
  pouredAt: { expr: 'b.poured_at', cast: 'timestamptz' },
  meltStartedAt: { expr: 'b.melt_started_at', cast: 'timestamptz' },
  pourTempC: { expr: 'b.pour_temp_c::float8', cast: 'float8' },
  yieldPct: { expr: 'b.yield_ratio', cast: 'float8' },
};

/**
 * One page of heats in a stable order: the sort value with empty values
 * last in either direction, then the id. `after` continues past a row.
 */
export async function listHeatRows(
  workshopId: string,
  visibility: HeatVisibility,
  filter: Partial<HeatFilter> & { sort: HeatSort; dir: SortDirection },
  page: { limit: number; after?: KeysetPosition },
): Promise<HeatListRecord[]> {
  const replacements: Record<string, unknown> = { workshopId, actorId: visibility.actorId, limit: page.limit };
  const where = ['h.workshop_id = :workshopId', heatVisibilitySql(visibility), ...filterSql(filter, replacements)];
  const { expr, cast } = SORT_SQL[filter.sort];
  const cmp = filter.dir === 'asc' ? '>' : '<';
  const dir = filter.dir === 'asc' ? 'ASC' : 'DESC';
  let keyset = 'true';
  if (page.after) {
    replacements.afterId = page.after.id;
    if (page.after.value === null) {
      keyset = `(${expr} IS NULL AND b.id ${cmp} :afterId)`;
    } else {
      replacements.afterValue = page.after.value;
      keyset = `(${expr} ${cmp} CAST(:afterValue AS ${cast}) OR (${expr} = CAST(:afterValue AS ${cast}) AND b.id ${cmp} :afterId) OR ${expr} IS NULL)`;
    }
  }
  const rows = await sequelize.query<Record<string, unknown>>(
    `WITH b AS (
       SELECT h.id, h.caster_id, u.display_name AS caster_name, h.melt_started_at, h.poured_at, h.alloy,
              h.furnace_id, f.name AS furnace_name, h.crucible_id, c.name AS crucible_name, c.material AS crucible_material,
              h.setpoint_c, h.pour_temp_c, h.ambient_temp_c, h.relative_humidity_pct, h.flux_kind, h.tools_preheated,
              h.safety_dry_tools, h.safety_ppe, h.safety_clear_floor, h.crucible_shock,
              cl.charge_g, cl.charge_kinds, k.casting_count, k.weighed_count, k.castings_g,
              CASE WHEN k.casting_count > 0 AND k.weighed_count = k.casting_count AND cl.charge_g > 0
                   THEN (k.castings_g / cl.charge_g)::float8 END AS yield_ratio
         FROM heats h
         JOIN users u ON u.id = h.caster_id
         LEFT JOIN furnaces f ON f.id = h.furnace_id
         LEFT JOIN crucibles c ON c.id = h.crucible_id
         LEFT JOIN LATERAL (SELECT COALESCE(sum(l.mass_g), 0) AS charge_g,
                                   COALESCE(array_agg(DISTINCT l.kind) FILTER (WHERE l.kind IS NOT NULL), '{}') AS charge_kinds
                              FROM heat_charge_lines l WHERE l.heat_id = h.id) cl ON true
         LEFT JOIN LATERAL (SELECT count(*)::int AS casting_count, count(x.mass_g)::int AS weighed_count,
                                   COALESCE(sum(x.mass_g), 0) AS castings_g
                              FROM castings x WHERE x.heat_id = h.id) k ON true
        WHERE ${where.join(' AND ')}
     )
     SELECT b.*, ${expr} AS sort_value,
            CASE WHEN b.crucible_id IS NULL THEN NULL ELSE
              (SELECT count(*)::int FROM heats y WHERE y.crucible_id = b.crucible_id AND (y.poured_at, y.id) <= (b.poured_at, b.id))
            END AS crucible_cycle
       FROM b
      WHERE ${keyset}
      ORDER BY (${expr} IS NULL), ${expr} ${dir}, b.id ${dir}
      LIMIT :limit`,
    { replacements, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: r.id as string,
    casterId: r.caster_id as string,
    casterName: r.caster_name as string,
    meltStartedAt: iso(r.melt_started_at as Date | null),
    pouredAt: iso(r.poured_at as Date)!,
    alloy: r.alloy as string,
    furnaceId: (r.furnace_id as string | null) ?? null,
    furnaceName: (r.furnace_name as string | null) ?? null,
    crucibleId: (r.crucible_id as string | null) ?? null,
    crucibleName: (r.crucible_name as string | null) ?? null,
    crucibleMaterial: (r.crucible_material as CrucibleMaterial | null) ?? null,
    setpointC: num(r.setpoint_c),
    pourTempC: num(r.pour_temp_c),
    ambientTempC: num(r.ambient_temp_c),
    relativeHumidityPct: num(r.relative_humidity_pct),
    fluxKind: r.flux_kind as HeatFluxKind,
    toolsPreheated: r.tools_preheated as boolean | null,
    safety: { dryTools: r.safety_dry_tools as boolean, ppe: r.safety_ppe as boolean, clearFloor: r.safety_clear_floor as boolean },
    crucibleShock: r.crucible_shock as CrucibleShock,
    chargeG: num(r.charge_g) ?? 0,
    chargeKinds: (r.charge_kinds as ChargeKind[] | null) ?? [],
    castingCount: r.casting_count as number,
    weighedCount: r.weighed_count as number,
    castingsG: num(r.castings_g) ?? 0,
    crucibleCycle: num(r.crucible_cycle),
    sortValue:
      filter.sort === 'pouredAt' || filter.sort === 'meltStartedAt'
        ? iso(r.sort_value as Date | string | null)
        : num(r.sort_value),
  }));
}

// ── whole heats ─────────────────────────────────────────────────────────────

/** Heats by id with their lines and castings, in the order of `ids`; unknown ids are skipped. */
export async function loadHeats(workshopId: string, ids: readonly string[], tx?: Tx): Promise<HeatRecord[]> {
  if (ids.length === 0) return [];
  const heats = await sequelize.query<Record<string, unknown>>(
    `SELECT h.*, u.display_name AS caster_name, f.name AS furnace_name, f.kind AS furnace_kind,
            CASE WHEN h.crucible_id IS NULL THEN NULL ELSE
              (SELECT count(*)::int FROM heats y WHERE y.crucible_id = h.crucible_id AND (y.poured_at, y.id) <= (h.poured_at, h.id))
            END AS crucible_cycle
       FROM heats h
       JOIN users u ON u.id = h.caster_id
       LEFT JOIN furnaces f ON f.id = h.furnace_id
      WHERE h.workshop_id = :workshopId AND h.id IN (:ids)`,
    { replacements: { workshopId, ids }, type: QueryTypes.SELECT, transaction: tx },
  );
  if (heats.length === 0) return [];
  const found = heats.map((h) => h.id as string);
  const [lines, castings] = await Promise.all([
    sequelize.query<Record<string, unknown>>(
      `SELECT heat_id, kind, description, mass_g FROM heat_charge_lines WHERE heat_id IN (:ids) ORDER BY heat_id, position`,
      { replacements: { ids: found }, type: QueryTypes.SELECT, transaction: tx },
    ),
    sequelize.query<Record<string, unknown>>(
      `SELECT k.*, m.name AS mould_name, m.material AS mould_material, m.has_riser AS mould_has_riser
         FROM castings k LEFT JOIN moulds m ON m.id = k.mould_id
        WHERE k.heat_id IN (:ids) ORDER BY k.heat_id, k.position, k.created_at, k.id`,
      { replacements: { ids: found }, type: QueryTypes.SELECT, transaction: tx },
    ),
  ]);
  const byId = new Map(
    heats.map((h) => [
      h.id as string,
      {
        id: h.id as string,
        workshopId: h.workshop_id as string,
        casterId: h.caster_id as string,
        casterName: h.caster_name as string,
        meltStartedAt: iso(h.melt_started_at as Date | null),
        pouredAt: iso(h.poured_at as Date)!,
        alloy: h.alloy as string,
        workshopAlloyId: (h.workshop_alloy_id as string | null) ?? null,
        chargeLines: [],
        furnaceId: (h.furnace_id as string | null) ?? null,
        furnace: h.furnace_id ? { id: h.furnace_id as string, name: h.furnace_name as string, kind: h.furnace_kind as FurnaceKind } : null,
        crucibleId: (h.crucible_id as string | null) ?? null,
        crucibleCycle: num(h.crucible_cycle),
        setpointC: num(h.setpoint_c),
        peakTempC: num(h.peak_temp_c),
        pourTempC: num(h.pour_temp_c),
        fluxKind: h.flux_kind as HeatFluxKind,
        fluxAmountG: num(h.flux_amount_g),
        degassing: h.degassing as HeatRecord['degassing'],
        skimmed: h.skimmed as boolean | null,
        toolsPreheated: h.tools_preheated as boolean | null,
        ambientTempC: num(h.ambient_temp_c),
        relativeHumidityPct: num(h.relative_humidity_pct),
        crucibleRemainderG: num(h.crucible_remainder_g),
        notes: (h.notes as string | null) ?? null,
        safety: { dryTools: h.safety_dry_tools as boolean, ppe: h.safety_ppe as boolean, clearFloor: h.safety_clear_floor as boolean },
        crucibleShock: h.crucible_shock as CrucibleShock,
        castings: [],
        createdAt: iso(h.created_at as Date)!,
        updatedAt: iso(h.updated_at as Date)!,
      } satisfies HeatRecord as HeatRecord,
    ]),
  );
  for (const l of lines) {
    byId.get(l.heat_id as string)!.chargeLines.push({
      kind: l.kind as HeatRecord['chargeLines'][number]['kind'],
      description: (l.description as string | null) ?? null,
      massG: num(l.mass_g)!,
    });
  }
  for (const k of castings) byId.get(k.heat_id as string)!.castings.push(castingOf(k));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

function castingOf(k: Record<string, unknown>): CastingRecord {
  return {
    id: k.id as string,
    heatId: k.heat_id as string,
    mouldId: (k.mould_id as string | null) ?? null,
    mould: k.mould_id
      ? {
          id: k.mould_id as string,
          name: k.mould_name as string,
          material: k.mould_material as NonNullable<CastingRecord['mould']>['material'],
          hasRiser: k.mould_has_riser as boolean,
        }
      : null,
    mouldPreheatC: num(k.mould_preheat_c),
    coated: k.coated as boolean | null,
    vented: k.vented as boolean | null,
    pourHeightCm: num(k.pour_height_cm),
    sectionThicknessMm: num(k.section_thickness_mm),
    massG: num(k.mass_g),
    airCoolMin: num(k.air_cool_min),
    quenchMedium: k.quench_medium as CastingRecord['quenchMedium'],
    notes: (k.notes as string | null) ?? null,
    createdAt: iso(k.created_at as Date)!,
    updatedAt: iso(k.updated_at as Date)!,
  };
}

export async function heatOwner(workshopId: string, heatId: string): Promise<{ casterId: string } | null> {
  return HeatModel.findOne({ where: { workshopId, id: heatId }, attributes: ['casterId'], raw: true });
}

export async function castingHeat(workshopId: string, castingId: string): Promise<{ heatId: string } | null> {
  return CastingModel.findOne({ where: { workshopId, id: castingId }, attributes: ['heatId'], raw: true });
}

// ── writes ──────────────────────────────────────────────────────────────────

function heatColumns(h: Partial<HeatWrite>) {
  return given({
    casterId: h.casterId,
    meltStartedAt: h.meltStartedAt === undefined ? undefined : toDate(h.meltStartedAt),
    pouredAt: h.pouredAt === undefined ? undefined : new Date(h.pouredAt),
    alloy: h.alloy,
    furnaceId: h.furnaceId,
    crucibleId: h.crucibleId,
    setpointC: h.setpointC,
    peakTempC: h.peakTempC,
    pourTempC: h.pourTempC,
    fluxKind: h.fluxKind,
    fluxAmountG: h.fluxAmountG,
    degassing: h.degassing,
    skimmed: h.skimmed,
    toolsPreheated: h.toolsPreheated,
    ambientTempC: h.ambientTempC,
    relativeHumidityPct: h.relativeHumidityPct,
    crucibleRemainderG: h.crucibleRemainderG,
    notes: h.notes,
    safetyDryTools: h.safety?.dryTools,
    safetyPpe: h.safety?.ppe,
    safetyClearFloor: h.safety?.clearFloor,
    crucibleShock: h.crucibleShock,
  });
}

function castingColumns(k: CastingUpdateInput) {
  return given({
    mouldId: k.mouldId,
    mouldPreheatC: k.mouldPreheatC,
    coated: k.coated,
    vented: k.vented,
    pourHeightCm: k.pourHeightCm,
    sectionThicknessMm: k.sectionThicknessMm,
    massG: k.massG,
    airCoolMin: k.airCoolMin,
    quenchMedium: k.quenchMedium,
    notes: k.notes,
  });
}

const nulls = <T extends object>(o: T) =>
  Object.fromEntries(Object.entries(o).map(([k, v]) => [k, v === undefined ? null : v])) as { [K in keyof T]: Exclude<T[K], undefined> | null };

/** Inserts a heat with its charge lines and castings; returns its id. */
export async function insertHeat(workshopId: string, heat: HeatWrite, tx: Tx): Promise<string> {
  const created = await HeatModel.create(
    {
      workshopId,
      workshopAlloyId: null,
      ...nulls({
        meltStartedAt: toDate(heat.meltStartedAt),
        furnaceId: heat.furnaceId,
        crucibleId: heat.crucibleId,
        setpointC: heat.setpointC,
        peakTempC: heat.peakTempC,
        pourTempC: heat.pourTempC,
        fluxAmountG: heat.fluxAmountG,
        skimmed: heat.skimmed,
        toolsPreheated: heat.toolsPreheated,
        ambientTempC: heat.ambientTempC,
        relativeHumidityPct: heat.relativeHumidityPct,
        crucibleRemainderG: heat.crucibleRemainderG,
        notes: heat.notes,
      }),
      casterId: heat.casterId,
      pouredAt: new Date(heat.pouredAt),
      alloy: heat.alloy,
      fluxKind: heat.fluxKind,
      degassing: heat.degassing,
      safetyDryTools: heat.safety.dryTools,
      safetyPpe: heat.safety.ppe,
      safetyClearFloor: heat.safety.clearFloor,
      crucibleShock: heat.crucibleShock,
    },
    { transaction: tx },
  );
  await replaceChargeLines(created.id, heat.chargeLines, tx);
  for (const casting of heat.castings) await insertCasting(workshopId, created.id, casting, tx);
  return created.id;
}

export async function updateHeat(workshopId: string, heatId: string, changes: Partial<HeatWrite> & Pick<HeatUpdateInput, 'chargeLines'>, tx: Tx) {
  const columns = heatColumns(changes);
  if (Object.keys(columns).length) await HeatModel.update(columns, { where: { workshopId, id: heatId }, transaction: tx });
  if (changes.chargeLines) await replaceChargeLines(heatId, changes.chargeLines, tx);
}

async function replaceChargeLines(heatId: string, lines: readonly ChargeLineInput[], tx: Tx) {
  await HeatChargeLineModel.destroy({ where: { heatId }, transaction: tx });
  await HeatChargeLineModel.bulkCreate(
    lines.map((l, position) => ({ heatId, position, kind: l.kind, description: l.description ?? null, massG: l.massG })),
    { transaction: tx },
  );
}

export async function deleteHeat(workshopId: string, heatId: string): Promise<void> {
  await HeatModel.destroy({ where: { workshopId, id: heatId } });
}

export async function insertCasting(workshopId: string, heatId: string, casting: CastingCreateInput, tx: Tx): Promise<string> {
  const position = ((await CastingModel.max<number, CastingModel>('position', { where: { heatId }, transaction: tx })) ?? -1) + 1;
  const created = await CastingModel.create(
    {
      workshopId,
      heatId,
      position,
      ...nulls({
        mouldId: casting.mouldId,
        mouldPreheatC: casting.mouldPreheatC,
        coated: casting.coated,
        vented: casting.vented,
        pourHeightCm: casting.pourHeightCm,
        sectionThicknessMm: casting.sectionThicknessMm,
        massG: casting.massG,
        airCoolMin: casting.airCoolMin,
        notes: casting.notes,
      }),
      quenchMedium: casting.quenchMedium,
    },
    { transaction: tx },
  );
  return created.id;
}

export async function updateCasting(workshopId: string, castingId: string, changes: CastingUpdateInput, tx: Tx): Promise<void> {
  const columns = castingColumns(changes);
  if (Object.keys(columns).length) await CastingModel.update(columns, { where: { workshopId, id: castingId }, transaction: tx });
}

export async function deleteCasting(workshopId: string, castingId: string, tx: Tx): Promise<void> {
  await CastingModel.destroy({ where: { workshopId, id: castingId }, transaction: tx });
}

/** Serialises writes to one heat so the castings-within-charge check cannot race. */
export async function lockHeat(workshopId: string, heatId: string, tx: Tx): Promise<boolean> {
  const rows = await sequelize.query('SELECT id FROM heats WHERE workshop_id = :workshopId AND id = :heatId FOR UPDATE', {
    replacements: { workshopId, heatId },
    type: QueryTypes.SELECT,
    transaction: tx,
  });
  return rows.length > 0;
}

// ── history the suggestions learn from ──────────────────────────────────────

/** A furnace's newest heats that have both a setpoint and a measured pour temperature. */
export async function setpointHistory(workshopId: string, furnaceId: string, limit: number) {
  const rows = await sequelize.query<{ setpointC: unknown; measuredC: unknown }>(
    `SELECT setpoint_c AS "setpointC", pour_temp_c AS "measuredC"
       FROM heats
      WHERE workshop_id = :workshopId AND furnace_id = :furnaceId
        AND setpoint_c IS NOT NULL AND pour_temp_c IS NOT NULL
      ORDER BY poured_at DESC, id DESC
      LIMIT :limit`,
    { replacements: { workshopId, furnaceId, limit }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ setpointC: num(r.setpointC)!, measuredC: num(r.measuredC)! }));
}

/** Charge and cast grams of a caster's newest heats whose castings are all weighed. */
export async function yieldHistory(workshopId: string, casterId: string, limit: number) {
  const rows = await sequelize.query<{ chargeG: unknown; castingsG: unknown }>(
    `SELECT cl.charge_g AS "chargeG", k.castings_g AS "castingsG"
       FROM heats h
       JOIN LATERAL (SELECT sum(l.mass_g) AS charge_g FROM heat_charge_lines l WHERE l.heat_id = h.id) cl ON true
       JOIN LATERAL (SELECT count(*) AS n, count(x.mass_g) AS weighed, sum(x.mass_g) AS castings_g
                       FROM castings x WHERE x.heat_id = h.id) k ON true
      WHERE h.workshop_id = :workshopId AND h.caster_id = :casterId
        AND k.n > 0 AND k.weighed = k.n AND cl.charge_g > 0
      ORDER BY h.poured_at DESC, h.id DESC
      LIMIT :limit`,
    { replacements: { workshopId, casterId, limit }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ chargeG: num(r.chargeG)!, castingsG: num(r.castingsG)! }));
}

/** The caster's newest heat's id, and the mould of its latest casting. */
export async function lastHeatOf(workshopId: string, casterId: string): Promise<{ heatId: string; mouldId: string | null } | null> {
  const [row] = await sequelize.query<{ heatId: string; mouldId: string | null }>(
    `SELECT h.id AS "heatId",
            (SELECT k.mould_id FROM castings k WHERE k.heat_id = h.id AND k.mould_id IS NOT NULL
              ORDER BY k.position DESC LIMIT 1) AS "mouldId"
       FROM heats h
      WHERE h.workshop_id = :workshopId AND h.caster_id = :casterId
      ORDER BY h.poured_at DESC, h.id DESC
      LIMIT 1`,
    { replacements: { workshopId, casterId }, type: QueryTypes.SELECT },
  );
  return row ?? null;
}
