import { Connector, DipTube, DrumOpening, DrumType, KeyCode, Pairing, PairingReview, Slurry, Station, Supplier, ThreadSpec, TubeSet } from './registry';
import { ChangeOut, HardwareWarning, Notification, ReceivingCheck, RinseLog, SourcingPlan } from './operations';
import { Attachment, ImportRecord, OutboxMessage } from './files-and-mail';
import { SiteSettings } from './site-settings';
import { PasswordReset, User } from './user';

export * from './files-and-mail';
export * from './operations';
export * from './registry';
export { PasswordReset, SiteSettings, User };
export const ENTITIES = [
  User,
  SiteSettings,
  Supplier,
  ThreadSpec,
  KeyCode,
  DrumType,
  DrumOpening,
  DipTube,
  Connector,
  Pairing,
  PairingReview,
  Slurry,
  Station,
  TubeSet,
  ReceivingCheck,
  Notification,
  SourcingPlan,
  HardwareWarning,
  RinseLog,
  ChangeOut,
  Attachment,
  ImportRecord,
  OutboxMessage,
  PasswordReset,
];
