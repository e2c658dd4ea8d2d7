import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

/** The yard's cost per foot of one stock item (US dollars) in one table version. */
export class CostRowModel extends Model<InferAttributes<CostRowModel>, InferCreationAttributes<CostRowModel>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  /** see itemKey in lib/tables */
  declare itemKey: string;
  declare costPerFt: number;
}

export function initCost(sequelize: Sequelize): void {
  CostRowModel.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      itemKey: { type: DataTypes.STRING(200), allowNull: false, field: "item_key" },
      costPerFt: { type: DataTypes.DOUBLE, allowNull: false, field: "cost_per_ft_usd" },
    },
    { sequelize, tableName: "material_costs", underscored: true, timestamps: false },
  );
}
