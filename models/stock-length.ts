import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { StockMaterial } from "@/lib/tables/types";

/** The lengths the yard stocks one material family in (ft), in one table version. */
export class StockLengthModel extends Model<InferAttributes<StockLengthModel>, InferCreationAttributes<StockLengthModel>> {
  declare id: CreationOptional<string>;
  declare versionId: string;
  declare material: StockMaterial;
  declare lengthsFt: number[];
}

export function initStockLength(sequelize: Sequelize): void {
  StockLengthModel.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      versionId: { type: DataTypes.UUID, allowNull: false, field: "version_id" },
      material: { type: DataTypes.STRING(20), allowNull: false, field: "material" },
      lengthsFt: { type: DataTypes.ARRAY(DataTypes.DOUBLE), allowNull: false, field: "lengths_ft" },
    },
    { sequelize, tableName: "material_stock_lengths", underscored: true, timestamps: false },
  );
}
