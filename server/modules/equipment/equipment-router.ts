import { Router } from 'express';
import {
  crucibleCreateSchema,
  crucibleLimitsUpdateSchema,
  crucibleNoteCreateSchema,
  crucibleParamsSchema,
  crucibleUpdateSchema,
  furnaceCreateSchema,
  furnaceParamsSchema,
  furnaceUpdateSchema,
  mouldCreateSchema,
  mouldParamsSchema,
  mouldUpdateSchema,
} from '../../../shared/heats/equipment-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as equipmentService from './equipment-service.ts';

export const equipmentRouter = Router();
const base = '/workshops/:workshopId';

// ── furnaces ────────────────────────────────────────────────────────────────

equipmentRouter.get(`${base}/furnaces`, requireMember, async (_req, res) => {
  res.json(await equipmentService.listFurnaces(res.locals.actor, res.locals.workshopId));
});

equipmentRouter.post(`${base}/furnaces`, requireMember, async (req, res) => {
  const input = furnaceCreateSchema.parse(req.body);
  res.status(201).json(await equipmentService.createFurnace(res.locals.actor, res.locals.workshopId, input));
});

equipmentRouter.get(`${base}/furnaces/:furnaceId`, requireMember, async (req, res) => {
  const { furnaceId } = furnaceParamsSchema.parse(req.params);
  res.json(await equipmentService.getFurnace(res.locals.actor, res.locals.workshopId, furnaceId));
});

equipmentRouter.patch(`${base}/furnaces/:furnaceId`, requireMember, async (req, res) => {
  const { furnaceId } = furnaceParamsSchema.parse(req.params);
  const input = furnaceUpdateSchema.parse(req.body);
  res.json(await equipmentService.updateFurnace(res.locals.actor, res.locals.workshopId, furnaceId, input));
});

equipmentRouter.delete(`${base}/furnaces/:furnaceId`, requireMember, async (req, res) => {
  const { furnaceId } = furnaceParamsSchema.parse(req.params);
  await equipmentService.deleteFurnace(res.locals.actor, res.locals.workshopId, furnaceId);
  res.status(204).end();
});

// ── crucibles ───────────────────────────────────────────────────────────────

equipmentRouter.get(`${base}/crucibles`, requireMember, async (_req, res) => {
  res.json(await equipmentService.listCrucibles(res.locals.actor, res.locals.workshopId));
});

equipmentRouter.post(`${base}/crucibles`, requireMember, async (req, res) => {
  const input = crucibleCreateSchema.parse(req.body);
  res.status(201).json(await equipmentService.createCrucible(res.locals.actor, res.locals.workshopId, input));
});

equipmentRouter.get(`${base}/crucible-limits`, requireMember, async (_req, res) => {
  res.json(await equipmentService.getCrucibleLimits(res.locals.actor, res.locals.workshopId));
});

equipmentRouter.put(`${base}/crucible-limits`, requireMember, async (req, res) => {
  const input = crucibleLimitsUpdateSchema.parse(req.body);
  res.json(await equipmentService.putCrucibleLimits(res.locals.actor, res.locals.workshopId, input));
});

equipmentRouter.get(`${base}/crucibles/:crucibleId`, requireMember, async (req, res) => {
  const { crucibleId } = crucibleParamsSchema.parse(req.params);
  res.json(await equipmentService.getCrucible(res.locals.actor, res.locals.workshopId, crucibleId));
});

equipmentRouter.patch(`${base}/crucibles/:crucibleId`, requireMember, async (req, res) => {
  const { crucibleId } = crucibleParamsSchema.parse(req.params);
  const input = crucibleUpdateSchema.parse(req.body);
  res.json(await equipmentService.updateCrucible(res.locals.actor, res.locals.workshopId, crucibleId, input));
});

equipmentRouter.delete(`${base}/crucibles/:crucibleId`, requireMember, async (req, res) => {
  const { crucibleId } = crucibleParamsSchema.parse(req.params);
  await equipmentService.deleteCrucible(res.locals.actor, res.locals.workshopId, crucibleId);
  res.status(204).end();
});

equipmentRouter.post(`${base}/crucibles/:crucibleId/notes`, requireMember, async (req, res) => {
  const { crucibleId } = crucibleParamsSchema.parse(req.params);
  const input = crucibleNoteCreateSchema.parse(req.body);
  res.status(201).json(await equipmentService.addCrucibleNote(res.locals.actor, res.locals.workshopId, crucibleId, input));
});

// ── moulds ──────────────────────────────────────────────────────────────────

equipmentRouter.get(`${base}/moulds`, requireMember, async (_req, res) => {
  res.json(await equipmentService.listMoulds(res.locals.actor, res.locals.workshopId));
});

equipmentRouter.post(`${base}/moulds`, requireMember, async (req, res) => {
  const input = mouldCreateSchema.parse(req.body);
  res.status(201).json(await equipmentService.createMould(res.locals.actor, res.locals.workshopId, input));
});

equipmentRouter.get(`${base}/moulds/:mouldId`, requireMember, async (req, res) => {
  const { mouldId } = mouldParamsSchema.parse(req.params);
  res.json(await equipmentService.getMould(res.locals.actor, res.locals.workshopId, mouldId));
});

equipmentRouter.patch(`${base}/moulds/:mouldId`, requireMember, async (req, res) => {
  const { mouldId } = mouldParamsSchema.parse(req.params);
  const input = mouldUpdateSchema.parse(req.body);
  res.json(await equipmentService.updateMould(res.locals.actor, res.locals.workshopId, mouldId, input));
});

equipmentRouter.delete(`${base}/moulds/:mouldId`, requireMember, async (req, res) => {
  const { mouldId } = mouldParamsSchema.parse(req.params);
  await equipmentService.deleteMould(res.locals.actor, res.locals.workshopId, mouldId);
  res.status(204).end();
});
