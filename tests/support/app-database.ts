import pg from 'pg';
import sqlite3 from 'sqlite3';
import { parseDatabaseUrl } from '@/lib/db/connection';

/**
 * Runs statements on a running app's database over a connection of its own
 * (sqlite3 or pg, never the app's Sequelize instance), as someone typing SQL
 * at the database would: for tests that store rows the API would refuse, or
 * check what the database itself refuses. Parameters are written `?`; on
 * PostgreSQL they become `$1`, `$2`, … Each statement's error (or null) is
 * returned in order; a failed one does not stop the next.
 */
export async function runOnAppDatabase(
  databaseUrl: string,
  statements: [sql: string, params?: unknown[]][],
): Promise<(Error | null)[]> {
  const target = parseDatabaseUrl(databaseUrl);
  const outcomes: (Error | null)[] = [];
  if (target.dialect === 'postgres') {
    const client = new pg.Client({ connectionString: databaseUrl });
    await client.connect();
    try {
      for (const [sql, params = []] of statements) {
        let n = 0;
        outcomes.push(
          await client
            .query(
              sql.replace(/\?/g, () => `$${++n}`),
              params,
            )
            .then(
              () => null,
              (err: Error) => err,
            ),
        );
      }
    } finally {
      await client.end();
    }
    return outcomes;
  }
  const db = new sqlite3.Database(target.storage!);
  for (const [sql, params = []] of statements)
    outcomes.push(await new Promise<Error | null>((resolve) => db.run(sql, params, (err) => resolve(err))));
  await new Promise((resolve) => db.close(resolve));
  return outcomes;
}

/**
 * Reads rows from a running app's database over a connection of its own
 * (sqlite3 or pg), parameters written `?`. Column values come as each driver
 * gives them: on PostgreSQL JSON columns are already parsed and dates are
 * `Date`s; `jsonColumn` and `dateColumn` read either.
 */
export async function queryAppDatabase<T>(databaseUrl: string, sql: string, params: unknown[] = []): Promise<T[]> {
  const target = parseDatabaseUrl(databaseUrl);
  if (target.dialect === 'postgres') {
    const client = new pg.Client({ connectionString: databaseUrl });
    await client.connect();
    try {
      let n = 0;
      return (
        await client.query(
          sql.replace(/\?/g, () => `$${++n}`),
          params,
        )
      ).rows as T[];
    } finally {
      await client.end();
    }
  }
  const db = new sqlite3.Database(target.storage!, sqlite3.OPEN_READONLY);
  try {
    return await new Promise<T[]>((resolve, reject) =>
      db.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[]))),
    );
  } finally {
    await new Promise((resolve) => db.close(resolve));
  }
}

/** A JSON column's value, whether the driver parsed it (pg) or returned its text (sqlite3). */
export const jsonColumn = <T>(value: unknown): T => (typeof value === 'string' ? JSON.parse(value) : value) as T;

/** A date column's value in milliseconds, whether the driver returned a `Date` (pg) or text (sqlite3). */
export const dateColumn = (value: unknown): number =>
  value instanceof Date ? value.getTime() : Date.parse(String(value));
