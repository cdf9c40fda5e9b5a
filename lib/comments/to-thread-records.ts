import type { Transaction } from 'sequelize';
import { Comment } from '@/models';
import { peopleById } from '@/lib/memos/load-memo';
import type { PersonRef } from '@/lib/memos/memo-record';
import type { CommentRecord, ThreadRecord } from './comment-record';

const unknownPerson = (id: number): PersonRef => ({ id, name: `user ${id}` });
const iso = (d: Date | string) => new Date(d).toISOString();

/** Thread roots with their replies (oldest first) as API records, with authors' names. */
export async function toThreadRecords(roots: readonly Comment[], transaction?: Transaction): Promise<ThreadRecord[]> {
  if (roots.length === 0) return [];
  const replies = await Comment.findAll({
    where: { parentId: roots.map((r) => r.id) },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
  });
  const ids = [
    ...roots.map((r) => r.authorId),
    ...roots.flatMap((r) => (r.resolvedBy ? [r.resolvedBy] : [])),
    ...replies.map((r) => r.authorId),
  ];
  const people = await peopleById(ids);
  const person = (id: number) => people.get(id) ?? unknownPerson(id);
  const toComment = (c: Comment): CommentRecord => ({
    id: c.id,
    author: person(c.authorId),
    body: c.body,
    createdAt: iso(c.createdAt),
  });
  return roots.map((root) => {
    if (!root.anchor || !root.status) throw new Error(`comment ${root.id} is not a thread root`);
    return {
      ...toComment(root),
      memoId: root.memoId,
      anchor: root.anchor,
      status: root.status,
      resolvedBy: root.resolvedBy ? person(root.resolvedBy) : null,
      resolvedAt: root.resolvedAt ? iso(root.resolvedAt) : null,
      replies: replies.filter((r) => r.parentId === root.id).map(toComment),
      updatedAt: iso(root.updatedAt),
    };
  });
}
