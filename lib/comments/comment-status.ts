/** A thread is open until an analyst resolves it; it can be reopened. */
export const THREAD_STATUSES = ['open', 'resolved'] as const;
export type ThreadStatus = (typeof THREAD_STATUSES)[number];

/** What a notification tells its reader happened (in a thread, or to the memo in review). */
export { NOTIFICATION_KINDS, type NotificationKind } from '@/lib/notifications/notification-kinds';
