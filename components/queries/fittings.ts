import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Fitting, FittingBody, FittingFilters } from '@/server/schemas';
import { api } from '../api-client';
import { playerKeys } from './players';

export const fittingKeys = {
  all: ['fittings'] as const,
  list: (f: FittingFilters) => [...fittingKeys.all, 'list', f] as const,
  detail: (id: string) => [...fittingKeys.all, 'detail', id] as const,
};

export const getFittings = (f: FittingFilters) =>
  api.get<Fitting[]>('/fittings', { playerId: f.playerId, q: f.q?.trim() || undefined, from: f.from, to: f.to, sort: f.sort, step: f.step, archived: f.archived });
export const getFitting = (id: string) => api.get<Fitting>(`/fittings/${encodeURIComponent(id)}`);

export const fittingsQuery = (f: FittingFilters) =>
  queryOptions({ queryKey: fittingKeys.list(f), queryFn: () => getFittings(f) });
export const fittingQuery = (id: string) =>
  queryOptions({ queryKey: fittingKeys.detail(id), queryFn: () => getFitting(id) });

export function useFittingsQuery(f: FittingFilters, options: { enabled?: boolean } = {}) {
  return useQuery({ ...fittingsQuery(f), enabled: options.enabled ?? true });
}

export function useFittingQuery(id: string) {
  return useQuery(fittingQuery(id));
}

/** A fitting change: the update schema's keys (the player of a fitting does not change). */
export type FittingChange = Partial<Omit<FittingBody, 'playerId'>>;

export function useCreateFittingMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: FittingBody) => api.post<Fitting>('/fittings', body),
    onSuccess: (fitting) => {
      queryClient.setQueryData(fittingKeys.detail(fitting.id), fitting);
      // Player rows show a fitting count.
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: fittingKeys.all }),
        queryClient.invalidateQueries({ queryKey: playerKeys.all }),
      ]);
    },
  });
}

export function useUpdateFittingMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: FittingChange) => api.patch<Fitting>(`/fittings/${encodeURIComponent(id)}`, body),
    onSuccess: (fitting) => {
      queryClient.setQueryData(fittingKeys.detail(id), fitting);
      return queryClient.invalidateQueries({ queryKey: fittingKeys.all });
    },
  });
}
