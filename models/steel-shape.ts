import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/**
 * A hot-rolled W-shape in one table version, with the properties the AISC 360 checks read
 * (lb/ft, in, in², in³, in⁴, in⁶). Rows are never updated.
 */
export class SteelShapeRow extends Model<InferAttributes<SteelShapeRow>, InferCreationAttributes<SteelShapeRow>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare name: string;
  declare W: number;
  declare A: number;
  declare d: number;
  declare tw: number;
  declare bf: number;
  declare tf: number;
  declare kdes: number;
  declare Ix: number;
  declare Zx: number;
  declare Sx: number;
  declare rx: number;
  declare Iy: number;
  declare Zy: number;
  declare Sy: number;
  declare ry: number;
  declare J: number;
  declare Cw: number;
  declare rts: number;
  declare ho: number;
  declare bf_2tf: number;
  declare h_tw: number;
  declare source: string;
}

export function initSteelShape(sequelize: Sequelize): void {
  SteelShapeRow.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      name: { type: DataTypes.STRING(20), allowNull: false },
      W: { type: DataTypes.DOUBLE, allowNull: false, field: "w_plf" },
      A: { type: DataTypes.DOUBLE, allowNull: false, field: "area_in2" },
      d: { type: DataTypes.DOUBLE, allowNull: false, field: "d_in" },
      tw: { type: DataTypes.DOUBLE, allowNull: false, field: "tw_in" },
      bf: { type: DataTypes.DOUBLE, allowNull: false, field: "bf_in" },
      tf: { type: DataTypes.DOUBLE, allowNull: false, field: "tf_in" },
      kdes: { type: DataTypes.DOUBLE, allowNull: false, field: "kdes_in" },
      Ix: { type: DataTypes.DOUBLE, allowNull: false, field: "ix_in4" },
      Zx: { type: DataTypes.DOUBLE, allowNull: false, field: "zx_in3" },
      Sx: { type: DataTypes.DOUBLE, allowNull: false, field: "sx_in3" },
      rx: { type: DataTypes.DOUBLE, allowNull: false, field: "rx_in" },
      Iy: { type: DataTypes.DOUBLE, allowNull: false, field: "iy_in4" },
      Zy: { type: DataTypes.DOUBLE, allowNull: false, field: "zy_in3" },
      Sy: { type: DataTypes.DOUBLE, allowNull: false, field: "sy_in3" },
      ry: { type: DataTypes.DOUBLE, allowNull: false, field: "ry_in" },
      J: { type: DataTypes.DOUBLE, allowNull: false, field: "j_in4" },
      Cw: { type: DataTypes.DOUBLE, allowNull: false, field: "cw_in6" },
      rts: { type: DataTypes.DOUBLE, allowNull: false, field: "rts_in" },
      ho: { type: DataTypes.DOUBLE, allowNull: false, field: "ho_in" },
      bf_2tf: { type: DataTypes.DOUBLE, allowNull: false, field: "bf_2tf" },
      h_tw: { type: DataTypes.DOUBLE, allowNull: false, field: "h_tw" },
      source: { type: DataTypes.TEXT, allowNull: false },
    },
    { sequelize, tableName: "steel_shapes", underscored: true, timestamps: false },
  );
}
