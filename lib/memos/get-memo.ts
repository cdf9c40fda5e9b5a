import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor, toMemoDetail } from './load-memo';
import type { MemoDetail } from './memo-record';

export async function getMemo(actor: Actor, memoId: number): Promise<MemoDetail> {
  const { memo, facts } = await loadMemoFor(actor, memoId, 'memo.view');
  return toMemoDetail(actor, memo, facts);
}
