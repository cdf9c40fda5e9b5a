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
import type { User } from './user';

/** A file stored with a memo (images in its text); never changed after upload. */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare filename: string;
  declare contentType: string;
  declare byteSize: number;
  declare sha256: string;
  declare data: Buffer;
  declare uploadedBy: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Attachment {
    Attachment.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        filename: { type: DataTypes.STRING(255), allowNull: false },
        contentType: { type: DataTypes.STRING(100), allowNull: false, field: 'content_type' },
        byteSize: { type: DataTypes.INTEGER, allowNull: false, field: 'byte_size' },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        data: { type: DataTypes.BLOB, allowNull: false },
        uploadedBy: { type: DataTypes.INTEGER, allowNull: false, field: 'uploaded_by' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'attachments', modelName: 'Attachment', updatedAt: false },
    );
    return Attachment;
  }
}
