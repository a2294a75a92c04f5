import type { Actor } from '../../../shared/auth/roles.ts';
import { median } from '../../../shared/domain/index.ts';
import { defectFrequencyOf, defectRatesByBand, yieldTrendOf } from '../../../shared/insights/insight-aggregates.ts';
import {
  MOULD_PREHEAT_BAND_WIDTH_C,
  POUR_BAND_WIDTH_C,
  type CrucibleCycles,
  type DefectFrequency,
  type DefectRateByBand,
  type FurnaceOffset,
  type InsightFilter,
  type MouldPreheatBandQuery,
  type PourBandQuery,
  type YieldTrend,
} from '../../../shared/insights/insight-schemas.ts';
import * as equipmentService from '../equipment/equipment-service.ts';
import * as heatsService from '../heats/heats-service.ts';
import * as repo from './insights-repository.ts';

// Every insight counts only heats the actor may read in the heat log
// (students and casters their own, mentors also their mentees', admins all),
// through the heat log's own visibility rule. A casterId the actor may not
// read simply matches nothing, as in the heat log's list.

const kindsOf = (markCounts: Record<string, number>) => Object.keys(markCounts).filter((k) => markCounts[k] > 0);

export async function defectFrequency(actor: Actor, workshopId: string, filter: InsightFilter): Promise<DefectFrequency> {
  const castings = await repo.castingFacts(workshopId, heatsService.visibilityOf(actor), filter);
  return defectFrequencyOf(castings);
}

export async function defectRateByPourBand(actor: Actor, workshopId: string, query: PourBandQuery): Promise<DefectRateByBand> {
  const castings = await repo.castingFacts(workshopId, heatsService.visibilityOf(actor), query);
  return defectRatesByBand(
    castings.map((c) => ({ heatId: c.heatId, valueC: c.pourTempC, kinds: kindsOf(c.markCounts) })),
    POUR_BAND_WIDTH_C,
    { kind: query.kind, alloy: query.alloy },
  );
}

export async function defectRateByMouldPreheatBand(
  actor: Actor,
  workshopId: string,
  query: MouldPreheatBandQuery,
): Promise<DefectRateByBand> {
  const castings = await repo.castingFacts(workshopId, heatsService.visibilityOf(actor), query);
  return defectRatesByBand(
    castings.map((c) => ({ heatId: c.heatId, valueC: c.mouldPreheatC, kinds: kindsOf(c.markCounts) })),
    MOULD_PREHEAT_BAND_WIDTH_C,
    { kind: query.kind, alloy: query.alloy ?? null },
  );
}

export async function yieldTrend(actor: Actor, workshopId: string, filter: InsightFilter): Promise<YieldTrend> {
  return yieldTrendOf(await repo.heatMasses(workshopId, heatsService.visibilityOf(actor), filter));
}

/**
 * Crucible life over time. The crucible list, cycle totals, retirement dates
 * and condition notes are equipment every member reads; the dated points are
 * only the actor's readable heats, each carrying the crucible's true cycle
 * number, so nobody learns when someone else melted.
 */
export async function crucibleCycles(actor: Actor, workshopId: string, filter: InsightFilter): Promise<CrucibleCycles> {
  const [crucibles, points, notes, limits] = await Promise.all([
    repo.crucibles(workshopId),
    repo.crucibleCyclePoints(workshopId, heatsService.visibilityOf(actor), filter),
    repo.crucibleNotes(workshopId, filter),
    equipmentService.cycleLimitsOf(workshopId),
  ]);
  const narrowed = Boolean(filter.casterId || filter.alloy || filter.from || filter.to);
  return {
    crucibles: crucibles
      .map((c) => ({
        ...c,
        ...limits[c.material],
        points: points.filter((p) => p.crucibleId === c.id).map(({ heatId, pouredAt, cycle }) => ({ heatId, pouredAt, cycle })),
        notes: notes.filter((n) => n.crucibleId === c.id).map(({ id, notedOn, note }) => ({ id, notedOn, note })),
      }))
      // With a filter, a crucible none of the matching heats used is noise.
      .filter((c) => !narrowed || c.points.length > 0),
  };
}

/** Per furnace, each readable heat's pour temperature minus its setpoint, and their median. */
export async function furnaceOffset(actor: Actor, workshopId: string, filter: InsightFilter): Promise<FurnaceOffset> {
  const readings = await repo.furnaceReadings(workshopId, heatsService.visibilityOf(actor), filter);
  const furnaces = new Map<string, FurnaceOffset['furnaces'][number]>();
  for (const r of readings) {
    const f = furnaces.get(r.furnaceId) ?? { id: r.furnaceId, name: r.furnaceName, kind: r.furnaceKind, medianOffsetC: null, points: [] };
    f.points.push({ heatId: r.heatId, pouredAt: r.pouredAt, setpointC: r.setpointC, pourTempC: r.pourTempC, offsetC: r.pourTempC - r.setpointC });
    furnaces.set(r.furnaceId, f);
  }
  return {
    furnaces: [...furnaces.values()].map((f) => ({ ...f, medianOffsetC: f.points.length ? median(f.points.map((p) => p.offsetC)) : null })),
  };
}
