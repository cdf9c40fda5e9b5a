import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MemoVersion } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { makeMemo } from '../support/factories';
import { makeBaselineRows } from '../support/baseline-rows';

/*
 * What is checked: migrations 20261202134000, 20261202120000 (signatures) and 20261202141000 (names of versions) by direct SQL on a PostgreSQL
 * connection of its own (npm pg, not the app's Sequelize instance), so the
 * database refuses whatever a client sends. For each baseline table, every
 * way to change an existing row — UPDATE, DELETE, INSERT … ON CONFLICT DO
 * UPDATE and TRUNCATE (PostgreSQL 15 documentation, SQL Commands: UPDATE,
 * DELETE, INSERT "ON CONFLICT Clause", TRUNCATE) — fails with
 * "<table> rows are immutable", the text of the SQLite triggers
 * (refuse-rewriting-baselines.test.ts), and the row reads back the same.
 * Runs under `npm run test:postgres`; skipped on SQLite.
 */

const postgres = Boolean(process.env.NODEWRIGHT_TEST_POSTGRES_URL);
type Row = Record<string, unknown>;
let raw: pg.Client;
const run = async (sql: string, params: unknown[] = []): Promise<Error | null> => {
  try {
    await raw.query(sql, params);
    return null;
  } catch (err) {
    return err as Error;
  }
};
const all = async (sql: string, params: unknown[] = []) => (await raw.query(sql, params)).rows as Row[];

let analyst: Actor;
const cases: { table: string; id: number; tamper: Row }[] = [];

beforeAll(async () => {
  if (!postgres) return;
  const rows = await makeBaselineRows();
  analyst = rows.analyst;
  for (const [table, c] of Object.entries(rows.tampered)) cases.push({ table, ...c });
  raw = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await raw.connect();
});

afterAll(async () => {
  await raw?.end();
});

describe.skipIf(!postgres)('baseline tables refuse every rewrite by direct SQL (PostgreSQL)', () => {
  it.each(['revisions', 'attachments', 'audit_events', 'memo_versions', 'signatures', 'memo_version_labels'])(
    '%s',
    async (table) => {
      const c = cases.find((x) => x.table === table)!;
      const [before] = await all(`SELECT * FROM ${table} WHERE id = $1`, [c.id]);
      const count = async () => Number((await all(`SELECT COUNT(*) AS n FROM ${table}`))[0].n);
      const rowsBefore = await count();
      const changed = { ...before, ...c.tamper };
      const cols = Object.keys(changed);
      const values = cols.map((k) => (k.endsWith('_json') ? JSON.stringify(changed[k]) : changed[k]));
      const marks = cols.map((_, i) => `$${i + 1}`).join(', ');
      const [setCol] = Object.keys(c.tamper);

      const attempts: [string, string, unknown[]][] = [
        ['UPDATE', `UPDATE ${table} SET ${setCol} = $1 WHERE id = $2`, [c.tamper[setCol], c.id]],
        ['DELETE', `DELETE FROM ${table} WHERE id = $1`, [c.id]],
        [
          'INSERT … ON CONFLICT DO UPDATE',
          `INSERT INTO ${table} (${cols.join(', ')}) VALUES (${marks}) ON CONFLICT (id) DO UPDATE SET ${setCol} = excluded.${setCol}`,
          values,
        ],
        ['TRUNCATE', `TRUNCATE ${table} CASCADE`, []],
      ];
      for (const [what, sql, params] of attempts) {
        const err = await run(sql, params);
        expect(err?.message, `${what} on ${table}`).toMatch(new RegExp(`^${table} rows are immutable$`));
        expect(
          (await all(`SELECT * FROM ${table} WHERE id = $1`, [c.id]))[0],
          `${what} left the row unchanged`,
        ).toEqual(before);
      }
      expect(await count()).toBe(rowsBefore);
    },
  );

  it('ordinary inserts still pass, and a memo with saved versions cannot be deleted', async () => {
    const memo = await makeMemo(analyst, { title: 'Another memo' });
    expect(await MemoVersion.count({ where: { memoId: memo.id } })).toBe(1);
    expect((await run('DELETE FROM memos WHERE id = $1', [memo.id]))?.message).toMatch(
      /memo_versions rows are immutable/,
    );
    expect(await all('SELECT id FROM memos WHERE id = $1', [memo.id])).toHaveLength(1);
  });
});
