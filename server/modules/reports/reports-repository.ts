import { QueryTypes } from 'sequelize';
import type { Access } from '../../../shared/auth/permissions.ts';
import type { Role } from '../../../shared/auth/roles.ts';
import { DEFECT_KIND_IDS, findMeltVariable } from '../../../shared/domain/index.ts';
import type { DefectKindId, MeltVariableId } from '../../../shared/domain/index.ts';
import type { DiagnosisSnapshot } from '../../../shared/reports/diagnosis-schemas.ts';
import type { ConfirmedCause, ConfirmedCauseInput, ReportEvent, ReportListQuery, ReportRow } from '../../../shared/reports/report-schemas.ts';
import type { ReportState } from '../../../shared/reports/report-states.ts';
import { sequelize, type Tx } from '../../db/sequelize.ts';

const iso = (d: Date | string | null | undefined): string | null => (d ? new Date(d).toISOString() : null);

/** A report as stored, with its author's name and its casting's heat. */
export type ReportRecord = {
  id: string;
  workshopId: string;
  castingId: string;
  heatId: string;
  authorId: string;
  authorName: string;
  title: string;
  question: string;
  state: ReportState;
  snapshot: DiagnosisSnapshot | null;
  requestedMentorId: string | null;
  followUpHeatId: string | null;
  resolutionNote: string | null;
  createdAt: string;
  updatedAt: string;
  submittedAt: string | null;
  resolvedAt: string | null;
};

/** Which reports the actor may see (or review): the reach from accessFor plus who they are. */
export type ReportVisibility = { access: readonly Access[]; actorId: string };

const RECORD_SELECT = `
  SELECT r.id, r.workshop_id, r.casting_id, k.heat_id, r.author_id, u.display_name AS author_name, r.title, r.question,
         r.state, r.snapshot, r.requested_mentor_id, r.follow_up_heat_id, r.resolution_note,
         r.created_at, r.updated_at, r.submitted_at, r.resolved_at
    FROM reports r
    JOIN users u ON u.id = r.author_id
    JOIN castings k ON k.id = r.casting_id`;

function recordOf(r: Record<string, unknown>): ReportRecord {
  return {
    id: r.id as string,
    workshopId: r.workshop_id as string,
    castingId: r.casting_id as string,
    heatId: r.heat_id as string,
    authorId: r.author_id as string,
    authorName: r.author_name as string,
    title: r.title as string,
    question: r.question as string,
    state: r.state as ReportState,
    snapshot: (r.snapshot as DiagnosisSnapshot | null) ?? null,
    requestedMentorId: (r.requested_mentor_id as string | null) ?? null,
    followUpHeatId: (r.follow_up_heat_id as string | null) ?? null,
    resolutionNote: (r.resolution_note as string | null) ?? null,
    createdAt: iso(r.created_at as Date)!,
    updatedAt: iso(r.updated_at as Date)!,
    submittedAt: iso(r.submitted_at as Date | null),
    resolvedAt: iso(r.resolved_at as Date | null),
  };
}

export async function findReport(workshopId: string, reportId: string, tx?: Tx): Promise<ReportRecord | null> {
  const rows = await sequelize.query<Record<string, unknown>>(`${RECORD_SELECT} WHERE r.workshop_id = :workshopId AND r.id = :reportId`, {
    replacements: { workshopId, reportId },
    type: QueryTypes.SELECT,
    transaction: tx,
  });
  return rows[0] ? recordOf(rows[0]) : null;
}

/** The report, locked for the rest of `tx` so two transitions cannot both start from the same state. */
export async function lockReport(workshopId: string, reportId: string, tx: Tx): Promise<ReportRecord | null> {
  await sequelize.query('SELECT id FROM reports WHERE workshop_id = :workshopId AND id = :reportId FOR UPDATE', {
    replacements: { workshopId, reportId },
    type: QueryTypes.SELECT,
    transaction: tx,
  });
  return findReport(workshopId, reportId, tx);
}

