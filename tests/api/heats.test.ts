import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Role } from '../../shared/auth/roles.ts';
import {
  ITS90_FREEZING_POINTS_C,
  cautionsFor,
  chargeFor,
  dewPointC,
  findAlloy,
  heatConditionsSchema,
  humidityRisk,
  hydrogenSolubility,
  median,
  pourYield,
  suggestSetpoint,
  superheatC,
} from '../../shared/domain/index.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { buildHeat, insertCrucible, insertFurnace, insertHeat, insertMould } from '../factories/heats.ts';
import { assignMentor, insertMember, insertWorkshopWithCrew } from '../factories/people.ts';
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

/** Rows of the heat log in one workshop, to prove a refused request wrote nothing. */
async function logRows(workshopId: string) {
  const [row] = await sequelize.query<{ heats: number; lines: number; castings: number }>(
    `SELECT (SELECT count(*)::int FROM heats WHERE workshop_id = :workshopId) AS heats,
            (SELECT count(*)::int FROM heat_charge_lines l JOIN heats h ON h.id = l.heat_id WHERE h.workshop_id = :workshopId) AS lines,
            (SELECT count(*)::int FROM castings WHERE workshop_id = :workshopId) AS castings`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
  return row;
}

async function heatNotes(heatId: string): Promise<string | null | undefined> {
  const rows = await sequelize.query<{ notes: string | null }>('SELECT notes FROM heats WHERE id = :heatId', {
    replacements: { heatId },
    type: QueryTypes.SELECT,
  });
  return rows[0]?.notes;
}

const at = (iso: string, minutes: number) => new Date(Date.parse(iso) + minutes * 60_000).toISOString();

describe('POST /api/workshops/:workshopId/heats', () => {
  test('when a caster logs a heat with charge lines and castings, then the figures equal the trade core’s', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const [furnace, crucible, mould] = await Promise.all([
      insertFurnace(crew.workshop.id),
      insertCrucible(crew.workshop.id),
      insertMould(crew.workshop.id, { material: 'steel', hasRiser: true }),
    ]);
    const caster = await signedIn(crew.caster);
    const pouredAt = '2026-11-24T19:30:00.000Z';
    const body = buildHeat({
      pouredAt,
      meltStartedAt: at(pouredAt, -50),
      pourTempC: 725,
      peakTempC: 748,
      ambientTempC: 24,
      relativeHumidityPct: 70,
      furnaceId: furnace.id,
      crucibleId: crucible.id,
      chargeLines: [
        { kind: 'ingot', massG: 800, description: 'A356 ingot' },
        { kind: 'clean_scrap', massG: 400, description: 'wheel offcuts' },
      ],
      castings: [
        { mouldId: mould.id, massG: 420, mouldPreheatC: 250, coated: true, vented: true, pourHeightCm: 8, sectionThicknessMm: 12, airCoolMin: 3, quenchMedium: 'water' },
        { massG: 300 },
      ],
    });

    // Act
    const res = await caster.post(`/api/workshops/${crew.workshop.id}/heats`, body);

    // Assert
    expect(res.status).toBe(201);
    const alloy = findAlloy('A356.0')!;
    const dewPoint = dewPointC({ tempC: 24, relativeHumidityPct: 70 });
    const totals = pourYield({ chargeG: 1200, castingG: 720 });
    expect(res.body).toMatchObject({
      casterId: crew.caster.id,
      casterName: crew.caster.displayName,
      alloy: 'A356.0',
      pouredAt,
      chargeLines: body.chargeLines,
      furnace: { id: furnace.id, name: furnace.name, kind: furnace.kind },
      crucible: { id: crucible.id, cycleCount: 1, warnAt: 15, limitAt: 20, status: 'ok' },
    });
    // Into water three minutes after the pour: the trade core's early-quench caution, from the pour's conditions.
    expect(res.body.cautions).toEqual(cautionsFor({ alloy, conditions: res.body.castings[0].conditions }));
    expect(res.body.cautions.map((c: { id: string }) => c.id)).toEqual(['early_water_quench']);
    expect(res.body.figures).toEqual({
      chargeG: 1200,
      castingsG: 720,
      yieldPct: totals.yieldPct,
      remainderG: totals.remainderG,
      superheatC: superheatC(725, alloy),
      liquidusC: alloy.liquidusC,
      holdTimeMin: 50,
      dewPointC: dewPoint,
      humidityRisk: humidityRisk(dewPoint),
      hydrogen: {
        atPourMlPer100g: hydrogenSolubility({ tempC: 725, phase: 'liquid' }),
        atMeltingPointMlPer100g: hydrogenSolubility({ tempC: ITS90_FREEZING_POINTS_C.aluminium, phase: 'liquid' }),
        meltingPointC: ITS90_FREEZING_POINTS_C.aluminium,
        ratio: hydrogenSolubility({ tempC: 725, phase: 'liquid' }) / hydrogenSolubility({ tempC: ITS90_FREEZING_POINTS_C.aluminium, phase: 'liquid' }),
      },
      crucibleCycle: 1,
    });
    expect(res.body.castings.map((k: { yieldPct: number }) => k.yieldPct)).toEqual([
      pourYield({ chargeG: 1200, castingG: 420 }).yieldPct,
      pourYield({ chargeG: 1200, castingG: 300 }).yieldPct,
    ]);
    // Every field of the first pour is known, so its conditions are a full HeatConditions.
    expect(heatConditionsSchema.parse(res.body.castings[0].conditions)).toEqual({
      pourTempC: 725,
      peakTempC: 748,
      holdTimeMin: 50,
      chargeKind: 'clean_scrap',
      degassed: true,
      fluxed: true,
      fluxKind: 'cover',
      skimmed: true,
      toolsPreheated: true,
      ambientTempC: 24,
      relativeHumidityPct: 70,
      moldMaterial: 'steel',
      moldTempC: 250,
      moldCoated: true,
      moldVented: true,
      riser: true,
      pourHeightCm: 8,
      sectionThicknessMm: 12,
      quenchDelayMin: 3,
      crucibleCycles: 1,
    });
    expect(await logRows(crew.workshop.id)).toEqual({ heats: 1, lines: 2, castings: 2 });
  });

  test('when the alloy is a bronze, then superheat uses its liquidus and there is no aluminium hydrogen hint', async () => {
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);

    const res = await caster.post(`/api/workshops/${crew.workshop.id}/heats`, buildHeat({ alloy: 'C83600', pourTempC: 1150 }));

    expect(res.status).toBe(201);
    expect(res.body.figures.superheatC).toBe(superheatC(1150, findAlloy('C83600')!));
    expect(res.body.figures.hydrogen).toBeNull();
  });

  test.each([
    ['no charge lines', 'chargeLines', { chargeLines: [] }],
    ['a negative charge mass', 'chargeLines.0.massG', { chargeLines: [{ kind: 'ingot', massG: -5 }] }],
    ['an unknown charge kind', 'chargeLines.0.kind', { chargeLines: [{ kind: 'ore', massG: 5 }] }],
    ['an alloy the library does not know', 'alloy', { alloy: 'unobtainium' }],
    ['a melt that starts after the pour', 'meltStartedAt', { pouredAt: '2026-11-20T10:00:00Z', meltStartedAt: '2026-11-20T11:00:00Z' }],
    ['castings heavier than the charge', 'castings', { castings: [{ massG: 900 }, { massG: 300 }] }],
    ['a pour temperature beyond any furnace', 'pourTempC', { pourTempC: 5000 }],
    ['a humidity above 100 %', 'relativeHumidityPct', { relativeHumidityPct: 120 }],
    ['a pour time without an offset', 'pouredAt', { pouredAt: '2026-11-20 18:00' }],
    ['an unknown degassing method', 'degassing', { degassing: 'prayer' }],
  ] as const)('when the heat has %s, then 400 names %s and nothing is written', async (_what, path, overrides) => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);
    const before = await logRows(crew.workshop.id);

    // Act
    const res = await caster.post(`/api/workshops/${crew.workshop.id}/heats`, { ...buildHeat(), ...overrides });

    // Assert
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation-failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
    expect(await logRows(crew.workshop.id)).toEqual(before);
  });

  test('when the heat names another workshop’s furnace or mould, then 400 names them and nothing is written', async () => {
    const crew = await insertWorkshopWithCrew();
    const elsewhere = await insertWorkshopWithCrew();
    const [furnace, mould] = await Promise.all([insertFurnace(elsewhere.workshop.id), insertMould(elsewhere.workshop.id)]);
    const caster = await signedIn(crew.caster);

    const res = await caster.post(
      `/api/workshops/${crew.workshop.id}/heats`,
      buildHeat({ furnaceId: furnace.id, castings: [{ mouldId: mould.id, massG: 300 }] }),
    );

    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['castings.0.mouldId', 'furnaceId']);
    expect(await logRows(crew.workshop.id)).toEqual({ heats: 0, lines: 0, castings: 0 });
  });

  test('when an admin logs a heat for a student, then it is the student’s; a student cannot log for someone else', async () => {
    const crew = await insertWorkshopWithCrew();
    const outsider = (await insertWorkshopWithCrew()).caster;
    const admin = await signedIn(crew.admin);
    const student = await signedIn(crew.student);
    const url = `/api/workshops/${crew.workshop.id}/heats`;

    const forStudent = await admin.post(url, buildHeat({ casterId: crew.student.id }));
    const forCaster = await student.post(url, buildHeat({ casterId: crew.caster.id }));
    const forOutsider = await admin.post(url, buildHeat({ casterId: outsider.id }));

    expect(forStudent.status).toBe(201);
    expect(forStudent.body.casterId).toBe(crew.student.id);
    expect(forCaster.status).toBe(403);
    expect(forOutsider.status).toBe(400);
    expect(forOutsider.body.error.issues[0].path).toBe('casterId');
    expect((await logRows(crew.workshop.id)).heats).toBe(1);
  });

  test('when a heat quenched the crucible, used borax on aluminium, skipped the tool preheat and two ticks, then each raises a caution', async () => {
    const crew = await insertWorkshopWithCrew();
    const crucible = await insertCrucible(crew.workshop.id);
    const caster = await signedIn(crew.caster);
    const url = `/api/workshops/${crew.workshop.id}/heats`;

    const risky = await caster.post(
      url,
      buildHeat({
        crucibleId: crucible.id,
        crucibleShock: 'quenched',
        fluxKind: 'borax',
        toolsPreheated: false,
        safety: { dryTools: true, ppe: false, clearFloor: false },
      }),
    );
    const list = await caster.get(url);

    expect(risky.status).toBe(201);
    expect(risky.body.cautions.map((c: { id: string }) => c.id)).toEqual([
      'crucible_shock',
      'safety_checklist_incomplete',
      'borax_on_aluminium',
      'tools_not_preheated',
    ]);
    expect(risky.body.cautions[0].title).toMatch(/quenched/);
    expect(risky.body.cautions[1].text).toMatch(/protective equipment on, floor clear/);
    for (const caution of risky.body.cautions) expect(caution.source.length).toBeGreaterThan(3);
    expect(list.body.items[0].cautionIds).toEqual(risky.body.cautions.map((c: { id: string }) => c.id));
  });

  test('when borax goes on a brass heat, then no borax caution (it is a copper-alloy flux), but the zinc-fume one', async () => {
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);

    const res = await caster.post(`/api/workshops/${crew.workshop.id}/heats`, buildHeat({ alloy: 'C85400', pourTempC: 1050, fluxKind: 'borax' }));

    expect(res.body.cautions.map((c: { id: string }) => c.id)).toEqual(['zinc_fume']);
  });

  test('when dirty scrap is charged, then the heat and its list row carry the trade core’s scrap caution', async () => {
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);
    const url = `/api/workshops/${crew.workshop.id}/heats`;

    const res = await caster.post(url, buildHeat({ chargeLines: [{ kind: 'ingot', massG: 500 }, { kind: 'dirty_scrap', massG: 300 }] }));
    const list = await caster.get(url);

    expect(res.body.cautions.map((c: { id: string }) => c.id)).toEqual(['wet_or_dirty_scrap']);
    expect(list.body.items[0].cautionIds).toEqual(['wet_or_dirty_scrap']);
  });

  test('when a heat goes past the crucible’s limit, then the heat carries a crucible caution', async () => {
    const crew = await insertWorkshopWithCrew();
    const crucible = await insertCrucible(crew.workshop.id, { material: 'steel' });
    const admin = await signedIn(crew.admin);
    await admin.send('put', `/api/workshops/${crew.workshop.id}/crucible-limits`, { limits: [{ material: 'steel', warnAt: 1, limitAt: 2 }] });
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, crucibleId: crucible.id, pouredAt: '2026-11-01T10:00:00Z' });

    const second = await admin.post(`/api/workshops/${crew.workshop.id}/heats`, buildHeat({ crucibleId: crucible.id, pouredAt: '2026-11-02T10:00:00Z' }));

    expect(second.body.figures.crucibleCycle).toBe(2);
    expect(second.body.crucible.status).toBe('past-limit');
    expect(second.body.cautions.map((c: { id: string }) => c.id)).toEqual(['crucible_past_limit']);
  });
});

