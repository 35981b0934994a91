import type { ConnectorRecord, DipTubeRecord, DrumTypeRecord, OpeningRecord, PairingStatus, Region } from '@/shared/contract/records';
import { REGION_LABELS } from '@/shared/contract/records';

// Words for the registry's stored codes, in the trade's own terms.
export const MATERIAL_LABELS: Record<DrumTypeRecord['material'], string> = {
  steel: 'Steel',
  plastic: 'Plastic (HDPE)',
  fibre: 'Fibre',
  aluminium: 'Aluminium',
  other: 'Other',
};

export const HEAD_LABELS: Record<DrumTypeRecord['head'], string> = {
  tight: 'Tight head (bungs in a fixed top)',
  open: 'Open head (removable lid)',
};

export const POSITION_LABELS: Record<OpeningRecord['position'], string> = {
  large: 'Large bung',
  small: 'Small bung',
  center: 'Centre bung',
  other: 'Other',
};

export const CHANNEL_LABELS: Record<DipTubeRecord['channels'], string> = {
  feed: 'Feed only',
  'feed-return': 'Feed and return',
};

export const SUITED_TO_LABELS: Record<ConnectorRecord['suitedTo'], string> = {
  'two-opening': 'Two-opening tapping',
  'one-opening': 'One-opening tapping',
  both: 'Either tapping',
};

export const RETURN_PATH_LABELS: Record<ConnectorRecord['returnPath'], string> = {
  none: 'No return (feed only)',
  restricted: 'Restricted return',
  open: 'Open return',
};

export const STATUS_LABELS: Record<PairingStatus, string> = {
  draft: 'Draft',
  approved: 'Approved',
  retired: 'Retired',
};

export const TAPPING_LABELS: Record<string, string> = {
  'two-opening': 'Two-opening tapping',
  'one-opening': 'One-opening tapping',
};

export const regionLabel = (r: Region | string): string => REGION_LABELS[r as Region] ?? r;

/** A calendar date, the same on every screen: 2026-11-20. */
export function formatDate(iso: string | null | undefined): string {
  if (!iso) return '—';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '—' : d.toISOString().slice(0, 10);
}

/** The thread codes of a drum's openings, as the trade writes a drum's bungs: "NPS-2 + NPS-3/4". */
export const openingThreads = (openings: OpeningRecord[]): string => openings.map((o) => o.threadCode ?? '?').join(' + ') || '—';
