import { isUUID } from 'class-validator';
import { Router, type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import type { RateLimiterRes } from 'rate-limiter-flexible';
import type { DataSource } from 'typeorm';
import { FORGOT_ANSWER } from '../../shared/passwords';
import { fieldError, HttpError, unavailable } from '../common/errors';
import { body } from '../common/validate';
import { ChangePasswordDto, ForgotPasswordDto, ResetPasswordDto } from './password.dto';
import { PasswordService, WrongCurrentPassword } from './password.service';
import { secured } from './policy';
import { accountKey, counter, retryAfterS } from './sign-in-limits';
import type { MessageAnswer } from '../../shared/contract/users';

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
 * A limit counted in PostgreSQL like the sign-in's (`counter` in sign-in-limits.ts): `key` names what is
 * counted; with `onlyFailures` the route counts by itself (`failed`) and the middleware only refuses once the
 * count is used up. When the counters cannot be reached the answer is 503, never an uncounted request.
 */
function limiter(ds: DataSource, prefix: string, limit: number, windowMs: number, refusal: string, key: (req: Request) => string, onlyFailures = false) {
  const store = counter(ds, prefix, limit, windowMs);
  const refuse = (res: Response, r: RateLimiterRes) => {
    res.set('Retry-After', String(retryAfterS(r)));
    return new HttpError(429, 'too_many_attempts', refusal);
  };
  const check: RequestHandler = async (req, res, next) => {
    let r: RateLimiterRes | null;
    try {
      r = onlyFailures ? await store.get(key(req)) : await store.penalty(key(req));
    } catch {
      res.set('Retry-After', '5');
      return next(unavailable('Password requests are unavailable while the database cannot be reached; try again shortly.'));
    }
    if (r && r.consumedPoints > (onlyFailures ? limit - 1 : limit)) return next(refuse(res, r));
    next();
  };
  const failed = (req: Request) =>
    store.penalty(key(req)).then(
      () => undefined,
      () => undefined,
    );
  return { check, failed };
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
  const minutes = Math.round(limits.windowMs / 60_000);
  const tooManyForgot = `Too many reset requests; wait ${minutes} minutes before asking again.`;
  const forgotPerAddress = limiter(ds, 'forgot-addr', limits.forgotPerAddress, limits.windowMs, tooManyForgot, (req) => req.ip ?? 'unknown');
  // Counted whether or not the address exists, so a refusal says nothing about it either.
  const forgotPerEmail = limiter(ds, 'forgot-email', limits.forgotPerEmail, limits.windowMs, tooManyForgot, (req) => accountKey(String((req.body as ForgotPasswordDto).email)));
  // Only a wrong current password counts: a new password that breaks the rule is an honest typo.
  const wrongCurrent = limiter(
    ds,
    'pw-change',
    limits.wrongCurrentPerAccount,
    limits.windowMs,
    `Too many wrong current passwords; wait ${minutes} minutes, or ask an administrator to reset your password.`,
    (req) => req.user!.id,
    true,
  );

  const forgot = Router();
  secured(forgot).post('/auth/forgot-password', forgotPerAddress.check, body(ForgotPasswordDto), forgotPerEmail.check, async (req, res) => {
    const started = Date.now();
    try {
      await service.requestReset((req.body as ForgotPasswordDto).email);
    } finally {
      await waitUntil(started + limits.forgotAnswerMs);
    }
    res.status(202).json({ message: FORGOT_ANSWER } satisfies MessageAnswer);
  });
  const reset = Router();
  secured(reset).post('/auth/reset-password', body(ResetPasswordDto), async (req, res) => {
    const { token, newPassword } = req.body as ResetPasswordDto;
    await service.resetWithToken(token, newPassword);
    res.json({ message: 'Your new password is set, and every session of yours has ended. Sign in with the new password.' } satisfies MessageAnswer);
  });

  const signedIn = Router();
  const s = secured(signedIn);
  s.post('/me/password', wrongCurrent.check, body(ChangePasswordDto), NO_STORE, async (req, res) => {
    const { currentPassword, newPassword } = req.body as ChangePasswordDto;
    try {
      res.json(await service.change(req.user!.id, currentPassword, newPassword));
    } catch (err) {
      if (err instanceof WrongCurrentPassword) await wrongCurrent.failed(req);
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
