import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Fitting, Player } from '@/server/schemas';
import { api } from '../api-client';
import { fittingKeys } from './fittings';
import { playerKeys } from './players';

/** Archive or bring back a player (lists hide archived ones unless asked). */
export function useArchivePlayerMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (archived: boolean) => api.put<Player>(`/players/${encodeURIComponent(id)}/archived`, { archived }),
    onSuccess: (player) => {
      queryClient.setQueryData(playerKeys.detail(id), player);
      return queryClient.invalidateQueries({ queryKey: playerKeys.all });
    },
  });
}

/** Deletes a player with everything of theirs. */
export function useDeletePlayerMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>(`/players/${encodeURIComponent(id)}`),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: playerKeys.detail(id) });
      return Promise.all([queryClient.invalidateQueries({ queryKey: playerKeys.all }), queryClient.invalidateQueries({ queryKey: fittingKeys.all })]);
    },
  });
}

export function useArchiveFittingMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (archived: boolean) => api.put<Fitting>(`/fittings/${encodeURIComponent(id)}/archived`, { archived }),
    onSuccess: (fitting) => {
      queryClient.setQueryData(fittingKeys.detail(id), fitting);
      return queryClient.invalidateQueries({ queryKey: fittingKeys.all });
    },
  });
}

export function useDeleteFittingMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>(`/fittings/${encodeURIComponent(id)}`),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: fittingKeys.detail(id) });
      return Promise.all([queryClient.invalidateQueries({ queryKey: fittingKeys.all }), queryClient.invalidateQueries({ queryKey: playerKeys.all })]);
    },
  });
}
