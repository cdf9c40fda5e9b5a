import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('memos', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    document_number: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    title: { type: DataTypes.STRING(300), allowNull: false },
    status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
    content_json: { type: DataTypes.JSON, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    owner_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('memos', ['status']);
  await queryInterface.addIndex('memos', ['owner_id']);

  await queryInterface.createTable('memo_versions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'CASCADE',
    },
    version_number: { type: DataTypes.INTEGER, allowNull: false },
    title: { type: DataTypes.STRING(300), allowNull: false },
    content_json: { type: DataTypes.JSON, allowNull: false },
    author_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('memo_versions', ['memo_id', 'version_number'], { unique: true });
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('memo_versions');
  await queryInterface.dropTable('memos');
};
