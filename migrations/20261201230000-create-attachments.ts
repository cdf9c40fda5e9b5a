import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('attachments', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'CASCADE',
    },
    filename: { type: DataTypes.STRING(255), allowNull: false },
    content_type: { type: DataTypes.STRING(100), allowNull: false },
    byte_size: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    data: { type: DataTypes.BLOB, allowNull: false },
    uploaded_by: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('attachments', ['memo_id']);
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('attachments');
};
