import { useQuery } from '@tanstack/react-query';
import type { SettingsRecord } from '@/shared/contract/records';
import type { FitSettings } from '@/shared/fit';
import { api } from '../api/client';

export type { SettingsRecord };

export const settingsKeys = { all: ['settings'] as const };

/** The site settings (tip clearance window, flow limits) every fit check uses. */
export function useSettingsQuery() {
  return useQuery({ queryKey: settingsKeys.all, queryFn: () => api<SettingsRecord>('/settings') });
}

/** Only the numbers the fit rules read. */
export function fitSettingsOf(s: SettingsRecord): FitSettings {
  return {
    tipClearanceMinMm: s.tipClearanceMinMm,
    tipClearanceMaxMm: s.tipClearanceMaxMm,
    threadMatchToleranceMm: s.threadMatchToleranceMm,
    laminarLimit: s.laminarLimit,
    maxReturnVelocityRatio: s.maxReturnVelocityRatio,
  };
}
