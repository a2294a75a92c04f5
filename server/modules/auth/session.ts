import type { Request } from 'express';
import { csrfToken } from '../../middleware/csrf.ts';

/**
 * Signs the request's session in as `userId`. The session id is regenerated
 * first (no fixation), so the CSRF token is new too and goes back to the client.
 */
export function signInSession(req: Request, userId: string): Promise<string> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = userId;
      req.session.signedInAt = Date.now();
      const token = csrfToken(req, true);
      req.session.save((saveErr) => (saveErr ? reject(saveErr) : resolve(token)));
    });
  });
}

export function destroySession(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
}
