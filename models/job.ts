import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { Member } from "./member";

/**
 * A job: one site (a house, an addition, a deck) holding the members sized for it. Owned by one
 * account; nobody else reads or changes it. `deletedAt` marks a job deleted (kept for Undo).
 */
export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
  declare id: CreationOptional<string>;
  declare ownerId: ForeignKey<string>;
  declare name: string;
  declare siteAddress: CreationOptional<string>;
  declare notes: CreationOptional<string>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare members?: NonAttribute<Member[]>;
}

export function initJob(sequelize: Sequelize): void {
  Job.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      ownerId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      siteAddress: { type: DataTypes.STRING(240), allowNull: false, defaultValue: "" },
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "jobs", underscored: true },
  );
}
