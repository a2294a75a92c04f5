import { queryOptions } from '@tanstack/react-query';
import { invitationSchema, memberSchema, workshopSchema } from '#shared/workshops/workshop-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

const base = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}`;

/** The signed-in user's workshops, each with their role in it. */
export const workshopQueries = {
  all: () => ['workshops'] as const,
  lists: () => [...workshopQueries.all(), 'list'] as const,
  list: () =>
    queryOptions({
      queryKey: workshopQueries.lists(),
      queryFn: async ({ signal }) => workshopSchema.array().parse(await apiClient.get('/workshops', { signal })),
    }),
};

export const memberQueries = {
  all: () => ['members'] as const,
  lists: () => [...memberQueries.all(), 'list'] as const,
  list: (workshopId: string) =>
    queryOptions({
      queryKey: [...memberQueries.lists(), { workshopId }] as const,
      queryFn: async ({ signal }) => memberSchema.array().parse(await apiClient.get(`${base(workshopId)}/members`, { signal })),
    }),
};

export const invitationQueries = {
  all: () => ['invitations'] as const,
  lists: () => [...invitationQueries.all(), 'list'] as const,
  list: (workshopId: string) =>
    queryOptions({
      queryKey: [...invitationQueries.lists(), { workshopId }] as const,
      queryFn: async ({ signal }) =>
        invitationSchema.array().parse(await apiClient.get(`${base(workshopId)}/invitations`, { signal })),
    }),
};
