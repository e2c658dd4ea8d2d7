import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// What an order list needs of a member beyond its sizing: the width of floor or deck the joists repeat
// across (to count them), and for members on posts the post height and size and each footing's diameter
// and depth (to count posts and concrete). All optional: without them the order list says what is missing.

const COLUMNS = ["run_width_ft", "post_height_ft", "post_size", "footing_diameter_in", "footing_depth_in"] as const;

export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.addColumn("members", "run_width_ft", { type: DataTypes.DOUBLE, allowNull: true }, { transaction });
    await queryInterface.addColumn("members", "post_height_ft", { type: DataTypes.DOUBLE, allowNull: true }, { transaction });
    await queryInterface.addColumn("members", "post_size", { type: DataTypes.STRING(20), allowNull: true }, { transaction });
    await queryInterface.addColumn("members", "footing_diameter_in", { type: DataTypes.DOUBLE, allowNull: true }, { transaction });
    await queryInterface.addColumn("members", "footing_depth_in", { type: DataTypes.DOUBLE, allowNull: true }, { transaction });
  });
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    for (const column of [...COLUMNS].reverse()) await queryInterface.removeColumn("members", column, { transaction });
  });
}