// ── who may read, change and delete whose heat ──────────────────────────────

type Target = 'own' | 'another member’s' | 'a mentee’s' | 'another workshop’s';
type Action = 'read' | 'update' | 'delete';

const ok = { read: 200, update: 200, delete: 204 } as const;
const EXPECTED: Record<Role, Record<Target, Record<Action, number>>> = {
  // Mentee access comes from the grant table, not from an assignment row: a
  // student or caster recorded as someone's "mentor" still sees nothing.
  student: {
    own: ok,
    'another member’s': { read: 404, update: 404, delete: 404 },
    'a mentee’s': { read: 404, update: 404, delete: 404 },
    'another workshop’s': { read: 404, update: 404, delete: 404 },
  },
  caster: {
    own: ok,
    'another member’s': { read: 404, update: 404, delete: 404 },
    'a mentee’s': { read: 404, update: 404, delete: 404 },
    'another workshop’s': { read: 404, update: 404, delete: 404 },
  },
  mentor: {
    own: ok,
    'another member’s': { read: 404, update: 404, delete: 404 },
    'a mentee’s': { read: 200, update: 403, delete: 403 },
    'another workshop’s': { read: 404, update: 404, delete: 404 },
  },
  admin: {
    own: ok,
    'another member’s': ok,
    'a mentee’s': ok,
    'another workshop’s': { read: 404, update: 404, delete: 404 },
  },
};
const MATRIX = (Object.keys(EXPECTED) as Role[]).flatMap((role) =>
  (Object.keys(EXPECTED[role]) as Target[]).flatMap((target) =>
    (['read', 'update', 'delete'] as const).map((action) => [role, action, target, EXPECTED[role][target][action]] as const),
  ),
);

