import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { sessionStateSchema, type SessionState } from '#shared/auth/auth-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

export const sessionQueries = {
  all: () => ['session'] as const,
  me: () =>
    queryOptions({
      queryKey: [...sessionQueries.all(), 'me'] as const,
      queryFn: async ({ signal }) => sessionStateSchema.parse(await apiClient.get('/auth/me', { signal })),
    }),
};

/**
 * After sign-in, sign-up or accepting an invitation the server regenerates the
 * session: keep its new state (and CSRF token), and drop every cached answer
 * that belonged to whoever was here before.
 */
export function adoptSession(queryClient: QueryClient, session: SessionState) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionQueries.all()[0] });
  queryClient.setQueryData(sessionQueries.me().queryKey, session);
}
