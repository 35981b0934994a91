import { Column, Entity } from 'typeorm';
import { ROLES, type Role } from '../../shared/roles';
import type { ThemeChoice } from '../../shared/themes';
import { Base } from './base';

@Entity({ name: 'users' })
export class User extends Base {
  /** Stored lower-cased; the unique index makes it case-insensitive. */
  @Column({ type: 'varchar', length: 254, unique: true })
  email: string;

  @Column({ name: 'display_name', type: 'varchar', length: 120 })
  displayName: string;

  @Column({ type: 'enum', enum: ROLES, enumName: 'user_role' })
  role: Role;

  @Column({ name: 'password_hash', type: 'varchar', length: 100, select: false })
  passwordHash: string;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @Column({ name: 'must_change_password', type: 'boolean', default: false })
  mustChangePassword: boolean;

  @Column({ name: 'length_unit', type: 'varchar', length: 2, default: 'mm' })
  lengthUnit: 'mm' | 'in';

  /** Kinds of notice this person does not want by e-mail (they still see them in the app). */
  @Column({ name: 'mail_off', type: 'varchar', length: 20, array: true, default: () => "'{}'" })
  mailOff: string[];

  /** The colour theme this person chose (shared/themes.ts); 'system' follows each device's settings. */
  @Column({ type: 'varchar', length: 8, default: 'system' })
  theme: ThemeChoice;
}
