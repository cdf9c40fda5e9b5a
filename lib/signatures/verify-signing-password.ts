import { db, User } from '@/models';
import { ApiError } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { verifyPassword } from '@/lib/users/password';
import {
  assertPasswordAttemptAllowed,
  PasswordAttemptsRefused,
  recordPasswordFailure,
  recordPasswordSuccess,
} from '@/lib/throttle/password-attempts';

/**
 * The signer proves again who they are before a signature is recorded: their
 * own password, checked against their account as it is now, even within a
 * signed-in session. (21 CFR 11.200(a)(1) lets later signings of one
 * continuous session use a single component; asking for the password at
 * every signing meets that and needs no notion of "the same session".)
 *
 * Counted by the sign-in throttle (lib/throttle/password-attempts.ts) against
 * the account and the client address: wrong signing passwords and wrong
 * sign-in passwords share one count, so neither can be used to guess past
 * the other's limit. Refused → 401 (429 while throttled), audited. Runs
 * outside any transaction: the throttle's counters are writes of their own.
 */
export async function verifySigningPassword(
  actor: Actor,
  password: string | undefined,
  clientAddress: string,
  memoId: number,
): Promise<void> {
  const attempt = { account: actor.email, clientAddress };
  try {
    await assertPasswordAttemptAllowed(attempt);
  } catch (err) {
    if (err instanceof PasswordAttemptsRefused) {
      await recordAudit({
        actor,
        action: 'signature.throttled',
        memoId,
        details: { scope: err.scope, clientAddress, retryAt: err.retryAt.toISOString() },
      });
      throw new ApiError('too_many_requests', `${err.message} Your signature was not recorded.`, {
        retryAfterSeconds: (err.retryAt.getTime() - Date.now()) / 1000,
        details: { retryAt: err.retryAt.toISOString() },
      });
    }
    throw err;
  }
  if (!password) {
    throw new ApiError(
      'unauthenticated',
      'Enter your password to sign: approving, requesting changes and freezing are electronic signatures.',
      { fields: { password: 'enter your password to sign' } },
    );
  }
  await db();
  const user = await User.findByPk(actor.id, { attributes: ['id', 'passwordHash', 'active'] });
  if (!user || !user.active || !(await verifyPassword(password, user.passwordHash))) {
    await recordPasswordFailure(attempt);
    await recordAudit({ actor, action: 'signature.refused', memoId, details: { clientAddress } });
    throw new ApiError(
      'unauthenticated',
      'That password is not right; nothing was signed. Enter the password you sign in with.',
      { fields: { password: 'wrong password' } },
    );
  }
  await recordPasswordSuccess(attempt);
}
