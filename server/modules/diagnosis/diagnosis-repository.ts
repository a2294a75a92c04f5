import { QueryTypes } from 'sequelize';
import { DEFECT_KIND_IDS, MELT_VARIABLE_IDS } from '../../../shared/domain/index.ts';
import type { CausePrior, ChargeKind, DefectKindId, MeltVariableId, MoldMaterial } from '../../../shared/domain/index.ts';
import type { HeatConditionsCasting, HeatConditionsHeat } from '../../../shared/heats/heat-conditions-of.ts';
import type { DegassingMethod, HeatFluxKind, QuenchMedium } from '../../../shared/heats/heat-schemas.ts';
import { sequelize } from '../../db/sequelize.ts';

// Read models for the diagnosis: what a casting and its heat recorded, what
// was marked on its photos, and what the workshop's reviewers confirmed.

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export type CastingSource = {
  heatId: string;
  casterId: string;
  alloy: string;
  heat: HeatConditionsHeat;
  casting: HeatConditionsCasting;
};

/** A casting with the heat fields heatConditionsOf reads; null when it is not in the workshop. */
export async function castingSource(workshopId: string, castingId: string): Promise<CastingSource | null> {
  const [r] = await sequelize.query<Record<string, unknown>>(
    `SELECT h.id AS heat_id, h.caster_id, h.alloy, h.melt_started_at, h.poured_at, h.pour_temp_c, h.peak_temp_c,
            h.degassing, h.flux_kind, h.skimmed, h.tools_preheated, h.ambient_temp_c, h.relative_humidity_pct,
            CASE WHEN h.crucible_id IS NULL THEN NULL ELSE
              (SELECT count(*)::int FROM heats y WHERE y.crucible_id = h.crucible_id AND (y.poured_at, y.id) <= (h.poured_at, h.id))
            END AS crucible_cycle,
            COALESCE((SELECT array_agg(l.kind ORDER BY l.position) FROM heat_charge_lines l WHERE l.heat_id = h.id), '{}') AS charge_kinds,
            k.mould_preheat_c, k.coated, k.vented, k.pour_height_cm, k.section_thickness_mm, k.air_cool_min, k.quench_medium,
            m.material AS mould_material, m.has_riser AS mould_has_riser
       FROM castings k
       JOIN heats h ON h.id = k.heat_id
       LEFT JOIN moulds m ON m.id = k.mould_id
      WHERE k.workshop_id = :workshopId AND k.id = :castingId`,
    { replacements: { workshopId, castingId }, type: QueryTypes.SELECT },
  );
  if (!r) return null;
  const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));
  return {
    heatId: r.heat_id as string,
    casterId: r.caster_id as string,
    alloy: r.alloy as string,
    heat: {
      meltStartedAt: iso(r.melt_started_at as Date | null),
      pouredAt: iso(r.poured_at as Date),
      pourTempC: num(r.pour_temp_c),
      peakTempC: num(r.peak_temp_c),
      chargeLines: (r.charge_kinds as ChargeKind[]).map((kind) => ({ kind })),
      degassing: r.degassing as DegassingMethod,
      fluxKind: r.flux_kind as HeatFluxKind,
      skimmed: r.skimmed as boolean | null,
      toolsPreheated: r.tools_preheated as boolean | null,
      ambientTempC: num(r.ambient_temp_c),
      relativeHumidityPct: num(r.relative_humidity_pct),
      crucibleCycle: num(r.crucible_cycle),
    },
    casting: {
      mould: r.mould_material ? { material: r.mould_material as MoldMaterial, hasRiser: r.mould_has_riser as boolean } : null,
      mouldPreheatC: num(r.mould_preheat_c),
      coated: r.coated as boolean | null,
      vented: r.vented as boolean | null,
      pourHeightCm: num(r.pour_height_cm),
      sectionThicknessMm: num(r.section_thickness_mm),
      airCoolMin: num(r.air_cool_min),
      quenchMedium: r.quench_medium as QuenchMedium,
    },
  };
}

const KNOWN_KINDS: ReadonlySet<string> = new Set(DEFECT_KIND_IDS);
const KNOWN_VARIABLES: ReadonlySet<string> = new Set(MELT_VARIABLE_IDS);

/** Each defect kind marked on the casting's photos once, at its highest severity, in vocabulary order. */
export async function castingDefects(workshopId: string, castingId: string): Promise<{ kind: DefectKindId; severity: 1 | 2 | 3 }[]> {
  const rows = await sequelize.query<{ kind: string; severity: number }>(
    `SELECT m.defect_kind AS kind, max(m.severity)::int AS severity
       FROM marks m JOIN photos p ON p.id = m.photo_id
      WHERE p.workshop_id = :workshopId AND p.casting_id = :castingId
      GROUP BY m.defect_kind`,
    { replacements: { workshopId, castingId }, type: QueryTypes.SELECT },
  );
  return rows
    .filter((r) => KNOWN_KINDS.has(r.kind))
    .sort((a, b) => DEFECT_KIND_IDS.indexOf(a.kind as DefectKindId) - DEFECT_KIND_IDS.indexOf(b.kind as DefectKindId))
    .map((r) => ({ kind: r.kind as DefectKindId, severity: Math.min(3, Math.max(1, r.severity)) as 1 | 2 | 3 }));
}

/**
 * The workshop's history as the trade core's priors: for each defect kind
 * marked on resolved reports' castings and each variable confirmed on them,
 * how many such reports confirmed it, out of all resolved reports with that kind.
 */
export async function workshopPriors(workshopId: string): Promise<CausePrior[]> {
  const rows = await sequelize.query<{ defectKind: string; variable: string; confirmedCount: number; resolvedCount: number }>(
    `WITH kinds AS (
       SELECT DISTINCT r.id AS report_id, m.defect_kind
         FROM reports r
         JOIN photos p ON p.casting_id = r.casting_id
         JOIN marks m ON m.photo_id = p.id
        WHERE r.workshop_id = :workshopId AND r.state = 'resolved'
     ), totals AS (
       SELECT defect_kind, count(*)::int AS resolved_count FROM kinds GROUP BY defect_kind
     )
     SELECT k.defect_kind AS "defectKind", c.variable, count(DISTINCT k.report_id)::int AS "confirmedCount",
            t.resolved_count AS "resolvedCount"
       FROM kinds k
       JOIN report_confirmed_causes c ON c.report_id = k.report_id
       JOIN totals t ON t.defect_kind = k.defect_kind
      GROUP BY k.defect_kind, c.variable, t.resolved_count
      ORDER BY k.defect_kind, c.variable`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
  return rows
    .filter((r) => KNOWN_KINDS.has(r.defectKind) && KNOWN_VARIABLES.has(r.variable))
    .map((r) => ({
      defectKind: r.defectKind as DefectKindId,
      variable: r.variable as MeltVariableId,
      confirmedCount: r.confirmedCount,
      resolvedCount: r.resolvedCount,
    }));
}
