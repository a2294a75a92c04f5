import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { sessionStateSchema, signUpInputSchema, type SignUpInput } from '#shared/auth/auth-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { adoptSession } from './session-queries.ts';

/**
 * 201: the account exists and the session is signed in. 202: "if this address
 * can be used, we've sent a mail"; the server does not say whether an
 * address is already registered.
 */
export type SignUpResult = { kind: 'signed-in' } | { kind: 'check-email' };

const checkEmailSchema = z.object({ status: z.literal('check-email') });

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SignUpInput): Promise<SignUpResult> => {
      const { status, data } = await apiClient.request('POST', '/auth/sign-up', signUpInputSchema.parse(input));
      if (status === 202) {
        checkEmailSchema.parse(data);
        return { kind: 'check-email' };
      }
      adoptSession(queryClient, sessionStateSchema.parse(data));
      return { kind: 'signed-in' };
    },
  });
}
