import { ClusterMemoryStoreWorker } from '@express-rate-limit/cluster-memory-store';
import cluster from 'node:cluster';
import { secured } from './policy';
import { Router, type Request } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { DataSource } from 'typeorm';
import { HttpError } from '../common/errors';
import { body } from '../common/validate';
import { SignInDto } from './auth.dto';
import { AuthService } from './auth.service';

export interface SignInLimits {
  /** Failed sign-ins allowed per account in the window. */
  perAccount: number;
  /** Failed sign-ins allowed per client address in the window. */
  perAddress: number;
  windowMs: number;
}

export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = { perAccount: 8, perAddress: 30, windowMs: 15 * 60 * 1000 };

const tooMany = new HttpError(429, 'too_many_attempts', 'Too many failed sign-ins; wait 15 minutes or ask an administrator.');

export function authRouter(ds: DataSource, secret: string, limits: SignInLimits): Router {
  const service = new AuthService(ds, secret);
  // Under the cluster primary (server/index.ts) failures are counted there for every worker; a single
  // process counts them itself.
  const store = (prefix: string) => (cluster.isWorker ? { store: new ClusterMemoryStoreWorker({ prefix }) } : {});
  const common = { windowMs: limits.windowMs, skipSuccessfulRequests: true, standardHeaders: 'draft-8' as const, legacyHeaders: false, handler: (_req: Request, _res: unknown, next: (err: unknown) => void) => next(tooMany) };
  // Only failures count (skipSuccessfulRequests); an account is limited wherever the attempts come from.
  const perAddress = rateLimit({ ...common, ...store('sign-in-address'), limit: limits.perAddress });
  const perAccount = rateLimit({
    ...common,
    ...store('sign-in-account'),
    limit: limits.perAccount,
    keyGenerator: (req: Request) => `acct:${String(req.body?.email ?? '').trim().toLowerCase()}`,
  });

  const router = Router();
  const r = secured(router);
  r.post('/auth/sign-in', perAddress, body(SignInDto), perAccount, async (req, res) => {
    const { email, password } = req.body as SignInDto;
    res.json(await service.signIn(email, password));
  });
  return router;
}
