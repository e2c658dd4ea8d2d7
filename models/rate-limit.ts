import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/**
 * One fixed-window counter per key ("sign-in:ip:203.0.113.9"). Kept in PostgreSQL so every server
 * instance counts against the same numbers; lib/auth/rate-limit.ts bumps it with one atomic upsert.
 */
export class RateLimit extends Model<InferAttributes<RateLimit>, InferCreationAttributes<RateLimit>> {
  declare key: string;
  declare windowStart: Date;
  declare count: number;
}

export function initRateLimit(sequelize: Sequelize): void {
  RateLimit.init(
    {
      key: { type: DataTypes.STRING(200), primaryKey: true },
      windowStart: { type: DataTypes.DATE, allowNull: false },
      count: { type: DataTypes.INTEGER, allowNull: false },
    },
    { sequelize, tableName: "rate_limits", underscored: true, timestamps: false },
  );
}
