// The registry snapshot a phone keeps for the dock (GET /dock-snapshot); its shape lives beside the code that judges it.
export type { DockSnapshot, SnapshotDrumType, SnapshotSlurry, SnapshotStation } from '../dock/snapshot';
