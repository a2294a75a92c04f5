import { useMutation, useQueryClient } from '@tanstack/react-query';
import { mfaEnableInputSchema, recoveryCodesSchema, type MfaEnableInput } from '#shared/auth/mfa-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { sessionQueries } from './session-queries.ts';

/** POST /auth/mfa/enable: two-step sign-in is on; resolves to the ten recovery codes, shown once. */
export function useEnableMfa() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: MfaEnableInput) =>
      recoveryCodesSchema.parse(await apiClient.post('/auth/mfa/enable', mfaEnableInputSchema.parse(input))).recoveryCodes,
    onSuccess: () =>
      queryClient.setQueryData(sessionQueries.me().queryKey, (old) =>
        old?.user ? { ...old, user: { ...old.user, mfaEnabled: true } } : old,
      ),
  });
}
