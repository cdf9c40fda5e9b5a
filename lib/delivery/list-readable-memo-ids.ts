import { Delivery, Revision } from '@/models';

/** Memos whose latest revision was released to this customer. */
export async function listReadableMemoIds(customerId: number): Promise<number[]> {
  const delivered = await Delivery.findAll({
    where: { recipientId: customerId },
    attributes: ['memoId', 'revisionId'],
  });
  if (delivered.length === 0) return [];
  const memoIds = [...new Set(delivered.map((d) => d.memoId))];
  const revisions = await Revision.findAll({ where: { memoId: memoIds }, attributes: ['id', 'memoId'] });
  const latest = new Map<number, number>();
  for (const r of revisions) latest.set(r.memoId, Math.max(latest.get(r.memoId) ?? 0, r.id));
  const released = new Set(delivered.map((d) => d.revisionId));
  return memoIds.filter((m) => released.has(latest.get(m) ?? -1));
}
