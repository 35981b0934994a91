import { useMutation } from '@tanstack/react-query';
import { api } from '../api/client';
import { useSession } from '../session';
import type { MessageAnswer, SignInResult } from '@/shared/contract/users';

/**
 * The signed-in person's own change. The answer carries a fresh token: the server ends every other session of
 * theirs, and this one goes on with the new token.
 */
export function useChangePasswordMutation() {
  const { begin } = useSession();
  return useMutation({
    mutationFn: (v: { currentPassword: string; newPassword: string }) => api<SignInResult>('/me/password', { method: 'POST', body: v }),
    onSuccess: (result) => begin(result),
  });
}

/** "Forgot password": the answer is the same whether or not the address belongs to anyone. */
export function useForgotPasswordMutation() {
  return useMutation({ mutationFn: (email: string) => api<MessageAnswer>('/auth/forgot-password', { method: 'POST', body: { email } }) });
}

/** Sets a new password with the token from an e-mailed link; every session of that person ends. */
export function useResetPasswordMutation() {
  return useMutation({ mutationFn: (v: { token: string; newPassword: string }) => api<MessageAnswer>('/auth/reset-password', { method: 'POST', body: v }) });
}
