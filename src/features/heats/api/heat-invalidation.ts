import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { heatQueries } from './heat-queries.ts';

/**
 * Other features' caches a heat write touches (the equipment's counts, the
 * casting page's copy of the heat). Their keys come from their own
 * factories, handed in by the route that composes the features, since one
 * feature never imports another.
 */
export type RelatedKeys = { invalidateAlso?: readonly QueryKey[] };

/**
 * After a heat is written or deleted: every list and page of the log, the
 * next form's defaults, and the suggestions learned from the log (setpoint
 * offsets, usual yield).
 */
export function invalidateHeatLog(queryClient: QueryClient, related: RelatedKeys = {}) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: heatQueries.infinites() }),
    queryClient.invalidateQueries({ queryKey: heatQueries.lists() }),
    queryClient.invalidateQueries({ queryKey: heatQueries.defaults() }),
    queryClient.invalidateQueries({ queryKey: heatQueries.setpoints() }),
    queryClient.invalidateQueries({ queryKey: heatQueries.chargePlans() }),
    ...(related.invalidateAlso ?? []).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
  ]);
}
