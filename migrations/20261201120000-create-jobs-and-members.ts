import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.createTable(
      "jobs",
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
        owner_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
        name: { type: DataTypes.STRING(120), allowNull: false },
        site_address: { type: DataTypes.STRING(240), allowNull: false, defaultValue: "" },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        deleted_at: { type: DataTypes.DATE, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false },
        updated_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await queryInterface.addIndex("jobs", ["owner_id", "deleted_at"], { name: "jobs_owner_id_deleted_at", transaction });

    await queryInterface.createTable(
      "members",
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
        job_id: { type: DataTypes.UUID, allowNull: false, references: { model: "jobs", key: "id" }, onDelete: "CASCADE" },
        label: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.ENUM("floor-joist", "header", "beam", "deck-joist", "deck-beam", "rafter"), allowNull: false },
        flow_state: { type: DataTypes.JSONB, allowNull: false },
        result_summary: { type: DataTypes.JSONB, allowNull: true },
        chosen_member: { type: DataTypes.JSONB, allowNull: true },
        carried_by_member_id: { type: DataTypes.UUID, allowNull: true, references: { model: "members", key: "id" }, onDelete: "SET NULL" },
        sort_order: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        deleted_at: { type: DataTypes.DATE, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false },
        updated_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await queryInterface.addIndex("members", ["job_id", "sort_order"], { name: "members_job_id_sort_order", transaction });
    await queryInterface.addIndex("members", ["carried_by_member_id"], { name: "members_carried_by_member_id", transaction });
  });
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.dropTable("members", { transaction });
    await queryInterface.sequelize.query('DROP TYPE IF EXISTS "enum_members_kind"', { transaction });
    await queryInterface.dropTable("jobs", { transaction });
  });
}
