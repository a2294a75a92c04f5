import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  heatTreatmentCreateSchema,
  heatTreatmentDetailSchema,
  type HeatTreatmentCreateDraft,
} from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { heatTreatmentQueries, heatTreatmentsBase } from './heat-treatment-queries.ts';

/** Plans a treatment; the list and the candidates (which now show the open plan) refetch. */
export function useCreateHeatTreatment(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: HeatTreatmentCreateDraft) =>
      heatTreatmentDetailSchema.parse(await apiClient.post(heatTreatmentsBase(workshopId), heatTreatmentCreateSchema.parse(input))),
    onSuccess: (detail) => {
      queryClient.setQueryData(heatTreatmentQueries.detail(workshopId, detail.id).queryKey, detail);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: heatTreatmentQueries.lists() }),
        queryClient.invalidateQueries({ queryKey: heatTreatmentQueries.candidateLists() }),
      ]);
    },
  });
}
