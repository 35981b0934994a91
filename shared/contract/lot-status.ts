// The one home of where a lot stands at the dock: the server's DTOs and entity, the history filter and the
// client types read this list.

export const LOT_STATUSES = ['checked', 'on-hold', 'quarantined', 'released'] as const;
export type LotStatus = (typeof LOT_STATUSES)[number];

export const LOT_STATUS_LABELS: Record<LotStatus, string> = {
  checked: 'Checked',
  'on-hold': 'On hold',
  quarantined: 'Quarantined',
  released: 'Released',
};

/** Statuses that keep a lot off the stations until an engineer (or the missing certificate) releases it. */
export const HELD_STATUSES: readonly LotStatus[] = ['on-hold', 'quarantined'];
