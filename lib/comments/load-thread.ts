import type { Transaction } from 'sequelize';
import { Comment, db, type Memo } from '@/models';
import { loadMemoFor } from '@/lib/memos/load-memo';
import {
  assertMemo,
  decideMemo,
  notSharedOrMissing,
  type Actor,
  type MemoAction,
  type MemoFacts,
} from '@/lib/auth/permissions';

/**
 * Loads the thread a comment belongs to (the comment itself when it is a
 * root, else its parent) and checks that the actor may do `action` on the
 * thread's memo (403 or 409 otherwise). An unknown comment, one on a
 * hidden memo and one the caller may not read (customers never see threads)
 * answer the same 404, so comment ids cannot be probed.
 */
export async function loadThreadFor(
  actor: Actor,
  commentId: number,
  action: MemoAction,
  transaction?: Transaction,
): Promise<{ root: Comment; memo: Memo; facts: MemoFacts }> {
  await db();
  const comment = await Comment.findByPk(commentId, { transaction });
  if (!comment) throw notSharedOrMissing();
  const root = comment.parentId === null ? comment : await Comment.findByPk(comment.parentId, { transaction });
  if (!root) throw notSharedOrMissing();
  const { memo, facts } = await loadMemoFor(actor, root.memoId, 'memo.view', transaction);
  if (!decideMemo(actor, 'memo.threads', facts).allowed) throw notSharedOrMissing();
  assertMemo(actor, action, facts);
  return { root, memo, facts };
}
