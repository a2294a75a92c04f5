import { Router } from 'express';
import {
  passwordResetConfirmSchema,
  passwordResetRequestSchema,
  preferencesUpdateSchema,
  signInInputSchema,
  signUpInputSchema,
} from '../../../shared/auth/auth-schemas.ts';
import { csrfToken } from '../../middleware/csrf.ts';
import { requireUser } from '../../middleware/require-user.ts';
import * as authService from './auth-service.ts';
import { SESSION_COOKIE } from './session-cookie.ts';
import { destroySession, signInSession } from './session.ts';

export const authRouter = Router();

authRouter.get('/auth/me', async (req, res) => {
  const user = req.session.userId ? await authService.currentUser(req.session.userId) : null;
  res.json({ user, csrfToken: csrfToken(req) });
});

authRouter.post('/auth/sign-up', async (req, res) => {
  const input = signUpInputSchema.parse(req.body);
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
  const userId = await authService.verifyCredentials(input, req.ip ?? '');
  const token = await signInSession(req, userId);
  res.json({ user: await authService.currentUser(userId), csrfToken: token });
});

authRouter.post('/auth/sign-out', async (req, res) => {
  await destroySession(req);
  res.clearCookie(SESSION_COOKIE, { path: '/' });
  res.status(204).end();
});

authRouter.patch('/auth/me', requireUser, async (req, res) => {
  const input = preferencesUpdateSchema.parse(req.body);
  res.json(await authService.updatePreferences(res.locals.userId as string, input));
});

authRouter.post('/auth/password-reset', async (req, res) => {
  const { email } = passwordResetRequestSchema.parse(req.body);
  await authService.requestPasswordReset(email, req.ip ?? '');
  res.status(202).json({});
});

authRouter.post('/auth/password-reset/confirm', async (req, res) => {
  const input = passwordResetConfirmSchema.parse(req.body);
  await authService.confirmPasswordReset(input);
  res.status(204).end();
});
