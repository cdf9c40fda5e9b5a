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

export type ReviewVerdict = 'approve' | 'request-changes';

/** A reviewer's verdict on one review round of a memo. */
export class ReviewDecision extends Model<InferAttributes<ReviewDecision>, InferCreationAttributes<ReviewDecision>> {
  declare id: CreationOptional<number>;
  declare memoId: ForeignKey<Memo['id']>;
  declare reviewerId: ForeignKey<User['id']>;
  declare round: number;
  declare decision: ReviewVerdict;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof ReviewDecision {
    ReviewDecision.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        memoId: { type: DataTypes.INTEGER, allowNull: false, field: 'memo_id' },
        reviewerId: { type: DataTypes.INTEGER, allowNull: false, field: 'reviewer_id' },
        round: { type: DataTypes.INTEGER, allowNull: false },
        decision: { type: DataTypes.STRING(20), allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: true },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'review_decisions', modelName: 'ReviewDecision', updatedAt: false },
    );
    return ReviewDecision;
  }
}
