import { attemptNotificationMail } from './attempt-notification-mail';

/**
 * Sends the queued e-mails of notifications a transition just recorded, one
 * after another, after its transaction committed. It does not hold up the
 * response: a mail that fails stays failed with its next attempt due, and
 * the retry pass (`retryDueNotificationMails`) takes it from there.
 */
export function sendNotificationMails(notificationIds: readonly number[]): void {
  if (notificationIds.length === 0) return;
  void (async () => {
    for (const id of notificationIds) {
      try {
        await attemptNotificationMail(id);
      } catch (err) {
        console.error('[nodewright] notification mail attempt failed', err);
      }
    }
  })();
}
