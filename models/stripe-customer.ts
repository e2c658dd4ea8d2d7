import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** The Stripe customer that stands for a Spanlark user (one each, made at the first checkout). */
export class StripeCustomer extends Model<InferAttributes<StripeCustomer>, InferCreationAttributes<StripeCustomer>> {
  declare userId: string;
  declare stripeCustomerId: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initStripeCustomer(sequelize: Sequelize): void {
  StripeCustomer.init(
    {
      userId: { type: DataTypes.UUID, primaryKey: true },
      stripeCustomerId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "stripe_customers", underscored: true },
  );
}
