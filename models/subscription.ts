import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** Stripe's subscription statuses; `active` and `trialing` give access. */
export type SubscriptionStatus = "incomplete" | "incomplete_expired" | "trialing" | "active" | "past_due" | "canceled" | "unpaid" | "paused";

/** A subscription as Stripe last reported it (webhooks or a read from the API). */
export class Subscription extends Model<InferAttributes<Subscription>, InferCreationAttributes<Subscription>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare stripeSubscriptionId: string;
  declare stripeCustomerId: string;
  declare stripePriceId: string | null;
  declare plan: string | null;
  declare status: SubscriptionStatus;
  declare cancelAtPeriodEnd: CreationOptional<boolean>;
  declare currentPeriodEnd: Date | null;
  declare canceledAt: Date | null;
  declare endedAt: Date | null;
  /** When Stripe produced the state stored here (the event's `created`), to ignore older news. */
  declare stripeUpdatedAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initSubscription(sequelize: Sequelize): void {
  Subscription.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      stripeSubscriptionId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
      stripeCustomerId: { type: DataTypes.STRING(255), allowNull: false },
      stripePriceId: { type: DataTypes.STRING(255), allowNull: true },
      plan: { type: DataTypes.STRING(20), allowNull: true },
      status: { type: DataTypes.STRING(32), allowNull: false },
      cancelAtPeriodEnd: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      currentPeriodEnd: { type: DataTypes.DATE, allowNull: true },
      canceledAt: { type: DataTypes.DATE, allowNull: true },
      endedAt: { type: DataTypes.DATE, allowNull: true },
      stripeUpdatedAt: { type: DataTypes.DATE, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "subscriptions", underscored: true },
  );
}