describe('GET/PATCH/DELETE /api/workshops/:workshopId/heats/:heatId', () => {
  test.each(MATRIX)('when a %s tries to %s %s heat, then %i', async (role, action, target, status) => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const actor = crew[role];
    let owner: { id: string };
    let heatWorkshop = crew.workshop.id;
    if (target === 'own') owner = actor;
    else if (target === 'another member’s') owner = await insertMember(crew.workshop.id, 'student');
    else if (target === 'a mentee’s') {
      owner = await insertMember(crew.workshop.id, 'student');
      await assignMentor(crew.workshop.id, actor.id, owner.id);
    } else {
      const elsewhere = await insertWorkshopWithCrew();
      owner = elsewhere.caster;
      heatWorkshop = elsewhere.workshop.id;
    }
    const heat = await insertHeat({ workshopId: heatWorkshop, casterId: owner.id, notes: 'as logged' });
    const b = await signedIn(actor);
    const url = `/api/workshops/${crew.workshop.id}/heats/${heat.id}`;

    // Act
    const res =
      action === 'read' ? await b.get(url) : action === 'update' ? await b.patch(url, { notes: 'changed' }) : await b.delete(url);

    // Assert
    expect(res.status).toBe(status);
    if (status === 404) expect(res.body.error.code).toBe('heat-not-found');
    const notes = await heatNotes(heat.id);
    if (action === 'update') expect(notes).toBe(status === 200 ? 'changed' : 'as logged');
    if (action === 'delete') expect(notes).toBe(status === 204 ? undefined : 'as logged');
  });

  test('when anyone asks for a heat under a workshop they are not in, then the same 404 as a missing workshop', async () => {
    const crew = await insertWorkshopWithCrew();
    const elsewhere = await insertWorkshopWithCrew();
    const heat = await insertHeat({ workshopId: elsewhere.workshop.id, casterId: elsewhere.caster.id });
    const admin = await signedIn(crew.admin);

    const res = await admin.get(`/api/workshops/${elsewhere.workshop.id}/heats/${heat.id}`);
    const list = await admin.get(`/api/workshops/${elsewhere.workshop.id}/heats`);

    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('workshop-not-found');
    expect(list.status).toBe(404);
  });

  test('when a heat id is missing or not a uuid, then 404 heat-not-found or 400 naming heatId', async () => {
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);

    const missing = await caster.get(`/api/workshops/${crew.workshop.id}/heats/00000000-0000-4000-8000-000000000000`);
    const garbled = await caster.get(`/api/workshops/${crew.workshop.id}/heats/not-a-heat`);

    expect(missing.status).toBe(404);
    expect(garbled.status).toBe(400);
    expect(garbled.body.error.issues[0].path).toBe('heatId');
  });
});

