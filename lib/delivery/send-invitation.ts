import type { Transaction } from 'sequelize';
import type { User } from '@/models';
import { recordAudit } from '@/lib/audit/record-audit';
import { sendMail } from '@/lib/mail/send-mail';
import { composeAccountMessage } from './compose-account-message';
import { deliveryConfig } from './delivery-config';
import { issueToken } from './link-token';

export type InvitationOutcome = { sent: true } | { sent: false; error: string };

/** Mails a one-time invitation link to an invited (inactive) customer account; the outcome is in the audit trail either way. */
export async function sendInvitation(user: User, by: { id: number; email: string; name: string }, memoId: number, transaction?: Transaction): Promise<InvitationOutcome> {
  const config = deliveryConfig();
  const { token, expiresAt } = await issueToken({ purpose: 'invitation', userId: user.id, deliveryId: null, revisionId: null }, config.linkTtlMs, transaction);
  const outcome = await sendMail(composeAccountMessage('invitation', { to: { name: user.name, email: user.email }, link: `${config.publicUrl}/invitation/${token}`, expiresAt, invitedBy: by.name }));
  await recordAudit({ actor: by, action: 'invitation.sent', memoId, details: { userId: user.id, email: user.email, sent: outcome.ok, error: outcome.ok ? null : outcome.error } }, transaction);
  return outcome.ok ? { sent: true } : { sent: false, error: outcome.error };
}
