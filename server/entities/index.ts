import { SiteSettings } from './site-settings';
import { User } from './user';

export { SiteSettings, User };
export const ENTITIES = [User, SiteSettings];
