import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { reportDetailSchema, reportPageSchema, reviewQueueSchema, studentOverviewSchema } from '../../shared/reports/report-schemas.ts';
import type { ReportState } from '../../shared/reports/report-states.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertHeat } from '../factories/heats.ts';
import { assignMentor, insertMember, insertWorkshopWithCrew } from '../factories/people.ts';
import { insertMarkedCasting, insertReport } from '../factories/reports.ts';
import { linkIn, mailProxy, mailsTo, waitForMail } from '../support/mail.ts';
import { browser, startApp, type TestApp } from '../support/test-app.ts';

let t: TestApp;
beforeAll(() => {
  t = startApp();
});
afterAll(() => t.close());

async function signedIn(user: { email: string; password: string }) {
  const b = await browser(t.app);
  await b.signIn(user.email, user.password);
  return b;
}

/**
 * A workshop with a student and their assigned mentor, a mentor the student
 * may ask for, a mentor with nothing to do with them, another student, an
 * independent caster and an admin.
 */
async function setUp() {
  const crew = await insertWorkshopWithCrew();
  const ws = crew.workshop.id;
  const [requestedMentor, otherMentor, otherStudent] = await Promise.all([
    insertMember(ws, 'mentor'),
    insertMember(ws, 'mentor'),
    insertMember(ws, 'student'),
  ]);
  await assignMentor(ws, crew.mentor.id, crew.student.id);
  return { ...crew, ws, assignedMentor: crew.mentor, requestedMentor, otherMentor, otherStudent };
}

async function eventsOf(reportId: string) {
  return sequelize.query<{ action: string; from_state: string | null; to_state: string }>(
    'SELECT action, from_state, to_state FROM report_events WHERE report_id = :reportId ORDER BY created_at, id',
    { replacements: { reportId }, type: QueryTypes.SELECT },
  );
}

async function stateOf(reportId: string) {
  const [row] = await sequelize.query<{ state: string }>('SELECT state FROM reports WHERE id = :reportId', {
    replacements: { reportId },
    type: QueryTypes.SELECT,
  });
  return row.state;
}

const BODIES: Record<string, object> = {
  submit: { action: 'submit' },
  withdraw: { action: 'withdraw', note: 'adding a photo' },
  start_review: { action: 'start_review' },
  resolve: { action: 'resolve', note: 'Not degassed.', causes: [{ variable: 'degassing', fixesToTry: ['Degas with argon for 5 minutes.'] }] },
  reopen: { action: 'reopen', note: 'Still porous after the fix' },
};

describe('POST /api/workshops/:workshopId/reports', () => {
  test('when a student reports on their own marked casting, then 201 draft with the casting’s photos and a create event', async () => {
    // Arrange
    const s = await setUp();
    const casting = await insertMarkedCasting(s.ws, s.student.id);
    const b = await signedIn(s.student);

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/reports`, {
      castingId: casting.castingId,
      title: 'Pinholes all over the top face',
      question: 'Was it the scrap?',
      requestedMentorId: s.requestedMentor.id,
    });

    // Assert
    expect(res.status).toBe(201);
    const report = reportDetailSchema.parse(res.body);
    expect(report).toMatchObject({ state: 'draft', authorId: s.student.id, photoIds: [casting.photoId], snapshot: null, changed: false });
    expect(report.allowedActions).toEqual(['submit']);
    expect(report.mentorIds.sort()).toEqual([s.assignedMentor.id, s.requestedMentor.id].sort());
    expect(report.current.input.defects).toEqual([{ kind: 'gas_porosity', severity: 3 }]);
    expect(await eventsOf(report.id)).toEqual([{ action: 'create', from_state: null, to_state: 'draft' }]);
  });

  test.each([
    ['someone else’s casting', 'castingId', (s: Awaited<ReturnType<typeof setUp>>, own: string, other: string) => ({ castingId: other, title: 'Holes' })],
    ['a student as the requested mentor', 'requestedMentorId', (s: Awaited<ReturnType<typeof setUp>>, own: string) => ({ castingId: own, title: 'Holes', requestedMentorId: s.otherStudent.id })],
    ['a two-letter title', 'title', (_s: Awaited<ReturnType<typeof setUp>>, own: string) => ({ castingId: own, title: 'ab' })],
    ['an unknown field', '', (_s: Awaited<ReturnType<typeof setUp>>, own: string) => ({ castingId: own, title: 'Holes', colour: 'red' })],
  ])('when the body names %s, then 400 with an issue at "%s" and nothing is written', async (_what, field, body) => {
    // Arrange
    const s = await setUp();
    const own = await insertMarkedCasting(s.ws, s.student.id);
    const other = await insertMarkedCasting(s.ws, s.otherStudent.id);
    const b = await signedIn(s.student);

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/reports`, body(s, own.castingId, other.castingId));

    // Assert
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation-failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
    const [{ n }] = await sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM reports WHERE workshop_id = :ws', {
      replacements: { ws: s.ws },
      type: QueryTypes.SELECT,
    });
    expect(n).toBe(0);
  });

  test('when a mentor tries to write a report, then 403', async () => {
    const s = await setUp();
    const casting = await insertMarkedCasting(s.ws, s.assignedMentor.id);
    const b = await signedIn(s.assignedMentor);

    const res = await b.post(`/api/workshops/${s.ws}/reports`, { castingId: casting.castingId, title: 'My own pour' });

    expect(res.status).toBe(403);
  });
});

