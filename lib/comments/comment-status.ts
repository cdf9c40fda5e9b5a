/** A thread is open until an analyst resolves it; it can be reopened. */
export const THREAD_STATUSES = ['open', 'resolved'] as const;
export type ThreadStatus = (typeof THREAD_STATUSES)[number];

/** What a notification tells its reader happened in a thread. */
export const NOTIFICATION_KINDS = ['comment', 'reply', 'resolved', 'reopened'] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];
