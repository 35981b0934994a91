import { useMutation } from '@tanstack/react-query';
import type { Role } from '@/shared/contract/roles';
import type { ThemeChoice } from '@/shared/themes';
import { api } from '../api/client';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  lengthUnit?: 'mm' | 'in';
  /** Kinds of notice this person does not want by e-mail (they still appear under Notices). */
  mailOff?: string[];
  /** An account made or reset by an administrator: the password change comes before anything else. */
  mustChangePassword?: boolean;
  /** The colour theme chosen on the account; it follows the person to every device they sign in on. */
  theme?: ThemeChoice;
}

export interface SignInResult {
  token: string;
  user: SessionUser;
}

export const signInRequest = (email: string, password: string) => api<SignInResult>('/auth/sign-in', { method: 'POST', body: { email, password } });

export const meRequest = () => api<{ user: SessionUser }>('/me');

export function useSignInMutation() {
  return useMutation({ mutationFn: (v: { email: string; password: string }) => signInRequest(v.email, v.password) });
}
