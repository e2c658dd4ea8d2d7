import { DataTypes, type ModelAttributeColumnOptions } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// Material tables: one row in table_versions per published version, and one row table per material
// table holding a full copy of that table's rows for each version (copy-on-write: a version's rows are
// never updated, a change writes a new version). version_id cascades so a seeder's down can clear them.

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 };
const versionId = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: "table_versions", key: "id" },
  onDelete: "CASCADE",
  onUpdate: "CASCADE",
};
const real = (allowNull = false): ModelAttributeColumnOptions => ({ type: DataTypes.DOUBLE, allowNull });
const text = { type: DataTypes.TEXT, allowNull: false };

const ROW_TABLES = ["sawn_sizes", "sawn_values", "size_factors", "engineered_products", "steel_shapes", "steel_grades", "material_costs"];

export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.createTable(
      "table_versions",
      {
        id,
        number: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        source: { type: DataTypes.ENUM("seed", "edit", "import", "restore"), allowNull: false },
        note: text,
        created_by_id: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: "users", key: "id" },
          onDelete: "SET NULL",
          onUpdate: "CASCADE",
        },
        created_by_email: { type: DataTypes.STRING(254), allowNull: true },
        restored_from_id: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: "table_versions", key: "id" },
          onDelete: "SET NULL",
          onUpdate: "CASCADE",
        },
        summary: { type: DataTypes.JSONB, allowNull: false },
        rows_added: { type: DataTypes.INTEGER, allowNull: false },
        rows_changed: { type: DataTypes.INTEGER, allowNull: false },
        rows_removed: { type: DataTypes.INTEGER, allowNull: false },
        created_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );

    await queryInterface.createTable(
      "sawn_sizes",
      {
        id,
        version_id: versionId,
        name: { type: DataTypes.STRING(20), allowNull: false },
        nominal_thickness_in: real(),
        nominal_depth_in: real(),
        b_in: real(),
        d_in: real(),
        area_in2: real(),
        sx_in3: real(),
        ix_in4: real(),
        size_class: { type: DataTypes.STRING(20), allowNull: false },
      },
      { transaction },
    );

    await queryInterface.createTable(
      "sawn_values",
      {
        id,
        version_id: versionId,
        species: { type: DataTypes.STRING(40), allowNull: false },
        grade: { type: DataTypes.STRING(40), allowNull: false },
        size_class: { type: DataTypes.STRING(20), allowNull: false },
        nominal_depth_in: real(true),
        fb_psi: real(),
        ft_psi: real(),
        fv_psi: real(),
        fc_perp_psi: real(),
        fc_psi: real(),
        e_psi: real(),
        emin_psi: real(),
        specific_gravity: real(),
        source: text,
      },
      { transaction },
    );

    await queryInterface.createTable(
      "size_factors",
      {
        id,
        version_id: versionId,
        table_ref: { type: DataTypes.STRING(4), allowNull: false },
        grades: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
        nominal_depth_in: real(),
        nominal_thickness_in: real(),
        cf_fb: real(),
        cf_ft: real(),
        cf_fc: real(),
        source: text,
      },
      { transaction },
    );

    await queryInterface.createTable(
      "engineered_products",
      {
        id,
        version_id: versionId,
        name: { type: DataTypes.STRING(80), allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        fb_psi: real(),
        fb_neg_psi: real(true),
        fv_psi: real(),
        fc_perp_psi: real(),
        e_psi: real(),
        emin_psi: real(),
        size_rule: { type: DataTypes.JSONB, allowNull: false },
        widths_in: { type: DataTypes.ARRAY(DataTypes.DOUBLE), allowNull: false },
        depths_in: { type: DataTypes.ARRAY(DataTypes.DOUBLE), allowNull: false },
        density_pcf: real(),
        note: text,
        source: text,
      },
      { transaction },
    );

    const shapeColumns = [
      "w_plf",
      "area_in2",
      "d_in",
      "tw_in",
      "bf_in",
      "tf_in",
      "kdes_in",
      "ix_in4",
      "zx_in3",
      "sx_in3",
      "rx_in",
      "iy_in4",
      "zy_in3",
      "sy_in3",
      "ry_in",
      "j_in4",
      "cw_in6",
      "rts_in",
      "ho_in",
      "bf_2tf",
      "h_tw",
    ];
    await queryInterface.createTable(
      "steel_shapes",
      {
        id,
        version_id: versionId,
        name: { type: DataTypes.STRING(20), allowNull: false },
        ...Object.fromEntries(shapeColumns.map((c) => [c, real()])),
        source: text,
      },
      { transaction },
    );

    await queryInterface.createTable(
      "steel_grades",
      { id, version_id: versionId, name: { type: DataTypes.STRING(20), allowNull: false }, fy_ksi: real(), fu_ksi: real() },
      { transaction },
    );

    await queryInterface.createTable(
      "material_costs",
      { id, version_id: versionId, item_key: { type: DataTypes.STRING(200), allowNull: false }, cost_per_ft_usd: real() },
      { transaction },
    );

    // One row per natural key within a version (the key an import matches rows on).
    const unique: [string, string][] = [
      ["sawn_sizes", "(version_id, name)"],
      ["sawn_values", "(version_id, species, grade, size_class, COALESCE(nominal_depth_in, 0))"],
      ["size_factors", "(version_id, table_ref, grades, nominal_depth_in, nominal_thickness_in)"],
      ["engineered_products", "(version_id, name)"],
      ["steel_shapes", "(version_id, name)"],
      ["steel_grades", "(version_id, name)"],
      ["material_costs", "(version_id, item_key)"],
    ];
    for (const [table, columns] of unique) {
      await sequelize.query(`CREATE UNIQUE INDEX "${table}_version_key" ON "${table}" ${columns}`, { transaction });
    }
  });
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    for (const table of ROW_TABLES) await queryInterface.dropTable(table, { transaction });
    await queryInterface.dropTable("table_versions", { transaction });
    await sequelize.query('DROP TYPE IF EXISTS "enum_table_versions_source"', { transaction });
  });
}
