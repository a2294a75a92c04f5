import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  hardnessCreateSchema,
  heatTreatmentDetailSchema,
  heatTreatmentPhotoCreateSchema,
  heatTreatmentUpdateSchema,
  stepsActualUpdateSchema,
  type HardnessCreateInput,
  type HeatTreatmentDetail,
  type HeatTreatmentUpdateInput,
  type StepsActualUpdateInput,
} from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { heatTreatmentQueries, heatTreatmentUrl } from './heat-treatment-queries.ts';

// Every write to a plan answers with the whole plan (record, comparison,
// hardness, photos), so the detail is replaced from the answer rather than
// refetched, and the list (whose state may have changed) is invalidated.

function useWriteToPlan<TInput>(workshopId: string, id: string, send: (input: TInput) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: TInput): Promise<HeatTreatmentDetail> => heatTreatmentDetailSchema.parse(await send(input)),
    onSuccess: (detail) => {
      queryClient.setQueryData(heatTreatmentQueries.detail(workshopId, id).queryKey, detail);
      return queryClient.invalidateQueries({ queryKey: heatTreatmentQueries.lists() });
    },
  });
}

export function useRecordSteps(workshopId: string, id: string) {
  return useWriteToPlan(workshopId, id, (input: StepsActualUpdateInput) =>
    apiClient.patch(`${heatTreatmentUrl(workshopId, id)}/steps`, stepsActualUpdateSchema.parse(input)),
  );
}

export function useUpdateHeatTreatment(workshopId: string, id: string) {
  return useWriteToPlan(workshopId, id, (input: HeatTreatmentUpdateInput) =>
    apiClient.patch(heatTreatmentUrl(workshopId, id), heatTreatmentUpdateSchema.parse(input)),
  );
}

export function useAddHardness(workshopId: string, id: string) {
  return useWriteToPlan(workshopId, id, (input: HardnessCreateInput) =>
    apiClient.post(`${heatTreatmentUrl(workshopId, id)}/hardness`, hardnessCreateSchema.parse(input)),
  );
}

export function useAddPhoto(workshopId: string, id: string) {
  return useWriteToPlan(workshopId, id, (photoId: string) =>
    apiClient.post(`${heatTreatmentUrl(workshopId, id)}/photos`, heatTreatmentPhotoCreateSchema.parse({ photoId })),
  );
}

/** Removes a hardness reading; the plan is refetched (the delete answers 204). */
export function useRemoveHardness(workshopId: string, id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (readingId: string) => apiClient.delete(`${heatTreatmentUrl(workshopId, id)}/hardness/${encodeURIComponent(readingId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: heatTreatmentQueries.detail(workshopId, id).queryKey }),
  });
}
