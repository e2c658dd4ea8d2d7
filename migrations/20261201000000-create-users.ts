import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.createTable("users", {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    company: { type: DataTypes.STRING(160), allowNull: true },
    role: { type: DataTypes.ENUM("builder", "subscriber", "admin"), allowNull: false, defaultValue: "builder" },
    email_verified_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.dropTable("users", {});
  await queryInterface.sequelize.query('DROP TYPE IF EXISTS "enum_users_role"');
}