describe('POST /api/workshops/:workshopId/reports/:reportId/transitions', () => {
  type Who = 'author' | 'assigned mentor' | 'requested mentor' | 'admin' | 'unassigned mentor' | 'other student' | 'caster';
  const rows: [Who, ReportState, string, number, ReportState | null][] = [
    ['author', 'draft', 'submit', 200, 'submitted'],
    ['author', 'submitted', 'withdraw', 200, 'draft'],
    ['author', 'resolved', 'reopen', 200, 'submitted'],
    ['author', 'submitted', 'start_review', 403, null],
    ['author', 'in_review', 'resolve', 403, null],
    ['author', 'resolved', 'submit', 409, null],
    ['author', 'in_review', 'withdraw', 409, null],
    ['assigned mentor', 'submitted', 'start_review', 200, 'in_review'],
    ['assigned mentor', 'in_review', 'resolve', 200, 'resolved'],
    ['assigned mentor', 'resolved', 'reopen', 200, 'in_review'],
    ['assigned mentor', 'draft', 'submit', 403, null],
    ['assigned mentor', 'draft', 'start_review', 409, null],
    ['assigned mentor', 'submitted', 'resolve', 409, null],
    ['requested mentor', 'submitted', 'start_review', 200, 'in_review'],
    ['requested mentor', 'in_review', 'resolve', 200, 'resolved'],
    ['admin', 'submitted', 'start_review', 200, 'in_review'],
    ['admin', 'in_review', 'resolve', 200, 'resolved'],
    ['admin', 'resolved', 'reopen', 200, 'in_review'],
    ['admin', 'draft', 'submit', 403, null],
    ['unassigned mentor', 'submitted', 'start_review', 404, null],
    ['other student', 'draft', 'submit', 404, null],
    ['caster', 'submitted', 'start_review', 404, null],
  ];

  test.each(rows)('when the %s takes a report in %s through %s, then %i (now %s)', async (who, from, action, status, to) => {
    // Arrange
    const s = await setUp();
    const report = await insertReport({
      workshopId: s.ws,
      authorId: s.student.id,
      state: from,
      requestedMentorId: s.requestedMentor.id,
      reviewerId: s.assignedMentor.id,
    });
    const actor = {
      author: s.student,
      'assigned mentor': s.assignedMentor,
      'requested mentor': s.requestedMentor,
      admin: s.admin,
      'unassigned mentor': s.otherMentor,
      'other student': s.otherStudent,
      caster: s.caster,
    }[who];
    const before = (await eventsOf(report.id)).length;
    const b = await signedIn(actor);

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, BODIES[action]);

    // Assert
    expect(res.status, JSON.stringify(res.body)).toBe(status);
    const events = await eventsOf(report.id);
    if (to) {
      expect(reportDetailSchema.parse(res.body).state).toBe(to);
      expect(await stateOf(report.id)).toBe(to);
      expect(events).toHaveLength(before + 1);
      expect(events[events.length - 1]).toEqual({ action, from_state: from, to_state: to });
    } else {
      expect(await stateOf(report.id)).toBe(from);
      expect(events).toHaveLength(before);
    }
  });

  test('when a mentor resolves, then the confirmed causes, the note and the resolution time are kept', async () => {
    // Arrange
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'in_review' });
    const b = await signedIn(s.assignedMentor);

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, {
      action: 'resolve',
      note: 'The melt was never degassed and the air was damp.',
      causes: [
        { variable: 'degassing', note: 'no tablet', fixesToTry: ['Plunge a degassing tablet with a dry bell.'] },
        { variable: 'humidity' },
      ],
    });

    // Assert
    expect(res.status).toBe(200);
    const detail = reportDetailSchema.parse(res.body);
    expect(detail.resolvedAt).not.toBeNull();
    expect(detail.resolutionNote).toBe('The melt was never degassed and the air was damp.');
    expect(detail.confirmedCauses.map((c) => [c.variable, c.name, c.fixesToTry, c.confirmedBy])).toEqual([
      ['degassing', 'Degassing', ['Plunge a degassing tablet with a dry bell.'], s.assignedMentor.id],
      ['humidity', 'Humidity', [], s.assignedMentor.id],
    ]);
  });

  test.each([
    ['a resolution without causes', 'causes', { action: 'resolve', note: 'done', causes: [] }],
    ['the same cause twice', 'causes.1.variable', { action: 'resolve', note: 'done', causes: [{ variable: 'degassing' }, { variable: 'degassing' }] }],
    ['an unknown variable', 'causes.0.variable', { action: 'resolve', note: 'done', causes: [{ variable: 'bad_luck' }] }],
    ['an unknown action', 'action', { action: 'approve' }],
  ])('when the mentor sends %s, then 400 naming %s', async (_what, path, body) => {
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'in_review' });
    const b = await signedIn(s.assignedMentor);

    const res = await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, body);

    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
  });

  test('when the author submits, then the snapshot holds the diagnosis and the rule set’s hash', async () => {
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, heat: { degassing: 'none' } });
    const b = await signedIn(s.student);

    const res = await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, { action: 'submit' });

    const detail = reportDetailSchema.parse(res.body);
    expect(detail.snapshot?.causes[0].variable).toBe('degassing');
    expect(detail.snapshot?.ruleSet.hash).toMatch(/^[0-9a-f]{16}$/);
    expect(detail.snapshot?.diagnosedAt).toBeTruthy();
    expect(detail.submittedAt).not.toBeNull();
    expect(detail.changed).toBe(false);
  });
});

