import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  ruleCreateSchema,
  ruleOverrideSchema,
  rulePreviewRequestSchema,
  rulePreviewSchema,
  workshopRuleSchema,
  type RuleOverrideInput,
  type RulePreviewRequest,
} from '#shared/reports/workshop-rule-schemas.ts';
import type { Rule } from '#shared/domain/index.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { diagnosisBase, diagnosisQueries } from './diagnosis-queries.ts';

// A rule change moves every ranking, so each invalidates the whole diagnosis branch.

export function useUpdateRule(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ ruleId, input }: { ruleId: string; input: RuleOverrideInput }) =>
      workshopRuleSchema.parse(await apiClient.patch(`${diagnosisBase(workshopId)}/rules/${encodeURIComponent(ruleId)}`, ruleOverrideSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: diagnosisQueries.all() }),
  });
}

export function useCreateRule(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (rule: Rule) => workshopRuleSchema.parse(await apiClient.post(`${diagnosisBase(workshopId)}/rules`, ruleCreateSchema.parse(rule))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: diagnosisQueries.all() }),
  });
}

export function useDeleteRule(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (ruleId: string) => apiClient.delete(`${diagnosisBase(workshopId)}/rules/${encodeURIComponent(ruleId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: diagnosisQueries.all() }),
  });
}

/** Replays the last resolved reports with the change; nothing is saved. */
export function usePreviewRule(workshopId: string) {
  return useMutation({
    mutationFn: async (input: RulePreviewRequest) =>
      rulePreviewSchema.parse(await apiClient.post(`${diagnosisBase(workshopId)}/rules/preview`, rulePreviewRequestSchema.parse(input))),
  });
}
