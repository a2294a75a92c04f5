import { describe, expect, test } from 'vitest';
import type { Role } from '../auth/roles.ts';
import {
  REPORT_ACTIONS,
  REPORT_STATES,
  allowedActions,
  canEditReport,
  canReadReport,
  checkTransition,
  reportRelations,
} from './report-states.ts';
import type { ReportAction, ReportRelation, ReportState } from './report-states.ts';

const AUTHOR: ReportRelation[] = ['author'];
const REVIEWER: ReportRelation[] = ['reviewer'];
const BOTH: ReportRelation[] = ['author', 'reviewer'];
const NONE: ReportRelation[] = [];

describe('checkTransition', () => {
  // Every state × action × relation, so a change to the table shows up here.
  const expected: Record<string, string> = {
    // author
    'author draft submit': 'submitted',
    'author submitted withdraw': 'draft',
    'author resolved reopen': 'submitted',
    // reviewer
    'reviewer submitted start_review': 'in_review',
    'reviewer in_review resolve': 'resolved',
    'reviewer resolved reopen': 'in_review',
  };
  const authorActions: ReportAction[] = ['submit', 'withdraw', 'reopen'];
  const reviewerActions: ReportAction[] = ['start_review', 'resolve', 'reopen'];
  const rows = (['author', 'reviewer', 'none'] as const).flatMap((who) =>
    REPORT_STATES.flatMap((state) =>
      REPORT_ACTIONS.map((action) => {
        const to = expected[`${who} ${state} ${action}`];
        const theirs = who === 'author' ? authorActions : who === 'reviewer' ? reviewerActions : [];
        const outcome = to ?? (theirs.includes(action) ? 'wrong-state' : 'forbidden');
        return [who, state, action, outcome] as const;
      }),
    ),
  );

  test.each(rows)('when the %s takes %s → %s, then the answer is %s', (who, state, action, outcome) => {
    // Arrange
    const relations = who === 'author' ? AUTHOR : who === 'reviewer' ? REVIEWER : NONE;

    // Act
    const check = checkTransition(state, action, relations);

    // Assert
    if (check.ok) expect(check.transition.to).toBe(outcome);
    else expect(check.reason).toBe(outcome);
  });

  test('when someone is both author and reviewer and reopens, then the reviewer’s move wins', () => {
    const check = checkTransition('resolved', 'reopen', BOTH);

    expect(check).toMatchObject({ ok: true, transition: { to: 'in_review', by: 'reviewer' } });
  });
});

describe('allowedActions', () => {
  test.each([
    ['draft', AUTHOR, ['submit']],
    ['submitted', AUTHOR, ['withdraw']],
    ['in_review', AUTHOR, []],
    ['resolved', AUTHOR, ['reopen']],
    ['draft', REVIEWER, []],
    ['submitted', REVIEWER, ['start_review']],
    ['in_review', REVIEWER, ['resolve']],
    ['resolved', REVIEWER, ['reopen']],
    ['submitted', BOTH, ['withdraw', 'start_review']],
    ['resolved', BOTH, ['reopen']],
    ['submitted', NONE, []],
  ] as [ReportState, ReportRelation[], ReportAction[]][])('when a report is %s and the actor is %j, then they may %j', (state, relations, actions) => {
    expect(allowedActions(state, relations)).toEqual(actions);
  });
});

describe('canEditReport', () => {
  test.each([
    ['draft', AUTHOR, true],
    ['submitted', AUTHOR, false],
    ['draft', REVIEWER, false],
  ] as [ReportState, ReportRelation[], boolean][])('when a %s report is edited by %j, then it is %s', (state, relations, ok) => {
    expect(canEditReport(state, relations)).toBe(ok);
  });
});

describe('reportRelations and canReadReport', () => {
  const parties = { authorId: 'student-1', mentorIds: ['mentor-1', 'admin-2'] };
  const as = (id: string, role: Role) => ({ id, role });

  test.each([
    ['the student author', as('student-1', 'student'), ['author'], true],
    ['a caster author', as('student-1', 'caster'), ['author'], true],
    ['an assigned or requested mentor', as('mentor-1', 'mentor'), ['reviewer'], true],
    ['another mentor', as('mentor-9', 'mentor'), [], false],
    ['another student', as('student-2', 'student'), [], false],
    ['another caster', as('caster-2', 'caster'), [], false],
    ['an admin', as('admin-1', 'admin'), ['reviewer'], true],
    ['an admin who wrote it', { id: 'student-1', role: 'admin' as const }, ['author', 'reviewer'], true],
  ] as const)('when %s looks at the report, then the relations and read access follow the grants', (_who, actor, relations, readable) => {
    expect(reportRelations(actor, parties)).toEqual(relations);
    expect(canReadReport(actor, parties)).toBe(readable);
  });
});
