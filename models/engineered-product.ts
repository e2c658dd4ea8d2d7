import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { EngineeredKind, EngineeredSizeRule } from "@/lib/tables/types";

/** An engineered lumber product (LVL, PSL, glulam) in one table version: psi, in, lb/ft³. */
export class EngineeredProductRow extends Model<InferAttributes<EngineeredProductRow>, InferCreationAttributes<EngineeredProductRow>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare name: string;
  declare kind: EngineeredKind;
  declare Fb: number;
  /** glulam Fbx− of unbalanced layups; null = same as Fb */
  declare FbNeg: number | null;
  declare Fv: number;
  declare FcPerp: number;
  declare E: number;
  declare Emin: number;
  declare sizeRule: EngineeredSizeRule;
  declare widths: number[];
  declare depths: number[];
  declare density: number;
  declare note: string;
  declare source: string;
}

export function initEngineeredProduct(sequelize: Sequelize): void {
  EngineeredProductRow.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      name: { type: DataTypes.STRING(80), allowNull: false },
      kind: { type: DataTypes.STRING(10), allowNull: false },
      Fb: { type: DataTypes.DOUBLE, allowNull: false, field: "fb_psi" },
      FbNeg: { type: DataTypes.DOUBLE, allowNull: true, field: "fb_neg_psi" },
      Fv: { type: DataTypes.DOUBLE, allowNull: false, field: "fv_psi" },
      FcPerp: { type: DataTypes.DOUBLE, allowNull: false, field: "fc_perp_psi" },
      E: { type: DataTypes.DOUBLE, allowNull: false, field: "e_psi" },
      Emin: { type: DataTypes.DOUBLE, allowNull: false, field: "emin_psi" },
      sizeRule: { type: DataTypes.JSONB, allowNull: false, field: "size_rule" },
      widths: { type: DataTypes.ARRAY(DataTypes.DOUBLE), allowNull: false, field: "widths_in" },
      depths: { type: DataTypes.ARRAY(DataTypes.DOUBLE), allowNull: false, field: "depths_in" },
      density: { type: DataTypes.DOUBLE, allowNull: false, field: "density_pcf" },
      note: { type: DataTypes.TEXT, allowNull: false },
      source: { type: DataTypes.TEXT, allowNull: false },
    },
    { sequelize, tableName: "engineered_products", underscored: true, timestamps: false },
  );
}
