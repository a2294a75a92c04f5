import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { heatImportSchema, type HeatCsvImportField } from '#shared/heats/heat-csv.ts';
import { apiClient, isApiError } from '#src/lib/api-client.ts';
import { invalidateHeatLog, type RelatedKeys } from './heat-invalidation.ts';
import { heatsBase } from './heat-queries.ts';

/**
 * The answer to POST /heats/import (HeatImportResult in shared/heats/heat-csv.ts,
 * which has no schema of its own): the preview keeps only what the page
 * shows of each heat, so fields the heat gains later pass through.
 */
const importResultSchema = z.object({
  dryRun: z.boolean(),
  preview: z.array(
    z.object({
      row: z.number().int(),
      heat: z.looseObject({
        pouredAt: z.string(),
        alloy: z.string(),
        pourTempC: z.number().nullable().optional(),
        chargeLines: z.array(z.looseObject({ massG: z.number() })),
        castings: z.array(z.looseObject({ massG: z.number().nullable().optional() })),
      }),
    }),
  ),
  errors: z.array(z.object({ row: z.number().int(), field: z.string(), message: z.string() })),
  heatIds: z.array(z.string()),
});
export type ImportResult = z.infer<typeof importResultSchema>;

export type ImportRequest = { csv: string; mapping: Partial<Record<HeatCsvImportField, string>>; dryRun: boolean };
export type ImportOutcome = ImportResult & {
  /** Set when a real import was refused (422): nothing was written, and `errors` come from a fresh check. */
  rejected?: string;
};

/**
 * Checks (dryRun) or imports a CSV. The server writes every row or none; a
 * refused import answers 422, whose row errors this fetches again with a
 * dry run so the page can show them.
 */
export function useImportHeats(workshopId: string, related: RelatedKeys = {}) {
  const queryClient = useQueryClient();
  const send = async (input: ImportRequest) =>
    importResultSchema.parse(await apiClient.post(`${heatsBase(workshopId)}/heats/import`, heatImportSchema.parse(input)));
  return useMutation({
    mutationFn: async (input: ImportRequest): Promise<ImportOutcome> => {
      try {
        return await send(input);
      } catch (error) {
        if (!input.dryRun && isApiError(error, 'import-rejected')) {
          return { ...(await send({ ...input, dryRun: true })), rejected: error.message };
        }
        throw error;
      }
    },
    onSuccess: (outcome) => (outcome.heatIds.length > 0 ? invalidateHeatLog(queryClient, related) : undefined),
  });
}
