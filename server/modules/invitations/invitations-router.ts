import { Router } from 'express';
import {
  invitationAcceptSchema,
  invitationCreateSchema,
  invitationTokenParamsSchema,
} from '../../../shared/workshops/workshop-schemas.ts';
import { withPasswordPolicy } from '../../lib/password-policy.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as authService from '../auth/auth-service.ts';
import { signInSession } from '../auth/session.ts';
import * as invitationsService from './invitations-service.ts';

export const invitationsRouter = Router();

// A new account made by accepting gets the same password policy as sign-up.
const acceptBodySchema = withPasswordPolicy(invitationAcceptSchema, ['password']);

invitationsRouter.get('/workshops/:workshopId/invitations', requireMember, async (_req, res) => {
  res.json(await invitationsService.listInvitations(res.locals.actor, res.locals.workshopId));
});

invitationsRouter.post('/workshops/:workshopId/invitations', requireMember, async (req, res) => {
  const input = invitationCreateSchema.parse(req.body);
  res.status(201).json(await invitationsService.invite(res.locals.actor, res.locals.workshopId, input));
});

invitationsRouter.get('/invitations/:token', async (req, res) => {
  const { token } = invitationTokenParamsSchema.parse(req.params);
  res.json(await invitationsService.preview(token));
});

invitationsRouter.post('/invitations/:token/accept', async (req, res) => {
  const { token } = invitationTokenParamsSchema.parse(req.params);
  const input = acceptBodySchema.parse(req.body ?? {});
  const { userId, workshopId } = await invitationsService.accept(token, req.session.userId, input);
  const csrfToken = await signInSession(req, userId);
  res.json({ user: await authService.currentUser(userId), csrfToken, workshopId });
});
