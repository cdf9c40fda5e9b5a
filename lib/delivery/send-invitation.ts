import type { User } from '@/models';
import { queueAccountMessage } from './queue-account-message';
import { attemptAccountMessage } from './attempt-account-message';

export type InvitationOutcome = { sent: true } | { sent: false; error: string };

/**
 * Mails a one-time invitation link to an invited (inactive) customer account
 * now; a failure stays queued and is retried with doubling waits like a
 * delivery. The outcome of this first attempt is returned and, like every
 * retry, in the audit trail.
 */
export async function sendInvitation(
  user: User,
  by: { id: number; email: string; name: string },
  memoId: number,
): Promise<InvitationOutcome> {
  const message = await queueAccountMessage('invitation', user.id, { memoId, requestedBy: by.id });
  const outcome = await attemptAccountMessage(message.id);
  if (!outcome) return { sent: false, error: 'another attempt is sending this invitation' };
  return outcome.ok ? { sent: true } : { sent: false, error: outcome.error };
}
