import { Router } from 'express';
import {
  candidateQuerySchema,
  hardnessCreateSchema,
  hardnessParamsSchema,
  heatTreatmentCreateSchema,
  heatTreatmentListQuerySchema,
  heatTreatmentParamsSchema,
  heatTreatmentPhotoCreateSchema,
  heatTreatmentPhotoParamsSchema,
  heatTreatmentUpdateSchema,
  stepsActualUpdateSchema,
} from '../../../shared/heat-treatment/heat-treatment-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as service from './heat-treatment-service.ts';

export const heatTreatmentRouter = Router();
const base = '/workshops/:workshopId/heat-treatments';

// Fixed paths before /:heatTreatmentId, which would refuse them as bad ids.

heatTreatmentRouter.get(base, requireMember, async (req, res) => {
  const query = heatTreatmentListQuerySchema.parse(req.query);
  res.json(await service.listPlans(res.locals.actor, res.locals.workshopId, query));
});

heatTreatmentRouter.get(`${base}/candidates`, requireMember, async (req, res) => {
  const { alloy } = candidateQuerySchema.parse(req.query);
  res.json(await service.candidates(res.locals.actor, res.locals.workshopId, alloy));
});

heatTreatmentRouter.post(base, requireMember, async (req, res) => {
  const input = heatTreatmentCreateSchema.parse(req.body);
  res.status(201).json(await service.createPlan(res.locals.actor, res.locals.workshopId, input));
});

heatTreatmentRouter.get(`${base}/:heatTreatmentId`, requireMember, async (req, res) => {
  const { heatTreatmentId } = heatTreatmentParamsSchema.parse(req.params);
  res.json(await service.getPlan(res.locals.actor, res.locals.workshopId, heatTreatmentId));
});

heatTreatmentRouter.patch(`${base}/:heatTreatmentId`, requireMember, async (req, res) => {
  const { heatTreatmentId } = heatTreatmentParamsSchema.parse(req.params);
  const input = heatTreatmentUpdateSchema.parse(req.body);
  res.json(await service.updatePlan(res.locals.actor, res.locals.workshopId, heatTreatmentId, input));
});

heatTreatmentRouter.delete(`${base}/:heatTreatmentId`, requireMember, async (req, res) => {
  const { heatTreatmentId } = heatTreatmentParamsSchema.parse(req.params);
  await service.deletePlan(res.locals.actor, res.locals.workshopId, heatTreatmentId);
  res.status(204).end();
});

heatTreatmentRouter.patch(`${base}/:heatTreatmentId/steps`, requireMember, async (req, res) => {
  const { heatTreatmentId } = heatTreatmentParamsSchema.parse(req.params);
  const input = stepsActualUpdateSchema.parse(req.body);
  res.json(await service.recordSteps(res.locals.actor, res.locals.workshopId, heatTreatmentId, input));
});

heatTreatmentRouter.post(`${base}/:heatTreatmentId/hardness`, requireMember, async (req, res) => {
  const { heatTreatmentId } = heatTreatmentParamsSchema.parse(req.params);
  const input = hardnessCreateSchema.parse(req.body);
  res.status(201).json(await service.addHardness(res.locals.actor, res.locals.workshopId, heatTreatmentId, input));
});

heatTreatmentRouter.delete(`${base}/:heatTreatmentId/hardness/:readingId`, requireMember, async (req, res) => {
  const { heatTreatmentId, readingId } = hardnessParamsSchema.parse(req.params);
  await service.removeHardness(res.locals.actor, res.locals.workshopId, heatTreatmentId, readingId);
  res.status(204).end();
});

heatTreatmentRouter.post(`${base}/:heatTreatmentId/photos`, requireMember, async (req, res) => {
  const { heatTreatmentId } = heatTreatmentParamsSchema.parse(req.params);
  const { photoId } = heatTreatmentPhotoCreateSchema.parse(req.body);
  res.status(201).json(await service.addPhoto(res.locals.actor, res.locals.workshopId, heatTreatmentId, photoId));
});

heatTreatmentRouter.delete(`${base}/:heatTreatmentId/photos/:photoId`, requireMember, async (req, res) => {
  const { heatTreatmentId, photoId } = heatTreatmentPhotoParamsSchema.parse(req.params);
  await service.removePhoto(res.locals.actor, res.locals.workshopId, heatTreatmentId, photoId);
  res.status(204).end();
});
