import { generateSync } from 'otplib';
import { QueryTypes } from 'sequelize';
import { expect } from 'vitest';
import { sequelize } from '../../server/db/sequelize.ts';
import type { Browser } from './test-app.ts';

const PERIOD_S = 30;
const currentStep = () => Math.floor(Date.now() / 1000 / PERIOD_S);

async function lastStepOf(userId: string): Promise<number | null> {
  const [row] = await sequelize.query<{ step: number | null }>('SELECT totp_last_step AS step FROM users WHERE id = :userId', {
    replacements: { userId },
    type: QueryTypes.SELECT,
  });
  return row?.step ?? null;
}

/**
 * A code the server will accept now: from the current step or the next one
 * (the server allows ±1), always later than the last step the account used,
 * so each call gives a code that is not a replay. Never an earlier step, so
 * crossing a step boundary before the request lands keeps it inside the
 * window. When both usable steps are spent it waits for the clock.
 */
export async function freshCode(secret: string, userId: string): Promise<string> {
  for (;;) {
    const now = currentStep();
    const last = await lastStepOf(userId);
    const step = Math.max(now, (last ?? -1) + 1);
    if (step <= now + 1) return generateSync({ secret, epoch: step * PERIOD_S + 1 });
    await new Promise((r) => setTimeout(r, ((now + 1) * PERIOD_S - Date.now() / 1000) * 1000 + 50));
  }
}

/** A six-digit code the account's app does not show anywhere in the server's window. */
export function wrongCode(secret: string): string {
  const near = new Set([-1, 0, 1, 2].map((d) => generateSync({ secret, epoch: (currentStep() + d) * PERIOD_S + 1 })));
  for (let n = 0; ; n++) {
    const candidate = String(n).padStart(6, '0');
    if (!near.has(candidate)) return candidate;
  }
}

/** Failed attempts the sign-in limiter holds for this account. */
export async function accountFailures(email: string): Promise<number> {
  const [row] = await sequelize.query<{ points: number }>('SELECT points FROM rate_limits WHERE key = :key', {
    replacements: { key: `sign-in-account:${email}` },
    type: QueryTypes.SELECT,
  });
  return row?.points ?? 0;
}

/** Turns two-step sign-in on for the signed-in browser's account through the API. */
export async function enableMfa(b: Browser, user: { id: string; password: string }) {
  const setup = await b.post('/api/auth/mfa/setup', { password: user.password });
  expect(setup.status, JSON.stringify(setup.body)).toBe(200);
  const secret = setup.body.secret as string;
  const enabled = await b.post('/api/auth/mfa/enable', { code: await freshCode(secret, user.id) });
  expect(enabled.status, JSON.stringify(enabled.body)).toBe(200);
  return { secret, recoveryCodes: enabled.body.recoveryCodes as string[] };
}

/** The session cookie ("pourscope.sid=…") a response set, if any. */
export function sessionCookie(res: { headers: Record<string, unknown> }): string | undefined {
  const cookies = res.headers['set-cookie'] as string[] | undefined;
  return cookies?.find((c) => c.startsWith('pourscope.sid='))?.split(';')[0];
}
