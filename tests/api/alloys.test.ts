import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { ALLOYS, findAlloy } from '../../shared/domain/index.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertMember, insertWorkshopWithCrew } from '../factories/people.ts';
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

async function storedRows(workshopId: string) {
  return sequelize.query<{ designation: string; designation_key: string; source_note: string; data: { liquidusC: number } }>(
    `SELECT designation, designation_key, source_note, data FROM workshop_alloys WHERE workshop_id = :workshopId ORDER BY designation`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
}

const a356 = findAlloy('A356.0')!;
const wheelScrap = { designation: 'Wheel scrap', basedOn: 'A356.0', source: 'Cast alloy wheels; most are A356, assumed so' };
const mysteryBar = {
  designation: 'Bronze bar ends',
  family: 'copper',
  commonName: 'Offcuts from the bearing supplier',
  solidusC: 850,
  liquidusC: 980,
  pourRangeC: { sand: { min: 1070, max: 1200 } },
  densityGcm3: 8.9,
  patternShrinkPct: 1.56,
  source: 'Supplier says SAE 660-ish; values copied from their sheet',
};

describe('/api/workshops/:workshopId/alloys', () => {
  test('when an admin adds, edits and removes a workshop alloy, then each step answers and the library follows', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);
    const url = `/api/workshops/${crew.workshop.id}/alloys`;

    // Act
    const created = await admin.post(url, wheelScrap);
    const listed = await admin.get(url);
    const edited = await admin.patch(`${url}/${created.body.id}`, { liquidusC: 618, pourRangeC: { permanentMould: null } });
    const rowsAfterEdit = await storedRows(crew.workshop.id);
    const deleted = await admin.delete(`${url}/${created.body.id}`);
    const afterDelete = await admin.get(url);
    const editDeleted = await admin.patch(`${url}/${created.body.id}`, { liquidusC: 620 });

    // Assert
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      origin: 'workshop',
      id: expect.any(String),
      createdBy: crew.admin.id,
      createdByName: crew.admin.displayName,
      alloy: {
        designation: 'Wheel scrap',
        basedOn: 'A356.0',
        solidusC: a356.solidusC,
        liquidusC: a356.liquidusC,
        source: wheelScrap.source,
        sources: { solidusLiquidus: a356.sources.solidusLiquidus },
      },
    });
    expect(listed.status).toBe(200);
    expect(listed.body).toHaveLength(ALLOYS.length + 1);
    expect(listed.body.filter((e: { origin: string }) => e.origin === 'library')).toHaveLength(ALLOYS.length);
    expect(listed.body.at(-1)).toMatchObject({ origin: 'workshop', id: created.body.id });
    expect(edited.status).toBe(200);
    expect(edited.body.alloy).toMatchObject({ liquidusC: 618, pourRangeC: { sand: a356.pourRangeC.sand } });
    expect(edited.body.alloy.pourRangeC.permanentMould).toBeUndefined();
    expect(edited.body.alloy.sources.solidusLiquidus).toBeUndefined();
    expect(rowsAfterEdit).toEqual([
      expect.objectContaining({ designation: 'Wheel scrap', designation_key: 'WHEELSCRAP', source_note: wheelScrap.source, data: expect.objectContaining({ liquidusC: 618 }) }),
    ]);
    expect(deleted.status).toBe(204);
    expect(afterDelete.body).toHaveLength(ALLOYS.length);
    expect(editDeleted.status).toBe(404);
    expect(editDeleted.body.error.code).toBe('alloy-not-found');
  });

  test('when a student reads the library, then every library alloy and the workshop’s own come back flagged by origin', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);
    await admin.post(`/api/workshops/${crew.workshop.id}/alloys`, mysteryBar);
    const student = await signedIn(crew.student);

    const res = await student.get(`/api/workshops/${crew.workshop.id}/alloys`);

    expect(res.status).toBe(200);
    expect(res.body.map((e: { alloy: { designation: string } }) => e.alloy.designation)).toEqual([
      ...ALLOYS.map((a) => a.designation),
      'Bronze bar ends',
    ]);
    expect(res.body[0]).toMatchObject({ origin: 'library', id: null, createdBy: null });
    expect(res.body.at(-1)).toMatchObject({
      origin: 'workshop',
      alloy: { family: 'copper', liquidusC: 980, pourRangeC: { sand: { min: 1070, max: 1200 } }, sources: {} },
    });
  });

  test.each(['student', 'caster', 'mentor'] as const)('when a %s tries to add, edit or delete a workshop alloy, then 403 and nothing changes', async (role) => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);
    const existing = await admin.post(`/api/workshops/${crew.workshop.id}/alloys`, wheelScrap);
    const member = await signedIn(crew[role]);
    const url = `/api/workshops/${crew.workshop.id}/alloys`;

    // Act
    const created = await member.post(url, { ...mysteryBar, designation: 'Mine' });
    const edited = await member.patch(`${url}/${existing.body.id}`, { liquidusC: 700 });
    const deleted = await member.delete(`${url}/${existing.body.id}`);

    // Assert
    for (const res of [created, edited, deleted]) {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    expect(await storedRows(crew.workshop.id)).toEqual([expect.objectContaining({ designation: 'Wheel scrap', data: expect.objectContaining({ liquidusC: a356.liquidusC }) })]);
  });

  test('when an admin of another workshop reaches for this workshop’s alloy, then it is 404 as if it did not exist', async () => {
    // Arrange
    const home = await insertWorkshopWithCrew();
    const other = await insertWorkshopWithCrew();
    const homeAdmin = await signedIn(home.admin);
    const alloy = await homeAdmin.post(`/api/workshops/${home.workshop.id}/alloys`, wheelScrap);
    const otherAdmin = await signedIn(other.admin);

    // Act
    const readHome = await otherAdmin.get(`/api/workshops/${home.workshop.id}/alloys`);
    const editViaOwn = await otherAdmin.patch(`/api/workshops/${other.workshop.id}/alloys/${alloy.body.id}`, { liquidusC: 700 });
    const deleteViaOwn = await otherAdmin.delete(`/api/workshops/${other.workshop.id}/alloys/${alloy.body.id}`);
    const editHome = await otherAdmin.patch(`/api/workshops/${home.workshop.id}/alloys/${alloy.body.id}`, { liquidusC: 700 });

    // Assert
    expect(readHome.status).toBe(404);
    expect(readHome.body.error.code).toBe('workshop-not-found');
    expect(editViaOwn.status).toBe(404);
    expect(editViaOwn.body.error.code).toBe('alloy-not-found');
    expect(deleteViaOwn.status).toBe(404);
    expect(editHome.status).toBe(404);
    expect(await storedRows(home.workshop.id)).toHaveLength(1);
  });

  test('when the body is wrong, then 400 names each field and nothing is written', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);

    const res = await admin.post(`/api/workshops/${crew.workshop.id}/alloys`, {
      designation: '',
      family: 'plastic',
      solidusC: 'hot',
      liquidusC: 5000,
      densityGcm3: -1,
      source: '',
    });

    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation-failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'densityGcm3',
      'designation',
      'family',
      'liquidusC',
      'solidusC',
      'source',
    ]);
    expect(await storedRows(crew.workshop.id)).toEqual([]);
  });

  test('when the values make no sound alloy (solidus above liquidus, pour below it), then 400 names those fields', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);

    const res = await admin.post(`/api/workshops/${crew.workshop.id}/alloys`, {
      ...mysteryBar,
      solidusC: 1000,
      liquidusC: 980,
      pourRangeC: { sand: { min: 900, max: 950 } },
    });

    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['pourRangeC', 'solidusC']);
    expect(await storedRows(crew.workshop.id)).toEqual([]);
  });

  test.each(['A356', 'a356.0', 'Almag 35', 'zamak3'])('when the designation "%s" is a library alloy’s, then 409 and nothing is written', async (designation) => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);

    const res = await admin.post(`/api/workshops/${crew.workshop.id}/alloys`, { ...wheelScrap, designation });

    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('alloy-in-library');
    expect(await storedRows(crew.workshop.id)).toEqual([]);
  });

  test('when an admin repeats a workshop designation or renames onto one, then 409; another workshop may use it', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);
    const url = `/api/workshops/${crew.workshop.id}/alloys`;
    await admin.post(url, wheelScrap);
    const second = await admin.post(url, mysteryBar);
    const otherWorkshop = await insertWorkshopWithCrew();
    const otherAdmin = await signedIn(otherWorkshop.admin);

    // Act
    const repeated = await admin.post(url, { ...wheelScrap, designation: 'wheel-scrap' });
    const renamed = await admin.patch(`${url}/${second.body.id}`, { designation: 'WHEEL SCRAP' });
    const renamedToLibrary = await admin.patch(`${url}/${second.body.id}`, { designation: 'C93200' });
    const elsewhere = await otherAdmin.post(`/api/workshops/${otherWorkshop.workshop.id}/alloys`, wheelScrap);

    // Assert
    expect(repeated.status).toBe(409);
    expect(repeated.body.error.code).toBe('alloy-designation-taken');
    expect(renamed.status).toBe(409);
    expect(renamed.body.error.code).toBe('alloy-designation-taken');
    expect(renamedToLibrary.status).toBe(409);
    expect(renamedToLibrary.body.error.code).toBe('alloy-in-library');
    expect(elsewhere.status).toBe(201);
    expect((await storedRows(crew.workshop.id)).map((r) => r.designation)).toEqual(['Bronze bar ends', 'Wheel scrap']);
  });

  test('when a new admin edits an alloy another admin added, then it saves and keeps who added it', async () => {
    const crew = await insertWorkshopWithCrew();
    const first = await signedIn(crew.admin);
    const created = await first.post(`/api/workshops/${crew.workshop.id}/alloys`, mysteryBar);
    const secondAdmin = await insertMember(crew.workshop.id, 'admin');
    const second = await signedIn(secondAdmin);

    const res = await second.patch(`/api/workshops/${crew.workshop.id}/alloys/${created.body.id}`, {
      source: 'Checked against the supplier’s certificate',
      patternShrinkPct: null,
    });

    expect(res.status).toBe(200);
    expect(res.body.createdBy).toBe(crew.admin.id);
    expect(res.body.alloy.source).toBe('Checked against the supplier’s certificate');
    expect(res.body.alloy.patternShrinkPct).toBeUndefined();
    expect((await storedRows(crew.workshop.id))[0].source_note).toBe('Checked against the supplier’s certificate');
  });
});
