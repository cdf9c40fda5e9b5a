import { Transaction } from 'sequelize';
import { db } from '@/models';
import { conflict } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { auditExcerpt } from '@/lib/audit/audit-excerpt';
import type { ThreadStatus } from './comment-status';
import type { ThreadRecord } from './comment-record';
import { loadThreadFor } from './load-thread';
import { notifyThread } from './notify-thread';
import { toThreadRecords } from './to-thread-records';

/**
 * Resolves (`'resolved'`) or reopens (`'open'`) the thread of `commentId`.
 * Only analysts may (permission memo.resolve); a thread already in that
 * state is a 409. Notifies everyone who wrote in the thread.
 */
export async function changeThreadStatus(actor: Actor, commentId: number, status: ThreadStatus): Promise<ThreadRecord> {
  const sequelize = await db();
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const { root, memo, facts } = await loadThreadFor(actor, commentId, 'memo.resolve', transaction);
    if (root.status === status)
      throw conflict(status === 'resolved' ? 'This thread is already resolved.' : 'This thread is already open.');
    root.status = status;
    root.resolvedBy = status === 'resolved' ? actor.id : null;
    root.resolvedAt = status === 'resolved' ? new Date() : null;
    await root.save({ transaction });
    await notifyThread({
      memo,
      facts,
      root,
      commentId: root.id,
      actorId: actor.id,
      kind: status === 'resolved' ? 'resolved' : 'reopened',
      transaction,
    });
    await recordAudit(
      {
        actor,
        action: status === 'resolved' ? 'comment.resolve' : 'comment.reopen',
        memoId: root.memoId,
        details: { threadId: root.id, quote: auditExcerpt(root.anchor?.quote) },
      },
      transaction,
    );
    const [record] = await toThreadRecords([root], transaction);
    return record;
  });
}
