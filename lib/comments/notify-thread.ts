import type { Transaction } from 'sequelize';
import { Comment, Notification, User, type Memo } from '@/models';
import { decideMemo, type MemoFacts } from '@/lib/auth/permissions';
import type { NotificationKind } from './comment-status';

/**
 * Tells the people concerned that something happened in a thread.
 * A new thread or a reply: the memo's authors (owner and co-authors, who
 * settle threads) and everyone who wrote in the thread. Resolving or reopening: everyone who wrote in the thread.
 * Never the person who did it, and only people who may still see the memo.
 * Returns the ids notified.
 */
export async function notifyThread(args: {
  memo: Memo;
  facts: MemoFacts;
  root: Comment;
  /** The comment the notification points at (the new reply, or the root). */
  commentId: number;
  actorId: number;
  kind: NotificationKind;
  transaction?: Transaction;
}): Promise<number[]> {
  const { memo, facts, root, commentId, actorId, kind, transaction } = args;
  const replies = await Comment.findAll({ where: { parentId: root.id }, attributes: ['authorId'], transaction });
  const concerned = new Set<number>([root.authorId, ...replies.map((r) => r.authorId)]);
  if (kind === 'comment' || kind === 'reply') for (const id of [memo.ownerId, ...facts.coAuthorIds]) concerned.add(id);
  concerned.delete(actorId);
  if (concerned.size === 0) return [];
  const people = await User.findAll({ where: { id: [...concerned], active: true }, transaction });
  const recipients = people
    .filter((u) => decideMemo({ id: u.id, role: u.role, name: u.name, email: u.email }, 'memo.view', facts).allowed)
    .map((u) => u.id);
  if (recipients.length === 0) return [];
  await Notification.bulkCreate(
    recipients.map((userId) => ({ userId, memoId: memo.id, commentId, actorId, kind, readAt: null })),
    { transaction },
  );
  return recipients.sort((a, b) => a - b);
}
