import { useMutation, useQueryClient } from '@tanstack/react-query';
import { passwordChangeSchema, type PasswordChangeInput } from '#shared/auth/auth-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { sessionQueries } from './session-queries.ts';

/**
 * 204: the password is changed and every other session has ended. This
 * session got a new id and so a new CSRF token; refetching the session
 * picks it up before the next change.
 */
export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: PasswordChangeInput) => {
      await apiClient.post('/auth/password', passwordChangeSchema.parse(input));
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionQueries.me().queryKey }),
  });
}
