import { Connector, DipTube, DrumOpening, DrumType, KeyCode, Pairing, PairingReview, Slurry, Station, Supplier, ThreadSpec, TubeSet } from './registry';
import { SiteSettings } from './site-settings';
import { User } from './user';

export * from './registry';
export { SiteSettings, User };
export const ENTITIES = [User, SiteSettings, Supplier, ThreadSpec, KeyCode, DrumType, DrumOpening, DipTube, Connector, Pairing, PairingReview, Slurry, Station, TubeSet];
