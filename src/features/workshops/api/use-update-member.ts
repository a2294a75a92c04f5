import { useMutation, useQueryClient } from '@tanstack/react-query';
import { memberSchema, memberUpdateSchema, type MemberUpdateInput } from '#shared/workshops/workshop-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { memberQueries } from './workshop-queries.ts';

/** An admin changes a member's role or a student's mentors; the table changes at once. */
export function useUpdateMember(workshopId: string) {
  const queryClient = useQueryClient();
  const queryKey = memberQueries.list(workshopId).queryKey;
  return useMutation({
    mutationFn: async (input: MemberUpdateInput) =>
      memberSchema.parse(
        await apiClient.post(`/workshops/${encodeURIComponent(workshopId)}/members`, memberUpdateSchema.parse(input)),
      ),
    onMutate: async (input) => {
      await queryClient.cancelQueries({ queryKey });
      const previous = queryClient.getQueryData(queryKey);
      queryClient.setQueryData(queryKey, (old) =>
        old?.map((member) =>
          member.userId === input.userId
            ? { ...member, ...(input.role ? { role: input.role } : {}), ...(input.mentorIds ? { mentorIds: input.mentorIds } : {}) }
            : member,
        ),
      );
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(queryKey, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey }),
  });
}
