import { db, Notification } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { markReadInputSchema, type MarkReadInput } from './comment-schema';

/** Marks the actor's unread notifications read (those of one memo when `memoId` is given). */
export async function markNotificationsRead(
  actor: Actor,
  input: MarkReadInput,
): Promise<{ marked: number; unreadCount: number }> {
  const { memoId } = markReadInputSchema.parse(input);
  await db();
  const [marked] = await Notification.update(
    { readAt: new Date() },
    { where: { userId: actor.id, readAt: null, ...(memoId !== undefined ? { memoId } : {}) } },
  );
  const unreadCount = await Notification.count({ where: { userId: actor.id, readAt: null } });
  return { marked, unreadCount };
}