export async function insertReport(
  values: { workshopId: string; castingId: string; authorId: string; title: string; question: string; requestedMentorId: string | null },
  tx: Tx,
): Promise<string> {
  const [row] = await sequelize.query<{ id: string }>(
    `INSERT INTO reports (id, workshop_id, casting_id, author_id, title, question, state, requested_mentor_id, created_at, updated_at)
     VALUES (gen_random_uuid(), :workshopId, :castingId, :authorId, :title, :question, 'draft', :requestedMentorId, clock_timestamp(), clock_timestamp())
     RETURNING id`,
    { replacements: values, type: QueryTypes.SELECT, transaction: tx },
  );
  return row.id;
}

export type ReportChanges = Partial<{
  title: string;
  question: string;
  requestedMentorId: string | null;
  state: ReportState;
  snapshot: DiagnosisSnapshot | null;
  submittedAt: Date | null;
  resolvedAt: Date | null;
  resolutionNote: string | null;
  followUpHeatId: string | null;
}>;

const COLUMNS: Record<keyof ReportChanges, string> = {
  title: 'title',
  question: 'question',
  requestedMentorId: 'requested_mentor_id',
  state: 'state',
  snapshot: 'snapshot',
  submittedAt: 'submitted_at',
  resolvedAt: 'resolved_at',
  resolutionNote: 'resolution_note',
  followUpHeatId: 'follow_up_heat_id',
};

export async function updateReport(workshopId: string, reportId: string, changes: ReportChanges, tx: Tx): Promise<void> {
  const entries = Object.entries(changes).filter(([, v]) => v !== undefined) as [keyof ReportChanges, unknown][];
  const sets = entries.map(([k]) => (k === 'snapshot' ? `snapshot = CAST(:snapshot AS jsonb)` : `${COLUMNS[k]} = :${k}`));
  const replacements: Record<string, unknown> = { workshopId, reportId };
  for (const [k, v] of entries) replacements[k] = k === 'snapshot' ? (v === null ? null : JSON.stringify(v)) : v;
  await sequelize.query(
    `UPDATE reports SET ${[...sets, 'updated_at = clock_timestamp()'].join(', ')} WHERE workshop_id = :workshopId AND id = :reportId`,
    { replacements, transaction: tx },
  );
}

export async function setPhotos(reportId: string, photoIds: readonly string[], tx: Tx): Promise<void> {
  await sequelize.query('DELETE FROM report_photos WHERE report_id = :reportId', { replacements: { reportId }, transaction: tx });
  for (const [position, photoId] of photoIds.entries()) {
    await sequelize.query('INSERT INTO report_photos (report_id, photo_id, position) VALUES (:reportId, :photoId, :position)', {
      replacements: { reportId, photoId, position },
      transaction: tx,
    });
  }
}

