import { createSecretKey } from 'node:crypto';
import type { RequestHandler } from 'express';
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/contract/roles';
import { forbidden, unauthorized } from '../common/errors';
import type { ChangeFeed } from '../db/change-feed';
import { preparedQuery } from '../db/prepared';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport types req.user as Express.User: ours is the signed-in user's row.
    interface User {
      id: string;
      email: string;
      displayName: string;
      role: Role;
      active: boolean;
      /** Set for an account made or reset by an administrator: only the password change is open to it. */
      mustChangePassword: boolean;
      /** Tokens carrying another epoch were signed before a password change or reset, and are refused. */
      sessionEpoch: number;
    }
  }
}

/** What is kept for a token whose user no longer exists. */
const NO_USER = { active: false } as const;

interface UserRow {
  id: string;
  email: string;
  display_name: string;
  role: Role;
  active: boolean;
  must_change_password: boolean;
  session_epoch: number;
}

/**
 * A passport instance per app (tests build several apps). The token names the user; the user's row decides,
 * so a deactivated user, a changed role or a password change (the session epoch) takes effect at once, whatever
 * the token says. With a change feed
 * the rows are kept in memory until the users table changes (every process is told at commit); without
 * one, or while its connection is down, the row is read on every request by one prepared statement.
 * The secret is a KeyObject made once: given a string, the JWT library tries to read it as a public key on
 * every request, which cost about a tenth of a busy server's CPU.
 */
export function makeAuthenticator(dataSource: DataSource, secret: string, changes: ChangeFeed | null = null): RequestHandler {
  const kept = changes?.keep<Express.User | typeof NO_USER>('bungwise_users', { maxSize: 10_000, sizeOf: () => 1 }) ?? null;
  const read = async (id: string): Promise<Express.User | typeof NO_USER> => {
    const [u] = await preparedQuery<UserRow>(dataSource, 'auth-user', 'SELECT id, email, display_name, role, active, must_change_password, session_epoch FROM users WHERE id = $1', [id]);
    return u ? { id: u.id, email: u.email, displayName: u.display_name, role: u.role, active: u.active, mustChangePassword: u.must_change_password, sessionEpoch: u.session_epoch } : NO_USER;
  };
  // The JWT library accepts a KeyObject at run time; passport-jwt's types only list string and Buffer.
  const key = createSecretKey(Buffer.from(secret, 'utf8')) as unknown as Buffer;
  const instance = new passport.Passport();
  instance.use(
    new JwtStrategy(
      { jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: key, algorithms: ['HS256'], issuer: 'bungwise' },
      (payload: { sub?: string; ep?: unknown }, done: (err: unknown, user?: Express.User | false) => void) => {
        if (!payload.sub) return done(null, false);
        const id = payload.sub;
        const epoch = payload.ep ?? 0;
        (kept ? kept.through(id, () => read(id)) : read(id)).then((user) => done(null, user.active && user.sessionEpoch === epoch ? user : false)).catch((err) => done(err));
      },
    ),
  );
  const authenticate = instance.authenticate('jwt', { session: false, failWithError: true });
  return (req, res, next) => {
    authenticate(req, res, (err?: unknown) => {
      if (err && (err as { status?: number }).status !== 401) return next(err);
      if (err || !req.user) return next(unauthorized('Sign in to continue: the token is missing, expired or no longer valid.'));
      next();
    });
  };
}

export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(unauthorized());
    if (!roles.includes(req.user.role)) return next(forbidden(`This needs the role ${roles.join(' or ')}; you are signed in as ${req.user.role}.`));
    next();
  };
}
