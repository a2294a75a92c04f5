import { useMutation, useQueryClient } from '@tanstack/react-query';
import { castingUpdateSchema, heatUpdateSchema } from '#shared/heats/heat-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import type { ConditionPatch } from '../lib/condition-inputs.ts';
import { diagnosisBase, diagnosisQueries } from './diagnosis-queries.ts';

/**
 * Saves one recorded value on the heat or the casting, then refetches every
 * ranking. `onRecorded` lets the page refresh what other features cache
 * (the casting page's heat), since a feature never names another's keys.
 */
export function useRecordCondition(workshopId: string, ids: { heatId: string; castingId: string }, onRecorded?: () => unknown) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (patches: readonly ConditionPatch[]) => {
      const heat = Object.assign({}, ...patches.filter((p) => p.target === 'heat').map((p) => p.values)) as Record<string, unknown>;
      const casting = Object.assign({}, ...patches.filter((p) => p.target === 'casting').map((p) => p.values)) as Record<string, unknown>;
      if (Object.keys(heat).length > 0) {
        await apiClient.patch(`${diagnosisBase(workshopId)}/heats/${encodeURIComponent(ids.heatId)}`, heatUpdateSchema.parse(heat));
      }
      if (Object.keys(casting).length > 0) {
        await apiClient.patch(`${diagnosisBase(workshopId)}/castings/${encodeURIComponent(ids.castingId)}`, castingUpdateSchema.parse(casting));
      }
    },
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: diagnosisQueries.all() }), onRecorded?.()]),
  });
}
