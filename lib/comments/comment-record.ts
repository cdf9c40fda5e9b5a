import type { PersonRef } from '@/lib/memos/memo-record';
import type { CommentAnchor } from './comment-schema';
import type { NotificationKind, ThreadStatus } from './comment-status';
import type { NotificationMailStatus } from '@/lib/notifications/notification-kinds';

/** API shapes of review threads and notifications. */

export interface CommentRecord {
  id: number;
  author: PersonRef;
  body: string;
  createdAt: string;
}

export interface ThreadRecord extends CommentRecord {
  memoId: number;
  anchor: CommentAnchor;
  status: ThreadStatus;
  resolvedBy: PersonRef | null;
  resolvedAt: string | null;
  replies: CommentRecord[];
  updatedAt: string;
}

export interface NotificationRecord {
  id: number;
  kind: NotificationKind;
  memo: { id: number; documentNumber: string; title: string };
  /** The thread (root comment) a thread notification is about; null for a workflow notification. */
  threadId: number | null;
  commentId: number | null;
  /** The revision a frozen or released notification is about. */
  revisionLetter: string | null;
  actor: PersonRef;
  /** The start of the comment or reply, or of the transition's note, for a one-line preview. */
  excerpt: string;
  /** A workflow notification's note in full (submit note, reviewer's note, change summary, cover note). */
  note: string | null;
  /** Its e-mail: null when none is sent (a thread note, or switched off by its reader). */
  mail: NotificationMailStatus | null;
  read: boolean;
  createdAt: string;
}

export interface NotificationsRecord {
  unreadCount: number;
  items: NotificationRecord[];
}
