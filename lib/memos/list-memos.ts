import { Op, type WhereOptions } from 'sequelize';
import { db, Memo, MemoReviewer } from '@/models';
import { assertGlobal, memoVisibility, type Actor } from '@/lib/auth/permissions';
import type { MemoStatus } from './memo-status';
import { peopleById, toMemoSummary } from './load-memo';
import type { MemoSummary } from './memo-record';
import { countOpenThreads } from '@/lib/comments/count-open-threads';

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
    // Nothing is visible to a customer until a revision is released to them.
    return [];
  }
  const memos = await Memo.findAll({ where, order: [['updatedAt', 'DESC']], attributes: { exclude: ['content'] } });
  const people = await peopleById(memos.map((m) => m.ownerId));
  const openThreads = await countOpenThreads(memos.map((m) => m.id));
  return memos.map((m) => toMemoSummary(m, people, openThreads.get(m.id) ?? 0));
}