describe('GET /api/workshops/:workshopId/heats', () => {
  test('when each role lists heats, then they see only what they may read', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    await assignMentor(crew.workshop.id, crew.mentor.id, crew.student.id);
    const heats = Object.fromEntries(
      await Promise.all(
        (['student', 'caster', 'mentor', 'admin'] as const).map(async (r) => [r, (await insertHeat({ workshopId: crew.workshop.id, casterId: crew[r].id })).id] as const),
      ),
    );
    const ids = async (role: Role) => {
      const b = await signedIn(crew[role]);
      const res = await b.get(`/api/workshops/${crew.workshop.id}/heats?limit=100`);
      return res.body.items.map((h: { id: string }) => h.id).sort();
    };

    // Act / Assert
    expect(await ids('student')).toEqual([heats.student]);
    expect(await ids('caster')).toEqual([heats.caster]);
    expect(await ids('mentor')).toEqual([heats.student, heats.mentor].sort());
    expect(await ids('admin')).toEqual(Object.values(heats).sort());
  });

  test.each([
    ['pouredAt', 'desc'],
    ['pouredAt', 'asc'],
    ['meltStartedAt', 'asc'],
    ['pourTempC', 'asc'],
    ['pourTempC', 'desc'],
    ['yieldPct', 'desc'],
  ] as const)('when paging by %s %s three at a time, then every heat comes once, in order, empty values last', async (sort, dir) => {
    // Arrange: ties and gaps on purpose (two heats at 720 °C, one unmeasured, one without castings).
    const crew = await insertWorkshopWithCrew();
    const specs = [
      { pourTempC: 720, castings: [{ massG: 600 }] },
      { pourTempC: 720, castings: [{ massG: 450 }] },
      { pourTempC: null, castings: [{ massG: 300 }] },
      { pourTempC: 705, castings: [] },
      { pourTempC: 760, castings: [{ massG: 500 }], meltStartedAt: null },
      { pourTempC: 690, castings: [{ massG: 250 }, { massG: 250 }] },
      { pourTempC: 740, castings: [{ massG: 700 }] },
    ];
    const heats: Awaited<ReturnType<typeof insertHeat>>[] = [];
    for (const s of specs) heats.push(await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, ...s }));
    const value = (h: (typeof heats)[number]): string | number | null => {
      if (sort === 'pouredAt') return h.pouredAt;
      if (sort === 'meltStartedAt') return h.meltStartedAt ?? null;
      if (sort === 'pourTempC') return h.pourTempC ?? null;
      const cast = h.castings.reduce((sum, k) => sum + (k.massG ?? 0), 0);
      return h.castings.length ? pourYield({ chargeG: 1000, castingG: cast }).yieldPct : null;
    };
    const sign = dir === 'asc' ? 1 : -1;
    const expected = [...heats]
      .sort((a, b) => {
        const [va, vb] = [value(a), value(b)];
        if (va === null || vb === null) return va === vb ? sign * a.id.localeCompare(b.id) : va === null ? 1 : -1;
        if (va !== vb) return sign * (va < vb ? -1 : 1);
        return sign * a.id.localeCompare(b.id);
      })
      .map((h) => h.id);
    const caster = await signedIn(crew.caster);

    // Act
    const seen: string[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const query: string = `sort=${sort}&dir=${dir}&limit=3${cursor ? `&cursor=${cursor}` : ''}`;
      const res = await caster.get(`/api/workshops/${crew.workshop.id}/heats?${query}`);
      expect(res.status).toBe(200);
      seen.push(...res.body.items.map((h: { id: string }) => h.id));
      cursor = res.body.nextCursor;
      pages += 1;
    } while (cursor && pages < 10);

    // Assert
    expect(seen).toEqual(expected);
    expect(pages).toBe(3);
  });

  test('when the page size or cursor is wrong, then 400 names the parameter', async () => {
    const crew = await insertWorkshopWithCrew();
    for (let i = 0; i < 3; i++) await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id });
    const caster = await signedIn(crew.caster);
    const url = `/api/workshops/${crew.workshop.id}/heats`;
    const first = await caster.get(`${url}?limit=1`);

    const tooMany = await caster.get(`${url}?limit=101`);
    const garbled = await caster.get(`${url}?cursor=not-a-cursor`);
    const otherSort = await caster.get(`${url}?sort=pourTempC&cursor=${first.body.nextCursor}`);
    const badSort = await caster.get(`${url}?sort=colour`);

    expect([tooMany.status, garbled.status, otherSort.status, badSort.status]).toEqual([400, 400, 400, 400]);
    expect(tooMany.body.error.issues[0].path).toBe('limit');
    expect(garbled.body.error.issues[0].path).toBe('cursor');
    expect(otherSort.body.error.issues[0].path).toBe('cursor');
    expect(badSort.body.error.issues[0].path).toBe('sort');
  });

  test('when filtering by alloy, caster, furnace, crucible and days, then only matching heats come back', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const w = crew.workshop.id;
    const [furnace, crucible] = await Promise.all([insertFurnace(w), insertCrucible(w)]);
    const a = await insertHeat({ workshopId: w, casterId: crew.caster.id, alloy: 'A356.0', furnaceId: furnace.id, pouredAt: '2026-11-10T09:00:00Z', meltStartedAt: null });
    const b = await insertHeat({ workshopId: w, casterId: crew.student.id, alloy: '319.0', crucibleId: crucible.id, pouredAt: '2026-11-11T23:30:00Z', meltStartedAt: null });
    const c = await insertHeat({ workshopId: w, casterId: crew.caster.id, alloy: 'A356.0', pouredAt: '2026-11-12T00:30:00Z', meltStartedAt: null });
    const admin = await signedIn(crew.admin);
    const ids = async (query: string) =>
      (await admin.get(`/api/workshops/${w}/heats?${query}`)).body.items.map((h: { id: string }) => h.id).sort();

    // Act / Assert
    expect(await ids('alloy=a356')).toEqual([a.id, c.id].sort());
    expect(await ids(`casterId=${crew.student.id}`)).toEqual([b.id]);
    expect(await ids(`furnaceId=${furnace.id}`)).toEqual([a.id]);
    expect(await ids(`crucibleId=${crucible.id}`)).toEqual([b.id]);
    expect(await ids('from=2026-11-11&to=2026-11-11')).toEqual([b.id]);
    expect(await ids('from=2026-11-11T00:00:00Z')).toEqual([b.id, c.id].sort());
    // No casting here has marked photos; the matching case is in photos.test.ts.
    expect(await ids('defect=cold_shut')).toEqual([]);
  });

  test('when listing, then each row carries the headline figures from the trade core', async () => {
    const crew = await insertWorkshopWithCrew();
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, pourTempC: 731, castings: [{ massG: 350 }, { massG: null }] });
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, pourTempC: 712, castings: [{ massG: 640 }] });
    const caster = await signedIn(crew.caster);

    const res = await caster.get(`/api/workshops/${crew.workshop.id}/heats?sort=pourTempC&dir=asc`);

    expect(res.body.items[0].figures).toEqual({
      chargeG: 1000,
      castingsG: 640,
      yieldPct: pourYield({ chargeG: 1000, castingG: 640 }).yieldPct,
      remainderG: pourYield({ chargeG: 1000, castingG: 640 }).remainderG,
      superheatC: superheatC(712, findAlloy('A356.0')!),
      holdTimeMin: 45,
    });
    // An unweighed casting leaves the yield unknown rather than wrong.
    expect(res.body.items[1].figures).toMatchObject({ castingsG: null, yieldPct: null });
    expect(res.body.items[1].castingCount).toBe(2);
  });
});

