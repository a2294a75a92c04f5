import type { QueryClient } from '@tanstack/react-query';
import { setCsrfSource } from '#src/lib/api-client.ts';
import { sessionQueries } from './session-queries.ts';

/** Lets the API client read the CSRF token from the session query, and refresh it. */
export function bindCsrfToSession(queryClient: QueryClient) {
  setCsrfSource({
    get: () => queryClient.getQueryData(sessionQueries.me().queryKey)?.csrfToken || undefined,
    refresh: async () => (await queryClient.fetchQuery({ ...sessionQueries.me(), staleTime: 0 })).csrfToken,
  });
}
