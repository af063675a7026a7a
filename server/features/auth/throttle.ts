import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import type pg from 'pg';
import { TooManyRequestsError } from '../../http/errors';

export interface ThrottleConfig {
  /** Failed sign-ins allowed per account, and per IP, in `windowSeconds`. */
  signInPerAccount: number;
  signInPerIp: number;
  /** Reset e-mails allowed per account, and per IP, in `windowSeconds`. */
  resetPerAccount: number;
  resetPerIp: number;
  /** Sign-ups allowed per address, and per IP, in `windowSeconds` (default 5 and 30, like sign-in). */
  signUpPerAccount?: number;
  signUpPerIp?: number;
  windowSeconds: number;
}

export const defaultThrottle: ThrottleConfig = {
  signInPerAccount: 5,
  signInPerIp: 30,
  resetPerAccount: 3,
  resetPerIp: 10,
  signUpPerAccount: 5,
  signUpPerIp: 30,
  windowSeconds: 15 * 60,
};

/** A counter in PostgreSQL (table `throttles`), shared by every instance: `points` per key in `windowSeconds`. */
export const throttleCounter = (pool: pg.Pool, keyPrefix: string, points: number, windowSeconds: number) =>
  new RateLimiterPostgres({
    storeClient: pool,
    storeType: 'pool',
    tableName: 'throttles',
    tableCreated: true,
    clearExpiredByTimeout: false,
    keyPrefix,
    points,
    duration: windowSeconds,
  });

/** Takes a point from each counter (one atomic upsert each); 429 (with `message`, if given) when any is spent. */
export async function takePoints(counters: [RateLimiterPostgres, string][], message?: string): Promise<void> {
  const results = await Promise.allSettled(counters.map(([l, key]) => l.consume(key)));
  for (const r of results) if (r.status === 'rejected' && !(r.reason instanceof RateLimiterRes)) throw r.reason;
  if (results.some((r) => r.status === 'rejected')) throw new TooManyRequestsError(message);
}

/** The sign-in, sign-up and reset counters. */
export function createThrottles(pool: pg.Pool, config: ThrottleConfig) {
  const limiter = (keyPrefix: string, points: number) => throttleCounter(pool, keyPrefix, points, config.windowSeconds);
  const signInAccount = limiter('sign-in-account', config.signInPerAccount);
  const signInIp = limiter('sign-in-ip', config.signInPerIp);
  const resetAccount = limiter('reset-account', config.resetPerAccount);
  const resetIp = limiter('reset-ip', config.resetPerIp);
  const signUpAccount = limiter('sign-up-account', config.signUpPerAccount ?? defaultThrottle.signUpPerAccount!);
  const signUpIp = limiter('sign-up-ip', config.signUpPerIp ?? defaultThrottle.signUpPerIp!);
  const take = (...counters: [RateLimiterPostgres, string][]) => takePoints(counters);

  return {
    /**
     * Counts the attempt before the password is checked, so parallel guesses cannot all slip under the
     * limit while their hashes are being verified; a right password gives the points back.
     */
    async signInAttempt(ip: string, email: string) {
      await take([signInIp, ip], [signInAccount, email]);
    },
    async signInSucceeded(ip: string, email: string) {
      await Promise.all([signInAccount.delete(email), signInIp.reward(ip, 1)]);
    },
    /** Every sign-up counts, whether or not the address has an account. */
    async signUpAttempt(ip: string, email: string) {
      await take([signUpIp, ip], [signUpAccount, email]);
    },
    /** Counts every reset request; the answer stays the same whether or not the account exists. */
    async resetRequested(ip: string, email: string) {
      await take([resetIp, ip], [resetAccount, email]);
    },
  };
}