describe('GET /api/workshops/:workshopId/reports/:reportId', () => {
  test.each([
    ['the author', 200],
    ['the assigned mentor', 200],
    ['the requested mentor', 200],
    ['an admin', 200],
    ['another student', 404],
    ['an unassigned mentor', 404],
    ['an independent caster', 404],
  ] as const)('when %s opens a submitted report, then %i', async (who, status) => {
    // Arrange
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'submitted', requestedMentorId: s.requestedMentor.id });
    const actor = {
      'the author': s.student,
      'the assigned mentor': s.assignedMentor,
      'the requested mentor': s.requestedMentor,
      'an admin': s.admin,
      'another student': s.otherStudent,
      'an unassigned mentor': s.otherMentor,
      'an independent caster': s.caster,
    }[who];
    const b = await signedIn(actor);

    // Act
    const res = await b.get(`/api/workshops/${s.ws}/reports/${report.id}`);

    // Assert
    expect(res.status).toBe(status);
    if (status === 404) expect(res.body.error.code).toBe('report-not-found');
  });

  test('when someone from another workshop asks, then 404 both through their workshop and through the report’s', async () => {
    // Arrange
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'submitted' });
    const elsewhere = await insertWorkshopWithCrew();
    const b = await signedIn(elsewhere.admin);

    // Act
    const viaTheirs = await b.get(`/api/workshops/${elsewhere.workshop.id}/reports/${report.id}`);
    const viaOurs = await b.get(`/api/workshops/${s.ws}/reports/${report.id}`);

    // Assert
    expect(viaTheirs.status).toBe(404);
    expect(viaTheirs.body.error.code).toBe('report-not-found');
    expect(viaOurs.status).toBe(404);
    expect(viaOurs.body.error.code).toBe('workshop-not-found');
  });

  test('when the top rule is switched off after submitting, then the snapshot keeps its ranking, the current one differs and changed is true', async () => {
    // Arrange: an undegassed melt, so "degassing" tops the ranking at submit.
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, heat: { degassing: 'none' } });
    const student = await signedIn(s.student);
    const submitted = reportDetailSchema.parse((await student.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, { action: 'submit' })).body);
    const admin = await signedIn(s.admin);

    // Act
    const off = await admin.patch(`/api/workshops/${s.ws}/rules/undegassed-gas`, { enabled: false });
    const res = await student.get(`/api/workshops/${s.ws}/reports/${report.id}`);

    // Assert
    expect(off.status).toBe(200);
    const detail = reportDetailSchema.parse(res.body);
    expect(submitted.snapshot!.causes[0].variable).toBe('degassing');
    expect(detail.snapshot).toEqual(submitted.snapshot);
    expect(detail.current.causes[0].variable).not.toBe('degassing');
    expect(detail.current.causes.find((c) => c.variable === 'degassing')?.status ?? 'gone').not.toBe('confirmed');
    expect(detail.current.ruleSet.hash).not.toBe(detail.snapshot!.ruleSet.hash);
    expect(detail.changed).toBe(true);
  });
});

