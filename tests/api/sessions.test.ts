import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { config } from '../../server/config.ts';
import { sequelize } from '../../server/db/sequelize.ts';
import { insertUser } from '../factories/people.ts';
import { waitForMail } from '../support/mail.ts';
import { accountFailures, enableMfa, freshCode, sessionCookie } from '../support/mfa.ts';
import { browser, startApp, type TestApp } from '../support/test-app.ts';

// OWASP ASVS 5.0 V7: session timeouts, session ids renewed at every change
// of authentication, and ending other sessions.

let t: TestApp;
beforeAll(() => {
  t = startApp();
});
afterAll(() => t.close());

const HOUR_MS = 3600_000;

async function sessionRows(userId: string) {
  return sequelize.query<{ sid: string; expire: Date }>('SELECT sid, expire FROM sessions WHERE user_id = :userId', {
    replacements: { userId },
    type: QueryTypes.SELECT,
  });
}

describe('session lifetimes', () => {
  test('when signed in, then the cookie and the stored row expire after the idle timeout (12 hours by default)', async () => {
    const user = await insertUser();
    const b = await browser(t.app);

    const res = await b.signIn(user.email, user.password);

    const expires = /Expires=([^;]+)/i.exec(res.headers['set-cookie']![0])![1];
    const idleMs = config().session.idleMs;
    expect(idleMs).toBe(12 * HOUR_MS);
    expect(Math.abs(new Date(expires).getTime() - (Date.now() + idleMs))).toBeLessThan(60_000);
    const [row] = await sessionRows(user.id);
    expect(Math.abs(new Date(row.expire).getTime() - (Date.now() + idleMs))).toBeLessThan(60_000);
  });

  test('when the session has been idle past its expiry, then it no longer signs in', async () => {
    const user = await insertUser();
    const b = await browser(t.app);
    await b.signIn(user.email, user.password);
    await sequelize.query("UPDATE sessions SET expire = now() - interval '1 minute' WHERE user_id = :id", { replacements: { id: user.id } });

    const me = await b.get('/api/auth/me');

    expect(me.body.user).toBeNull();
    expect((await b.get('/api/workshops')).status).toBe(401);
  });

  test('when the sign-in is older than the absolute timeout (336 hours by default), then the session ends even though it was active', async () => {
    const user = await insertUser();
    const b = await browser(t.app);
    await b.signIn(user.email, user.password);
    const absoluteMs = config().session.absoluteMs;
    expect(absoluteMs).toBe(336 * HOUR_MS);
    const setSignedInAt = (ms: number) =>
      sequelize.query(`UPDATE sessions SET sess = jsonb_set(sess::jsonb, '{signedInAt}', to_jsonb(:ms::bigint))::json WHERE user_id = :id`, {
        replacements: { id: user.id, ms },
      });

    // Just inside the lifetime it still works (and stays active)…
    await setSignedInAt(Date.now() - absoluteMs + 5 * 60_000);
    expect((await b.get('/api/auth/me')).body.user?.id).toBe(user.id);
    // …just past it, it ends, and its row is gone.
    await setSignedInAt(Date.now() - absoluteMs - 60_000);
    const me = await b.get('/api/auth/me');

    expect(me.body.user).toBeNull();
    expect(await sessionRows(user.id)).toHaveLength(0);
  });
});

describe('session id renewal', () => {
  test('when signing in with two steps, then the id changes at the password and again at the code, and the code-step id is dead', async () => {
    const user = await insertUser();
    const owner = await browser(t.app);
    await owner.signIn(user.email, user.password);
    const { secret } = await enableMfa(owner, user);
    const b = await browser(t.app);
    const anonymous = sessionCookie(await b.get('/api/auth/me'));

    const passwordStep = await b.post('/api/auth/sign-in', { email: user.email, password: user.password });
    const codeStep = sessionCookie(passwordStep);
    const done = await b.post('/api/auth/sign-in/mfa', { code: await freshCode(secret, user.id) });
    const signedIn = sessionCookie(done);

    expect(passwordStep.body.mfaRequired).toBe(true);
    expect(anonymous).toBeDefined();
    expect(codeStep).toBeDefined();
    expect(signedIn).toBeDefined();
    expect(new Set([anonymous, codeStep, signedIn]).size).toBe(3);
    expect((await request(t.app).get('/api/auth/me').set('Cookie', codeStep!)).body.user).toBeNull();
    expect((await request(t.app).get('/api/auth/me').set('Cookie', signedIn!)).body.user.id).toBe(user.id);
  });

  test('when signing in with a password only, then the session id changes', async () => {
    const user = await insertUser();
    const b = await browser(t.app);
    const anonymous = sessionCookie(await b.get('/api/auth/me'));

    const signedIn = sessionCookie(await b.signIn(user.email, user.password));

    expect(signedIn).toBeDefined();
    expect(signedIn).not.toBe(anonymous);
  });
});

