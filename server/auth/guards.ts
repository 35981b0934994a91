import type { RequestHandler } from 'express';
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/roles';
import { forbidden, unauthorized } from '../common/errors';
import { User } from '../entities';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport types req.user as Express.User: ours is the User entity.
    interface User {
      id: string;
      email: string;
      displayName: string;
      role: Role;
      active: boolean;
    }
  }
}

/**
 * A passport instance per app (tests build several apps). The user is loaded on every request, so a
 * deactivated user or a changed role takes effect at once, whatever the token says.
 */
export function makeAuthenticator(dataSource: DataSource, secret: string): RequestHandler {
  const instance = new passport.Passport();
  instance.use(
    new JwtStrategy(
      { jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), secretOrKey: secret, algorithms: ['HS256'], issuer: 'bungwise' },
      (payload: { sub?: string }, done: (err: unknown, user?: User | false) => void) => {
        if (!payload.sub) return done(null, false);
        dataSource
          .getRepository(User)
          .findOneBy({ id: payload.sub })
          .then((user) => done(null, user && user.active ? user : false))
          .catch((err) => done(err));
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
