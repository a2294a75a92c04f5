import { Router } from 'express';
import { config } from '../../config.ts';
import { AppError } from '../../lib/app-error.ts';
import { readStoredMail } from '../../lib/mail-outbox.ts';
import { requireUser } from '../../middleware/require-user.ts';
import * as workshopsService from '../workshops/workshops-service.ts';

/** Development helpers; the router is not mounted in production. */
export const devRouter = Router();

// The local mail fake's inbox, newest first, for admins of any workshop.
devRouter.get('/dev/mail', requireUser, async (_req, res) => {
  const dir = config().mail.fakeDir;
  if (!dir) throw new AppError('route-not-found', 'No API route GET /api/dev/mail', 404);
  const memberships = await workshopsService.membershipsOf(res.locals.userId);
  if (!memberships.some((m) => m.role === 'admin')) {
    throw new AppError('forbidden', 'Only workshop admins can read the development outbox', 403);
  }
  const messages = readStoredMail(dir)
    .reverse()
    .slice(0, 200)
    .map((m) => ({ id: m.id, to: m.to, from: m.from, subject: m.subject, date: m.receivedAt, text: m.text, html: m.html }));
  res.json({ messages });
});
