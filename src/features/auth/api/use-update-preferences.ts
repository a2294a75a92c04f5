import { useMutation, useQueryClient } from '@tanstack/react-query';
import { currentUserSchema, preferencesUpdateSchema, type PreferencesUpdate } from '#shared/auth/auth-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { sessionQueries } from './session-queries.ts';

const mutationKey = [...sessionQueries.all(), 'preferences'] as const;

/**
 * PATCH /api/auth/me, optimistic: the units and theme change at once and
 * roll back if the server says no. The mutation lives next to the session
 * query because it edits that cache entry; the preferences feature's
 * controls receive it from the app layer.
 */
export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  const queryKey = sessionQueries.me().queryKey;
  return useMutation({
    mutationKey,
    mutationFn: async (input: PreferencesUpdate) =>
      currentUserSchema.parse(await apiClient.patch('/auth/me', preferencesUpdateSchema.parse(input))),
    onMutate: async (input) => {
      await queryClient.cancelQueries({ queryKey });
      const previous = queryClient.getQueryData(queryKey);
      if (previous?.user) {
        queryClient.setQueryData(queryKey, { ...previous, user: { ...previous.user, ...input } });
      }
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(queryKey, context.previous);
    },
    onSuccess: (user) => {
      // With several toggles in flight, an earlier answer would undo a later
      // optimistic change; only the last one to finish writes the server's user.
      if (queryClient.isMutating({ mutationKey }) > 1) return;
      queryClient.setQueryData(queryKey, (old) => (old ? { ...old, user } : old));
    },
  });
}
