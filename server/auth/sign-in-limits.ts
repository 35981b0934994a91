import { createHash } from 'node:crypto';
import { RateLimiterPostgres, type RateLimiterRes } from 'rate-limiter-flexible';
import type { DataSource } from 'typeorm';
import { SIGN_IN_COUNTERS_TABLE } from '../../migrations/1764648000000-sign-in-counters';
import { HttpError } from '../common/errors';

export interface SignInLimits {
  /** Failed sign-ins allowed per account from one address, and per account from all addresses, in the window. */
  perAccount: number;
  /** Failed sign-ins allowed per client address (whatever the account) in the window. */
  perAddress: number;
  windowMs: number;
}

export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = { perAccount: 8, perAddress: 30, windowMs: 15 * 60 * 1000 };

/** A sign-in refused before its password was looked at; `retryAfterS` goes out as Retry-After. */
export class SignInRefused extends HttpError {
  constructor(
    readonly retryAfterS: number,
    status: 429 | 503,
  ) {
    super(
      status,
      status === 429 ? 'too_many_attempts' : 'unavailable',
      status === 429 ? 'Too many failed sign-ins; wait 15 minutes or ask an administrator.' : 'Sign-in is unavailable while the database cannot be reached; try again shortly.',
    );
  }
}

/**
 * One fixed-window counter in PostgreSQL (rate-limiter-flexible, table `sign_in_counters`, created by its
 * migration), on TypeORM's pool: the sign-in limits below and the password-request limits
 * (server/auth/password.router.ts) count here, so every process on every machine sees the same counts.
 */
export function counter(ds: DataSource, keyPrefix: string, points: number, windowMs: number, clearExpiredByTimeout = false): RateLimiterPostgres {
  const duration = Math.max(1, Math.ceil(windowMs / 1000));
  return new RateLimiterPostgres({ storeClient: ds, storeType: 'typeorm', tableName: SIGN_IN_COUNTERS_TABLE, tableCreated: true, clearExpiredByTimeout, keyPrefix, points, duration });
}

/** How long until a counter's window ends, for Retry-After. */
export const retryAfterS = (r: RateLimiterRes) => Math.max(1, Math.ceil(r.msBeforeNext / 1000));

// The account part of a key: e-mails can be long and need not sit in plain text in a counters table.
export const accountKey = (email: string) => createHash('sha256').update(email.trim().toLowerCase()).digest('base64url');

/**
 * Failed sign-ins counted in PostgreSQL (rate-limiter-flexible), so every server process on every machine
 * sees the same counts. Three counters, each a fixed window from its first failure:
 * - per address: `perAddress` failures from one address, whatever the accounts;
 * - per account and address: `perAccount` failures for one account from one address;
 * - per account: failures for one account from all addresses. Once the other addresses have made
 *   `perAccount` of them, only an address without a failure for the account in the window may still try
 *   (one try each): a stranger who trips it cannot lock the owner out, and a guesser spread over many
 *   addresses gets one guess per fresh address instead of `perAccount`.
 * Every attempt is counted before the password is checked (so parallel attempts cannot slip past the
 * count); a success takes back its own count and that of the failures before it from the same address. When the counters cannot be reached, sign-in answers 503:
 * it never lets attempts through uncounted.
 */
export class SignInGuard {
  private readonly byAddress: RateLimiterPostgres;
  private readonly byAccountAddress: RateLimiterPostgres;
  private readonly byAccount: RateLimiterPostgres;

  constructor(
    ds: DataSource,
    private readonly limits: SignInLimits,
  ) {
    // One table for the three (each key carries its prefix); one of them deletes expired rows.
    this.byAddress = counter(ds, 'addr', limits.perAddress, limits.windowMs, true);
    this.byAccountAddress = counter(ds, 'acct-addr', limits.perAccount, limits.windowMs);
    this.byAccount = counter(ds, 'acct', limits.perAccount, limits.windowMs);
  }

  /** Runs `attempt` (the password check) if the counts allow it; a 401 from it stays counted. */
  async guard<T>(email: string, address: string, attempt: () => Promise<T>): Promise<T> {
    const account = accountKey(email);
    const pair = `${account}|${address}`;
    let counts: RateLimiterRes[];
    try {
      counts = await Promise.all([this.byAddress.penalty(address), this.byAccountAddress.penalty(pair), this.byAccount.penalty(account)]);
    } catch {
      throw new SignInRefused(5, 503);
    }
    const [addr, accountAddr, acct] = counts;
    const over = [
      addr.consumedPoints > this.limits.perAddress && addr,
      accountAddr.consumedPoints > this.limits.perAccount && accountAddr,
      // Other addresses have used up the account's allowance: only an address with no failure for it yet
      // (this attempt is its first) may try.
      acct.consumedPoints - accountAddr.consumedPoints >= this.limits.perAccount && accountAddr.consumedPoints > 1 && acct,
    ].filter((r): r is RateLimiterRes => !!r);
    if (over.length) throw new SignInRefused(Math.max(...over.map(retryAfterS)), 429);

    let result: T;
    try {
      result = await attempt();
    } catch (err) {
      // Only a wrong password (401) is a failure; an outage part-way takes the count back.
      if (!(err instanceof HttpError && err.status === 401)) {
        await Promise.all([this.byAddress.reward(address), this.byAccountAddress.reward(pair), this.byAccount.reward(account)]).catch(() => undefined);
      }
      throw err;
    }
    // The owner is in: this attempt and the failures before it from this address were theirs (typos), so
    // none of them count any longer; failures from other addresses still do.
    // (Never below zero: another counter's window may have started afresh meanwhile.)
    const own = accountAddr.consumedPoints;
    await Promise.all([
      this.byAddress.reward(address, Math.min(own, addr.consumedPoints)),
      this.byAccountAddress.delete(pair),
      this.byAccount.reward(account, Math.min(own, acct.consumedPoints)),
    ]).catch(() => undefined);
    return result;
  }
}
