import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SavedMemberResponse } from "@/lib/offline/answers";

/**
 * The answer given to one save of a member that carried an idempotency key. The key is unique per account
 * (primary key owner + key): a save sent again gets this answer back instead of making a second member.
 */
export class MemberSave extends Model<InferAttributes<MemberSave>, InferCreationAttributes<MemberSave>> {
  declare ownerId: string;
  declare idempotencyKey: string;
  declare memberId: string;
  /** sha-256 of the save's parsed input, hex */
  declare requestHash: string;
  declare response: SavedMemberResponse;
  declare createdAt: Date;
}

export function initMemberSave(sequelize: Sequelize): void {
  MemberSave.init(
    {
      ownerId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
      idempotencyKey: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
      memberId: { type: DataTypes.UUID, allowNull: false },
      requestHash: { type: DataTypes.STRING(64), allowNull: false },
      response: { type: DataTypes.JSONB, allowNull: false },
      createdAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: "member_saves", underscored: true, updatedAt: false },
  );
}
