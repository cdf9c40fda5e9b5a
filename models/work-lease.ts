import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Who runs a kind of scheduled work (`name`) until when; see lib/db/claim-work-lease.ts. */
export class WorkLease extends Model<InferAttributes<WorkLease>, InferCreationAttributes<WorkLease>> {
  declare name: string;
  declare holder: string;
  declare expiresAt: Date;

  static initModel(sequelize: Sequelize): typeof WorkLease {
    WorkLease.init(
      {
        name: { type: DataTypes.STRING(64), primaryKey: true },
        holder: { type: DataTypes.STRING(200), allowNull: false },
        expiresAt: { type: DataTypes.DATE, allowNull: false, field: 'expires_at' },
      },
      { sequelize, tableName: 'work_leases', modelName: 'WorkLease', timestamps: false },
    );
    return WorkLease;
  }
}
