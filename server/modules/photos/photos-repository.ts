import { QueryTypes } from 'sequelize';
import type { DefectKindId } from '../../../shared/domain/defect-kinds.ts';
import type { Mark, MarkCreateInput, MarkUpdateInput, PhotoListQuery, PhotoVariant } from '../../../shared/photos/photo-schemas.ts';
import { sequelize, type Tx } from '../../db/sequelize.ts';

export type PhotoRow = {
  id: string;
  workshopId: string;
  castingId: string;
  heatId: string;
  uploadedBy: string | null;
  casterId: string | null;
  casterName: string | null;
  title: string | null;
  notes: string | null;
  fileName: string | null;
  alloy: string | null;
  mouldMaterial: string | null;
  capturedAt: Date | null;
  createdAt: Date;
  originalKey: string;
  originalContentType: string;
  originalWidth: number;
  originalHeight: number;
  displayKey: string;
  displayWidth: number;
  displayHeight: number;
  thumbKey: string;
  thumbWidth: number;
  thumbHeight: number;
};

const PHOTO_COLUMNS = `
  p.id, p.workshop_id AS "workshopId", p.casting_id AS "castingId", c.heat_id AS "heatId",
  p.uploaded_by AS "uploadedBy", h.caster_id AS "casterId", u.display_name AS "casterName",
  p.title, p.notes, p.file_name AS "fileName", h.alloy, mo.material AS "mouldMaterial",
  p.captured_at AS "capturedAt", p.created_at AS "createdAt",
  p.original_key AS "originalKey", p.original_content_type AS "originalContentType",
  p.original_width AS "originalWidth", p.original_height AS "originalHeight",
  p.display_key AS "displayKey", p.display_width AS "displayWidth", p.display_height AS "displayHeight",
  p.thumb_key AS "thumbKey", p.thumb_width AS "thumbWidth", p.thumb_height AS "thumbHeight"`;

const PHOTO_FROM = `
  FROM photos p
  JOIN castings c ON c.id = p.casting_id
  JOIN heats h ON h.id = c.heat_id
  LEFT JOIN users u ON u.id = h.caster_id
  LEFT JOIN moulds mo ON mo.id = c.mould_id`;

export type NewPhoto = {
  id: string;
  workshopId: string;
  castingId: string;
  uploadedBy: string;
  sha256: string;
  fileName: string | null;
  sourceFormat: string;
  capturedAt: Date | null;
  originalContentType: string;
  variants: Record<PhotoVariant, { key: string; width: number; height: number; bytes: number }>;
};

export async function insertPhoto(p: NewPhoto, tx?: Tx): Promise<void> {
  const v = p.variants;
  await sequelize.query(
    `INSERT INTO photos (id, workshop_id, casting_id, uploaded_by, sha256, file_name, source_format, captured_at,
        original_content_type, original_key, original_width, original_height, original_bytes,
        display_key, display_width, display_height, display_bytes, thumb_key, thumb_width, thumb_height, thumb_bytes,
        created_at, updated_at)
     VALUES (:id, :workshopId, :castingId, :uploadedBy, :sha256, :fileName, :sourceFormat, :capturedAt,
        :originalContentType, :ok, :ow, :oh, :ob, :dk, :dw, :dh, :db, :tk, :tw, :th, :tb, now(), now())`,
    {
      replacements: {
        ...p,
        ok: v.original.key, ow: v.original.width, oh: v.original.height, ob: v.original.bytes,
        dk: v.display.key, dw: v.display.width, dh: v.display.height, db: v.display.bytes,
        tk: v.thumb.key, tw: v.thumb.width, th: v.thumb.height, tb: v.thumb.bytes,
      },
      transaction: tx,
    },
  );
}

export async function findBySha(workshopId: string, sha256: string): Promise<string | null> {
  const rows = await sequelize.query<{ id: string }>('SELECT id FROM photos WHERE workshop_id = :workshopId AND sha256 = :sha256', {
    replacements: { workshopId, sha256 },
    type: QueryTypes.SELECT,
  });
  return rows[0]?.id ?? null;
}

export async function findPhoto(workshopId: string, photoId: string): Promise<PhotoRow | null> {
  const rows = await sequelize.query<PhotoRow>(`SELECT ${PHOTO_COLUMNS} ${PHOTO_FROM} WHERE p.workshop_id = :workshopId AND p.id = :photoId`, {
    replacements: { workshopId, photoId },
    type: QueryTypes.SELECT,
  });
  return rows[0] ?? null;
}

