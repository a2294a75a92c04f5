import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  crucibleLimitRowSchema,
  crucibleLimitsUpdateSchema,
  type CrucibleLimitsUpdateInput,
} from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

/** Replaces the workshop's own cycle limits; every crucible's status may change with them. */
export function useUpdateCrucibleLimits(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CrucibleLimitsUpdateInput) => {
      const { data } = await apiClient.request('PUT', `${equipmentBase(workshopId)}/crucible-limits`, crucibleLimitsUpdateSchema.parse(input));
      return crucibleLimitRowSchema.array().parse(data);
    },
    onSuccess: (rows) => {
      queryClient.setQueryData(equipmentQueries.crucibleLimits(workshopId).queryKey, rows);
      return queryClient.invalidateQueries({ queryKey: equipmentQueries.crucibles() });
    },
  });
}
