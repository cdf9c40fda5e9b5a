import { Op } from 'sequelize';
import { db, Notification } from '@/models';
import { attemptNotificationMail, STALE_MAIL_ATTEMPT_MS } from './attempt-notification-mail';

/** A queued mail this old was left behind (the process stopped before sending it); pick it up. */
const QUEUED_GRACE_MS = 60 * 1000;

/**
 * The automatic retry pass for notification e-mails, run beside the
 * delivery retries: failed ones whose next attempt is due, and any left
 * queued or half-sent by a stopped process. Returns the ids tried.
 */
export async function retryDueNotificationMails(now = new Date()): Promise<number[]> {
  await db();
  const due = await Notification.findAll({
    where: {
      [Op.or]: [
        { mailStatus: 'failed', mailNextAttemptAt: { [Op.lte]: now } },
        { mailStatus: 'queued', createdAt: { [Op.lte]: new Date(now.getTime() - QUEUED_GRACE_MS) } },
        { mailStatus: 'sending', mailLastAttemptAt: { [Op.lte]: new Date(now.getTime() - STALE_MAIL_ATTEMPT_MS) } },
      ],
    },
    attributes: ['id'],
    order: [['id', 'ASC']],
    limit: 50,
  });
  const tried: number[] = [];
  for (const n of due) if (await attemptNotificationMail(n.id)) tried.push(n.id);
  return tried;
}
