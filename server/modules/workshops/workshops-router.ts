import { Router } from 'express';
import {
  memberParamsSchema,
  memberUpdateSchema,
  workshopCreateSchema,
  workshopUpdateSchema,
} from '../../../shared/workshops/workshop-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import { requireUser } from '../../middleware/require-user.ts';
import * as workshopsService from './workshops-service.ts';

export const workshopsRouter = Router();

workshopsRouter.get('/workshops', requireUser, async (_req, res) => {
  res.json(await workshopsService.listWorkshops(res.locals.userId));
});

workshopsRouter.post('/workshops', requireUser, async (req, res) => {
  const input = workshopCreateSchema.parse(req.body);
  res.status(201).json(await workshopsService.createWorkshop(res.locals.userId, input));
});

workshopsRouter.patch('/workshops/:workshopId', requireMember, async (req, res) => {
  const input = workshopUpdateSchema.parse(req.body);
  res.json(await workshopsService.updateWorkshop(res.locals.actor, res.locals.workshopId, input));
});

workshopsRouter.get('/workshops/:workshopId/members', requireMember, async (_req, res) => {
  res.json(await workshopsService.listMembers(res.locals.actor, res.locals.workshopId));
});

workshopsRouter.post('/workshops/:workshopId/members', requireMember, async (req, res) => {
  const input = memberUpdateSchema.parse(req.body);
  res.json(await workshopsService.updateMember(res.locals.actor, res.locals.workshopId, input));
});

workshopsRouter.delete('/workshops/:workshopId/members/:userId', requireMember, async (req, res) => {
  const { userId } = memberParamsSchema.parse(req.params);
  await workshopsService.removeMember(res.locals.actor, res.locals.workshopId, userId);
  res.status(204).end();
});
