import { useMutation } from '@tanstack/react-query';
import { mfaSetupInputSchema, mfaSetupSchema, type MfaSetupInput } from '#shared/auth/mfa-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

/** POST /auth/mfa/setup: a new pending secret with its QR code; nothing is on until it is confirmed. */
export function useStartMfaSetup() {
  return useMutation({
    mutationFn: async (input: MfaSetupInput) =>
      mfaSetupSchema.parse(await apiClient.post('/auth/mfa/setup', mfaSetupInputSchema.parse(input))),
  });
}
