import { QueryTypes } from 'sequelize';
import type { Access } from '../../../shared/auth/permissions.ts';
import type { Temper } from '../../../shared/domain/index.ts';
import type {
  ActualQuenchMedium,
  HardnessReading,
  HardnessScale,
  HeatTreatmentState,
  HeatTreatmentSummary,
  StepActual,
  StoredHeatTreatmentPlan,
  TreatedCasting,
} from '../../../shared/heat-treatment/heat-treatment-schemas.ts';
import { sequelize, type Tx } from '../../db/sequelize.ts';

// Plain SQL over the heat-treatment tables; castings, heats and photos are
// read here too (never through those modules' repositories), as the equipment
// module reads heats for its counts.

const num = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));
const iso = (d: Date | string | null): string | null => (d === null ? null : new Date(d).toISOString());

/** Whose castings and plans the actor reaches for one action: the heat log's access (own, mentees', any). */
export type Reach = { access: readonly Access[]; actorId: string };

/** "The actor reaches the caster in column `column`": the heat log's visibility rule (heats-repository), over any caster column. */
function reachSql(reach: Reach, column: string): string {
  if (reach.access.includes('any')) return 'true';
  const parts: string[] = [];
  if (reach.access.includes('own')) parts.push(`${column} = :actorId`);
  if (reach.access.includes('mentee')) {
    parts.push(`${column} IN (SELECT a.student_id FROM mentor_assignments a WHERE a.workshop_id = :workshopId AND a.mentor_id = :actorId)`);
  }
  return parts.length ? `(${parts.join(' OR ')})` : 'false';
}

// ── castings ────────────────────────────────────────────────────────────────

export type CastingForPlan = { castingId: string; heatId: string; casterId: string; heatAlloy: string };

/** The castings among `ids` that are in this workshop, with their heat's caster and alloy. */
export async function castingsForPlan(workshopId: string, ids: readonly string[]): Promise<CastingForPlan[]> {
  if (!ids.length) return [];
  return sequelize.query<CastingForPlan>(
    `SELECT x.id AS "castingId", x.heat_id AS "heatId", h.caster_id AS "casterId", h.alloy AS "heatAlloy"
       FROM castings x JOIN heats h ON h.id = x.heat_id
      WHERE x.workshop_id = :workshopId AND x.id IN (:ids)`,
    { replacements: { workshopId, ids }, type: QueryTypes.SELECT },
  );
}

const TREATED_CASTING_COLUMNS = `
  x.id, x.heat_id AS "heatId", h.poured_at AS "heatPouredAt", h.alloy AS "heatAlloy",
  (x.position + 1)::int AS number, x.mass_g AS "massG", m.name AS "mouldName"`;

type TreatedCastingRow = Omit<TreatedCasting, 'heatPouredAt' | 'massG'> & { heatPouredAt: Date; massG: unknown };
const treatedCastingOf = (r: TreatedCastingRow): TreatedCasting => ({ ...r, heatPouredAt: iso(r.heatPouredAt)!, massG: num(r.massG) });

/**
 * Castings the actor could put into a plan (those of heats they may change),
 * newest heat first, with the open plans that already hold each.
 */
export async function candidateCastings(workshopId: string, reach: Reach, alloy: string | undefined, limit: number) {
  const rows = await sequelize.query<TreatedCastingRow & { casterId: string; casterName: string; openPlanIds: string[] }>(
    `SELECT ${TREATED_CASTING_COLUMNS}, h.caster_id AS "casterId", u.display_name AS "casterName",
            COALESCE((SELECT array_agg(t.id ORDER BY t.created_at) FROM heat_treatment_castings tc
                        JOIN heat_treatments t ON t.id = tc.heat_treatment_id
                       WHERE tc.casting_id = x.id AND t.state <> 'done'), '{}') AS "openPlanIds"
       FROM castings x
       JOIN heats h ON h.id = x.heat_id
       JOIN users u ON u.id = h.caster_id
       LEFT JOIN moulds m ON m.id = x.mould_id
      WHERE x.workshop_id = :workshopId AND ${reachSql(reach, 'h.caster_id')} ${alloy ? 'AND h.alloy = :alloy' : ''}
      ORDER BY h.poured_at DESC, x.position, x.id
      LIMIT :limit`,
    { replacements: { workshopId, actorId: reach.actorId, alloy: alloy ?? null, limit }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...treatedCastingOf(r), casterId: r.casterId, casterName: r.casterName, openPlanIds: r.openPlanIds }));
}

