import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { forgotBodySchema, resetBodySchema } from '@/server/schemas';
import { api } from '../api-client';
import { resetCacheForUser } from '../queries/me';

export type ForgotBody = z.infer<typeof forgotBodySchema>;
export type ResetBody = z.infer<typeof resetBodySchema>;

/** Asks for a link to set a new password; the server answers 204 whether or not the account exists. */
export function useForgotPasswordMutation() {
  return useMutation({
    mutationFn: (body: ForgotBody) => api.post<void>('/auth/forgot', body),
  });
}

/** Sets a new password with the e-mailed token; every session of that user has ended afterwards. */
export function useResetPasswordMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ResetBody) => api.post<void>('/auth/reset', body),
    onSuccess: () => {
      // The server ended every session of the user: nothing cached may outlive them.
      resetCacheForUser(queryClient, null);
    },
  });
}
