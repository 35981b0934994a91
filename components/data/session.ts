import { useMutation } from '@tanstack/react-query';
import type { MeAnswer, SignInResult, UserRecord } from '@/shared/contract/users';
import { api } from '../api/client';

export type { SignInResult, UserRecord };

export const signInRequest = (email: string, password: string) => api<SignInResult>('/auth/sign-in', { method: 'POST', body: { email, password } });

export const meRequest = () => api<MeAnswer>('/me');

export function useSignInMutation() {
  return useMutation({ mutationFn: (v: { email: string; password: string }) => signInRequest(v.email, v.password) });
}
