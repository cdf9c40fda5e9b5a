import { Comment } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';
import type { ThreadRecord } from './comment-record';
import { toThreadRecords } from './to-thread-records';

/** Every thread of a memo with its replies, oldest first. */
export async function listThreads(actor: Actor, memoId: number): Promise<ThreadRecord[]> {
  await loadMemoFor(actor, memoId, 'memo.threads');
  const roots = await Comment.findAll({
    where: { memoId, parentId: null },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return toThreadRecords(roots);
}
