import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  notificationPageSchema,
  notificationPreferencesSchema,
  notificationSchema,
  type NotificationPreferences,
} from '#shared/reports/notification-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

/** The signed-in user's notifications (across workshops) and how they want them by e-mail. */
export const notificationQueries = {
  all: () => ['notifications'] as const,
  lists: () => [...notificationQueries.all(), 'list'] as const,
  list: () =>
    queryOptions({
      queryKey: [...notificationQueries.lists(), { limit: 30 }] as const,
      queryFn: async ({ signal }) => notificationPageSchema.parse(await apiClient.get('/notifications?limit=30', { signal })),
      // The bell's count stays roughly current without a socket.
      refetchInterval: 60_000,
    }),
  preferences: () =>
    queryOptions({
      queryKey: [...notificationQueries.all(), 'preferences'] as const,
      queryFn: async ({ signal }) => notificationPreferencesSchema.parse(await apiClient.get('/notification-preferences', { signal })),
    }),
};

export function useMarkNotificationRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (notificationId: string) =>
      notificationSchema.parse(await apiClient.post(`/notifications/${encodeURIComponent(notificationId)}/read`)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: notificationQueries.lists() }),
  });
}

export function useMarkAllNotificationsRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => apiClient.post('/notifications/read-all'),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: notificationQueries.lists() }),
  });
}

export function useUpdateNotificationPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: NotificationPreferences) =>
      notificationPreferencesSchema.parse(
        (await apiClient.request('PUT', '/notification-preferences', notificationPreferencesSchema.parse(input))).data,
      ),
    onSuccess: (saved) => queryClient.setQueryData(notificationQueries.preferences().queryKey, saved),
  });
}
