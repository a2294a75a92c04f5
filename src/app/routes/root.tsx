import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { Outlet, ScrollRestoration } from 'react-router-dom';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { ThemeSync } from '#src/features/preferences/components/theme-sync.tsx';
import { storedTheme } from '#src/lib/theme.ts';

/** Every page needs to know who is here (and the CSRF token) before it renders. */
export const clientLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(sessionQueries.me());
  return null;
};

export default function Root() {
  const { data } = useQuery(sessionQueries.me());
  return (
    <>
      <ThemeSync theme={data?.user?.theme ?? storedTheme()} />
      <ScrollRestoration />
      <Outlet />
    </>
  );
}
