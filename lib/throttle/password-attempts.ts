import { RateLimiterRes } from 'rate-limiter-flexible';
import { LIMITS, describeRetry, limiterFor, type Limit } from './throttle-limits';

/**
 * Guards every check of a password (sign-in now; an electronic signature
 * that asks for the password again can reuse it): refuse while the account
 * or the client address is blocked, count each wrong password against both,
 * and clear the account's count after a right one (the address's count stays,
 * so one good account cannot wash an address clean).
 */
export interface PasswordAttempt {
  /** The account as typed: e-mail address (normalised here). */
  account: string;
  /** The client address from `clientAddress()`. */
  clientAddress: string;
}

export class PasswordAttemptsRefused extends Error {
  constructor(
    readonly scope: 'account' | 'address',
    readonly retryAt: Date,
  ) {
    super(
      scope === 'account'
        ? `Too many wrong passwords for this account. ${describeRetry(retryAt)}`
        : `Too many wrong passwords from your network address. ${describeRetry(retryAt)}`,
    );
    this.name = 'PasswordAttemptsRefused';
  }
}

const accountKey = (a: PasswordAttempt) => a.account.trim().toLowerCase().slice(0, 200);

async function blockedUntil(limit: Limit, key: string): Promise<Date | null> {
  const res = await limiterFor(limit).get(key);
  if (!res || res.consumedPoints < limit.points) return null;
  return new Date(Date.now() + Math.max(res.msBeforeNext, 1000));
}

/** Throws PasswordAttemptsRefused (with when to try again) while the account or the address is blocked. */
export async function assertPasswordAttemptAllowed(attempt: PasswordAttempt): Promise<void> {
  const account = await blockedUntil(LIMITS.passwordFailuresPerAccount, accountKey(attempt));
  if (account) throw new PasswordAttemptsRefused('account', account);
  const address = await blockedUntil(LIMITS.passwordFailuresPerAddress, attempt.clientAddress);
  if (address) throw new PasswordAttemptsRefused('address', address);
}

async function countFailure(limit: Limit, key: string): Promise<void> {
  const limiter = limiterFor(limit);
  try {
    const res = await limiter.consume(key);
    if (res.consumedPoints >= limit.points) await limiter.block(key, limit.blockSeconds);
  } catch (err) {
    // Over the limit already (a concurrent failure blocked it first): the consume itself says so.
    if (!(err instanceof RateLimiterRes)) throw err;
  }
}

/** Counts one wrong password against the account and the address. */
export async function recordPasswordFailure(attempt: PasswordAttempt): Promise<void> {
  await countFailure(LIMITS.passwordFailuresPerAccount, accountKey(attempt));
  await countFailure(LIMITS.passwordFailuresPerAddress, attempt.clientAddress);
}

/** A right password clears the account's failures. */
export async function recordPasswordSuccess(attempt: Pick<PasswordAttempt, 'account'>): Promise<void> {
  await limiterFor(LIMITS.passwordFailuresPerAccount).delete(accountKey({ ...attempt, clientAddress: '' }));
}
