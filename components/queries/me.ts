import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { Me, UnitsPreference } from '@/server/schemas';
import { api, ApiError } from '../api-client';

export const meKeys = {
  all: ['me'] as const,
};

/** The signed-in user, or null when there is no session (401). */
export async function getMe(): Promise<Me | null> {
  try {
    return await api.get<Me>('/me');
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const meQuery = () => queryOptions({ queryKey: meKeys.all, queryFn: getMe });

export function useMeQuery() {
  return useQuery(meQuery());
}

/** Saves the units preference; the answer replaces the cached user. */
export function useUpdateUnitsMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (units: UnitsPreference) => api.patch<Me>('/me', { units }),
    onSuccess: (me) => queryClient.setQueryData(meKeys.all, me),
  });
}

/**
 * A new user (or none): drops every cached query of the previous one and records the new user.
 * The session query itself is kept and set, not removed: the SessionProvider observes it, and a
 * removed query would leave that observer on stale data.
 */
export function resetCacheForUser(queryClient: QueryClient, me: Me | null): void {
  queryClient.cancelQueries();
  queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== meKeys.all[0] });
  queryClient.getMutationCache().clear();
  queryClient.setQueryData(meKeys.all, me);
}