describe('PATCH /api/workshops/:workshopId/reports/:reportId', () => {
  test('when the author edits a draft, then it changes and an edit event is written', async () => {
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id });
    const b = await signedIn(s.student);

    const res = await b.patch(`/api/workshops/${s.ws}/reports/${report.id}`, { title: 'Holes under the riser', photoIds: [] });

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ title: 'Holes under the riser', photoIds: [] });
    expect((await eventsOf(report.id)).map((e) => e.action)).toEqual(['create', 'edit']);
  });

  test.each([
    ['a submitted report', 409, 'submitted', {}],
    ['a photo of another casting', 400, 'draft', { other: true }],
  ] as const)('when the author edits %s, then %i', async (_what, status, state, opts) => {
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state });
    const other = await insertMarkedCasting(s.ws, s.student.id);
    const b = await signedIn(s.student);

    const res = await b.patch(`/api/workshops/${s.ws}/reports/${report.id}`, 'other' in opts ? { photoIds: [other.photoId] } : { title: 'Changed it' });

    expect(res.status).toBe(status);
    if (status === 409) expect(res.body.error.code).toBe('report-not-draft');
  });
});

describe('GET /api/workshops/:workshopId/reports', () => {
  test('when a mentor filters and pages, then each filter holds and the pages join up without overlap', async () => {
    // Arrange
    const s = await setUp();
    const a = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'submitted', marks: [{ kind: 'cold_shut' }] });
    const b1 = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'resolved' });
    const c = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'draft' });
    const hidden = await insertReport({ workshopId: s.ws, authorId: s.otherStudent.id, state: 'submitted' });
    const mentor = await signedIn(s.assignedMentor);
    const base = `/api/workshops/${s.ws}/reports`;

    // Act
    const all = reportPageSchema.parse((await mentor.get(base)).body);
    const resolved = reportPageSchema.parse((await mentor.get(`${base}?state=resolved`)).body);
    const coldShut = reportPageSchema.parse((await mentor.get(`${base}?defect=cold_shut`)).body);
    const byStudent = reportPageSchema.parse((await mentor.get(`${base}?studentId=${s.student.id}&mentorId=${s.assignedMentor.id}`)).body);
    const page1 = reportPageSchema.parse((await mentor.get(`${base}?limit=2`)).body);
    const page2 = reportPageSchema.parse((await mentor.get(`${base}?limit=2&cursor=${page1.nextCursor}`)).body);
    const bad = await mentor.get(`${base}?cursor=nonsense`);

    // Assert
    expect(all.items.map((r) => r.id).sort()).toEqual([a.id, b1.id, c.id].sort());
    expect(all.items.map((r) => r.id)).not.toContain(hidden.id);
    expect(resolved.items.map((r) => r.id)).toEqual([b1.id]);
    expect(coldShut.items.map((r) => r.id)).toEqual([a.id]);
    expect(coldShut.items[0].defectKinds).toEqual(['cold_shut']);
    expect(byStudent.items).toHaveLength(3);
    expect(page1.items).toHaveLength(2);
    expect(page1.nextCursor).not.toBeNull();
    expect(page2.items).toHaveLength(1);
    expect(page2.nextCursor).toBeNull();
    expect([...page1.items, ...page2.items].map((r) => r.id)).toEqual(all.items.map((r) => r.id));
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('cursor');
  });

  test('when a student lists, then only their own reports come back', async () => {
    const s = await setUp();
    const mine = await insertReport({ workshopId: s.ws, authorId: s.otherStudent.id });
    await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'submitted' });
    const b = await signedIn(s.otherStudent);

    const res = reportPageSchema.parse((await b.get(`/api/workshops/${s.ws}/reports`)).body);

    expect(res.items.map((r) => r.id)).toEqual([mine.id]);
  });
});

