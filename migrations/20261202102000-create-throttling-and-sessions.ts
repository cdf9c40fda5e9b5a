import { DataTypes } from 'sequelize';
import type { Migration } from '../lib/db/migrate';

/**
 * Throttling, revocable sessions and retried account messages:
 * - rate_limit_counters: the store of rate-limiter-flexible's limiters (sign-in
 *   failures and password-reset requests per account and per client address),
 *   in the database so every app instance counts against the same limits;
 * - auth_sessions: one row per signed-in browser, named by the session id the
 *   JWT carries, so sign-out, a password change and "sign out everywhere" can
 *   end a session before its token expires;
 * - account_messages: invitation and password-reset mails with their SMTP
 *   outcome, retried with doubling waits like deliveries;
 * - access_tokens.replaced_at: an unused link voided because a newer one was
 *   issued for the same purpose (same delivery, or same account).
 */
export const up: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('rate_limit_counters', {
    key: { type: DataTypes.STRING(255), primaryKey: true },
    points: { type: DataTypes.INTEGER, allowNull: false },
    expires_at_ms: { type: DataTypes.BIGINT, allowNull: true },
  });
  await queryInterface.addIndex('rate_limit_counters', ['expires_at_ms']);

  await queryInterface.createTable('auth_sessions', {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    via: { type: DataTypes.STRING(20), allowNull: false },
    client_address: { type: DataTypes.STRING(64), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    ended_at: { type: DataTypes.DATE, allowNull: true },
    ended_reason: { type: DataTypes.STRING(40), allowNull: true },
  });
  await queryInterface.addIndex('auth_sessions', ['user_id', 'ended_at']);

  await queryInterface.createTable('account_messages', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    purpose: { type: DataTypes.STRING(20), allowNull: false },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    memo_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'memos', key: 'id' },
      onDelete: 'SET NULL',
    },
    requested_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    status: { type: DataTypes.STRING(16), allowNull: false },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    last_attempt_at: { type: DataTypes.DATE, allowNull: true },
    delivered_at: { type: DataTypes.DATE, allowNull: true },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    next_attempt_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('account_messages', ['status', 'next_attempt_at']);

  await queryInterface.addColumn('access_tokens', 'replaced_at', { type: DataTypes.DATE, allowNull: true });
  await queryInterface.addIndex('access_tokens', ['user_id', 'purpose']);
  await queryInterface.addIndex('access_tokens', ['delivery_id']);
};

export const down: Migration = async ({ context: { queryInterface } }) => {
  await queryInterface.removeIndex('access_tokens', ['delivery_id']);
  await queryInterface.removeIndex('access_tokens', ['user_id', 'purpose']);
  await queryInterface.removeColumn('access_tokens', 'replaced_at');
  await queryInterface.dropTable('account_messages');
  await queryInterface.dropTable('auth_sessions');
  await queryInterface.dropTable('rate_limit_counters');
};
