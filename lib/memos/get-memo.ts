import { assertMemo, notSharedOrMissing, type Actor } from '@/lib/auth/permissions';
import { buildMemoDetail } from './load-memo';
import type { MemoDetail } from './memo-record';
import { readMemoView } from './read-memo-view';

/**
 * One memo as the actor may see it: 404 worded as for an unknown id when
 * they may not (permissions.ts decides, on facts read with the memo).
 */
export async function getMemo(actor: Actor, memoId: number): Promise<MemoDetail> {
  const view = await readMemoView(memoId);
  if (!view) throw notSharedOrMissing();
  assertMemo(actor, 'memo.view', view.facts);
  return buildMemoDetail(actor, view.memo, view.facts, view.people, view.openThreads);
}
