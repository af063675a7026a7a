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
  windowSeconds: number;
}

export const defaultThrottle: ThrottleConfig = {
  signInPerAccount: 5,
  signInPerIp: 30,
  resetPerAccount: 3,
  resetPerIp: 10,
  windowSeconds: 15 * 60,
};

/** Counters in PostgreSQL (table `throttles`), shared by every instance. */
export function createThrottles(pool: pg.Pool, config: ThrottleConfig) {
  const limiter = (keyPrefix: string, points: number) =>
    new RateLimiterPostgres({
      storeClient: pool,
      storeType: 'pool',
      tableName: 'throttles',
      tableCreated: true,
      clearExpiredByTimeout: false,
      keyPrefix,
      points,
      duration: config.windowSeconds,
    });
  const signInAccount = limiter('sign-in-account', config.signInPerAccount);
  const signInIp = limiter('sign-in-ip', config.signInPerIp);
  const resetAccount = limiter('reset-account', config.resetPerAccount);
  const resetIp = limiter('reset-ip', config.resetPerIp);

  const blocked = async (l: RateLimiterPostgres, key: string) => {
    const res = await l.get(key);
    return res !== null && res.consumedPoints >= l.points;
  };
  const consume = async (l: RateLimiterPostgres, key: string) => {
    try {
      await l.consume(key);
    } catch (err) {
      if (!(err instanceof RateLimiterRes)) throw err;
    }
  };

  return {
    /** Refuses before checking the password when either counter is spent. */
    async assertSignInAllowed(ip: string, email: string) {
      if ((await blocked(signInIp, ip)) || (await blocked(signInAccount, email))) throw new TooManyRequestsError();
    },
    async signInFailed(ip: string, email: string) {
      await Promise.all([consume(signInIp, ip), consume(signInAccount, email)]);
    },
    async signInSucceeded(email: string) {
      await signInAccount.delete(email);
    },
    /** Counts every reset request; the answer stays the same whether or not the account exists. */
    async resetRequested(ip: string, email: string) {
      if ((await blocked(resetIp, ip)) || (await blocked(resetAccount, email))) throw new TooManyRequestsError();
      await Promise.all([consume(resetIp, ip), consume(resetAccount, email)]);
    },
  };
}
export type Throttles = ReturnType<typeof createThrottles>;
