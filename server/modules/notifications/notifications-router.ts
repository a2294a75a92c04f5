import { Router } from 'express';
import {
  notificationListQuerySchema,
  notificationParamsSchema,
  notificationPreferencesSchema,
} from '../../../shared/reports/notification-schemas.ts';
import { requireUser } from '../../middleware/require-user.ts';
import * as notificationsService from './notifications-service.ts';

// The signed-in user's own notifications, across all their workshops.
export const notificationsRouter = Router();

notificationsRouter.get('/notifications', requireUser, async (req, res) => {
  const query = notificationListQuerySchema.parse(req.query);
  res.json(await notificationsService.listNotifications(res.locals.userId, query));
});

notificationsRouter.post('/notifications/read-all', requireUser, async (_req, res) => {
  res.json(await notificationsService.markAllRead(res.locals.userId));
});

notificationsRouter.post('/notifications/:notificationId/read', requireUser, async (req, res) => {
  const { notificationId } = notificationParamsSchema.parse(req.params);
  res.json(await notificationsService.markRead(res.locals.userId, notificationId));
});

notificationsRouter.get('/notification-preferences', requireUser, async (_req, res) => {
  res.json(await notificationsService.preferences(res.locals.userId));
});

notificationsRouter.put('/notification-preferences', requireUser, async (req, res) => {
  const input = notificationPreferencesSchema.parse(req.body);
  res.json(await notificationsService.setPreferences(res.locals.userId, input));
});
