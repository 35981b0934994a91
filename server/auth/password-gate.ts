import type { RequestHandler } from 'express';
import { HttpError } from '../common/errors';
import { POLICY } from './policy';

/**
 * What a person who must change their password (an account made or reset by an administrator) may still call
 * with their token. The routes used signed out (sign-in, "forgot password") come before the token check and
 * are never gated. There is no sign-out route: signing out drops the token in the client.
 */
export const OPEN_DURING_PASSWORD_CHANGE: readonly string[] = ['GET /api/me', 'POST /api/me/password'];

export const passwordChangeRequired = () => new HttpError(403, 'password_change_required', 'Choose a new password first: this account has a temporary one. Nothing else is open until then.');

/** After the token check: everything else answers 403 `password_change_required` until the password is changed. */
export function passwordChangeGate(): RequestHandler {
  // A route renamed without this list would lock people out of the change itself: refuse to start instead.
  for (const key of OPEN_DURING_PASSWORD_CHANGE) if (!POLICY[key]) throw new Error(`${key} is open during a forced password change but has no POLICY entry`);
  const open = new Set(OPEN_DURING_PASSWORD_CHANGE);
  return (req, _res, next) => {
    if (!req.user?.mustChangePassword || open.has(`${req.method} /api${req.path}`)) return next();
    next(passwordChangeRequired());
  };
}
