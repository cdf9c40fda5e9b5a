import { AccessToken, db, DistributionContact, User } from '@/models';
import { conflict, notFound } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { sendInvitation, type InvitationOutcome } from './send-invitation';

/** Mails a fresh invitation to a contact whose account is not active yet. */
export async function resendInvitation(actor: Actor, memoId: number, userId: number): Promise<InvitationOutcome> {
  await db();
  await loadMemoFor(actor, memoId, 'memo.distribute');
  if (!(await DistributionContact.findOne({ where: { memoId, userId } })))
    throw notFound(`Contact ${userId} on memo ${memoId}`);
  const user = await User.findByPk(userId, { rejectOnEmpty: true });
  if (user.active) throw conflict(`${user.name} has an active account already; no invitation is needed.`);
  // Only accounts that came from an invitation never accepted: a deactivated account stays deactivated.
  const tokens = await AccessToken.findAll({ where: { userId, purpose: 'invitation' }, attributes: ['usedAt'] });
  if (tokens.length === 0 || tokens.some((t) => t.usedAt))
    throw conflict(`${user.name}'s account was deactivated by an administrator; ask them to reactivate it.`);
  return sendInvitation(user, actor, memoId);
}