// ── plans ───────────────────────────────────────────────────────────────────

export type HeatTreatmentRow = HeatTreatmentSummary & {
  workshopId: string;
  plan: StoredHeatTreatmentPlan;
  notes: string | null;
};

const SUMMARY_COLUMNS = `
  t.id, t.workshop_id AS "workshopId", t.caster_id AS "casterId", u.display_name AS "casterName", t.created_by AS "createdBy",
  t.alloy, t.temper, t.oven, t.state, t.created_at AS "createdAt", t.updated_at AS "updatedAt",
  (SELECT count(*)::int FROM heat_treatment_castings tc WHERE tc.heat_treatment_id = t.id) AS "castingCount"`;

type RawRow = Omit<HeatTreatmentRow, 'createdAt' | 'updatedAt'> & { createdAt: Date; updatedAt: Date };
const rowOf = (r: RawRow): HeatTreatmentRow => ({ ...r, createdAt: iso(r.createdAt)!, updatedAt: iso(r.updatedAt)! });

export async function insertTreatment(
  values: {
    workshopId: string;
    casterId: string;
    createdBy: string;
    alloy: string;
    temper: Temper;
    plan: StoredHeatTreatmentPlan;
    oven: string;
    notes: string | null;
    castingIds: readonly string[];
  },
  tx: Tx,
): Promise<string> {
  const [row] = await sequelize.query<{ id: string }>(
    `INSERT INTO heat_treatments (id, workshop_id, caster_id, created_by, alloy, temper, plan, oven, state, notes, created_at, updated_at)
     VALUES (gen_random_uuid(), :workshopId, :casterId, :createdBy, :alloy, :temper, CAST(:plan AS jsonb), :oven, 'planned', :notes, now(), now())
     RETURNING id`,
    { replacements: { ...values, plan: JSON.stringify(values.plan) }, type: QueryTypes.SELECT, transaction: tx },
  );
  await sequelize.query(
    `INSERT INTO heat_treatment_castings (heat_treatment_id, casting_id, created_at)
     SELECT :id, c, now() FROM unnest(ARRAY[:castingIds]::uuid[]) AS c`,
    { replacements: { id: row.id, castingIds: values.castingIds }, transaction: tx },
  );
  return row.id;
}