/**
 * The gallery list's SQL with positional parameters, newest first; the
 * cursor is the last row's (created_at, id). Exported so the benchmark's bare
 * floor server runs exactly the same statement.
 */
export function listPhotosQuery(
  workshopId: string,
  q: PhotoListQuery,
  after: { createdAt: string; id: string } | null,
): { sql: string; bind: unknown[] } {
  const bind: unknown[] = [workshopId];
  const param = (v: unknown) => {
    bind.push(v);
    return `$${bind.length}`;
  };
  const where = ['p.workshop_id = $1'];
  if (q.kind) where.push(`EXISTS (SELECT 1 FROM marks m WHERE m.photo_id = p.id AND m.defect_kind = ${param(q.kind)})`);
  if (q.alloy) where.push(`lower(h.alloy) = lower(${param(q.alloy)})`);
  if (q.mouldMaterial) where.push(`mo.material = ${param(q.mouldMaterial)}`);
  if (q.casterId) where.push(`h.caster_id = ${param(q.casterId)}`);
  if (q.castingId) where.push(`p.casting_id = ${param(q.castingId)}`);
  if (q.from) where.push(`p.created_at >= ${param(q.from)}::date`);
  if (q.to) where.push(`p.created_at < (${param(q.to)}::date + interval '1 day')`);
  if (after) where.push(`(p.created_at, p.id) < (${param(after.createdAt)}::timestamptz, ${param(after.id)}::uuid)`);
  const sql = `SELECT ${PHOTO_COLUMNS} ${PHOTO_FROM} WHERE ${where.join(' AND ')} ORDER BY p.created_at DESC, p.id DESC LIMIT ${param(q.limit)}`;
  return { sql, bind };
}

export async function listPhotos(
  workshopId: string,
  q: PhotoListQuery,
  after: { createdAt: string; id: string } | null,
): Promise<PhotoRow[]> {
  const { sql, bind } = listPhotosQuery(workshopId, q, after);
  return sequelize.query<PhotoRow>(sql, { bind, type: QueryTypes.SELECT });
}

export async function updatePhoto(workshopId: string, photoId: string, values: { title?: string | null; notes?: string | null }) {
  const sets = Object.keys(values).map((k) => `${k} = :${k}`);
  if (!sets.length) return;
  await sequelize.query(`UPDATE photos SET ${sets.join(', ')}, updated_at = now() WHERE workshop_id = :workshopId AND id = :photoId`, {
    replacements: { ...values, workshopId, photoId },
  });
}

export async function deletePhoto(workshopId: string, photoId: string): Promise<void> {
  await sequelize.query('DELETE FROM photos WHERE workshop_id = :workshopId AND id = :photoId', {
    replacements: { workshopId, photoId },
  });
}

/** The casting's heat owner, for permission checks on uploads. */
export async function castingOwner(workshopId: string, castingId: string): Promise<{ casterId: string } | null> {
  const rows = await sequelize.query<{ casterId: string }>(
    `SELECT h.caster_id AS "casterId" FROM castings c JOIN heats h ON h.id = c.heat_id
      WHERE c.workshop_id = :workshopId AND c.id = :castingId`,
    { replacements: { workshopId, castingId }, type: QueryTypes.SELECT },
  );
  return rows[0] ?? null;
}

type MarkRow = Omit<Mark, 'createdAt' | 'updatedAt'> & { createdAt: Date; updatedAt: Date };
const MARK_COLUMNS = `m.id, m.photo_id AS "photoId", m.author_id AS "authorId", u.display_name AS "authorName",
  m.defect_kind AS kind, m.severity, m.shape, m.x, m.y, m.width, m.height, m.note,
  m.created_at AS "createdAt", m.updated_at AS "updatedAt"`;

const markOut = (r: MarkRow): Mark => ({ ...r, createdAt: r.createdAt.toISOString(), updatedAt: r.updatedAt.toISOString() });

/** The marks of a page of photos, oldest first; positional, for the benchmark floor too. */
export const MARKS_OF_SQL = `SELECT ${MARK_COLUMNS} FROM marks m LEFT JOIN users u ON u.id = m.author_id
  WHERE m.photo_id = ANY($1::uuid[]) ORDER BY m.created_at, m.id`;

