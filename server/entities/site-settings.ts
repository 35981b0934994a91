import { Column, Entity } from 'typeorm';
import { Base } from './base';
import { Float } from './columns';

/** One row: the site this installation serves and its rule settings. */
@Entity({ name: 'site_settings' })
export class SiteSettings extends Base {
  @Column({ name: 'site_name', type: 'varchar', length: 120 })
  siteName: string;

  @Float('tip_clearance_min_mm', { default: 5 }) tipClearanceMinMm: number;
  @Float('tip_clearance_max_mm', { default: 25 }) tipClearanceMaxMm: number;
  @Float('thread_match_tolerance_mm', { default: 0.6 }) threadMatchToleranceMm: number;
  @Float('laminar_limit', { default: 2300 }) laminarLimit: number;
  @Float('max_return_velocity_ratio', { default: 4 }) maxReturnVelocityRatio: number;
  /** IANA zone of the site: its calendar date is the "today" lot expiry is judged on. */
  @Column({ name: 'time_zone', type: 'varchar', length: 64, default: 'UTC' }) timeZone: string;
}
