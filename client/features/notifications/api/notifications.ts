import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { UpdateNotificationPreferencesInput } from '@shared/schemas/notification.schema';
import type {
  NotificationPage,
  NotificationPreferencesView,
  NotificationView,
} from '@shared/schemas/notification-views';
import { api } from '@client/lib/api-client';

export const notificationKeys = {
  all: ['notifications'] as const,
  list: () => [...notificationKeys.all, 'list'] as const,
  preferences: () => [...notificationKeys.all, 'preferences'] as const,
};

/** The newest page; enough for the bell's list and its unread count. */
export const notificationsQuery = () =>
  queryOptions({
    queryKey: notificationKeys.list(),
    queryFn: ({ signal }) => api.get<NotificationPage>('/me/notifications', signal),
  });
export const preferencesQuery = () =>
  queryOptions({
    queryKey: notificationKeys.preferences(),
    queryFn: ({ signal }) => api.get<NotificationPreferencesView>('/me/notification-preferences', signal),
  });

export const useNotifications = () => useQuery(notificationsQuery());
export const usePreferences = () => useQuery(preferencesQuery());

export function useMarkRead() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      api.post<{ notification: NotificationView; unreadCount: number }>(`/me/notifications/${id}/read`),
    onSuccess: ({ notification, unreadCount }) => {
      qc.setQueryData(
        notificationKeys.list(),
        (page: NotificationPage | undefined) =>
          page && {
            ...page,
            unreadCount,
            notifications: page.notifications.map((n) => (n.id === notification.id ? notification : n)),
          },
      );
    },
  });
}

export function useMarkAllRead() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<{ updated: number; unreadCount: number }>('/me/notifications/read-all'),
    onSuccess: () => qc.invalidateQueries({ queryKey: notificationKeys.list() }),
  });
}

export function useUpdatePreferences() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateNotificationPreferencesInput) =>
      api.patch<NotificationPreferencesView>('/me/notification-preferences', input),
    onSuccess: (view) => qc.setQueryData(notificationKeys.preferences(), view),
  });
}
