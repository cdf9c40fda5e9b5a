import type { Transaction } from 'sequelize';
import { Delivery, Revision } from '@/models';

/** Customers each of these revisions was released to, by revision id. */
export async function listRevisionRecipients(
  revisionIds: readonly number[],
  transaction?: Transaction,
): Promise<Map<number, number[]>> {
  const out = new Map<number, number[]>(revisionIds.map((id) => [id, []]));
  if (revisionIds.length === 0) return out;
  const rows = await Delivery.findAll({
    where: { revisionId: [...revisionIds] },
    attributes: ['revisionId', 'recipientId'],
    transaction,
  });
  for (const r of rows) {
    const list = out.get(r.revisionId) ?? [];
    if (!list.includes(r.recipientId)) list.push(r.recipientId);
    out.set(r.revisionId, list);
  }
  return out;
}

/**
 * Customers who may read the memo as it stands: a frozen memo's content is
 * its latest revision, so those that revision was released to. None while
 * the memo is not frozen.
 */
export async function listCurrentReaders(
  memo: { id: number; status: string },
  transaction?: Transaction,
): Promise<number[]> {
  if (memo.status !== 'frozen') return [];
  const latest = await Revision.findOne({
    where: { memoId: memo.id },
    order: [['id', 'DESC']],
    attributes: ['id'],
    transaction,
  });
  if (!latest) return [];
  return (await listRevisionRecipients([latest.id], transaction)).get(latest.id) ?? [];
}
