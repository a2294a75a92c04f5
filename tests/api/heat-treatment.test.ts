import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertHeat } from '../factories/heats.ts';
import { insertPhotoWithMarks } from '../factories/marks.ts';
import { assignMentor, insertMember, insertWorkshopWithCrew } from '../factories/people.ts';
import { insertCasting } from '../factories/photos.ts';
import { browser, startApp, type Browser, type TestApp } from '../support/test-app.ts';

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

/** A workshop with a mentored student who has two A356.0 castings, and a caster with one. */
async function setUp() {
  const crew = await insertWorkshopWithCrew();
  const w = crew.workshop.id;
  await assignMentor(w, crew.mentor.id, crew.student.id);
  const other = await insertMember(w, 'student');
  const [a, b, c, d] = await Promise.all([
    insertCasting(w, crew.student.id),
    insertCasting(w, crew.student.id),
    insertCasting(w, crew.caster.id),
    insertCasting(w, other.id),
  ]);
  return { ...crew, other, w, studentCastings: [a.castingId, b.castingId], casterCasting: c.castingId, otherCasting: d.castingId };
}

const planUrl = (w: string, id?: string) => `/api/workshops/${w}/heat-treatments${id ? `/${id}` : ''}`;

async function storedPlans(w: string) {
  return sequelize.query<{ id: string; caster_id: string; plan: { steps: unknown[] } }>(
    'SELECT id, caster_id, plan FROM heat_treatments WHERE workshop_id = :w',
    { replacements: { w }, type: QueryTypes.SELECT },
  );
}

async function plan(b: Browser, w: string, castingIds: string[], body: Record<string, unknown> = {}) {
  return b.post(planUrl(w), { alloy: 'A356.0', temper: 'T6', castingIds, oven: 'Pottery kiln', ...body });
}

describe('POST /api/workshops/:workshopId/heat-treatments', () => {
  test('when a student plans A356.0 T6, then the stored steps are the published schedule', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);

    // Act
    const res = await plan(b, s.w, s.studentCastings);

    // Assert
    // ASTM B917/B917M as quoted in a published research paper (DOMAIN.md §5):
    // A356.0-T6 is solution treated at 540 °C for 6–12 h, quenched in water
    // at 65–100 °C, and aged at 155 °C for 3–5 h.
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ alloy: 'A356.0', temper: 'T6', state: 'planned', casterId: s.student.id, castingCount: 2 });
    expect(res.body.plan.steps).toEqual([
      expect.objectContaining({ kind: 'solution', tempC: { min: 540, max: 540 }, durationMin: { min: 6 * 60, max: 12 * 60 } }),
      expect.objectContaining({ kind: 'quench', medium: 'water', mediumTempC: { min: 65, max: 100 } }),
      expect.objectContaining({ kind: 'artificial_age', tempC: { min: 155, max: 155 }, durationMin: { min: 3 * 60, max: 5 * 60 } }),
    ]);
    expect(res.body.plan.sources.map((src: { citation: string }) => src.citation).join(' ')).toContain('ASTM B917');
    const [row] = await storedPlans(s.w);
    expect(row.plan.steps).toEqual(res.body.plan.steps);
    expect(res.body.comparison.steps.map((st: { status: string }) => st.status)).toEqual(['not_recorded', 'not_recorded', 'not_recorded']);
  });

  test.each([
    { alloy: 'A356.0', temper: 'T4', why: 'the alloy has no T4 schedule' },
    { alloy: '319.0', temper: 'T6', why: 'the alloy has no schedules at all' },
  ])('when $why, then 400 on the temper and nothing is stored', async ({ alloy, temper }) => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);

    // Act
    const res = await plan(b, s.w, s.studentCastings, { alloy, temper });

    // Assert
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([expect.objectContaining({ path: 'temper' })]);
    expect(await storedPlans(s.w)).toHaveLength(0);
  });

  test('when a student names another student’s casting, then 400 as for a missing casting', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);
    const res = await plan(b, s.w, [s.studentCastings[0], s.otherCasting]);
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([{ path: 'castingIds.1', message: 'No such casting in this workshop' }]);
    expect(await storedPlans(s.w)).toHaveLength(0);
  });

  test('when a mentor plans for a mentee’s casting, then 403: mentors read, the caster records', async () => {
    const s = await setUp();
    const b = await signedIn(s.mentor);
    const res = await plan(b, s.w, [s.studentCastings[0]]);
    expect(res.status).toBe(403);
    expect(await storedPlans(s.w)).toHaveLength(0);
  });

  test('when an admin plans for a student’s castings, then the plan is the student’s', async () => {
    const s = await setUp();
    const b = await signedIn(s.admin);
    const res = await plan(b, s.w, s.studentCastings);
    expect(res.status).toBe(201);
    expect(res.body.casterId).toBe(s.student.id);
    expect(res.body.createdBy).toBe(s.admin.id);
  });

  test('when an admin mixes two casters’ castings, then 400 asks for one plan each', async () => {
    const s = await setUp();
    const b = await signedIn(s.admin);
    const res = await plan(b, s.w, [s.studentCastings[0], s.casterCasting]);
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['castingIds']);
  });

  test('when a casting comes from a heat of another alloy, then 400 names it', async () => {
    const s = await setUp();
    const heat = await insertHeat({ workshopId: s.w, casterId: s.student.id, alloy: '319.0', castings: [{ massG: 300 }] });
    const [{ id }] = await sequelize.query<{ id: string }>('SELECT id FROM castings WHERE heat_id = :h', {
      replacements: { h: heat.id },
      type: QueryTypes.SELECT,
    });
    const b = await signedIn(s.student);
    const res = await plan(b, s.w, [s.studentCastings[0], id]);
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([{ path: 'castingIds.1', message: expect.stringContaining('319.0') }]);
  });

  test('when the body is malformed, then 400, not 500', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);
    const res = await b.post(planUrl(s.w), { alloy: 'A356.0', temper: 'T9', castingIds: ['nope'], oven: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['castingIds.0', 'oven', 'temper']);
  });
});

