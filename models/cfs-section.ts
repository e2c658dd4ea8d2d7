import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A cold-formed steel C-section or track in one table version: dimensions (in), Fy (ksi), properties (in², in³, in⁴, in⁶), weight (lb/ft). */
export class CfsSectionRow extends Model<InferAttributes<CfsSectionRow>, InferCreationAttributes<CfsSectionRow>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare name: string;
  declare style: "S" | "T";
  declare depth: number;
  declare flange: number;
  declare lip: number;
  declare mils: number;
  declare t: number;
  declare R: number;
  declare Fy: number;
  declare A: number;
  declare Ix: number;
  declare Sx: number;
  declare Iy: number;
  declare Sxe: number;
  declare Ixe: number;
  declare J: number;
  declare Cw: number;
  declare weightPlf: number;
  declare source: string;
}

const real = { type: DataTypes.DOUBLE, allowNull: false };

export function initCfsSection(sequelize: Sequelize): void {
  CfsSectionRow.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      name: { type: DataTypes.STRING(40), allowNull: false },
      style: { type: DataTypes.STRING(1), allowNull: false },
      depth: { ...real, field: "depth_in" },
      flange: { ...real, field: "flange_in" },
      lip: { ...real, field: "lip_in" },
      mils: { type: DataTypes.INTEGER, allowNull: false },
      t: { ...real, field: "t_in" },
      R: { ...real, field: "r_in" },
      Fy: { ...real, field: "fy_ksi" },
      A: { ...real, field: "a_in2" },
      Ix: { ...real, field: "ix_in4" },
      Sx: { ...real, field: "sx_in3" },
      Iy: { ...real, field: "iy_in4" },
      Sxe: { ...real, field: "sxe_in3" },
      Ixe: { ...real, field: "ixe_in4" },
      J: { ...real, field: "j_in4" },
      Cw: { ...real, field: "cw_in6" },
      weightPlf: { ...real, field: "weight_plf" },
      source: { type: DataTypes.TEXT, allowNull: false },
    },
    { sequelize, tableName: "cfs_sections", underscored: true, timestamps: false },
  );
}