export async function photoIdsOf(reportId: string): Promise<string[]> {
  const rows = await sequelize.query<{ photoId: string }>(
    'SELECT photo_id AS "photoId" FROM report_photos WHERE report_id = :reportId ORDER BY position, photo_id',
    { replacements: { reportId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.photoId);
}

export async function insertEvent(
  e: { reportId: string; actorId: string; action: string; fromState: ReportState | null; toState: ReportState; note: string | null },
  tx: Tx,
): Promise<void> {
  await sequelize.query(
    `INSERT INTO report_events (id, report_id, actor_id, action, from_state, to_state, note, created_at)
     VALUES (gen_random_uuid(), :reportId, :actorId, :action, :fromState, :toState, :note, clock_timestamp())`,
    { replacements: e, transaction: tx },
  );
}

export async function eventsOf(reportId: string): Promise<ReportEvent[]> {
  const rows = await sequelize.query<Omit<ReportEvent, 'createdAt'> & { createdAt: Date }>(
    `SELECT e.id, e.action, e.from_state AS "fromState", e.to_state AS "toState", e.actor_id AS "actorId",
            u.display_name AS "actorName", e.note, e.created_at AS "createdAt"
       FROM report_events e LEFT JOIN users u ON u.id = e.actor_id
      WHERE e.report_id = :reportId ORDER BY e.created_at, e.id`,
    { replacements: { reportId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

/** A resolution's confirmed causes replace any from an earlier resolution. */
export async function replaceConfirmedCauses(reportId: string, causes: readonly ConfirmedCauseInput[], userId: string, tx: Tx): Promise<void> {
  await sequelize.query('DELETE FROM report_confirmed_causes WHERE report_id = :reportId', { replacements: { reportId }, transaction: tx });
  for (const c of causes) {
    await sequelize.query(
      `INSERT INTO report_confirmed_causes (id, report_id, variable, note, fixes_to_try, confirmed_by, created_at)
       VALUES (gen_random_uuid(), :reportId, :variable, :note,
               ARRAY(SELECT jsonb_array_elements_text(CAST(:fixes AS jsonb))), :userId, clock_timestamp())`,
      { replacements: { reportId, variable: c.variable, note: c.note, fixes: JSON.stringify(c.fixesToTry), userId }, transaction: tx },
    );
  }
}

export async function confirmedCausesOf(reportId: string): Promise<ConfirmedCause[]> {
  const rows = await sequelize.query<{
    variable: MeltVariableId;
    note: string;
    fixesToTry: string[];
    confirmedBy: string | null;
    confirmedByName: string | null;
    createdAt: Date;
  }>(
    `SELECT c.variable, c.note, c.fixes_to_try AS "fixesToTry", c.confirmed_by AS "confirmedBy",
            u.display_name AS "confirmedByName", c.created_at AS "createdAt"
       FROM report_confirmed_causes c LEFT JOIN users u ON u.id = c.confirmed_by
      WHERE c.report_id = :reportId ORDER BY c.created_at, c.id`,
    { replacements: { reportId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    ...r,
    name: findMeltVariable(r.variable)?.name ?? r.variable,
    createdAt: r.createdAt.toISOString(),
  }));
}

/** A casting of the workshop with its heat and caster; null when there is none. */
export async function castingOf(workshopId: string, castingId: string): Promise<{ heatId: string; casterId: string } | null> {
  const [row] = await sequelize.query<{ heatId: string; casterId: string }>(
    `SELECT k.heat_id AS "heatId", h.caster_id AS "casterId" FROM castings k JOIN heats h ON h.id = k.heat_id
      WHERE k.workshop_id = :workshopId AND k.id = :castingId`,
    { replacements: { workshopId, castingId }, type: QueryTypes.SELECT },
  );
  return row ?? null;
}

export async function photoIdsOfCasting(workshopId: string, castingId: string): Promise<string[]> {
  const rows = await sequelize.query<{ id: string }>(
    'SELECT id FROM photos WHERE workshop_id = :workshopId AND casting_id = :castingId ORDER BY created_at, id',
    { replacements: { workshopId, castingId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.id);
}

export async function heatOf(workshopId: string, heatId: string): Promise<{ casterId: string; pouredAt: string } | null> {
  const [row] = await sequelize.query<{ casterId: string; pouredAt: Date }>(
    'SELECT caster_id AS "casterId", poured_at AS "pouredAt" FROM heats WHERE workshop_id = :workshopId AND id = :heatId',
    { replacements: { workshopId, heatId }, type: QueryTypes.SELECT },
  );
  return row ? { casterId: row.casterId, pouredAt: row.pouredAt.toISOString() } : null;
}

const byVocabulary = (kinds: readonly string[]): DefectKindId[] =>
  DEFECT_KIND_IDS.filter((k) => kinds.includes(k));

/** Defect kinds marked on any casting of a heat. */
export async function heatDefectKinds(heatId: string): Promise<DefectKindId[]> {
  const rows = await sequelize.query<{ kind: string }>(
    `SELECT DISTINCT m.defect_kind AS kind FROM castings k JOIN photos p ON p.casting_id = k.id JOIN marks m ON m.photo_id = p.id
      WHERE k.heat_id = :heatId`,
    { replacements: { heatId }, type: QueryTypes.SELECT },
  );
  return byVocabulary(rows.map((r) => r.kind));
}

export async function adminIds(workshopId: string): Promise<string[]> {
  const rows = await sequelize.query<{ userId: string }>(
    `SELECT user_id AS "userId" FROM memberships WHERE workshop_id = :workshopId AND role = 'admin' ORDER BY created_at, user_id`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.userId);
}

export async function displayName(userId: string): Promise<string> {
  const [row] = await sequelize.query<{ name: string }>('SELECT display_name AS name FROM users WHERE id = :userId', {
    replacements: { userId },
    type: QueryTypes.SELECT,
  });
  return row?.name ?? 'Someone';
}

/** Members who have commented on the report, with their role in the workshop now. */
export async function commenters(workshopId: string, reportId: string): Promise<{ id: string; role: Role }[]> {
  return sequelize.query<{ id: string; role: Role }>(
    `SELECT DISTINCT c.author_id AS id, m.role
       FROM comments c JOIN memberships m ON m.workshop_id = :workshopId AND m.user_id = c.author_id
      WHERE c.report_id = :reportId`,
    { replacements: { workshopId, reportId }, type: QueryTypes.SELECT },
  );
}

// ── lists ───────────────────────────────────────────────────────────────────

function visibilitySql(v: ReportVisibility): string {
  if (v.access.includes('any')) return 'true';
  const parts: string[] = [];
  if (v.access.includes('own')) parts.push('r.author_id = :actorId');
  if (v.access.includes('mentee')) parts.push(reviewerSql(':actorId'));
  return parts.length ? `(${parts.join(' OR ')})` : 'false';
}

/** Reports the mentor named by `param` may review: their students' and those asking for them. */
function reviewerSql(param: string): string {
  return `(r.author_id IN (SELECT a.student_id FROM mentor_assignments a WHERE a.workshop_id = r.workshop_id AND a.mentor_id = ${param})
           OR r.requested_mentor_id = ${param})`;
}

const ROW_SELECT = `
  SELECT r.id, r.title, r.state, r.author_id AS "authorId", u.display_name AS "authorName", r.casting_id AS "castingId",
         k.heat_id AS "heatId", r.requested_mentor_id AS "requestedMentorId",
         COALESCE((SELECT array_agg(DISTINCT m.defect_kind) FROM photos p JOIN marks m ON m.photo_id = p.id
                    WHERE p.casting_id = r.casting_id), '{}') AS "defectKinds",
         (SELECT count(*)::int FROM comments c WHERE c.report_id = r.id) AS "commentCount",
         r.snapshot #>> '{causes,0,variable}' AS "topCause",
         r.created_at AS "createdAt", r.updated_at AS "updatedAt", r.submitted_at AS "submittedAt", r.resolved_at AS "resolvedAt"
    FROM reports r
    JOIN users u ON u.id = r.author_id
    JOIN castings k ON k.id = r.casting_id`;

type RawRow = Omit<ReportRow, 'createdAt' | 'updatedAt' | 'submittedAt' | 'resolvedAt' | 'defectKinds'> & {
  defectKinds: string[];
  createdAt: Date;
  updatedAt: Date;
  submittedAt: Date | null;
  resolvedAt: Date | null;
};

const rowOf = (r: RawRow): ReportRow => ({
  ...r,
  defectKinds: byVocabulary(r.defectKinds),
  createdAt: iso(r.createdAt)!,
  updatedAt: iso(r.updatedAt)!,
  submittedAt: iso(r.submittedAt),
  resolvedAt: iso(r.resolvedAt),
});

/** One page of the reports the actor may see, newest first; `after` continues past a row. */
export async function listRows(
  workshopId: string,
  visibility: ReportVisibility,
  filter: Omit<ReportListQuery, 'cursor' | 'limit'>,
  page: { limit: number; after?: { createdAt: string; id: string } },
): Promise<ReportRow[]> {
  const where = ['r.workshop_id = :workshopId', visibilitySql(visibility)];
  const replacements: Record<string, unknown> = { workshopId, actorId: visibility.actorId, limit: page.limit };
  if (filter.state) {
    where.push('r.state = :state');
    replacements.state = filter.state;
  }
  if (filter.studentId) {
    where.push('r.author_id = :studentId');
    replacements.studentId = filter.studentId;
  }
  if (filter.mentorId) {
    where.push(reviewerSql(':mentorId'));
    replacements.mentorId = filter.mentorId;
  }
  if (filter.defect) {
    where.push('EXISTS (SELECT 1 FROM photos p JOIN marks m ON m.photo_id = p.id WHERE p.casting_id = r.casting_id AND m.defect_kind = :defect)');
    replacements.defect = filter.defect;
  }
  if (page.after) {
    where.push('(r.created_at, r.id) < (CAST(:afterCreatedAt AS timestamptz), CAST(:afterId AS uuid))');
    replacements.afterCreatedAt = page.after.createdAt;
    replacements.afterId = page.after.id;
  }
  const rows = await sequelize.query<RawRow>(
    `${ROW_SELECT} WHERE ${where.join(' AND ')} ORDER BY r.created_at DESC, r.id DESC LIMIT :limit`,
    { replacements, type: QueryTypes.SELECT },
  );
  return rows.map(rowOf);
}

/** Submitted and in-review reports the actor may review, oldest submission first. */
export async function queueRows(workshopId: string, reviewer: ReportVisibility, limit: number): Promise<ReportRow[]> {
  const reach = reviewer.access.includes('any') ? 'true' : reviewer.access.includes('mentee') ? reviewerSql(':actorId') : 'false';
  const rows = await sequelize.query<RawRow>(
    `${ROW_SELECT}
      WHERE r.workshop_id = :workshopId AND r.state IN ('submitted', 'in_review') AND ${reach}
      ORDER BY r.submitted_at ASC NULLS LAST, r.id ASC
      LIMIT :limit`,
    { replacements: { workshopId, actorId: reviewer.actorId, limit }, type: QueryTypes.SELECT },
  );
  return rows.map(rowOf);
}

export async function queueCounts(workshopId: string, reviewer: ReportVisibility): Promise<Record<'submitted' | 'in_review', number>> {
  const reach = reviewer.access.includes('any') ? 'true' : reviewer.access.includes('mentee') ? reviewerSql(':actorId') : 'false';
  const rows = await sequelize.query<{ state: 'submitted' | 'in_review'; n: number }>(
    `SELECT r.state, count(*)::int AS n FROM reports r
      WHERE r.workshop_id = :workshopId AND r.state IN ('submitted', 'in_review') AND ${reach}
      GROUP BY r.state`,
    { replacements: { workshopId, actorId: reviewer.actorId }, type: QueryTypes.SELECT },
  );
  const counts = { submitted: 0, in_review: 0 };
  for (const r of rows) counts[r.state] = r.n;
  return counts;
}

/** Of `reportIds`, those in the workshop the actor may see. */
export async function visibleIds(workshopId: string, visibility: ReportVisibility, reportIds: readonly string[]): Promise<string[]> {
  if (!reportIds.length) return [];
  const rows = await sequelize.query<{ id: string }>(
    `SELECT r.id FROM reports r WHERE r.workshop_id = :workshopId AND r.id IN (:reportIds) AND ${visibilitySql(visibility)}`,
    { replacements: { workshopId, reportIds, actorId: visibility.actorId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.id);
}

// ── a student's overview ────────────────────────────────────────────────────

export async function heatCount(workshopId: string, userId: string): Promise<number> {
  const [row] = await sequelize.query<{ n: number }>(
    'SELECT count(*)::int AS n FROM heats WHERE workshop_id = :workshopId AND caster_id = :userId',
    { replacements: { workshopId, userId }, type: QueryTypes.SELECT },
  );
  return row.n;
}

/** Marks on the member's castings per defect kind per month of the pour (UTC), oldest first. */
export async function defectTrend(workshopId: string, userId: string): Promise<{ month: string; kind: DefectKindId; count: number }[]> {
  const rows = await sequelize.query<{ month: string; kind: string; count: number }>(
    `SELECT to_char(date_trunc('month', h.poured_at AT TIME ZONE 'UTC'), 'YYYY-MM') AS month, m.defect_kind AS kind, count(*)::int AS count
       FROM marks m
       JOIN photos p ON p.id = m.photo_id
       JOIN castings k ON k.id = p.casting_id
       JOIN heats h ON h.id = k.heat_id
      WHERE h.workshop_id = :workshopId AND h.caster_id = :userId
      GROUP BY 1, 2
      ORDER BY 1, 2`,
    { replacements: { workshopId, userId }, type: QueryTypes.SELECT },
  );
  return rows.filter((r) => (DEFECT_KIND_IDS as readonly string[]).includes(r.kind)) as { month: string; kind: DefectKindId; count: number }[];
}
