/** What happened in a review thread. */
export const THREAD_NOTIFICATION_KINDS = ['comment', 'reply', 'resolved', 'reopened'] as const;

/**
 * What happened to a memo in review, each told in the app and (unless the
 * person switched it off) by e-mail: submitted to you (reviewers), changes
 * requested and approved (the memo's authors; approved also configuration
 * managers), frozen (authors and reviewers), released to customers (owner).
 */
export const WORKFLOW_NOTIFICATION_KINDS = [
  'submitted',
  'changes-requested',
  'approved',
  'frozen',
  'released',
] as const;
export type WorkflowNotificationKind = (typeof WORKFLOW_NOTIFICATION_KINDS)[number];

export const NOTIFICATION_KINDS = [...THREAD_NOTIFICATION_KINDS, ...WORKFLOW_NOTIFICATION_KINDS] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

/** The state of a workflow notification's e-mail; null when none is sent (a thread note, or e-mail switched off). */
export const NOTIFICATION_MAIL_STATUSES = ['queued', 'sending', 'sent', 'failed'] as const;
export type NotificationMailStatus = (typeof NOTIFICATION_MAIL_STATUSES)[number];

/** How each kind is named on the settings page and in mail subjects. */
export const WORKFLOW_KIND_TITLES: Record<WorkflowNotificationKind, string> = {
  submitted: 'A memo is submitted to you for review',
  'changes-requested': 'A reviewer requests changes to your memo',
  approved: 'A memo is approved',
  frozen: 'A memo is frozen as a revision',
  released: 'A revision of your memo is released to customers',
};
