import { useMutation } from '@tanstack/react-query';
import { quickCheckCreateSchema, quickCheckSchema, type QuickCheckCreateInput } from '#shared/reports/diagnosis-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { diagnosisBase } from './diagnosis-queries.ts';

/** POST /quick-checks: a heat stub poured now with one casting, for the photo about to be taken. */
export function useCreateQuickCheck(workshopId: string) {
  return useMutation({
    mutationFn: async (input: QuickCheckCreateInput) =>
      quickCheckSchema.parse(await apiClient.post(`${diagnosisBase(workshopId)}/quick-checks`, quickCheckCreateSchema.parse(input))),
  });
}
