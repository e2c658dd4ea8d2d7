import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SheetSnapshot } from "@/lib/sheets/snapshot";

/**
 * A job sheet: the job's members frozen as computed when it was saved (inputs, loads, every check with its
 * ratio, reactions, the diagrams' polynomial pieces), with the material tables version, the date, the
 * company name and the caution. It is written once and never updated: a reprint reads `snapshot` and
 * computes nothing, so it prints the same numbers after the tables or the job change.
 */
export class JobSheet extends Model<InferAttributes<JobSheet>, InferCreationAttributes<JobSheet>> {
  declare id: CreationOptional<string>;
  /** null once the job itself is gone for good; the sheet stays */
  declare jobId: string | null;
  declare ownerId: string;
  declare title: string;
  declare tablesVersionId: string;
  declare snapshot: SheetSnapshot;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initJobSheet(sequelize: Sequelize): void {
  JobSheet.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      jobId: { type: DataTypes.UUID, allowNull: true },
      ownerId: { type: DataTypes.UUID, allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      tablesVersionId: { type: DataTypes.STRING(64), allowNull: false },
      snapshot: { type: DataTypes.JSONB, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: "job_sheets", underscored: true },
  );
}
