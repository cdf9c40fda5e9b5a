import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { connectDatabase } from '@/lib/db/connection';
import { createMigrator } from '@/lib/db/migrate';

/*
 * Runs on the dialect the suite runs on: SQLite under `npm test`,
 * PostgreSQL under `npm run test:postgres` (tests/support/temp-database.ts).
 */

const names = async (sql: string): Promise<string[]> => {
  const sequelize = await connectDatabase();
  const rows = await sequelize.query<{ name: string }>(sql, { type: QueryTypes.SELECT });
  return rows.map((r) => r.name).sort();
};
const onPostgres = async () => (await connectDatabase()).getDialect() === 'postgres';

async function tableNames(): Promise<string[]> {
  return (await onPostgres())
    ? names("SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public'")
    : names("SELECT name FROM sqlite_master WHERE type='table' AND name NOT LIKE 'sqlite_%'");
}

async function triggerNames(): Promise<string[]> {
  return (await onPostgres())
    ? names('SELECT tgname AS name FROM pg_trigger WHERE NOT tgisinternal')
    : names("SELECT name FROM sqlite_master WHERE type='trigger'");
}

const BASELINE_TABLES = [
  'attachments',
  'audit_events',
  'memo_versions',
  'revisions',
  'signatures',
  'memo_version_labels',
];
/**
 * The triggers that keep baselines from being rewritten: on SQLite those of
 * migrations 20261201232000 and 20261202101000, on PostgreSQL those of
 * 20261202134000 (no REPLACE there, but TRUNCATE skips row triggers),
 * for signatures those of 20261202120000 and for the names of versions
 * those of 20261202141000 on either dialect.
 */
const baselineTriggers = async () => {
  const kinds = (await onPostgres()) ? ['delete', 'truncate', 'update'] : ['delete', 'replace', 'update'];
  return BASELINE_TABLES.flatMap((t) => kinds.map((what) => `${t}_refuse_${what}`));
};
/** The migration that installs the last of them on this dialect. */
const baselineMigration = async () =>
  (await onPostgres())
    ? '20261202134000-refuse-rewriting-baselines-on-postgres'
    : '20261202101000-refuse-rewriting-baselines';

describe('migrations', () => {
  it('run up from an empty database, then all the way down again, then up again', async () => {
    const sequelize = await connectDatabase();
    const migrator = createMigrator(sequelize);
    expect(await tableNames()).toEqual([]);

    const applied = await migrator.up();
    expect(applied.length).toBeGreaterThanOrEqual(3);
    expect(applied.map((m) => m.name)).toEqual([...applied.map((m) => m.name)].sort());
    for (const m of applied) expect(m.name).toMatch(/^\d{14}-[a-z0-9-]+$/);
    expect(await tableNames()).toEqual(
      expect.arrayContaining([
        'users',
        'memos',
        'memo_versions',
        'memo_reviewers',
        'memo_co_authors',
        'comments',
        'notifications',
        'notification_settings',
        'distribution_contacts',
        'releases',
        'deliveries',
        'access_tokens',
        'outbox_messages',
        'outbox_attachments',
        'rate_limit_counters',
        'auth_sessions',
        'account_messages',
        'work_leases',
        'organisation_settings',
        'signatures',
        'memo_version_labels',
        'schema_migrations',
      ]),
    );
    expect(await migrator.pending()).toEqual([]);
    const BASELINE_TRIGGERS = await baselineTriggers();
    expect(await triggerNames()).toEqual(expect.arrayContaining(BASELINE_TRIGGERS));

    await migrator.down({ to: 0 });
    expect(await tableNames()).toEqual(['schema_migrations']);
    expect(await triggerNames()).toEqual([]);

    const again = await migrator.up();
    expect(again.length).toBe(applied.length);
    expect(await triggerNames()).toEqual(expect.arrayContaining(BASELINE_TRIGGERS));

    // Down to (and including) the baseline triggers' migration, and up again.
    await migrator.down({ to: await baselineMigration() });
    expect(await triggerNames()).not.toContain('memo_versions_refuse_update');
    await migrator.up();
    expect(await triggerNames()).toEqual(expect.arrayContaining(BASELINE_TRIGGERS));
  });

  it('includes the PostgreSQL baseline triggers (a no-op on SQLite)', async () => {
    const migrator = createMigrator(await connectDatabase());
    const names = [...(await migrator.executed()), ...(await migrator.pending())].map((m) => m.name);
    expect(names).toContain('20261202134000-refuse-rewriting-baselines-on-postgres');
  });

  it.skipIf(process.env.NODEWRIGHT_TEST_POSTGRES_URL)(
    '20261202133000 adds the orbit-message columns of revisions in place and takes them away again, keeping the triggers',
    async () => {
      const sequelize = await connectDatabase();
      const migrator = createMigrator(sequelize);
      await migrator.up();
      const columns = async () =>
        (
          (await sequelize.query('PRAGMA table_info(revisions)', { type: QueryTypes.SELECT })) as { name: string }[]
        ).map((c) => c.name);
      expect(await columns()).toEqual(expect.arrayContaining(['opm_kvn', 'opm_sha256', 'oem_kvn', 'oem_sha256']));
      await migrator.down({ to: '20261202133000-store-revision-orbit-messages' });
      expect(await columns()).not.toContain('opm_kvn');
      // The tables that existed before 20261202133000 keep theirs (the names of versions came later).
      const older = (await baselineTriggers()).filter((t) => !t.startsWith('memo_version_labels_'));
      expect(await triggerNames()).toEqual(expect.arrayContaining(older));
      await migrator.up();
      expect(await columns()).toEqual(expect.arrayContaining(['opm_kvn', 'oem_sha256']));
    },
  );

  it('20261202141000 adds the names of saved versions with their triggers and takes them away again', async () => {
    const sequelize = await connectDatabase();
    const migrator = createMigrator(sequelize);
    await migrator.up();
    const own = (await baselineTriggers()).filter((t) => t.startsWith('memo_version_labels_'));
    expect(own).toHaveLength(3);
    await migrator.down({ to: '20261202141000-create-memo-version-labels' });
    expect(await tableNames()).not.toContain('memo_version_labels');
    const left = await triggerNames();
    for (const t of own) expect(left).not.toContain(t);
    expect(left).toContain('memo_versions_refuse_update');
    await migrator.up();
    expect(await tableNames()).toContain('memo_version_labels');
    expect(await triggerNames()).toEqual(expect.arrayContaining(own));
  });

  it.skipIf(process.env.NODEWRIGHT_TEST_POSTGRES_URL)('switches on foreign keys and WAL (SQLite)', async () => {
    const sequelize = await connectDatabase();
    const [fk] = await sequelize.query<{ foreign_keys: number }>('PRAGMA foreign_keys', { type: QueryTypes.SELECT });
    const [wal] = await sequelize.query<{ journal_mode: string }>('PRAGMA journal_mode', { type: QueryTypes.SELECT });
    expect(fk.foreign_keys).toBe(1);
    expect(wal.journal_mode).toBe('wal');
  });
});
