import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { connectDatabase } from '@/lib/db/connection';
import { createMigrator } from '@/lib/db/migrate';

async function tableNames(): Promise<string[]> {
  const sequelize = await connectDatabase();
  const [rows] = await sequelize.query("SELECT name FROM sqlite_master WHERE type='table' AND name NOT LIKE 'sqlite_%' ORDER BY name");
  return (rows as { name: string }[]).map((r) => r.name);
}

async function triggerNames(): Promise<string[]> {
  const sequelize = await connectDatabase();
  const [rows] = await sequelize.query("SELECT name FROM sqlite_master WHERE type='trigger' ORDER BY name");
  return (rows as { name: string }[]).map((r) => r.name);
}

/** The triggers that keep baselines from being rewritten (see migrations 20261201232000 and 20261202101000). */
const BASELINE_TRIGGERS = [
  'attachments_refuse_delete', 'attachments_refuse_replace', 'attachments_refuse_update',
  'audit_events_refuse_delete', 'audit_events_refuse_replace', 'audit_events_refuse_update',
  'memo_versions_refuse_delete', 'memo_versions_refuse_replace', 'memo_versions_refuse_update',
  'revisions_refuse_delete', 'revisions_refuse_replace', 'revisions_refuse_update',
  'signatures_refuse_delete', 'signatures_refuse_replace', 'signatures_refuse_update',
];

describe('migrations', () => {
  it('run up from an empty database, then all the way down again, then up again', async () => {
    const sequelize = await connectDatabase();
    const migrator = createMigrator(sequelize);
    expect(await tableNames()).toEqual([]);

    const applied = await migrator.up();
    expect(applied.length).toBeGreaterThanOrEqual(3);
    expect(applied.map((m) => m.name)).toEqual([...applied.map((m) => m.name)].sort());
    for (const m of applied) expect(m.name).toMatch(/^\d{14}-[a-z0-9-]+$/);
    expect(await tableNames()).toEqual(expect.arrayContaining(['users', 'memos', 'memo_versions', 'memo_reviewers', 'memo_co_authors', 'comments', 'notifications', 'notification_settings', 'distribution_contacts', 'releases', 'deliveries', 'access_tokens', 'outbox_messages', 'outbox_attachments', 'rate_limit_counters', 'auth_sessions', 'account_messages', 'signatures', 'schema_migrations']));
    expect(await migrator.pending()).toEqual([]);
    expect(await triggerNames()).toEqual(expect.arrayContaining(BASELINE_TRIGGERS));

    await migrator.down({ to: 0 });
    expect(await tableNames()).toEqual(['schema_migrations']);
    expect(await triggerNames()).toEqual([]);

    const again = await migrator.up();
    expect(again.length).toBe(applied.length);
    expect(await triggerNames()).toEqual(expect.arrayContaining(BASELINE_TRIGGERS));

    // Down to (and including) the baseline triggers' migration, and up again.
    await migrator.down({ to: '20261202101000-refuse-rewriting-baselines' });
    expect(await triggerNames()).not.toContain('memo_versions_refuse_replace');
    await migrator.up();
    expect(await triggerNames()).toEqual(expect.arrayContaining(BASELINE_TRIGGERS));
  });

  it('switches on foreign keys and WAL', async () => {
    const sequelize = await connectDatabase();
    const [fk] = await sequelize.query<{ foreign_keys: number }>('PRAGMA foreign_keys', { type: QueryTypes.SELECT });
    const [wal] = await sequelize.query<{ journal_mode: string }>('PRAGMA journal_mode', { type: QueryTypes.SELECT });
    expect(fk.foreign_keys).toBe(1);
    expect(wal.journal_mode).toBe('wal');
  });
});
