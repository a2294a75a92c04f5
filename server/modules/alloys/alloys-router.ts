import { Router } from 'express';
import {
  workshopAlloyCreateSchema,
  workshopAlloyParamsSchema,
  workshopAlloyUpdateSchema,
} from '../../../shared/alloys/alloy-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as alloysService from './alloys-service.ts';

export const alloysRouter = Router();
const base = '/workshops/:workshopId/alloys';

alloysRouter.get(base, requireMember, async (_req, res) => {
  res.json(await alloysService.listAlloys(res.locals.actor, res.locals.workshopId));
});

alloysRouter.post(base, requireMember, async (req, res) => {
  const input = workshopAlloyCreateSchema.parse(req.body);
  res.status(201).json(await alloysService.createAlloy(res.locals.actor, res.locals.workshopId, input));
});

alloysRouter.patch(`${base}/:alloyId`, requireMember, async (req, res) => {
  const { alloyId } = workshopAlloyParamsSchema.parse(req.params);
  const input = workshopAlloyUpdateSchema.parse(req.body);
  res.json(await alloysService.updateAlloy(res.locals.actor, res.locals.workshopId, alloyId, input));
});

alloysRouter.delete(`${base}/:alloyId`, requireMember, async (req, res) => {
  const { alloyId } = workshopAlloyParamsSchema.parse(req.params);
  await alloysService.deleteAlloy(res.locals.actor, res.locals.workshopId, alloyId);
  res.status(204).end();
});
