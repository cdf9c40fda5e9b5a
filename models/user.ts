import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { ROLES, type Role } from '@/lib/auth/roles';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare role: Role;
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof User {
    User.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: false, field: 'password_hash' },
        role: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [ROLES as unknown as string[]] } },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
      },
      { sequelize, tableName: 'users', modelName: 'User' },
    );
    return User;
  }
}
