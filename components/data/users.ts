import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Page } from '@/shared/contract/records';
import type { Role } from '@/shared/contract/roles';
import type { PasswordResetAnswer, UserRecord } from '@/shared/contract/users';
import { api } from '../api/client';

export type { UserRecord };

export const userKeys = { all: ['users'] as const, list: () => [...userKeys.all, 'list'] as const };

export function useUsersQuery() {
  return useQuery({ queryKey: userKeys.list(), queryFn: () => api<Page<UserRecord>>('/users') });
}

export function useUserCreateMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { email: string; name: string; role: Role; temporaryPassword: string }) => api<UserRecord>('/users', { method: 'POST', body: v }),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.all }),
  });
}

export function useUserUpdateMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: { id: string; role?: Role; active?: boolean }) => api<UserRecord>(`/users/${id}`, { method: 'PATCH', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.all }),
  });
}

/** An administrator's reset: the answer holds the temporary password, shown once and kept nowhere in the client. */
export function useUserResetPasswordMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api<PasswordResetAnswer>(`/users/${id}/reset-password`, { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.all }),
  });
}
