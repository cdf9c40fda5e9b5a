import type { Sequelize } from 'sequelize';

type SqliteConnectionManager = { getConnection(options?: { uuid?: string; type?: string }): Promise<unknown> };

/**
 * Sequelize's SQLite dialect runs every statement outside a transaction on
 * one connection, and wraps each in node-sqlite3's `serialize`, which starts
 * a statement only once the one before it on that connection has finished.
 * Reads of concurrent requests (the session check, a memo and its people)
 * therefore queued behind each other with a trip through the event loop
 * between each. In WAL mode readers do not block each other or the writer
 * (https://www.sqlite.org/wal.html, "Concurrency"), so SELECTs outside a
 * transaction are spread over `count` connections of their own, taken in
 * turn; every other statement keeps the dialect's connection, and
 * transactions the writer's (share-writer-connection.ts). Each reader sees
 * the last commit at the start of its statement, as the shared connection
 * did. An in-memory database is one connection whatever is asked (the
 * dialect keys it by `inMemory`), so nothing changes there.
 */
export function spreadSqliteReads(sequelize: Sequelize, count: number): void {
  if (count < 1) return;
  const manager = (sequelize as unknown as { connectionManager: SqliteConnectionManager }).connectionManager;
  const getConnection = manager.getConnection.bind(manager);
  let next = 0;
  manager.getConnection = (options) => {
    const outsideTransaction = options?.uuid === undefined || options.uuid === 'default';
    if (!outsideTransaction || options?.type !== 'SELECT') return getConnection(options);
    next = (next + 1) % count;
    return getConnection({ ...options, uuid: `nodewright-reader-${next}` });
  };
}

/** `NODEWRIGHT_SQLITE_READ_CONNECTIONS` (default 3, 0 to 8): connections for reads outside transactions. */
export function sqliteReadConnections(): number {
  const raw = process.env.NODEWRIGHT_SQLITE_READ_CONNECTIONS;
  if (raw === undefined || raw.trim() === '') return 3;
  const n = Number(raw);
  return Number.isSafeInteger(n) && n >= 0 && n <= 8 ? n : 3;
}
