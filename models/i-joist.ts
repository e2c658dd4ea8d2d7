import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** A wood I-joist in one table version: published capacities (lbf, lbf-ft), EI (lbf-in²) and K (lbf). */
export class IJoistRow extends Model<InferAttributes<IJoistRow>, InferCreationAttributes<IJoistRow>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare name: string;
  declare series: string;
  declare d: number;
  declare flangeWidth: number;
  declare EI: number;
  declare M: number;
  declare V: number;
  declare IR: number;
  declare ER175: number;
  declare ER175Stiffened: number;
  declare ER4: number;
  declare ER4Stiffened: number;
  declare K: number;
  declare weightPlf: number;
  declare source: string;
}

const real = { type: DataTypes.DOUBLE, allowNull: false };

export function initIJoist(sequelize: Sequelize): void {
  IJoistRow.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      name: { type: DataTypes.STRING(60), allowNull: false },
      series: { type: DataTypes.STRING(40), allowNull: false },
      d: { ...real, field: "d_in" },
      flangeWidth: { ...real, field: "flange_width_in" },
      EI: { ...real, field: "ei_lb_in2" },
      M: { ...real, field: "m_lb_ft" },
      V: { ...real, field: "v_lb" },
      IR: { ...real, field: "ir_lb" },
      ER175: { ...real, field: "er_175_lb" },
      ER175Stiffened: { ...real, field: "er_175_stiff_lb" },
      ER4: { ...real, field: "er_4_lb" },
      ER4Stiffened: { ...real, field: "er_4_stiff_lb" },
      K: { ...real, field: "k_lb" },
      weightPlf: { ...real, field: "weight_plf" },
      source: { type: DataTypes.TEXT, allowNull: false },
    },
    { sequelize, tableName: "i_joists", underscored: true, timestamps: false },
  );
}
