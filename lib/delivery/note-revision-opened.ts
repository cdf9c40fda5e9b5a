import type { Transaction } from 'sequelize';
import { Delivery } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';

/**
 * Records the first time a customer opens a revision released to them (by
 * its link, its portal page or its PDF). Later openings change nothing.
 */
export async function noteRevisionOpened(
  actor: Actor,
  revision: { id: number; memoId: number; letter: string },
  via: 'link' | 'portal' | 'pdf',
  transaction?: Transaction,
): Promise<void> {
  if (actor.role !== 'customer') return;
  const [n] = await Delivery.update(
    { firstOpenedAt: new Date() },
    { where: { revisionId: revision.id, recipientId: actor.id, firstOpenedAt: null }, transaction },
  );
  if (n > 0)
    await recordAudit(
      { actor, action: 'delivery.open', memoId: revision.memoId, revisionLetter: revision.letter, details: { via } },
      transaction,
    );
}
