import { db, User } from '@/models';
import { recordAudit } from '@/lib/audit/record-audit';
import { assertPasswordResetAllowed } from '@/lib/throttle/password-resets';
import { queueAccountMessage } from './queue-account-message';
import { attemptAccountMessage } from './attempt-account-message';

/** Runs a job after the response has been sent (Next's `after` in the route; a plain call in tests). */
export type ScheduleAfterResponse = (job: () => Promise<void>) => void;

/**
 * Accepts a password-reset request. Before the response: only the throttle
 * (per client address and per e-mail address as typed, 429 when exceeded),
 * which does the same work for every address. Everything that depends on
 * whether the address has an account — the lookup, the link, the message —
 * runs in `schedule`d work after the response, so the answer and its timing
 * are the same for every address.
 */
export async function requestPasswordReset(
  email: string,
  clientAddress: string,
  schedule: ScheduleAfterResponse,
): Promise<void> {
  await db();
  try {
    await assertPasswordResetAllowed({ email, clientAddress });
  } catch (err) {
    await recordAudit({ actor: null, action: 'password-reset.throttled', details: { email, clientAddress } });
    throw err;
  }
  schedule(() =>
    sendPasswordReset(email).catch((err: unknown) => {
      console.error('[nodewright] password-reset request failed', err);
    }),
  );
}

/**
 * The work behind a reset request: an active account with this address gets
 * a message with a one-hour link (voiding its older unused reset links),
 * retried like deliveries when the SMTP server fails; any other address only
 * leaves a line in the audit trail.
 */
export async function sendPasswordReset(email: string): Promise<void> {
  await db();
  const user = await User.findOne({ where: { email } });
  if (!user || !user.active) {
    await recordAudit({
      actor: null,
      action: 'password-reset.request',
      details: { email, sent: false, reason: 'no active account' },
    });
    return;
  }
  const message = await queueAccountMessage('password-reset', user.id);
  await attemptAccountMessage(message.id);
}
