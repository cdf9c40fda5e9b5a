import { Comment, db, Memo, Notification } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { peopleById } from '@/lib/memos/load-memo';
import type { NotificationRecord, NotificationsRecord } from './comment-record';

/** How many of the latest notifications a listing carries. */
export const NOTIFICATION_PAGE = 20;
const EXCERPT_CHARS = 140;

function excerpt(body: string): string {
  const oneLine = body.replace(/\s+/g, ' ').trim();
  return oneLine.length <= EXCERPT_CHARS ? oneLine : `${oneLine.slice(0, EXCERPT_CHARS - 1)}…`;
}

/** The actor's unread count and latest notifications (newest first) of threads and review transitions, their own only. */
export async function listNotifications(actor: Actor): Promise<NotificationsRecord> {
  await db();
  const unreadCount = await Notification.count({ where: { userId: actor.id, readAt: null } });
  const rows = await Notification.findAll({
    where: { userId: actor.id },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: NOTIFICATION_PAGE,
  });
  const memos = new Map(
    (
      await Memo.findAll({
        where: { id: [...new Set(rows.map((n) => n.memoId))] },
        attributes: ['id', 'documentNumber', 'title'],
      })
    ).map((m) => [m.id, m]),
  );
  const commentIds = [...new Set(rows.flatMap((n) => (n.commentId === null ? [] : [n.commentId])))];
  const comments = new Map(
    (await Comment.findAll({ where: { id: commentIds }, attributes: ['id', 'parentId', 'body'] })).map((c) => [
      c.id,
      c,
    ]),
  );
  const people = await peopleById(rows.map((n) => n.actorId));
  const items: NotificationRecord[] = [];
  for (const n of rows) {
    const memo = memos.get(n.memoId);
    const comment = n.commentId === null ? null : comments.get(n.commentId);
    if (!memo || comment === undefined) continue;
    items.push({
      id: n.id,
      kind: n.kind,
      memo: { id: memo.id, documentNumber: memo.documentNumber, title: memo.title },
      threadId: comment ? (comment.parentId ?? comment.id) : null,
      commentId: comment?.id ?? null,
      revisionLetter: n.revisionLetter,
      actor: people.get(n.actorId) ?? { id: n.actorId, name: `user ${n.actorId}` },
      excerpt: excerpt(comment?.body ?? n.note ?? ''),
      note: comment ? null : n.note,
      mail: n.mailStatus,
      read: n.readAt !== null,
      createdAt: new Date(n.createdAt).toISOString(),
    });
  }
  return { unreadCount, items };
}
