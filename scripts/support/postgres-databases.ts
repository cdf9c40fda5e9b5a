import crypto from 'node:crypto';
import pg from 'pg';

/**
 * Creating and dropping whole databases in a PostgreSQL cluster, for tests
 * (one fresh database per test file or app server) and benchmarks. Runs on a
 * connection of its own to the cluster's maintenance database named by
 * `adminUrl`; CREATE and DROP DATABASE cannot run inside a transaction.
 */
async function onAdmin<T>(adminUrl: string, work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** The URL of `database` in the same cluster as `adminUrl`. */
export function databaseUrl(adminUrl: string, database: string): string {
  const url = new URL(adminUrl);
  url.pathname = `/${database}`;
  return url.toString();
}

/** Creates an empty database with a fresh name (`prefix_` + random hex) and returns its URL. */
export async function createDatabase(adminUrl: string, prefix = 'nodewright'): Promise<string> {
  const name = `${prefix}_${crypto.randomBytes(6).toString('hex')}`;
  await onAdmin(adminUrl, (c) => c.query(`CREATE DATABASE ${name}`));
  return databaseUrl(adminUrl, name);
}

/** Drops the database a URL names, ending its remaining connections first (PostgreSQL 13+ `WITH (FORCE)`). */
export async function dropDatabase(adminUrl: string, url: string): Promise<void> {
  const name = new URL(url).pathname.slice(1);
  if (!/^[a-z0-9_]+$/.test(name)) throw new Error(`refusing to drop database "${name}"`);
  await onAdmin(adminUrl, (c) => c.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`));
}
