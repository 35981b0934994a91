// Every migration, in order. A new migration is added here as well as in its own timestamped file
// (see DEVELOPERS.md): an explicit list works the same compiled by tsc and under ts-jest.
import { Iso7ThreadFamilies1764759600000 } from './1764759600000-iso-7-thread-families';
import { CreateUsers1764612000000 } from './1764612000000-create-users';
import { CreateRegistry1764615600000 } from './1764615600000-create-registry';
import { CreateOperations1764619200000 } from './1764619200000-create-operations';
import { CreateImportsAttachmentsOutbox1764622800000 } from './1764622800000-create-imports-attachments-outbox';
import { CreateAuditLog1764626400000 } from './1764626400000-create-audit-log';
import { IndexTubeReach1764630000000 } from './1764630000000-index-tube-reach';
import { CoverTubeReach1764633600000 } from './1764633600000-cover-tube-reach';
import { ChangeNotify1764637200000 } from './1764637200000-change-notify';
import { PasswordResets1764644400000 } from './1764644400000-password-resets';
import { SignInCounters1764648000000 } from './1764648000000-sign-in-counters';
import { LotAcceptance1764655200000 } from './1764655200000-lot-acceptance';
import { UserTheme1764662400000 } from './1764662400000-user-theme';
import { OfflineDockChecks1764666000000 } from './1764666000000-offline-dock-checks';
import { StationChangeNotify1764846000000 } from './1764846000000-station-change-notify';
import { SlurryProperties1764932400000 } from './1764932400000-slurry-properties';

export const MIGRATIONS = [
  CreateUsers1764612000000,
  CreateRegistry1764615600000,
  CreateOperations1764619200000,
  CreateImportsAttachmentsOutbox1764622800000,
  CreateAuditLog1764626400000,
  IndexTubeReach1764630000000,
  CoverTubeReach1764633600000,
  ChangeNotify1764637200000,
  PasswordResets1764644400000,
  SignInCounters1764648000000,
  LotAcceptance1764655200000,
  UserTheme1764662400000,
  OfflineDockChecks1764666000000,
  Iso7ThreadFamilies1764759600000,
  StationChangeNotify1764846000000,
  SlurryProperties1764932400000,
];
