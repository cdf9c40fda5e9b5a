import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import type { Memo } from './memo';
import type { User } from './user';

/** One accepted save of a memo: never updated after it is written. */
export class MemoVersion extends Model<InferAttributes<MemoVersion>, InferCreationAttributes<MemoVersion>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare versionNumber: number;
  declare title: string;
  declare content: TiptapDoc;
  declare authorId: ForeignKey<User['id']>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof MemoVersion {
    MemoVersion.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        versionNumber: { type: DataTypes.INTEGER, allowNull: false, field: 'version_number' },
        title: { type: DataTypes.STRING(300), allowNull: false },
        content: { type: DataTypes.JSON, allowNull: false, field: 'content_json' },
        authorId: { type: DataTypes.INTEGER, allowNull: false, field: 'author_id' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'memo_versions', modelName: 'MemoVersion', updatedAt: false },
    );
    return MemoVersion;
  }
}
