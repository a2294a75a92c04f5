import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { sessionStateSchema } from '#shared/auth/auth-schemas.ts';
import { invitationAcceptSchema, type InvitationAcceptInput } from '#shared/workshops/workshop-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { adoptSession } from './session-queries.ts';

const acceptedSchema = sessionStateSchema.extend({ workshopId: z.uuid() });

/** Joins the workshop: `{}` when signed in, or a name and password for a new account. */
export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: InvitationAcceptInput) =>
      acceptedSchema.parse(
        await apiClient.post(`/invitations/${encodeURIComponent(token)}/accept`, invitationAcceptSchema.parse(input)),
      ),
    onSuccess: ({ workshopId: _workshopId, ...session }) => adoptSession(queryClient, session),
  });
}
