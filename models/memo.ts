import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import { MEMO_STATUSES, type MemoStatus } from '@/lib/memos/memo-status';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import type { User } from './user';

export class Memo extends Model<InferAttributes<Memo>, InferCreationAttributes<Memo>> {
  declare id: CreationOptional<number>;
  declare documentNumber: string;
  declare title: string;
  declare status: CreationOptional<MemoStatus>;
  declare content: TiptapDoc;
  /** Optimistic-concurrency counter: the number of the latest saved MemoVersion. */
  declare version: CreationOptional<number>;
  declare ownerId: ForeignKey<User['id']>;
  /** Incremented at each submission for review; decisions belong to a round. */
  declare reviewRound: CreationOptional<number>;
  declare submittedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Memo {
    Memo.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        documentNumber: { type: DataTypes.STRING(64), allowNull: false, unique: true, field: 'document_number' },
        title: { type: DataTypes.STRING(300), allowNull: false },
        status: {
          type: DataTypes.STRING(20),
          allowNull: false,
          defaultValue: 'draft',
          validate: { isIn: [MEMO_STATUSES as unknown as string[]] },
        },
        content: { type: DataTypes.JSON, allowNull: false, field: 'content_json' },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        ownerId: { type: DataTypes.INTEGER, allowNull: false, field: 'owner_id' },
        reviewRound: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'review_round' },
        submittedAt: { type: DataTypes.DATE, allowNull: true, field: 'submitted_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'memos', modelName: 'Memo' },
    );
    return Memo;
  }
}
