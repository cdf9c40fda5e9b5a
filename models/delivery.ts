import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import type { Memo } from './memo';
import type { Release } from './release';
import type { Revision } from './revision';
import type { User } from './user';

/** queued: not tried yet · sending: an attempt is running · delivered: the SMTP server accepted it · failed: refused or unreachable (retried). */
export type DeliveryStatus = 'queued' | 'sending' | 'delivered' | 'failed';

/** One recipient of one release: the message's SMTP outcome and what the recipient did with it. */
export class Delivery extends Model<InferAttributes<Delivery>, InferCreationAttributes<Delivery>> {
  declare id: CreationOptional<number>;
  declare releaseId: ForeignKey<Release['id']>;
  declare memoId: ForeignKey<Memo['id']>;
  declare revisionId: ForeignKey<Revision['id']>;
  declare recipientId: ForeignKey<User['id']>;
  declare recipientEmail: string;
  declare status: DeliveryStatus;
  declare attempts: CreationOptional<number>;
  declare lastAttemptAt: Date | null;
  declare deliveredAt: Date | null;
  declare lastError: string | null;
  declare smtpResponse: string | null;
  declare smtpMessageId: string | null;
  declare pdfAttached: boolean | null;
  declare nextAttemptAt: Date | null;
  declare firstOpenedAt: Date | null;
  declare acknowledgedAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Delivery {
    Delivery.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        releaseId: { type: DataTypes.INTEGER, allowNull: false, field: 'release_id' },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        revisionId: { type: DataTypes.INTEGER, allowNull: false, field: 'revision_id' },
        recipientId: { type: DataTypes.INTEGER, allowNull: false, field: 'recipient_id' },
        recipientEmail: { type: DataTypes.STRING(320), allowNull: false, field: 'recipient_email' },
        status: { type: DataTypes.STRING(16), allowNull: false },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastAttemptAt: { type: DataTypes.DATE, allowNull: true, field: 'last_attempt_at' },
        deliveredAt: { type: DataTypes.DATE, allowNull: true, field: 'delivered_at' },
        lastError: { type: DataTypes.TEXT, allowNull: true, field: 'last_error' },
        smtpResponse: { type: DataTypes.TEXT, allowNull: true, field: 'smtp_response' },
        smtpMessageId: { type: DataTypes.STRING(300), allowNull: true, field: 'smtp_message_id' },
        pdfAttached: { type: DataTypes.BOOLEAN, allowNull: true, field: 'pdf_attached' },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: true, field: 'next_attempt_at' },
        firstOpenedAt: { type: DataTypes.DATE, allowNull: true, field: 'first_opened_at' },
        acknowledgedAt: { type: DataTypes.DATE, allowNull: true, field: 'acknowledged_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'deliveries', modelName: 'Delivery', updatedAt: false },
    );
    return Delivery;
  }
}
