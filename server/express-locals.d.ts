import type { Actor } from '../shared/auth/roles.ts';

// What our middleware puts on res.locals for the handlers after it.
declare global {
  namespace Express {
    interface Locals {
      requestId: string;
      userId: string;
      actor: Actor;
      workshopId: string;
    }
  }
}
export {};
