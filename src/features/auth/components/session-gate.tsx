import { useSuspenseQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Navigate, useLocation, useNavigation } from 'react-router-dom';
import { paths } from '#src/config/paths.ts';
import { sessionQueries } from '../api/session-queries.ts';
import { useIsSigningOut } from '../api/use-sign-out.ts';

/**
 * Renders its children only for a signed-in user; anyone else goes to
 * sign-in with `next` set, and comes back here after signing in. The loader
 * (lib/require-session.ts) does the same before the page loads; this catches
 * a session that ends while the page is open.
 */
export function SessionGate({ children }: { children: ReactNode }) {
  const { data } = useSuspenseQuery(sessionQueries.me());
  const location = useLocation();
  const navigation = useNavigation();
  const signingOut = useIsSigningOut();
  if (!data.user) {
    // Signing out goes to sign-in on its own: render nothing and let it finish.
    if (signingOut || navigation.state !== 'idle') return null;
    return <Navigate replace to={paths.signIn.getHref(`${location.pathname}${location.search}`)} />;
  }
  return children;
}
