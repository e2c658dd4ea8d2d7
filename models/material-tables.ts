import type { Sequelize } from "sequelize";
import { CfsSectionRow, initCfsSection } from "./cfs-section";
import { CostRowModel, initCost } from "./cost";
import { EngineeredProductRow, initEngineeredProduct } from "./engineered-product";
import { IJoistRow, initIJoist } from "./i-joist";
import { initSawnSize, SawnSizeRow } from "./sawn-size";
import { initSawnValue, SawnValueRow } from "./sawn-value";
import { initSizeFactor, SizeFactorRow } from "./size-factor";
import { initSteelGrade, SteelGradeRow } from "./steel-grade";
import { initSteelShape, SteelShapeRow } from "./steel-shape";
import { initStockLength, StockLengthModel } from "./stock-length";
import { initTableVersion, TableVersion, TABLE_VERSION_SOURCES, type TableVersionSource } from "./table-version";

export {
  CfsSectionRow,
  CostRowModel,
  EngineeredProductRow,
  IJoistRow,
  SawnSizeRow,
  SawnValueRow,
  SizeFactorRow,
  SteelGradeRow,
  SteelShapeRow,
  StockLengthModel,
  TableVersion,
};
export { TABLE_VERSION_SOURCES, type TableVersionSource };

/** The material table models: one version table and one row table per material table. */
export function initMaterialTableModels(sequelize: Sequelize): void {
  initTableVersion(sequelize);
  initSawnSize(sequelize);
  initSawnValue(sequelize);
  initSizeFactor(sequelize);
  initEngineeredProduct(sequelize);
  initIJoist(sequelize);
  initSteelShape(sequelize);
  initSteelGrade(sequelize);
  initCost(sequelize);
  initStockLength(sequelize);
  initCfsSection(sequelize);
}
