import type { RequestHandler } from 'express';
import { workshopIdParamsSchema } from '../../shared/workshops/workshop-schemas.ts';
import { AppError } from '../lib/app-error.ts';
import { memberActor } from '../modules/workshops/workshops-service.ts';

/**
 * For routes under /workshops/:workshopId: the signed-in user must be a
 * member (and, where the workshop requires it of mentors and admins, have
 * two-step sign-in on). Sets res.locals.userId, res.locals.actor
 * ({ id, role }) and res.locals.workshopId for the handler.
 */
export const requireMember: RequestHandler = async (req, res, next) => {
  const userId = req.session.userId;
  if (!userId) throw new AppError('not-signed-in', 'Sign in to continue', 401);
  const { workshopId } = workshopIdParamsSchema.parse({ workshopId: req.params.workshopId });
  res.locals.userId = userId;
  res.locals.actor = await memberActor(workshopId, userId);
  res.locals.workshopId = workshopId;
  next();
};
