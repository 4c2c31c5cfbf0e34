import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../api-client';
import { resetCacheForUser } from '../queries/me';

/** Signs out this browser, or (everywhere) every browser of the user; the cache is emptied. */
export function useSignOutMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (options: { everywhere: boolean }) =>
      api.post<void>(options.everywhere ? '/auth/sign-out-everywhere' : '/auth/sign-out'),
    onSuccess: () => {
      resetCacheForUser(queryClient, null);
    },
  });
}
