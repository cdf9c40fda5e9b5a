import { QueryTypes, type Transaction } from 'sequelize';
import { db } from '@/models';
import type { MemoFacts } from '@/lib/auth/permissions';
import { listCurrentReaders } from '@/lib/delivery/list-revision-recipients';
import type { MemoStatus } from './memo-status';
import type { TiptapDoc } from './memo-schema';
import type { PersonRef } from './memo-record';

interface MemoViewRow {
  id: number;
  document_number: string;
  title: string;
  status: MemoStatus;
  version: number;
  owner_id: number;
  /** JSON text on SQLite, already parsed by the pg driver on PostgreSQL. */
  content_json: string | TiptapDoc;
  created_at: string | Date;
  updated_at: string | Date;
  owner_name: string | null;
  /** A bigint on PostgreSQL: the driver hands it over as text. */
  open_threads: number | string;
}

interface PersonLinkRow {
  link: 'reviewer' | 'co-author';
  user_id: number;
  name: string | null;
}

/** Everything GET /api/memos/:id shows and decides on, in the shape toMemoDetail's callers build it. */
export interface MemoView {
  memo: {
    id: number;
    documentNumber: string;
    title: string;
    status: MemoStatus;
    version: number;
    ownerId: number;
    content: TiptapDoc;
    createdAt: string | Date;
    updatedAt: string | Date;
  };
  facts: MemoFacts;
  /** Names of the owner, reviewers and co-authors found in the users table. */
  people: Map<number, PersonRef>;
  openThreads: number;
}

/*
 * Plain SQL that both dialects read alike (no backquotes, no dialect
 * functions). Sequelize's SQLite dialect runs `PRAGMA table_info` before
 * every model query whose SQL names a backquoted table, to type the
 * columns: the five model lookups a memo read made (memo, reviewers,
 * co-authors, names, open threads) were ten SQLite statements. These are two.
 */
const MEMO_SQL = `SELECT m.id, m.document_number, m.title, m.status, m.version, m.owner_id, m.content_json,
  m.created_at, m.updated_at, u.name AS owner_name,
  (SELECT COUNT(*) FROM comments c WHERE c.memo_id = m.id AND c.parent_id IS NULL AND c.status = 'open') AS open_threads
FROM memos m LEFT JOIN users u ON u.id = m.owner_id
WHERE m.id = :memoId`;

// Ordered as loadMemoFacts orders them: reviewers by person, co-authors in the order they were added.
const PEOPLE_SQL = `SELECT 'reviewer' AS link, l.user_id AS sort_key, l.user_id, u.name
FROM memo_reviewers l LEFT JOIN users u ON u.id = l.user_id WHERE l.memo_id = :memoId
UNION ALL
SELECT 'co-author' AS link, l.id AS sort_key, l.user_id, u.name
FROM memo_co_authors l LEFT JOIN users u ON u.id = l.user_id WHERE l.memo_id = :memoId
ORDER BY link, sort_key`;

/**
 * A memo as one person's read shows it, with what the permission rules need
 * to decide on it, in two queries (plus the delivery lookup for a frozen
 * memo, whose readers are its latest revision's recipients); null when there
 * is no such memo. Decides nothing: the caller asks permissions.ts. Within
 * `transaction` when given (a save re-reads and re-checks under its lock).
 */
export async function readMemoView(memoId: number, transaction?: Transaction): Promise<MemoView | null> {
  const sequelize = await db();
  const options = { replacements: { memoId }, type: QueryTypes.SELECT, transaction } as const;
  const [memoRows, links] = await Promise.all([
    sequelize.query<MemoViewRow>(MEMO_SQL, options),
    sequelize.query<PersonLinkRow>(PEOPLE_SQL, options),
  ]);
  const row = memoRows[0];
  if (!row) return null;
  const memo = {
    id: Number(row.id),
    documentNumber: row.document_number,
    title: row.title,
    status: row.status,
    version: Number(row.version),
    ownerId: Number(row.owner_id),
    content: typeof row.content_json === 'string' ? (JSON.parse(row.content_json) as TiptapDoc) : row.content_json,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
  const people = new Map<number, PersonRef>();
  if (row.owner_name !== null) people.set(memo.ownerId, { id: memo.ownerId, name: row.owner_name });
  const reviewerIds: number[] = [];
  const coAuthorIds: number[] = [];
  for (const l of links) {
    const userId = Number(l.user_id);
    (l.link === 'reviewer' ? reviewerIds : coAuthorIds).push(userId);
    if (l.name !== null) people.set(userId, { id: userId, name: l.name });
  }
  const facts: MemoFacts = {
    ownerId: memo.ownerId,
    coAuthorIds,
    status: memo.status,
    reviewerIds,
    releasedToUserIds: await listCurrentReaders(memo, transaction),
  };
  return { memo, facts, people, openThreads: Number(row.open_threads) };
}
