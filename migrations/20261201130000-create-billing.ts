import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// Billing: each user's Stripe customer, their subscriptions as last reported by Stripe, and the ids of the
// webhook events already handled (the primary key makes a repeated event a no-op).
export async function up({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.createTable("stripe_customers", {
    user_id: {
      type: DataTypes.UUID,
      primaryKey: true,
      allowNull: false,
      references: { model: "users", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    stripe_customer_id: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.createTable("subscriptions", {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
    user_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: "users", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    stripe_subscription_id: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    stripe_customer_id: { type: DataTypes.STRING(255), allowNull: false },
    stripe_price_id: { type: DataTypes.STRING(255), allowNull: true },
    plan: { type: DataTypes.STRING(20), allowNull: true },
    status: { type: DataTypes.STRING(32), allowNull: false },
    cancel_at_period_end: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    current_period_end: { type: DataTypes.DATE, allowNull: true },
    canceled_at: { type: DataTypes.DATE, allowNull: true },
    ended_at: { type: DataTypes.DATE, allowNull: true },
    stripe_updated_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("subscriptions", ["user_id", "status"], { name: "subscriptions_user_status" });

  await queryInterface.createTable("stripe_events", {
    event_id: { type: DataTypes.STRING(255), primaryKey: true, allowNull: false },
    type: { type: DataTypes.STRING(100), allowNull: false },
    stripe_created_at: { type: DataTypes.DATE, allowNull: false },
    outcome: { type: DataTypes.STRING(40), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.dropTable("stripe_events", {});
  await queryInterface.dropTable("subscriptions", {});
  await queryInterface.dropTable("stripe_customers", {});
}
