import { Op } from 'sequelize';
import { db, Memo, Notification, User } from '@/models';
import { sendMail } from '@/lib/mail/send-mail';
import { deliveryConfig, nextAttemptAt } from '@/lib/delivery/delivery-config';
import { composeNotificationMessage } from './compose-notification-message';
import type { WorkflowNotificationKind } from './notification-kinds';

/** An attempt that started this long ago and never finished (the process stopped) may be taken over. */
export const STALE_MAIL_ATTEMPT_MS = 5 * 60 * 1000;

/**
 * One attempt to hand a workflow notification's e-mail to the SMTP server,
 * with the same doubling waits as a delivery (NODEWRIGHT_MAIL_RETRY_SECONDS,
 * NODEWRIGHT_MAIL_MAX_ATTEMPTS). The outcome is stored on the notification.
 * Returns false when the mail is not due (sent, switched off, or another
 * attempt is running).
 */
export async function attemptNotificationMail(notificationId: number): Promise<boolean> {
  await db();
  const config = deliveryConfig();
  const started = new Date();
  const [claimed] = await Notification.update(
    { mailStatus: 'sending', mailLastAttemptAt: started },
    {
      where: {
        id: notificationId,
        [Op.or]: [
          { mailStatus: { [Op.in]: ['queued', 'failed'] } },
          {
            mailStatus: 'sending',
            mailLastAttemptAt: { [Op.lt]: new Date(started.getTime() - STALE_MAIL_ATTEMPT_MS) },
          },
        ],
      },
    },
  );
  if (claimed !== 1) return false;
  const n = await Notification.findByPk(notificationId, { rejectOnEmpty: true });
  const attempt = n.mailAttempts + 1;
  let error: string;
  try {
    const [recipient, actor, memo] = await Promise.all([
      User.findByPk(n.userId, { rejectOnEmpty: true, attributes: ['name', 'email'] }),
      User.findByPk(n.actorId, { attributes: ['name'] }),
      Memo.findByPk(n.memoId, { rejectOnEmpty: true, attributes: ['id', 'documentNumber', 'title'] }),
    ]);
    const outcome = await sendMail(
      composeNotificationMessage({
        kind: n.kind as WorkflowNotificationKind,
        to: { name: recipient.name, email: recipient.email },
        actorName: actor?.name ?? 'Someone',
        memo: { documentNumber: memo.documentNumber, title: memo.title },
        revisionLetter: n.revisionLetter,
        note: n.note,
        link: `${config.publicUrl}/memos/${memo.id}`,
        settingsLink: `${config.publicUrl}/settings/notifications`,
      }),
    );
    if (outcome.ok) {
      await n.update({
        mailStatus: 'sent',
        mailAttempts: attempt,
        mailSentAt: new Date(),
        mailError: null,
        mailNextAttemptAt: null,
      });
      return true;
    }
    error = outcome.error;
  } catch (err) {
    // Not an SMTP answer (say, the database was busy): failed and due again, never lost.
    error = `could not prepare the message: ${err instanceof Error ? err.message : String(err)}`;
  }
  await n.update({
    mailStatus: 'failed',
    mailAttempts: attempt,
    mailError: error.slice(0, 1000),
    mailNextAttemptAt: nextAttemptAt(attempt, new Date(), config),
  });
  return true;
}