describe('GET /api/workshops/:workshopId/review-queue', () => {
  test('when a mentor opens the queue, then their students’ and requesters’ open reports come oldest first with counts', async () => {
    // Arrange
    const s = await setUp();
    await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'draft' });
    const first = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'submitted' });
    const second = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'in_review' });
    await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'resolved' });
    const asked = await insertReport({ workshopId: s.ws, authorId: s.caster.id, state: 'submitted', requestedMentorId: s.assignedMentor.id });
    await insertReport({ workshopId: s.ws, authorId: s.otherStudent.id, state: 'submitted' });
    const mentor = await signedIn(s.assignedMentor);

    // Act
    const res = await mentor.get(`/api/workshops/${s.ws}/review-queue`);

    // Assert
    expect(res.status).toBe(200);
    const queue = reviewQueueSchema.parse(res.body);
    expect(queue.items.map((r) => r.id)).toEqual([first.id, second.id, asked.id]);
    expect(queue.counts).toEqual({ submitted: 2, in_review: 1 });
    expect(queue.items[0].topCause).not.toBeNull();
  });

  test.each([
    ['student', 403],
    ['caster', 403],
    ['admin', 200],
  ] as const)('when the %s opens the queue, then %i', async (role, status) => {
    const s = await setUp();
    const b = await signedIn(s[role]);

    const res = await b.get(`/api/workshops/${s.ws}/review-queue`);

    expect(res.status).toBe(status);
  });
});

describe('GET /api/workshops/:workshopId/students/:userId/overview', () => {
  test.each([
    ['their assigned mentor', 200],
    ['an admin', 200],
    ['the student themself', 200],
    ['another mentor', 403],
    ['another student', 403],
  ] as const)('when %s asks for a student’s overview, then %i', async (who, status) => {
    // Arrange
    const s = await setUp();
    await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'submitted', marks: [{ kind: 'gas_porosity' }, { kind: 'pinholes' }] });
    await insertHeat({ workshopId: s.ws, casterId: s.student.id });
    const actor = {
      'their assigned mentor': s.assignedMentor,
      'an admin': s.admin,
      'the student themself': s.student,
      'another mentor': s.otherMentor,
      'another student': s.otherStudent,
    }[who];
    const b = await signedIn(actor);

    // Act
    const res = await b.get(`/api/workshops/${s.ws}/students/${s.student.id}/overview`);

    // Assert
    expect(res.status).toBe(status);
    if (status === 200) {
      const overview = studentOverviewSchema.parse(res.body);
      expect(overview.heatCount).toBe(2);
      expect(overview.reportCounts).toEqual({ draft: 0, submitted: 1, in_review: 0, resolved: 0 });
      expect(overview.defectTrend.map((d) => [d.kind, d.count])).toEqual([
        ['gas_porosity', 1],
        ['pinholes', 1],
      ]);
      expect(overview.defectTrend[0].month).toMatch(/^\d{4}-\d{2}$/);
    }
  });

  test('when the member does not exist, then 404', async () => {
    const s = await setUp();
    const b = await signedIn(s.admin);

    const res = await b.get(`/api/workshops/${s.ws}/students/${s.caster.id.replace(/.$/, (c) => (c === '0' ? '1' : '0'))}/overview`);

    expect(res.status).toBe(404);
  });
});

