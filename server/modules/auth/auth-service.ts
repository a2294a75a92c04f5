import type {
  CurrentUser,
  PasswordChangeInput,
  PasswordResetConfirm,
  PreferencesUpdate,
  SignInInput,
} from '../../../shared/auth/auth-schemas.ts';
import type { MfaSetup, SecondFactor } from '../../../shared/auth/mfa-schemas.ts';
import { config } from '../../config.ts';
import { withTransaction, type Tx } from '../../db/sequelize.ts';
import { AppError } from '../../lib/app-error.ts';
import { mailLayout } from '../../lib/mailer.ts';
import { queueMail } from '../../lib/mail-queue.ts';
import { burnPasswordCheck, hashPassword, verifyPassword } from '../../lib/password.ts';
import { hashToken, newLinkToken } from '../../lib/tokens.ts';
import * as workshopsService from '../workshops/workshops-service.ts';
import * as mfaService from './mfa-service.ts';
import * as resetTokens from './password-reset-repository.ts';
import * as limiter from './sign-in-limiter.ts';
import * as users from './users-repository.ts';

export const PASSWORD_RESET_LIFETIME_MS = 60 * 60 * 1000;

export async function currentUser(userId: string): Promise<CurrentUser | null> {
  const user = await users.findById(userId);
  if (!user) return null;
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    temperatureUnit: user.temperatureUnit,
    massUnit: user.massUnit,
    theme: user.theme,
    mfaEnabled: user.totpEnabledAt !== null,
    memberships: await workshopsService.membershipsOf(user.id),
  };
}

/** Creates an account; used by sign-up and by accepting an invitation. */
export async function createAccount(
  input: { email: string; password: string; displayName: string; temperatureUnit?: 'C' | 'F'; massUnit?: 'g' | 'oz' },
  tx?: Tx,
) {
  const passwordHash = await hashPassword(input.password, config().auth.bcryptCost);
  return users.create({ ...input, passwordHash }, tx);
}

export async function findAccountByEmail(email: string) {
  return users.findByEmail(email);
}

/**
 * Sign-up never says whether an address is registered: for a taken address
 * the owner gets a mail pointing to sign-in and password reset, and the caller
 * gets the same "check your e-mail" answer a mail-confirmation flow would give.
 */
export async function signUp(
  input: { email: string; password: string; displayName: string; temperatureUnit: 'C' | 'F'; massUnit: 'g' | 'oz' },
  address: string,
): Promise<{ userId: string } | { status: 'check-email' }> {
  const existing = await users.findByEmail(input.email);
  if (existing) {
    await limiter.consumeMailRequest(`sign-up:${input.email}`, `sign-up-ip:${address}`);
    const origin = config().http.origin;
    await queueMail({
      to: existing.email,
      subject: 'Someone tried to open a Pourscope account with your address',
      text: `An account for ${existing.email} already exists. Sign in at ${origin}/sign-in, or reset your password at ${origin}/forgot-password if you have lost it.`,
      html: mailLayout({
        heading: 'You already have an account',
        paragraphs: [
          `Someone (perhaps you) tried to sign up to Pourscope with ${existing.email}, which already has an account.`,
          'If you have lost your password, you can set a new one.',
        ],
        action: { label: 'Sign in', url: `${origin}/sign-in` },
      }),
    });
    return { status: 'check-email' };
  }
  try {
    const user = await createAccount(input);
    return { userId: user.id };
  } catch (err) {
    // Two sign-ups for one address at the same moment: the loser gets the same answer.
    if ((err as { name?: string }).name === 'SequelizeUniqueConstraintError') return { status: 'check-email' };
    throw err;
  }
}

/**
 * Checks the password; throws the same 401 for an unknown e-mail and a wrong
 * password. With two-step sign-in on, the right password is only half: the
 * failure count is kept until the code is right too, so signing in again
 * with the password does not buy more guesses at the code.
 */
export async function verifyCredentials(
  input: SignInInput,
  address: string,
): Promise<{ userId: string; mfaRequired: boolean }> {
  await limiter.assertMaySignIn(input.email, address);
  const user = await users.findByEmail(input.email);
  const ok = user ? await verifyPassword(input.password, user.passwordHash) : await burnPasswordCheck(input.password);
  if (!user || !ok) {
    await limiter.recordFailure(input.email, address);
    throw new AppError('invalid-credentials', 'That e-mail and password do not match an account', 401);
  }
  const mfaRequired = user.totpEnabledAt !== null;
  if (!mfaRequired) await limiter.recordSuccess(input.email);
  return { userId: user.id, mfaRequired };
}

/** The second half of a two-step sign-in: a code from the app or a recovery code. */
export async function completeMfaSignIn(
  pending: { userId: string; email: string },
  input: { code?: string; recoveryCode?: string },
  address: string,
): Promise<{ recoveryCodesLeft?: number }> {
  const factor: SecondFactor =
    input.code !== undefined ? { kind: 'totp', value: input.code } : { kind: 'recovery', value: input.recoveryCode ?? '' };
  const outcome = await mfaService.verifySecondFactor(pending, factor, address, 401);
  await limiter.recordSuccess(pending.email);
  return outcome;
}

/**
 * The signed-in user's password, typed again before a sensitive change. A
 * wrong one counts against the sign-in limits, so a borrowed session cannot
 * be used to guess it.
 */
async function confirmPassword(userId: string, password: string, address: string) {
  const user = await users.findById(userId);
  if (!user) throw new AppError('not-signed-in', 'Sign in to continue', 401);
  await limiter.assertMaySignIn(user.email, address);
  if (!(await verifyPassword(password, user.passwordHash))) {
    await limiter.recordFailure(user.email, address);
    throw new AppError('password-incorrect', 'That is not your current password', 400);
  }
  return user;
}

