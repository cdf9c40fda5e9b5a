import { db, Delivery, User } from '@/models';
import { conflict } from '@/lib/api/errors';
import { notSharedOrMissing, type Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { attemptDelivery } from './attempt-delivery';
import { toDeliveryRecord } from './list-memo-deliveries';
import type { DeliveryRecord } from './delivery-record';

/** Sends a delivery's message again now, with a fresh one-time link (a retry after a failure, or a lost message). */
export async function resendDelivery(actor: Actor, deliveryId: number): Promise<DeliveryRecord> {
  await db();
  const delivery = await Delivery.findByPk(deliveryId, {
    attributes: ['id', 'memoId', 'revisionId', 'recipientEmail'],
  });
  if (!delivery) throw notSharedOrMissing();
  await loadMemoFor(actor, delivery.memoId, 'memo.distribute');
  await recordAudit({
    actor,
    action: 'delivery.resend',
    memoId: delivery.memoId,
    details: { deliveryId, to: delivery.recipientEmail },
  });
  if (!(await attemptDelivery(deliveryId, actor)))
    throw conflict('This message is being sent right now; wait a moment and look again.');
  const fresh = await Delivery.findByPk(deliveryId, { rejectOnEmpty: true });
  const people = new Map((await User.findAll({ where: { id: fresh.recipientId } })).map((u) => [u.id, u]));
  return toDeliveryRecord(fresh, people);
}
