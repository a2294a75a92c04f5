import { z } from 'zod';
import { can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { COMMENT_EDIT_WINDOW_MS } from '../../../shared/reports/comment-schemas.ts';
import type { Comment, CommentCreateInput, CommentUpdateInput } from '../../../shared/reports/comment-schemas.ts';
import { renderMarkdownLite } from '../../../shared/reports/markdown-lite.ts';
import { mentionedByName } from '../../../shared/reports/mentions.ts';
import { reportPath } from '../../../shared/reports/notification-schemas.ts';
import { canReadReport } from '../../../shared/reports/report-states.ts';
import { withTransaction } from '../../db/sequelize.ts';
import { AppError, forbidden, notFound } from '../../lib/app-error.ts';
import * as notificationsService from '../notifications/notifications-service.ts';
import type { NoticeDraft } from '../notifications/notifications-service.ts';
import * as photosService from '../photos/photos-service.ts';
import * as reportsService from '../reports/reports-service.ts';
import type { ReportAccess } from '../reports/reports-service.ts';
import * as workshopsService from '../workshops/workshops-service.ts';
import * as repo from './comments-repository.ts';
import type { CommentRecord } from './comments-repository.ts';

// Whoever may read a report may comment on it; the comment is theirs to fix
// for a short while. Mentions reach only people who can open the report, so
// a mention never leaks a report to someone outside it.

const commentNotFound = () => notFound('Comment', 'comment-not-found');

function toComment(r: CommentRecord): Comment {
  return {
    id: r.id,
    reportId: r.reportId,
    parentId: r.parentId,
    authorId: r.authorId,
    authorName: r.authorName,
    body: r.body,
    html: renderMarkdownLite(r.body),
    markId: r.markId,
    photoId: r.photoId,
    mentions: r.mentions,
    createdAt: r.createdAt.toISOString(),
    editedAt: r.editedAt?.toISOString() ?? null,
    editableUntil: new Date(r.createdAt.getTime() + COMMENT_EDIT_WINDOW_MS).toISOString(),
  };
}

type Issue = { path: (string | number)[]; message: string };
function invalid(issues: readonly Issue[]): never {
  throw new z.ZodError(issues.map((i) => ({ code: 'custom' as const, path: i.path, message: i.message, input: undefined })));
}

/**
 * The members a comment mentions: picked ids (each must be able to read the
 * report) plus "@Name" in the text; and the commenter's own name for the notices.
 */
async function mentionsIn(
  actor: Actor,
  workshopId: string,
  access: ReportAccess,
  body: string,
  picked: readonly string[] = [],
): Promise<{ mentioned: string[]; actorName: string }> {
  const members = await workshopsService.listMembers(actor, workshopId);
  const readers = members.filter((m) => canReadReport({ id: m.userId, role: m.role }, access.parties));
  if (picked.some((id) => !readers.some((r) => r.userId === id))) {
    invalid([{ path: ['mentionIds'], message: 'Mention members who can see this report' }]);
  }
  const named = mentionedByName(body, readers);
  return {
    mentioned: [...new Set([...picked, ...named])].filter((id) => id !== actor.id),
    actorName: members.find((m) => m.userId === actor.id)?.displayName ?? 'Someone',
  };
}

const excerpt = (text: string, max = 300) => (text.length > max ? `${text.slice(0, max - 1).trimEnd()}…` : text);

async function noticesFor(
  actor: Actor,
  authorName: string,
  access: ReportAccess,
  comment: { id: string; body: string },
  mentioned: readonly string[],
  everyone: boolean,
): Promise<NoticeDraft[]> {
  const { record } = access;
  const base = {
    workshopId: record.workshopId,
    reportId: record.id,
    commentId: comment.id,
    actorId: actor.id,
    body: excerpt(comment.body),
    link: `${reportPath(record.workshopId, record.id)}#comment-${comment.id}`,
  };
  const drafts: NoticeDraft[] = mentioned.map((userId) => ({
    ...base,
    userId,
    kind: 'mentioned',
    title: `${authorName} mentioned you on “${record.title}”`,
  }));
  if (everyone) {
    for (const userId of await reportsService.participantsOf(access)) {
      if (userId === actor.id || mentioned.includes(userId)) continue;
      drafts.push({ ...base, userId, kind: 'comment_added', title: `${authorName} commented on “${record.title}”` });
    }
  }
  return drafts;
}

export async function listComments(actor: Actor, workshopId: string, reportId: string): Promise<{ items: Comment[] }> {
  await reportsService.reportAccess(actor, workshopId, reportId);
  return { items: (await repo.commentsOfReport(reportId)).map(toComment) };
}

export async function createComment(actor: Actor, workshopId: string, reportId: string, input: CommentCreateInput): Promise<Comment> {
  const access = await reportsService.reportAccess(actor, workshopId, reportId);
  if (!can(actor, 'create', 'comment')) throw forbidden();
  const issues: Issue[] = [];
  if (input.parentId && !(await repo.isOnReport(input.parentId, reportId))) {
    issues.push({ path: ['parentId'], message: 'Answer a comment on this report' });
  }
  if (input.markId && !(await repo.markOnCasting(workshopId, input.markId, access.record.castingId))) {
    issues.push({ path: ['markId'], message: 'Pin the comment to a mark on a photo of this report’s casting' });
  }
  if (issues.length) invalid(issues);
  const { mentioned, actorName } = await mentionsIn(actor, workshopId, access, input.body, input.mentionIds);

  const { id, recorded } = await withTransaction(async (tx) => {
    const commentId = await repo.insertComment(
      { workshopId, reportId, parentId: input.parentId ?? null, authorId: actor.id, body: input.body, markId: input.markId ?? null },
      tx,
    );
    await repo.addMentions(commentId, mentioned, tx);
    const drafts = await noticesFor(actor, actorName, access, { id: commentId, body: input.body }, mentioned, true);
    return { id: commentId, recorded: await notificationsService.record(drafts, tx) };
  });
  await notificationsService.deliver(recorded);
  return toComment((await repo.findComment(workshopId, id))!);
}

/** The author fixes a comment within the edit window; people newly mentioned are told. */
export async function updateComment(actor: Actor, workshopId: string, commentId: string, input: CommentUpdateInput): Promise<Comment> {
  const comment = await repo.findComment(workshopId, commentId);
  if (!comment) throw commentNotFound();
  const access = await reportsService.reportAccess(actor, workshopId, comment.reportId).catch((error: unknown) => {
    // A comment on a report the actor cannot read is as missing as the report.
    if (error instanceof AppError && error.httpStatus === 404) throw commentNotFound();
    throw error;
  });
  if (!comment.authorId || !can(actor, 'update', 'comment', { ownerId: comment.authorId })) throw forbidden('Only its author edits a comment');
  const closed = () =>
    new AppError('edit-window-closed', `Comments can be edited for ${COMMENT_EDIT_WINDOW_MS / 60_000} minutes after posting; write a new one`, 409);
  if (Date.now() - comment.createdAt.getTime() > COMMENT_EDIT_WINDOW_MS) throw closed();
  const { mentioned, actorName } = await mentionsIn(actor, workshopId, access, input.body, input.mentionIds);

  const recorded = await withTransaction(async (tx) => {
    await repo.lockComment(workshopId, commentId, tx);
    await repo.updateBody(commentId, input.body, tx);
    const added = await repo.addMentions(commentId, mentioned, tx);
    return notificationsService.record(await noticesFor(actor, actorName, access, { id: commentId, body: input.body }, added, false), tx);
  });
  await notificationsService.deliver(recorded);
  return toComment((await repo.findComment(workshopId, commentId))!);
}

/** Comments pinned to the photo's marks, from the reports the actor may read, for the photo page. */
export async function photoComments(actor: Actor, workshopId: string, photoId: string): Promise<{ items: Comment[] }> {
  await photosService.getPhoto(actor, workshopId, photoId);
  const rows = await repo.commentsOnPhoto(workshopId, photoId);
  const readable = new Set(await reportsService.readableReportIds(actor, workshopId, [...new Set(rows.map((r) => r.reportId))]));
  return { items: rows.filter((r) => readable.has(r.reportId)).map(toComment) };
}
