import { useIsMutating, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { sessionQueries } from './session-queries.ts';

const signOutMutationKey = [...sessionQueries.all(), 'sign-out'] as const;

/**
 * Signs out. `beforeReset` navigates to sign-in and is awaited, so the page
 * being left never renders without a user; only then does the cache forget
 * the user and every other cached answer, and the signed-out session (with
 * its new CSRF token) is fetched. While this runs, the session gate and the
 * sign-in page hold still (see useIsSigningOut) instead of redirecting.
 */
export function useSignOut({ beforeReset, everywhere = false }: { beforeReset?: () => unknown; everywhere?: boolean } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: signOutMutationKey,
    // Everywhere: every session of the account ends, on every device, this one too.
    mutationFn: () => apiClient.post(everywhere ? '/auth/sign-out-everywhere' : '/auth/sign-out'),
    onSuccess: async () => {
      await beforeReset?.();
      queryClient.setQueryData(sessionQueries.me().queryKey, (old) => (old ? { ...old, user: null, csrfToken: '' } : old));
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionQueries.all()[0] });
      return queryClient.invalidateQueries({ queryKey: sessionQueries.all() });
    },
  });
}

export function useIsSigningOut(): boolean {
  return useIsMutating({ mutationKey: signOutMutationKey }) > 0;
}
