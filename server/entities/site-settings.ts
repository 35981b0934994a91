import { Column, Entity } from 'typeorm';
import { Base } from './base';

/** One row: the site this installation serves and its rule settings. */
@Entity({ name: 'site_settings' })
export class SiteSettings extends Base {
  @Column({ name: 'site_name', type: 'varchar', length: 120 })
  siteName: string;
}
