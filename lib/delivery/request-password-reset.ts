import { db, User } from '@/models';
import { recordAudit } from '@/lib/audit/record-audit';
import { sendMail } from '@/lib/mail/send-mail';
import { composeAccountMessage } from './compose-account-message';
import { deliveryConfig } from './delivery-config';
import { issueToken } from './link-token';

/** A reset link lives an hour. */
const RESET_TTL_MS = 60 * 60 * 1000;

/**
 * Mails a one-time password-reset link to an active account. The answer is
 * the same whether or not the address has an account; the outcome (sent,
 * refused by the SMTP server, or no such account) is in the audit trail.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  await db();
  const user = await User.findOne({ where: { email } });
  if (!user || !user.active) {
    await recordAudit({ actor: null, action: 'password-reset.request', details: { email, sent: false, reason: 'no active account' } });
    return;
  }
  const { token, expiresAt } = await issueToken({ purpose: 'password-reset', userId: user.id, deliveryId: null, revisionId: null }, RESET_TTL_MS);
  const outcome = await sendMail(composeAccountMessage('password-reset', { to: { name: user.name, email: user.email }, link: `${deliveryConfig().publicUrl}/password-reset/${token}`, expiresAt }));
  await recordAudit({ actor: null, action: 'password-reset.request', details: { email, userId: user.id, sent: outcome.ok, error: outcome.ok ? null : outcome.error } });
}
