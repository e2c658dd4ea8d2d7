import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// Cold-formed steel C-sections and tracks as a material table of their own: one full copy of the rows per
// table version, like the other row tables (version_id cascades with its version). A version published
// before this table existed holds no rows; the next migration carries the starter sections in.

const real = { type: DataTypes.DOUBLE, allowNull: false };

export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.createTable(
      "cfs_sections",
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
        version_id: { type: DataTypes.UUID, allowNull: false, references: { model: "table_versions", key: "id" }, onDelete: "CASCADE", onUpdate: "CASCADE" },
        name: { type: DataTypes.STRING(40), allowNull: false },
        style: { type: DataTypes.STRING(1), allowNull: false },
        depth_in: real,
        flange_in: real,
        lip_in: real,
        mils: { type: DataTypes.INTEGER, allowNull: false },
        t_in: real,
        r_in: real,
        fy_ksi: real,
        a_in2: real,
        ix_in4: real,
        sx_in3: real,
        iy_in4: real,
        sxe_in3: real,
        ixe_in4: real,
        j_in4: real,
        cw_in6: real,
        weight_plf: real,
        source: { type: DataTypes.TEXT, allowNull: false },
      },
      { transaction },
    );
    await queryInterface.addIndex("cfs_sections", ["version_id", "name"], { unique: true, name: "cfs_sections_version_id_name", transaction });
  });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.dropTable("cfs_sections", {});
}
