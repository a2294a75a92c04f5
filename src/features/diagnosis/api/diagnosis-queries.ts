import { queryOptions } from '@tanstack/react-query';
import { diagnosisSchema, quickCheckQuestionsSchema } from '#shared/reports/diagnosis-schemas.ts';
import { workshopRulesSchema } from '#shared/reports/workshop-rule-schemas.ts';
import { z } from 'zod';
import { apiClient } from '#src/lib/api-client.ts';

export const diagnosisBase = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}`;

/** The few heat fields the recording form needs to turn a hold time into a melt-start stamp. */
const recordHeatSchema = z.object({ id: z.uuid(), pouredAt: z.string(), meltStartedAt: z.string().nullable() });

/**
 * A casting's likely causes, the quick check's questions and the workshop's
 * rules. Every key starts with 'diagnosis' so one invalidation refreshes
 * every ranking after a rule or a recorded value changes.
 */
export const diagnosisQueries = {
  all: () => ['diagnosis'] as const,
  details: () => [...diagnosisQueries.all(), 'detail'] as const,
  casting: (workshopId: string, castingId: string) =>
    queryOptions({
      queryKey: [...diagnosisQueries.details(), { workshopId, castingId }] as const,
      queryFn: async ({ signal }) =>
        diagnosisSchema.parse(await apiClient.get(`${diagnosisBase(workshopId)}/castings/${encodeURIComponent(castingId)}/diagnosis`, { signal })),
      // Marks are made on the photo page, which does not know this key: read afresh whenever the panel mounts.
      staleTime: 0,
    }),

  questions: (workshopId: string, kinds: readonly string[]) =>
    queryOptions({
      queryKey: [...diagnosisQueries.all(), 'questions', { workshopId, kinds: [...kinds].sort() }] as const,
      queryFn: async ({ signal }) =>
        quickCheckQuestionsSchema.parse(
          await apiClient.get(`${diagnosisBase(workshopId)}/quick-check-questions?kinds=${encodeURIComponent([...kinds].sort().join(','))}`, { signal }),
        ),
    }),

  heat: (workshopId: string, heatId: string) =>
    queryOptions({
      queryKey: [...diagnosisQueries.all(), 'heat', { workshopId, heatId }] as const,
      queryFn: async ({ signal }) => recordHeatSchema.parse(await apiClient.get(`${diagnosisBase(workshopId)}/heats/${encodeURIComponent(heatId)}`, { signal })),
    }),

  rules: (workshopId: string) =>
    queryOptions({
      queryKey: [...diagnosisQueries.all(), 'rules', { workshopId }] as const,
      queryFn: async ({ signal }) => workshopRulesSchema.parse(await apiClient.get(`${diagnosisBase(workshopId)}/rules`, { signal })),
    }),
};
