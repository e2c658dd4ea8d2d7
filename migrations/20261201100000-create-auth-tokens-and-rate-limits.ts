import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// Single-use mailed tokens (hash only), PostgreSQL rate-limit counters, and the time a password last
// changed (sessions issued before it stop working).
export async function up({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.createTable("auth_tokens", {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
    user_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: "users", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    purpose: { type: DataTypes.ENUM("verify-email", "reset-password"), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex("auth_tokens", ["user_id", "purpose"], { name: "auth_tokens_user_purpose" });

  await queryInterface.createTable("rate_limits", {
    key: { type: DataTypes.STRING(200), primaryKey: true, allowNull: false },
    window_start: { type: DataTypes.DATE, allowNull: false },
    count: { type: DataTypes.INTEGER, allowNull: false },
  });
  await queryInterface.addIndex("rate_limits", ["window_start"], { name: "rate_limits_window_start" });

  await queryInterface.addColumn("users", "password_changed_at", { type: DataTypes.DATE, allowNull: true });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.removeColumn("users", "password_changed_at");
  await queryInterface.dropTable("rate_limits", {});
  await queryInterface.dropTable("auth_tokens", {});
  await queryInterface.sequelize.query('DROP TYPE IF EXISTS "enum_auth_tokens_purpose"');
}
