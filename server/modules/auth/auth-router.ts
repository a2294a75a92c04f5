import { Router } from 'express';
import {
  passwordChangeSchema,
  passwordResetConfirmSchema,
  passwordResetRequestSchema,
  preferencesUpdateSchema,
  signInInputSchema,
  signUpInputSchema,
} from '../../../shared/auth/auth-schemas.ts';
import {
  mfaConfirmInputSchema,
  mfaEnableInputSchema,
  mfaSetupInputSchema,
  signInMfaInputSchema,
} from '../../../shared/auth/mfa-schemas.ts';
import { AppError } from '../../lib/app-error.ts';
import { withPasswordPolicy } from '../../lib/password-policy.ts';
import { csrfToken } from '../../middleware/csrf.ts';
import { requireUser } from '../../middleware/require-user.ts';
import * as authService from './auth-service.ts';
import { SESSION_COOKIE } from './session-cookie.ts';
import { destroySession, pendingMfa, renewSession, signInSession, startMfaChallenge } from './session.ts';

export const authRouter = Router();

// Every route that sets a password also refuses the common ones.
const signUpBodySchema = withPasswordPolicy(signUpInputSchema, ['password']);
const resetConfirmBodySchema = withPasswordPolicy(passwordResetConfirmSchema, ['password']);
const passwordChangeBodySchema = withPasswordPolicy(passwordChangeSchema, ['newPassword']);

authRouter.get('/auth/me', async (req, res) => {
  const user = req.session.userId ? await authService.currentUser(req.session.userId) : null;
  res.json({ user, csrfToken: csrfToken(req) });
});

authRouter.post('/auth/sign-up', async (req, res) => {
  const input = signUpBodySchema.parse(req.body);
  const outcome = await authService.signUp(input, req.ip ?? '');
  if ('status' in outcome) {
    res.status(202).json(outcome);
    return;
  }
  const token = await signInSession(req, outcome.userId);
  res.status(201).json({ user: await authService.currentUser(outcome.userId), csrfToken: token });
});

authRouter.post('/auth/sign-in', async (req, res) => {
  const input = signInInputSchema.parse(req.body);
  const { userId, mfaRequired } = await authService.verifyCredentials(input, req.ip ?? '');
  if (mfaRequired) {
    const token = await startMfaChallenge(req, { userId, email: input.email });
    res.json({ mfaRequired: true, csrfToken: token });
    return;
  }
  const token = await signInSession(req, userId);
  res.json({ user: await authService.currentUser(userId), csrfToken: token });
});

authRouter.post('/auth/sign-in/mfa', async (req, res) => {
  const input = signInMfaInputSchema.parse(req.body);
  const pending = pendingMfa(req);
  if (!pending) {
    throw new AppError('mfa-expired', 'The time for the code ran out, or sign-in was not started. Sign in again.', 401);
  }
  const outcome = await authService.completeMfaSignIn(pending, input, req.ip ?? '');
  const token = await signInSession(req, pending.userId);
  res.json({ user: await authService.currentUser(pending.userId), csrfToken: token, ...outcome });
});

authRouter.post('/auth/sign-out', async (req, res) => {
  await destroySession(req);
  res.clearCookie(SESSION_COOKIE, { path: '/' });
  res.status(204).end();
});

authRouter.post('/auth/sign-out-everywhere', requireUser, async (req, res) => {
  await authService.endAllSessions(res.locals.userId);
  await destroySession(req);
  res.clearCookie(SESSION_COOKIE, { path: '/' });
  res.status(204).end();
});

authRouter.patch('/auth/me', requireUser, async (req, res) => {
  const input = preferencesUpdateSchema.parse(req.body);
  res.json(await authService.updatePreferences(res.locals.userId as string, input));
});

authRouter.post('/auth/password', requireUser, async (req, res) => {
  const input = passwordChangeBodySchema.parse(req.body);
  await authService.changePassword(res.locals.userId, input, req.ip ?? '', req.sessionID);
  // This session stays signed in, under a new id; the client fetches the new CSRF token.
  await renewSession(req);
  res.status(204).end();
});

authRouter.post('/auth/password-reset', async (req, res) => {
  const { email } = passwordResetRequestSchema.parse(req.body);
  await authService.requestPasswordReset(email, req.ip ?? '');
  res.status(202).json({});
});

authRouter.post('/auth/password-reset/confirm', async (req, res) => {
  const input = resetConfirmBodySchema.parse(req.body);
  await authService.confirmPasswordReset(input);
  res.status(204).end();
});

authRouter.post('/auth/mfa/setup', requireUser, async (req, res) => {
  const { password } = mfaSetupInputSchema.parse(req.body);
  res.json(await authService.startMfaSetup(res.locals.userId, password, req.ip ?? ''));
});

authRouter.post('/auth/mfa/enable', requireUser, async (req, res) => {
  const { code } = mfaEnableInputSchema.parse(req.body);
  res.json({ recoveryCodes: await authService.enableMfa(res.locals.userId, code, req.sessionID) });
});

authRouter.post('/auth/mfa/disable', requireUser, async (req, res) => {
  const input = mfaConfirmInputSchema.parse(req.body);
  await authService.disableMfa(res.locals.userId, input, req.ip ?? '', req.sessionID);
  res.status(204).end();
});

authRouter.post('/auth/mfa/recovery-codes', requireUser, async (req, res) => {
  const input = mfaConfirmInputSchema.parse(req.body);
  res.json({ recoveryCodes: await authService.replaceRecoveryCodes(res.locals.userId, input, req.ip ?? '') });
});
