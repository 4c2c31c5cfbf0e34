import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { BagClubBody, BagClubUpdate, BagHistoryItem, BagView } from '@/server/schemas';
import { api } from '../api-client';
import type { BagClubState } from '../bag/bag-club-state';

export const bagKeys = {
  all: ['bags'] as const,
  detail: (playerId: string, on: string | null) => [...bagKeys.all, 'detail', playerId, on ?? 'today'] as const,
  history: (bagClubId: string) => [...bagKeys.all, 'history', bagClubId] as const,
};

const enc = encodeURIComponent;
export const getBag = (playerId: string, on: string | null) => api.get<BagView>(`/players/${enc(playerId)}/bag`, { on: on ?? undefined });
export const getBagClubHistory = (id: string) => api.get<BagHistoryItem[]>(`/bag-clubs/${enc(id)}/history`);

export const bagQuery = (playerId: string, on: string | null = null) =>
  queryOptions({ queryKey: bagKeys.detail(playerId, on), queryFn: () => getBag(playerId, on) });

/** A player's bag today, or as recorded at the end of `on` (YYYY-MM-DD). */
export function useBagQuery(playerId: string, on: string | null = null, options: { enabled?: boolean } = {}) {
  return useQuery({ ...bagQuery(playerId, on), enabled: (options.enabled ?? true) && playerId !== '' });
}

export function useBagClubHistoryQuery(id: string) {
  return useQuery({ queryKey: bagKeys.history(id), queryFn: () => getBagClubHistory(id) });
}

/** Adds a club to a player's bag (staff). */
export function useAddBagClubMutation(playerId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: BagClubBody) => api.post<BagClubState>(`/players/${enc(playerId)}/bag/clubs`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bagKeys.all }),
  });
}

/** Saves a club (staff); a 409 VERSION_CONFLICT answer means reload first. */
export function useUpdateBagClubMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: BagClubUpdate }) => api.patch<BagClubState>(`/bag-clubs/${enc(id)}`, change),
    onSettled: () => queryClient.invalidateQueries({ queryKey: bagKeys.all }),
  });
}

/** Saves a wedge's rounds and practice sessions (the player or staff). */
export function useUpdateWearMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: { roundsSince?: number; practiceSessionsSince?: number; version: number } }) =>
      api.patch<BagClubState>(`/bag-clubs/${enc(id)}/wear`, change),
    onSettled: () => queryClient.invalidateQueries({ queryKey: bagKeys.all }),
  });
}
