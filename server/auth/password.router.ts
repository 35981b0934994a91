import { ClusterMemoryStoreWorker } from '@express-rate-limit/cluster-memory-store';
import { isUUID } from 'class-validator';
import { Router, type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import { rateLimit, type Options } from 'express-rate-limit';
import cluster from 'node:cluster';
import type { DataSource } from 'typeorm';
import { FORGOT_ANSWER } from '../../shared/passwords';
import { fieldError, HttpError } from '../common/errors';
import { body } from '../common/validate';
import { ChangePasswordDto, ForgotPasswordDto, ResetPasswordDto } from './password.dto';
import { PasswordService, WrongCurrentPassword } from './password.service';
import { secured } from './policy';

export interface PasswordLimits {
  /** "Forgot password" requests per target address in the window, whoever asks: no mailbox can be flooded. */
  forgotPerEmail: number;
  /** "Forgot password" requests per client address in the window, whatever addresses they name. */
  forgotPerAddress: number;
  /** Wrong current passwords per signed-in account in the window, on the change form. */
  wrongCurrentPerAccount: number;
  windowMs: number;
  /** The least time a "forgot password" answer takes, so a known and an unknown address take as long. */
  forgotAnswerMs: number;
}

export const DEFAULT_PASSWORD_LIMITS: PasswordLimits = { forgotPerEmail: 3, forgotPerAddress: 20, wrongCurrentPerAccount: 5, windowMs: 15 * 60 * 1000, forgotAnswerMs: 250 };

const NO_STORE = (_req: Request, res: Response, next: NextFunction) => {
  // The answers carry a token or a temporary password: no cache along the way may keep them.
  res.set('Cache-Control', 'no-store');
  next();
};

/**
 * The same limiter as the sign-in's (server/auth/auth.router.ts): express-rate-limit, counted in the cluster
 * primary under several processes and in memory otherwise.
 */
function limiter(prefix: string, limit: number, windowMs: number, refusal: HttpError, extra: Partial<Options> = {}): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    ...(cluster.isWorker ? { store: new ClusterMemoryStoreWorker({ prefix }) } : {}),
    handler: (_req, _res, next) => next(refusal),
    ...extra,
  });
}

const waitUntil = (at: number) => new Promise((resolve) => setTimeout(resolve, Math.max(0, at - Date.now())));

/**
 * Password change, reset and "forgot password", in three routers by where they are mounted: `forgot` and
 * `reset` are used signed out (before the token check); `reset` changes a user row, so it comes after the step
 * that drops what the process keeps, where `forgot` (which changes nothing kept) stays out of its way;
 * `signedIn` is the rest.
 */
export function passwordRouters(ds: DataSource, secret: string, limits: PasswordLimits): { forgot: Router; reset: Router; signedIn: Router } {
  const service = new PasswordService(ds, secret);
  const tooManyForgot = new HttpError(429, 'too_many_attempts', `Too many reset requests; wait ${Math.round(limits.windowMs / 60_000)} minutes before asking again.`);
  const forgotPerAddress = limiter('forgot-address', limits.forgotPerAddress, limits.windowMs, tooManyForgot);
  // Counted whether or not the address exists, so a refusal says nothing about it either.
  const forgotPerEmail = limiter('forgot-email', limits.forgotPerEmail, limits.windowMs, tooManyForgot, {
    keyGenerator: (req: Request) => `email:${String((req.body as ForgotPasswordDto).email).trim().toLowerCase()}`,
  });
  const wrongCurrent = limiter(
    'password-change-account',
    limits.wrongCurrentPerAccount,
    limits.windowMs,
    new HttpError(429, 'too_many_attempts', `Too many wrong current passwords; wait ${Math.round(limits.windowMs / 60_000)} minutes, or ask an administrator to reset your password.`),
    {
      keyGenerator: (req: Request) => `user:${req.user!.id}`,
      // Only a wrong current password counts: a new password that breaks the rule is an honest typo.
      skipSuccessfulRequests: true,
      requestWasSuccessful: (_req: Request, res: Response) => !res.locals.wrongCurrentPassword,
    },
  );

  const forgot = Router();
  secured(forgot).post('/auth/forgot-password', forgotPerAddress, body(ForgotPasswordDto), forgotPerEmail, async (req, res) => {
    const started = Date.now();
    try {
      await service.requestReset((req.body as ForgotPasswordDto).email);
    } finally {
      await waitUntil(started + limits.forgotAnswerMs);
    }
    res.status(202).json({ message: FORGOT_ANSWER });
  });
  const reset = Router();
  secured(reset).post('/auth/reset-password', body(ResetPasswordDto), async (req, res) => {
    const { token, newPassword } = req.body as ResetPasswordDto;
    await service.resetWithToken(token, newPassword);
    res.json({ message: 'Your new password is set, and every session of yours has ended. Sign in with the new password.' });
  });

  const signedIn = Router();
  const s = secured(signedIn);
  s.post('/me/password', wrongCurrent, body(ChangePasswordDto), NO_STORE, async (req, res) => {
    const { currentPassword, newPassword } = req.body as ChangePasswordDto;
    try {
      res.json(await service.change(req.user!.id, currentPassword, newPassword));
    } catch (err) {
      if (err instanceof WrongCurrentPassword) res.locals.wrongCurrentPassword = true;
      throw err;
    }
  });
  s.post('/users/:id/reset-password', NO_STORE, async (req, res) => {
    const id = String(req.params.id);
    if (!isUUID(id)) throw fieldError('id', 'must be a user id');
    res.json(await service.adminReset(id, req.user!.id));
  });
  return { forgot, reset, signedIn };
}
