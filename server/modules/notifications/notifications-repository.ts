import { QueryTypes } from 'sequelize';
import type { EmailMode, Notification, NotificationKind } from '../../../shared/reports/notification-schemas.ts';
import { sequelize, type Tx } from '../../db/sequelize.ts';

export type NotificationRow = {
  userId: string;
  workshopId: string;
  kind: NotificationKind;
  reportId: string | null;
  commentId: string | null;
  actorId: string | null;
  title: string;
  body: string;
  link: string;
  mail: EmailMode;
};

export type StoredNotification = NotificationRow & { id: string; createdAt: Date };

export async function preferencesOf(userIds: readonly string[], tx?: Tx): Promise<Map<string, EmailMode>> {
  if (!userIds.length) return new Map();
  const rows = await sequelize.query<{ userId: string; email: EmailMode }>(
    'SELECT user_id AS "userId", email FROM notification_preferences WHERE user_id IN (:userIds)',
    { replacements: { userIds }, type: QueryTypes.SELECT, transaction: tx },
  );
  return new Map(rows.map((r) => [r.userId, r.email]));
}

export async function setPreference(userId: string, email: EmailMode): Promise<void> {
  await sequelize.query(
    `INSERT INTO notification_preferences (user_id, email, created_at, updated_at) VALUES (:userId, :email, now(), now())
     ON CONFLICT (user_id) DO UPDATE SET email = EXCLUDED.email, updated_at = now()`,
    { replacements: { userId, email } },
  );
}

export async function insertMany(rows: readonly NotificationRow[], tx: Tx): Promise<StoredNotification[]> {
  const out: StoredNotification[] = [];
  for (const r of rows) {
    const [created] = await sequelize.query<{ id: string; createdAt: Date }>(
      `INSERT INTO notifications (id, user_id, workshop_id, kind, report_id, comment_id, actor_id, title, body, link, mail, created_at)
       VALUES (gen_random_uuid(), :userId, :workshopId, :kind, :reportId, :commentId, :actorId, :title, :body, :link, :mail, clock_timestamp())
       RETURNING id, created_at AS "createdAt"`,
      { replacements: { ...r }, type: QueryTypes.SELECT, transaction: tx },
    );
    out.push({ ...r, ...created });
  }
  return out;
}

const LIST_COLUMNS = `n.id, n.workshop_id AS "workshopId", w.name AS "workshopName", n.kind, n.title, n.body, n.link,
  n.report_id AS "reportId", n.comment_id AS "commentId", n.actor_id AS "actorId", a.display_name AS "actorName",
  n.read_at AS "readAt", n.created_at AS "createdAt"`;
const LIST_FROM = `FROM notifications n JOIN workshops w ON w.id = n.workshop_id LEFT JOIN users a ON a.id = n.actor_id`;

type ListRow = Omit<Notification, 'readAt' | 'createdAt'> & { readAt: Date | null; createdAt: Date };
const out = (r: ListRow): Notification => ({ ...r, readAt: r.readAt?.toISOString() ?? null, createdAt: r.createdAt.toISOString() });

