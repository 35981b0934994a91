import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Page } from '@/shared/contract/records';
import type { Role } from '@/shared/contract/roles';
import { api } from '../api/client';

export interface UserRow {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** Still on a temporary password (new, or reset by an administrator). */
  mustChangePassword: boolean;
}

export const userKeys = { all: ['users'] as const, list: () => [...userKeys.all, 'list'] as const };

export function useUsersQuery() {
  return useQuery({ queryKey: userKeys.list(), queryFn: () => api<Page<UserRow>>('/users') });
}

export function useUserCreateMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { email: string; name: string; role: Role; temporaryPassword: string }) => api<UserRow>('/users', { method: 'POST', body: v }),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.all }),
  });
}

export function useUserUpdateMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: { id: string; role?: Role; active?: boolean }) => api<UserRow>(`/users/${id}`, { method: 'PATCH', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.all }),
  });
}

/** An administrator's reset: the answer holds the temporary password, shown once and kept nowhere in the client. */
export function useUserResetPasswordMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api<{ user: UserRow; temporaryPassword: string }>(`/users/${id}/reset-password`, { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.all }),
  });
}
