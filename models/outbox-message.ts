import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A message as the built-in SMTP server received it: envelope, parsed headers and bodies, and the raw RFC 5322 text. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<number>;
  declare receivedAt: Date;
  declare envelopeFrom: string | null;
  declare envelopeTo: string[];
  declare messageId: string | null;
  declare subject: string | null;
  declare fromText: string | null;
  declare toText: string | null;
  declare headers: [string, string][];
  declare textBody: string | null;
  declare htmlBody: string | null;
  declare raw: Buffer;

  static initModel(sequelize: Sequelize): typeof OutboxMessage {
    OutboxMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        receivedAt: { type: DataTypes.DATE, allowNull: false, field: 'received_at' },
        envelopeFrom: { type: DataTypes.STRING(320), allowNull: true, field: 'envelope_from' },
        envelopeTo: { type: DataTypes.JSON, allowNull: false, field: 'envelope_to' },
        messageId: { type: DataTypes.STRING(300), allowNull: true, field: 'message_id' },
        subject: { type: DataTypes.STRING(1000), allowNull: true },
        fromText: { type: DataTypes.STRING(1000), allowNull: true, field: 'from_text' },
        toText: { type: DataTypes.STRING(2000), allowNull: true, field: 'to_text' },
        headers: { type: DataTypes.JSON, allowNull: false, field: 'headers_json' },
        textBody: { type: DataTypes.TEXT, allowNull: true, field: 'text_body' },
        htmlBody: { type: DataTypes.TEXT, allowNull: true, field: 'html_body' },
        raw: { type: DataTypes.BLOB, allowNull: false },
      },
      { sequelize, tableName: 'outbox_messages', modelName: 'OutboxMessage', timestamps: false },
    );
    return OutboxMessage;
  }
}
