import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/**
 * Review decisions, frozen revisions and the audit trail. Frozen revisions
 * and audit events are immutable: the API never changes them, and on SQLite
 * triggers refuse UPDATE and DELETE of their rows as well.
 */
export const up: Migration = async ({ context: { queryInterface, sequelize } }) => {
  await queryInterface.addColumn('memos', 'review_round', {
    type: DataTypes.INTEGER,
    allowNull: false,
    defaultValue: 0,
  });
  await queryInterface.addColumn('memos', 'submitted_at', { type: DataTypes.DATE, allowNull: true });

  await queryInterface.createTable('review_decisions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'CASCADE',
    },
    reviewer_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    round: { type: DataTypes.INTEGER, allowNull: false },
    decision: { type: DataTypes.STRING(20), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('review_decisions', ['memo_id', 'round']);

  await queryInterface.createTable('revisions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'RESTRICT',
    },
    letter: { type: DataTypes.STRING(4), allowNull: false },
    memo_version: { type: DataTypes.INTEGER, allowNull: false },
    document_number: { type: DataTypes.STRING(64), allowNull: false },
    title: { type: DataTypes.STRING(300), allowNull: false },
    content_json: { type: DataTypes.JSON, allowNull: false },
    blocks_json: { type: DataTypes.JSON, allowNull: false },
    engine_version: { type: DataTypes.STRING(64), allowNull: false },
    constants_json: { type: DataTypes.JSON, allowNull: false },
    figures_json: { type: DataTypes.JSON, allowNull: false },
    approval_json: { type: DataTypes.JSON, allowNull: false },
    change_summary: { type: DataTypes.TEXT, allowNull: false },
    pdf_data: { type: DataTypes.BLOB, allowNull: false },
    pdf_sha256: { type: DataTypes.STRING(64), allowNull: false },
    frozen_by: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    frozen_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('revisions', ['memo_id', 'letter'], { unique: true });

  await queryInterface.createTable('audit_events', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    at: { type: DataTypes.DATE, allowNull: false },
    actor_id: { type: DataTypes.INTEGER, allowNull: true },
    actor_email: { type: DataTypes.STRING(320), allowNull: true },
    action: { type: DataTypes.STRING(40), allowNull: false },
    memo_id: { type: DataTypes.INTEGER, allowNull: true },
    revision_letter: { type: DataTypes.STRING(4), allowNull: true },
    details_json: { type: DataTypes.JSON, allowNull: true },
  });
  await queryInterface.addIndex('audit_events', ['at']);
  await queryInterface.addIndex('audit_events', ['memo_id']);
  await queryInterface.addIndex('audit_events', ['action']);

  if (sequelize.getDialect() === 'sqlite') {
    for (const table of ['revisions', 'audit_events']) {
      await sequelize.query(
        `CREATE TRIGGER ${table}_refuse_update BEFORE UPDATE ON ${table} BEGIN SELECT RAISE(ABORT, '${table} rows are immutable'); END;`,
      );
      await sequelize.query(
        `CREATE TRIGGER ${table}_refuse_delete BEFORE DELETE ON ${table} BEGIN SELECT RAISE(ABORT, '${table} rows are immutable'); END;`,
      );
    }
  }
};

export const down: Migration = async ({ context: { queryInterface, sequelize } }) => {
  if (sequelize.getDialect() === 'sqlite') {
    for (const table of ['revisions', 'audit_events']) {
      await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_refuse_update;`);
      await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_refuse_delete;`);
    }
  }
  await queryInterface.dropTable('audit_events');
  await queryInterface.dropTable('revisions');
  await queryInterface.dropTable('review_decisions');
  await queryInterface.removeColumn('memos', 'submitted_at');
  await queryInterface.removeColumn('memos', 'review_round');
};
