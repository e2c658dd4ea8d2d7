import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

// One row per save of a member that came with an idempotency key (a save queued on a phone with no signal,
// or sent again after its answer was lost): the key is unique per account, so the same save sent twice makes
// one member, and the second send gets the first one's answer back. `request_hash` tells a resend of the same
// save from a different save that reuses a key.

export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await queryInterface.createTable(
      "member_saves",
      {
        owner_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
        idempotency_key: { type: DataTypes.UUID, allowNull: false },
        member_id: { type: DataTypes.UUID, allowNull: false, references: { model: "members", key: "id" }, onDelete: "CASCADE" },
        request_hash: { type: DataTypes.STRING(64), allowNull: false },
        response: { type: DataTypes.JSONB, allowNull: false },
        created_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await queryInterface.addConstraint("member_saves", {
      type: "primary key",
      fields: ["owner_id", "idempotency_key"],
      name: "member_saves_pkey",
      transaction,
    });
    await queryInterface.addIndex("member_saves", ["member_id"], { name: "member_saves_member_id", transaction });
  });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }): Promise<void> {
  await queryInterface.dropTable("member_saves", {});
}
