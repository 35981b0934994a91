import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ListParams, Page } from '@/shared/contract/records';
import { api } from '../api/client';

function queryString(params: ListParams): string {
  const entries = Object.entries(params).filter(([, v]) => v !== undefined && v !== '' && v !== null);
  return entries.length ? `?${entries.map(([k, v]) => `${k}=${encodeURIComponent(String(v))}`).join('&')}` : '';
}

/**
 * The query module of one registry resource: keys, list and detail hooks, and mutations that invalidate
 * the resource on success. Each resource file calls this once (components/data/<resource>.ts).
 */
export function resourceQueries<T extends { id: string; version: number }, Input extends object = Partial<T>>(path: string) {
  const keys = {
    all: [path] as const,
    list: (params: ListParams) => [path, 'list', params] as const,
    detail: (id: string) => [path, 'detail', id] as const,
  };
  return {
    keys,
    useList(params: ListParams = {}, options: { enabled?: boolean } = {}) {
      return useQuery({ queryKey: keys.list(params), queryFn: () => api<Page<T>>(`/${path}${queryString(params)}`), placeholderData: keepPreviousData, ...options });
    },
    useDetail(id: string | undefined) {
      return useQuery({ queryKey: keys.detail(id ?? ''), queryFn: () => api<T>(`/${path}/${id}`), enabled: !!id });
    },
    useCreate() {
      const qc = useQueryClient();
      return useMutation({ mutationFn: (body: Input) => api<T>(`/${path}`, { method: 'POST', body }), onSuccess: () => qc.invalidateQueries({ queryKey: keys.all }) });
    },
    /** Sends the version the form was based on; a 409 comes back as an ApiError with details.current. */
    useUpdate() {
      const qc = useQueryClient();
      return useMutation({
        mutationFn: ({ id, ...body }: Partial<Input> & { id: string; version: number }) => api<T>(`/${path}/${id}`, { method: 'PATCH', body }),
        onSuccess: () => qc.invalidateQueries({ queryKey: keys.all }),
      });
    },
    useRemove() {
      const qc = useQueryClient();
      return useMutation({
        mutationFn: ({ id, version }: { id: string; version: number }) => api<void>(`/${path}/${id}?version=${version}`, { method: 'DELETE' }),
        onSuccess: () => qc.invalidateQueries({ queryKey: keys.all }),
      });
    },
  };
}
