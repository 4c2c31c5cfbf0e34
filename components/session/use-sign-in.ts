import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Me, SignInBody } from '@/server/schemas';
import { api } from '../api-client';
import { resetCacheForUser } from '../queries/me';

/** Signs in; the server sets the session cookie and answers with the user. */
export function useSignInMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => api.post<{ user: Me }>('/auth/sign-in', body),
    onSuccess: ({ user }) => {
      // Nothing of a previous user may linger.
      resetCacheForUser(queryClient, user);
    },
  });
}
