import { Transaction } from 'sequelize';
import { Comment, db } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { recordAudit } from '@/lib/audit/record-audit';
import { auditExcerpt } from '@/lib/audit/audit-excerpt';
import { createThreadInputSchema, type CreateThreadInput } from './comment-schema';
import type { ThreadRecord } from './comment-record';
import { notifyThread } from './notify-thread';
import { toThreadRecords } from './to-thread-records';

/** Starts an open thread on a quoted passage of the memo and notifies the memo's owner. */
export async function createThread(actor: Actor, memoId: number, input: CreateThreadInput): Promise<ThreadRecord> {
  const parsed = createThreadInputSchema.parse(input);
  const sequelize = await db();
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const { memo, facts } = await loadMemoFor(actor, memoId, 'memo.comment', transaction);
    const root = await Comment.create(
      {
        memoId,
        parentId: null,
        authorId: actor.id,
        body: parsed.body,
        anchor: parsed.anchor,
        status: 'open',
        resolvedBy: null,
        resolvedAt: null,
      },
      { transaction },
    );
    await notifyThread({ memo, facts, root, commentId: root.id, actorId: actor.id, kind: 'comment', transaction });
    await recordAudit(
      {
        actor,
        action: 'comment.create',
        memoId,
        details: {
          threadId: root.id,
          quote: auditExcerpt(parsed.anchor.quote),
          excerpt: auditExcerpt(parsed.body),
          version: memo.version,
        },
      },
      transaction,
    );
    const [record] = await toThreadRecords([root], transaction);
    return record;
  });
}