describe('PUT /api/workshops/:workshopId/reports/:reportId/follow-up-heat', () => {
  test('when the author links their next heat to a resolved report, then it shows with that heat’s defects and an event', async () => {
    // Arrange
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'resolved' });
    const next = await insertMarkedCasting(s.ws, s.student.id, { marks: [] });
    const b = await signedIn(s.student);

    // Act
    const res = await b.send('put', `/api/workshops/${s.ws}/reports/${report.id}/follow-up-heat`, { heatId: next.heatId, note: 'degassed this time' });

    // Assert
    expect(res.status).toBe(200);
    expect(res.body.followUp).toMatchObject({ heatId: next.heatId, defectKinds: [] });
    expect((await eventsOf(report.id)).at(-1)).toEqual({ action: 'link_follow_up', from_state: 'resolved', to_state: 'resolved' });
  });

  test.each([
    ['the report is still in review', 409, 'in_review', 'own', 'student'],
    ['the heat is someone else’s', 400, 'resolved', 'other', 'student'],
    ['a mentor tries it', 403, 'resolved', 'own', 'assignedMentor'],
  ] as const)('when %s, then %i', async (_what, status, state, whose, who) => {
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state });
    const heat = await insertHeat({ workshopId: s.ws, casterId: whose === 'own' ? s.student.id : s.otherStudent.id });
    const b = await signedIn(s[who]);

    const res = await b.send('put', `/api/workshops/${s.ws}/reports/${report.id}/follow-up-heat`, { heatId: heat.id });

    expect(res.status).toBe(status);
  });
});

describe('report mail', () => {
  test('when a student submits, then their assigned and requested mentors get a mail linking to the report, and nobody else', async () => {
    // Arrange
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, requestedMentorId: s.requestedMentor.id, title: 'Porous ingot from Thursday' });
    const b = await signedIn(s.student);

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, { action: 'submit' });
    const [assigned, requested] = await Promise.all([
      waitForMail(s.assignedMentor.email, (m) => m.subject.includes('Porous ingot from Thursday')),
      waitForMail(s.requestedMentor.email, (m) => m.subject.includes('Porous ingot from Thursday')),
    ]);

    // Assert
    expect(res.status).toBe(200);
    const link = linkIn(assigned, `/w/${s.ws}/reports/${report.id}`);
    expect(new URL(link).pathname).toBe(`/w/${s.ws}/reports/${report.id}`);
    expect(assigned.html).toContain(`/w/${s.ws}/reports/${report.id}`);
    expect(requested.text).toContain(`/w/${s.ws}/reports/${report.id}`);
    expect(mailsTo(s.otherMentor.email)).toHaveLength(0);
    expect(mailsTo(s.student.email)).toHaveLength(0);
  });

  test('when an independent caster with no mentor submits, then the workshop’s admins are asked', async () => {
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.caster.id, title: 'Cold shut on the lid casting' });
    const b = await signedIn(s.caster);

    await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, { action: 'submit' });
    const mail = await waitForMail(s.admin.email, (m) => m.subject.includes('Cold shut on the lid casting'));

    expect(linkIn(mail, `/w/${s.ws}/reports/${report.id}`)).toBeTruthy();
  });

  test('when a mentor resolves, then the author gets a mail naming the confirmed cause', async () => {
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'in_review', title: 'Gassy top of the bar' });
    const b = await signedIn(s.assignedMentor);

    await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, BODIES.resolve);
    const mail = await waitForMail(s.student.email, (m) => m.subject.includes('Gassy top of the bar'));

    expect(mail.subject).toContain('resolved');
    expect(mail.text).toContain('Confirmed cause: Degassing');
    expect(linkIn(mail, `/w/${s.ws}/reports/${report.id}`)).toBeTruthy();
  });

  test('when the mail server is down at submit, then the request succeeds and the mail arrives once it is back, exactly once', async () => {
    // Arrange
    const s = await setUp();
    const report = await insertReport({ workshopId: s.ws, authorId: s.student.id, title: 'Submitted during the outage' });
    const b = await signedIn(s.student);
    mailProxy().down();

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/reports/${report.id}/transitions`, { action: 'submit' });
    await new Promise((r) => setTimeout(r, 2_500));
    const whileDown = mailsTo(s.assignedMentor.email).length;
    mailProxy().up();
    const mail = await waitForMail(s.assignedMentor.email, (m) => m.subject.includes('Submitted during the outage'), 30_000);
    await new Promise((r) => setTimeout(r, 2_000));

    // Assert
    expect(res.status).toBe(200);
    expect(res.body.state).toBe('submitted');
    expect(whileDown).toBe(0);
    expect(linkIn(mail, `/w/${s.ws}/reports/${report.id}`)).toBeTruthy();
    expect(mailsTo(s.assignedMentor.email)).toHaveLength(1);
  });
});
