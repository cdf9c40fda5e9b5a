import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { DeliveryStatus } from './delivery';
import type { Memo } from './memo';
import type { User } from './user';

export type AccountMessagePurpose = 'invitation' | 'password-reset';

/**
 * An invitation or password-reset message to one account, with its SMTP
 * outcome; failed ones are retried with doubling waits like deliveries, each
 * attempt with a fresh link that voids the older unused ones.
 */
export class AccountMessage extends Model<InferAttributes<AccountMessage>, InferCreationAttributes<AccountMessage>> {
  declare id: CreationOptional<number>;
  declare purpose: AccountMessagePurpose;
  declare userId: ForeignKey<User['id']>;
  declare memoId: ForeignKey<Memo['id']> | null;
  declare requestedBy: ForeignKey<User['id']> | null;
  declare status: DeliveryStatus;
  declare attempts: CreationOptional<number>;
  declare lastAttemptAt: Date | null;
  declare deliveredAt: Date | null;
  declare lastError: string | null;
  declare nextAttemptAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof AccountMessage {
    AccountMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        purpose: { type: DataTypes.STRING(20), allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        memoId: { type: DataTypes.INTEGER, allowNull: true, field: 'memo_id' },
        requestedBy: { type: DataTypes.INTEGER, allowNull: true, field: 'requested_by' },
        status: { type: DataTypes.STRING(16), allowNull: false },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastAttemptAt: { type: DataTypes.DATE, allowNull: true, field: 'last_attempt_at' },
        deliveredAt: { type: DataTypes.DATE, allowNull: true, field: 'delivered_at' },
        lastError: { type: DataTypes.TEXT, allowNull: true, field: 'last_error' },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: true, field: 'next_attempt_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'account_messages', modelName: 'AccountMessage', updatedAt: false },
    );
    return AccountMessage;
  }
}
