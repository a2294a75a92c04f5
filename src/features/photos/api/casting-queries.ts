import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { castingSchema, heatDetailSchema } from '#shared/heats/heat-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { photosBase } from './photo-queries.ts';

/**
 * What the casting page shows of a heat (GET /heats/:heatId): only the
 * fields it reads are picked from the heat-log schema, so fields the heat log
 * adds later do not break this page, while a change to one it does read
 * still fails loudly here.
 */
export const castingPageHeatSchema = heatDetailSchema
  .pick({ id: true, casterId: true, casterName: true, pouredAt: true, alloy: true, pourTempC: true })
  .extend({
    castings: z.array(
      castingSchema.pick({
        id: true,
        heatId: true,
        mould: true,
        mouldPreheatC: true,
        coated: true,
        vented: true,
        pourHeightCm: true,
        sectionThicknessMm: true,
        massG: true,
        airCoolMin: true,
        quenchMedium: true,
        notes: true,
        yieldPct: true,
      }),
    ),
  });
export type CastingPageHeat = z.infer<typeof castingPageHeatSchema>;
export type CastingPageCasting = CastingPageHeat['castings'][number];

/**
 * The heat behind a casting page. Its own key branch ("castings"), so it
 * never shares a cache entry with the heat log's own queries.
 */
export const castingQueries = {
  all: () => ['castings'] as const,
  heats: () => [...castingQueries.all(), 'heat'] as const,
  heat: (workshopId: string, heatId: string) =>
    queryOptions({
      queryKey: [...castingQueries.heats(), { workshopId, heatId }] as const,
      queryFn: async ({ signal }) =>
        castingPageHeatSchema.parse(await apiClient.get(`${photosBase(workshopId)}/heats/${encodeURIComponent(heatId)}`, { signal })),
    }),
};