export async function marksOf(photoIds: string[]): Promise<Map<string, Mark[]>> {
  const byPhoto = new Map<string, Mark[]>(photoIds.map((id) => [id, []]));
  if (!photoIds.length) return byPhoto;
  const rows = await sequelize.query<MarkRow>(MARKS_OF_SQL, { bind: [photoIds], type: QueryTypes.SELECT });
  for (const r of rows) byPhoto.get(r.photoId)!.push(markOut(r));
  return byPhoto;
}

export async function findMark(photoId: string, markId: string): Promise<Mark | null> {
  const rows = await sequelize.query<MarkRow>(
    `SELECT ${MARK_COLUMNS} FROM marks m LEFT JOIN users u ON u.id = m.author_id WHERE m.photo_id = :photoId AND m.id = :markId`,
    { replacements: { photoId, markId }, type: QueryTypes.SELECT },
  );
  return rows[0] ? markOut(rows[0]) : null;
}

export async function insertMark(
  workshopId: string,
  photoId: string,
  authorId: string,
  m: Required<Pick<MarkCreateInput, 'kind' | 'shape' | 'x' | 'y'>> & { severity: 1 | 2 | 3; width?: number; height?: number; note?: string },
): Promise<string> {
  const rows = await sequelize.query<{ id: string }>(
    `INSERT INTO marks (id, workshop_id, photo_id, author_id, defect_kind, severity, shape, x, y, width, height, note, created_at, updated_at)
     VALUES (gen_random_uuid(), :workshopId, :photoId, :authorId, :kind, :severity, :shape, :x, :y, :width, :height, :note, now(), now())
     RETURNING id`,
    {
      replacements: { workshopId, photoId, authorId, ...m, width: m.width ?? null, height: m.height ?? null, note: m.note || null },
      type: QueryTypes.SELECT,
    },
  );
  return rows[0].id;
}

export async function updateMark(markId: string, values: MarkUpdateInput): Promise<void> {
  const columns: Record<string, string> = { kind: 'defect_kind', severity: 'severity', note: 'note', x: 'x', y: 'y', width: 'width', height: 'height' };
  const entries = Object.entries(values).filter(([k]) => k in columns);
  await sequelize.query(
    `UPDATE marks SET ${entries.map(([k]) => `${columns[k]} = :${k}`).join(', ')}, updated_at = now() WHERE id = :markId`,
    { replacements: { ...values, markId } },
  );
}

export async function deleteMark(markId: string): Promise<void> {
  await sequelize.query('DELETE FROM marks WHERE id = :markId', { replacements: { markId } });
}

/** Every photo of the workshop with its defect kinds, for the client's search index. */
export async function searchIndex(workshopId: string) {
  return sequelize.query<{
    id: string;
    title: string | null;
    notes: string | null;
    alloy: string | null;
    casterName: string | null;
    mouldMaterial: string | null;
    kinds: DefectKindId[];
    createdAt: Date;
    thumbWidth: number;
    thumbHeight: number;
  }>(
    `SELECT p.id, p.title, p.notes, h.alloy, u.display_name AS "casterName", mo.material AS "mouldMaterial",
            p.created_at AS "createdAt", p.thumb_width AS "thumbWidth", p.thumb_height AS "thumbHeight",
            COALESCE((SELECT array_agg(DISTINCT m.defect_kind) FROM marks m WHERE m.photo_id = p.id), '{}') AS kinds
       ${PHOTO_FROM}
      WHERE p.workshop_id = :workshopId
      ORDER BY p.created_at DESC, p.id DESC
      LIMIT 10000`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
}

/** Every object key the database references, for the storage sweep. */
export async function allObjectKeys(): Promise<{ photoId: string; key: string }[]> {
  return sequelize.query<{ photoId: string; key: string }>(
    `SELECT id AS "photoId", unnest(ARRAY[original_key, display_key, thumb_key]) AS key FROM photos`,
    { type: QueryTypes.SELECT },
  );
}

export async function queuedDeletions(limit: number): Promise<string[]> {
  const rows = await sequelize.query<{ key: string }>(
    'SELECT object_key AS key FROM object_deletions WHERE attempts < 20 ORDER BY queued_at LIMIT :limit',
    { replacements: { limit }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.key);
}

export async function finishDeletions(done: string[], failed: string[]): Promise<void> {
  if (done.length) await sequelize.query('DELETE FROM object_deletions WHERE object_key IN (:done)', { replacements: { done } });
  if (failed.length) {
    await sequelize.query('UPDATE object_deletions SET attempts = attempts + 1 WHERE object_key IN (:failed)', {
      replacements: { failed },
    });
  }
}
