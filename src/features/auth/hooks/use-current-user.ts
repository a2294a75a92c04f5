import { useSuspenseQuery } from '@tanstack/react-query';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { sessionQueries } from '../api/session-queries.ts';

/** The signed-in user, or null. Inside the session gate it is always set. */
export function useCurrentUser(): CurrentUser | null {
  return useSuspenseQuery(sessionQueries.me()).data.user;
}
