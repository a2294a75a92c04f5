import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentCreateSchema, commentSchema, commentUpdateSchema, type CommentCreateInput, type CommentUpdateInput } from '#shared/reports/comment-schemas.ts';
import {
  followUpHeatSchema,
  reportCreateSchema,
  reportDetailSchema,
  reportTransitionSchema,
  type FollowUpHeatInput,
  type ReportTransitionInput,
} from '#shared/reports/report-schemas.ts';
import type { z } from 'zod';
import { apiClient } from '#src/lib/api-client.ts';
import { reportQueries, reportsBase } from './report-queries.ts';

const reportPath = (workshopId: string, reportId: string) => `${reportsBase(workshopId)}/reports/${encodeURIComponent(reportId)}`;

/** POST /reports: a draft on one's own casting. */
export function useCreateReport(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: z.input<typeof reportCreateSchema>) =>
      reportDetailSchema.parse(await apiClient.post(`${reportsBase(workshopId)}/reports`, reportCreateSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reportQueries.all() }),
  });
}

/** One move of the state table; every list and the report refetch (counts and queue change with it). */
export function useReportTransition(workshopId: string, reportId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ReportTransitionInput) =>
      reportDetailSchema.parse(await apiClient.post(`${reportPath(workshopId, reportId)}/transitions`, reportTransitionSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reportQueries.all() }),
  });
}

export function useLinkFollowUpHeat(workshopId: string, reportId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: FollowUpHeatInput) =>
      reportDetailSchema.parse((await apiClient.request('PUT', `${reportPath(workshopId, reportId)}/follow-up-heat`, followUpHeatSchema.parse(input))).data),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reportQueries.detail(workshopId, reportId).queryKey }),
  });
}

export function useCreateComment(workshopId: string, reportId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CommentCreateInput) =>
      commentSchema.parse(await apiClient.post(`${reportPath(workshopId, reportId)}/comments`, commentCreateSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reportQueries.comments(workshopId, reportId).queryKey }),
  });
}

export function useUpdateComment(workshopId: string, reportId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ commentId, input }: { commentId: string; input: CommentUpdateInput }) =>
      commentSchema.parse(await apiClient.patch(`${reportsBase(workshopId)}/comments/${encodeURIComponent(commentId)}`, commentUpdateSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reportQueries.comments(workshopId, reportId).queryKey }),
  });
}