describe('reading heat-treatment plans', () => {
  test('when each role reads a student’s plan, then the caster, mentor and admin see it and others get 404', async () => {
    // Arrange
    const s = await setUp();
    const created = await plan(await signedIn(s.student), s.w, s.studentCastings);
    const id = created.body.id as string;
    const elsewhere = await insertWorkshopWithCrew();

    // Act
    const [student, mentor, admin, caster, other, outsider] = await Promise.all(
      [s.student, s.mentor, s.admin, s.caster, s.other, elsewhere.admin].map(async (u) => (await signedIn(u)).get(planUrl(s.w, id))),
    );

    // Assert
    expect([student.status, mentor.status, admin.status]).toEqual([200, 200, 200]);
    expect([caster.status, other.status, outsider.status]).toEqual([404, 404, 404]);
  });

  test('when the list is asked for, then each sees the plans they may read', async () => {
    const s = await setUp();
    const mine = await plan(await signedIn(s.student), s.w, s.studentCastings);
    const casters = await plan(await signedIn(s.caster), s.w, [s.casterCasting]);
    const ids = async (u: { email: string; password: string }) =>
      ((await (await signedIn(u)).get(planUrl(s.w))).body as { id: string }[]).map((p) => p.id).sort();
    expect(await ids(s.student)).toEqual([mine.body.id]);
    expect(await ids(s.mentor)).toEqual([mine.body.id]);
    expect(await ids(s.caster)).toEqual([casters.body.id]);
    expect(await ids(s.admin)).toEqual([mine.body.id, casters.body.id].sort());
  });

  test('when a student asks for candidates, then only their own castings are offered', async () => {
    const s = await setUp();
    const res = await (await signedIn(s.student)).get(`${planUrl(s.w)}/candidates?alloy=A356.0`);
    expect(res.status).toBe(200);
    expect((res.body as { id: string }[]).map((c) => c.id).sort()).toEqual([...s.studentCastings].sort());
  });
});

