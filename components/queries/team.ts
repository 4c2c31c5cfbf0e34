import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { TeamMember } from '@/server/schemas';
import { api } from '../api-client';

export const teamKeys = {
  all: ['team'] as const,
  list: () => [...teamKeys.all, 'list'] as const,
};

export const getTeam = () => api.get<TeamMember[]>('/team');

export const teamQuery = () => queryOptions({ queryKey: teamKeys.list(), queryFn: getTeam });

export function useTeamQuery() {
  return useQuery(teamQuery());
}

export function useUpdateTeamMemberMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: { id: string; name?: string; active?: boolean }) =>
      api.patch<TeamMember>(`/team/${encodeURIComponent(id)}`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
