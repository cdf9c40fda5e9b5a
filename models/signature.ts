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

export type SignedAction = 'approve' | 'request-changes' | 'freeze';

/**
 * One electronic signature: the signer (id, printed name and role as they
 * were when signing), the meaning they signed with, the UTC time, and what
 * was signed (memo version and review round; revision letter for a freeze).
 * Insert-only (migration 20261202120000).
 */
export class Signature extends Model<InferAttributes<Signature>, InferCreationAttributes<Signature>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare userId: ForeignKey<User['id']>;
  declare printedName: string;
  declare role: string;
  declare action: SignedAction;
  declare meaning: string;
  declare memoVersion: number;
  declare reviewRound: number;
  declare revisionLetter: string | null;
  declare signedAt: Date;

  static initModel(sequelize: Sequelize): typeof Signature {
    Signature.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        printedName: { type: DataTypes.STRING(200), allowNull: false, field: 'printed_name' },
        role: { type: DataTypes.STRING(20), allowNull: false },
        action: { type: DataTypes.STRING(20), allowNull: false },
        meaning: { type: DataTypes.STRING(200), allowNull: false },
        memoVersion: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_version' },
        reviewRound: { type: DataTypes.INTEGER, allowNull: false, field: 'review_round' },
        revisionLetter: { type: DataTypes.STRING(8), allowNull: true, field: 'revision_letter' },
        signedAt: { type: DataTypes.DATE, allowNull: false, field: 'signed_at' },
      },
      { sequelize, tableName: 'signatures', modelName: 'Signature', timestamps: false },
    );
    return Signature;
  }
}
