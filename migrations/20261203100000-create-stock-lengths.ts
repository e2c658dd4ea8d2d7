import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// Stock lengths: the lengths the yard sells each material family in, one row per family per table version
// (copy-on-write like the other material tables). A version without a sawn row orders sawn lumber in the
// default 8 to 24 ft lengths (lib/orders).

export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.createTable(
      "material_stock_lengths",
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
        version_id: { type: DataTypes.UUID, allowNull: false, references: { model: "table_versions", key: "id" }, onDelete: "CASCADE", onUpdate: "CASCADE" },
        material: { type: DataTypes.STRING(20), allowNull: false },
        lengths_ft: { type: DataTypes.ARRAY(DataTypes.DOUBLE), allowNull: false },
      },
      { transaction },
    );
    await sequelize.query('CREATE UNIQUE INDEX "material_stock_lengths_version_key" ON "material_stock_lengths" (version_id, material)', { transaction });
  });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.dropTable("material_stock_lengths", {});
}
