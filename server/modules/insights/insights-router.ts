import { Router } from 'express';
import {
  insightFilterSchema,
  mouldPreheatBandQuerySchema,
  pourBandQuerySchema,
} from '../../../shared/insights/insight-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as insightsService from './insights-service.ts';

export const insightsRouter = Router();
const base = '/workshops/:workshopId/insights';

insightsRouter.get(`${base}/defect-frequency`, requireMember, async (req, res) => {
  const filter = insightFilterSchema.parse(req.query);
  res.json(await insightsService.defectFrequency(res.locals.actor, res.locals.workshopId, filter));
});

insightsRouter.get(`${base}/defect-rate-by-pour-band`, requireMember, async (req, res) => {
  const query = pourBandQuerySchema.parse(req.query);
  res.json(await insightsService.defectRateByPourBand(res.locals.actor, res.locals.workshopId, query));
});

insightsRouter.get(`${base}/defect-rate-by-mould-preheat-band`, requireMember, async (req, res) => {
  const query = mouldPreheatBandQuerySchema.parse(req.query);
  res.json(await insightsService.defectRateByMouldPreheatBand(res.locals.actor, res.locals.workshopId, query));
});

insightsRouter.get(`${base}/yield-trend`, requireMember, async (req, res) => {
  const filter = insightFilterSchema.parse(req.query);
  res.json(await insightsService.yieldTrend(res.locals.actor, res.locals.workshopId, filter));
});

insightsRouter.get(`${base}/crucible-cycles`, requireMember, async (req, res) => {
  const filter = insightFilterSchema.parse(req.query);
  res.json(await insightsService.crucibleCycles(res.locals.actor, res.locals.workshopId, filter));
});

insightsRouter.get(`${base}/furnace-offset`, requireMember, async (req, res) => {
  const filter = insightFilterSchema.parse(req.query);
  res.json(await insightsService.furnaceOffset(res.locals.actor, res.locals.workshopId, filter));
});
