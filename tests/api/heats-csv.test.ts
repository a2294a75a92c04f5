import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { parseCsv } from '../../shared/heats/csv.ts';
import { HEAT_CSV_COLUMNS } from '../../shared/heats/heat-csv.ts';
import type { HeatDetail } from '../../shared/heats/heat-schemas.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { buildHeat, insertCrucible, insertFurnace, insertHeat, insertMould } from '../factories/heats.ts';
import { insertWorkshopWithCrew } from '../factories/people.ts';
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

async function logRows(workshopId: string) {
  const [row] = await sequelize.query<{ heats: number; lines: number; castings: number }>(
    `SELECT (SELECT count(*)::int FROM heats WHERE workshop_id = :workshopId) AS heats,
            (SELECT count(*)::int FROM heat_charge_lines l JOIN heats h ON h.id = l.heat_id WHERE h.workshop_id = :workshopId) AS lines,
            (SELECT count(*)::int FROM castings WHERE workshop_id = :workshopId) AS castings`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
  return row;
}

/** The export as text (supertest leaves text/csv as a string). */
async function exportText(b: Browser, workshopId: string, query = ''): Promise<{ status: number; text: string; headers: Record<string, string> }> {
  const res = await b.agent.get(`/api/workshops/${workshopId}/heats.csv${query}`).buffer(true);
  return { status: res.status, text: res.text, headers: res.headers as Record<string, string> };
}

/** Records of an export keyed by column. */
function rowsOf(text: string): Record<string, string>[] {
  const [header, ...rows] = parseCsv(text);
  return rows.map((r) => Object.fromEntries(header.cells.map((h, i) => [h, r.cells[i]])));
}

describe('GET /api/workshops/:workshopId/heats.csv', () => {
  test('when a caster exports, then the stable header and one row per heat with lines and castings flattened', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const w = crew.workshop.id;
    const [furnace, mould] = await Promise.all([insertFurnace(w, { name: 'Tower' }), insertMould(w, { name: 'Ingot tray' })]);
    await insertHeat({
      workshopId: w,
      casterId: crew.caster.id,
      furnaceId: furnace.id,
      pouredAt: '2026-11-21T18:00:00Z',
      chargeLines: [
        { kind: 'ingot', massG: 800, description: 'A356 ingot' },
        { kind: 'clean_scrap', massG: 400, description: 'wheel offcuts' },
      ],
      castings: [{ mouldId: mould.id, massG: 420, mouldPreheatC: 250, quenchMedium: 'water', airCoolMin: 3 }, { massG: 300 }],
    });
    await insertHeat({ workshopId: w, casterId: crew.student.id });
    const caster = await signedIn(crew.caster);

    // Act
    const res = await exportText(caster, w);

    // Assert
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="heats-\d{4}-\d{2}-\d{2}\.csv"$/);
    expect(res.text.startsWith('\uFEFF')).toBe(true);
    expect(res.text.includes('\r\n')).toBe(true);
    expect(parseCsv(res.text)[0].cells).toEqual([...HEAT_CSV_COLUMNS]);
    const rows = rowsOf(res.text);
    expect(rows).toHaveLength(1); // the student's heat is not the caster's to read
    expect(rows[0]).toMatchObject({
      poured_at: '2026-11-21T18:00:00.000Z',
      caster_id: crew.caster.id,
      alloy: 'A356.0',
      furnace_id: furnace.id,
      furnace: 'Tower',
      pour_temp_c: '720',
      charge_lines: 'ingot:800:A356 ingot|clean_scrap:400:wheel offcuts',
      charge_g: '1200',
      castings: `mass_g=420;mould_id=${mould.id};mould=Ingot tray;mould_preheat_c=250;air_cool_min=3;quench=water|mass_g=300;quench=none`,
      casting_count: '2',
      castings_g: '720',
      yield_pct: '60',
      safety_ppe: 'true',
    });
  });

  test('when cells start with = + - @, then they are escaped against spreadsheet formulas; negative numbers stay numbers', async () => {
    const crew = await insertWorkshopWithCrew();
    await insertHeat({
      workshopId: crew.workshop.id,
      casterId: crew.caster.id,
      notes: '=HYPERLINK("http://example.test","click")',
      ambientTempC: -5,
      chargeLines: [{ kind: 'ingot', massG: 900, description: '@grabbed from bin' }],
    });
    const caster = await signedIn(crew.caster);

    const res = await exportText(caster, crew.workshop.id);

    const [row] = rowsOf(res.text);
    expect(row.notes).toBe(`'=HYPERLINK("http://example.test","click")`);
    expect(res.text).toContain(`"'=HYPERLINK(""http://example.test"",""click"")"`);
    expect(row.ambient_temp_c).toBe('-5');
    // Inside a list cell the formula character is not at the cell's start, so nothing to escape.
    expect(row.charge_lines).toBe('ingot:900:@grabbed from bin');
  });

  test('when the export is filtered, then it holds the same heats as the list with those filters', async () => {
    const crew = await insertWorkshopWithCrew();
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, alloy: '319.0' });
    const a356 = await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, alloy: 'A356.0' });
    const admin = await signedIn(crew.admin);

    const res = await exportText(admin, crew.workshop.id, '?alloy=A356.0');
    const bad = await exportText(admin, crew.workshop.id, '?sort=colour');

    expect(rowsOf(res.text).map((r) => r.heat_id)).toEqual([a356.id]);
    expect(bad.status).toBe(400);
  });
});

