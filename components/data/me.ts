import { useMutation } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { ThemeChoice } from '@/shared/themes';
import { formatLength, fromMm, toMm, type LengthUnit } from '@/shared/units';
import { api } from '../api/client';
import { useSession } from '../session';
import { setDeviceTheme, storedThemeChoice } from '../theme-web';
import type { MeAnswer } from '@/shared/contract/users';

/** The signed-in user's length unit (kept per user on the server) and a way to change it. */
export function useLengthUnit() {
  const { session, updateUser } = useSession();
  const unit: LengthUnit = session?.user.lengthUnit ?? 'mm';
  // Changes only with the unit, so that lists may build their columns once per unit.
  const show = useCallback((mm: number | null | undefined, digits?: number) => (mm == null ? '—' : formatLength(mm, unit, digits)), [unit]);
  const change = useMutation({
    mutationFn: (next: LengthUnit) => api<MeAnswer>('/me', { method: 'PATCH', body: { lengthUnit: next } }),
    onSuccess: ({ user }) => updateUser(user),
  });
  return {
    unit,
    setUnit: (next: LengthUnit) => change.mutate(next),
    /** A stored mm value shown in the user's unit, e.g. "851 mm" or "33.504 in". */
    show,
    /** A value typed in the user's unit, to mm for the API. */
    toMm: (value: number) => toMm(value, unit),
    fromMm: (mm: number) => fromMm(mm, unit),
  };
}

/**
 * The person's colour theme (kept on the account, PATCH /me {theme}, and on this device). A choice shows at
 * once; if saving fails, the account's own choice shows again and the error offers a retry.
 */
export function useThemeChoice() {
  const { session, updateUser } = useSession();
  const account = session?.user.theme ?? storedThemeChoice();
  const save = useMutation({
    scope: { id: 'me' },
    mutationFn: (theme: ThemeChoice) => api<MeAnswer>('/me', { method: 'PATCH', body: { theme } }),
    onSuccess: ({ user }) => updateUser(user),
    onError: () => setDeviceTheme(account),
  });
  const choose = (theme: ThemeChoice) => {
    setDeviceTheme(theme);
    save.mutate(theme);
  };
  return {
    choice: save.isPending && save.variables ? save.variables : account,
    choose,
    retry: () => (save.variables ? choose(save.variables) : undefined),
    saving: save.isPending,
    saved: save.isSuccess,
    error: save.error,
  };
}
