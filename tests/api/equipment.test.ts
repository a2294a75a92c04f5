import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { DEFAULT_CRUCIBLE_CYCLE_LIMITS } from '../../shared/heats/crucible-life.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertCrucible, insertFurnace, insertHeat, insertMould } from '../factories/heats.ts';
import { insertWorkshopWithCrew } from '../factories/people.ts';
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

async function countRows(table: string, workshopId: string): Promise<number> {
  const [row] = await sequelize.query<{ n: number }>(`SELECT count(*)::int AS n FROM ${table} WHERE workshop_id = :workshopId`, {
    replacements: { workshopId },
    type: QueryTypes.SELECT,
  });
  return row.n;
}

const today = () => new Date().toISOString().slice(0, 10);

describe('/api/workshops/:workshopId/furnaces', () => {
  test('when a caster creates, renames and deletes an unused furnace, then each step answers and the list follows', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);
    const url = `/api/workshops/${crew.workshop.id}/furnaces`;

    // Act
    const created = await caster.post(url, { name: 'Kiln conversion', kind: 'electric', notes: 'lid seal replaced' });
    const renamed = await caster.patch(`${url}/${created.body.id}`, { name: 'Kiln No. 2' });
    const read = await caster.get(`${url}/${created.body.id}`);
    const listed = await caster.get(url);
    const deleted = await caster.delete(`${url}/${created.body.id}`);
    const afterDelete = await caster.get(`${url}/${created.body.id}`);

    // Assert
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Kiln conversion', kind: 'electric', notes: 'lid seal replaced', heatCount: 0 });
    expect(renamed.status).toBe(200);
    expect(read.body).toMatchObject({ name: 'Kiln No. 2', kind: 'electric', notes: 'lid seal replaced' });
    expect(listed.body.map((f: { id: string }) => f.id)).toEqual([created.body.id]);
    expect(deleted.status).toBe(204);
    expect(afterDelete.status).toBe(404);
    expect(afterDelete.body.error.code).toBe('furnace-not-found');
  });

  test.each(['student', 'mentor'] as const)('when a %s tries to add a furnace, then 403 and nothing is written', async (role) => {
    const crew = await insertWorkshopWithCrew();
    const member = await signedIn(crew[role]);

    const res = await member.post(`/api/workshops/${crew.workshop.id}/furnaces`, { name: 'Mine', kind: 'gas' });

    expect(res.status).toBe(403);
    expect(await countRows('furnaces', crew.workshop.id)).toBe(0);
  });

  test('when a student reads the furnaces, then they see them (every member reads equipment)', async () => {
    const crew = await insertWorkshopWithCrew();
    const furnace = await insertFurnace(crew.workshop.id, { name: 'Propane tower', kind: 'gas' });
    const student = await signedIn(crew.student);

    const res = await student.get(`/api/workshops/${crew.workshop.id}/furnaces`);

    expect(res.status).toBe(200);
    expect(res.body).toEqual([expect.objectContaining({ id: furnace.id, name: 'Propane tower', kind: 'gas' })]);
  });

  test('when the body is wrong, then 400 names each field and nothing is written', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);

    const res = await admin.post(`/api/workshops/${crew.workshop.id}/furnaces`, { name: '', kind: 'plasma' });

    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation-failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['kind', 'name']);
    expect(await countRows('furnaces', crew.workshop.id)).toBe(0);
  });

  test('when a furnace has heats, then deleting it answers 409 and it stays', async () => {
    const crew = await insertWorkshopWithCrew();
    const furnace = await insertFurnace(crew.workshop.id);
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, furnaceId: furnace.id });
    const admin = await signedIn(crew.admin);

    const res = await admin.delete(`/api/workshops/${crew.workshop.id}/furnaces/${furnace.id}`);

    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('equipment-in-use');
    expect(res.body.error.message).toMatch(/1 heat/);
    expect(await countRows('furnaces', crew.workshop.id)).toBe(1);
  });
});

