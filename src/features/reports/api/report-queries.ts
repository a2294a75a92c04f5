import { infiniteQueryOptions, queryOptions } from '@tanstack/react-query';
import { commentListSchema } from '#shared/reports/comment-schemas.ts';
import {
  reportDetailSchema,
  reportPageSchema,
  reviewQueueSchema,
  studentOverviewSchema,
} from '#shared/reports/report-schemas.ts';
import type { ReportState } from '#shared/reports/report-states.ts';
import { heatDetailSchema, heatPageSchema } from '#shared/heats/heat-schemas.ts';
import { photoPageSchema, photoSchema } from '#shared/photos/photo-schemas.ts';
import type { DefectKindId } from '#shared/domain/index.ts';
import { apiClient } from '#src/lib/api-client.ts';

export const reportsBase = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}`;

export const REPORT_PAGE_SIZE = 25;

export type ReportFilters = { state?: ReportState; studentId?: string; mentorId?: string; defect?: DefectKindId };

function filterQuery(filters: ReportFilters): URLSearchParams {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value) params.set(key, value);
  return params;
}

/**
 * Defect reports: the keyset list (its own infinite branch), one report,
 * the review queue, a student's overview, a report's comments and the
 * photos a report shows (fetched here so the page draws its own marks).
 */
export const reportQueries = {
  all: () => ['reports'] as const,

  infinites: () => [...reportQueries.all(), 'infinite'] as const,
  infinite: (workshopId: string, filters: ReportFilters) =>
    infiniteQueryOptions({
      queryKey: [...reportQueries.infinites(), { workshopId, ...filters }] as const,
      queryFn: async ({ pageParam, signal }) => {
        const params = filterQuery(filters);
        params.set('limit', String(REPORT_PAGE_SIZE));
        if (pageParam) params.set('cursor', pageParam);
        return reportPageSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/reports?${params.toString()}`, { signal }));
      },
      initialPageParam: null as string | null,
      getNextPageParam: (last) => last.nextCursor,
    }),

  lists: () => [...reportQueries.all(), 'list'] as const,
  /** One page per state, for the counts above the list. */
  count: (workshopId: string, state: ReportState) =>
    queryOptions({
      queryKey: [...reportQueries.lists(), 'count', { workshopId, state }] as const,
      queryFn: async ({ signal }) => {
        const page = reportPageSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/reports?state=${state}&limit=100`, { signal }));
        return { count: page.items.length, more: page.nextCursor !== null };
      },
    }),
  reviewQueue: (workshopId: string) =>
    queryOptions({
      queryKey: [...reportQueries.lists(), 'review-queue', { workshopId }] as const,
      queryFn: async ({ signal }) => reviewQueueSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/review-queue`, { signal })),
    }),
  student: (workshopId: string, userId: string) =>
    queryOptions({
      queryKey: [...reportQueries.lists(), 'student', { workshopId, userId }] as const,
      queryFn: async ({ signal }) =>
        studentOverviewSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/students/${encodeURIComponent(userId)}/overview`, { signal })),
    }),

  details: () => [...reportQueries.all(), 'detail'] as const,
  detail: (workshopId: string, reportId: string) =>
    queryOptions({
      queryKey: [...reportQueries.details(), { workshopId, reportId }] as const,
      queryFn: async ({ signal }) =>
        reportDetailSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/reports/${encodeURIComponent(reportId)}`, { signal })),
    }),

  comments: (workshopId: string, reportId: string) =>
    queryOptions({
      queryKey: [...reportQueries.details(), 'comments', { workshopId, reportId }] as const,
      queryFn: async ({ signal }) =>
        commentListSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/reports/${encodeURIComponent(reportId)}/comments`, { signal })).items,
    }),

  photo: (workshopId: string, photoId: string) =>
    queryOptions({
      queryKey: [...reportQueries.all(), 'photo', { workshopId, photoId }] as const,
      queryFn: async ({ signal }) => photoSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/photos/${encodeURIComponent(photoId)}`, { signal })),
    }),
};

/** The heats the author may link as the follow-up, and the follow-up heat's photos (before/after). */
export const followUpQueries = {
  all: () => [...reportQueries.all(), 'follow-up'] as const,
  heats: (workshopId: string, casterId: string) =>
    queryOptions({
      queryKey: [...followUpQueries.all(), 'heats', { workshopId, casterId }] as const,
      queryFn: async ({ signal }) =>
        heatPageSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/heats?casterId=${encodeURIComponent(casterId)}&limit=20`, { signal })).items,
    }),
  photos: (workshopId: string, heatId: string) =>
    queryOptions({
      queryKey: [...followUpQueries.all(), 'photos', { workshopId, heatId }] as const,
      queryFn: async ({ signal }) => {
        const heat = heatDetailSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/heats/${encodeURIComponent(heatId)}`, { signal }));
        const pages = await Promise.all(
          heat.castings.map(async (c) =>
            photoPageSchema.parse(await apiClient.get(`${reportsBase(workshopId)}/photos?castingId=${encodeURIComponent(c.id)}&limit=20`, { signal })),
          ),
        );
        return pages.flatMap((p) => p.items);
      },
    }),
};
