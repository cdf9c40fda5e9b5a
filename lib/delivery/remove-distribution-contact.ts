import { db, DistributionContact, User } from '@/models';
import { notFound } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFor } from '@/lib/memos/load-memo';

/** Takes a contact off the list for future releases; what was already released to them stays theirs. */
export async function removeDistributionContact(actor: Actor, memoId: number, userId: number): Promise<void> {
  await db();
  await loadMemoFor(actor, memoId, 'memo.distribute');
  const contact = await DistributionContact.findOne({ where: { memoId, userId } });
  if (!contact) throw notFound(`Contact ${userId} on memo ${memoId}`);
  const user = await User.findByPk(userId, { attributes: ['email'] });
  await contact.destroy();
  await recordAudit({ actor, action: 'distribution.remove', memoId, details: { userId, email: user?.email ?? null } });
}
