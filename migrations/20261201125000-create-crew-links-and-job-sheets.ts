import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// Crew links (token hash for lookup, sealed token for the owner, revocation and expiry) and job sheets (a
// frozen JSON snapshot per sheet). A sheet outlives its job: deleting the job leaves job_id null.
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.createTable(
      "crew_links",
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
        job_id: { type: DataTypes.UUID, allowNull: false, references: { model: "jobs", key: "id" }, onDelete: "CASCADE" },
        owner_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
        token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        token_sealed: { type: DataTypes.STRING(200), allowNull: false },
        label: { type: DataTypes.STRING(80), allowNull: true },
        expires_at: { type: DataTypes.DATE, allowNull: true },
        revoked_at: { type: DataTypes.DATE, allowNull: true },
        last_opened_at: { type: DataTypes.DATE, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false },
        updated_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await queryInterface.addIndex("crew_links", ["job_id", "created_at"], { name: "crew_links_job_id_created_at", transaction });
    await queryInterface.addIndex("crew_links", ["owner_id", "revoked_at"], { name: "crew_links_owner_id_revoked_at", transaction });

    await queryInterface.createTable(
      "job_sheets",
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
        job_id: { type: DataTypes.UUID, allowNull: true, references: { model: "jobs", key: "id" }, onDelete: "SET NULL" },
        owner_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
        title: { type: DataTypes.STRING(200), allowNull: false },
        tables_version_id: { type: DataTypes.STRING(64), allowNull: false },
        snapshot: { type: DataTypes.JSONB, allowNull: false },
        created_at: { type: DataTypes.DATE, allowNull: false },
        updated_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await queryInterface.addIndex("job_sheets", ["owner_id", "created_at"], { name: "job_sheets_owner_id_created_at", transaction });
    await queryInterface.addIndex("job_sheets", ["job_id"], { name: "job_sheets_job_id", transaction });
  });
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.dropTable("job_sheets", { transaction });
    await queryInterface.dropTable("crew_links", { transaction });
  });
}
