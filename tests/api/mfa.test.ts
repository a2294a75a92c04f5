import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { sequelize } from '../../server/db/sequelize.ts';
import { SIGN_IN_LIMITS } from '../../server/modules/auth/sign-in-limiter.ts';
import { insertUser, insertWorkshopWithCrew } from '../factories/people.ts';
import { waitForMail } from '../support/mail.ts';
import { accountFailures, enableMfa, freshCode, wrongCode } from '../support/mfa.ts';
import { browser, startApp, type TestApp } from '../support/test-app.ts';

// OWASP ASVS 5.0 V6.5 (one-time passwords and lookup secrets), V6.3 (MFA).

let t: TestApp;
beforeAll(() => {
  t = startApp();
});
afterAll(() => t.close());

const RECOVERY_CODE_SHAPE = /^[0-9a-hjkmnp-tv-z]{4}(-[0-9a-hjkmnp-tv-z]{4}){5}$/;

async function userRow(id: string) {
  const [row] = await sequelize.query<{ totp_secret: string | null; totp_enabled_at: Date | null; recovery: number }>(
    `SELECT totp_secret, totp_enabled_at, (SELECT count(*)::int FROM recovery_codes r WHERE r.user_id = u.id) AS recovery
       FROM users u WHERE id = :id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return row;
}

describe('two-step sign-in, from setup to disable', () => {
  test(
    'when a user sets it up, then sign-in needs a code, wrong codes count, a code works once, a recovery code works once, and turning it off needs a code',
    async () => {
      // Arrange: a signed-in user.
      const user = await insertUser();
      const b = await browser(t.app);
      await b.signIn(user.email, user.password);

      // Setup needs the password again, and changes nothing until confirmed.
      const wrongPassword = await b.post('/api/auth/mfa/setup', { password: 'not my password' });
      expect(wrongPassword.status).toBe(400);
      expect(wrongPassword.body.error.code).toBe('password-incorrect');
      const setup = await b.post('/api/auth/mfa/setup', { password: user.password });
      expect(setup.status).toBe(200);
      const secret: string = setup.body.secret;
      expect(secret).toMatch(/^[A-Z2-7]{32}$/);
      expect(setup.body.otpauthUri).toMatch(/^otpauth:\/\/totp\/Pourscope:/);
      expect(new URL(setup.body.otpauthUri).searchParams.get('secret')).toBe(secret);
      expect(setup.body.qrDataUrl).toMatch(/^data:image\/svg\+xml;base64,/);
      expect(Buffer.from(setup.body.qrDataUrl.split(',')[1], 'base64').toString()).toContain('<svg');
      const pending = await userRow(user.id);
      expect(pending.totp_secret).toMatch(/^v1\./);
      expect(pending.totp_secret).not.toContain(secret);
      expect(pending.totp_enabled_at).toBeNull();
      expect((await b.get('/api/auth/me')).body.user.mfaEnabled).toBe(false);
      const stillPasswordOnly = await browser(t.app);
      expect((await stillPasswordOnly.signIn(user.email, user.password)).body.user.id).toBe(user.id);

      // Enable: a wrong code is refused; the right one returns ten recovery codes, once.
      expect((await b.post('/api/auth/mfa/enable', { code: wrongCode(secret) })).body.error.code).toBe('code-invalid');
      const enabled = await b.post('/api/auth/mfa/enable', { code: await freshCode(secret, user.id) });
      expect(enabled.status).toBe(200);
      const codes: string[] = enabled.body.recoveryCodes;
      expect(codes).toHaveLength(10);
      expect(new Set(codes).size).toBe(10);
      for (const code of codes) expect(code).toMatch(RECOVERY_CODE_SHAPE);
      const stored = await sequelize.query<{ code_hash: string }>('SELECT code_hash FROM recovery_codes WHERE user_id = :id', {
        replacements: { id: user.id },
        type: QueryTypes.SELECT,
      });
      expect(stored).toHaveLength(10);
      for (const { code_hash } of stored) expect(code_hash).toMatch(/^[0-9a-f]{64}$/);
      expect((await b.get('/api/auth/me')).body.user.mfaEnabled).toBe(true);
      // The session signed in without a code ended with the change.
      expect((await stillPasswordOnly.get('/api/auth/me')).body.user).toBeNull();

      // Sign-in: the right password is only the first step.
      const device = await browser(t.app);
      const first = await device.post('/api/auth/sign-in', { email: user.email, password: user.password });
      expect(first.status).toBe(200);
      expect(first.body).toEqual({ mfaRequired: true, csrfToken: expect.any(String) });
      expect((await device.get('/api/auth/me')).body.user).toBeNull();
      expect((await device.get('/api/workshops')).status).toBe(401);

      // A wrong code: 401, counted against the account like a wrong password.
      const before = await accountFailures(user.email);
      const wrong = await device.post('/api/auth/sign-in/mfa', { code: wrongCode(secret) });
      expect(wrong.status).toBe(401);
      expect(wrong.body.error.code).toBe('code-invalid');
      expect(await accountFailures(user.email)).toBe(before + 1);

      // The right code signs in, and the failures are forgotten.
      const code = await freshCode(secret, user.id);
      const signedIn = await device.post('/api/auth/sign-in/mfa', { code });
      expect(signedIn.status).toBe(200);
      expect(signedIn.body.user).toMatchObject({ id: user.id, mfaEnabled: true });
      expect((await device.get('/api/auth/me')).body.user.id).toBe(user.id);
      expect(await accountFailures(user.email)).toBe(0);

      // The same code again, from another device within its 30 s: refused.
      const thief = await browser(t.app);
      await thief.post('/api/auth/sign-in', { email: user.email, password: user.password });
      const replay = await thief.post('/api/auth/sign-in/mfa', { code });
      expect(replay.status).toBe(401);
      expect(replay.body.error.code).toBe('code-invalid');
      expect((await thief.get('/api/auth/me')).body.user).toBeNull();

      // A recovery code instead, typed loosely (upper case, spaces): works, once.
      const phoneLost = await browser(t.app);
      await phoneLost.post('/api/auth/sign-in', { email: user.email, password: user.password });
      const typed = codes[0].toUpperCase().replaceAll('-', ' ');
      const recovered = await phoneLost.post('/api/auth/sign-in/mfa', { recoveryCode: typed });
      expect(recovered.status).toBe(200);
      expect(recovered.body.recoveryCodesLeft).toBe(9);
      const again = await browser(t.app);
      await again.post('/api/auth/sign-in', { email: user.email, password: user.password });
      const reused = await again.post('/api/auth/sign-in/mfa', { recoveryCode: codes[0] });
      expect(reused.status).toBe(401);
      expect(reused.body.error.code).toBe('code-invalid');

      // Turning it off needs the password and a current code.
      const noCode = await b.post('/api/auth/mfa/disable', { password: user.password, code: wrongCode(secret) });
      expect(noCode.status).toBe(400);
      expect(noCode.body.error.code).toBe('code-invalid');
      const off = await b.post('/api/auth/mfa/disable', { password: user.password, code: await freshCode(secret, user.id) });
      expect(off.status).toBe(204);
      const after = await userRow(user.id);
      expect(after).toMatchObject({ totp_secret: null, totp_enabled_at: null, recovery: 0 });
      expect((await b.get('/api/auth/me')).body.user.mfaEnabled).toBe(false);
      // The owner is told by mail of both changes.
      await waitForMail(user.email, (m) => m.text.includes('Two-step sign-in was turned on'));
      await waitForMail(user.email, (m) => m.text.includes('Two-step sign-in was turned off'));
      const plain = await browser(t.app);
      expect((await plain.signIn(user.email, user.password)).body.user.id).toBe(user.id);
    },
    120_000,
  );
});

describe('POST /api/auth/sign-in/mfa', () => {
  test('when the code step is older than 5 minutes, then even the right code does not sign in', async () => {
    const user = await insertUser();
    const owner = await browser(t.app);
    await owner.signIn(user.email, user.password);
    const { secret } = await enableMfa(owner, user);
    const b = await browser(t.app);
    await b.post('/api/auth/sign-in', { email: user.email, password: user.password });
    await sequelize.query(
      `UPDATE sessions SET sess = jsonb_set(sess::jsonb, '{mfaPending,until}', to_jsonb(:until::bigint))::json
        WHERE sess::jsonb -> 'mfaPending' ->> 'userId' = :id`,
      { replacements: { id: user.id, until: Date.now() - 1000 } },
    );

    const res = await b.post('/api/auth/sign-in/mfa', { code: await freshCode(secret, user.id) });

    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('mfa-expired');
    expect((await b.get('/api/auth/me')).body.user).toBeNull();
  });

  test('when no sign-in was started, then a code is refused without a 5xx', async () => {
    const b = await browser(t.app);

    const res = await b.post('/api/auth/sign-in/mfa', { code: '123456' });
    const malformed = await b.post('/api/auth/sign-in/mfa', { code: '12ab56' });
    const both = await b.post('/api/auth/sign-in/mfa', { code: '123456', recoveryCode: 'x' });

    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('mfa-expired');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.issues[0].path).toBe('code');
    expect(both.status).toBe(400);
  });

  test(`when wrong codes reach the account's limit (${SIGN_IN_LIMITS.perAccount.points}), then even the right code answers 429`, async () => {
    const user = await insertUser();
    const owner = await browser(t.app);
    await owner.signIn(user.email, user.password);
    const { secret } = await enableMfa(owner, user);
    const b = await browser(t.app);
    await b.post('/api/auth/sign-in', { email: user.email, password: user.password });
    for (let i = 0; i < SIGN_IN_LIMITS.perAccount.points; i++) {
      expect((await b.post('/api/auth/sign-in/mfa', { code: wrongCode(secret) })).status).toBe(401);
    }

    const blocked = await b.post('/api/auth/sign-in/mfa', { code: await freshCode(secret, user.id) });
    // Signing in with the password again does not reset the count either.
    const retry = await browser(t.app);
    const password = await retry.post('/api/auth/sign-in', { email: user.email, password: user.password });

    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate-limited');
    expect(password.status).toBe(429);
  });
});