describe('PATCH /api/workshops/:workshopId/heat-treatments/:id/steps', () => {
  test('when the record strays from the plan, then each deviation is reported against the step', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);
    const id = (await plan(b, s.w, s.studentCastings)).body.id as string;

    // Act
    const res = await b.patch(`${planUrl(s.w, id)}/steps`, {
      steps: [
        // 560 °C is past A356.0's 555 °C solidus (incipient melting); 5 h is short of 6 h.
        { stepIndex: 0, startedAt: '2026-11-30T08:00:00Z', endedAt: '2026-11-30T13:00:00Z', temperatureC: 560 },
        // Cold water and 25 s from door to tank, over the 15 s target.
        { stepIndex: 1, quenchMedium: 'water', temperatureC: 40, quenchDelayS: 25 },
        { stepIndex: 2, startedAt: '2026-11-30T14:00:00Z', endedAt: '2026-11-30T18:00:00Z', temperatureC: 157 },
      ],
    });

    // Assert
    expect(res.status).toBe(200);
    expect(res.body.state).toBe('in_progress');
    const codes = (res.body.comparison.deviations as { stepIndex: number; code: string; level: string }[]).map((d) => [d.stepIndex, d.code, d.level]);
    expect(codes).toEqual([
      [0, 'at_or_above_solidus', 'danger'],
      [0, 'duration_short', 'caution'],
      [1, 'temperature_below_plan', 'caution'],
      [1, 'quench_delay_over_max', 'caution'],
    ]);
    expect(res.body.comparison.worst).toBe('danger');
    expect(res.body.comparison.steps.map((st: { status: string }) => st.status)).toEqual(['deviates', 'deviates', 'as_planned']);
    expect(res.body.comparison.steps[0].durationMin).toBe(300);
  });

  test('when a later record sends one field, then the others are kept', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);
    const id = (await plan(b, s.w, s.studentCastings)).body.id as string;
    await b.patch(`${planUrl(s.w, id)}/steps`, { steps: [{ stepIndex: 0, startedAt: '2026-11-30T08:00:00Z', temperatureC: 541 }] });
    const res = await b.patch(`${planUrl(s.w, id)}/steps`, { steps: [{ stepIndex: 0, endedAt: '2026-11-30T16:00:00Z' }] });
    expect(res.status).toBe(200);
    expect(res.body.comparison.steps[0]).toMatchObject({ status: 'as_planned', durationMin: 480, deviations: [], missing: [] });
    expect(res.body.comparison.steps[0].actual).toMatchObject({ temperatureC: 541, startedAt: '2026-11-30T08:00:00.000Z' });
  });

  test.each([
    { body: { steps: [{ stepIndex: 5, temperatureC: 540 }] }, path: 'steps.0.stepIndex' },
    { body: { steps: [{ stepIndex: 0, quenchDelayS: 10 }] }, path: 'steps.0.quenchDelayS' },
    { body: { steps: [{ stepIndex: 0, startedAt: '2026-11-30T10:00:00Z', endedAt: '2026-11-30T09:00:00Z' }] }, path: 'steps.0.endedAt' },
  ])('when the record does not fit the plan ($path), then 400', async ({ body, path }) => {
    const s = await setUp();
    const b = await signedIn(s.student);
    const id = (await plan(b, s.w, s.studentCastings)).body.id as string;
    const res = await b.patch(`${planUrl(s.w, id)}/steps`, body);
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
  });

  test('when the mentor tries to record, then 403 and nothing is written', async () => {
    const s = await setUp();
    const id = (await plan(await signedIn(s.student), s.w, s.studentCastings)).body.id as string;
    const res = await (await signedIn(s.mentor)).patch(`${planUrl(s.w, id)}/steps`, { steps: [{ stepIndex: 0, temperatureC: 540 }] });
    expect(res.status).toBe(403);
    const rows = await sequelize.query('SELECT 1 FROM heat_treatment_steps_actual WHERE heat_treatment_id = :id', {
      replacements: { id },
      type: QueryTypes.SELECT,
    });
    expect(rows).toHaveLength(0);
  });
});

describe('the outcome: hardness and photos', () => {
  test('when the student records hardness and links a photo of a treated casting, then both show on the plan', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);
    const id = (await plan(b, s.w, s.studentCastings)).body.id as string;
    const photoId = await insertPhotoWithMarks(s.w, s.studentCastings[0], s.student.id, ['gas_porosity']);

    // Act
    const hb = await b.post(`${planUrl(s.w, id)}/hardness`, { scale: 'HB', value: 82, castingId: s.studentCastings[0], locationNote: 'flange' });
    const webster = await b.post(`${planUrl(s.w, id)}/hardness`, { scale: 'webster_b', value: 13 });
    const photo = await b.post(`${planUrl(s.w, id)}/photos`, { photoId });

    // Assert
    expect([hb.status, webster.status, photo.status]).toEqual([201, 201, 201]);
    expect(photo.body.hardness.map((h: { scale: string; value: number }) => [h.scale, h.value])).toEqual([
      ['HB', 82],
      ['webster_b', 13],
    ]);
    expect(photo.body.photos).toEqual([{ id: photoId, castingId: s.studentCastings[0], thumbUrl: expect.stringContaining(photoId) }]);
  });

  test('when a reading is off its scale, names a casting outside the plan, or a photo is of another casting, then 400', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);
    const id = (await plan(b, s.w, [s.studentCastings[0]])).body.id as string;
    const otherPhoto = await insertPhotoWithMarks(s.w, s.studentCastings[1], s.student.id);

    const offScale = await b.post(`${planUrl(s.w, id)}/hardness`, { scale: 'webster_b', value: 45 });
    const notInPlan = await b.post(`${planUrl(s.w, id)}/hardness`, { scale: 'HB', value: 80, castingId: s.studentCastings[1] });
    const wrongPhoto = await b.post(`${planUrl(s.w, id)}/photos`, { photoId: otherPhoto });

    expect([offScale.status, notInPlan.status, wrongPhoto.status]).toEqual([400, 400, 400]);
    expect(offScale.body.error.issues[0]).toMatchObject({ path: 'value', message: 'Webster B reads 0–20' });
  });

  test('when the student marks the plan done, then the state changes; a mentor cannot', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);
    const id = (await plan(b, s.w, s.studentCastings)).body.id as string;
    const mentor = await (await signedIn(s.mentor)).patch(planUrl(s.w, id), { state: 'done' });
    const done = await b.patch(planUrl(s.w, id), { state: 'done', notes: 'Sheet filed in the oven log' });
    expect(mentor.status).toBe(403);
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ state: 'done', notes: 'Sheet filed in the oven log' });
  });
});
