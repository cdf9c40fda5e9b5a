import { LIMITS, blockedUntil, countFailure } from './throttle-limits';
import { PasswordAttemptsRefused } from './password-attempts';

/**
 * The delivery-link sign-in's throttle, like the password guard: refused
 * links (forged, expired, used, replaced) count against the client address
 * and, when the link is correctly signed, against the account it names.
 * Signed links cannot be guessed; this keeps a client from trying link after
 * link and from filling the audit trail.
 */
export interface LinkAttempt {
  clientAddress: string;
  /** The account a correctly signed link names; null for a forged one. */
  userId: number | null;
}

const accountKey = (userId: number) => `user-${userId}`;

export async function assertLinkAttemptAllowed(attempt: LinkAttempt): Promise<void> {
  const account =
    attempt.userId === null ? null : await blockedUntil(LIMITS.linkFailuresPerAccount, accountKey(attempt.userId));
  if (account) throw new PasswordAttemptsRefused('account', account, 'unusable links');
  const address = await blockedUntil(LIMITS.linkFailuresPerAddress, attempt.clientAddress);
  if (address) throw new PasswordAttemptsRefused('address', address, 'unusable links');
}

export async function recordLinkFailure(attempt: LinkAttempt): Promise<void> {
  if (attempt.userId !== null) await countFailure(LIMITS.linkFailuresPerAccount, accountKey(attempt.userId));
  await countFailure(LIMITS.linkFailuresPerAddress, attempt.clientAddress);
}
