import { Router } from 'express';
import {
  followUpHeatSchema,
  reportCreateSchema,
  reportListQuerySchema,
  reportParamsSchema,
  reportTransitionSchema,
  reportUpdateSchema,
  studentParamsSchema,
} from '../../../shared/reports/report-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as reportsService from './reports-service.ts';

export const reportsRouter = Router();
const base = '/workshops/:workshopId';

reportsRouter.get(`${base}/reports`, requireMember, async (req, res) => {
  const query = reportListQuerySchema.parse(req.query);
  res.json(await reportsService.listReports(res.locals.actor, res.locals.workshopId, query));
});

reportsRouter.post(`${base}/reports`, requireMember, async (req, res) => {
  const input = reportCreateSchema.parse(req.body);
  res.status(201).json(await reportsService.createReport(res.locals.actor, res.locals.workshopId, input));
});

reportsRouter.get(`${base}/reports/:reportId`, requireMember, async (req, res) => {
  const { reportId } = reportParamsSchema.parse(req.params);
  res.json(await reportsService.getReport(res.locals.actor, res.locals.workshopId, reportId));
});

reportsRouter.patch(`${base}/reports/:reportId`, requireMember, async (req, res) => {
  const { reportId } = reportParamsSchema.parse(req.params);
  const input = reportUpdateSchema.parse(req.body);
  res.json(await reportsService.updateDraft(res.locals.actor, res.locals.workshopId, reportId, input));
});

reportsRouter.post(`${base}/reports/:reportId/transitions`, requireMember, async (req, res) => {
  const { reportId } = reportParamsSchema.parse(req.params);
  const input = reportTransitionSchema.parse(req.body);
  res.json(await reportsService.transition(res.locals.actor, res.locals.workshopId, reportId, input));
});

reportsRouter.put(`${base}/reports/:reportId/follow-up-heat`, requireMember, async (req, res) => {
  const { reportId } = reportParamsSchema.parse(req.params);
  const input = followUpHeatSchema.parse(req.body);
  res.json(await reportsService.linkFollowUp(res.locals.actor, res.locals.workshopId, reportId, input));
});

reportsRouter.get(`${base}/review-queue`, requireMember, async (_req, res) => {
  res.json(await reportsService.reviewQueue(res.locals.actor, res.locals.workshopId));
});

reportsRouter.get(`${base}/students/:userId/overview`, requireMember, async (req, res) => {
  const { userId } = studentParamsSchema.parse(req.params);
  res.json(await reportsService.studentOverview(res.locals.actor, res.locals.workshopId, userId));
});
