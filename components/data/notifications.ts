import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NoticeList, NoticeRecord } from '@/shared/contract/notifications';
import { api } from '../api/client';

export type { NoticeList, NoticeRecord };

export const notificationKeys = { all: ['notifications'] as const };

/** The signed-in user's notices; polled so the unread count in the bar stays current. */
export function useNotificationsQuery(options: { enabled?: boolean } = {}) {
  return useQuery({
    queryKey: notificationKeys.all,
    queryFn: () => api<NoticeList>('/notifications'),
    refetchInterval: 60_000,
    refetchOnWindowFocus: true,
    ...options,
  });
}

export function useMarkNoticeReadMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api<NoticeRecord>(`/notifications/${id}/read`, { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: notificationKeys.all }),
  });
}

export function useMarkAllNoticesReadMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>('/notifications/read-all', { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: notificationKeys.all }),
  });
}
