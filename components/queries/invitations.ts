import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Invitation, InvitationPreview, Me } from '@/server/schemas';
import { api } from '../api-client';
import { resetCacheForUser } from './me';

export const invitationKeys = {
  all: ['invitations'] as const,
  fitters: () => [...invitationKeys.all, 'fitters'] as const,
  player: (playerId: string) => [...invitationKeys.all, 'player', playerId] as const,
};

export const fitterInvitationsQuery = () =>
  queryOptions({ queryKey: invitationKeys.fitters(), queryFn: () => api.get<Invitation[]>('/team/invitations') });
export const playerInvitationsQuery = (playerId: string) =>
  queryOptions({ queryKey: invitationKeys.player(playerId), queryFn: () => api.get<Invitation[]>(`/players/${encodeURIComponent(playerId)}/invitations`) });

export function useFitterInvitationsQuery() {
  return useQuery(fitterInvitationsQuery());
}

export function usePlayerInvitationsQuery(playerId: string) {
  return useQuery(playerInvitationsQuery(playerId));
}

export function useInviteFitterMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { name: string; email: string }) => api.post<Invitation>('/team/invitations', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}

export function useInvitePlayerMutation(playerId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { email?: string }) => api.post<Invitation>(`/players/${encodeURIComponent(playerId)}/invitations`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}

export function useResendInvitationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.post<Invitation>(`/invitations/${encodeURIComponent(id)}/resend`, {}),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}

export function useRevokeInvitationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(`/invitations/${encodeURIComponent(id)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}

/** The invitation page: who is invited, by which shop (a dead link answers INVITATION_INVALID). */
export function useInvitationPreviewQuery(token: string) {
  return useQuery({
    queryKey: [...invitationKeys.all, 'preview', token] as const,
    queryFn: () => api.post<InvitationPreview>('/auth/invitation', { token }),
    retry: false,
  });
}

/** Sets the password and signs in: the session starts with this user. */
export function useAcceptInvitationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { token: string; password: string }) => api.post<{ user: Me }>('/auth/invitation/accept', body),
    onSuccess: ({ user }) => {
      resetCacheForUser(queryClient, user);
    },
  });
}
