import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router-dom';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { paths } from '#src/config/paths.ts';
import { sessionQueries } from '../api/session-queries.ts';

/** For loaders of signed-in pages: the user, or a redirect to sign-in that comes back here. */
export async function requireUser(queryClient: QueryClient, request: Request): Promise<CurrentUser> {
  const session = await queryClient.ensureQueryData(sessionQueries.me());
  if (!session.user) {
    const url = new URL(request.url);
    throw redirect(paths.signIn.getHref(`${url.pathname}${url.search}`));
  }
  return session.user;
}
