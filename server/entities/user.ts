import { Column, Entity, JoinColumn, ManyToOne } from 'typeorm';
import { ROLES, type Role } from '../../shared/contract/roles';
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

  /** Copied into each sign-in token; bumped by a password change or reset, which ends every older session. */
  @Column({ name: 'session_epoch', type: 'integer', default: 0 })
  sessionEpoch: number;

  @Column({ name: 'password_changed_at', type: 'timestamptz', nullable: true })
  passwordChangedAt: Date | null;

  @Column({ name: 'length_unit', type: 'varchar', length: 2, default: 'mm' })
  lengthUnit: 'mm' | 'in';

  /** Kinds of notice this person does not want by e-mail (they still see them in the app). */
  @Column({ name: 'mail_off', type: 'varchar', length: 20, array: true, default: () => "'{}'" })
  mailOff: string[];

  /** The colour theme this person chose (shared/themes.ts); 'system' follows each device's settings. */
  @Column({ type: 'varchar', length: 8, default: 'system' })
  theme: ThemeChoice;
}

/** An e-mailed reset link: only the SHA-256 of its token is kept; used once, or never after `expiresAt`. */
@Entity({ name: 'password_resets' })
export class PasswordReset extends Base {
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: User;

  @Column({ name: 'token_hash', type: 'char', length: 64, unique: true })
  tokenHash: string;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'used_at', type: 'timestamptz', nullable: true })
  usedAt: Date | null;
}
