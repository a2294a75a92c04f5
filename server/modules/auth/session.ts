import type { Request } from 'express';
import type { SessionData } from 'express-session';
import { csrfToken } from '../../middleware/csrf.ts';

/** How long the code step of a two-step sign-in waits for the code. */
export const MFA_PENDING_LIFETIME_MS = 5 * 60 * 1000;

/**
 * Replaces the session with a new one (new id, so no fixation; new CSRF
 * token, which goes back to the client) holding `values`.
 */
function regenerateWith(req: Request, values: Partial<SessionData>): Promise<string> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      Object.assign(req.session, values);
      const token = csrfToken(req, true);
      req.session.save((saveErr) => (saveErr ? reject(saveErr) : resolve(token)));
    });
  });
}

/** Signs the request's session in as `userId`, in a regenerated session. */
export function signInSession(req: Request, userId: string): Promise<string> {
  return regenerateWith(req, { userId, signedInAt: Date.now() });
}

/**
 * After the right password of a two-step account: a regenerated session that
 * is NOT signed in and holds who may finish signing in with a code, for 5 minutes.
 */
export function startMfaChallenge(req: Request, account: { userId: string; email: string }): Promise<string> {
  return regenerateWith(req, { mfaPending: { ...account, until: Date.now() + MFA_PENDING_LIFETIME_MS } });
}

/** The pending two-step sign-in, if it has not run out; an expired one is dropped. */
export function pendingMfa(req: Request): { userId: string; email: string } | null {
  const pending = req.session.mfaPending;
  if (!pending) return null;
  if (pending.until < Date.now()) {
    delete req.session.mfaPending;
    return null;
  }
  return { userId: pending.userId, email: pending.email };
}

/**
 * The same signed-in user in a new session id (after a password change).
 * The sign-in time is kept: re-entering the password does not extend the
 * absolute lifetime.
 */
export function renewSession(req: Request): Promise<string> {
  return regenerateWith(req, { userId: req.session.userId, signedInAt: req.session.signedInAt });
}

export function destroySession(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
}
