import { createHash, randomBytes } from 'node:crypto';
import { generateSecret, generateURI, verifySync } from 'otplib';
import QRCode from 'qrcode';
import {
  formatRecoveryCode,
  RECOVERY_CODE_ALPHABET,
  RECOVERY_CODE_COUNT,
  TOTP_DIGITS,
  TOTP_PERIOD_SECONDS,
  type MfaSetup,
  type SecondFactor,
} from '../../../shared/auth/mfa-schemas.ts';
import { config } from '../../config.ts';
import { withTransaction, type Tx } from '../../db/sequelize.ts';
import { AppError } from '../../lib/app-error.ts';
import { createSecretBox, type SecretBox } from '../../lib/secret-box.ts';
import * as repo from './mfa-repository.ts';
import * as limiter from './sign-in-limiter.ts';

const ISSUER = 'Pourscope';

let box: SecretBox | undefined;
const secretBox = () => (box ??= createSecretBox(config().auth.mfaKeyMaterial, 'totp-secret'));
// The sealed secret is bound to its user's id: copied to another row, it does not open.
const sealFor = (userId: string, secret: string) => secretBox().seal(secret, `user:${userId}`);
const openFor = (userId: string, sealed: string) => secretBox().open(sealed, `user:${userId}`);

/** Only a recovery code's SHA-256 is stored; the codes are random enough (120 bits) for that. */
export function hashRecoveryCode(normalizedCode: string): string {
  return createHash('sha256').update(normalizedCode, 'utf8').digest('hex');
}

function newRecoveryCode(): string {
  // 15 random bytes = 120 bits, read 5 bits at a time into Crockford base32.
  const bytes = randomBytes(15);
  let bits = 0;
  let value = 0;
  let out = '';
  for (const byte of bytes) {
    value = (value << 8) | byte;
    bits += 8;
    while (bits >= 5) {
      out += RECOVERY_CODE_ALPHABET[(value >>> (bits - 5)) & 31];
      bits -= 5;
    }
    value &= (1 << bits) - 1;
  }
  return out;
}

/**
 * The time step the code belongs to, or null. ±1 step (30 s each way) allows
 * for clock drift and typing time (RFC 6238 §5.2); `afterStep` refuses that
 * step and every earlier one, so a code once accepted cannot be used again.
 */
function matchingStep(secret: string, code: string, afterStep: number | null): number | null {
  try {
    const result = verifySync({
      secret,
      token: code,
      digits: TOTP_DIGITS,
      period: TOTP_PERIOD_SECONDS,
      epochTolerance: TOTP_PERIOD_SECONDS,
      ...(afterStep === null ? {} : { afterTimeStep: afterStep }),
    });
    // verifySync's result type covers HOTP too; a TOTP match carries its time step.
    return result.valid && 'timeStep' in result ? result.timeStep : null;
  } catch {
    // otplib throws for a stored step beyond the window (a clock set back);
    // the code is then simply not accepted.
    return null;
  }
}

/** Checks a code against the enabled secret and spends its step. */
async function acceptTotp(userId: string, code: string): Promise<boolean> {
  const state = await repo.findTotpState(userId);
  if (!state?.enabledAt || !state.sealedSecret) return false;
  const secret = openFor(userId, state.sealedSecret);
  if (!secret) {
    throw new AppError(
      'mfa-secret-unreadable',
      'Your authenticator setup can no longer be read on this server. Use a recovery code, then set up two-step sign-in again.',
      409,
    );
  }
  const step = matchingStep(secret, code, state.lastStep);
  return step !== null && (await repo.claimStep(userId, step));
}

export async function isEnabled(userId: string): Promise<boolean> {
  return Boolean((await repo.findTotpState(userId))?.enabledAt);
}

/**
 * Checks a second factor for the account with this e-mail, counting a wrong
 * one against the same per-account and per-address limits as a wrong
 * password. `status` is 401 at sign-in, 400 for a signed-in confirmation.
 */
export async function verifySecondFactor(
  account: { userId: string; email: string },
  factor: SecondFactor,
  address: string,
  status: 400 | 401,
): Promise<{ recoveryCodesLeft?: number }> {
  await limiter.assertMaySignIn(account.email, address);
  const ok =
    factor.kind === 'totp'
      ? await acceptTotp(account.userId, factor.value)
      : (await isEnabled(account.userId)) && (await repo.useRecoveryCode(account.userId, hashRecoveryCode(factor.value)));
  if (!ok) {
    await limiter.recordFailure(account.email, address);
    throw new AppError(
      'code-invalid',
      factor.kind === 'totp'
        ? 'That code is not right, or was already used. Wait for the next code in your app and try again.'
        : 'That recovery code is not right, or was already used.',
      status,
    );
  }
  return factor.kind === 'recovery' ? { recoveryCodesLeft: await repo.countUnusedRecoveryCodes(account.userId) } : {};
}

/** A new pending secret, its otpauth URI and the URI as a QR code; nothing changes until it is confirmed. */
export async function startSetup(account: { userId: string; email: string }): Promise<MfaSetup> {
  const secret = generateSecret(); // 20 bytes = 160 bits, RFC 4226's recommendation
  if (!(await repo.setPendingSecret(account.userId, sealFor(account.userId, secret)))) {
    throw new AppError('mfa-already-enabled', 'Two-step sign-in is already on. Turn it off first to move it to another app.', 409);
  }
  const otpauthUri = generateURI({
    issuer: ISSUER,
    label: account.email,
    secret,
    digits: TOTP_DIGITS,
    period: TOTP_PERIOD_SECONDS,
  });
  const svg = await QRCode.toString(otpauthUri, { type: 'svg', errorCorrectionLevel: 'M', margin: 2 });
  return { secret, otpauthUri, qrDataUrl: `data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}` };
}

async function issueRecoveryCodes(userId: string, work: (tx: Tx) => Promise<void>): Promise<string[]> {
  const codes = Array.from({ length: RECOVERY_CODE_COUNT }, newRecoveryCode);
  await withTransaction(async (tx) => {
    await work(tx);
    await repo.replaceRecoveryCodes(userId, codes.map(hashRecoveryCode), tx);
  });
  return codes.map(formatRecoveryCode);
}

/** Confirms the pending secret with a code from the app; returns the recovery codes, shown once. */
export async function enable(userId: string, code: string): Promise<string[]> {
  const state = await repo.findTotpState(userId);
  if (state?.enabledAt) {
    throw new AppError('mfa-already-enabled', 'Two-step sign-in is already on.', 409);
  }
  const secret = state?.sealedSecret ? openFor(userId, state.sealedSecret) : null;
  if (!secret) throw new AppError('mfa-setup-needed', 'Start the setup again: there is no authenticator waiting to be confirmed.', 409);
  const step = matchingStep(secret, code, state?.lastStep ?? null);
  if (step === null) {
    throw new AppError('code-invalid', 'That code is not right. Check the app shows Pourscope and try the newest code.', 400);
  }
  return issueRecoveryCodes(userId, async (tx) => {
    if (!(await repo.enable(userId, step, tx))) {
      throw new AppError('mfa-already-enabled', 'Two-step sign-in is already on.', 409);
    }
  });
}

/** A new set of recovery codes; the old ones stop working. */
export async function replaceRecoveryCodes(userId: string): Promise<string[]> {
  return issueRecoveryCodes(userId, async () => {});
}

export async function disable(userId: string): Promise<void> {
  await withTransaction((tx) => repo.disable(userId, tx));
}
