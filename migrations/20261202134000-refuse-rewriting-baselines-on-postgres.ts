import type { Migration } from '../lib/db/migrate';

/**
 * Baselines cannot be rewritten on PostgreSQL either: the counterpart of the
 * SQLite triggers of 20261201232000 and 20261202101000, with the same error
 * text ("<table> rows are immutable").
 *
 * One PL/pgSQL trigger function raises the error; per protected table
 *  - BEFORE UPDATE and BEFORE DELETE, FOR EACH ROW: refuse changing or
 *    removing a row. `INSERT … ON CONFLICT DO UPDATE` runs the UPDATE path
 *    and so fires the BEFORE UPDATE trigger (PostgreSQL 15 documentation,
 *    SQL Commands, INSERT, "ON CONFLICT Clause"; and 39.1 "Overview of
 *    Trigger Behavior"). PostgreSQL has no REPLACE that deletes a row
 *    behind its triggers' back, so there is no counterpart of SQLite's
 *    BEFORE INSERT guard.
 *  - BEFORE TRUNCATE, FOR EACH STATEMENT: TRUNCATE removes rows without
 *    firing row-level DELETE triggers (same documentation, SQL Commands,
 *    TRUNCATE: "ON DELETE triggers … will not fire").
 * Plain inserts pass, so copying an installation (`npm run db:copy`) needs
 * nothing switched off. Memos with saved versions cannot be deleted (their
 * ON DELETE CASCADE reaches memo_versions and is refused), as on SQLite.
 *
 * Tables: revisions (content, numbers and PDF bytes), attachments (the
 * images a revision shows), audit_events and memo_versions.
 */
const TABLES = ['revisions', 'attachments', 'audit_events', 'memo_versions'];

export const up: Migration = async ({ context: { sequelize } }) => {
  if (sequelize.getDialect() !== 'postgres') return;
  await sequelize.query(`
    CREATE FUNCTION nodewright_refuse_baseline_change() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION '% rows are immutable', TG_TABLE_NAME USING ERRCODE = 'integrity_constraint_violation';
    END;
    $$;`);
  for (const table of TABLES) {
    await sequelize.query(
      `CREATE TRIGGER ${table}_refuse_update BEFORE UPDATE ON ${table} FOR EACH ROW EXECUTE FUNCTION nodewright_refuse_baseline_change();`,
    );
    await sequelize.query(
      `CREATE TRIGGER ${table}_refuse_delete BEFORE DELETE ON ${table} FOR EACH ROW EXECUTE FUNCTION nodewright_refuse_baseline_change();`,
    );
    await sequelize.query(
      `CREATE TRIGGER ${table}_refuse_truncate BEFORE TRUNCATE ON ${table} FOR EACH STATEMENT EXECUTE FUNCTION nodewright_refuse_baseline_change();`,
    );
  }
};

export const down: Migration = async ({ context: { sequelize } }) => {
  if (sequelize.getDialect() !== 'postgres') return;
  for (const table of [...TABLES].reverse()) {
    for (const what of ['truncate', 'delete', 'update'])
      await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_refuse_${what} ON ${table};`);
  }
  await sequelize.query('DROP FUNCTION IF EXISTS nodewright_refuse_baseline_change();');
};
