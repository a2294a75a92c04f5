import { useMutation } from '@tanstack/react-query';
import { mfaConfirmInputSchema, recoveryCodesSchema, type MfaConfirmInput } from '#shared/auth/mfa-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

/** POST /auth/mfa/recovery-codes: a new set of ten; the old ones stop working. */
export function useReplaceRecoveryCodes() {
  return useMutation({
    mutationFn: async (input: MfaConfirmInput) => {
      // Sent as typed (see useDisableMfa).
      mfaConfirmInputSchema.parse(input);
      return recoveryCodesSchema.parse(await apiClient.post('/auth/mfa/recovery-codes', input)).recoveryCodes;
    },
  });
}