describe('/api/workshops/:workshopId/crucibles', () => {
  test('when a caster adds a crucible, then it reads back with no cycles, the default limits and status ok', async () => {
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);

    const created = await caster.post(`/api/workshops/${crew.workshop.id}/crucibles`, {
      name: 'A6 clay-graphite',
      material: 'clay_graphite',
      capacityG: 2500,
      inServiceSince: '2026-10-01',
    });

    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      name: 'A6 clay-graphite',
      material: 'clay_graphite',
      capacityG: 2500,
      inServiceSince: '2026-10-01',
      retired: false,
      retiredOn: null,
      cycleCount: 0,
      warnAt: DEFAULT_CRUCIBLE_CYCLE_LIMITS.warnAt,
      limitAt: DEFAULT_CRUCIBLE_CYCLE_LIMITS.limitAt,
      status: 'ok',
      lastShock: null,
      notes: [],
    });
  });

  test('when heats use a crucible, then its cycle count rises with each and the status flips at 15 and at 20', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const crucible = await insertCrucible(crew.workshop.id, { material: 'clay_graphite' });
    const student = await signedIn(crew.student);
    const url = `/api/workshops/${crew.workshop.id}/crucibles/${crucible.id}`;
    const seen: { cycleCount: number; status: string }[] = [];

    // Act
    for (let i = 1; i <= 20; i++) {
      await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, crucibleId: crucible.id });
      if ([1, 14, 15, 19, 20].includes(i)) {
        const { cycleCount, status } = (await student.get(url)).body;
        seen.push({ cycleCount, status });
      }
    }

    // Assert
    expect(seen).toEqual([
      { cycleCount: 1, status: 'ok' },
      { cycleCount: 14, status: 'ok' },
      { cycleCount: 15, status: 'near-limit' },
      { cycleCount: 19, status: 'near-limit' },
      { cycleCount: 20, status: 'past-limit' },
    ]);
  });

  test('when the workshop sets its own limits for a material, then crucibles of it use them and others keep the defaults', async () => {
    const crew = await insertWorkshopWithCrew();
    const clay = await insertCrucible(crew.workshop.id, { material: 'clay_graphite' });
    const sic = await insertCrucible(crew.workshop.id, { material: 'silicon_carbide' });
    for (let i = 0; i < 3; i++) {
      await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, crucibleId: clay.id });
      await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, crucibleId: sic.id });
    }
    const caster = await signedIn(crew.caster);

    const put = await caster.send('put', `/api/workshops/${crew.workshop.id}/crucible-limits`, {
      limits: [{ material: 'clay_graphite', warnAt: 2, limitAt: 4 }],
    });
    const list = await caster.get(`/api/workshops/${crew.workshop.id}/crucibles`);

    expect(put.status).toBe(200);
    expect(put.body).toContainEqual({ material: 'clay_graphite', warnAt: 2, limitAt: 4, isDefault: false });
    expect(put.body).toContainEqual({ material: 'silicon_carbide', warnAt: 15, limitAt: 20, isDefault: true });
    const byId = Object.fromEntries(list.body.map((c: { id: string }) => [c.id, c]));
    expect(byId[clay.id]).toMatchObject({ cycleCount: 3, warnAt: 2, limitAt: 4, status: 'near-limit' });
    expect(byId[sic.id]).toMatchObject({ cycleCount: 3, warnAt: 15, limitAt: 20, status: 'ok' });
  });

  test('when the limits are put again without a material, then that material goes back to the defaults', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);
    const url = `/api/workshops/${crew.workshop.id}/crucible-limits`;
    await admin.send('put', url, { limits: [{ material: 'steel', warnAt: 40, limitAt: 60 }] });

    const reset = await admin.send('put', url, { limits: [] });
    const read = await admin.get(url);

    expect(reset.status).toBe(200);
    expect(read.body.find((l: { material: string }) => l.material === 'steel')).toEqual({ material: 'steel', warnAt: 15, limitAt: 20, isDefault: true });
  });

  test('when limits are out of order or a student sets them, then 400 or 403 and the defaults stay', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);
    const student = await signedIn(crew.student);
    const url = `/api/workshops/${crew.workshop.id}/crucible-limits`;

    const backwards = await admin.send('put', url, { limits: [{ material: 'steel', warnAt: 30, limitAt: 10 }] });
    const byStudent = await student.send('put', url, { limits: [{ material: 'steel', warnAt: 5, limitAt: 10 }] });

    expect(backwards.status).toBe(400);
    expect(backwards.body.error.issues[0].path).toBe('limits.0.warnAt');
    expect(byStudent.status).toBe(403);
    expect(await countRows('crucible_cycle_limits', crew.workshop.id)).toBe(0);
  });

  test('when a student notes a crack, then the crucible reads the note with its day and author, newest first', async () => {
    const crew = await insertWorkshopWithCrew();
    const crucible = await insertCrucible(crew.workshop.id);
    const student = await signedIn(crew.student);
    const url = `/api/workshops/${crew.workshop.id}/crucibles/${crucible.id}`;

    const first = await student.post(`${url}/notes`, { note: 'Glaze flaking at the rim', notedOn: '2026-11-02' });
    const second = await student.post(`${url}/notes`, { note: 'Hairline crack below the pouring lip' });
    const read = await student.get(url);

    expect(first.status).toBe(201);
    expect(second.body).toMatchObject({ note: 'Hairline crack below the pouring lip', notedOn: today(), authorId: crew.student.id });
    expect(read.body.notes.map((n: { note: string }) => n.note)).toEqual(['Hairline crack below the pouring lip', 'Glaze flaking at the rim']);
    expect(read.body.notes[0].authorName).toBe(crew.student.displayName);
  });

  test('when a used crucible is deleted, then 409 suggests retiring; retiring stamps today and shows status retired', async () => {
    const crew = await insertWorkshopWithCrew();
    const crucible = await insertCrucible(crew.workshop.id);
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, crucibleId: crucible.id });
    const caster = await signedIn(crew.caster);
    const url = `/api/workshops/${crew.workshop.id}/crucibles/${crucible.id}`;

    const deleted = await caster.delete(url);
    const retired = await caster.patch(url, { retired: true });
    const back = await caster.patch(url, { retired: false });

    expect(deleted.status).toBe(409);
    expect(deleted.body.error.message).toMatch(/retire/i);
    expect(retired.body).toMatchObject({ retired: true, retiredOn: today(), status: 'retired', cycleCount: 1 });
    expect(back.body).toMatchObject({ retired: false, retiredOn: null, status: 'ok' });
  });

  test('when an unused crucible is deleted, then 204 and it is gone', async () => {
    const crew = await insertWorkshopWithCrew();
    const crucible = await insertCrucible(crew.workshop.id);
    const admin = await signedIn(crew.admin);

    const res = await admin.delete(`/api/workshops/${crew.workshop.id}/crucibles/${crucible.id}`);

    expect(res.status).toBe(204);
    expect(await countRows('crucibles', crew.workshop.id)).toBe(0);
  });

  test('when a heat quenched the crucible, then the crucible read shows that latest shock', async () => {
    const crew = await insertWorkshopWithCrew();
    const crucible = await insertCrucible(crew.workshop.id);
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, crucibleId: crucible.id, crucibleShock: 'fast_heat_up', pouredAt: '2026-11-01T10:00:00Z', meltStartedAt: null });
    const quench = await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, crucibleId: crucible.id, crucibleShock: 'quenched', pouredAt: '2026-11-03T10:00:00Z', meltStartedAt: null });
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, crucibleId: crucible.id, pouredAt: '2026-11-05T10:00:00Z', meltStartedAt: null });
    const student = await signedIn(crew.student);

    const res = await student.get(`/api/workshops/${crew.workshop.id}/crucibles/${crucible.id}`);

    expect(res.body.lastShock).toEqual({ heatId: quench.id, kind: 'quenched', pouredAt: '2026-11-03T10:00:00.000Z' });
    expect(res.body.cycleCount).toBe(3);
  });
});

