import { useMutation, useQueryClient } from '@tanstack/react-query';
import { crucibleNoteCreateSchema, crucibleNoteSchema, type CrucibleNoteCreateInput } from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

/** A dated condition note on a crucible; its page refetches with the note in place. */
export function useAddCrucibleNote(workshopId: string, crucibleId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CrucibleNoteCreateInput) =>
      crucibleNoteSchema.parse(
        await apiClient.post(
          `${equipmentBase(workshopId)}/crucibles/${encodeURIComponent(crucibleId)}/notes`,
          crucibleNoteCreateSchema.parse(input),
        ),
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: equipmentQueries.crucibleDetail(workshopId, crucibleId).queryKey }),
  });
}