/** A heat read without what a re-import rightly changes: ids, timestamps and crucible counts. */
function comparable(h: HeatDetail) {
  return {
    ...h,
    id: undefined,
    createdAt: undefined,
    updatedAt: undefined,
    crucible: h.crucible && { ...h.crucible, cycleCount: undefined, status: undefined },
    figures: { ...h.figures, crucibleCycle: undefined },
    conditions: { ...h.conditions, crucibleCycles: undefined },
    cautions: h.cautions.filter((c) => c.id !== 'crucible_near_limit' && c.id !== 'crucible_past_limit'),
    castings: h.castings.map((k) => ({
      ...k,
      id: undefined,
      heatId: undefined,
      createdAt: undefined,
      updatedAt: undefined,
      conditions: { ...k.conditions, crucibleCycles: undefined },
    })),
  };
}

describe('POST /api/workshops/:workshopId/heats/import', () => {
  test('when an export is imported back, then the new heats equal the originals field for field', async () => {
    // Arrange: awkward text on purpose (commas, quotes, line breaks, list separators, formula starts).
    const crew = await insertWorkshopWithCrew();
    const w = crew.workshop.id;
    const [furnace, crucible, mould] = await Promise.all([
      insertFurnace(w, { name: 'Tower, propane' }),
      insertCrucible(w, { name: 'A8 "big" pot' }),
      insertMould(w, { name: 'Tray: 2|3 cavities', material: 'graphite' }),
    ]);
    const admin = await signedIn(crew.admin);
    const bodies = [
      buildHeat({
        furnaceId: furnace.id,
        crucibleId: crucible.id,
        crucibleShock: 'fast_heat_up',
        notes: 'Windy evening,\nlid left "ajar"; =not a formula',
        chargeLines: [
          { kind: 'ingot', massG: 700.5, description: 'A356; lot 7=good' },
          { kind: 'dirty_scrap', massG: 300, description: 'pistons | rods \\ misc: oily' },
        ],
        castings: [
          { mouldId: mould.id, massG: 410.25, mouldPreheatC: 300, coated: true, vented: false, pourHeightCm: 12.5, sectionThicknessMm: 9, airCoolMin: 4, quenchMedium: 'water', notes: 'gate; cut = ok | keep' },
          { massG: null, quenchMedium: 'other' },
        ],
      }),
      buildHeat({
        casterId: crew.student.id,
        alloy: 'C83600',
        pourTempC: 1150,
        peakTempC: 1170,
        setpointC: null,
        meltStartedAt: null,
        fluxKind: 'borax',
        fluxAmountG: 0,
        degassing: 'none',
        skimmed: false,
        toolsPreheated: null,
        ambientTempC: -3.5,
        relativeHumidityPct: null,
        crucibleRemainderG: 55,
        safety: { dryTools: false, ppe: true, clearFloor: false },
        chargeLines: [{ kind: 'clean_scrap', massG: 2000 }],
      }),
    ];
    const originals: HeatDetail[] = [];
    for (const body of bodies) originals.push((await admin.post(`/api/workshops/${w}/heats`, body)).body);
    const csv = (await exportText(admin, w, '?sort=pouredAt&dir=asc')).text;
    const before = await logRows(w);

    // Act
    const dry = await admin.post(`/api/workshops/${w}/heats/import`, { csv, mapping: {}, dryRun: true });
    const afterDry = await logRows(w);
    const wet = await admin.post(`/api/workshops/${w}/heats/import`, { csv, mapping: {}, dryRun: false });
    const imported: HeatDetail[] = [];
    for (const id of wet.body.heatIds) imported.push((await admin.get(`/api/workshops/${w}/heats/${id}`)).body);

    // Assert
    expect(dry.status).toBe(200);
    expect(dry.body.errors).toEqual([]);
    expect(dry.body.preview.map((p: { row: number }) => p.row)).toEqual([2, 3]);
    expect(afterDry).toEqual(before);
    expect(wet.status).toBe(201);
    expect(wet.body.heatIds).toHaveLength(2);
    const sorted = [...originals].sort((a, b) => a.pouredAt.localeCompare(b.pouredAt));
    expect(imported.map(comparable)).toEqual(sorted.map(comparable));
    expect(await logRows(w)).toEqual({ heats: before.heats * 2, lines: before.lines * 2, castings: before.castings * 2 });
  });

  test('when their columns are mapped onto ours, then the rows become heats in their order', async () => {
    const crew = await insertWorkshopWithCrew();
    const furnace = await insertFurnace(crew.workshop.id, { name: 'Old Faithful' });
    const caster = await signedIn(crew.caster);
    const csv = [
      'Date,Metal,What went in,Pour °C,Oven,Comment',
      '2026-10-02T17:00:00+02:00,a356,ingot:1500,715,old faithful,first try',
      '2026-10-09T17:00:00Z,319,clean_scrap:900:cylinder head|ingot:300,,Old Faithful,',
    ].join('\n');
    const mapping = { poured_at: 'Date', alloy: 'Metal', charge_lines: 'What went in', pour_temp_c: 'Pour °C', furnace: 'Oven', notes: 'Comment' };

    const res = await caster.post(`/api/workshops/${crew.workshop.id}/heats/import`, { csv, mapping, dryRun: false });

    expect(res.status).toBe(201);
    expect(res.body.preview.map((p: { heat: unknown }) => p.heat)).toEqual([
      expect.objectContaining({ pouredAt: '2026-10-02T15:00:00.000Z', alloy: 'A356.0', pourTempC: 715, furnaceId: furnace.id, notes: 'first try', casterId: crew.caster.id }),
      expect.objectContaining({
        alloy: '319.0',
        chargeLines: [
          { kind: 'clean_scrap', massG: 900, description: 'cylinder head' },
          { kind: 'ingot', massG: 300, description: null },
        ],
      }),
    ]);
    expect(await logRows(crew.workshop.id)).toEqual({ heats: 2, lines: 3, castings: 0 });
  });

  test('when some rows are bad, then each is reported with its row and field, nothing is written, and a dry run previews the good ones', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);
    const csv = [
      'poured_at,alloy,charge_lines,pour_temp_c,furnace,castings',
      '2026-10-01T10:00:00Z,A356.0,ingot:1000,720,,mass_g=400',
      '2026-10-02T10:00:00Z,A356.0,ingot:1000,hot,,',
      '2026-10-03T10:00:00Z,A356.0,ingot:1000,720,Nowhere furnace,',
      '2026-10-04T10:00:00Z,A356.0,ingot:1000,720,,mass_g=1400',
      '2026-10-05T10:00:00Z,brass-ish,ore:10,720,,',
    ].join('\r\n');
    const url = `/api/workshops/${crew.workshop.id}/heats/import`;

    // Act
    const wet = await caster.post(url, { csv, mapping: {}, dryRun: false });
    const dry = await caster.post(url, { csv, mapping: {} });

    // Assert
    expect(wet.status).toBe(422);
    expect(wet.body.error.code).toBe('import-rejected');
    expect(wet.body.heatIds).toEqual([]);
    expect(wet.body.errors).toEqual([
      { row: 3, field: 'pour_temp_c', message: expect.stringContaining('"hot" is not a number') },
      { row: 4, field: 'furnace', message: expect.stringContaining('no furnace called "Nowhere furnace"') },
      { row: 5, field: 'castings', message: expect.stringContaining('more than the metal charged') },
      { row: 6, field: 'alloy', message: expect.stringContaining('not an alloy in the library') },
      { row: 6, field: 'charge_lines', message: expect.stringContaining('line 1 kind') },
    ]);
    expect(await logRows(crew.workshop.id)).toEqual({ heats: 0, lines: 0, castings: 0 });
    expect(dry.status).toBe(200);
    expect(dry.body.dryRun).toBe(true);
    expect(dry.body.preview.map((p: { row: number }) => p.row)).toEqual([2]);
    expect(dry.body.errors).toHaveLength(5);
  });

  test('when the CSV is broken or a mapped column is missing, then the error names the row and nothing is written', async () => {
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);
    const url = `/api/workshops/${crew.workshop.id}/heats/import`;

    const broken = await caster.post(url, {
      csv: 'poured_at,alloy,charge_lines,notes\n2026-10-01T10:00:00Z,A356.0,ingot:900,"fine"\n2026-10-02T10:00:00Z,A356.0,ingot:900,"never closed\n',
      dryRun: false,
    });
    const unmapped = await caster.post(url, {
      csv: 'Date,Metal\n2026-10-01T10:00:00Z,A356.0\n',
      mapping: { poured_at: 'Date', alloy: 'Alloy' },
      dryRun: false,
    });

    expect(broken.status).toBe(422);
    expect(broken.body.errors).toEqual([{ row: 3, field: 'csv', message: expect.stringContaining('never closed') }]);
    expect(unmapped.body.errors).toEqual([
      { row: 1, field: 'alloy', message: 'no column "Alloy" in the header row' },
      { row: 1, field: 'charge_lines', message: expect.stringContaining('map a column to charge_lines') },
    ]);
    expect(await logRows(crew.workshop.id)).toEqual({ heats: 0, lines: 0, castings: 0 });
  });

  test('when a student imports a row for someone else, then that row is refused; an admin may', async () => {
    const crew = await insertWorkshopWithCrew();
    const csv = `poured_at,alloy,charge_lines,caster_id\n2026-10-01T10:00:00Z,A356.0,ingot:900,${crew.caster.id}\n`;
    const student = await signedIn(crew.student);
    const admin = await signedIn(crew.admin);
    const url = `/api/workshops/${crew.workshop.id}/heats/import`;

    const byStudent = await student.post(url, { csv, dryRun: false });
    const byAdmin = await admin.post(url, { csv, dryRun: false });

    expect(byStudent.status).toBe(422);
    expect(byStudent.body.errors).toEqual([{ row: 2, field: 'caster_id', message: expect.any(String) }]);
    expect(byAdmin.status).toBe(201);
    expect(byAdmin.body.preview[0].heat.casterId).toBe(crew.caster.id);
  });

  test('when the request body itself is wrong, then 400 names the field', async () => {
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);

    const res = await caster.post(`/api/workshops/${crew.workshop.id}/heats/import`, { csv: '', mapping: { colour: 'x' } });

    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['csv', 'mapping']);
  });
});
