import { LIMITS, blockedUntil, countFailure, describeRetry, limiterFor } from './throttle-limits';

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
    what = 'wrong passwords',
  ) {
    super(
      scope === 'account'
        ? `Too many ${what} for this account. ${describeRetry(retryAt)}`
        : `Too many ${what} from your network address. ${describeRetry(retryAt)}`,
    );
    this.name = 'PasswordAttemptsRefused';
  }
}

const accountKey = (a: PasswordAttempt) => a.account.trim().toLowerCase().slice(0, 200);

/** Throws PasswordAttemptsRefused (with when to try again) while the account or the address is blocked. */
export async function assertPasswordAttemptAllowed(attempt: PasswordAttempt): Promise<void> {
  const account = await blockedUntil(LIMITS.passwordFailuresPerAccount, accountKey(attempt));
  if (account) throw new PasswordAttemptsRefused('account', account);
  const address = await blockedUntil(LIMITS.passwordFailuresPerAddress, attempt.clientAddress);
  if (address) throw new PasswordAttemptsRefused('address', address);
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
