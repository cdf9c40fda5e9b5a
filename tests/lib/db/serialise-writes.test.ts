import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, db, Memo, MemoVersion } from '@/models';
import { getSequelize } from '@/lib/db/connection';
import { mayWrite, writeQueueOf } from '@/lib/db/serialise-writes';
import { WriteQueue } from '@/lib/db/write-queue';
import { ApiError } from '@/lib/api/errors';
import { saveMemo } from '@/lib/memos/save-memo';
import { recordAudit } from '@/lib/audit/record-audit';
import type { Actor } from '@/lib/auth/permissions';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';

/*
 * What is checked: the behaviour of the in-process write queue on a real
 * SQLite file in WAL mode (each test file has its own, tests/support/
 * temp-database.ts). Before the queue, five or more write transactions at
 * once filled libuv's four threadpool threads with SQLite busy waits while
 * the lock holder waited for a thread: SQLITE_BUSY for most of them. No
 * timing is asserted here (bench:load prints the figures); the tests check
 * outcomes and ordering.
 */

const doc = (text: string): TiptapDoc => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text }] }],
});
const gate = () => {
  let open!: () => void;
  const opened = new Promise<void>((resolve) => (open = resolve));
  return { opened, open };
};
const withinSeconds = <T>(p: Promise<T>, s: number, what: string) =>
  Promise.race([
    p,
    new Promise<never>((_, reject) =>
      setTimeout(() => reject(new Error(`${what} did not finish within ${s} s`)), s * 1000),
    ),
  ]);

let analysts: Actor[];

beforeAll(async () => {
  await freshDatabase();
  analysts = [];
  for (let i = 0; i < 5; i++) analysts.push(await makeUser('analyst', `Analyst ${i}`));
});