describe('PATCH /api/workshops/:workshopId/heats/:heatId', () => {
  test('when charge lines are given, then they replace the old ones; safety ticks merge; untouched fields stay', async () => {
    const crew = await insertWorkshopWithCrew();
    const heat = await insertHeat({ workshopId: crew.workshop.id, casterId: crew.student.id, safety: { dryTools: true, ppe: true, clearFloor: false } });
    const student = await signedIn(crew.student);

    const res = await student.patch(`/api/workshops/${crew.workshop.id}/heats/${heat.id}`, {
      chargeLines: [{ kind: 'dirty_scrap', massG: 1500, description: 'painted extrusion' }],
      safety: { clearFloor: true },
    });

    expect(res.status).toBe(200);
    expect(res.body.chargeLines).toEqual([{ kind: 'dirty_scrap', massG: 1500, description: 'painted extrusion' }]);
    expect(res.body.safety).toEqual({ dryTools: true, ppe: true, clearFloor: true });
    expect(res.body).toMatchObject({ pourTempC: heat.pourTempC, alloy: heat.alloy, pouredAt: heat.pouredAt });
    expect(res.body.conditions.chargeKind).toBe('dirty_scrap');
    expect((await logRows(crew.workshop.id)).lines).toBe(1);
  });

  test('when new charge lines weigh less than the castings, then 400 and the old lines stay', async () => {
    const crew = await insertWorkshopWithCrew();
    const heat = await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, castings: [{ massG: 800 }] });
    const caster = await signedIn(crew.caster);

    const res = await caster.patch(`/api/workshops/${crew.workshop.id}/heats/${heat.id}`, { chargeLines: [{ kind: 'ingot', massG: 500 }] });
    const read = await caster.get(`/api/workshops/${crew.workshop.id}/heats/${heat.id}`);

    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('chargeLines');
    expect(read.body.chargeLines).toEqual(heat.chargeLines);
  });

  test('when the new melt start comes after the stored pour, then 400 names meltStartedAt', async () => {
    const crew = await insertWorkshopWithCrew();
    const heat = await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id });
    const caster = await signedIn(crew.caster);

    const res = await caster.patch(`/api/workshops/${crew.workshop.id}/heats/${heat.id}`, { meltStartedAt: at(heat.pouredAt, 10) });

    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('meltStartedAt');
  });
});

