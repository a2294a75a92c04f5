import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { COMMON_PASSWORD_MESSAGE } from '../../shared/auth/password-policy.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertUser, insertWorkshopWithCrew, uniqueEmail } from '../factories/people.ts';
import { linkIn, waitForMail } from '../support/mail.ts';
import { browser, startApp, type TestApp } from '../support/test-app.ts';

// OWASP ASVS 5.0 V6.2: 8 to 128 characters, no composition rules, and never
// a password from a list of common ones, wherever a password is set.

let t: TestApp;
beforeAll(() => {
  t = startApp();
});
afterAll(() => t.close());

/** A password of exactly `length` characters that no list holds. */
const randomPassword = (length: number) => randomBytes(length).toString('base64url').slice(0, length);

function fieldIssues(body: { error: { code: string; issues?: { path: string; message: string }[] } }) {
  expect(body.error.code).toBe('validation-failed');
  return body.error.issues ?? [];
}

async function countUsersWith(email: string) {
  const [{ n }] = await sequelize.query<{ n: number }>('SELECT count(*)::int AS n FROM users WHERE email = :email', {
    replacements: { email },
    type: QueryTypes.SELECT,
  });
  return n;
}

describe('common passwords', () => {
  test('when signing up with a common password (any case, with spaces), then 400 names the password field and no account is made', async () => {
    const b = await browser(t.app);
    const email = uniqueEmail();

    const res = await b.post('/api/auth/sign-up', { email, password: '  PassWord123 ', displayName: 'Ada' });

    expect(res.status).toBe(400);
    expect(fieldIssues(res.body)).toEqual([{ path: 'password', message: COMMON_PASSWORD_MESSAGE }]);
    expect(await countUsersWith(email)).toBe(0);
  });

  test('when a reset link sets a common password, then 400 names the field and the link still works for a good one', async () => {
    const user = await insertUser();
    const b = await browser(t.app);
    await b.post('/api/auth/password-reset', { email: user.email });
    const mail = await waitForMail(user.email, (m) => m.subject.includes('password'));
    const token = new URL(linkIn(mail, '/reset-password')).searchParams.get('token')!;

    const res = await b.post('/api/auth/password-reset/confirm', { token, password: 'iloveyou' });
    const good = await b.post('/api/auth/password-reset/confirm', { token, password: 'sprue and riser cut clean' });

    expect(res.status).toBe(400);
    expect(fieldIssues(res.body)).toEqual([{ path: 'password', message: COMMON_PASSWORD_MESSAGE }]);
    expect(good.status).toBe(204);
  });

  test('when an invitation makes a new account with a common password, then 400 names the field and the invitation is not used', async () => {
    const { workshop, admin } = await insertWorkshopWithCrew();
    const a = await browser(t.app);
    await a.signIn(admin.email, admin.password);
    const email = uniqueEmail();
    expect((await a.post(`/api/workshops/${workshop.id}/invitations`, { email, role: 'student' })).status).toBe(201);
    const token = linkIn(await waitForMail(email), '/invitations/').split('/invitations/')[1];
    const guest = await browser(t.app);

    const res = await guest.post(`/api/invitations/${token}/accept`, { displayName: 'New Student', password: 'qwertyuiop' });

    expect(res.status).toBe(400);
    expect(fieldIssues(res.body)).toEqual([{ path: 'password', message: COMMON_PASSWORD_MESSAGE }]);
    expect(await countUsersWith(email)).toBe(0);
    expect((await guest.get(`/api/invitations/${token}`)).status).toBe(200);
  });

  test('when changing to a common password, then 400 names newPassword and the old password still works', async () => {
    const user = await insertUser();
    const b = await browser(t.app);
    await b.signIn(user.email, user.password);

    const res = await b.post('/api/auth/password', { currentPassword: user.password, newPassword: 'football' });

    expect(res.status).toBe(400);
    expect(fieldIssues(res.body)).toEqual([{ path: 'newPassword', message: COMMON_PASSWORD_MESSAGE }]);
    const check = await browser(t.app);
    expect((await check.post('/api/auth/sign-in', { email: user.email, password: user.password })).status).toBe(200);
  });
});

describe('password length', () => {
  test('when a password has 7 characters, then 400 names the field', async () => {
    const b = await browser(t.app);

    const res = await b.post('/api/auth/sign-up', { email: uniqueEmail(), password: randomPassword(7), displayName: 'Ada' });

    expect(res.status).toBe(400);
    expect(fieldIssues(res.body)).toEqual([{ path: 'password', message: 'Use at least 8 characters' }]);
  });

  test('when a password has 128 characters, then the account is made and the whole password signs in', async () => {
    const b = await browser(t.app);
    const email = uniqueEmail();
    const password = randomPassword(128);

    const res = await b.post('/api/auth/sign-up', { email, password, displayName: 'Ada' });

    expect(res.status).toBe(201);
    const check = await browser(t.app);
    expect((await check.post('/api/auth/sign-in', { email, password: `${password.slice(0, 127)}x` })).status).toBe(401);
    expect((await check.post('/api/auth/sign-in', { email, password })).status).toBe(200);
  });

  test('when a password has 129 characters, then 400 names the field on sign-up and on change', async () => {
    const user = await insertUser();
    const b = await browser(t.app);
    await b.signIn(user.email, user.password);
    const anonymous = await browser(t.app);

    const signUp = await anonymous.post('/api/auth/sign-up', { email: uniqueEmail(), password: randomPassword(129), displayName: 'Ada' });
    const change = await b.post('/api/auth/password', { currentPassword: user.password, newPassword: randomPassword(129) });

    expect(signUp.status).toBe(400);
    expect(fieldIssues(signUp.body)).toEqual([{ path: 'password', message: 'Use at most 128 characters' }]);
    expect(change.status).toBe(400);
    expect(fieldIssues(change.body)).toEqual([{ path: 'newPassword', message: 'Use at most 128 characters' }]);
  });
});
