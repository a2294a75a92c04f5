import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signInInputSchema, type SignInInput } from '#shared/auth/auth-schemas.ts';
import { signInResultSchema } from '#shared/auth/mfa-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { adoptSession, sessionQueries } from './session-queries.ts';

/** Signed in, or the password was right and the account asks for a code next. */
export type SignInOutcome = { kind: 'signed-in' } | { kind: 'mfa-required' };

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SignInInput): Promise<SignInOutcome> => {
      const result = signInResultSchema.parse(await apiClient.post('/auth/sign-in', signInInputSchema.parse(input)));
      if ('mfaRequired' in result) {
        // Still signed out, but in a new session whose CSRF token the code step needs.
        queryClient.setQueryData(sessionQueries.me().queryKey, { user: null, csrfToken: result.csrfToken });
        return { kind: 'mfa-required' };
      }
      adoptSession(queryClient, result);
      return { kind: 'signed-in' };
    },
  });
}
