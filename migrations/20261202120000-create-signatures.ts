import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/**
 * Electronic signatures: who signed (user id, the printed name and the role
 * at the moment of signing, so a later rename or role change does not
 * rewrite them), what the signature means, when (UTC), and what was signed
 * (memo, its version and review round; the revision letter for a freeze).
 * Written in the transaction of the transition it signs.
 *
 * Like the baselines of 20261202101000 the rows are insert-only: SQLite
 * triggers refuse UPDATE, DELETE and any insert whose id names an existing
 * row (INSERT OR REPLACE / REPLACE INTO delete the old row without firing
 * DELETE triggers unless recursive_triggers is on,
 * https://www.sqlite.org/lang_conflict.html), with the same error text,
 * "signatures rows are immutable". On PostgreSQL, as 20261202134000 does
 * for the older baselines (which runs after this one, so this migration
 * brings its own trigger function): BEFORE UPDATE and BEFORE DELETE per
 * row, BEFORE TRUNCATE per statement (TRUNCATE fires no row triggers,
 * PostgreSQL 15 documentation, SQL Commands, TRUNCATE).
 */
const refuse = `SELECT RAISE(ABORT, 'signatures rows are immutable');`;

export const up: Migration = async ({ context: { queryInterface, sequelize } }) => {
  await queryInterface.createTable('signatures', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'RESTRICT',
    },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    printed_name: { type: DataTypes.STRING(200), allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false },
    action: { type: DataTypes.STRING(20), allowNull: false },
    meaning: { type: DataTypes.STRING(200), allowNull: false },
    memo_version: { type: DataTypes.INTEGER, allowNull: false },
    review_round: { type: DataTypes.INTEGER, allowNull: false },
    revision_letter: { type: DataTypes.STRING(8), allowNull: true },
    signed_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('signatures', ['memo_id', 'review_round']);
  if (sequelize.getDialect() === 'postgres') {
    await sequelize.query(`
      CREATE FUNCTION nodewright_refuse_signature_change() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        RAISE EXCEPTION 'signatures rows are immutable' USING ERRCODE = 'integrity_constraint_violation';
      END;
      $$;`);
    await sequelize.query(
      'CREATE TRIGGER signatures_refuse_update BEFORE UPDATE ON signatures FOR EACH ROW EXECUTE FUNCTION nodewright_refuse_signature_change();',
    );
    await sequelize.query(
      'CREATE TRIGGER signatures_refuse_delete BEFORE DELETE ON signatures FOR EACH ROW EXECUTE FUNCTION nodewright_refuse_signature_change();',
    );
    await sequelize.query(
      'CREATE TRIGGER signatures_refuse_truncate BEFORE TRUNCATE ON signatures FOR EACH STATEMENT EXECUTE FUNCTION nodewright_refuse_signature_change();',
    );
    return;
  }
  if (sequelize.getDialect() !== 'sqlite') return;
  await sequelize.query(
    `CREATE TRIGGER signatures_refuse_replace BEFORE INSERT ON signatures WHEN EXISTS (SELECT 1 FROM signatures WHERE id = NEW.id) BEGIN ${refuse} END;`,
  );
  await sequelize.query(`CREATE TRIGGER signatures_refuse_update BEFORE UPDATE ON signatures BEGIN ${refuse} END;`);
  await sequelize.query(`CREATE TRIGGER signatures_refuse_delete BEFORE DELETE ON signatures BEGIN ${refuse} END;`);
};

export const down: Migration = async ({ context: { queryInterface, sequelize } }) => {
  if (sequelize.getDialect() === 'sqlite') {
    for (const t of ['replace', 'update', 'delete'])
      await sequelize.query(`DROP TRIGGER IF EXISTS signatures_refuse_${t};`);
  }
  if (sequelize.getDialect() === 'postgres') {
    for (const t of ['truncate', 'delete', 'update'])
      await sequelize.query(`DROP TRIGGER IF EXISTS signatures_refuse_${t} ON signatures;`);
  }
  await queryInterface.dropTable('signatures');
  if (sequelize.getDialect() === 'postgres')
    await sequelize.query('DROP FUNCTION IF EXISTS nodewright_refuse_signature_change();');
};
