import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Player, PlayerBody, PlayerFilters } from '@/server/schemas';
import { api } from '../api-client';
import { fittingKeys } from './fittings';

export const playerKeys = {
  all: ['players'] as const,
  list: (f: PlayerFilters) => [...playerKeys.all, 'list', f] as const,
  detail: (id: string) => [...playerKeys.all, 'detail', id] as const,
};

export const getPlayers = (f: PlayerFilters) => api.get<Player[]>('/players', { q: f.q, archived: f.archived, sort: f.sort });
export const getPlayer = (id: string) => api.get<Player>(`/players/${encodeURIComponent(id)}`);

export const playersQuery = (f: PlayerFilters) =>
  queryOptions({ queryKey: playerKeys.list(f), queryFn: () => getPlayers(f) });
export const playerQuery = (id: string) =>
  queryOptions({ queryKey: playerKeys.detail(id), queryFn: () => getPlayer(id) });

export function usePlayersQuery(f: PlayerFilters) {
  return useQuery(playersQuery(f));
}

export function usePlayerQuery(id: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...playerQuery(id), enabled: (options.enabled ?? true) && id !== '' });
}

export function useCreatePlayerMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PlayerBody) => api.post<Player>('/players', body),
    onSuccess: (player) => {
      queryClient.setQueryData(playerKeys.detail(player.id), player);
      return queryClient.invalidateQueries({ queryKey: playerKeys.all });
    },
  });
}

export function useUpdatePlayerMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<PlayerBody>) => api.patch<Player>(`/players/${encodeURIComponent(id)}`, body),
    onSuccess: (player) => {
      queryClient.setQueryData(playerKeys.detail(id), player);
      // Fittings show the player's name.
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: playerKeys.all }),
        queryClient.invalidateQueries({ queryKey: fittingKeys.all }),
      ]);
    },
  });
}
