import { Transaction } from 'sequelize';
import { Comment, db } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { auditExcerpt } from '@/lib/audit/audit-excerpt';
import { commentBodySchema } from './comment-schema';
import type { ThreadRecord } from './comment-record';
import { loadThreadFor } from './load-thread';
import { notifyThread } from './notify-thread';
import { toThreadRecords } from './to-thread-records';

/** Adds a reply to the thread of `commentId` (open or resolved) and notifies the thread. */
export async function replyToThread(actor: Actor, commentId: number, body: string): Promise<ThreadRecord> {
  const text = commentBodySchema.parse(body);
  const sequelize = await db();
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const { root, memo, facts } = await loadThreadFor(actor, commentId, 'memo.comment', transaction);
    const reply = await Comment.create(
      {
        memoId: root.memoId,
        parentId: root.id,
        authorId: actor.id,
        body: text,
        anchor: null,
        status: null,
        resolvedBy: null,
        resolvedAt: null,
      },
      { transaction },
    );
    root.changed('updatedAt', true);
    await root.save({ transaction });
    await notifyThread({ memo, facts, root, commentId: reply.id, actorId: actor.id, kind: 'reply', transaction });
    await recordAudit(
      {
        actor,
        action: 'comment.reply',
        memoId: root.memoId,
        details: { threadId: root.id, commentId: reply.id, excerpt: auditExcerpt(text) },
      },
      transaction,
    );
    const [record] = await toThreadRecords([root], transaction);
    return record;
  });
}