export async function listTreatments(workshopId: string, reach: Reach, state?: HeatTreatmentState): Promise<HeatTreatmentSummary[]> {
  const rows = await sequelize.query<RawRow>(
    `SELECT ${SUMMARY_COLUMNS}, t.plan, t.notes
       FROM heat_treatments t JOIN users u ON u.id = t.caster_id
      WHERE t.workshop_id = :workshopId AND ${reachSql(reach, 't.caster_id')} ${state ? 'AND t.state = :state' : ''}
      ORDER BY t.created_at DESC, t.id DESC
      LIMIT 500`,
    { replacements: { workshopId, actorId: reach.actorId, state: state ?? null }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => {
    const { plan: _plan, notes: _notes, workshopId: _w, ...summary } = rowOf(r);
    return summary;
  });
}

export async function findTreatment(workshopId: string, id: string): Promise<HeatTreatmentRow | null> {
  const rows = await sequelize.query<RawRow>(
    `SELECT ${SUMMARY_COLUMNS}, t.plan, t.notes
       FROM heat_treatments t JOIN users u ON u.id = t.caster_id
      WHERE t.workshop_id = :workshopId AND t.id = :id`,
    { replacements: { workshopId, id }, type: QueryTypes.SELECT },
  );
  return rows[0] ? rowOf(rows[0]) : null;
}

export async function treatedCastings(id: string): Promise<TreatedCasting[]> {
  const rows = await sequelize.query<TreatedCastingRow>(
    `SELECT ${TREATED_CASTING_COLUMNS}
       FROM heat_treatment_castings tc
       JOIN castings x ON x.id = tc.casting_id
       JOIN heats h ON h.id = x.heat_id
       LEFT JOIN moulds m ON m.id = x.mould_id
      WHERE tc.heat_treatment_id = :id
      ORDER BY h.poured_at, x.position, x.id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return rows.map(treatedCastingOf);
}

export async function updateTreatment(
  workshopId: string,
  id: string,
  values: { state?: HeatTreatmentState; oven?: string; notes?: string | null },
  tx?: Tx,
): Promise<void> {
  const columns = Object.entries(values).filter(([, v]) => v !== undefined);
  if (!columns.length) return;
  await sequelize.query(
    `UPDATE heat_treatments SET ${columns.map(([k]) => `${k} = :${k}`).join(', ')}, updated_at = now()
      WHERE workshop_id = :workshopId AND id = :id`,
    { replacements: { ...values, workshopId, id }, transaction: tx },
  );
}

export async function deleteTreatment(workshopId: string, id: string): Promise<void> {
  await sequelize.query('DELETE FROM heat_treatments WHERE workshop_id = :workshopId AND id = :id', { replacements: { workshopId, id } });
}

/** Serialises writes to one plan's record. */
export async function lockTreatment(workshopId: string, id: string, tx: Tx): Promise<boolean> {
  const rows = await sequelize.query('SELECT id FROM heat_treatments WHERE workshop_id = :workshopId AND id = :id FOR UPDATE', {
    replacements: { workshopId, id },
    type: QueryTypes.SELECT,
    transaction: tx,
  });
  return rows.length > 0;
}

// ── the record ──────────────────────────────────────────────────────────────

type StepRow = Omit<StepActual, 'startedAt' | 'endedAt' | 'temperatureC' | 'quenchDelayS'> & {
  startedAt: Date | null;
  endedAt: Date | null;
  temperatureC: unknown;
  quenchDelayS: unknown;
};

export async function stepActuals(id: string, tx?: Tx): Promise<StepActual[]> {
  const rows = await sequelize.query<StepRow>(
    `SELECT step_index AS "stepIndex", started_at AS "startedAt", ended_at AS "endedAt", temperature_c AS "temperatureC",
            quench_medium AS "quenchMedium", quench_delay_s AS "quenchDelayS", notes
       FROM heat_treatment_steps_actual WHERE heat_treatment_id = :id ORDER BY step_index`,
    { replacements: { id }, type: QueryTypes.SELECT, transaction: tx },
  );
  return rows.map((r) => ({
    stepIndex: r.stepIndex,
    startedAt: iso(r.startedAt),
    endedAt: iso(r.endedAt),
    temperatureC: num(r.temperatureC),
    quenchMedium: (r.quenchMedium as ActualQuenchMedium | null) ?? null,
    quenchDelayS: num(r.quenchDelayS),
    notes: r.notes ?? null,
  }));
}

/** Writes whole step records (already merged with what was stored). */
export async function saveStepActuals(id: string, steps: readonly StepActual[], tx: Tx): Promise<void> {
  for (const s of steps) {
    await sequelize.query(
      `INSERT INTO heat_treatment_steps_actual
         (id, heat_treatment_id, step_index, started_at, ended_at, temperature_c, quench_medium, quench_delay_s, notes, created_at, updated_at)
       VALUES (gen_random_uuid(), :id, :stepIndex, :startedAt, :endedAt, :temperatureC, :quenchMedium, :quenchDelayS, :notes, now(), now())
       ON CONFLICT (heat_treatment_id, step_index) DO UPDATE SET
         started_at = EXCLUDED.started_at, ended_at = EXCLUDED.ended_at, temperature_c = EXCLUDED.temperature_c,
         quench_medium = EXCLUDED.quench_medium, quench_delay_s = EXCLUDED.quench_delay_s, notes = EXCLUDED.notes,
         updated_at = now()`,
      { replacements: { id, ...s }, transaction: tx },
    );
  }
}

type HardnessRow = Omit<HardnessReading, 'value' | 'measuredAt'> & { value: unknown; measuredAt: Date };

export async function hardnessReadings(id: string): Promise<HardnessReading[]> {
  const rows = await sequelize.query<HardnessRow>(
    `SELECT id, casting_id AS "castingId", scale, value, location_note AS "locationNote", measured_at AS "measuredAt", created_by AS "createdBy"
       FROM heat_treatment_hardness WHERE heat_treatment_id = :id ORDER BY measured_at, created_at, id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, value: num(r.value)!, measuredAt: iso(r.measuredAt)! }));
}

