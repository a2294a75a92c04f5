import { useMutation } from '@tanstack/react-query';
import { passwordResetConfirmSchema, type PasswordResetConfirm } from '#shared/auth/auth-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

/** 204 when the password is changed; 400 'token-invalid' when the link was used or has expired. */
export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: async (input: PasswordResetConfirm) => {
      await apiClient.post('/auth/password-reset/confirm', passwordResetConfirmSchema.parse(input));
    },
  });
}
