import { col, fn, type Transaction } from 'sequelize';
import { Comment } from '@/models';

/** Open threads per memo, in one grouped query; memos without any are absent from the map. */
export async function countOpenThreads(
  memoIds: readonly number[],
  transaction?: Transaction,
): Promise<Map<number, number>> {
  if (memoIds.length === 0) return new Map();
  const rows = (await Comment.findAll({
    attributes: ['memoId', [fn('COUNT', col('id')), 'openThreads']],
    where: { memoId: [...memoIds], parentId: null, status: 'open' },
    group: ['memoId'],
    raw: true,
    transaction,
  })) as unknown as { memoId: number; openThreads: number | string }[];
  return new Map(rows.map((r) => [Number(r.memoId), Number(r.openThreads)]));
}
