import { csrfSync } from 'csrf-sync';

// Synchroniser-token CSRF protection (OWASP CSRF cheat sheet): the token lives
// in the server-side session and the client echoes it in X-CSRF-Token on
// every state-changing request.
export const { csrfSynchronisedProtection: csrfProtection, generateToken: csrfToken } = csrfSync({
  getTokenFromRequest: (req) => req.get('x-csrf-token'),
});
