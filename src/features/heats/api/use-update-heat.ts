import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  castingCreateSchema,
  castingUpdateSchema,
  heatDetailSchema,
  heatUpdateSchema,
  type CastingCreateInput,
  type CastingUpdateInput,
  type HeatUpdateInput,
} from '#shared/heats/heat-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { invalidateHeatLog, type RelatedKeys } from './heat-invalidation.ts';
import { heatQueries, heatsBase } from './heat-queries.ts';

export type HeatChanges = {
  /** Only the fields that changed; `chargeLines`, when given, replaces every line. */
  heat: HeatUpdateInput;
  castings: {
    remove: readonly string[];
    update: readonly { id: string; input: CastingUpdateInput }[];
    create: readonly CastingCreateInput[];
  };
};

/**
 * Saves an edited heat. The API keeps castings on their own routes, so this
 * sends removals first (they only lighten the heat), then the heat's own
 * fields, then changed and new castings: the order in which "castings never
 * outweigh the charge" holds at every step for the usual edits. A failure
 * part-way leaves the earlier steps saved; the page refetches either way.
 */
export function useUpdateHeat(workshopId: string, heatId: string, related: RelatedKeys = {}) {
  const queryClient = useQueryClient();
  const heatPath = `${heatsBase(workshopId)}/heats/${encodeURIComponent(heatId)}`;
  const castingPath = (id: string) => `${heatsBase(workshopId)}/castings/${encodeURIComponent(id)}`;
  const refresh = () =>
    Promise.all([queryClient.invalidateQueries({ queryKey: heatQueries.detail(workshopId, heatId).queryKey }), invalidateHeatLog(queryClient, related)]);
  return useMutation({
    mutationFn: async ({ heat, castings }: HeatChanges) => {
      for (const id of castings.remove) await apiClient.delete(castingPath(id));
      if (Object.keys(heat).length > 0) heatDetailSchema.parse(await apiClient.patch(heatPath, heatUpdateSchema.parse(heat)));
      for (const { id, input } of castings.update) await apiClient.patch(castingPath(id), castingUpdateSchema.parse(input));
      for (const input of castings.create) await apiClient.post(`${heatPath}/castings`, castingCreateSchema.parse(input));
    },
    onSuccess: refresh,
    onError: () => void refresh(),
  });
}
