import { NOTICE_KIND_WORDS, NOTICE_KINDS, type NoticeKind } from '@/shared/contract/notice-kinds';
import { useMutation } from '@tanstack/react-query';
import { api } from '../api/client';
import { useSession } from '../session';
import type { MeAnswer } from '@/shared/contract/users';

/** The kinds of notice that can also come by e-mail, in the words of the settings. */
export const MAIL_KINDS = NOTICE_KINDS.map((kind) => ({ kind, label: NOTICE_KIND_WORDS[kind].setting }));
export type MailKind = NoticeKind;

/**
 * The signed-in person's e-mail choices, kept on their account (PATCH /me {mailOff}). Each change is sent at
 * once; changes run one after another so the last one made is the one kept.
 */
export function useMailPreferences() {
  const { session, updateUser } = useSession();
  const save = useMutation({
    scope: { id: 'me' },
    mutationFn: (mailOff: string[]) => api<MeAnswer>('/me', { method: 'PATCH', body: { mailOff } }),
    onSuccess: ({ user }) => updateUser(user),
  });
  // While a change is on its way, show it; if it fails, the account's own list shows again.
  const off: string[] = save.isPending && save.variables ? save.variables : (session?.user.mailOff ?? []);
  return {
    isOn: (kind: MailKind) => !off.includes(kind),
    set: (kind: MailKind, on: boolean) => save.mutate(on ? off.filter((k) => k !== kind) : [...off.filter((k) => k !== kind), kind]),
    retry: () => (save.variables ? save.mutate(save.variables) : undefined),
    saving: save.isPending,
    saved: save.isSuccess,
    error: save.error,
  };
}
