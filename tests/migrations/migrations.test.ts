import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { connectDatabase } from '@/lib/db/connection';
import { createMigrator } from '@/lib/db/migrate';

async function tableNames(): Promise<string[]> {
  const sequelize = await connectDatabase();
  const [rows] = await sequelize.query("SELECT name FROM sqlite_master WHERE type='table' AND name NOT LIKE 'sqlite_%' ORDER BY name");
  return (rows as { name: string }[]).map((r) => r.name);
}

describe('migrations', () => {
  it('run up from an empty database, then all the way down again, then up again', async () => {
    const sequelize = await connectDatabase();
    const migrator = createMigrator(sequelize);
    expect(await tableNames()).toEqual([]);

    const applied = await migrator.up();
    expect(applied.length).toBeGreaterThanOrEqual(3);
    expect(applied.map((m) => m.name)).toEqual([...applied.map((m) => m.name)].sort());
    for (const m of applied) expect(m.name).toMatch(/^\d{14}-[a-z0-9-]+$/);
    expect(await tableNames()).toEqual(expect.arrayContaining(['users', 'memos', 'memo_versions', 'memo_reviewers', 'comments', 'notifications', 'distribution_contacts', 'releases', 'deliveries', 'access_tokens', 'outbox_messages', 'outbox_attachments', 'rate_limit_counters', 'auth_sessions', 'account_messages', 'schema_migrations']));
    expect(await migrator.pending()).toEqual([]);

    await migrator.down({ to: 0 });
    expect(await tableNames()).toEqual(['schema_migrations']);

    const again = await migrator.up();
    expect(again.length).toBe(applied.length);
  });

  it('switches on foreign keys and WAL', async () => {
    const sequelize = await connectDatabase();
    const [fk] = await sequelize.query<{ foreign_keys: number }>('PRAGMA foreign_keys', { type: QueryTypes.SELECT });
    const [wal] = await sequelize.query<{ journal_mode: string }>('PRAGMA journal_mode', { type: QueryTypes.SELECT });
    expect(fk.foreign_keys).toBe(1);
    expect(wal.journal_mode).toBe('wal');
  });
});
