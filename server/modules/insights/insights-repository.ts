import { heatVisibilitySql, type HeatVisibility } from '../../db/heat-visibility.ts';
import { QueryTypes } from 'sequelize';
import type { CrucibleMaterial } from '../../../shared/heats/crucible-life.ts';
import type { FurnaceKind } from '../../../shared/heats/equipment-schemas.ts';
import type { InsightFilter } from '../../../shared/insights/insight-schemas.ts';
import { sequelize } from '../../db/sequelize.ts';

// Insights are a read model over the heat log, equipment and photo tables,
// read here in SQL the way the equipment module reads heats for its counts;
// no other module's repository or models are imported.

/** Which heats the reader may see: the heat log's visibility (heats-service visibilityOf). */
export type { HeatVisibility } from '../../db/heat-visibility.ts';

const num = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));
const iso = (d: Date | string) => new Date(d).toISOString();


const nextDay = (day: string) => new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000).toISOString();

/** The WHERE clause over heats h for one workshop, the reader and the filters (days in UTC, `to` inclusive, as the heat log). */
function scope(workshopId: string, visibility: HeatVisibility, f: Partial<InsightFilter>) {
  const replacements: Record<string, unknown> = { workshopId, actorId: visibility.actorId };
  const where = ['h.workshop_id = :workshopId', heatVisibilitySql(visibility)];
  if (f.alloy) {
    where.push('h.alloy = :alloy');
    replacements.alloy = f.alloy;
  }
  if (f.casterId) {
    where.push('h.caster_id = :casterId');
    replacements.casterId = f.casterId;
  }
  if (f.from) {
    where.push('h.poured_at >= :from');
    replacements.from = `${f.from}T00:00:00.000Z`;
  }
  if (f.to) {
    where.push('h.poured_at < :to');
    replacements.to = nextDay(f.to);
  }
  return { where: where.join(' AND '), replacements };
}

export type CastingFacts = {
  castingId: string;
  heatId: string;
  pouredAt: string;
  pourTempC: number | null;
  mouldPreheatC: number | null;
  /** Marks on the casting's photos by defect kind. */
  markCounts: Record<string, number>;
};

/** Every casting of the heats in scope, with its heat's pour temperature, its mould preheat and its marks by kind. */
export async function castingFacts(workshopId: string, visibility: HeatVisibility, filter: Partial<InsightFilter>): Promise<CastingFacts[]> {
  const { where, replacements } = scope(workshopId, visibility, filter);
  const rows = await sequelize.query<Record<string, unknown>>(
    `SELECT x.id AS casting_id, x.heat_id, h.poured_at, h.pour_temp_c, x.mould_preheat_c,
            COALESCE((SELECT json_object_agg(s.kind, s.n)
                        FROM (SELECT m.defect_kind AS kind, count(*)::int AS n
                                FROM photos p JOIN marks m ON m.photo_id = p.id
                               WHERE p.casting_id = x.id
                               GROUP BY m.defect_kind) s), '{}'::json) AS mark_counts
       FROM castings x
       JOIN heats h ON h.id = x.heat_id
      WHERE ${where}
      ORDER BY h.poured_at, x.position, x.id`,
    { replacements, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    castingId: r.casting_id as string,
    heatId: r.heat_id as string,
    pouredAt: iso(r.poured_at as Date),
    pourTempC: num(r.pour_temp_c),
    mouldPreheatC: num(r.mould_preheat_c),
    markCounts: (r.mark_counts as Record<string, number>) ?? {},
  }));
}

export type HeatMassFacts = {
  heatId: string;
  pouredAt: string;
  chargeG: number;
  castingCount: number;
  weighedCount: number;
  castingsG: number;
};

/** Charge and casting masses of every heat in scope. */
export async function heatMasses(workshopId: string, visibility: HeatVisibility, filter: Partial<InsightFilter>): Promise<HeatMassFacts[]> {
  const { where, replacements } = scope(workshopId, visibility, filter);
  const rows = await sequelize.query<Record<string, unknown>>(
    `SELECT h.id, h.poured_at,
            (SELECT COALESCE(sum(l.mass_g), 0) FROM heat_charge_lines l WHERE l.heat_id = h.id) AS charge_g,
            k.casting_count, k.weighed_count, k.castings_g
       FROM heats h
       JOIN LATERAL (SELECT count(*)::int AS casting_count, count(x.mass_g)::int AS weighed_count,
                            COALESCE(sum(x.mass_g), 0) AS castings_g
                       FROM castings x WHERE x.heat_id = h.id) k ON true
      WHERE ${where}
      ORDER BY h.poured_at, h.id`,
    { replacements, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    heatId: r.id as string,
    pouredAt: iso(r.poured_at as Date),
    chargeG: num(r.charge_g) ?? 0,
    castingCount: r.casting_count as number,
    weighedCount: r.weighed_count as number,
    castingsG: num(r.castings_g) ?? 0,
  }));
}

