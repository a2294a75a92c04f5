import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signInMfaInputSchema, signInMfaResultSchema, type SignInMfaInput } from '#shared/auth/mfa-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { adoptSession } from './session-queries.ts';

/**
 * The code step of a two-step sign-in: `{ code }` from the app or
 * `{ recoveryCode }`. 401 'code-invalid' for a wrong or used code,
 * 401 'mfa-expired' when the 5 minutes ran out.
 */
export function useCompleteMfaSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SignInMfaInput) =>
      signInMfaResultSchema.parse(await apiClient.post('/auth/sign-in/mfa', signInMfaInputSchema.parse(input))),
    onSuccess: ({ recoveryCodesLeft: _left, ...session }) => adoptSession(queryClient, session),
  });
}
