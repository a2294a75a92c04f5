import { can } from '../auth/permissions.ts';
import type { Actor } from '../auth/roles.ts';

// A defect report's life: the caster writes a draft and submits it, a mentor
// (or an admin) starts the review and resolves it by confirming causes; a
// resolved report can be reopened. The table below is the one place that
// says who may move a report where; the server enforces it and the client
// reads it to decide which buttons to show.

export const REPORT_STATES = ['draft', 'submitted', 'in_review', 'resolved'] as const;
export type ReportState = (typeof REPORT_STATES)[number];

export const REPORT_STATE_LABELS: Record<ReportState, string> = {
  draft: 'draft',
  submitted: 'submitted',
  in_review: 'in review',
  resolved: 'resolved',
};

export const REPORT_ACTIONS = ['submit', 'withdraw', 'start_review', 'resolve', 'reopen'] as const;
export type ReportAction = (typeof REPORT_ACTIONS)[number];

/**
 * How the actor stands to one report. `author`: the caster who wrote it.
 * `reviewer`: one of the author's assigned mentors, the mentor the author
 * asked for, or an admin. An admin's own report makes them both.
 */
export const REPORT_RELATIONS = ['author', 'reviewer'] as const;
export type ReportRelation = (typeof REPORT_RELATIONS)[number];

export type ReportTransition = { action: ReportAction; from: ReportState; to: ReportState; by: ReportRelation };

/**
 * Every allowed move. Order matters only for `reopen`, which both sides may
 * do with different outcomes: a reviewer reopens to look again (back to
 * in review), the author to ask again because the fix did not work (back to
 * submitted). Someone who is both gets the reviewer's move.
 */
export const REPORT_TRANSITIONS: readonly ReportTransition[] = Object.freeze([
  { action: 'submit', from: 'draft', to: 'submitted', by: 'author' },
  // Taking a question back before anyone has started on it, to edit it.
  { action: 'withdraw', from: 'submitted', to: 'draft', by: 'author' },
  { action: 'start_review', from: 'submitted', to: 'in_review', by: 'reviewer' },
  { action: 'resolve', from: 'in_review', to: 'resolved', by: 'reviewer' },
  { action: 'reopen', from: 'resolved', to: 'in_review', by: 'reviewer' },
  { action: 'reopen', from: 'resolved', to: 'submitted', by: 'author' },
] as const);

/** Who the report concerns: its author and every mentor who may review it (assigned or requested). */
export type ReportParties = { authorId: string; mentorIds: readonly string[] };

/**
 * The actor's relations to a report, from the permission table: the author
 * needs `update:report:own`; a reviewer needs `update:report` through the
 * mentee grant (being among `mentorIds`) or the any grant (admins).
 */
export function reportRelations(actor: Actor, parties: ReportParties): ReportRelation[] {
  const relations: ReportRelation[] = [];
  if (actor.id === parties.authorId && can(actor, 'update', 'report', { ownerId: parties.authorId })) relations.push('author');
  // ownerId '' is nobody, so only the mentee and any grants can answer yes here.
  if (can(actor, 'update', 'report', { ownerId: '', ownerMentorIds: parties.mentorIds })) relations.push('reviewer');
  return relations;
}

/** Whether the actor may read the report at all (author, its mentors, admins). */
export function canReadReport(actor: Actor, parties: ReportParties): boolean {
  return can(actor, 'read', 'report', { ownerId: parties.authorId, ownerMentorIds: parties.mentorIds });
}

export type TransitionCheck =
  | { ok: true; transition: ReportTransition }
  /** `forbidden`: the actor never takes this action on this report; `wrong-state`: not from this state. */
  | { ok: false; reason: 'forbidden' | 'wrong-state' };

/**
 * Whether `action` may be taken from `state` by someone with `relations`,
 * and where it leads. An action the actor could never take answers
 * `forbidden` whatever the state, so a student asking to resolve learns
 * that they cannot, not that the report is in the wrong state.
 */
export function checkTransition(state: ReportState, action: ReportAction, relations: readonly ReportRelation[]): TransitionCheck {
  const theirs = REPORT_TRANSITIONS.filter((t) => t.action === action && relations.includes(t.by));
  if (theirs.length === 0) return { ok: false, reason: 'forbidden' };
  const transition = theirs.find((t) => t.from === state);
  return transition ? { ok: true, transition } : { ok: false, reason: 'wrong-state' };
}

/** The actions the actor may take on a report in `state`, in table order, each once. */
export function allowedActions(state: ReportState, relations: readonly ReportRelation[]): ReportAction[] {
  const actions: ReportAction[] = [];
  for (const t of REPORT_TRANSITIONS) {
    if (t.from === state && relations.includes(t.by) && !actions.includes(t.action)) actions.push(t.action);
  }
  return actions;
}

/** Only the author edits, and only a draft: a submitted question stays as the mentor first read it. */
export function canEditReport(state: ReportState, relations: readonly ReportRelation[]): boolean {
  return state === 'draft' && relations.includes('author');
}
