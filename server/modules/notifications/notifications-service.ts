import { z } from 'zod';
import { DEFAULT_EMAIL_MODE, MAILED_NOTIFICATION_KINDS } from '../../../shared/reports/notification-schemas.ts';
import type {
  Notification,
  NotificationKind,
  NotificationListQuery,
  NotificationPage,
  NotificationPreferences,
} from '../../../shared/reports/notification-schemas.ts';
import { config } from '../../config.ts';
import { withTransaction, type Tx } from '../../db/sequelize.ts';
import { AppError } from '../../lib/app-error.ts';
import { defineJob, startJobs } from '../../lib/jobs.ts';
import { logger } from '../../lib/logger.ts';
import { queueMail } from '../../lib/mail-queue.ts';
import { mailLayout } from '../../lib/mailer.ts';
import * as repo from './notifications-repository.ts';

// Notifications are written in the same transaction as the change that
// causes them, so they exist exactly when the change does. Mail is queued
// only after that commit, and a failure to queue is logged, never thrown:
// the in-app notification stays, and the digest run picks the mail up later.

/** What a service wants said to one user. */
export type NoticeDraft = {
  userId: string;
  workshopId: string;
  kind: NotificationKind;
  reportId?: string | null;
  commentId?: string | null;
  actorId?: string | null;
  title: string;
  /** Plain text, a few lines at most. */
  body: string;
  /** Client path, e.g. /w/:workshopId/reports/:reportId. */
  link: string;
};

export type RecordedNotice = repo.StoredNotification;

export const NOTIFICATION_DIGEST_JOB = 'notification-digest';
/** When the digest goes out (UTC, every day). */
export const DIGEST_CRON = '0 7 * * *';
/** An immediate mail not queued within this long is treated as failed and goes into the next digest. */
const IMMEDIATE_GRACE_MS = 10 * 60_000;

