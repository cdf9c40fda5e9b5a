import { Op } from 'sequelize';
import { db, Delivery } from '@/models';
import { attemptDelivery } from './attempt-delivery';

/** A queued delivery this old was left behind (the process stopped before sending); pick it up. */
const QUEUED_GRACE_MS = 60 * 1000;

/**
 * The automatic retry pass: every failed delivery whose next attempt is due,
 * and any delivery left queued or half-sent by a stopped process, gets one
 * more attempt. Returns the ids tried.
 */
export async function retryDueDeliveries(now = new Date()): Promise<number[]> {
  await db();
  const due = await Delivery.findAll({
    where: {
      [Op.or]: [
        { status: 'failed', nextAttemptAt: { [Op.lte]: now } },
        { status: 'queued', createdAt: { [Op.lte]: new Date(now.getTime() - QUEUED_GRACE_MS) } },
        { status: 'sending', lastAttemptAt: { [Op.lte]: new Date(now.getTime() - 5 * 60 * 1000) } },
      ],
    },
    attributes: ['id'],
    order: [['id', 'ASC']],
    limit: 50,
  });
  const tried: number[] = [];
  for (const d of due) if (await attemptDelivery(d.id, null)) tried.push(d.id);
  return tried;
}
