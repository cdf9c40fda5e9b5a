import { Op, type WhereOptions } from 'sequelize';
import { db, Memo, MemoReviewer } from '@/models';
import { assertGlobal, memoVisibility, type Actor } from '@/lib/auth/permissions';
import type { MemoStatus } from './memo-status';
import { peopleById, toMemoSummary } from './load-memo';
import type { MemoSummary } from './memo-record';
import { countOpenThreads } from '@/lib/comments/count-open-threads';
import { listReadableMemoIds } from '@/lib/delivery/list-readable-memo-ids';

/** Every memo the actor may see, most recently updated first. */
export async function listMemos(actor: Actor, filter: { status?: MemoStatus } = {}): Promise<MemoSummary[]> {
  assertGlobal(actor, 'memo.list');
  await db();
  const visibility = memoVisibility(actor);
  const where: WhereOptions = {};
  if (filter.status) Object.assign(where, { status: filter.status });
  if (visibility.scope === 'assigned') {
    const links = await MemoReviewer.findAll({ where: { userId: visibility.reviewerId }, attributes: ['memoId'] });
    Object.assign(where, { id: { [Op.in]: links.map((l) => l.memoId) } });
  } else if (visibility.scope === 'released') {
    // Frozen memos whose latest revision was released to this customer (the same rule as decideMemo).
    if (filter.status && filter.status !== 'frozen') return [];
    Object.assign(where, { status: 'frozen', id: { [Op.in]: await listReadableMemoIds(visibility.customerId) } });
  }
  const memos = await Memo.findAll({ where, order: [['updatedAt', 'DESC']], attributes: { exclude: ['content'] } });
  const people = await peopleById(memos.map((m) => m.ownerId));
  const openThreads = await countOpenThreads(memos.map((m) => m.id));
  // Review threads are not a customer's business.
  return memos.map((m) => toMemoSummary(m, people, visibility.scope === 'released' ? 0 : (openThreads.get(m.id) ?? 0)));
}
