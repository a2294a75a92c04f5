import { useMutation } from '@tanstack/react-query';
import { passwordResetRequestSchema, type PasswordResetRequest } from '#shared/auth/auth-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

/** Always answers 202, whether or not the address has an account. */
export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: async (input: PasswordResetRequest) => {
      await apiClient.post('/auth/password-reset', passwordResetRequestSchema.parse(input));
    },
  });
}
