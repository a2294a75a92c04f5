import { useMutation, useQueryClient } from '@tanstack/react-query';
import { workshopCreateSchema, workshopSchema, type WorkshopCreateInput } from '#shared/workshops/workshop-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { workshopQueries } from './workshop-queries.ts';

export function useCreateWorkshop() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: WorkshopCreateInput) =>
      workshopSchema.parse(await apiClient.post('/workshops', workshopCreateSchema.parse(input))),
    onSuccess: (workshop) => {
      queryClient.setQueryData(workshopQueries.list().queryKey, (old) => (old ? [...old, workshop] : [workshop]));
      return queryClient.invalidateQueries({ queryKey: workshopQueries.lists() });
    },
  });
}
