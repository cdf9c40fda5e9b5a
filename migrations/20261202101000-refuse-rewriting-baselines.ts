import type { Migration } from '../lib/db/migrate';

/**
 * Baselines cannot be rewritten, not even by SQL typed at the database.
 *
 * The triggers of 20261201232000 refuse UPDATE and DELETE on revisions and
 * audit events, but `INSERT OR REPLACE` / `REPLACE INTO` deletes the
 * conflicting row without firing DELETE triggers unless recursive_triggers
 * is on (https://www.sqlite.org/lang_conflict.html, REPLACE), so it could
 * swap a frozen revision's PDF bytes and SHA-256. A BEFORE INSERT trigger
 * fires before any conflict is resolved: it refuses an insert whose key
 * (primary key or any unique key) names an existing row. That also covers
 * `INSERT … ON CONFLICT DO UPDATE` and holds whatever a connection's PRAGMAs
 * are. In a BEFORE INSERT trigger a rowid still to be assigned reads as -1
 * (SQLite's own test/tkt3832.test; seen here too), so ordinary inserts pass.
 *
 * Protected: revisions (their content, numbers and PDF bytes), attachments
 * (the images a revision's content shows, served from /api/attachments/:id),
 * audit events and memo versions. Memo versions and attachments also refuse
 * UPDATE and DELETE now. Both hang off memos with ON DELETE CASCADE, so a
 * memo can no longer be deleted (nor replaced) once it has a saved version —
 * which is every memo: the app never deletes memos or users (people are
 * deactivated), and revisions already RESTRICT deleting their memo.
 *
 * The error text is the one of the earlier triggers: "<table> rows are
 * immutable". PostgreSQL gets its triggers with the PostgreSQL work.
 */
const PROTECTED: { table: string; uniqueKeys: string[][]; refuseChange: boolean }[] = [
  { table: 'revisions', uniqueKeys: [['memo_id', 'letter']], refuseChange: false },
  { table: 'audit_events', uniqueKeys: [], refuseChange: false },
  { table: 'memo_versions', uniqueKeys: [['memo_id', 'version_number']], refuseChange: true },
  { table: 'attachments', uniqueKeys: [], refuseChange: true },
];

const refuse = (table: string) => `SELECT RAISE(ABORT, '${table} rows are immutable');`;

export const up: Migration = async ({ context: { sequelize } }) => {
  if (sequelize.getDialect() !== 'sqlite') return;
  for (const { table, uniqueKeys, refuseChange } of PROTECTED) {
    const existing = [['id'], ...uniqueKeys].map(
      (cols) => `EXISTS (SELECT 1 FROM ${table} WHERE ${cols.map((c) => `${c} = NEW.${c}`).join(' AND ')})`,
    );
    await sequelize.query(
      `CREATE TRIGGER ${table}_refuse_replace BEFORE INSERT ON ${table} WHEN ${existing.join(' OR ')} BEGIN ${refuse(table)} END;`,
    );
    if (refuseChange) {
      await sequelize.query(
        `CREATE TRIGGER ${table}_refuse_update BEFORE UPDATE ON ${table} BEGIN ${refuse(table)} END;`,
      );
      await sequelize.query(
        `CREATE TRIGGER ${table}_refuse_delete BEFORE DELETE ON ${table} BEGIN ${refuse(table)} END;`,
      );
    }
  }
};

export const down: Migration = async ({ context: { sequelize } }) => {
  if (sequelize.getDialect() !== 'sqlite') return;
  for (const { table, refuseChange } of [...PROTECTED].reverse()) {
    await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_refuse_replace;`);
    if (refuseChange) {
      await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_refuse_update;`);
      await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_refuse_delete;`);
    }
  }
};
