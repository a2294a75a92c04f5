import { QueryTypes } from 'sequelize';
import { sequelize, type Tx } from '../../db/sequelize.ts';

export type CommentRecord = {
  id: string;
  workshopId: string;
  reportId: string;
  parentId: string | null;
  authorId: string | null;
  authorName: string | null;
  body: string;
  markId: string | null;
  photoId: string | null;
  mentions: { userId: string; displayName: string }[];
  createdAt: Date;
  editedAt: Date | null;
};

const SELECT = `
  SELECT c.id, c.workshop_id AS "workshopId", c.report_id AS "reportId", c.parent_id AS "parentId",
         c.author_id AS "authorId", u.display_name AS "authorName", c.body, c.mark_id AS "markId", mk.photo_id AS "photoId",
         COALESCE((SELECT json_agg(json_build_object('userId', x.user_id, 'displayName', xu.display_name) ORDER BY xu.display_name, x.user_id)
                     FROM comment_mentions x JOIN users xu ON xu.id = x.user_id WHERE x.comment_id = c.id), '[]'::json) AS mentions,
         c.created_at AS "createdAt", c.edited_at AS "editedAt"
    FROM comments c
    LEFT JOIN users u ON u.id = c.author_id
    LEFT JOIN marks mk ON mk.id = c.mark_id`;

export async function insertComment(
  values: { workshopId: string; reportId: string; parentId: string | null; authorId: string; body: string; markId: string | null },
  tx: Tx,
): Promise<string> {
  const [row] = await sequelize.query<{ id: string }>(
    `INSERT INTO comments (id, workshop_id, report_id, parent_id, author_id, body, mark_id, created_at, updated_at)
     VALUES (gen_random_uuid(), :workshopId, :reportId, :parentId, :authorId, :body, :markId, clock_timestamp(), clock_timestamp())
     RETURNING id`,
    { replacements: values, type: QueryTypes.SELECT, transaction: tx },
  );
  return row.id;
}

/** Adds mentions; returns the users not mentioned in this comment before. */
export async function addMentions(commentId: string, userIds: readonly string[], tx: Tx): Promise<string[]> {
  const added: string[] = [];
  for (const userId of userIds) {
    const rows = await sequelize.query<{ userId: string }>(
      `INSERT INTO comment_mentions (comment_id, user_id) VALUES (:commentId, :userId) ON CONFLICT DO NOTHING RETURNING user_id AS "userId"`,
      { replacements: { commentId, userId }, type: QueryTypes.SELECT, transaction: tx },
    );
    if (rows.length) added.push(userId);
  }
  return added;
}

export async function findComment(workshopId: string, commentId: string, tx?: Tx): Promise<CommentRecord | null> {
  const rows = await sequelize.query<CommentRecord>(`${SELECT} WHERE c.workshop_id = :workshopId AND c.id = :commentId`, {
    replacements: { workshopId, commentId },
    type: QueryTypes.SELECT,
    transaction: tx,
  });
  return rows[0] ?? null;
}

export async function lockComment(workshopId: string, commentId: string, tx: Tx): Promise<void> {
  await sequelize.query('SELECT id FROM comments WHERE workshop_id = :workshopId AND id = :commentId FOR UPDATE', {
    replacements: { workshopId, commentId },
    type: QueryTypes.SELECT,
    transaction: tx,
  });
}

export async function commentsOfReport(reportId: string): Promise<CommentRecord[]> {
  return sequelize.query<CommentRecord>(`${SELECT} WHERE c.report_id = :reportId ORDER BY c.created_at, c.id`, {
    replacements: { reportId },
    type: QueryTypes.SELECT,
  });
}

/** Comments pinned to any mark of the photo, oldest first. */
export async function commentsOnPhoto(workshopId: string, photoId: string): Promise<CommentRecord[]> {
  return sequelize.query<CommentRecord>(
    `${SELECT} WHERE c.workshop_id = :workshopId AND mk.photo_id = :photoId ORDER BY c.created_at, c.id`,
    { replacements: { workshopId, photoId }, type: QueryTypes.SELECT },
  );
}

export async function updateBody(commentId: string, body: string, tx: Tx): Promise<void> {
  await sequelize.query('UPDATE comments SET body = :body, edited_at = clock_timestamp(), updated_at = clock_timestamp() WHERE id = :commentId', {
    replacements: { commentId, body },
    transaction: tx,
  });
}

export async function isOnReport(commentId: string, reportId: string): Promise<boolean> {
  const rows = await sequelize.query('SELECT 1 FROM comments WHERE id = :commentId AND report_id = :reportId', {
    replacements: { commentId, reportId },
    type: QueryTypes.SELECT,
  });
  return rows.length > 0;
}

/** Whether the mark is on a photo of the casting. */
export async function markOnCasting(workshopId: string, markId: string, castingId: string): Promise<boolean> {
  const rows = await sequelize.query(
    `SELECT 1 FROM marks m JOIN photos p ON p.id = m.photo_id
      WHERE m.workshop_id = :workshopId AND m.id = :markId AND p.casting_id = :castingId`,
    { replacements: { workshopId, markId, castingId }, type: QueryTypes.SELECT },
  );
  return rows.length > 0;
}
