import { AsyncLocalStorage } from 'node:async_hooks';
import { type Sequelize, type Transaction, type TransactionOptions } from 'sequelize';
import { ApiError } from '@/lib/api/errors';
import { WriteQueue } from './write-queue';
import { shareWriterConnection } from './share-writer-connection';

/**
 * Every write of this process to the SQLite file goes through one queue.
 *
 * Why: node-sqlite3 runs each statement on one of libuv's threadpool threads
 * (4 by default), and SQLite's busy handler (busy_timeout) sleeps on that
 * thread while another connection holds the write lock. Five write
 * transactions at once could fill the pool with sleepers while the lock
 * holder waited for a thread to run its next statement: SQLITE_BUSY after
 * the timeout, for every writer but a few. SQLite allows one writer at a
 * time anyway (https://www.sqlite.org/wal.html, "Concurrency"), so waiting in
 * JavaScript for our turn loses nothing and keeps the threadpool free.
 *
 * How: installed once on the shared Sequelize instance, so every model call
 * and every `sequelize.transaction(…)` goes through it without asking:
 * - a transaction (`sequelize.transaction(options, async (t) => …)`) holds
 *   the queue from BEGIN to COMMIT or ROLLBACK;
 * - a statement outside a transaction that may write (anything but SELECT,
 *   EXPLAIN and read-only PRAGMAs) holds it for that one statement;
 * - reads outside a transaction never touch the queue: in WAL mode they read
 *   the last committed snapshot while a write is under way;
 * - transactions, one at a time now, share one connection that stays open
 *   (shareWriterConnection) instead of opening one each.
 * Two mistakes that would wait for themselves are refused at once with an
 * error naming the fix: a second transaction started inside a transaction,
 * and a write inside a transaction that does not pass `{ transaction }`.
 *
 * PostgreSQL has row locks and no busy wait on the threadpool: there the
 * instance is left as it is.
 */
export function serialiseWrites(sequelize: Sequelize, opts: { waitLimitMs?: number } = {}): WriteQueue {
  const installed = (sequelize as SerialisedSequelize)[QUEUE];
  if (installed) return installed;
  const queue = new WriteQueue();
  (sequelize as SerialisedSequelize)[QUEUE] = queue;
  if (sequelize.getDialect() !== 'sqlite') return queue;

  const waitLimitMs = opts.waitLimitMs ?? writeWaitLimitMs();
  const inside = new AsyncLocalStorage<{ active: boolean }>();
  const acquire = () =>
    queue.acquire(
      waitLimitMs,
      (waited) =>
        new ApiError(
          'unavailable',
          `The database is busy with other changes (waited ${(waited / 1000).toFixed(0)} s); nothing was changed. Try again in a moment.`,
          { retryAfterSeconds: 5 },
        ),
    );

  const originalTransaction = sequelize.transaction.bind(sequelize) as (
    options?: TransactionOptions,
    callback?: (t: Transaction) => Promise<unknown>,
  ) => Promise<unknown>;
  const transaction = async (
    optionsOrCallback?: TransactionOptions | ((t: Transaction) => Promise<unknown>),
    maybeCallback?: (t: Transaction) => Promise<unknown>,
  ) => {
    const [options, callback] =
      typeof optionsOrCallback === 'function' ? [undefined, optionsOrCallback] : [optionsOrCallback, maybeCallback];
    // A savepoint inside a transaction this caller already holds.
    if (options?.transaction) return originalTransaction(options, callback);
    if (inside.getStore()?.active) {
      throw new Error(
        'A transaction was started inside another transaction; it would wait for the outer one forever. Pass the outer one instead: sequelize.transaction({ transaction }, …) or { transaction } on each query.',
      );
    }
    const release = await acquire();
    if (!callback) return unmanaged(options, release);
    const state = { active: true };
    // The first afterCommit hook hands the queue on, so later hooks may write.
    const done = () => {
      state.active = false;
      release();
    };
    try {
      return await inside.run(state, () =>
        originalTransaction(options, async (t) => {
          t.afterCommit(done);
          return callback(t);
        }),
      );
    } finally {
      done();
    }
  };

  /** `const t = await sequelize.transaction()`: the queue is held until commit or rollback. */
  const unmanaged = async (options: TransactionOptions | undefined, release: () => void) => {
    let t: Transaction;
    try {
      t = (await originalTransaction(options)) as Transaction;
    } catch (err) {
      release();
      throw err;
    }
    t.afterCommit(release);
    const rollback = t.rollback.bind(t);
    t.rollback = async () => {
      try {
        await rollback();
      } finally {
        release();
      }
    };
    return t;
  };

  const originalQuery = sequelize.query.bind(sequelize) as (
    sql: unknown,
    options?: QueryOptionsLike,
  ) => Promise<unknown>;
  const query = async (sql: unknown, options?: QueryOptionsLike) => {
    if (options?.transaction || !mayWrite(sql)) return originalQuery(sql, options);
    if (inside.getStore()?.active) {
      throw new Error(
        `A write inside a transaction did not pass { transaction }; it would wait for that transaction forever. Statement: ${sqlText(sql).slice(0, 120)}`,
      );
    }
    const release = await acquire();
    try {
      return await originalQuery(sql, options);
    } finally {
      release();
    }
  };

  Object.assign(sequelize, { transaction, query });
  shareWriterConnection(sequelize);
  return queue;
}

const QUEUE = Symbol.for('nodewright.writeQueue');
type SerialisedSequelize = Sequelize & { [QUEUE]?: WriteQueue };
type QueryOptionsLike = { transaction?: Transaction | null };

/** The write queue of this Sequelize instance (installed by getSequelize). */
export function writeQueueOf(sequelize: Sequelize): WriteQueue | undefined {
  return (sequelize as SerialisedSequelize)[QUEUE];
}

/** `NODEWRIGHT_WRITE_WAIT_SECONDS` (default 30): how long a write waits for its turn before a 503. */
function writeWaitLimitMs(): number {
  const seconds = Number(process.env.NODEWRIGHT_WRITE_WAIT_SECONDS ?? 30);
  return (Number.isFinite(seconds) && seconds > 0 ? seconds : 30) * 1000;
}

function sqlText(sql: unknown): string {
  if (typeof sql === 'string') return sql;
  if (sql && typeof sql === 'object' && 'query' in sql && typeof sql.query === 'string') return sql.query;
  return '';
}

/**
 * Whether a statement may write, judged by its text alone (a query type can
 * be wrong: `INSERT … RETURNING` may be run as a SELECT). Errs towards yes: a
 * read taken for a write only waits its turn, a write taken for a read could
 * busy-wait on the threadpool again.
 */
export function mayWrite(sql: unknown): boolean {
  const text = sqlText(sql).replace(/^(\s|--[^\n]*\n|\/\*[\s\S]*?\*\/)+/, '');
  if (/^(SELECT|EXPLAIN)\b/i.test(text)) return false;
  if (/^PRAGMA\b/i.test(text)) return text.includes('=');
  return true;
}