describe('/api/workshops/:workshopId/moulds', () => {
  test('when a caster adds, edits and deletes an unused mould, then the alloy is stored in its library spelling', async () => {
    const crew = await insertWorkshopWithCrew();
    const caster = await signedIn(crew.caster);
    const url = `/api/workshops/${crew.workshop.id}/moulds`;

    const created = await caster.post(url, {
      name: 'Ingot tray',
      material: 'cast_iron',
      capacityG: 900,
      capacityAlloy: 'a356',
      hasRiser: false,
      coating: 'soot',
    });
    const edited = await caster.patch(`${url}/${created.body.id}`, { coating: 'boron nitride', hasRiser: true });
    const deleted = await caster.delete(`${url}/${created.body.id}`);

    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ material: 'cast_iron', capacityG: 900, capacityAlloy: 'A356.0', hasRiser: false, coating: 'soot', castingCount: 0 });
    expect(edited.body).toMatchObject({ coating: 'boron nitride', hasRiser: true, capacityAlloy: 'A356.0' });
    expect(deleted.status).toBe(204);
  });

  test('when the alloy or material is unknown, then 400 names them and nothing is written', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);

    const res = await admin.post(`/api/workshops/${crew.workshop.id}/moulds`, { name: 'Odd', material: 'ice', capacityAlloy: 'unobtainium' });

    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['capacityAlloy', 'material']);
    expect(await countRows('moulds', crew.workshop.id)).toBe(0);
  });

  test('when a mould has castings, then deleting it answers 409 and it stays', async () => {
    const crew = await insertWorkshopWithCrew();
    const mould = await insertMould(crew.workshop.id);
    await insertHeat({ workshopId: crew.workshop.id, casterId: crew.caster.id, castings: [{ mouldId: mould.id, massG: 400 }] });
    const admin = await signedIn(crew.admin);

    const res = await admin.delete(`/api/workshops/${crew.workshop.id}/moulds/${mould.id}`);
    const read = await admin.get(`/api/workshops/${crew.workshop.id}/moulds/${mould.id}`);

    expect(res.status).toBe(409);
    expect(read.body.castingCount).toBe(1);
  });
});

