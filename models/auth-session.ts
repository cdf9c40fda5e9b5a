import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { User } from './user';

export const SESSION_END_REASONS = [
  'sign-out',
  'password-change',
  'password-reset',
  'signed-out-everywhere',
  'deactivated',
] as const;
export type SessionEndReason = (typeof SESSION_END_REASONS)[number];

/**
 * One signed-in browser. The session JWT carries this row's id (`sid`);
 * a session whose row is ended, or missing, counts as signed out.
 */
export class AuthSession extends Model<InferAttributes<AuthSession>, InferCreationAttributes<AuthSession>> {
  declare id: string;
  declare userId: ForeignKey<User['id']>;
  declare via: 'password' | 'delivery-link';
  declare clientAddress: string | null;
  declare createdAt: CreationOptional<Date>;
  declare endedAt: Date | null;
  declare endedReason: SessionEndReason | null;

  static initModel(sequelize: Sequelize): typeof AuthSession {
    AuthSession.init(
      {
        id: { type: DataTypes.STRING(64), primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
        via: { type: DataTypes.STRING(20), allowNull: false },
        clientAddress: { type: DataTypes.STRING(64), allowNull: true, field: 'client_address' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        endedAt: { type: DataTypes.DATE, allowNull: true, field: 'ended_at' },
        endedReason: { type: DataTypes.STRING(40), allowNull: true, field: 'ended_reason' },
      },
      { sequelize, tableName: 'auth_sessions', modelName: 'AuthSession', updatedAt: false },
    );
    return AuthSession;
  }
}
