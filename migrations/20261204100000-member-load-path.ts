import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// The load path of a job: where a member sits on the member carrying it (`bearing`: which of its supports,
// and where on the carrier), and two new kinds of member, posts and footings, whose inputs are not the
// sizing flow's (`support_design`; their `flow_state` is empty).

const OLD_KINDS = ["floor-joist", "header", "beam", "deck-joist", "deck-beam", "rafter"];

export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  // ALTER TYPE … ADD VALUE may not share a transaction with statements that use the new value
  await sequelize.query(`ALTER TYPE "enum_members_kind" ADD VALUE IF NOT EXISTS 'post'`);
  await sequelize.query(`ALTER TYPE "enum_members_kind" ADD VALUE IF NOT EXISTS 'footing'`);
  await sequelize.transaction(async (transaction) => {
    await queryInterface.addColumn("members", "bearing", { type: DataTypes.JSONB, allowNull: true }, { transaction });
    await queryInterface.addColumn("members", "support_design", { type: DataTypes.JSONB, allowNull: true }, { transaction });
    await queryInterface.changeColumn("members", "flow_state", { type: DataTypes.JSONB, allowNull: true }, { transaction });
  });
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    // posts and footings cannot exist without their kinds: the members that sat on them keep their own answers
    await sequelize.query(
      `UPDATE members SET carried_by_member_id = NULL WHERE carried_by_member_id IN (SELECT id FROM members WHERE kind IN ('post', 'footing'))`,
      { transaction },
    );
    await sequelize.query(`DELETE FROM members WHERE kind IN ('post', 'footing')`, { transaction });
    await queryInterface.changeColumn("members", "flow_state", { type: DataTypes.JSONB, allowNull: false }, { transaction });
    await queryInterface.removeColumn("members", "support_design", { transaction });
    await queryInterface.removeColumn("members", "bearing", { transaction });
    await sequelize.query(`ALTER TABLE members ALTER COLUMN kind TYPE text`, { transaction });
    await sequelize.query(`DROP TYPE "enum_members_kind"`, { transaction });
    await sequelize.query(`CREATE TYPE "enum_members_kind" AS ENUM (${OLD_KINDS.map((k) => `'${k}'`).join(", ")})`, { transaction });
    await sequelize.query(`ALTER TABLE members ALTER COLUMN kind TYPE "enum_members_kind" USING kind::"enum_members_kind"`, { transaction });
  });
}