describe('POST /api/workshops/:workshopId/heats/:heatId/castings, PATCH/DELETE …/castings/:castingId', () => {
  test('when the caster adds, weighs and removes a pour, then the heat’s yield follows', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const mould = await insertMould(crew.workshop.id, { material: 'green_sand', hasRiser: false });
    const heat = await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id });
    const caster = await signedIn(crew.caster);
    const w = `/api/workshops/${crew.workshop.id}`;

    // Act
    const added = await caster.post(`${w}/heats/${heat.id}/castings`, { mouldId: mould.id, sectionThicknessMm: 6 });
    const unweighed = (await caster.get(`${w}/heats/${heat.id}`)).body.figures;
    const weighed = await caster.patch(`${w}/castings/${added.body.id}`, { massG: 380 });
    const afterWeighing = (await caster.get(`${w}/heats/${heat.id}`)).body;
    const tooHeavy = await caster.patch(`${w}/castings/${added.body.id}`, { massG: 1200 });
    const removed = await caster.delete(`${w}/castings/${added.body.id}`);
    const afterRemoval = (await caster.get(`${w}/heats/${heat.id}`)).body;

    // Assert
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({ heatId: heat.id, mould: { id: mould.id, material: 'green_sand', hasRiser: false }, quenchMedium: 'none', yieldPct: null });
    expect(added.body.conditions).toMatchObject({ moldMaterial: 'green_sand', riser: false, sectionThicknessMm: 6 });
    expect(unweighed.yieldPct).toBeNull();
    expect(weighed.body.yieldPct).toBe(pourYield({ chargeG: 1000, castingG: 380 }).yieldPct);
    expect(afterWeighing.figures.yieldPct).toBe(pourYield({ chargeG: 1000, castingG: 380 }).yieldPct);
    expect(tooHeavy.status).toBe(400);
    expect(tooHeavy.body.error.issues[0].path).toBe('massG');
    expect(removed.status).toBe(204);
    expect(afterRemoval.castings).toEqual([]);
  });

  test('when a mentor touches a mentee’s castings, then 403; another student gets 404; nothing changes', async () => {
    const crew = await insertWorkshopWithCrew();
    await assignMentor(crew.workshop.id, crew.mentor.id, crew.student.id);
    const other = await insertMember(crew.workshop.id, 'student');
    const heat = await insertHeat({ workshopId: crew.workshop.id, casterId: crew.student.id, castings: [{ massG: 300 }] });
    const [castingId] = (
      await sequelize.query<{ id: string }>('SELECT id FROM castings WHERE heat_id = :heatId', { replacements: { heatId: heat.id }, type: QueryTypes.SELECT })
    ).map((r) => r.id);
    const mentor = await signedIn(crew.mentor);
    const stranger = await signedIn(other);
    const w = `/api/workshops/${crew.workshop.id}`;

    const results = [
      await mentor.post(`${w}/heats/${heat.id}/castings`, { massG: 100 }),
      await mentor.patch(`${w}/castings/${castingId}`, { massG: 200 }),
      await mentor.delete(`${w}/castings/${castingId}`),
      await stranger.patch(`${w}/castings/${castingId}`, { massG: 200 }),
      await stranger.delete(`${w}/castings/${castingId}`),
    ];

    expect(results.map((r) => r.status)).toEqual([403, 403, 403, 404, 404]);
    expect(results[3].body.error.code).toBe('casting-not-found');
    expect(await logRows(crew.workshop.id)).toMatchObject({ castings: 1 });
  });
});