describe('setup and recovery codes', () => {
  test('when two-step sign-in is already on, then a new setup is refused and the secret stays', async () => {
    const user = await insertUser();
    const b = await browser(t.app);
    await b.signIn(user.email, user.password);
    await enableMfa(b, user);
    const before = await userRow(user.id);

    const res = await b.post('/api/auth/mfa/setup', { password: user.password });

    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('mfa-already-enabled');
    expect((await userRow(user.id)).totp_secret).toBe(before.totp_secret);
  });

  test('when new recovery codes are asked for with a recovery code, then ten new ones work and the old ones do not', async () => {
    const user = await insertUser();
    const b = await browser(t.app);
    await b.signIn(user.email, user.password);
    const { recoveryCodes: old } = await enableMfa(b, user);

    const wrongPassword = await b.post('/api/auth/mfa/recovery-codes', { password: 'nope nope nope', code: old[0] });
    const res = await b.post('/api/auth/mfa/recovery-codes', { password: user.password, code: old[0] });

    expect(wrongPassword.status).toBe(400);
    expect(res.status).toBe(200);
    const fresh: string[] = res.body.recoveryCodes;
    expect(fresh).toHaveLength(10);
    expect(fresh.some((c) => old.includes(c))).toBe(false);
    const oldTry = await browser(t.app);
    await oldTry.post('/api/auth/sign-in', { email: user.email, password: user.password });
    expect((await oldTry.post('/api/auth/sign-in/mfa', { recoveryCode: old[1] })).status).toBe(401);
    expect((await oldTry.post('/api/auth/sign-in/mfa', { recoveryCode: fresh[0] })).status).toBe(200);
  });

  test('when the sealed secret is copied onto another account, then it does not open there', async () => {
    const alice = await insertUser();
    const mallory = await insertUser();
    const a = await browser(t.app);
    await a.signIn(alice.email, alice.password);
    const { secret } = await enableMfa(a, alice);
    await sequelize.query(
      `UPDATE users SET totp_secret = (SELECT totp_secret FROM users WHERE id = :alice), totp_enabled_at = now() WHERE id = :mallory`,
      { replacements: { alice: alice.id, mallory: mallory.id } },
    );
    const m = await browser(t.app);
    await m.post('/api/auth/sign-in', { email: mallory.email, password: mallory.password });

    const res = await m.post('/api/auth/sign-in/mfa', { code: await freshCode(secret, mallory.id) });

    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('mfa-secret-unreadable');
    expect((await m.get('/api/auth/me')).body.user).toBeNull();
  });
});

