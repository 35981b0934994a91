import { useMutation } from '@tanstack/react-query';
import { formatLength, fromMm, toMm, type LengthUnit } from '@/shared/units';
import { api } from '../api/client';
import { useSession } from '../session';
import type { SessionUser } from './session';

/** The signed-in user's length unit (kept per user on the server) and a way to change it. */
export function useLengthUnit() {
  const { session, updateUser } = useSession();
  const unit: LengthUnit = session?.user.lengthUnit ?? 'mm';
  const change = useMutation({
    mutationFn: (next: LengthUnit) => api<{ user: SessionUser }>('/me', { method: 'PATCH', body: { lengthUnit: next } }),
    onSuccess: ({ user }) => updateUser(user),
  });
  return {
    unit,
    setUnit: (next: LengthUnit) => change.mutate(next),
    /** A stored mm value shown in the user's unit, e.g. "851 mm" or "33.504 in". */
    show: (mm: number | null | undefined, digits?: number) => (mm == null ? '—' : formatLength(mm, unit, digits)),
    /** A value typed in the user's unit, to mm for the API. */
    toMm: (value: number) => toMm(value, unit),
    fromMm: (mm: number) => fromMm(mm, unit),
  };
}
