import { Router } from 'express';
import {
  ruleCreateSchema,
  ruleOverrideSchema,
  ruleParamsSchema,
  rulePreviewRequestSchema,
} from '../../../shared/reports/workshop-rule-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as rulesService from './rules-service.ts';

export const rulesRouter = Router();
const base = '/workshops/:workshopId';

rulesRouter.get(`${base}/rules`, requireMember, async (_req, res) => {
  res.json(await rulesService.listRules(res.locals.actor, res.locals.workshopId));
});

rulesRouter.post(`${base}/rules/preview`, requireMember, async (req, res) => {
  const input = rulePreviewRequestSchema.parse(req.body);
  res.json(await rulesService.previewRule(res.locals.actor, res.locals.workshopId, input));
});

rulesRouter.post(`${base}/rules`, requireMember, async (req, res) => {
  const rule = ruleCreateSchema.parse(req.body);
  res.status(201).json(await rulesService.createRule(res.locals.actor, res.locals.workshopId, rule));
});

rulesRouter.patch(`${base}/rules/:ruleId`, requireMember, async (req, res) => {
  const { ruleId } = ruleParamsSchema.parse(req.params);
  const input = ruleOverrideSchema.parse(req.body);
  res.json(await rulesService.updateRule(res.locals.actor, res.locals.workshopId, ruleId, input));
});

rulesRouter.delete(`${base}/rules/:ruleId`, requireMember, async (req, res) => {
  const { ruleId } = ruleParamsSchema.parse(req.params);
  await rulesService.deleteRule(res.locals.actor, res.locals.workshopId, ruleId);
  res.status(204).end();
});
