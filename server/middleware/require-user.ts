import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error.ts';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
    /** Sign-in time, for the absolute session lifetime. */
    signedInAt?: number;
  }
}

/** Refuses the request unless the session is signed in; sets res.locals.userId. */
export const requireUser: RequestHandler = (req, res, next) => {
  const userId = req.session.userId;
  if (!userId) throw new AppError('not-signed-in', 'Sign in to continue', 401);
  res.locals.userId = userId;
  next();
};
