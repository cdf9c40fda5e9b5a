import { AccountMessage, db } from '@/models';
import { attemptAccountMessage } from './attempt-account-message';
import { dueForAttempt, QUEUED_GRACE_MS } from './claim-attempt';

/** The retry pass for invitation and reset messages, like retryDueDeliveries; returns the ids tried. */
export async function retryDueAccountMessages(now = new Date()): Promise<number[]> {
  await db();
  const due = await AccountMessage.findAll({
    where: dueForAttempt(now, QUEUED_GRACE_MS),
    attributes: ['id'],
    order: [['id', 'ASC']],
    limit: 50,
  });
  const tried: number[] = [];
  for (const m of due) if (await attemptAccountMessage(m.id)) tried.push(m.id);
  return tried;
}
