import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { insertMember, insertUser, insertWorkshopWithCrew } from '../factories/people.ts';
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

describe('POST /api/workshops', () => {
  test('when a signed-in user creates a workshop, then they are its admin and it is listed', async () => {
    const user = await insertUser();
    const b = await signedIn(user);

    const created = await b.post('/api/workshops', { name: 'Tuesday bronze group', kind: 'school' });
    const list = await b.get('/api/workshops');

    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Tuesday bronze group', kind: 'school', role: 'admin', memberCount: 1 });
    expect(list.body.map((w: { id: string }) => w.id)).toContain(created.body.id);
  });

  test('when nobody is signed in, then 401', async () => {
    const b = await browser(t.app);
    expect((await b.get('/api/workshops')).status).toBe(401);
    expect((await b.post('/api/workshops', { name: 'Nope' })).status).toBe(401);
  });
});

describe('members of a workshop', () => {
  test('when any member lists members, then they see each role; mentor assignments show on students', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);
    await admin.post(`/api/workshops/${crew.workshop.id}/members`, { userId: crew.student.id, mentorIds: [crew.mentor.id] });
    const student = await signedIn(crew.student);

    const res = await student.get(`/api/workshops/${crew.workshop.id}/members`);

    expect(res.status).toBe(200);
    const byId = Object.fromEntries(res.body.map((m: { userId: string }) => [m.userId, m]));
    expect(byId[crew.admin.id].role).toBe('admin');
    expect(byId[crew.student.id].mentorIds).toEqual([crew.mentor.id]);
  });

  test.each(['student', 'caster', 'mentor'] as const)(
    'when a %s tries to change a role, then 403 and the role stays',
    async (role) => {
      const crew = await insertWorkshopWithCrew();
      const actor = await signedIn(crew[role]);

      const res = await actor.post(`/api/workshops/${crew.workshop.id}/members`, { userId: crew.caster.id, role: 'admin' });

      expect(res.status).toBe(403);
      const members = (await actor.get(`/api/workshops/${crew.workshop.id}/members`)).body;
      expect(members.find((m: { userId: string }) => m.userId === crew.caster.id).role).toBe('caster');
    },
  );

  test('when the admin changes a role, then it is saved; the last admin cannot step down', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);

    const promoted = await admin.post(`/api/workshops/${crew.workshop.id}/members`, { userId: crew.caster.id, role: 'mentor' });
    const lastAdmin = await admin.post(`/api/workshops/${crew.workshop.id}/members`, { userId: crew.admin.id, role: 'caster' });

    expect(promoted.status).toBe(200);
    expect(promoted.body.role).toBe('mentor');
    expect(lastAdmin.status).toBe(409);
    expect(lastAdmin.body.error.code).toBe('last-admin');
  });

  test('when a mentor list names a non-mentor, then 400 and the assignments stay', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);

    const res = await admin.post(`/api/workshops/${crew.workshop.id}/members`, { userId: crew.student.id, mentorIds: [crew.caster.id] });

    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('not-a-mentor');
  });

  test('when the admin removes a member, then they lose access to the workshop', async () => {
    const crew = await insertWorkshopWithCrew();
    const admin = await signedIn(crew.admin);
    const caster = await signedIn(crew.caster);

    const removed = await admin.delete(`/api/workshops/${crew.workshop.id}/members/${crew.caster.id}`);

    expect(removed.status).toBe(204);
    expect((await caster.get(`/api/workshops/${crew.workshop.id}/members`)).status).toBe(404);
  });
});

describe('workshop isolation', () => {
  test('when a member of another workshop calls any of its routes, then 404 that looks like a missing workshop', async () => {
    const crew = await insertWorkshopWithCrew();
    const elsewhere = await insertWorkshopWithCrew();
    const outsider = await signedIn(elsewhere.admin);
    const id = crew.workshop.id;

    const calls = await Promise.all([
      outsider.get(`/api/workshops/${id}/members`),
      outsider.post(`/api/workshops/${id}/members`, { userId: crew.caster.id, role: 'admin' }),
      outsider.delete(`/api/workshops/${id}/members/${crew.caster.id}`),
      outsider.get(`/api/workshops/${id}/invitations`),
      outsider.post(`/api/workshops/${id}/invitations`, { email: 'x@example.test', role: 'admin' }),
    ]);
    const missing = await outsider.get(`/api/workshops/00000000-0000-4000-8000-000000000000/members`);

    for (const res of calls) {
      expect(res.status).toBe(404);
      expect(res.body).toEqual(missing.body);
    }
    const members = (await (await signedIn(crew.admin)).get(`/api/workshops/${id}/members`)).body;
    expect(members.find((m: { userId: string }) => m.userId === crew.caster.id).role).toBe('caster');
  });

  test('when the workshop id is not a uuid, then 400 names the parameter', async () => {
    const user = await insertMember((await insertWorkshopWithCrew()).workshop.id, 'caster');
    const b = await signedIn(user);

    const res = await b.get('/api/workshops/not-a-uuid/members');

    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('workshopId');
  });
});
