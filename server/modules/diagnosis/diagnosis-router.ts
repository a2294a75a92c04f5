import { Router } from 'express';
import { castingParamsSchema } from '../../../shared/heats/heat-schemas.ts';
import {
  diagnosisRequestSchema,
  quickCheckCreateSchema,
  quickCheckQuestionsQuerySchema,
} from '../../../shared/reports/diagnosis-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as diagnosisService from './diagnosis-service.ts';

export const diagnosisRouter = Router();
const base = '/workshops/:workshopId';

diagnosisRouter.post(`${base}/diagnosis`, requireMember, async (req, res) => {
  const input = diagnosisRequestSchema.parse(req.body);
  res.json(await diagnosisService.whatIf(res.locals.actor, res.locals.workshopId, input));
});

diagnosisRouter.get(`${base}/castings/:castingId/diagnosis`, requireMember, async (req, res) => {
  const { castingId } = castingParamsSchema.parse(req.params);
  res.json(await diagnosisService.castingDiagnosis(res.locals.actor, res.locals.workshopId, castingId));
});

diagnosisRouter.post(`${base}/quick-checks`, requireMember, async (req, res) => {
  const input = quickCheckCreateSchema.parse(req.body);
  res.status(201).json(await diagnosisService.createQuickCheck(res.locals.actor, res.locals.workshopId, input));
});

diagnosisRouter.get(`${base}/quick-check-questions`, requireMember, async (req, res) => {
  const { kinds } = quickCheckQuestionsQuerySchema.parse(req.query);
  res.json(await diagnosisService.questionsFor(res.locals.actor, res.locals.workshopId, kinds));
});
