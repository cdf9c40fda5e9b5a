import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import type { WorkflowNotificationKind } from '@/lib/notifications/notification-kinds';
import type { User } from './user';

/** One person's choice whether a kind of workflow notification also comes by e-mail; no row means it does. */
export class NotificationSetting extends Model<
  InferAttributes<NotificationSetting>,
  InferCreationAttributes<NotificationSetting>
> {
  declare userId: ForeignKey<User['id']>;
  declare kind: WorkflowNotificationKind;
  declare email: boolean;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof NotificationSetting {
    NotificationSetting.init(
      {
        userId: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, field: 'user_id' },
        kind: { type: DataTypes.STRING(20), allowNull: false, primaryKey: true },
        email: { type: DataTypes.BOOLEAN, allowNull: false },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'notification_settings', modelName: 'NotificationSetting', createdAt: false },
    );
    return NotificationSetting;
  }
}
