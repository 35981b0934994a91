import type { DataSource } from 'typeorm';
import { unauthorized } from '../common/errors';
import type { SignInResult, UserRecord } from '../../shared/contract/users';
import { User } from '../entities';
import { verifyPassword } from './passwords';
import { sessionToken } from './tokens';

/** A person as the API answers with them (sign-in, /me, /users). */
export const toUserRecord = (u: User) =>
  ({
    id: u.id,
    email: u.email,
    name: u.displayName,
    role: u.role,
    active: u.active,
    lengthUnit: u.lengthUnit,
    mailOff: u.mailOff ?? [],
    mustChangePassword: u.mustChangePassword,
    theme: u.theme ?? 'system',
  }) satisfies UserRecord;

// One message whatever was wrong, so the answer never tells whether an account exists.
const WRONG = 'That e-mail and password do not match an active account.';
// Compared against when the account does not exist, so both paths cost one bcrypt comparison.
const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.vYQGqUu3x0bbpj7xvtJrW5.Vt9yy';

export class AuthService {
  constructor(
    private readonly ds: DataSource,
    private readonly secret: string,
  ) {}

  async signIn(email: string, password: string): Promise<SignInResult> {
    const user = await this.ds.getRepository(User).createQueryBuilder('u').addSelect('u.passwordHash').where('u.email = :email', { email: email.trim().toLowerCase() }).getOne();
    const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !ok || !user.active) throw unauthorized(WRONG);
    return { token: sessionToken(user, this.secret), user: toUserRecord(user) };
  }
}
