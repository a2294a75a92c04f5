import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { diagnosisSchema, quickCheckQuestionsSchema, quickCheckSchema } from '../../shared/reports/diagnosis-schemas.ts';
import type { Diagnosis } from '../../shared/reports/diagnosis-schemas.ts';
import { insertHeat } from '../factories/heats.ts';
import { assignMentor, insertMember, insertWorkshopWithCrew } from '../factories/people.ts';
import { insertMarkedCasting, insertPhotoWithMarks, insertReport } from '../factories/reports.ts';
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

async function setUp() {
  const crew = await insertWorkshopWithCrew();
  await assignMentor(crew.workshop.id, crew.mentor.id, crew.student.id);
  return { ...crew, ws: crew.workshop.id };
}

const rank = (d: Diagnosis, variable: string) => d.causes.findIndex((c) => c.variable === variable);

describe('POST /api/workshops/:workshopId/diagnosis', () => {
  test('when a member asks what if an A356 melt was not degassed, then degassing leads with its evidence, fixes and sources', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/diagnosis`, {
      alloy: 'a356',
      defects: [
        { kind: 'gas_porosity', severity: 2 },
        { kind: 'gas_porosity', severity: 3 },
      ],
      conditions: { pourTempC: 720, degassed: false, chargeKind: 'ingot' },
    });

    // Assert
    expect(res.status).toBe(200);
    const d = diagnosisSchema.parse(res.body);
    expect(d.input).toMatchObject({ alloy: 'A356.0', defects: [{ kind: 'gas_porosity', severity: 3 }] });
    expect(d.causes[0]).toMatchObject({ variable: 'degassing', status: 'confirmed', confirmed: true, missing: [] });
    expect(d.causes[0].evidence[0]).toContain('not degassed');
    expect(d.causes[0].fixes.length).toBeGreaterThan(0);
    expect(d.causes[0].sources.length).toBeGreaterThan(0);
    // What was not recorded, per cause and as one list.
    const humidity = d.causes.find((c) => c.variable === 'humidity')!;
    expect(humidity.status).toBe('suspected');
    expect(humidity.missing).toEqual(['ambientTempC', 'relativeHumidityPct']);
    expect(d.missing.find((m) => m.field === 'relativeHumidityPct')).toEqual({
      field: 'relativeHumidityPct',
      label: 'relative humidity',
      variables: ['humidity'],
    });
    expect(d.priorsNote).toBeNull();
    expect(d.ruleSet.custom).toBe(false);
  });

  test.each([
    ['a misspelt condition', { defects: [], conditions: { pourTemp: 700 } }, 'conditions'],
    ['a severity of 4', { defects: [{ kind: 'misrun', severity: 4 }], conditions: {} }, 'defects.0.severity'],
    ['an unknown defect', { defects: [{ kind: 'bubbles', severity: 1 }], conditions: {} }, 'defects.0.kind'],
    ['an alloy not in the library', { alloy: 'unobtainium', defects: [], conditions: {} }, 'alloy'],
    ['a humidity of 120 %', { defects: [], conditions: { relativeHumidityPct: 120 } }, 'conditions.relativeHumidityPct'],
    ['no defects list', { conditions: {} }, 'defects'],
  ])('when the what-if has %s, then 400 naming %s', async (_what, body, path) => {
    const s = await setUp();
    const b = await signedIn(s.caster);

    const res = await b.post(`/api/workshops/${s.ws}/diagnosis`, body);

    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation-failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
  });

  test('when someone outside the workshop asks, then 404', async () => {
    const s = await setUp();
    const outsider = await insertWorkshopWithCrew();
    const b = await signedIn(outsider.admin);

    const res = await b.post(`/api/workshops/${s.ws}/diagnosis`, { defects: [], conditions: {} });

    expect(res.status).toBe(404);
  });
});

describe('GET /api/workshops/:workshopId/castings/:castingId/diagnosis', () => {
  test('when a casting has marks on two photos, then each kind counts once at its worst, with the heat’s conditions', async () => {
    // Arrange
    const s = await setUp();
    const casting = await insertMarkedCasting(s.ws, s.student.id, { marks: [{ kind: 'cold_shut', severity: 1 }, { kind: 'gas_porosity', severity: 2 }] });
    await insertPhotoWithMarks(s.ws, casting.castingId, s.student.id, [{ kind: 'gas_porosity', severity: 3 }]);
    const b = await signedIn(s.student);

    // Act
    const res = await b.get(`/api/workshops/${s.ws}/castings/${casting.castingId}/diagnosis`);

    // Assert
    expect(res.status).toBe(200);
    const d = diagnosisSchema.parse(res.body);
    expect(d.input.defects).toEqual([
      { kind: 'gas_porosity', severity: 3 },
      { kind: 'cold_shut', severity: 1 },
    ]);
    expect(d.input.alloy).toBe('A356.0');
    expect(d.input.conditions).toMatchObject({ pourTempC: 720, peakTempC: 735, holdTimeMin: 45, chargeKind: 'ingot', degassed: true, relativeHumidityPct: 55 });
    // No mould on the casting: the mould fields are "not recorded", said per cause and together.
    expect(d.input.conditions.moldMaterial).toBeUndefined();
    const mould = d.missing.find((m) => m.field === 'moldMaterial');
    expect(mould?.label).toBe('mould material');
    for (const variable of mould!.variables) {
      expect(d.causes.find((c) => c.variable === variable)!.missing).toContain('moldMaterial');
    }
  });

  test.each([
    ['the caster', 'student', 200],
    ['their mentor', 'mentor', 200],
    ['an admin', 'admin', 200],
    ['another caster', 'caster', 404],
  ] as const)('when %s asks for a student’s casting, then %i', async (_who, role, status) => {
    const s = await setUp();
    const casting = await insertMarkedCasting(s.ws, s.student.id);
    const b = await signedIn(s[role]);

    const res = await b.get(`/api/workshops/${s.ws}/castings/${casting.castingId}/diagnosis`);

    expect(res.status).toBe(status);
    if (status === 404) expect(res.body.error.code).toBe('casting-not-found');
  });

  test('when reviewers keep confirming a lower-ranked cause, then a new casting with the same defect ranks it higher and says why', async () => {
    // Arrange: no melt start and no tool preheat recorded, so hold time and
    // tool preheat are equal suspects, hold time first by name.
    const s = await setUp();
    const unknowns = { meltStartedAt: null, toolsPreheated: null };
    const first = await insertMarkedCasting(s.ws, s.student.id, { heat: unknowns });
    const b = await signedIn(s.student);
    const before = diagnosisSchema.parse((await b.get(`/api/workshops/${s.ws}/castings/${first.castingId}/diagnosis`)).body);
    const mentor = await signedIn(s.mentor);
    for (let i = 0; i < 3; i++) {
      const r = await insertReport({ workshopId: s.ws, authorId: s.student.id, state: 'in_review', heat: unknowns });
      const resolved = await mentor.post(`/api/workshops/${s.ws}/reports/${r.id}/transitions`, {
        action: 'resolve',
        note: 'The skimmer went in cold every time.',
        causes: [{ variable: 'tool_preheat' }],
      });
      expect(resolved.status).toBe(200);
    }
    const fresh = await insertMarkedCasting(s.ws, s.student.id, { heat: unknowns });

    // Act
    const after = diagnosisSchema.parse((await b.get(`/api/workshops/${s.ws}/castings/${fresh.castingId}/diagnosis`)).body);

    // Assert
    expect(rank(before, 'hold_time')).toBeLessThan(rank(before, 'tool_preheat'));
    expect(rank(after, 'tool_preheat')).toBeLessThan(rank(after, 'hold_time'));
    const toolPreheat = after.causes.find((c) => c.variable === 'tool_preheat')!;
    expect(toolPreheat.prior).toEqual({
      confirmedCount: 3,
      resolvedCount: 3,
      explanation: 'confirmed in 3 of 3 resolved reports with gas porosity in this workshop',
    });
    expect(toolPreheat.evidence).toContain('Confirmed in 3 of 3 resolved reports with gas porosity in this workshop.');
    expect(after.priorsNote).toBe('The ranking also weighs what reviewers confirmed in 3 resolved reports with gas porosity in this workshop.');
  });
});

describe('POST /api/workshops/:workshopId/quick-checks', () => {
  test('when a student starts a quick check, then a heat stub of theirs with one casting and no charge lines exists', async () => {
    // Arrange
    const s = await setUp();
    const b = await signedIn(s.student);

    // Act
    const res = await b.post(`/api/workshops/${s.ws}/quick-checks`, { alloy: 'a356', title: 'Pinholes on the sprue' });

    // Assert
    expect(res.status).toBe(201);
    const { heatId, castingId } = quickCheckSchema.parse(res.body);
    const heat = await b.get(`/api/workshops/${s.ws}/heats/${heatId}`);
    expect(heat.status).toBe(200);
    expect(heat.body).toMatchObject({ casterId: s.student.id, alloy: 'A356.0', chargeLines: [], notes: 'Quick check: Pinholes on the sprue' });
    expect(heat.body.castings.map((k: { id: string }) => k.id)).toEqual([castingId]);
    expect(Date.now() - Date.parse(heat.body.pouredAt)).toBeLessThan(60_000);
    const d = diagnosisSchema.parse((await b.get(`/api/workshops/${s.ws}/castings/${castingId}/diagnosis`)).body);
    // The charge is not invented: it stays "not recorded".
    expect(d.input.conditions.chargeKind).toBeUndefined();
  });

  test('when no alloy is given, then the caster’s last heat’s alloy is used, and without any heat the alloy is asked for', async () => {
    const s = await setUp();
    await insertHeat({ workshopId: s.ws, casterId: s.caster.id, alloy: 'C83600' });
    const caster = await signedIn(s.caster);
    const student = await signedIn(s.student);

    const withHistory = await caster.post(`/api/workshops/${s.ws}/quick-checks`, {});
    const without = await student.post(`/api/workshops/${s.ws}/quick-checks`, {});

    expect(withHistory.status).toBe(201);
    expect((await caster.get(`/api/workshops/${s.ws}/heats/${withHistory.body.heatId}`)).body.alloy).toBe('C83600');
    expect(without.status).toBe(400);
    expect(without.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['alloy']);
  });
});

describe('GET /api/workshops/:workshopId/quick-check-questions', () => {
  test('when the defect is gas porosity, then the few questions ask for pour temperature, degassing, charge and humidity', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);

    const res = await b.get(`/api/workshops/${s.ws}/quick-check-questions?kinds=gas_porosity`);

    expect(res.status).toBe(200);
    const q = quickCheckQuestionsSchema.parse(res.body);
    expect(q.questions.length).toBeGreaterThanOrEqual(4);
    expect(q.questions.length).toBeLessThanOrEqual(5);
    expect(q.fields).toEqual(expect.arrayContaining(['pourTempC', 'degassed', 'chargeKind', 'relativeHumidityPct']));
  });

  test('when the defect is rounded edges, then pour temperature, mould material and mould temperature come first', async () => {
    const s = await setUp();
    const b = await signedIn(s.student);

    const res = await b.get(`/api/workshops/${s.ws}/quick-check-questions?kinds=rounded_edges`);

    const q = quickCheckQuestionsSchema.parse(res.body);
    expect(q.questions.slice(0, 3).flatMap((x) => x.fields).sort()).toEqual(['moldMaterial', 'moldTempC', 'pourTempC']);
  });

  test('when the workshop switches off the degassing rule, then degassing is no longer asked about gas porosity', async () => {
    const s = await setUp();
    const admin = await signedIn(s.admin);
    await admin.patch(`/api/workshops/${s.ws}/rules/undegassed-gas`, { enabled: false });

    const res = await admin.get(`/api/workshops/${s.ws}/quick-check-questions?kinds=gas_porosity&kinds=pinholes`);

    expect(res.status).toBe(200);
    expect(res.body.kinds).toEqual(['gas_porosity', 'pinholes']);
    expect(res.body.fields).not.toContain('degassed');
  });

  test.each([
    ['an unknown kind', '?kinds=bubbles', 'kinds.0'],
    ['no kinds', '?kinds=', 'kinds'],
    ['no query', '', 'kinds'],
  ])('when asked with %s, then 400 naming %s', async (_what, query, path) => {
    const s = await setUp();
    const b = await signedIn(s.student);

    const res = await b.get(`/api/workshops/${s.ws}/quick-check-questions${query}`);

    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
  });
});

describe('an unrelated member', () => {
  test('when a mentor without the student asks for the casting’s diagnosis, then 404', async () => {
    const s = await setUp();
    const other = await insertMember(s.ws, 'mentor');
    const casting = await insertMarkedCasting(s.ws, s.student.id);
    const b = await signedIn(other);

    const res = await b.get(`/api/workshops/${s.ws}/castings/${casting.castingId}/diagnosis`);

    expect(res.status).toBe(404);
  });
});
