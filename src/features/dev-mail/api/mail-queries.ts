import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '#src/lib/api-client.ts';

/** One message caught by the local mail fake. Development and test servers only. */
export const devMailMessageSchema = z.object({
  id: z.string(),
  to: z.array(z.string()),
  from: z.string(),
  subject: z.string(),
  date: z.string(),
  text: z.string(),
  html: z.string().optional(),
});
export type DevMailMessage = z.infer<typeof devMailMessageSchema>;

const outboxSchema = z.object({ messages: z.array(devMailMessageSchema) });

export const devMailQueries = {
  all: () => ['dev-mail'] as const,
  lists: () => [...devMailQueries.all(), 'list'] as const,
  list: () =>
    queryOptions({
      queryKey: devMailQueries.lists(),
      queryFn: async ({ signal }) => outboxSchema.parse(await apiClient.get('/dev/mail', { signal })).messages,
      staleTime: 0,
      retry: false,
    }),
};
