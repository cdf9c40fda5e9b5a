import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize, type ForeignKey } from 'sequelize';
import { NOTIFICATION_KINDS, type NotificationKind } from '@/lib/comments/comment-status';
import type { Comment } from './comment';
import type { Memo } from './memo';
import type { User } from './user';

/** Tells one person that something happened in a review thread; unread until read_at is set. */
export class Notification extends Model<InferAttributes<Notification>, InferCreationAttributes<Notification>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User['id']>;
  declare memoId: ForeignKey<Memo['id']>;
  declare commentId: ForeignKey<Comment['id']>;
  /** Who wrote, resolved or reopened. */
  declare actorId: ForeignKey<User['id']>;
  declare kind: NotificationKind;
  declare readAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Notification {
    Notification.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        commentId: { type: DataTypes.INTEGER, allowNull: false, field: 'comment_id' },
        actorId: { type: DataTypes.INTEGER, allowNull: false, field: 'actor_id' },
        kind: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [NOTIFICATION_KINDS as unknown as string[]] } },
        readAt: { type: DataTypes.DATE, allowNull: true, field: 'read_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'notifications', modelName: 'Notification', updatedAt: false },
    );
    return Notification;
  }
}
