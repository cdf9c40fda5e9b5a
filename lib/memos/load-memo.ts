import type { Transaction } from 'sequelize';
import { db, Memo, MemoCoAuthor, MemoReviewer, User } from '@/models';
import {
  assertMemo,
  decideMemo,
  MEMO_ACTIONS,
  notSharedOrMissing,
  type Actor,
  type Decision,
  type MemoAction,
  type MemoFacts,
} from '@/lib/auth/permissions';
import type { MemoDetail, MemoSummary, PersonRef } from './memo-record';
import { countOpenThreads } from '@/lib/comments/count-open-threads';
import { listCurrentReaders } from '@/lib/delivery/list-revision-recipients';

/** Read on every memo request: the three lookups are independent, and plain rows (raw) spare building model instances. */
export async function loadMemoFacts(memo: Memo, transaction?: Transaction): Promise<MemoFacts> {
  const [links, coAuthors, releasedToUserIds] = await Promise.all([
    // By person: the order SQLite's unique (memo, person) index gave, now the same on PostgreSQL.
    MemoReviewer.findAll({
      where: { memoId: memo.id },
      attributes: ['userId'],
      order: [['userId', 'ASC']],
      raw: true,
      transaction,
    }),
    MemoCoAuthor.findAll({
      where: { memoId: memo.id },
      attributes: ['userId'],
      order: [['id', 'ASC']],
      raw: true,
      transaction,
    }),
    // Customers the latest revision was released to (the frozen memo's content is that revision).
    listCurrentReaders(memo, transaction),
  ]);
  return {
    ownerId: memo.ownerId,
    coAuthorIds: coAuthors.map((c) => c.userId),
    status: memo.status,
    reviewerIds: links.map((l) => l.userId),
    releasedToUserIds,
  };
}

/**
 * Loads a memo and checks that the actor may do `action` with it: 403 or 409
 * otherwise, and 404 with one wording both for an unknown id and for a memo
 * the actor may not see (so ids cannot be probed).
 */
export async function loadMemoFor(
  actor: Actor,
  memoId: number,
  action: MemoAction,
  transaction?: Transaction,
): Promise<{ memo: Memo; facts: MemoFacts }> {
  await db();
  const memo = await Memo.findByPk(memoId, { transaction });
  if (!memo) throw notSharedOrMissing();
  const facts = await loadMemoFacts(memo, transaction);
  assertMemo(actor, action, facts);
  return { memo, facts };
}

export async function peopleById(ids: readonly number[]): Promise<Map<number, PersonRef>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const users = await User.findAll({ where: { id: unique }, attributes: ['id', 'name'], raw: true });
  return new Map(users.map((u) => [u.id, { id: u.id, name: u.name }]));
}

const unknownPerson = (id: number): PersonRef => ({ id, name: `user ${id}` });

/**
 * The memo columns a summary shows: a model instance, or a plain row read
 * for one view (read-memo-view.ts), whose SQLite timestamps are still text.
 */
export type MemoSummaryFields = Pick<Memo, 'id' | 'documentNumber' | 'title' | 'status' | 'version' | 'ownerId'> & {
  createdAt: Date | string;
  updatedAt: Date | string;
};

/** `openThreads`: the memo's open review threads (countOpenThreads); a memo just created has none. */
export function toMemoSummary(memo: MemoSummaryFields, people: Map<number, PersonRef>, openThreads = 0): MemoSummary {
  return {
    id: memo.id,
    documentNumber: memo.documentNumber,
    title: memo.title,
    status: memo.status,
    version: memo.version,
    owner: people.get(memo.ownerId) ?? unknownPerson(memo.ownerId),
    openThreads,
    createdAt: new Date(memo.createdAt).toISOString(),
    updatedAt: new Date(memo.updatedAt).toISOString(),
  };
}

export async function toMemoDetail(actor: Actor, memo: Memo, facts: MemoFacts): Promise<MemoDetail> {
  const [people, openThreadsByMemo] = await Promise.all([
    peopleById([memo.ownerId, ...facts.reviewerIds, ...facts.coAuthorIds]),
    countOpenThreads([memo.id]),
  ]);
  return buildMemoDetail(actor, memo, facts, people, openThreadsByMemo.get(memo.id) ?? 0);
}

/** The detail one actor sees, from what was read: the people named by id, and the memo's open threads. */
export function buildMemoDetail(
  actor: Actor,
  memo: MemoSummaryFields & { content: MemoDetail['content'] },
  facts: MemoFacts,
  people: Map<number, PersonRef>,
  openThreads: number,
): MemoDetail {
  return {
    ...toMemoSummary(memo, people, openThreads),
    content: memo.content,
    reviewers: facts.reviewerIds.map((id) => people.get(id) ?? unknownPerson(id)),
    coAuthors: facts.coAuthorIds.map((id) => people.get(id) ?? unknownPerson(id)),
    allowedActions: MEMO_ACTIONS.filter((a) => decideMemo(actor, a, facts).allowed),
    editRefusal: refusalReason(decideMemo(actor, 'memo.edit', facts)),
  };
}

function refusalReason(d: Decision): string | null {
  return d.allowed ? null : d.reason;
}
