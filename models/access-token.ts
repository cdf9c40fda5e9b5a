import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
  type ForeignKey,
} from 'sequelize';
import type { Delivery } from './delivery';
import type { User } from './user';

export const TOKEN_PURPOSES = ['delivery', 'invitation', 'password-reset'] as const;
export type TokenPurpose = (typeof TOKEN_PURPOSES)[number];

/** A one-time signed link, kept only as the SHA-256 of the token; used_at marks it spent, replaced_at voided by a newer link. */
export class AccessToken extends Model<InferAttributes<AccessToken>, InferCreationAttributes<AccessToken>> {
  declare id: CreationOptional<number>;
  declare purpose: TokenPurpose;
  declare tokenHash: string;
  declare userId: ForeignKey<User['id']>;
  declare deliveryId: ForeignKey<Delivery['id']> | null;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  /** Set when a newer link for the same delivery or account voided this unused one. */
  declare replacedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof AccessToken {
    AccessToken.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        purpose: { type: DataTypes.STRING(20), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true, field: 'token_hash' },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        deliveryId: { type: DataTypes.INTEGER, allowNull: true, field: 'delivery_id' },
        expiresAt: { type: DataTypes.DATE, allowNull: false, field: 'expires_at' },
        usedAt: { type: DataTypes.DATE, allowNull: true, field: 'used_at' },
        replacedAt: { type: DataTypes.DATE, allowNull: true, field: 'replaced_at' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'access_tokens', modelName: 'AccessToken', updatedAt: false },
    );
    return AccessToken;
  }
}