export async function insertHardness(values: {
  heatTreatmentId: string;
  castingId: string | null;
  scale: HardnessScale;
  value: number;
  locationNote: string | null;
  measuredAt: string;
  createdBy: string;
}): Promise<string> {
  const [row] = await sequelize.query<{ id: string }>(
    `INSERT INTO heat_treatment_hardness (id, heat_treatment_id, casting_id, scale, value, location_note, measured_at, created_by, created_at, updated_at)
     VALUES (gen_random_uuid(), :heatTreatmentId, :castingId, :scale, :value, :locationNote, :measuredAt, :createdBy, now(), now())
     RETURNING id`,
    { replacements: values, type: QueryTypes.SELECT },
  );
  return row.id;
}

/** Deletes one reading of the plan; false when the plan has no such reading. */
export async function deleteHardness(heatTreatmentId: string, readingId: string): Promise<boolean> {
  const rows = await sequelize.query<{ id: string }>(
    'DELETE FROM heat_treatment_hardness WHERE heat_treatment_id = :heatTreatmentId AND id = :readingId RETURNING id',
    { replacements: { heatTreatmentId, readingId }, type: QueryTypes.SELECT },
  );
  return rows.length > 0;
}

// ── photos ──────────────────────────────────────────────────────────────────

export async function photoCasting(workshopId: string, photoId: string): Promise<{ castingId: string } | null> {
  const rows = await sequelize.query<{ castingId: string }>(
    'SELECT casting_id AS "castingId" FROM photos WHERE workshop_id = :workshopId AND id = :photoId',
    { replacements: { workshopId, photoId }, type: QueryTypes.SELECT },
  );
  return rows[0] ?? null;
}

export async function treatmentPhotos(id: string): Promise<{ id: string; castingId: string }[]> {
  return sequelize.query<{ id: string; castingId: string }>(
    `SELECT p.id, p.casting_id AS "castingId"
       FROM heat_treatment_photos tp JOIN photos p ON p.id = tp.photo_id
      WHERE tp.heat_treatment_id = :id ORDER BY tp.created_at, p.id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
}

export async function addPhoto(id: string, photoId: string): Promise<void> {
  await sequelize.query(
    `INSERT INTO heat_treatment_photos (heat_treatment_id, photo_id, created_at) VALUES (:id, :photoId, now())
     ON CONFLICT DO NOTHING`,
    { replacements: { id, photoId } },
  );
}

export async function removePhoto(id: string, photoId: string): Promise<boolean> {
  const rows = await sequelize.query<{ photo_id: string }>(
    'DELETE FROM heat_treatment_photos WHERE heat_treatment_id = :id AND photo_id = :photoId RETURNING photo_id',
    { replacements: { id, photoId }, type: QueryTypes.SELECT },
  );
  return rows.length > 0;
}