describe.skipIf(process.env.NODEWRIGHT_TEST_POSTGRES_URL)('write queue on SQLite', () => {
  it('50 concurrent saves of 50 different memos, with 50 autocommit audit writes among them, all succeed', async () => {
    const memos = [];
    for (let i = 0; i < 50; i++)
      memos.push(await makeMemo(analysts[i % analysts.length], { title: `Concurrent ${i}` }));
    const auditBefore = await AuditEvent.count();

    const outcomes = await Promise.allSettled([
      ...memos.map((m, i) =>
        saveMemo(analysts[i % analysts.length], m.id, { content: doc(`text of memo ${i}`), baseVersion: 1 }),
      ),
      ...memos.map((m, i) =>
        recordAudit({ actor: analysts[0], action: 'pdf.download', memoId: m.id, details: { n: i } }),
      ),
    ]);

    const failures = outcomes
      .filter((o) => o.status === 'rejected')
      .map((o) => String((o as PromiseRejectedResult).reason));
    expect(failures).toEqual([]);
    for (const [i, m] of memos.entries()) {
      const row = await Memo.findByPk(m.id, { rejectOnEmpty: true });
      expect(row.version).toBe(2);
      const v2 = await MemoVersion.findOne({ where: { memoId: m.id, versionNumber: 2 }, rejectOnEmpty: true });
      expect(v2.content).toEqual(doc(`text of memo ${i}`));
    }
    // Each save writes one audit event, and 50 more were written outside transactions.
    expect((await AuditEvent.count()) - auditBefore).toBe(100);
  });

  it('a reader outside the queue reads the last committed state while a write transaction is open', async () => {
    const memo = await makeMemo(analysts[0], { title: 'Before' });
    const sequelize = await db();
    const inTransaction = gate();
    const readFinished = gate();

    const writer = sequelize.transaction(async (transaction) => {
      await Memo.update({ title: 'Uncommitted' }, { where: { id: memo.id }, transaction });
      inTransaction.open();
      // The transaction stays open until the reader is done: if reads queued
      // behind writes, this would wait for itself and time out.
      await withinSeconds(readFinished.opened, 10, 'the read during an open write transaction');
    });
    await inTransaction.opened;
    const titleSeenByReader = (await Memo.findByPk(memo.id, { rejectOnEmpty: true })).title;
    readFinished.open();
    await writer;

    expect(titleSeenByReader).toBe('Before');
    expect((await Memo.findByPk(memo.id, { rejectOnEmpty: true })).title).toBe('Uncommitted');
  });

  it('an autocommit write waits for the open transaction, then runs (first come, first served)', async () => {
    const memo = await makeMemo(analysts[0]);
    const sequelize = await db();
    const order: string[] = [];
    const inTransaction = gate();
    const release = gate();
    const writer = sequelize.transaction(async (transaction) => {
      await Memo.update({ title: 'Written in the transaction' }, { where: { id: memo.id }, transaction });
      inTransaction.open();
      await release.opened;
      order.push('transaction body done');
    });
    await inTransaction.opened;
    const single = Memo.update({ title: 'Written afterwards' }, { where: { id: memo.id } }).then(() =>
      order.push('autocommit write done'),
    );
    await new Promise((r) => setTimeout(r, 50));
    expect(writeQueueOf(sequelize)?.waiting).toBe(1);
    release.open();
    await Promise.all([writer, single]);
    expect(order).toEqual(['transaction body done', 'autocommit write done']);
    expect((await Memo.findByPk(memo.id, { rejectOnEmpty: true })).title).toBe('Written afterwards');
  });

  it('refuses, at once and with the fix in the message, a transaction inside a transaction and a write that forgets { transaction }', async () => {
    const memo = await makeMemo(analysts[0], { title: 'Unchanged' });
    const sequelize = await db();
    const nested = sequelize.transaction(async () => {
      await sequelize.transaction(async () => undefined);
    });
    await expect(withinSeconds(nested, 10, 'nested transaction')).rejects.toThrow(
      /inside another transaction.*Pass the outer one/,
    );
    const forgot = sequelize.transaction(async () => {
      await Memo.update({ title: 'Changed' }, { where: { id: memo.id } });
    });
    await expect(withinSeconds(forgot, 10, 'write without its transaction')).rejects.toThrow(
      /did not pass \{ transaction \}/,
    );
    expect((await Memo.findByPk(memo.id, { rejectOnEmpty: true })).title).toBe('Unchanged');
    // A savepoint in the caller's own transaction is fine.
    await sequelize.transaction(async (transaction) => {
      await sequelize.transaction({ transaction }, async (inner) =>
        Memo.update({ title: 'Savepoint' }, { where: { id: memo.id }, transaction: inner }),
      );
    });
    expect((await Memo.findByPk(memo.id, { rejectOnEmpty: true })).title).toBe('Savepoint');
  });

  it('an unmanaged transaction holds the queue until it commits or rolls back', async () => {
    const memo = await makeMemo(analysts[0], { title: 'Unmanaged' });
    const sequelize = getSequelize();
    const t = await sequelize.transaction();
    await Memo.update({ title: 'Rolled back' }, { where: { id: memo.id }, transaction: t });
    const waiting = Memo.update({ title: 'After the rollback' }, { where: { id: memo.id } });
    await new Promise((r) => setTimeout(r, 50));
    expect(writeQueueOf(sequelize)?.waiting).toBe(1);
    await t.rollback();
    await waiting;
    expect((await Memo.findByPk(memo.id, { rejectOnEmpty: true })).title).toBe('After the rollback');
    const t2 = await sequelize.transaction();
    await Memo.update({ title: 'Committed' }, { where: { id: memo.id }, transaction: t2 });
    await t2.commit();
    await Memo.update({ title: 'Queue free again' }, { where: { id: memo.id } });
    expect((await Memo.findByPk(memo.id, { rejectOnEmpty: true })).title).toBe('Queue free again');
  });

  it('transactions share one connection that stays open, and a rolled-back one leaves nothing behind on it', async () => {
    const memo = await makeMemo(analysts[0], { title: 'Kept' });
    const sequelize = await db();
    const connections = new Set<unknown>();
    for (let i = 0; i < 3; i++)
      await sequelize.transaction(
        async (t) => void connections.add((t as unknown as { connection: unknown }).connection),
      );
    expect(connections.size).toBe(1);
    const failing = sequelize.transaction(async (transaction) => {
      await Memo.update({ title: 'Rolled back' }, { where: { id: memo.id }, transaction });
      throw new Error('refused half-way');
    });
    await expect(failing).rejects.toThrow('refused half-way');
    await sequelize.transaction(async (transaction) => {
      connections.add((transaction as unknown as { connection: unknown }).connection);
      expect((await Memo.findByPk(memo.id, { transaction, rejectOnEmpty: true })).title).toBe('Kept');
    });
    expect(connections.size).toBe(1);
    expect((await Memo.findByPk(memo.id, { rejectOnEmpty: true })).title).toBe('Kept');
  });

  it('a write that waits past its limit gets a 503 naming the wait, and the queue goes on', async () => {
    const queue = new WriteQueue();
    const first = await queue.acquire(1000, () => new Error('not expected'));
    const late = queue.acquire(30, (ms) => new ApiError('unavailable', `waited ${Math.round(ms)} ms`));
    await expect(late).rejects.toMatchObject({ status: 503 });
    const next = queue.acquire(1000, () => new Error('not expected'));
    first();
    first(); // a second release is ignored
    (await next)();
    expect(queue.waiting).toBe(0);
  });
});

describe('mayWrite', () => {
  it.each([
    ['SELECT * FROM memos', false],
    ['  /* c */ select 1', false],
    ['EXPLAIN QUERY PLAN SELECT 1', false],
    ['PRAGMA foreign_keys', false],
    ['PRAGMA TABLE_INFO(`memos`);', false],
    ['PRAGMA journal_mode=WAL;', true],
    ['INSERT INTO memos VALUES (1)', true],
    ['UPDATE memos SET title = 1', true],
    ['DELETE FROM memos', true],
    ['REPLACE INTO memos VALUES (1)', true],
    ['WITH x AS (SELECT 1) INSERT INTO t SELECT * FROM x', true],
    ['CREATE TABLE t (a)', true],
    ['', true],
  ])('%j → %s', (sql, expected) => {
    expect(mayWrite(sql)).toBe(expected);
  });
});
