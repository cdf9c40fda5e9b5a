import { QueryTypes, type Transaction } from 'sequelize';
import { db } from '@/models';
import type { MemoFacts } from '@/lib/auth/permissions';
import { listCurrentReaders } from '@/lib/delivery/list-revision-recipients';
import type { MemoStatus } from './memo-status';
import type { TiptapDoc } from './memo-schema';
import type { PersonRef } from './memo-record';

/**
 * One row of MEMO_VIEW_SQL: the memo's own row (`link` null) with its columns
 * filled, or one reviewer or co-author link with only `link`, `user_id` and
 * `person_name` filled.
 */
interface MemoViewRow {
  link: 'reviewer' | 'co-author' | null;
  id: number | null;
  document_number: string | null;
  title: string | null;
  status: MemoStatus | null;
  version: number | null;
  owner_id: number | null;
  /** JSON text on SQLite, already parsed by the pg driver on PostgreSQL. */
  content_json: string | TiptapDoc | null;
  created_at: string | Date | null;
  updated_at: string | Date | null;
  /** A bigint on PostgreSQL: the driver hands it over as text. */
  open_threads: number | string | null;
  /** The memo row: the owner's name; a link row: the linked person's. */
  person_name: string | null;
  user_id: number | null;
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
 * columns, and each statement costs a round of Sequelize's query machinery
 * (about 0.1 ms of CPU, measured): the five model lookups a memo read made
 * (memo, reviewers, co-authors, names, open threads) were ten SQLite
 * statements; this is one. The memo's row comes first (rank 0), then the
 * reviewers by person and the co-authors in the order they were added, as
 * loadMemoFacts orders them. The NULLs of the link rows take their types
 * from the memo row's columns (UNION type resolution, PostgreSQL
 * documentation §10.5).
 */
const MEMO_VIEW_SQL = `SELECT 0 AS row_rank, 0 AS sort_key, NULL AS link, m.id, m.document_number, m.title, m.status, m.version,
  m.owner_id, m.content_json, m.created_at, m.updated_at,
  (SELECT COUNT(*) FROM comments c WHERE c.memo_id = m.id AND c.parent_id IS NULL AND c.status = 'open') AS open_threads,
  u.name AS person_name, m.owner_id AS user_id
FROM memos m LEFT JOIN users u ON u.id = m.owner_id
WHERE m.id = :memoId
UNION ALL
SELECT 1, l.user_id, 'reviewer', NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, u.name, l.user_id
FROM memo_reviewers l LEFT JOIN users u ON u.id = l.user_id WHERE l.memo_id = :memoId
UNION ALL
SELECT 2, l.id, 'co-author', NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL, u.name, l.user_id
FROM memo_co_authors l LEFT JOIN users u ON u.id = l.user_id WHERE l.memo_id = :memoId
ORDER BY row_rank, sort_key`;

/**
 * A memo as one person's read shows it, with what the permission rules need
 * to decide on it, in one query (plus the delivery lookup for a frozen
 * memo, whose readers are its latest revision's recipients); null when there
 * is no such memo. Decides nothing: the caller asks permissions.ts. Within
 * `transaction` when given (a save re-reads and re-checks under its lock).
 */
export async function readMemoView(memoId: number, transaction?: Transaction): Promise<MemoView | null> {
  const sequelize = await db();
  const rows = await sequelize.query<MemoViewRow>(MEMO_VIEW_SQL, {
    replacements: { memoId },
    type: QueryTypes.SELECT,
    transaction,
  });
  const row = rows[0];
  // The memo's row sorts first; a link row first (links left without their memo) means no memo either.
  if (!row || row.link !== null) return null;
  const memo = {
    id: Number(row.id),
    documentNumber: String(row.document_number),
    title: String(row.title),
    status: row.status as MemoStatus,
    version: Number(row.version),
    ownerId: Number(row.owner_id),
    content:
      typeof row.content_json === 'string'
        ? (JSON.parse(row.content_json) as TiptapDoc)
        : (row.content_json as TiptapDoc),
    createdAt: row.created_at as string | Date,
    updatedAt: row.updated_at as string | Date,
  };
  const people = new Map<number, PersonRef>();
  if (row.person_name !== null) people.set(memo.ownerId, { id: memo.ownerId, name: row.person_name });
  const reviewerIds: number[] = [];
  const coAuthorIds: number[] = [];
  for (const l of rows.slice(1)) {
    const userId = Number(l.user_id);
    (l.link === 'reviewer' ? reviewerIds : coAuthorIds).push(userId);
    if (l.person_name !== null) people.set(userId, { id: userId, name: l.person_name });
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