export type CrucibleFacts = {
  id: string;
  name: string;
  material: CrucibleMaterial;
  cycleCount: number;
  inServiceSince: string | null;
  retiredOn: string | null;
};

/** The workshop's crucibles with their cycle count over every heat (wear does not depend on who reads). */
export async function crucibles(workshopId: string): Promise<CrucibleFacts[]> {
  return sequelize.query<CrucibleFacts>(
    `SELECT c.id, c.name, c.material,
            (SELECT count(*)::int FROM heats y WHERE y.crucible_id = c.id) AS "cycleCount",
            to_char(c.in_service_since, 'YYYY-MM-DD') AS "inServiceSince",
            to_char(c.retired_on, 'YYYY-MM-DD') AS "retiredOn"
       FROM crucibles c
      WHERE c.workshop_id = :workshopId
      ORDER BY lower(c.name), c.id`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
}

/**
 * The heats in scope that used a crucible, each with the crucible's cycle
 * number at that heat. The number counts every heat on the crucible, in the
 * heat log's order (poured_at, id), so it matches the heat's own page.
 */
export async function crucibleCyclePoints(workshopId: string, visibility: HeatVisibility, filter: Partial<InsightFilter>) {
  const { where, replacements } = scope(workshopId, visibility, filter);
  const rows = await sequelize.query<Record<string, unknown>>(
    `WITH numbered AS (
       SELECT y.id, y.crucible_id,
              row_number() OVER (PARTITION BY y.crucible_id ORDER BY y.poured_at, y.id)::int AS cycle
         FROM heats y
        WHERE y.workshop_id = :workshopId AND y.crucible_id IS NOT NULL)
     SELECT h.id AS heat_id, h.crucible_id, h.poured_at, n.cycle
       FROM heats h JOIN numbered n ON n.id = h.id
      WHERE ${where}
      ORDER BY h.crucible_id, h.poured_at, h.id`,
    { replacements, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    heatId: r.heat_id as string,
    crucibleId: r.crucible_id as string,
    pouredAt: iso(r.poured_at as Date),
    cycle: r.cycle as number,
  }));
}

/** Dated condition notes on the workshop's crucibles, within the date range when one is given. */
export async function crucibleNotes(workshopId: string, filter: Pick<Partial<InsightFilter>, 'from' | 'to'>) {
  const where = ['c.workshop_id = :workshopId'];
  if (filter.from) where.push('n.noted_on >= CAST(:from AS date)');
  if (filter.to) where.push('n.noted_on <= CAST(:to AS date)');
  return sequelize.query<{ id: string; crucibleId: string; notedOn: string; note: string }>(
    `SELECT n.id, n.crucible_id AS "crucibleId", to_char(n.noted_on, 'YYYY-MM-DD') AS "notedOn", n.note
       FROM crucible_notes n JOIN crucibles c ON c.id = n.crucible_id
      WHERE ${where.join(' AND ')}
      ORDER BY n.noted_on, n.created_at, n.id`,
    { replacements: { workshopId, from: filter.from ?? null, to: filter.to ?? null }, type: QueryTypes.SELECT },
  );
}

export type FurnaceReading = {
  heatId: string;
  furnaceId: string;
  furnaceName: string;
  furnaceKind: FurnaceKind;
  pouredAt: string;
  setpointC: number;
  pourTempC: number;
};

/** Heats in scope on a furnace with both a setpoint and a measured pour temperature. */
export async function furnaceReadings(workshopId: string, visibility: HeatVisibility, filter: Partial<InsightFilter>): Promise<FurnaceReading[]> {
  const { where, replacements } = scope(workshopId, visibility, filter);
  const rows = await sequelize.query<Record<string, unknown>>(
    `SELECT h.id, h.furnace_id, f.name, f.kind, h.poured_at, h.setpoint_c, h.pour_temp_c
       FROM heats h JOIN furnaces f ON f.id = h.furnace_id
      WHERE ${where} AND h.setpoint_c IS NOT NULL AND h.pour_temp_c IS NOT NULL
      ORDER BY lower(f.name), f.id, h.poured_at, h.id`,
    { replacements, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    heatId: r.id as string,
    furnaceId: r.furnace_id as string,
    furnaceName: r.name as string,
    furnaceKind: r.kind as FurnaceKind,
    pouredAt: iso(r.poured_at as Date),
    setpointC: num(r.setpoint_c)!,
    pourTempC: num(r.pour_temp_c)!,
  }));
}
