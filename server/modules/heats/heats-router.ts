import { Router } from 'express';
import { furnaceParamsSchema, mouldParamsSchema } from '../../../shared/heats/equipment-schemas.ts';
import { heatImportSchema } from '../../../shared/heats/heat-csv.ts';
import {
  castingCreateSchema,
  castingParamsSchema,
  castingUpdateSchema,
  chargePlanQuerySchema,
  heatCreateSchema,
  heatDefaultsQuerySchema,
  heatFilterSchema,
  heatListQuerySchema,
  heatParamsSchema,
  heatUpdateSchema,
  setpointQuerySchema,
} from '../../../shared/heats/heat-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as heatsCsvService from './heats-csv-service.ts';
import * as heatsService from './heats-service.ts';

export const heatsRouter = Router();
const base = '/workshops/:workshopId';

// Fixed paths before /heats/:heatId, which would refuse them as bad ids.

heatsRouter.get(`${base}/heats`, requireMember, async (req, res) => {
  const query = heatListQuerySchema.parse(req.query);
  res.json(await heatsService.listHeats(res.locals.actor, res.locals.workshopId, query));
});

heatsRouter.get(`${base}/heats.csv`, requireMember, async (req, res) => {
  const filter = heatFilterSchema.parse(req.query);
  const csv = await heatsCsvService.exportCsv(res.locals.actor, res.locals.workshopId, filter);
  res.setHeader('Content-Type', 'text/csv; charset=utf-8; header=present');
  res.setHeader('Content-Disposition', `attachment; filename="heats-${new Date().toISOString().slice(0, 10)}.csv"`);
  res.send(csv);
});

heatsRouter.post(`${base}/heats/import`, requireMember, async (req, res) => {
  const input = heatImportSchema.parse(req.body);
  const result = await heatsCsvService.importCsv(res.locals.actor, res.locals.workshopId, input);
  if (!result.dryRun && result.errors.length) {
    const rows = new Set(result.errors.map((e) => e.row)).size;
    res.status(422).json({
      error: { code: 'import-rejected', message: `${rows} row${rows === 1 ? ' has' : 's have'} problems; nothing was imported` },
      ...result,
    });
    return;
  }
  res.status(result.dryRun ? 200 : 201).json(result);
});

heatsRouter.get(`${base}/heats/last-defaults`, requireMember, async (req, res) => {
  const { casterId } = heatDefaultsQuerySchema.parse(req.query);
  res.json(await heatsService.lastDefaults(res.locals.actor, res.locals.workshopId, casterId));
});

heatsRouter.post(`${base}/heats`, requireMember, async (req, res) => {
  const input = heatCreateSchema.parse(req.body);
  res.status(201).json(await heatsService.createHeat(res.locals.actor, res.locals.workshopId, input));
});

heatsRouter.get(`${base}/heats/:heatId`, requireMember, async (req, res) => {
  const { heatId } = heatParamsSchema.parse(req.params);
  res.json(await heatsService.getHeat(res.locals.actor, res.locals.workshopId, heatId));
});

heatsRouter.patch(`${base}/heats/:heatId`, requireMember, async (req, res) => {
  const { heatId } = heatParamsSchema.parse(req.params);
  const input = heatUpdateSchema.parse(req.body);
  res.json(await heatsService.updateHeat(res.locals.actor, res.locals.workshopId, heatId, input));
});

heatsRouter.delete(`${base}/heats/:heatId`, requireMember, async (req, res) => {
  const { heatId } = heatParamsSchema.parse(req.params);
  await heatsService.deleteHeat(res.locals.actor, res.locals.workshopId, heatId);
  res.status(204).end();
});

heatsRouter.post(`${base}/heats/:heatId/castings`, requireMember, async (req, res) => {
  const { heatId } = heatParamsSchema.parse(req.params);
  const input = castingCreateSchema.parse(req.body);
  res.status(201).json(await heatsService.addCasting(res.locals.actor, res.locals.workshopId, heatId, input));
});

heatsRouter.patch(`${base}/castings/:castingId`, requireMember, async (req, res) => {
  const { castingId } = castingParamsSchema.parse(req.params);
  const input = castingUpdateSchema.parse(req.body);
  res.json(await heatsService.updateCasting(res.locals.actor, res.locals.workshopId, castingId, input));
});

heatsRouter.delete(`${base}/castings/:castingId`, requireMember, async (req, res) => {
  const { castingId } = castingParamsSchema.parse(req.params);
  await heatsService.deleteCasting(res.locals.actor, res.locals.workshopId, castingId);
  res.status(204).end();
});

heatsRouter.get(`${base}/furnaces/:furnaceId/setpoint`, requireMember, async (req, res) => {
  const { furnaceId } = furnaceParamsSchema.parse(req.params);
  const { targetC } = setpointQuerySchema.parse(req.query);
  res.json(await heatsService.setpointAdvice(res.locals.actor, res.locals.workshopId, furnaceId, targetC));
});

heatsRouter.get(`${base}/moulds/:mouldId/charge-plan`, requireMember, async (req, res) => {
  const { mouldId } = mouldParamsSchema.parse(req.params);
  const query = chargePlanQuerySchema.parse(req.query);
  res.json(await heatsService.chargePlan(res.locals.actor, res.locals.workshopId, mouldId, query));
});
