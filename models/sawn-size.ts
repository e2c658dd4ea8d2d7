import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SawnSizeClass } from "@/lib/tables/types";

/** A dressed sawn size in one table version (inches, in², in³, in⁴). Rows are never updated. */
export class SawnSizeRow extends Model<InferAttributes<SawnSizeRow>, InferCreationAttributes<SawnSizeRow>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare name: string;
  declare nominalThickness: number;
  declare nominalDepth: number;
  declare b: number;
  declare d: number;
  declare A: number;
  declare Sx: number;
  declare Ix: number;
  declare sizeClass: SawnSizeClass;
}

export function initSawnSize(sequelize: Sequelize): void {
  SawnSizeRow.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      name: { type: DataTypes.STRING(20), allowNull: false },
      nominalThickness: { type: DataTypes.DOUBLE, allowNull: false, field: "nominal_thickness_in" },
      nominalDepth: { type: DataTypes.DOUBLE, allowNull: false, field: "nominal_depth_in" },
      b: { type: DataTypes.DOUBLE, allowNull: false, field: "b_in" },
      d: { type: DataTypes.DOUBLE, allowNull: false, field: "d_in" },
      A: { type: DataTypes.DOUBLE, allowNull: false, field: "area_in2" },
      Sx: { type: DataTypes.DOUBLE, allowNull: false, field: "sx_in3" },
      Ix: { type: DataTypes.DOUBLE, allowNull: false, field: "ix_in4" },
      sizeClass: { type: DataTypes.STRING(20), allowNull: false, field: "size_class" },
    },
    { sequelize, tableName: "sawn_sizes", underscored: true, timestamps: false },
  );
}
