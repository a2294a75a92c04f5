import { useMutation, useQueryClient } from '@tanstack/react-query';
import { mfaConfirmInputSchema, type MfaConfirmInput } from '#shared/auth/mfa-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { sessionQueries } from './session-queries.ts';

/** POST /auth/mfa/disable with the password and a current code (or a recovery code). */
export function useDisableMfa() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: MfaConfirmInput) => {
      // Checked with the server's schema, but sent as typed: the schema's
      // output tags the code by kind, which is the server's business.
      mfaConfirmInputSchema.parse(input);
      await apiClient.post('/auth/mfa/disable', input);
    },
    onSuccess: () =>
      queryClient.setQueryData(sessionQueries.me().queryKey, (old) =>
        old?.user ? { ...old, user: { ...old.user, mfaEnabled: false } } : old,
      ),
  });
}
