import { integerSetting } from '@/lib/mail/mail-config';

/** Delivery settings from the environment (README, "Configuration"). */
export interface DeliveryConfig {
  /** The frozen PDF rides along when it is at most this many bytes; larger ones go by link only. */
  attachmentMaxBytes: number;
  /** Lifetime of a delivery link and of an invitation. */
  linkTtlMs: number;
  /** First automatic retry after this many seconds; each further retry waits twice as long. */
  retryBaseSeconds: number;
  /** Automatic attempts before a delivery waits for a person to resend it. */
  maxAttempts: number;
  /** Public address of the app, the base of every link in a message. */
  publicUrl: string;
}

const DAY_MS = 24 * 60 * 60 * 1000;

export function deliveryConfig(): DeliveryConfig {
  return {
    attachmentMaxBytes: integerSetting('NODEWRIGHT_MAIL_ATTACHMENT_MAX_BYTES', 5 * 1024 * 1024, 0, 1024 * 1024 * 1024),
    linkTtlMs: integerSetting('NODEWRIGHT_LINK_TTL_DAYS', 30, 1, 3650) * DAY_MS,
    retryBaseSeconds: integerSetting('NODEWRIGHT_MAIL_RETRY_SECONDS', 60, 1, 86_400),
    maxAttempts: integerSetting('NODEWRIGHT_MAIL_MAX_ATTEMPTS', 8, 1, 100),
    publicUrl: (process.env.NEXTAUTH_URL ?? `http://localhost:${process.env.PORT ?? '3000'}`).replace(/\/+$/, ''),
  };
}

/** When the next automatic attempt is due after `attempts` failures, or null when they are used up. */
export function nextAttemptAt(
  attempts: number,
  from: Date,
  config: Pick<DeliveryConfig, 'retryBaseSeconds' | 'maxAttempts'>,
): Date | null {
  if (attempts >= config.maxAttempts) return null;
  const seconds = Math.min(config.retryBaseSeconds * 2 ** Math.max(0, attempts - 1), 6 * 60 * 60);
  return new Date(from.getTime() + seconds * 1000);
}
