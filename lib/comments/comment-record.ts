import type { PersonRef } from '@/lib/memos/memo-record';
import type { CommentAnchor } from './comment-schema';
import type { NotificationKind, ThreadStatus } from './comment-status';

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
  /** The thread (root comment) the notification is about. */
  threadId: number;
  commentId: number;
  actor: PersonRef;
  /** The start of the comment or reply, for a one-line preview. */
  excerpt: string;
  read: boolean;
  createdAt: string;
}

export interface NotificationsRecord {
  unreadCount: number;
  items: NotificationRecord[];
}
