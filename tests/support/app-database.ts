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