describe('/api/workshops/:workshopId/{furnaces,crucibles,moulds}/:id across workshops', () => {
  test('when a member asks for another workshop’s equipment, then 404 as if it did not exist', async () => {
    const crew = await insertWorkshopWithCrew();
    const elsewhere = await insertWorkshopWithCrew();
    const [furnace, crucible, mould] = await Promise.all([
      insertFurnace(elsewhere.workshop.id),
      insertCrucible(elsewhere.workshop.id),
      insertMould(elsewhere.workshop.id),
    ]);
    const admin = await signedIn(crew.admin);
    const own = `/api/workshops/${crew.workshop.id}`;

    const calls = await Promise.all([
      admin.get(`${own}/furnaces/${furnace.id}`),
      admin.patch(`${own}/furnaces/${furnace.id}`, { name: 'Taken' }),
      admin.delete(`${own}/crucibles/${crucible.id}`),
      admin.post(`${own}/crucibles/${crucible.id}/notes`, { note: 'mine now' }),
      admin.get(`${own}/moulds/${mould.id}`),
      admin.get(`/api/workshops/${elsewhere.workshop.id}/furnaces`),
    ]);

    expect(calls.map((r) => r.status)).toEqual([404, 404, 404, 404, 404, 404]);
    expect((await admin.get(`${own}/furnaces`)).body).toEqual([]);
  });
});
