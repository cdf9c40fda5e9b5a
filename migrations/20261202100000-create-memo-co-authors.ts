import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/** Analysts a memo's owner added as co-authors (with the owner, the memo's authors). */
export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('memo_co_authors', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    added_by: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('memo_co_authors', ['memo_id', 'user_id'], { unique: true });
  await queryInterface.addIndex('memo_co_authors', ['user_id']);
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('memo_co_authors');
};
