import { Router } from 'express';
import {
  commentCreateSchema,
  commentParamsSchema,
  commentUpdateSchema,
  photoCommentsParamsSchema,
  reportCommentsParamsSchema,
} from '../../../shared/reports/comment-schemas.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as commentsService from './comments-service.ts';

export const commentsRouter = Router();
const base = '/workshops/:workshopId';

commentsRouter.get(`${base}/reports/:reportId/comments`, requireMember, async (req, res) => {
  const { reportId } = reportCommentsParamsSchema.parse(req.params);
  res.json(await commentsService.listComments(res.locals.actor, res.locals.workshopId, reportId));
});

commentsRouter.post(`${base}/reports/:reportId/comments`, requireMember, async (req, res) => {
  const { reportId } = reportCommentsParamsSchema.parse(req.params);
  const input = commentCreateSchema.parse(req.body);
  res.status(201).json(await commentsService.createComment(res.locals.actor, res.locals.workshopId, reportId, input));
});

commentsRouter.patch(`${base}/comments/:commentId`, requireMember, async (req, res) => {
  const { commentId } = commentParamsSchema.parse(req.params);
  const input = commentUpdateSchema.parse(req.body);
  res.json(await commentsService.updateComment(res.locals.actor, res.locals.workshopId, commentId, input));
});

commentsRouter.get(`${base}/photos/:photoId/comments`, requireMember, async (req, res) => {
  const { photoId } = photoCommentsParamsSchema.parse(req.params);
  res.json(await commentsService.photoComments(res.locals.actor, res.locals.workshopId, photoId));
});
