import { db, Delivery } from '@/models';
import { attemptDelivery } from './attempt-delivery';
import { dueForAttempt, QUEUED_GRACE_MS } from './claim-attempt';

/**
 * The automatic retry pass: every failed delivery whose next attempt is due,
 * and any delivery left queued or half-sent by a stopped process, gets one
 * more attempt. Returns the ids tried.
 */
export async function retryDueDeliveries(now = new Date()): Promise<number[]> {
  await db();
  const due = await Delivery.findAll({
    where: dueForAttempt(now, QUEUED_GRACE_MS),
    attributes: ['id'],
    order: [['id', 'ASC']],
    limit: 50,
  });
  const tried: number[] = [];
  for (const d of due) if (await attemptDelivery(d.id, null)) tried.push(d.id);
  return tried;
}