/** Saves one notification per draft (one per user and event) inside `tx`, with each user's e-mail preference. */
export async function record(drafts: readonly NoticeDraft[], tx: Tx): Promise<RecordedNotice[]> {
  const seen = new Set<string>();
  const unique = drafts.filter((d) => {
    const key = `${d.userId}:${d.kind}:${d.reportId ?? ''}:${d.commentId ?? ''}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
  if (!unique.length) return [];
  const prefs = await repo.preferencesOf([...new Set(unique.map((d) => d.userId))], tx);
  return repo.insertMany(
    unique.map((d) => ({
      userId: d.userId,
      workshopId: d.workshopId,
      kind: d.kind,
      reportId: d.reportId ?? null,
      commentId: d.commentId ?? null,
      actorId: d.actorId ?? null,
      title: d.title.slice(0, 200),
      body: d.body,
      link: d.link,
      mail: MAILED_NOTIFICATION_KINDS.includes(d.kind) ? (prefs.get(d.userId) ?? DEFAULT_EMAIL_MODE) : 'off',
    })),
    tx,
  );
}

const absolute = (path: string) => `${config().http.origin}${path}`;

function singleMail(to: repo.Recipient, n: RecordedNotice, workshopName: string) {
  const url = absolute(n.link);
  const settings = absolute('/settings');
  const paragraphs = [n.body, `In ${workshopName}.`].filter(Boolean);
  return {
    to: to.email,
    subject: n.title,
    text: `Hello ${to.displayName},\n\n${n.title}\n\n${paragraphs.join('\n\n')}\n\nOpen the report: ${url}\n\nChoose how Pourscope mails you in your settings: ${settings}\n`,
    html: mailLayout({ heading: n.title, paragraphs: [`Hello ${to.displayName},`, ...paragraphs], action: { label: 'Open the report', url } }),
  };
}

function digestMail(to: repo.Recipient, items: readonly RecordedNotice[], names: ReadonlyMap<string, string>) {
  const lines = items.map((n) => `- ${n.title} (${names.get(n.workshopId) ?? 'your workshop'}): ${absolute(n.link)}`);
  const subject = `Pourscope: ${items.length} update${items.length === 1 ? '' : 's'} on defect reports`;
  return {
    to: to.email,
    subject,
    text: `Hello ${to.displayName},\n\nWhat happened on your defect reports:\n\n${lines.join('\n')}\n\nChoose how Pourscope mails you in your settings: ${absolute('/settings')}\n`,
    html: mailLayout({
      heading: subject,
      paragraphs: [`Hello ${to.displayName},`, ...items.map((n) => `${n.title} (${names.get(n.workshopId) ?? 'your workshop'}): ${absolute(n.link)}`)],
      action: { label: 'Open your notifications', url: absolute('/') },
    }),
  };
}

let digestScheduled: Promise<void> | undefined;

/**
 * Makes sure the daily digest is on pg-boss's schedule. Called when someone
 * first needs it (a daily preference, a daily notification) rather than at
 * start-up, so scripts that load this module never start the job queue.
 */
function ensureDigestSchedule(): void {
  digestScheduled ??= (async () => {
    const boss = await startJobs();
    await boss.createQueue(NOTIFICATION_DIGEST_JOB);
    await boss.schedule(NOTIFICATION_DIGEST_JOB, DIGEST_CRON, {}, { tz: 'UTC' });
  })().catch((err: unknown) => {
    digestScheduled = undefined;
    logger.error({ err }, 'could not schedule the notification digest');
  });
}

/** After the commit: queues the immediate mails. Never throws; what fails stays for the digest. */
export async function deliver(recorded: readonly RecordedNotice[]): Promise<void> {
  try {
    if (recorded.some((n) => n.mail === 'daily')) ensureDigestSchedule();
    const immediate = recorded.filter((n) => n.mail === 'immediate');
    if (!immediate.length) return;
    const [people, names] = await Promise.all([
      repo.recipients([...new Set(immediate.map((n) => n.userId))]),
      repo.workshopNames([...new Set(immediate.map((n) => n.workshopId))]),
    ]);
    for (const n of immediate) {
      const to = people.get(n.userId);
      if (!to) continue;
      try {
        await queueMail(singleMail(to, n, names.get(n.workshopId) ?? 'your workshop'));
        await repo.markMailed([n.id]);
      } catch (err) {
        logger.error({ err, notificationId: n.id }, 'could not queue a notification mail; the digest will retry it');
      }
    }
  } catch (err) {
    logger.error({ err }, 'could not deliver notifications; the digest will retry them');
  }
}

/** Records and delivers in one go, for changes that need no transaction of their own. */
export async function notify(drafts: readonly NoticeDraft[]): Promise<void> {
  const recorded = await withTransaction((tx) => record(drafts, tx));
  await deliver(recorded);
}

/**
 * The digest: one mail per user with everything still owed to them (daily
 * notifications, and immediate ones whose mail could not be queued). Each
 * user is handled in a transaction of their own, so one failure does not
 * resend the others.
 */
export async function runNotificationDigest(opts: { now?: Date } = {}): Promise<{ users: number; notifications: number }> {
  const staleBefore = new Date((opts.now ?? new Date()).getTime() - IMMEDIATE_GRACE_MS);
  let users = 0;
  let notifications = 0;
  for (const userId of await repo.usersWithUnsent(staleBefore)) {
    await withTransaction(async (tx) => {
      const items = await repo.lockUnsentOf(userId, staleBefore, tx);
      if (!items.length) return;
      const mode = (await repo.preferencesOf([userId], tx)).get(userId) ?? DEFAULT_EMAIL_MODE;
      const to = (await repo.recipients([userId])).get(userId);
      // Someone who has since turned mail off gets none of what was owed.
      if (mode !== 'off' && to) {
        const names = await repo.workshopNames([...new Set(items.map((n) => n.workshopId))]);
        await queueMail(digestMail(to, items, names));
        users += 1;
        notifications += items.length;
      }
      await repo.markMailed(
        items.map((n) => n.id),
        tx,
      );
    });
  }
  return { users, notifications };
}

defineJob(NOTIFICATION_DIGEST_JOB, async () => {
  await runNotificationDigest();
}, { retryLimit: 5 });

// ── the user's own notifications ────────────────────────────────────────────

const cursorSchema = z.object({ c: z.iso.datetime(), i: z.uuid() });

function decodeCursor(cursor: string | undefined) {
  if (!cursor) return undefined;
  try {
    const parsed = cursorSchema.parse(JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')));
    return { createdAt: parsed.c, id: parsed.i };
  } catch {
    throw new z.ZodError([{ code: 'custom', path: ['cursor'], message: 'This cursor is not valid; start again from the first page', input: cursor }]);
  }
}

export async function listNotifications(userId: string, query: NotificationListQuery): Promise<NotificationPage> {
  const rows = await repo.listFor(userId, { unread: query.unread, limit: query.limit + 1, after: decodeCursor(query.cursor) });
  const items = rows.slice(0, query.limit);
  const last = items[items.length - 1];
  return {
    items,
    unreadCount: await repo.unreadCount(userId),
    nextCursor: rows.length > query.limit && last ? Buffer.from(JSON.stringify({ c: last.createdAt, i: last.id })).toString('base64url') : null,
  };
}

export async function markRead(userId: string, notificationId: string): Promise<Notification> {
  const n = await repo.markRead(userId, notificationId);
  if (!n) throw new AppError('notification-not-found', 'Notification not found', 404);
  return n;
}

export async function markAllRead(userId: string): Promise<{ updated: number }> {
  return { updated: await repo.markAllRead(userId) };
}

export async function preferences(userId: string): Promise<NotificationPreferences> {
  const mode = (await repo.preferencesOf([userId])).get(userId);
  return { email: mode ?? DEFAULT_EMAIL_MODE };
}

export async function setPreferences(userId: string, input: NotificationPreferences): Promise<NotificationPreferences> {
  await repo.setPreference(userId, input.email);
  if (input.email === 'daily') ensureDigestSchedule();
  return preferences(userId);
}

