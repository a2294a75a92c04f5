import { queryOptions } from '@tanstack/react-query';
import { invitationPreviewSchema } from '#shared/workshops/workshop-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

/** What an invitation link shows before it is accepted (GET /api/invitations/:token). */
export const invitationPreviewQueries = {
  all: () => ['invitation-preview'] as const,
  details: () => [...invitationPreviewQueries.all(), 'detail'] as const,
  detail: (token: string) =>
    queryOptions({
      queryKey: [...invitationPreviewQueries.details(), token] as const,
      queryFn: async ({ signal }) =>
        invitationPreviewSchema.parse(await apiClient.get(`/invitations/${encodeURIComponent(token)}`, { signal })),
      // A used or expired invitation stays that way; asking again won't help.
      retry: false,
    }),
};
