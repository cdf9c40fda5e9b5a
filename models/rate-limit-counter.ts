import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * One counter of a rate limiter (lib/throttle): the points consumed under a
 * key (limiter prefix + account or client address) and when the window or
 * block ends, in milliseconds since the epoch (null: never).
 */
export class RateLimitCounter extends Model<
  InferAttributes<RateLimitCounter>,
  InferCreationAttributes<RateLimitCounter>
> {
  declare key: string;
  declare points: number;
  declare expiresAtMs: number | string | null;

  static initModel(sequelize: Sequelize): typeof RateLimitCounter {
    RateLimitCounter.init(
      {
        key: { type: DataTypes.STRING(255), primaryKey: true },
        points: { type: DataTypes.INTEGER, allowNull: false },
        // BIGINT comes back as a string from PostgreSQL; readers convert with Number().
        expiresAtMs: { type: DataTypes.BIGINT, allowNull: true, field: 'expires_at_ms' },
      },
      { sequelize, tableName: 'rate_limit_counters', modelName: 'RateLimitCounter', timestamps: false },
    );
    return RateLimitCounter;
  }
}
