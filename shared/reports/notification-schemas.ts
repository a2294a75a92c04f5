import { z } from 'zod';

// In-app notifications (always kept) and how each user wants them by e-mail:
// one mail each, one digest a day, or none.

export const NOTIFICATION_KINDS = [
  'report_submitted',
  'review_started',
  'comment_added',
  'mentioned',
  'report_resolved',
  'report_reopened',
] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

/** Kinds worth an e-mail; the rest are in-app only. */
export const MAILED_NOTIFICATION_KINDS: readonly NotificationKind[] = [
  'report_submitted',
  'comment_added',
  'mentioned',
  'report_resolved',
  'report_reopened',
];

export const EMAIL_MODES = ['immediate', 'daily', 'off'] as const;
export type EmailMode = (typeof EMAIL_MODES)[number];
export const DEFAULT_EMAIL_MODE: EmailMode = 'immediate';

export const notificationPreferencesSchema = z.object({ email: z.enum(EMAIL_MODES) }).strict();
export type NotificationPreferences = z.infer<typeof notificationPreferencesSchema>;

export const notificationParamsSchema = z.object({ notificationId: z.uuid('Unknown notification') });

export const NOTIFICATION_PAGE_MAX = 100;
export const notificationListQuerySchema = z.object({
  unread: z.enum(['true', 'false']).transform((v) => v === 'true').optional(),
  cursor: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(NOTIFICATION_PAGE_MAX, `At most ${NOTIFICATION_PAGE_MAX} a page`).default(30),
});
export type NotificationListQuery = z.output<typeof notificationListQuerySchema>;

export const notificationSchema = z.object({
  id: z.uuid(),
  workshopId: z.uuid(),
  workshopName: z.string(),
  kind: z.enum(NOTIFICATION_KINDS),
  title: z.string(),
  body: z.string(),
  /** Client path to open, e.g. /w/:workshopId/reports/:reportId. */
  link: z.string(),
  reportId: z.uuid().nullable(),
  commentId: z.uuid().nullable(),
  actorId: z.uuid().nullable(),
  actorName: z.string().nullable(),
  readAt: z.string().nullable(),
  createdAt: z.string(),
});
export type Notification = z.infer<typeof notificationSchema>;

export const notificationPageSchema = z.object({
  items: z.array(notificationSchema),
  unreadCount: z.number().int(),
  nextCursor: z.string().nullable(),
});
export type NotificationPage = z.infer<typeof notificationPageSchema>;

/** The client path of a report; mails put the app's origin in front. */
export function reportPath(workshopId: string, reportId: string): string {
  return `/w/${workshopId}/reports/${reportId}`;
}
