import { withTransaction } from '../../server/db/sequelize.ts';
import * as heatsRepository from '../../server/modules/heats/heats-repository.ts';
import { castingCreateSchema } from '../../shared/heats/heat-schemas.ts';
import { insertHeat } from './heats.ts';

/** A heat of `casterId` with one casting; returns both ids. */
export async function insertCasting(workshopId: string, casterId: string, overrides: { massG?: number } = {}) {
  const heat = await insertHeat({ workshopId, casterId });
  const casting = castingCreateSchema.parse({ massG: overrides.massG ?? 640 });
  const castingId = await withTransaction((tx) => heatsRepository.insertCasting(workshopId, heat.id, casting, tx));
  return { heatId: heat.id, castingId };
}
