import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sessionStateSchema, signInInputSchema, type SignInInput } from '#shared/auth/auth-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { adoptSession } from './session-queries.ts';

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SignInInput) =>
      sessionStateSchema.parse(await apiClient.post('/auth/sign-in', signInInputSchema.parse(input))),
    onSuccess: (session) => adoptSession(queryClient, session),
  });
}
