import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/**
 * Leases on scheduled work (the mail retry pass): one row per kind of work
 * naming the app instance that runs it and until when. Several instances
 * behind one database take turns through it; a crashed holder's lease runs
 * out and another instance takes the work over (lib/db/claim-work-lease.ts).
 */
export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('work_leases', {
    name: { type: DataTypes.STRING(64), primaryKey: true },
    holder: { type: DataTypes.STRING(200), allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('work_leases');
};
