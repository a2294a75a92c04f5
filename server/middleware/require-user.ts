import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error.ts';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
    /** Sign-in time, for the absolute session lifetime. */
    signedInAt?: number;
    /**
     * The password was right but the account has two-step sign-in: who is
     * signing in, until when (ms) the code may come. Not signed in yet.
     */
    mfaPending?: { userId: string; email: string; until: number };
  }
}

/** Refuses the request unless the session is signed in; sets res.locals.userId. */
export const requireUser: RequestHandler = (req, res, next) => {
  const userId = req.session.userId;
  if (!userId) throw new AppError('not-signed-in', 'Sign in to continue', 401);
  res.locals.userId = userId;
  next();
};