/**
 * Tells the account's owner by mail that how they sign in has changed, so a
 * change they did not make does not go unnoticed (ASVS 5.0 V6.3.7).
 */
async function tellOwner(user: { email: string; displayName: string }, change: string): Promise<void> {
  const origin = config().http.origin;
  const advice = 'If this was not you, set a new password now and then sign out everywhere from your settings.';
  await queueMail({
    to: user.email,
    subject: 'Your Pourscope sign-in was changed',
    text: `Hello ${user.displayName},\n\n${change}\n\n${advice}\nSet a new password: ${origin}/forgot-password`,
    html: mailLayout({
      heading: 'Your sign-in was changed',
      paragraphs: [`Hello ${user.displayName},`, change, advice],
      action: { label: 'Set a new password', url: `${origin}/forgot-password` },
    }),
  });
}

/** Sets a new password and ends every other session of the account; `keepSessionId` stays. */
export async function changePassword(
  userId: string,
  input: PasswordChangeInput,
  address: string,
  keepSessionId: string,
): Promise<void> {
  const user = await confirmPassword(userId, input.currentPassword, address);
  const passwordHash = await hashPassword(input.newPassword, config().auth.bcryptCost);
  await withTransaction(async (tx) => {
    await users.setPasswordHash(userId, passwordHash, tx);
    await users.endSessions(userId, keepSessionId, tx);
  });
  await tellOwner(user, 'Your password was changed, and every other device was signed out.');
}

/** Ends every session of the account, wherever it is signed in. */
export async function endAllSessions(userId: string): Promise<void> {
  await users.endSessions(userId);
}

/** Starts two-step setup after the password is typed again; nothing is on until `enableMfa`. */
export async function startMfaSetup(userId: string, password: string, address: string): Promise<MfaSetup> {
  const user = await confirmPassword(userId, password, address);
  return mfaService.startSetup({ userId, email: user.email });
}

/**
 * Turns two-step sign-in on; returns the recovery codes (shown once). Other
 * sessions were signed in without a code, so they end (ASVS 5.0 V7.4.3).
 */
export async function enableMfa(userId: string, code: string, keepSessionId: string): Promise<string[]> {
  const codes = await mfaService.enable(userId, code);
  await users.endSessions(userId, keepSessionId);
  const user = await users.findById(userId);
  if (user) await tellOwner(user, 'Two-step sign-in was turned on: signing in now also asks for a code from your authenticator app.');
  return codes;
}

/** Turns two-step sign-in off with the password and a current code; other sessions end. */
export async function disableMfa(
  userId: string,
  input: { password: string; code: SecondFactor },
  address: string,
  keepSessionId: string,
): Promise<void> {
  const user = await confirmPassword(userId, input.password, address);
  await mfaService.verifySecondFactor({ userId, email: user.email }, input.code, address, 400);
  await limiter.recordSuccess(user.email);
  await mfaService.disable(userId);
  await users.endSessions(userId, keepSessionId);
  await tellOwner(user, 'Two-step sign-in was turned off: your password alone now signs you in.');
}

/** A new set of recovery codes, with the password and a current code; the old set stops working. */
export async function replaceRecoveryCodes(
  userId: string,
  input: { password: string; code: SecondFactor },
  address: string,
): Promise<string[]> {
  const user = await confirmPassword(userId, input.password, address);
  await mfaService.verifySecondFactor({ userId, email: user.email }, input.code, address, 400);
  await limiter.recordSuccess(user.email);
  const codes = await mfaService.replaceRecoveryCodes(userId);
  await tellOwner(user, 'A new set of recovery codes was made; the old ones no longer work.');
  return codes;
}

export async function updatePreferences(userId: string, input: PreferencesUpdate): Promise<CurrentUser> {
  await users.update(userId, input);
  const user = await currentUser(userId);
  if (!user) throw new AppError('not-signed-in', 'Sign in to continue', 401);
  return user;
}

/** Mails a single-use reset link when the address has an account; silent otherwise. */
export async function requestPasswordReset(email: string, address: string): Promise<void> {
  await limiter.consumeMailRequest(`reset:${email}`, `reset-ip:${address}`);
  const user = await users.findByEmail(email);
  if (!user) return;
  const token = newLinkToken();
  await resetTokens.create(user.id, hashToken(token), new Date(Date.now() + PASSWORD_RESET_LIFETIME_MS));
  const url = `${config().http.origin}/reset-password?token=${token}`;
  await queueMail({
    to: user.email,
    subject: 'Set a new Pourscope password',
    text: `Hello ${user.displayName},\n\nOpen this link within an hour to set a new password:\n${url}\n\nThe link works once. If you did not ask for it, ignore this mail; your password stays as it is.`,
    html: mailLayout({
      heading: 'Set a new password',
      paragraphs: [
        `Hello ${user.displayName},`,
        'Open the link below within an hour to set a new password. It works once.',
        'If you did not ask for this, ignore the mail; your password stays as it is.',
      ],
      action: { label: 'Set a new password', url },
    }),
  });
}

/** Uses the token once, sets the password and ends every session of the account. */
export async function confirmPasswordReset(input: PasswordResetConfirm): Promise<void> {
  const passwordHash = await hashPassword(input.password, config().auth.bcryptCost);
  await withTransaction(async (tx) => {
    const userId = await resetTokens.consume(hashToken(input.token), tx);
    if (!userId) {
      throw new AppError('token-invalid', 'This link has expired or was already used. Ask for a new one.', 400);
    }
    await users.setPasswordHash(userId, passwordHash, tx);
    await users.endSessions(userId, undefined, tx);
  });
}