/** The user's notifications across workshops they still belong to, newest first. */
export async function listFor(
  userId: string,
  opts: { unread?: boolean; limit: number; after?: { createdAt: string; id: string } },
): Promise<Notification[]> {
  const where = ['n.user_id = :userId', 'EXISTS (SELECT 1 FROM memberships m WHERE m.workshop_id = n.workshop_id AND m.user_id = n.user_id)'];
  if (opts.unread) where.push('n.read_at IS NULL');
  if (opts.after) where.push('(n.created_at, n.id) < (CAST(:afterCreatedAt AS timestamptz), CAST(:afterId AS uuid))');
  const rows = await sequelize.query<ListRow>(
    `SELECT ${LIST_COLUMNS} ${LIST_FROM} WHERE ${where.join(' AND ')} ORDER BY n.created_at DESC, n.id DESC LIMIT :limit`,
    {
      replacements: { userId, limit: opts.limit, afterCreatedAt: opts.after?.createdAt ?? null, afterId: opts.after?.id ?? null },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map(out);
}

export async function unreadCount(userId: string): Promise<number> {
  const [row] = await sequelize.query<{ n: number }>(
    `SELECT count(*)::int AS n FROM notifications n
      WHERE n.user_id = :userId AND n.read_at IS NULL
        AND EXISTS (SELECT 1 FROM memberships m WHERE m.workshop_id = n.workshop_id AND m.user_id = n.user_id)`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return row.n;
}

export async function markRead(userId: string, id: string): Promise<Notification | null> {
  await sequelize.query('UPDATE notifications SET read_at = COALESCE(read_at, now()) WHERE user_id = :userId AND id = :id', {
    replacements: { userId, id },
  });
  const rows = await sequelize.query<ListRow>(`SELECT ${LIST_COLUMNS} ${LIST_FROM} WHERE n.user_id = :userId AND n.id = :id`, {
    replacements: { userId, id },
    type: QueryTypes.SELECT,
  });
  return rows[0] ? out(rows[0]) : null;
}

export async function markAllRead(userId: string): Promise<number> {
  const rows = await sequelize.query<{ id: string }>(
    'UPDATE notifications SET read_at = now() WHERE user_id = :userId AND read_at IS NULL RETURNING id',
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return rows.length;
}

export type Recipient = { id: string; email: string; displayName: string };

export async function recipients(userIds: readonly string[]): Promise<Map<string, Recipient>> {
  if (!userIds.length) return new Map();
  const rows = await sequelize.query<Recipient>('SELECT id, email, display_name AS "displayName" FROM users WHERE id IN (:userIds)', {
    replacements: { userIds },
    type: QueryTypes.SELECT,
  });
  return new Map(rows.map((r) => [r.id, r]));
}

export async function workshopNames(workshopIds: readonly string[]): Promise<Map<string, string>> {
  if (!workshopIds.length) return new Map();
  const rows = await sequelize.query<{ id: string; name: string }>('SELECT id, name FROM workshops WHERE id IN (:workshopIds)', {
    replacements: { workshopIds },
    type: QueryTypes.SELECT,
  });
  return new Map(rows.map((r) => [r.id, r.name]));
}

export async function markMailed(ids: readonly string[], tx?: Tx): Promise<void> {
  if (!ids.length) return;
  await sequelize.query('UPDATE notifications SET mailed_at = now() WHERE id IN (:ids) AND mailed_at IS NULL', {
    replacements: { ids },
    transaction: tx,
  });
}

/**
 * Users with mail still owed: digest notifications not yet sent, and
 * immediate ones whose mail could not be queued (older than `staleBefore`,
 * so one still being sent by its request is left alone).
 */
export async function usersWithUnsent(staleBefore: Date): Promise<string[]> {
  const rows = await sequelize.query<{ userId: string }>(
    `SELECT DISTINCT user_id AS "userId" FROM notifications
      WHERE mailed_at IS NULL AND (mail = 'daily' OR (mail = 'immediate' AND created_at < :staleBefore))`,
    { replacements: { staleBefore }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.userId);
}

/** One user's unsent notifications for the digest, locked so two digest runs cannot both send them. */
export async function lockUnsentOf(userId: string, staleBefore: Date, tx: Tx): Promise<StoredNotification[]> {
  return sequelize.query<StoredNotification>(
    `SELECT id, user_id AS "userId", workshop_id AS "workshopId", kind, report_id AS "reportId", comment_id AS "commentId",
            actor_id AS "actorId", title, body, link, mail, created_at AS "createdAt"
       FROM notifications
      WHERE user_id = :userId AND mailed_at IS NULL AND (mail = 'daily' OR (mail = 'immediate' AND created_at < :staleBefore))
      ORDER BY created_at, id
      FOR UPDATE SKIP LOCKED`,
    { replacements: { userId, staleBefore }, type: QueryTypes.SELECT, transaction: tx },
  );
}
