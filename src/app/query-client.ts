import { QueryCache, QueryClient } from '@tanstack/react-query';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { isApiError } from '#src/lib/api-client.ts';

export function createQueryClient() {
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      // A 401 anywhere means the session ended (expired, or signed out in
      // another tab): refetch it, and the session gate sends the person to sign-in.
      onError: (error) => {
        if (isApiError(error) && error.status === 401) {
          void queryClient.invalidateQueries({ queryKey: sessionQueries.all() });
        }
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 60_000,
        // Client errors won't change on a retry; network and server errors might.
        retry: (failureCount, error) => failureCount < 2 && !(isApiError(error) && error.status >= 400 && error.status < 500),
      },
    },
  });
  return queryClient;
}
