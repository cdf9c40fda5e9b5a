import { DataTypes, type QueryInterface, type ModelAttributes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/**
 * Notifications of review transitions besides those of threads: a
 * notification may point at no comment (submitted, changes requested,
 * approved, frozen, released), carries the note it reports, and the state
 * of the e-mail that tells the same by mail (retried like a delivery).
 * SQLite cannot drop NOT NULL from a column, so the table is rebuilt and
 * its rows copied. Each person's choice of which kinds they want by e-mail
 * is kept in notification_settings (a missing row means "yes").
 */

const BASE = {
  id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
  user_id: {
    type: DataTypes.INTEGER,
    allowNull: false,
    references: { model: 'users', key: 'id' },
    onDelete: 'CASCADE',
  },
  memo_id: {
    type: DataTypes.INTEGER,
    allowNull: false,
    references: { model: 'memos', key: 'id' },
    onDelete: 'CASCADE',
  },
  actor_id: {
    type: DataTypes.INTEGER,
    allowNull: false,
    references: { model: 'users', key: 'id' },
    onDelete: 'RESTRICT',
  },
  kind: { type: DataTypes.STRING(20), allowNull: false },
  read_at: { type: DataTypes.DATE, allowNull: true },
  created_at: { type: DataTypes.DATE, allowNull: false },
} satisfies ModelAttributes;
const BASE_COLUMNS = ['id', 'user_id', 'memo_id', 'comment_id', 'actor_id', 'kind', 'read_at', 'created_at'].join(', ');

async function rebuildNotifications(
  queryInterface: QueryInterface,
  attributes: ModelAttributes,
  keep: string,
): Promise<void> {
  await queryInterface.createTable('notifications_rebuilt', attributes);
  await queryInterface.sequelize.query(
    `INSERT INTO notifications_rebuilt (${BASE_COLUMNS}) SELECT ${BASE_COLUMNS} FROM notifications WHERE ${keep}`,
  );
  await queryInterface.dropTable('notifications');
  await queryInterface.renameTable('notifications_rebuilt', 'notifications');
  await queryInterface.addIndex('notifications', ['user_id', 'read_at']);
  await queryInterface.addIndex('notifications', ['user_id', 'memo_id']);
}

export const up: Migration = async ({ context: { queryInterface } }) => {
  await rebuildNotifications(
    queryInterface,
    {
      ...BASE,
      comment_id: {
        type: DataTypes.INTEGER,
        allowNull: true,
        references: { model: 'comments', key: 'id' },
        onDelete: 'CASCADE',
      },
      note: { type: DataTypes.TEXT, allowNull: true },
      revision_letter: { type: DataTypes.STRING(8), allowNull: true },
      mail_status: { type: DataTypes.STRING(10), allowNull: true },
      mail_attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      mail_error: { type: DataTypes.TEXT, allowNull: true },
      mail_last_attempt_at: { type: DataTypes.DATE, allowNull: true },
      mail_next_attempt_at: { type: DataTypes.DATE, allowNull: true },
      mail_sent_at: { type: DataTypes.DATE, allowNull: true },
    },
    '1 = 1',
  );
  await queryInterface.addIndex('notifications', ['mail_status', 'mail_next_attempt_at']);
  await queryInterface.createTable('notification_settings', {
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      primaryKey: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    kind: { type: DataTypes.STRING(20), allowNull: false, primaryKey: true },
    email: { type: DataTypes.BOOLEAN, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('notification_settings');
  await rebuildNotifications(
    queryInterface,
    {
      ...BASE,
      comment_id: {
        type: DataTypes.INTEGER,
        allowNull: false,
        references: { model: 'comments', key: 'id' },
        onDelete: 'CASCADE',
      },
    },
    'comment_id IS NOT NULL',
  );
};