describe('PATCH /api/workshops/:workshopId requireMfaForStaff', () => {
  test('when an admin without two-step sign-in asks to require it, then it is refused so they are not locked out', async () => {
    const { workshop, admin } = await insertWorkshopWithCrew();
    const b = await browser(t.app);
    await b.signIn(admin.email, admin.password);

    const res = await b.patch(`/api/workshops/${workshop.id}`, { requireMfaForStaff: true });

    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('mfa-needed-first');
    expect(res.body.error.message).toMatch(/two-step sign-in for your own account first/);
    const [row] = await sequelize.query<{ r: boolean }>('SELECT require_mfa_for_staff AS r FROM workshops WHERE id = :id', {
      replacements: { id: workshop.id },
      type: QueryTypes.SELECT,
    });
    expect(row.r).toBe(false);
  });

  test('when a mentor asks to change it, then 403', async () => {
    const { workshop, mentor } = await insertWorkshopWithCrew();
    const b = await browser(t.app);
    await b.signIn(mentor.email, mentor.password);

    const res = await b.patch(`/api/workshops/${workshop.id}`, { requireMfaForStaff: false });

    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  test('when it is on, then a mentor without two-step sign-in gets 403 mfa-required until they turn it on; students and casters are unaffected', async () => {
    // Arrange: the admin has two-step sign-in and turns the requirement on.
    const { workshop, admin, mentor, caster, student } = await insertWorkshopWithCrew();
    const a = await browser(t.app);
    await a.signIn(admin.email, admin.password);
    await enableMfa(a, admin);
    const turnedOn = await a.patch(`/api/workshops/${workshop.id}`, { requireMfaForStaff: true });
    expect(turnedOn.status).toBe(200);
    expect(turnedOn.body).toMatchObject({ id: workshop.id, requireMfaForStaff: true, role: 'admin' });
    const m = await browser(t.app);
    await m.signIn(mentor.email, mentor.password);
    const [c, s] = await Promise.all([browser(t.app), browser(t.app)]);
    await c.signIn(caster.email, caster.password);
    await s.signIn(student.email, student.password);
    const members = `/api/workshops/${workshop.id}/members`;

    // Act and assert
    const blocked = await m.get(members);
    expect(blocked.status).toBe(403);
    expect(blocked.body.error.code).toBe('mfa-required');
    expect(blocked.body.error.message).toMatch(/two-step sign-in/);
    expect((await m.get('/api/workshops')).body.find((w: { id: string }) => w.id === workshop.id)).toMatchObject({ requireMfaForStaff: true });
    expect((await s.get(members)).status).toBe(200);
    expect((await c.get(members)).status).toBe(200);
    expect((await a.get(members)).status).toBe(200);

    await enableMfa(m, mentor);
    expect((await m.get(members)).status).toBe(200);
  });
});
