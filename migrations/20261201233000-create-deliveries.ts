import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/**
 * Delivery of frozen revisions to customers: the distribution list of each
 * memo, releases (a revision sent to some contacts with a cover note), one
 * delivery per recipient with its SMTP outcome and tracking times, one-time
 * signed links (stored hashed), and the local outbox where the built-in SMTP
 * server keeps every message it receives.
 */
export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('distribution_contacts', {
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
  await queryInterface.addIndex('distribution_contacts', ['memo_id', 'user_id'], { unique: true });

  await queryInterface.createTable('releases', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'RESTRICT',
    },
    revision_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'revisions', key: 'id' },
      onDelete: 'RESTRICT',
    },
    cover_note: { type: DataTypes.TEXT, allowNull: false },
    released_by: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    released_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('releases', ['revision_id']);

  await queryInterface.createTable('deliveries', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    release_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'releases', key: 'id' },
      onDelete: 'RESTRICT',
    },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'memos', key: 'id' },
      onDelete: 'RESTRICT',
    },
    revision_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'revisions', key: 'id' },
      onDelete: 'RESTRICT',
    },
    recipient_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    recipient_email: { type: DataTypes.STRING(320), allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    last_attempt_at: { type: DataTypes.DATE, allowNull: true },
    delivered_at: { type: DataTypes.DATE, allowNull: true },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    smtp_response: { type: DataTypes.TEXT, allowNull: true },
    smtp_message_id: { type: DataTypes.STRING(300), allowNull: true },
    pdf_attached: { type: DataTypes.BOOLEAN, allowNull: true },
    next_attempt_at: { type: DataTypes.DATE, allowNull: true },
    first_opened_at: { type: DataTypes.DATE, allowNull: true },
    acknowledged_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('deliveries', ['revision_id']);
  await queryInterface.addIndex('deliveries', ['recipient_id']);
  await queryInterface.addIndex('deliveries', ['status', 'next_attempt_at']);

  await queryInterface.createTable('access_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    purpose: { type: DataTypes.STRING(20), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    delivery_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'deliveries', key: 'id' },
      onDelete: 'CASCADE',
    },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.createTable('outbox_messages', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    received_at: { type: DataTypes.DATE, allowNull: false },
    envelope_from: { type: DataTypes.STRING(320), allowNull: true },
    envelope_to: { type: DataTypes.JSON, allowNull: false },
    message_id: { type: DataTypes.STRING(300), allowNull: true },
    subject: { type: DataTypes.STRING(1000), allowNull: true },
    from_text: { type: DataTypes.STRING(1000), allowNull: true },
    to_text: { type: DataTypes.STRING(2000), allowNull: true },
    headers_json: { type: DataTypes.JSON, allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: true },
    html_body: { type: DataTypes.TEXT, allowNull: true },
    raw: { type: DataTypes.BLOB, allowNull: false },
  });
  await queryInterface.addIndex('outbox_messages', ['received_at']);

  await queryInterface.createTable('outbox_attachments', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    message_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'outbox_messages', key: 'id' },
      onDelete: 'CASCADE',
    },
    filename: { type: DataTypes.STRING(300), allowNull: true },
    content_type: { type: DataTypes.STRING(200), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    content: { type: DataTypes.BLOB, allowNull: false },
  });
  await queryInterface.addIndex('outbox_attachments', ['message_id']);
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('outbox_attachments');
  await queryInterface.dropTable('outbox_messages');
  await queryInterface.dropTable('access_tokens');
  await queryInterface.dropTable('deliveries');
  await queryInterface.dropTable('releases');
  await queryInterface.dropTable('distribution_contacts');
};
