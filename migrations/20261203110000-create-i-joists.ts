import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// Wood I-joists as a material table of their own: one full copy of the rows per table version, like the
// other row tables (version_id cascades with its version). A version published before this table existed
// simply holds no I-joist rows.

const real = { type: DataTypes.DOUBLE, allowNull: false };

export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.createTable(
      "i_joists",
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 },
        version_id: { type: DataTypes.UUID, allowNull: false, references: { model: "table_versions", key: "id" }, onDelete: "CASCADE", onUpdate: "CASCADE" },
        name: { type: DataTypes.STRING(60), allowNull: false },
        series: { type: DataTypes.STRING(40), allowNull: false },
        d_in: real,
        flange_width_in: real,
        ei_lb_in2: real,
        m_lb_ft: real,
        v_lb: real,
        ir_lb: real,
        er_175_lb: real,
        er_175_stiff_lb: real,
        er_4_lb: real,
        er_4_stiff_lb: real,
        k_lb: real,
        weight_plf: real,
        source: { type: DataTypes.TEXT, allowNull: false },
      },
      { transaction },
    );
    await queryInterface.addIndex("i_joists", ["version_id", "name"], { unique: true, name: "i_joists_version_id_name", transaction });
  });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.dropTable("i_joists", {});
}
