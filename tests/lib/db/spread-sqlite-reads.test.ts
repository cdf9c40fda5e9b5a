/**
 * lib/db/spread-sqlite-reads.ts on the test's SQLite file (WAL mode):
 * SELECTs outside a transaction go to the reader connections in turn, and
 * each sees every committed write at once (SQLite, "Write-Ahead Logging":
 * a reader sees the database as of the last commit before its read began);
 * writes and transactions keep their own connections. SQLite only: on
 * PostgreSQL the pool is left as it is.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { db, Memo } from '@/models';
import { getSequelize } from '@/lib/db/connection';
import { sqliteReadConnections } from '@/lib/db/spread-sqlite-reads';
import type { Actor } from '@/lib/auth/permissions';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';

const sqlite = !(process.env.DATABASE_URL ?? '').startsWith('postgres');
const connectionsOpen = () =>
  Object.keys(
    (getSequelize() as unknown as { connectionManager: { connections: object } }).connectionManager.connections,
  );
let owner: Actor;

beforeAll(async () => {
  await freshDatabase();
  owner = await makeUser('analyst');
});

describe.skipIf(!sqlite)('SQLite reads spread over reader connections', () => {
  it('opens the configured number of readers, besides the default and the writer', async () => {
    const sequelize = await db();
    for (let i = 0; i < 6; i++) await sequelize.query('SELECT 1 AS one', { type: QueryTypes.SELECT });
    expect(sqliteReadConnections()).toBe(3);
    expect(
      connectionsOpen()
        .filter((k) => k.startsWith('nodewright-reader-'))
        .sort(),
    ).toEqual(['nodewright-reader-0', 'nodewright-reader-1', 'nodewright-reader-2']);
  });

  it('every reader sees a write as soon as it is committed, inside or outside a transaction', async () => {
    const sequelize = await db();
    for (let round = 0; round < 3; round++) {
      const memo = await makeMemo(owner, { title: `Seen at once ${round}` });
      for (let r = 0; r < 3; r++) expect((await Memo.findByPk(memo.id))?.title).toBe(`Seen at once ${round}`);
      await sequelize.transaction(async (transaction) => {
        await Memo.update({ title: `Renamed ${round}` }, { where: { id: memo.id }, transaction });
      });
      for (let r = 0; r < 3; r++) expect((await Memo.findByPk(memo.id))?.title).toBe(`Renamed ${round}`);
      await Memo.update({ title: `Outside ${round}` }, { where: { id: memo.id } });
      for (let r = 0; r < 3; r++) expect((await Memo.findByPk(memo.id))?.title).toBe(`Outside ${round}`);
    }
  });

  it('a read outside a transaction sees the last commit, not the open transaction’s change, and does not wait for it', async () => {
    const sequelize = await db();
    const memo = await makeMemo(owner, { title: 'Before' });
    const readDuring: (string | undefined)[] = [];
    await sequelize.transaction(async (transaction) => {
      await Memo.update({ title: 'Uncommitted' }, { where: { id: memo.id }, transaction });
      for (let r = 0; r < 3; r++) readDuring.push((await Memo.findByPk(memo.id))?.title);
      expect((await Memo.findByPk(memo.id, { transaction }))?.title).toBe('Uncommitted');
    });
    expect(readDuring).toEqual(['Before', 'Before', 'Before']);
    expect((await Memo.findByPk(memo.id))?.title).toBe('Uncommitted');
  });
});