describe('GET /api/workshops/:workshopId/heats/last-defaults', () => {
  test('when the caster has logged heats, then the newest one’s choices come back, without a since-retired crucible', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const w = crew.workshop.id;
    const [furnace, crucible, mould, oldMould] = await Promise.all([insertFurnace(w), insertCrucible(w), insertMould(w), insertMould(w)]);
    await insertHeat({ workshopId: w, casterId: crew.caster.id, pouredAt: '2026-10-01T10:00:00Z', meltStartedAt: null, alloy: '319.0', castings: [{ mouldId: oldMould.id, massG: 200 }] });
    const newest = await insertHeat({
      workshopId: w,
      casterId: crew.caster.id,
      pouredAt: '2026-11-01T10:00:00Z',
      meltStartedAt: null,
      furnaceId: furnace.id,
      crucibleId: crucible.id,
      setpointC: 755,
      fluxKind: 'drossing',
      fluxAmountG: 8,
      degassing: 'argon_lance',
      castings: [{ mouldId: mould.id, massG: 300 }],
    });
    await insertHeat({ workshopId: w, casterId: crew.student.id, pouredAt: '2026-11-05T10:00:00Z', meltStartedAt: null, alloy: '713.0' });
    const caster = await signedIn(crew.caster);

    // Act
    const before = await caster.get(`/api/workshops/${w}/heats/last-defaults`);
    await caster.patch(`/api/workshops/${w}/crucibles/${crucible.id}`, { retired: true });
    const after = await caster.get(`/api/workshops/${w}/heats/last-defaults`);

    // Assert
    expect(before.body).toEqual({
      basedOnHeatId: newest.id,
      alloy: 'A356.0',
      furnaceId: furnace.id,
      crucibleId: crucible.id,
      setpointC: 755,
      fluxKind: 'drossing',
      fluxAmountG: 8,
      degassing: 'argon_lance',
      mouldId: mould.id,
    });
    expect(after.body.crucibleId).toBeNull();
  });

  test('when the caster has no heats, then every default is empty; a student may not read another member’s', async () => {
    const crew = await insertWorkshopWithCrew();
    const student = await signedIn(crew.student);

    const own = await student.get(`/api/workshops/${crew.workshop.id}/heats/last-defaults`);
    const others = await student.get(`/api/workshops/${crew.workshop.id}/heats/last-defaults?casterId=${crew.caster.id}`);

    expect(own.body).toEqual({
      basedOnHeatId: null,
      alloy: null,
      furnaceId: null,
      crucibleId: null,
      setpointC: null,
      fluxKind: null,
      fluxAmountG: null,
      degassing: null,
      mouldId: null,
    });
    expect(others.status).toBe(403);
  });
});

describe('GET /api/workshops/:workshopId/furnaces/:furnaceId/setpoint', () => {
  test('when the furnace has history, then the suggestion is suggestSetpoint over its newest 30 heats with both readings', async () => {
    // Arrange: 32 heats whose two oldest read far hot, one heat without a pour reading, one on another furnace.
    const crew = await insertWorkshopWithCrew();
    const w = crew.workshop.id;
    const [furnace, otherFurnace] = await Promise.all([insertFurnace(w), insertFurnace(w)]);
    const history: { setpointC: number; measuredC: number }[] = [];
    for (let i = 0; i < 32; i++) {
      const offset = i < 2 ? 200 : -10 - (i - 2);
      await insertHeat({ workshopId: w, casterId: i % 2 ? crew.caster.id : crew.student.id, furnaceId: furnace.id, setpointC: 750, pourTempC: 750 + offset, pouredAt: at('2026-09-01T10:00:00Z', i * 60 * 24), meltStartedAt: null });
      if (i >= 2) history.push({ setpointC: 750, measuredC: 750 + offset });
    }
    await insertHeat({ workshopId: w, casterId: crew.caster.id, furnaceId: furnace.id, setpointC: 750, pourTempC: null });
    await insertHeat({ workshopId: w, casterId: crew.caster.id, furnaceId: otherFurnace.id, setpointC: 700, pourTempC: 800 });
    const student = await signedIn(crew.student);

    // Act
    const res = await student.get(`/api/workshops/${w}/furnaces/${furnace.id}/setpoint?targetC=720`);

    // Assert
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ furnaceId: furnace.id, targetC: 720, ...suggestSetpoint({ targetC: 720, history }) });
    expect(res.body).toMatchObject({ samples: 30, basis: 'history' });
  });

  test('when the furnace has no usable history, then the target itself is suggested and the basis says so', async () => {
    const crew = await insertWorkshopWithCrew();
    const furnace = await insertFurnace(crew.workshop.id);
    const caster = await signedIn(crew.caster);

    const res = await caster.get(`/api/workshops/${crew.workshop.id}/furnaces/${furnace.id}/setpoint?targetC=700`);
    const noTarget = await caster.get(`/api/workshops/${crew.workshop.id}/furnaces/${furnace.id}/setpoint`);

    expect(res.body).toEqual({ furnaceId: furnace.id, targetC: 700, setpointC: 700, offsetC: 0, spreadC: 0, samples: 0, basis: 'no-history' });
    expect(noTarget.status).toBe(400);
    expect(noTarget.body.error.issues[0].path).toBe('targetC');
  });
});

