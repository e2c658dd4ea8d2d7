import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SawnGrade, SawnSizeClass, Species } from "@/lib/tables/types";

/** Reference design values (psi) of one species, grade and size class in one table version. */
export class SawnValueRow extends Model<InferAttributes<SawnValueRow>, InferCreationAttributes<SawnValueRow>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare species: Species;
  declare grade: SawnGrade;
  declare sizeClass: SawnSizeClass;
  /** only where the table gives values by width; null = every depth */
  declare nominalDepth: number | null;
  declare Fb: number;
  declare Ft: number;
  declare Fv: number;
  declare FcPerp: number;
  declare Fc: number;
  declare E: number;
  declare Emin: number;
  declare G: number;
  declare source: string;
}

export function initSawnValue(sequelize: Sequelize): void {
  SawnValueRow.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      species: { type: DataTypes.STRING(40), allowNull: false },
      grade: { type: DataTypes.STRING(40), allowNull: false },
      sizeClass: { type: DataTypes.STRING(20), allowNull: false, field: "size_class" },
      nominalDepth: { type: DataTypes.DOUBLE, allowNull: true, field: "nominal_depth_in" },
      Fb: { type: DataTypes.DOUBLE, allowNull: false, field: "fb_psi" },
      Ft: { type: DataTypes.DOUBLE, allowNull: false, field: "ft_psi" },
      Fv: { type: DataTypes.DOUBLE, allowNull: false, field: "fv_psi" },
      FcPerp: { type: DataTypes.DOUBLE, allowNull: false, field: "fc_perp_psi" },
      Fc: { type: DataTypes.DOUBLE, allowNull: false, field: "fc_psi" },
      E: { type: DataTypes.DOUBLE, allowNull: false, field: "e_psi" },
      Emin: { type: DataTypes.DOUBLE, allowNull: false, field: "emin_psi" },
      G: { type: DataTypes.DOUBLE, allowNull: false, field: "specific_gravity" },
      source: { type: DataTypes.TEXT, allowNull: false },
    },
    { sequelize, tableName: "sawn_values", underscored: true, timestamps: false },
  );
}
