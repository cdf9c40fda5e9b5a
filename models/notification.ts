import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import {
  NOTIFICATION_KINDS,
  NOTIFICATION_MAIL_STATUSES,
  type NotificationKind,
  type NotificationMailStatus,
} from '@/lib/notifications/notification-kinds';
import type { Comment } from './comment';
import type { Memo } from './memo';
import type { User } from './user';

/**
 * Tells one person that something happened in a review thread or to a memo
 * in review; unread until read_at is set. A workflow notification also
 * carries the state of its e-mail (mail_*), retried like a delivery.
 */
export class Notification extends Model<InferAttributes<Notification>, InferCreationAttributes<Notification>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User['id']>;
  declare memoId: ForeignKey<Memo['id']>;
  /** The comment a thread notification points at; null for a workflow notification. */
  declare commentId: ForeignKey<Comment['id']> | null;
  /** Who wrote, resolved, reopened, submitted, decided, froze or released. */
  declare actorId: ForeignKey<User['id']>;
  declare kind: NotificationKind;
  /** The submit note, the reviewer's note, the change summary or the cover note. */
  declare note: CreationOptional<string | null>;
  declare revisionLetter: CreationOptional<string | null>;
  declare readAt: Date | null;
  declare mailStatus: CreationOptional<NotificationMailStatus | null>;
  declare mailAttempts: CreationOptional<number>;
  declare mailError: CreationOptional<string | null>;
  declare mailLastAttemptAt: CreationOptional<Date | null>;
  declare mailNextAttemptAt: CreationOptional<Date | null>;
  declare mailSentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Notification {
    Notification.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        commentId: { type: DataTypes.INTEGER, allowNull: true, field: 'comment_id' },
        actorId: { type: DataTypes.INTEGER, allowNull: false, field: 'actor_id' },
        kind: {
          type: DataTypes.STRING(20),
          allowNull: false,
          validate: { isIn: [NOTIFICATION_KINDS as unknown as string[]] },
        },
        note: { type: DataTypes.TEXT, allowNull: true },
        revisionLetter: { type: DataTypes.STRING(8), allowNull: true, field: 'revision_letter' },
        readAt: { type: DataTypes.DATE, allowNull: true, field: 'read_at' },
        mailStatus: {
          type: DataTypes.STRING(10),
          allowNull: true,
          field: 'mail_status',
          validate: { isIn: [NOTIFICATION_MAIL_STATUSES as unknown as string[]] },
        },
        mailAttempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'mail_attempts' },
        mailError: { type: DataTypes.TEXT, allowNull: true, field: 'mail_error' },
        mailLastAttemptAt: { type: DataTypes.DATE, allowNull: true, field: 'mail_last_attempt_at' },
        mailNextAttemptAt: { type: DataTypes.DATE, allowNull: true, field: 'mail_next_attempt_at' },
        mailSentAt: { type: DataTypes.DATE, allowNull: true, field: 'mail_sent_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'notifications', modelName: 'Notification', updatedAt: false },
    );
    return Notification;
  }
}
