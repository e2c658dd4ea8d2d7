import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A webhook event already handled; the event id is the primary key, so a repeat cannot be recorded twice. */
export class StripeEvent extends Model<InferAttributes<StripeEvent>, InferCreationAttributes<StripeEvent>> {
  declare eventId: string;
  declare type: string;
  declare stripeCreatedAt: Date;
  /** What handling did: "applied", "stale" (older than what is stored), "ignored" (a type we do not use). */
  declare outcome: string;
  declare createdAt: CreationOptional<Date>;
}

export function initStripeEvent(sequelize: Sequelize): void {
  StripeEvent.init(
    {
      eventId: { type: DataTypes.STRING(255), primaryKey: true },
      type: { type: DataTypes.STRING(100), allowNull: false },
      stripeCreatedAt: { type: DataTypes.DATE, allowNull: false },
      outcome: { type: DataTypes.STRING(40), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: "stripe_events", underscored: true, updatedAt: false },
  );
}