describe('GET /api/workshops/:workshopId/moulds/:mouldId/charge-plan', () => {
  test('when the caster has weighed heats, then the plan uses their median yield and the stated margin', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const w = crew.workshop.id;
    const mould = await insertMould(w, { capacityG: 450, capacityAlloy: 'A356.0' });
    const castings = [[500], [300, 200], [650], [400]];
    for (const masses of castings) {
      await insertHeat({ workshopId: w, casterId: crew.caster.id, castings: masses.map((massG) => ({ massG })) });
    }
    await insertHeat({ workshopId: w, casterId: crew.caster.id, castings: [{ massG: 100 }, { massG: null }] });
    await insertHeat({ workshopId: w, casterId: crew.student.id, castings: [{ massG: 950 }] });
    const caster = await signedIn(crew.caster);
    const yields = castings.map((m) => pourYield({ chargeG: 1000, castingG: m.reduce((a, b) => a + b, 0) }).yieldPct);

    // Act
    const res = await caster.get(`/api/workshops/${w}/moulds/${mould.id}/charge-plan`);
    const wider = await caster.get(`/api/workshops/${w}/moulds/${mould.id}/charge-plan?marginPct=25`);

    // Assert
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      mouldId: mould.id,
      casterId: crew.caster.id,
      alloy: 'A356.0',
      castingG: 450,
      expectedYieldPct: median(yields),
      marginPct: 10,
      chargeG: chargeFor({ castingG: 450, expectedYieldPct: median(yields), marginPct: 10 }),
      basis: 'caster-median',
      samples: 4,
    });
    expect(wider.body.chargeG).toBe(chargeFor({ castingG: 450, expectedYieldPct: median(yields), marginPct: 25 }));
  });

  test('when the caster has no weighed heats, then the plan assumes 50 % and says so', async () => {
    const crew = await insertWorkshopWithCrew();
    const mould = await insertMould(crew.workshop.id, { capacityG: 450, capacityAlloy: 'A356.0' });
    const admin = await signedIn(crew.admin);

    const res = await admin.get(`/api/workshops/${crew.workshop.id}/moulds/${mould.id}/charge-plan?casterId=${crew.student.id}`);

    expect(res.body).toMatchObject({
      casterId: crew.student.id,
      expectedYieldPct: 50,
      basis: 'default',
      samples: 0,
      chargeG: chargeFor({ castingG: 450, expectedYieldPct: 50, marginPct: 10 }),
    });
  });

  test('when planning bronze in a mould measured in aluminium, then the cavity mass scales by density', async () => {
    const crew = await insertWorkshopWithCrew();
    const mould = await insertMould(crew.workshop.id, { capacityG: 450, capacityAlloy: 'A356.0' });
    const caster = await signedIn(crew.caster);

    const res = await caster.get(`/api/workshops/${crew.workshop.id}/moulds/${mould.id}/charge-plan?alloy=C83600`);

    const castingG = (450 * findAlloy('C83600')!.densityGcm3) / findAlloy('A356.0')!.densityGcm3;
    expect(res.body).toMatchObject({ alloy: 'C83600', castingG, chargeG: chargeFor({ castingG, expectedYieldPct: 50, marginPct: 10 }) });
  });

  test('when the mould has no capacity or the caster is someone else’s, then 422 or 403', async () => {
    const crew = await insertWorkshopWithCrew();
    const [blank, mould] = await Promise.all([
      insertMould(crew.workshop.id, { capacityG: null, capacityAlloy: null }),
      insertMould(crew.workshop.id),
    ]);
    const student = await signedIn(crew.student);

    const noCapacity = await student.get(`/api/workshops/${crew.workshop.id}/moulds/${blank.id}/charge-plan`);
    const others = await student.get(`/api/workshops/${crew.workshop.id}/moulds/${mould.id}/charge-plan?casterId=${crew.caster.id}`);

    expect(noCapacity.status).toBe(422);
    expect(noCapacity.body.error.code).toBe('mould-capacity-unknown');
    expect(others.status).toBe(403);
  });
});
