import crypto from 'node:crypto';
import sqlite3 from 'sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MemoVersion } from '@/models';
import { parseDatabaseUrl } from '@/lib/db/connection';
import type { Actor } from '@/lib/auth/permissions';
import { makeFrozenRevision, makeMemo, makeUser } from '../support/factories';
import { makeBaselineRows } from '../support/baseline-rows';

/*
 * What is checked: migrations 20261202101000, 20261202120000 (signatures) and 20261202141000 (names of versions) by direct SQL on a connection of
 * its own (sqlite3, not the app's Sequelize instance, no recursive_triggers),
 * so the database refuses whatever a client sends. For each baseline table,
 * every way to change an existing row — UPDATE, DELETE, INSERT OR REPLACE,
 * REPLACE INTO and INSERT … ON CONFLICT DO UPDATE (SQLite's statements as
 * documented at https://www.sqlite.org/lang_insert.html, lang_replace.html,
 * lang_upsert.html) — fails with "<table> rows are immutable", the text of
 * the earlier revision triggers, and the row reads back byte for byte the
 * same.
 */

type Row = Record<string, unknown>;
let raw: sqlite3.Database;
const run = (sql: string, params: unknown[] = []) =>
  new Promise<Error | null>((resolve) => raw.run(sql, params, (err) => resolve(err)));
const all = (sql: string, params: unknown[] = []) =>
  new Promise<Row[]>((resolve, reject) =>
    raw.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as Row[]))),
  );

let analyst: Actor;
const cases: { table: string; id: number; tamper: Row; uniqueKey?: string[] }[] = [];

beforeAll(async () => {
  if (process.env.NODEWRIGHT_TEST_POSTGRES_URL) return; // PostgreSQL: refuse-rewriting-baselines-on-postgres.test.ts
  const rows = await makeBaselineRows();
  analyst = rows.analyst;
  const t = rows.tampered;
  cases.push(
    { table: 'revisions', ...t.revisions, uniqueKey: ['memo_id', 'letter'] },
    { table: 'attachments', ...t.attachments },
    { table: 'audit_events', ...t.audit_events },
    {
      table: 'memo_versions',
      id: t.memo_versions.id,
      tamper: { content_json: '{"type":"doc","content":[]}', ...t.memo_versions.tamper },
      uniqueKey: ['memo_id', 'version_number'],
    },
    { table: 'signatures', ...t.signatures },
    { table: 'memo_version_labels', ...t.memo_version_labels },
  );
  raw = new sqlite3.Database(parseDatabaseUrl().storage!);
  await run('PRAGMA foreign_keys = ON');
});

afterAll(async () => {
  if (raw) await new Promise((resolve) => raw.close(resolve));
});

