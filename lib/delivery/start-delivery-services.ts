import { mailConfig } from '@/lib/mail/mail-config';
import { startFakeSmtpServer } from '@/lib/mail/start-fake-smtp-server';
import { deliveryConfig } from './delivery-config';
import { retryDueDeliveries } from './retry-due-deliveries';
import { retryDueAccountMessages } from './retry-due-account-messages';
import { retryDueNotificationMails } from '@/lib/notifications/retry-due-notification-mails';
import { claimWorkLease } from '@/lib/db/claim-work-lease';

/** The lease (lib/db/claim-work-lease.ts) that lets one app instance at a time run the retry pass. */
export const RETRY_PASS_LEASE = 'mail-retry-pass';

const holder = globalThis as unknown as { __nodewrightRetryTimer?: NodeJS.Timeout };

/**
 * Started with the app (instrumentation.ts): the built-in SMTP server when
 * SMTP_URL is unset, and the automatic retry pass for failed deliveries, invitation and reset messages and
 * notification e-mails,
 * which looks for due attempts every few seconds (the waits themselves double
 * from NODEWRIGHT_MAIL_RETRY_SECONDS).
 *
 * Several instances on one database: each runs the timer, but a pass runs
 * only in the instance holding the retry-pass lease, renewed at every pass
 * and taken over by another instance within four periods when its holder
 * stops. Each message is claimed on its own as well (claimAttempt, and the
 * notifications' conditional UPDATE), so even two passes at once would not
 * send a message twice.
 */
export async function startDeliveryServices(): Promise<void> {
  const mail = mailConfig();
  const delivery = deliveryConfig();
  if (!mail.smtpUrl) {
    const server = await startFakeSmtpServer();
    console.log(`[nodewright] local SMTP server (outbox) listening on ${server.host}:${server.port}`);
  }
  if (holder.__nodewrightRetryTimer) return;
  let running = false;
  const everyMs = Math.min(delivery.retryBaseSeconds * 1000, 15_000);
  holder.__nodewrightRetryTimer = setInterval(() => {
    if (running) return;
    running = true;
    claimWorkLease(RETRY_PASS_LEASE, 4 * everyMs)
      .then(async (held) => {
        if (!held) return;
        await retryDueDeliveries();
        await retryDueAccountMessages();
        await retryDueNotificationMails();
      })
      .catch((err: unknown) => console.error('[nodewright] mail retry pass failed', err))
      .finally(() => {
        running = false;
      });
  }, everyMs);
  holder.__nodewrightRetryTimer.unref();
}
