import { secured } from './policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { body } from '../common/validate';
import { SignInDto } from './auth.dto';
import { AuthService } from './auth.service';
import { SignInGuard, SignInRefused, type SignInLimits } from './sign-in-limits';

export { DEFAULT_SIGN_IN_LIMITS, type SignInLimits } from './sign-in-limits';

export function authRouter(ds: DataSource, secret: string, limits: SignInLimits): Router {
  const service = new AuthService(ds, secret);
  // Counted in the database, so the limits hold across every server process and machine.
  const guard = new SignInGuard(ds, limits);

  const router = Router();
  const r = secured(router);
  r.post('/auth/sign-in', body(SignInDto), async (req, res) => {
    const { email, password } = req.body as SignInDto;
    try {
      res.json(await guard.guard(email, req.ip ?? req.socket.remoteAddress ?? 'unknown', () => service.signIn(email, password)));
    } catch (err) {
      if (err instanceof SignInRefused) res.set('Retry-After', String(err.retryAfterS));
      throw err;
    }
  });
  return router;
}