describe('POST /api/auth/password', () => {
  test('when the current password is right, then the new one is set, every other session ends and this one stays under a new id', async () => {
    // Arrange: signed in here and on another device.
    const user = await insertUser();
    const here = await browser(t.app);
    const first = sessionCookie(await here.signIn(user.email, user.password));
    const elsewhere = await browser(t.app);
    await elsewhere.signIn(user.email, user.password);

    // Act
    const res = await here.post('/api/auth/password', { currentPassword: user.password, newPassword: 'bright orange pour at dusk' });

    // Assert
    expect(res.status).toBe(204);
    const renewed = sessionCookie(res);
    expect(renewed).toBeDefined();
    expect(renewed).not.toBe(first);
    expect((await here.get('/api/auth/me')).body.user.id).toBe(user.id);
    expect((await request(t.app).get('/api/auth/me').set('Cookie', first!)).body.user).toBeNull();
    expect((await elsewhere.get('/api/auth/me')).body.user).toBeNull();
    expect(await sessionRows(user.id)).toHaveLength(1);
    // This session's fresh CSRF token (from /me) works for the next change.
    expect((await here.patch('/api/auth/me', { theme: 'dark' })).status).toBe(200);
    const check = await browser(t.app);
    expect((await check.post('/api/auth/sign-in', { email: user.email, password: user.password })).status).toBe(401);
    expect((await check.post('/api/auth/sign-in', { email: user.email, password: 'bright orange pour at dusk' })).status).toBe(200);
    const notice = await waitForMail(user.email, (m) => m.subject.includes('sign-in was changed'));
    expect(notice.text).toContain('Your password was changed');
  });

  test('when the current password is wrong, then 400, nothing changes and the failure counts like a sign-in', async () => {
    const user = await insertUser();
    const here = await browser(t.app);
    await here.signIn(user.email, user.password);
    const elsewhere = await browser(t.app);
    await elsewhere.signIn(user.email, user.password);

    const res = await here.post('/api/auth/password', { currentPassword: 'not the password', newPassword: 'bright orange pour at dusk' });

    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('password-incorrect');
    expect(await accountFailures(user.email)).toBe(1);
    expect((await elsewhere.get('/api/auth/me')).body.user.id).toBe(user.id);
    const check = await browser(t.app);
    expect((await check.post('/api/auth/sign-in', { email: user.email, password: user.password })).status).toBe(200);
  });

  test('when signed out, then 401', async () => {
    const b = await browser(t.app);

    const res = await b.post('/api/auth/password', { currentPassword: 'x', newPassword: 'bright orange pour at dusk' });

    expect(res.status).toBe(401);
  });
});

describe('POST /api/auth/sign-out-everywhere', () => {
  test('when asked, then every session of the account ends, this one too, and other accounts keep theirs', async () => {
    const user = await insertUser();
    const other = await insertUser();
    const [a, b, c, someoneElse] = await Promise.all([browser(t.app), browser(t.app), browser(t.app), browser(t.app)]);
    await a.signIn(user.email, user.password);
    await b.signIn(user.email, user.password);
    await c.signIn(user.email, user.password);
    await someoneElse.signIn(other.email, other.password);

    const res = await a.post('/api/auth/sign-out-everywhere');

    expect(res.status).toBe(204);
    for (const device of [a, b, c]) expect((await device.get('/api/auth/me')).body.user).toBeNull();
    expect(await sessionRows(user.id)).toHaveLength(0);
    expect((await someoneElse.get('/api/auth/me')).body.user.id).toBe(other.id);
  });
});
