import { AccountMessage, db, User } from '@/models';
import { recordAudit } from '@/lib/audit/record-audit';
import { sendMail, type SendOutcome } from '@/lib/mail/send-mail';
import { composeAccountMessage } from './compose-account-message';
import { deliveryConfig, nextAttemptAt } from './delivery-config';
import { issueToken } from './link-token';
import { claimAttempt } from './claim-attempt';

/** A reset link lives an hour. */
export const RESET_TTL_MS = 60 * 60 * 1000;

/**
 * One attempt to send an invitation or password-reset message, the same way
 * as a delivery (lib/delivery/attempt-delivery.ts): a fresh one-time link,
 * which voids the account's older unused link of that kind, the message over
 * SMTP, and the outcome stored with the next automatic attempt after a
 * failure (doubling waits). An account that no longer needs the message (an
 * invitation already accepted, a reset for a deactivated account) ends it
 * without sending. Null when another attempt holds the message.
 */
export async function attemptAccountMessage(messageId: number): Promise<SendOutcome | null> {
  await db();
  const config = deliveryConfig();
  if (!(await claimAttempt(AccountMessage, messageId, new Date()))) return null;
  const message = await AccountMessage.findByPk(messageId, { rejectOnEmpty: true });
  const attempt = message.attempts + 1;
  const action = message.purpose === 'invitation' ? 'invitation.sent' : 'password-reset.request';
  const requester = message.requestedBy
    ? await User.findByPk(message.requestedBy, { attributes: ['id', 'name', 'email'] })
    : null;
  const user = await User.findByPk(message.userId, { rejectOnEmpty: true });
  let outcome: SendOutcome;
  try {
    const moot =
      message.purpose === 'invitation'
        ? user.active && 'the account is active already'
        : !user.active && 'the account is not active';
    if (moot) {
      await message.update({
        status: 'failed',
        attempts: attempt,
        lastError: `not sent: ${moot}`,
        nextAttemptAt: null,
      });
      return { ok: false, error: `not sent: ${moot}` };
    }
    const ttl = message.purpose === 'invitation' ? config.linkTtlMs : RESET_TTL_MS;
    const { token, expiresAt } = await issueToken(
      { purpose: message.purpose, userId: user.id, deliveryId: null, revisionId: null },
      ttl,
    );
    const invitedBy = requester?.name;
    const link = `${config.publicUrl}/${message.purpose === 'invitation' ? 'invitation' : 'password-reset'}/${token}`;
    outcome = await sendMail(
      composeAccountMessage(message.purpose, {
        to: { name: user.name, email: user.email },
        link,
        expiresAt,
        invitedBy,
      }),
    );
  } catch (err) {
    // Not an SMTP answer (say, the database was busy): keep it failed and due for a retry, never lost.
    outcome = {
      ok: false,
      error: `could not prepare the message: ${err instanceof Error ? err.message : String(err)}`.slice(0, 1000),
    };
  }
  const finished = new Date();
  const next = outcome.ok ? null : nextAttemptAt(attempt, finished, config);
  await message.update(
    outcome.ok
      ? { status: 'delivered', attempts: attempt, deliveredAt: finished, lastError: null, nextAttemptAt: null }
      : { status: 'failed', attempts: attempt, lastError: outcome.error, nextAttemptAt: next },
  );
  await recordAudit({
    actor: requester,
    action,
    memoId: message.memoId ?? undefined,
    details: {
      userId: user.id,
      email: user.email,
      messageId,
      attempt,
      sent: outcome.ok,
      error: outcome.ok ? null : outcome.error,
      nextAttemptAt: next?.toISOString() ?? null,
    },
  });
  return outcome;
}
