import { RateLimiterRes } from 'rate-limiter-flexible';
import { SequelizeRateLimiter } from './sequelize-rate-limiter';

/**
 * Nodewright's limits (README, "Throttling"). Each is a rate-limiter-flexible
 * limiter over the database store, so all app instances share the counts.
 * Windows are fixed from the first counted event; a key that reaches its
 * limit is blocked for `blockSeconds` from then on.
 */
export interface Limit {
  /** Key prefix in the counter table. */
  name: string;
  /** Events allowed within the window; the next one is refused. */
  points: number;
  windowSeconds: number;
  /** How long a key stays refused once it reached the limit. */
  blockSeconds: number;
}

export const LIMITS = {
  /** Wrong passwords for one account (e-mail address), from anywhere. */
  passwordFailuresPerAccount: {
    name: 'password-failures:account',
    points: 10,
    windowSeconds: 15 * 60,
    blockSeconds: 15 * 60,
  },
  /** Wrong passwords from one client address, for any accounts. */
  passwordFailuresPerAddress: {
    name: 'password-failures:address',
    points: 100,
    windowSeconds: 60 * 60,
    blockSeconds: 60 * 60,
  },
  /** Password-reset requests for one e-mail address (whether or not it has an account). */
  passwordResetsPerAccount: {
    name: 'password-resets:account',
    points: 3,
    windowSeconds: 60 * 60,
    blockSeconds: 60 * 60,
  },
  /** Password-reset requests from one client address. */
  passwordResetsPerAddress: {
    name: 'password-resets:address',
    points: 20,
    windowSeconds: 60 * 60,
    blockSeconds: 60 * 60,
  },
  /** Delivery links refused at sign-in (forged, expired, used, replaced) from one client address. */
  linkFailuresPerAddress: { name: 'link-failures:address', points: 20, windowSeconds: 15 * 60, blockSeconds: 15 * 60 },
  /** Refused delivery links naming one account (a correctly signed link that is expired, used or replaced). */
  linkFailuresPerAccount: { name: 'link-failures:account', points: 10, windowSeconds: 15 * 60, blockSeconds: 15 * 60 },
} as const satisfies Record<string, Limit>;

const limiters = new Map<string, SequelizeRateLimiter>();

/** The limiter of one limit (one instance per process; the counts are in the database). */
export function limiterFor(limit: Limit): SequelizeRateLimiter {
  let limiter = limiters.get(limit.name);
  if (!limiter) {
    limiter = new SequelizeRateLimiter({
      keyPrefix: limit.name,
      points: limit.points,
      duration: limit.windowSeconds,
      blockDuration: limit.blockSeconds,
    });
    limiters.set(limit.name, limiter);
  }
  return limiter;
}

/** "Try again after 14:05 UTC (in about 15 minutes)." */
export function describeRetry(retryAt: Date, now = new Date()): string {
  const minutes = Math.max(1, Math.ceil((retryAt.getTime() - now.getTime()) / 60_000));
  const clock = retryAt.toISOString().slice(11, 16);
  return `Try again after ${clock} UTC (in about ${minutes} minute${minutes === 1 ? '' : 's'}).`;
}

/** Until when a key is refused (it reached the limit), or null. */
export async function blockedUntil(limit: Limit, key: string): Promise<Date | null> {
  const res = await limiterFor(limit).get(key);
  if (!res || res.consumedPoints < limit.points) return null;
  return new Date(Date.now() + Math.max(res.msBeforeNext, 1000));
}

/** Counts one failure; the one that reaches the limit blocks the key for `blockSeconds`. */
export async function countFailure(limit: Limit, key: string): Promise<void> {
  const limiter = limiterFor(limit);
  try {
    const res = await limiter.consume(key);
    if (res.consumedPoints >= limit.points) await limiter.block(key, limit.blockSeconds);
  } catch (err) {
    // Over the limit already (a concurrent failure blocked it first): the consume itself says so.
    if (!(err instanceof RateLimiterRes)) throw err;
  }
}
