import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/**
 * Names given to saved versions ("Checkpoint: before review"): memo, version
 * number, the name, who gave it and when. A version is renamed by adding a
 * newer row; the newest row of a version is its name. Nothing in
 * memo_versions changes: a name is a fact about a version, kept beside it.
 *
 * The rows are insert-only like the baselines (the history of names is part
 * of what happened to a memo): on SQLite, triggers refuse UPDATE, DELETE and
 * any insert whose id names an existing row (REPLACE deletes the old row
 * without firing DELETE triggers unless recursive_triggers is on,
 * https://www.sqlite.org/lang_conflict.html); on PostgreSQL, the trigger
 * function of 20261202134000 (`nodewright_refuse_baseline_change`, which
 * names the table it fires on) refuses UPDATE and DELETE per row and
 * TRUNCATE per statement (TRUNCATE fires no row triggers, PostgreSQL 15
 * documentation, SQL Commands, TRUNCATE). Error text on both:
 * "memo_version_labels rows are immutable".
 */
const TABLE = 'memo_version_labels';
const refuse = `SELECT RAISE(ABORT, '${TABLE} rows are immutable');`;

export const up: Migration = async ({ context: { queryInterface, sequelize } }) => {
  await queryInterface.createTable(TABLE, {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'RESTRICT',
    },
    version_number: { type: DataTypes.INTEGER, allowNull: false },
    label: { type: DataTypes.STRING(80), allowNull: false },
    author_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex(TABLE, ['memo_id', 'version_number']);
  if (sequelize.getDialect() === 'postgres') {
    for (const [what, when] of [
      ['update', 'BEFORE UPDATE ON memo_version_labels FOR EACH ROW'],
      ['delete', 'BEFORE DELETE ON memo_version_labels FOR EACH ROW'],
      ['truncate', 'BEFORE TRUNCATE ON memo_version_labels FOR EACH STATEMENT'],
    ])
      await sequelize.query(
        `CREATE TRIGGER ${TABLE}_refuse_${what} ${when} EXECUTE FUNCTION nodewright_refuse_baseline_change();`,
      );
    return;
  }
  if (sequelize.getDialect() !== 'sqlite') return;
  await sequelize.query(
    `CREATE TRIGGER ${TABLE}_refuse_replace BEFORE INSERT ON ${TABLE} WHEN EXISTS (SELECT 1 FROM ${TABLE} WHERE id = NEW.id) BEGIN ${refuse} END;`,
  );
  await sequelize.query(`CREATE TRIGGER ${TABLE}_refuse_update BEFORE UPDATE ON ${TABLE} BEGIN ${refuse} END;`);
  await sequelize.query(`CREATE TRIGGER ${TABLE}_refuse_delete BEFORE DELETE ON ${TABLE} BEGIN ${refuse} END;`);
};

export const down: Migration = async ({ context: { queryInterface, sequelize } }) => {
  if (sequelize.getDialect() === 'sqlite') {
    for (const t of ['replace', 'update', 'delete'])
      await sequelize.query(`DROP TRIGGER IF EXISTS ${TABLE}_refuse_${t};`);
  }
  if (sequelize.getDialect() === 'postgres') {
    for (const t of ['truncate', 'delete', 'update'])
      await sequelize.query(`DROP TRIGGER IF EXISTS ${TABLE}_refuse_${t} ON ${TABLE};`);
  }
  await queryInterface.dropTable(TABLE);
};
