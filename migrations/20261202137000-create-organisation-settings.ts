import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/**
 * The issuing organisation as the PDF front matter prints it (name on the
 * title page and every page header, the distribution statement). One row,
 * id 1, edited by an administrator (PUT /api/organisation). A frozen
 * revision keeps the PDF it stored, so a later change never alters a baseline.
 */
export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('organisation_settings', {
    id: { type: DataTypes.INTEGER, primaryKey: true },
    name: { type: DataTypes.STRING(200), allowNull: false },
    distribution_statement: { type: DataTypes.TEXT, allowNull: false },
    updated_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('organisation_settings');
};
