import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SawnGrade, SizeFactorRow as SizeFactor } from "@/lib/tables/types";

/** A size factor CF row (NDS Supplement Table 4A, 4B or 4D) in one table version. */
export class SizeFactorRow extends Model<InferAttributes<SizeFactorRow>, InferCreationAttributes<SizeFactorRow>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare tableRef: SizeFactor["table"];
  declare grades: SawnGrade[];
  declare nominalDepth: number;
  /** 0 = any thickness */
  declare nominalThickness: number;
  declare CF_Fb: number;
  declare CF_Ft: number;
  declare CF_Fc: number;
  declare source: string;
}

export function initSizeFactor(sequelize: Sequelize): void {
  SizeFactorRow.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      tableRef: { type: DataTypes.STRING(4), allowNull: false, field: "table_ref" },
      grades: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
      nominalDepth: { type: DataTypes.DOUBLE, allowNull: false, field: "nominal_depth_in" },
      nominalThickness: { type: DataTypes.DOUBLE, allowNull: false, field: "nominal_thickness_in" },
      CF_Fb: { type: DataTypes.DOUBLE, allowNull: false, field: "cf_fb" },
      CF_Ft: { type: DataTypes.DOUBLE, allowNull: false, field: "cf_ft" },
      CF_Fc: { type: DataTypes.DOUBLE, allowNull: false, field: "cf_fc" },
      source: { type: DataTypes.TEXT, allowNull: false },
    },
    { sequelize, tableName: "size_factors", underscored: true, timestamps: false },
  );
}
