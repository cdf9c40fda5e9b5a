import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(200), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('users', ['role']);
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('users');
};
