import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('memo_reviewers', {
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
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('memo_reviewers', ['memo_id', 'user_id'], { unique: true });
  await queryInterface.addIndex('memo_reviewers', ['user_id']);
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('memo_reviewers');
};
