// People as the API answers them: the session's own account (sign-in, GET/PATCH /me) and the admin's list (/users).
import type { ThemeChoice } from '../themes';
import type { LengthUnit } from './units';
import type { Role } from './roles';

export interface UserRecord {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  lengthUnit: LengthUnit;
  /** Kinds of notice this person does not want by e-mail (they still appear under Notices). */
  mailOff: string[];
  /** An account made or reset by an administrator: the password change comes before anything else. */
  mustChangePassword: boolean;
  /** The colour theme chosen on the account; it follows the person to every device they sign in on. */
  theme: ThemeChoice;
}

/** Sign-in and the person's own password change: a token for the session and the account. */
export interface SignInResult {
  token: string;
  user: UserRecord;
}

/** GET /me, PATCH /me. */
export interface MeAnswer {
  user: UserRecord;
}

/** An administrator's reset: the temporary password is shown once. */
export interface PasswordResetAnswer {
  user: UserRecord;
  temporaryPassword: string;
}

/** "Forgot password" and the mailed link's reset: a sentence to show, the same whatever happened behind it. */
export interface MessageAnswer {
  message: string;
}
