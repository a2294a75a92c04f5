import { z } from 'zod';
import { accessFor, can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { findMeltVariable } from '../../../shared/domain/index.ts';
import { rankingKey } from '../../../shared/reports/diagnosis-schemas.ts';
import { reportPath } from '../../../shared/reports/notification-schemas.ts';
import type {
  FollowUpHeatInput,
  ReportCreateInput,
  ReportDetail,
  ReportListQuery,
  ReportPage,
  ReportTransitionInput,
  ReportUpdateInput,
  ReviewQueue,
  StudentOverview,
} from '../../../shared/reports/report-schemas.ts';
import {
  REPORT_STATE_LABELS,
  allowedActions,
  canEditReport,
  canReadReport,
  checkTransition,
  reportRelations,
} from '../../../shared/reports/report-states.ts';
import type { ReportAction, ReportParties, ReportRelation, ReportState } from '../../../shared/reports/report-states.ts';
import { withTransaction, type Tx } from '../../db/sequelize.ts';
import { AppError, forbidden, notFound } from '../../lib/app-error.ts';
import * as diagnosisService from '../diagnosis/diagnosis-service.ts';
import * as notificationsService from '../notifications/notifications-service.ts';
import type { NoticeDraft } from '../notifications/notifications-service.ts';
import * as workshopsService from '../workshops/workshops-service.ts';
import * as repo from './reports-repository.ts';
import type { ReportChanges, ReportRecord, ReportVisibility } from './reports-repository.ts';

// Reports follow the pure state table in shared/reports/report-states.ts:
// this service decides who the actor is to the report (author, reviewer),
// asks the table, and writes the change, its history row and its
// notifications in one transaction. Mail goes out after the commit.
// A report the actor may not read answers exactly like a missing one.

const reportNotFound = () => notFound('Report', 'report-not-found');

/** The report with who it concerns and how the actor stands to it. */
export type ReportAccess = { record: ReportRecord; parties: ReportParties; relations: ReportRelation[] };

async function partiesOf(record: Pick<ReportRecord, 'workshopId' | 'authorId' | 'requestedMentorId'>): Promise<ReportParties> {
  const assigned = await workshopsService.mentorIdsOf(record.workshopId, record.authorId);
  const mentorIds = [...new Set([...assigned, ...(record.requestedMentorId ? [record.requestedMentorId] : [])])];
  return { authorId: record.authorId, mentorIds };
}

/** The report when the actor may read it; otherwise the 404 of a missing report. */
export async function reportAccess(actor: Actor, workshopId: string, reportId: string): Promise<ReportAccess> {
  const record = await repo.findReport(workshopId, reportId);
  if (!record) throw reportNotFound();
  const parties = await partiesOf(record);
  if (!canReadReport(actor, parties)) throw reportNotFound();
  return { record, parties, relations: reportRelations(actor, parties) };
}

/** Of `reportIds`, the ones the actor may read (for lists built elsewhere, such as a photo's comments). */
export async function readableReportIds(actor: Actor, workshopId: string, reportIds: readonly string[]): Promise<string[]> {
  return repo.visibleIds(workshopId, visibilityOf(actor), reportIds);
}

/**
 * Who hears about what happens on a report: its author, every mentor who may
 * review it, and whoever has commented and may still read it.
 */
export async function participantsOf(access: Pick<ReportAccess, 'record' | 'parties'>): Promise<string[]> {
  const commenters = await repo.commenters(access.record.workshopId, access.record.id);
  const readers = commenters.filter((c) => canReadReport(c, access.parties)).map((c) => c.id);
  return [...new Set([access.parties.authorId, ...access.parties.mentorIds, ...readers])];
}

function visibilityOf(actor: Actor): ReportVisibility {
  return { access: accessFor(actor, 'read', 'report'), actorId: actor.id };
}

type Issue = { path: (string | number)[]; message: string };

/** A 400 naming the fields, in the same shape as a schema failure. */
function invalid(issues: readonly Issue[]): never {
  throw new z.ZodError(issues.map((i) => ({ code: 'custom' as const, path: i.path, message: i.message, input: undefined })));
}

async function mentorIssue(workshopId: string, authorId: string, mentorId: string): Promise<Issue | null> {
  const role = await workshopsService.findRole(workshopId, mentorId);
  if (mentorId === authorId || (role !== 'mentor' && role !== 'admin')) {
    return { path: ['requestedMentorId'], message: 'Ask one of this workshop’s mentors (or admins)' };
  }
  return null;
}

function photoIssue(photoIds: readonly string[], castingPhotoIds: readonly string[]): Issue | null {
  return photoIds.every((id) => castingPhotoIds.includes(id)) ? null : { path: ['photoIds'], message: 'Pick photos of this report’s casting' };
}

// ── reading ─────────────────────────────────────────────────────────────────

async function detailOf(access: ReportAccess): Promise<ReportDetail> {
  const { record, parties, relations } = access;
  const [photoIds, confirmedCauses, events, current, followUp] = await Promise.all([
    repo.photoIdsOf(record.id),
    repo.confirmedCausesOf(record.id),
    repo.eventsOf(record.id),
    diagnosisService.diagnoseCasting(record.workshopId, record.castingId),
    record.followUpHeatId ? followUpOf(record.workshopId, record.followUpHeatId) : Promise.resolve(null),
  ]);
  return {
    id: record.id,
    workshopId: record.workshopId,
    castingId: record.castingId,
    heatId: record.heatId,
    authorId: record.authorId,
    authorName: record.authorName,
    title: record.title,
    question: record.question,
    state: record.state,
    requestedMentorId: record.requestedMentorId,
    mentorIds: [...parties.mentorIds],
    photoIds,
    resolutionNote: record.resolutionNote,
    confirmedCauses,
    followUp,
    events,
    allowedActions: allowedActions(record.state, relations),
    canEdit: canEditReport(record.state, relations),
    snapshot: record.snapshot,
    current,
    // Scores move a little with every resolved report; the ranking is what a reader compares.
    changed: record.snapshot ? rankingKey(record.snapshot.causes) !== rankingKey(current.causes) : false,
    createdAt: record.createdAt,
    updatedAt: record.updatedAt,
    submittedAt: record.submittedAt,
    resolvedAt: record.resolvedAt,
  };
}

async function followUpOf(workshopId: string, heatId: string): Promise<ReportDetail['followUp']> {
  const heat = await repo.heatOf(workshopId, heatId);
  if (!heat) return null;
  return { heatId, pouredAt: heat.pouredAt, defectKinds: await repo.heatDefectKinds(heatId) };
}

/** The report with its snapshot and the current ranking side by side. */
export async function getReport(actor: Actor, workshopId: string, reportId: string): Promise<ReportDetail> {
  return detailOf(await reportAccess(actor, workshopId, reportId));
}

const cursorSchema = z.object({ c: z.iso.datetime(), i: z.uuid() });

function decodeCursor(cursor: string) {
  try {
    const parsed = cursorSchema.parse(JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')));
    return { createdAt: parsed.c, id: parsed.i };
  } catch {
    return invalid([{ path: ['cursor'], message: 'This cursor is not valid; start again from the first page' }]);
  }
}

export async function listReports(actor: Actor, workshopId: string, query: ReportListQuery): Promise<ReportPage> {
  const { cursor, limit, ...filter } = query;
  const rows = await repo.listRows(workshopId, visibilityOf(actor), filter, {
    limit: limit + 1,
    after: cursor ? decodeCursor(cursor) : undefined,
  });
  const items = rows.slice(0, limit);
  const last = items[items.length - 1];
  return {
    items,
    nextCursor: rows.length > limit && last ? Buffer.from(JSON.stringify({ c: last.createdAt, i: last.id })).toString('base64url') : null,
  };
}

/** A reviewer's reach: mentors their students' and requesters' reports, admins every report. */
function reviewerReach(actor: Actor): ReportVisibility | null {
  const access = accessFor(actor, 'update', 'report').filter((a) => a !== 'own');
  return access.length ? { access, actorId: actor.id } : null;
}

const QUEUE_MAX = 200;

export async function reviewQueue(actor: Actor, workshopId: string): Promise<ReviewQueue> {
  const reach = reviewerReach(actor);
  if (!reach) throw forbidden('The review queue is for mentors and admins');
  const [items, counts] = await Promise.all([repo.queueRows(workshopId, reach, QUEUE_MAX), repo.queueCounts(workshopId, reach)]);
  return { items, counts };
}

const OVERVIEW_REPORTS_MAX = 500;

export async function studentOverview(actor: Actor, workshopId: string, userId: string): Promise<StudentOverview> {
  const role = await workshopsService.findRole(workshopId, userId);
  if (!role) throw notFound('Member', 'member-not-found');
  const mentorIds = await workshopsService.mentorIdsOf(workshopId, userId);
  if (!can(actor, 'read', 'report', { ownerId: userId, ownerMentorIds: mentorIds })) {
    throw forbidden('Only the student’s mentors and the workshop’s admins see this overview');
  }
  const [displayName, heatCount, reports, defectTrend] = await Promise.all([
    repo.displayName(userId),
    repo.heatCount(workshopId, userId),
    repo.listRows(workshopId, visibilityOf(actor), { studentId: userId }, { limit: OVERVIEW_REPORTS_MAX }),
    repo.defectTrend(workshopId, userId),
  ]);
  const reportCounts = { draft: 0, submitted: 0, in_review: 0, resolved: 0 };
  for (const r of reports) reportCounts[r.state] += 1;
  return { student: { userId, displayName, role }, heatCount, reports, reportCounts, defectTrend };
}

// ── writing ─────────────────────────────────────────────────────────────────

export async function createReport(actor: Actor, workshopId: string, input: ReportCreateInput): Promise<ReportDetail> {
  if (!can(actor, 'create', 'report')) throw forbidden('Casters and students write reports; mentors review them');
  const casting = await repo.castingOf(workshopId, input.castingId);
  const issues: Issue[] = [];
  // A report is the caster's question about their own pour.
  if (!casting || casting.casterId !== actor.id) issues.push({ path: ['castingId'], message: 'Pick one of your own castings in this workshop' });
  if (input.requestedMentorId) {
    const issue = await mentorIssue(workshopId, actor.id, input.requestedMentorId);
    if (issue) issues.push(issue);
  }
  const castingPhotos = casting ? await repo.photoIdsOfCasting(workshopId, input.castingId) : [];
  const photoIds = input.photoIds ? [...new Set(input.photoIds)] : castingPhotos;
  const photoProblem = casting && photoIssue(photoIds, castingPhotos);
  if (photoProblem) issues.push(photoProblem);
  if (issues.length) invalid(issues);

  const reportId = await withTransaction(async (tx) => {
    const id = await repo.insertReport(
      {
        workshopId,
        castingId: input.castingId,
        authorId: actor.id,
        title: input.title,
        question: input.question,
        requestedMentorId: input.requestedMentorId ?? null,
      },
      tx,
    );
    await repo.setPhotos(id, photoIds, tx);
    await repo.insertEvent({ reportId: id, actorId: actor.id, action: 'create', fromState: null, toState: 'draft', note: null }, tx);
    return id;
  });
  return getReport(actor, workshopId, reportId);
}

export async function updateDraft(actor: Actor, workshopId: string, reportId: string, input: ReportUpdateInput): Promise<ReportDetail> {
  const access = await reportAccess(actor, workshopId, reportId);
  if (!access.relations.includes('author')) throw forbidden('Only the author edits a report');
  const notDraft = () => new AppError('report-not-draft', 'Only a draft can be edited; withdraw the report first', 409);
  if (!canEditReport(access.record.state, access.relations)) throw notDraft();
  const issues: Issue[] = [];
  if (input.requestedMentorId) {
    const issue = await mentorIssue(workshopId, access.record.authorId, input.requestedMentorId);
    if (issue) issues.push(issue);
  }
  if (input.photoIds) {
    const issue = photoIssue(input.photoIds, await repo.photoIdsOfCasting(workshopId, access.record.castingId));
    if (issue) issues.push(issue);
  }
  if (issues.length) invalid(issues);
  await withTransaction(async (tx) => {
    const locked = await repo.lockReport(workshopId, reportId, tx);
    if (!locked) throw reportNotFound();
    if (locked.state !== 'draft') throw notDraft();
    const { photoIds, ...changes } = input;
    await repo.updateReport(workshopId, reportId, changes, tx);
    if (photoIds) await repo.setPhotos(reportId, [...new Set(photoIds)], tx);
    await repo.insertEvent({ reportId, actorId: actor.id, action: 'edit', fromState: 'draft', toState: 'draft', note: null }, tx);
  });
  return getReport(actor, workshopId, reportId);
}

const ACTION_WORDS: Record<ReportAction, string> = {
  submit: 'submit',
  withdraw: 'withdraw',
  start_review: 'start reviewing',
  resolve: 'resolve',
  reopen: 'reopen',
};

function transitionError(reason: 'forbidden' | 'wrong-state', state: ReportState, action: ReportAction): AppError {
  if (reason === 'forbidden') return forbidden(`You cannot ${ACTION_WORDS[action]} this report`);
  return new AppError('transition-not-allowed', `This report is ${REPORT_STATE_LABELS[state]}; you cannot ${ACTION_WORDS[action]} it now`, 409);
}

const excerpt = (text: string, max = 300) => (text.length > max ? `${text.slice(0, max - 1).trimEnd()}…` : text);

async function noticesFor(
  actor: Actor,
  actorName: string,
  access: ReportAccess,
  input: ReportTransitionInput,
): Promise<NoticeDraft[]> {
  const { record, parties } = access;
  const base = { workshopId: record.workshopId, reportId: record.id, actorId: actor.id, link: reportPath(record.workshopId, record.id) };
  const to = (userIds: readonly string[], notice: Pick<NoticeDraft, 'kind' | 'title' | 'body'>): NoticeDraft[] =>
    [...new Set(userIds)].filter((id) => id !== actor.id).map((userId) => ({ ...base, ...notice, userId }));
  switch (input.action) {
    case 'submit': {
      // A caster without mentors has only the admins to ask.
      const reviewers = parties.mentorIds.length ? parties.mentorIds : await repo.adminIds(record.workshopId);
      return to(reviewers, {
        kind: 'report_submitted',
        title: `${record.authorName} asks about “${record.title}”`,
        body: record.question ? excerpt(record.question) : 'A defect report is waiting for review.',
      });
    }
    case 'start_review':
      return to([record.authorId], { kind: 'review_started', title: `${actorName} is reviewing “${record.title}”`, body: input.note ?? '' });
    case 'resolve': {
      const names = input.causes.map((c) => findMeltVariable(c.variable)?.name ?? c.variable);
      return to(await participantsOf(access), {
        kind: 'report_resolved',
        title: `${actorName} resolved “${record.title}”`,
        body: `Confirmed cause${names.length === 1 ? '' : 's'}: ${names.join(', ')}.\n${excerpt(input.note)}`,
      });
    }
    case 'reopen':
      return to(await participantsOf(access), { kind: 'report_reopened', title: `${actorName} reopened “${record.title}”`, body: excerpt(input.note) });
    case 'withdraw':
      return [];
  }
}

/** One move of the state table, with what it needs: the snapshot on submit, the confirmed causes on resolve. */
export async function transition(actor: Actor, workshopId: string, reportId: string, input: ReportTransitionInput): Promise<ReportDetail> {
  const access = await reportAccess(actor, workshopId, reportId);
  const early = checkTransition(access.record.state, input.action, access.relations);
  if (!early.ok) throw transitionError(early.reason, access.record.state, input.action);
  // The diagnosis reads many tables; it is taken before the row is locked.
  const snapshot =
    input.action === 'submit'
      ? { ...(await diagnosisService.diagnoseCasting(workshopId, access.record.castingId)), diagnosedAt: new Date().toISOString() }
      : undefined;
  const actorName = await repo.displayName(actor.id);

  const recorded = await withTransaction(async (tx: Tx) => {
    const locked = await repo.lockReport(workshopId, reportId, tx);
    if (!locked) throw reportNotFound();
    const check = checkTransition(locked.state, input.action, access.relations);
    if (!check.ok) throw transitionError(check.reason, locked.state, input.action);
    const now = new Date();
    const changes: ReportChanges = { state: check.transition.to };
    switch (input.action) {
      case 'submit':
        changes.snapshot = snapshot;
        changes.submittedAt = now;
        break;
      case 'withdraw':
        changes.submittedAt = null;
        break;
      case 'resolve':
        changes.resolvedAt = now;
        changes.resolutionNote = input.note;
        await repo.replaceConfirmedCauses(reportId, input.causes, actor.id, tx);
        break;
      case 'reopen':
        changes.resolvedAt = null;
        // Asking again puts the report at the back of the review queue.
        if (check.transition.to === 'submitted') changes.submittedAt = now;
        break;
      case 'start_review':
        break;
    }
    await repo.updateReport(workshopId, reportId, changes, tx);
    await repo.insertEvent(
      { reportId, actorId: actor.id, action: input.action, fromState: locked.state, toState: check.transition.to, note: input.note ?? null },
      tx,
    );
    return notificationsService.record(await noticesFor(actor, actorName, { ...access, record: locked }, input), tx);
  });
  await notificationsService.deliver(recorded);
  return getReport(actor, workshopId, reportId);
}

/** The author's next heat after trying the fix ("did it work?"); only on a resolved report. */
export async function linkFollowUp(actor: Actor, workshopId: string, reportId: string, input: FollowUpHeatInput): Promise<ReportDetail> {
  const access = await reportAccess(actor, workshopId, reportId);
  if (!access.relations.includes('author')) throw forbidden('Only the author links a follow-up heat');
  const notResolved = () => new AppError('report-not-resolved', 'Link a follow-up heat once the report is resolved', 409);
  if (access.record.state !== 'resolved') throw notResolved();
  if (input.heatId) {
    const heat = await repo.heatOf(workshopId, input.heatId);
    if (!heat || heat.casterId !== access.record.authorId) invalid([{ path: ['heatId'], message: 'Pick one of your own heats in this workshop' }]);
  }
  await withTransaction(async (tx) => {
    const locked = await repo.lockReport(workshopId, reportId, tx);
    if (!locked) throw reportNotFound();
    if (locked.state !== 'resolved') throw notResolved();
    await repo.updateReport(workshopId, reportId, { followUpHeatId: input.heatId }, tx);
    await repo.insertEvent(
      { reportId, actorId: actor.id, action: 'link_follow_up', fromState: 'resolved', toState: 'resolved', note: input.note ?? null },
      tx,
    );
  });
  return getReport(actor, workshopId, reportId);
}

