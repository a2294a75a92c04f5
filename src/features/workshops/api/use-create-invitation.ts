import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invitationCreateSchema, invitationSchema, type InvitationCreateInput } from '#shared/workshops/workshop-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { invitationQueries } from './workshop-queries.ts';

/** Sends an invitation e-mail; the invitations list refetches. */
export function useCreateInvitation(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: InvitationCreateInput) =>
      invitationSchema.parse(
        await apiClient.post(`/workshops/${encodeURIComponent(workshopId)}/invitations`, invitationCreateSchema.parse(input)),
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationQueries.list(workshopId).queryKey }),
  });
}
