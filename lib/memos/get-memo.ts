import type { Transaction } from 'sequelize';
import { assertMemo, notSharedOrMissing, type Actor, type MemoAction } from '@/lib/auth/permissions';
import { buildMemoDetail } from './load-memo';
import type { MemoDetail } from './memo-record';
import { readMemoView } from './read-memo-view';

/**
 * One memo as the actor may see it: 404 worded as for an unknown id when
 * they may not (permissions.ts decides, on facts read with the memo).
 */
export async function getMemo(actor: Actor, memoId: number): Promise<MemoDetail> {
  const view = await readMemoViewFor(actor, memoId, 'memo.view');
  return buildMemoDetail(actor, view.memo, view.facts, view.people, view.openThreads);
}

/** The memo as read-memo-view.ts reads it (within `transaction` when given), when the actor may take `action` on it. */
export async function readMemoViewFor(actor: Actor, memoId: number, action: MemoAction, transaction?: Transaction) {
  const view = await readMemoView(memoId, transaction);
  if (!view) throw notSharedOrMissing();
  assertMemo(actor, action, view.facts);
  return view;
}
