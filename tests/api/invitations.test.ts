import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertUser, insertWorkshopWithCrew, uniqueEmail } from '../factories/people.ts';
import { linkIn, waitForMail } from '../support/mail.ts';
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

async function inviteAndReadToken(workshopId: string, admin: { email: string; password: string }, email: string, role = 'student') {
  const b = await signedIn(admin);
  const res = await b.post(`/api/workshops/${workshopId}/invitations`, { email, role });
  expect(res.status).toBe(201);
  const mail = await waitForMail(email, (m) => m.subject.includes('invited'));
  return { token: linkIn(mail, '/invitations/').split('/invitations/')[1], mail, res };
}

describe('POST /api/workshops/:workshopId/invitations', () => {
  test('when an admin invites a new address, then the mail arrives and its link creates the account exactly once', async () => {
    // Arrange
    const crew = await insertWorkshopWithCrew();
    const email = uniqueEmail();
    const { token, mail, res } = await inviteAndReadToken(crew.workshop.id, crew.admin, email, 'student');
    const guest = await browser(t.app);

    // Act
    const preview = await guest.get(`/api/invitations/${token}`);
    const accepted = await guest.post(`/api/invitations/${token}/accept`, { displayName: 'New Student', password: 'first pour passphrase' });
    const second = await (await browser(t.app)).post(`/api/invitations/${token}/accept`, { displayName: 'Copycat', password: 'another passphrase' });

    // Assert
    expect(res.body).toMatchObject({ email, role: 'student', acceptedAt: null });
    expect(mail.html).toContain(`/invitations/${token}`);
    expect(preview.body).toEqual({ workshopName: crew.workshop.name, role: 'student', email, accountExists: false });
    expect(accepted.status).toBe(200);
    expect(accepted.body.workshopId).toBe(crew.workshop.id);
    expect(accepted.body.user.memberships).toEqual([{ workshopId: crew.workshop.id, workshopName: crew.workshop.name, role: 'student' }]);
    expect(second.status).toBe(404);
    expect(second.body.error.code).toBe('invitation-invalid');
    const users = await sequelize.query('SELECT 1 FROM users WHERE email = :email', { replacements: { email }, type: QueryTypes.SELECT });
    expect(users).toHaveLength(1);
  });

  test('when the address already has an account, then it must sign in as that account to accept', async () => {
    const crew = await insertWorkshopWithCrew();
    const existing = await insertUser();
    const stranger = await insertUser();
    const { token } = await inviteAndReadToken(crew.workshop.id, crew.admin, existing.email, 'caster');

    const anonymous = await (await browser(t.app)).post(`/api/invitations/${token}/accept`, {});
    const wrongAccount = await (await signedIn(stranger)).post(`/api/invitations/${token}/accept`, {});
    const right = await (await signedIn(existing)).post(`/api/invitations/${token}/accept`, {});

    expect(anonymous.status).toBe(409);
    expect(anonymous.body.error.code).toBe('sign-in-first');
    expect(wrongAccount.status).toBe(403);
    expect(right.status).toBe(200);
    expect(right.body.user.memberships.map((m: { role: string }) => m.role)).toEqual(['caster']);
  });

  test('when the invitation has expired, then preview and accept both refuse it', async () => {
    const crew = await insertWorkshopWithCrew();
    const email = uniqueEmail();
    const { token } = await inviteAndReadToken(crew.workshop.id, crew.admin, email);
    await sequelize.query("UPDATE invitations SET expires_at = now() - interval '1 second' WHERE email = :email", { replacements: { email } });
    const guest = await browser(t.app);

    const preview = await guest.get(`/api/invitations/${token}`);
    const accept = await guest.post(`/api/invitations/${token}/accept`, { displayName: 'Late', password: 'too late passphrase' });

    expect(preview.status).toBe(404);
    expect(accept.status).toBe(404);
  });

  test.each(['student', 'caster', 'mentor'] as const)('when a %s tries to invite, then 403 and no mail goes out', async (role) => {
    const crew = await insertWorkshopWithCrew();
    const b = await signedIn(crew[role]);
    const email = uniqueEmail();

    const res = await b.post(`/api/workshops/${crew.workshop.id}/invitations`, { email, role: 'admin' });

    expect(res.status).toBe(403);
    const rows = await sequelize.query('SELECT 1 FROM invitations WHERE email = :email', { replacements: { email }, type: QueryTypes.SELECT });
    expect(rows).toHaveLength(0);
  });

  test('when the token is malformed, then 400', async () => {
    const res = await (await browser(t.app)).get('/api/invitations/abc');
    expect(res.status).toBe(400);
  });
});
