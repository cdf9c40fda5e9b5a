import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import type { OutboxMessage } from './outbox-message';

/** One attachment of a received message, with its SHA-256. */
export class OutboxAttachment extends Model<
  InferAttributes<OutboxAttachment>,
  InferCreationAttributes<OutboxAttachment>
> {
  declare id: CreationOptional<number>;
  declare messageId: ForeignKey<OutboxMessage['id']>;
  declare filename: string | null;
  declare contentType: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare content: Buffer;

  static initModel(sequelize: Sequelize): typeof OutboxAttachment {
    OutboxAttachment.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        messageId: { type: DataTypes.INTEGER, allowNull: false, field: 'message_id' },
        filename: { type: DataTypes.STRING(300), allowNull: true },
        contentType: { type: DataTypes.STRING(200), allowNull: false, field: 'content_type' },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false, field: 'size_bytes' },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        content: { type: DataTypes.BLOB, allowNull: false },
      },
      { sequelize, tableName: 'outbox_attachments', modelName: 'OutboxAttachment', timestamps: false },
    );
    return OutboxAttachment;
  }
}
