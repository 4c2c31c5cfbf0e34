import { useMutation } from '@tanstack/react-query';
import type { SignUpBody } from '@/server/schemas';
import { api } from '../api-client';

/** Makes the shop and its owner; the server answers the same whether or not the address is known. */
export function useSignUpMutation() {
  return useMutation({ mutationFn: (body: SignUpBody) => api.post<{ sent: true }>('/auth/sign-up', body) });
}

/** Sends the confirmation link again (204 whatever the address). */
export function useResendVerificationMutation() {
  return useMutation({ mutationFn: (email: string) => api.post<void>('/auth/verify/resend', { email }) });
}

/** Confirms the address with the e-mailed token. */
export function useVerifyEmailMutation() {
  return useMutation({ mutationFn: (token: string) => api.post<void>('/auth/verify', { token }) });
}