describe.skipIf(process.env.NODEWRIGHT_TEST_POSTGRES_URL)('baseline tables refuse every rewrite by direct SQL', () => {
  it('recursive_triggers is off on this connection (the case REPLACE used to slip through)', async () => {
    expect(await all('PRAGMA recursive_triggers')).toEqual([{ recursive_triggers: 0 }]);
  });

  it.each(['revisions', 'attachments', 'audit_events', 'memo_versions', 'signatures', 'memo_version_labels'])(
    '%s',
    async (table) => {
      const c = cases.find((x) => x.table === table)!;
      const [before] = await all(`SELECT * FROM ${table} WHERE id = ?`, [c.id]);
      const count = async () => (await all(`SELECT COUNT(*) AS n FROM ${table}`))[0].n;
      const rowsBefore = await count();
      const changed = { ...before, ...c.tamper };
      const cols = Object.keys(changed);
      const values = cols.map((k) => changed[k]);
      const marks = cols.map(() => '?').join(', ');
      const [setCol] = Object.keys(c.tamper);
      const withoutId = cols.filter((k) => k !== 'id');

      const attempts: [string, string, unknown[]][] = [
        ['UPDATE', `UPDATE ${table} SET ${setCol} = ? WHERE id = ?`, [c.tamper[setCol], c.id]],
        ['DELETE', `DELETE FROM ${table} WHERE id = ?`, [c.id]],
        [
          'INSERT OR REPLACE (same id)',
          `INSERT OR REPLACE INTO ${table} (${cols.join(', ')}) VALUES (${marks})`,
          values,
        ],
        ['REPLACE INTO (same id)', `REPLACE INTO ${table} (${cols.join(', ')}) VALUES (${marks})`, values],
        [
          'INSERT … ON CONFLICT DO UPDATE',
          `INSERT INTO ${table} (${cols.join(', ')}) VALUES (${marks}) ON CONFLICT DO UPDATE SET ${setCol} = excluded.${setCol}`,
          values,
        ],
      ];
      if (c.uniqueKey) {
        // A new id but the same unique key: REPLACE would delete the old row to make room.
        attempts.push([
          'REPLACE INTO (same unique key, new id)',
          `REPLACE INTO ${table} (${withoutId.join(', ')}) VALUES (${withoutId.map(() => '?').join(', ')})`,
          withoutId.map((k) => changed[k]),
        ]);
      }
      for (const [what, sql, params] of attempts) {
        const err = await run(sql, params);
        expect(err?.message, `${what} on ${table}`).toMatch(new RegExp(`${table} rows are immutable`));
        expect((await all(`SELECT * FROM ${table} WHERE id = ?`, [c.id]))[0], `${what} left the row unchanged`).toEqual(
          before,
        );
      }
      expect(await count()).toBe(rowsBefore);
    },
  );

  it('the orbit data messages a revision carries (migration 20261202133000) are guarded with the rest of its row', async () => {
    const memo = await makeMemo(analyst, { title: 'Revision with orbit messages' });
    const cm = await makeUser('config-manager');
    const opm = 'CCSDS_OPM_VERS = 2.0\n';
    const revision = await makeFrozenRevision(memo.id, cm, {
      orbitMessages: {
        opmKvn: opm,
        opmSha256: crypto.createHash('sha256').update(opm).digest('hex'),
        oemKvn: 'CCSDS_OEM_VERS = 2.0\n',
        oemSha256: '1'.repeat(64),
      },
    });
    const [before] = await all('SELECT * FROM revisions WHERE id = ?', [revision.id]);
    expect(before.opm_kvn).toBe(opm);
    const forged = 'CCSDS_OPM_VERS = 2.0\nX = 1 [km]\n';
    const cols = Object.keys(before);
    const changed = {
      ...before,
      opm_kvn: forged,
      opm_sha256: crypto.createHash('sha256').update(forged).digest('hex'),
    };
    for (const [what, sql, params] of [
      [
        'UPDATE opm_kvn',
        'UPDATE revisions SET opm_kvn = ?, opm_sha256 = ? WHERE id = ?',
        [forged, changed.opm_sha256, revision.id],
      ],
      ['UPDATE oem_kvn to NULL', 'UPDATE revisions SET oem_kvn = NULL WHERE id = ?', [revision.id]],
      [
        'REPLACE INTO with another OPM',
        `REPLACE INTO revisions (${cols.join(', ')}) VALUES (${cols.map(() => '?').join(', ')})`,
        cols.map((k) => (changed as Row)[k]),
      ],
    ] as [string, string, unknown[]][]) {
      expect((await run(sql, params))?.message, what).toMatch(/revisions rows are immutable/);
    }
    expect((await all('SELECT * FROM revisions WHERE id = ?', [revision.id]))[0]).toEqual(before);
  });

  it('ordinary inserts still pass, and a memo with saved versions can be neither deleted nor replaced', async () => {
    const memo = await makeMemo(analyst, { title: 'Another memo' });
    expect(await MemoVersion.count({ where: { memoId: memo.id } })).toBe(1);
    expect((await run('DELETE FROM memos WHERE id = ?', [memo.id]))?.message).toMatch(
      /memo_versions rows are immutable/,
    );
    const [row] = await all('SELECT * FROM memos WHERE id = ?', [memo.id]);
    expect(
      (
        await run(
          'REPLACE INTO memos (id, document_number, title, status, content_json, version, owner_id, created_at, updated_at, review_round) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)',
          [memo.id, row.document_number, 'Replaced', 'draft', '{}', 1, analyst.id, row.created_at, row.updated_at, 0],
        )
      )?.message,
    ).toMatch(/memo_versions rows are immutable/);
    expect((await all('SELECT * FROM memos WHERE id = ?', [memo.id]))[0]).toEqual(row);
  });
});
