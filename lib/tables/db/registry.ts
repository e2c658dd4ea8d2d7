import type { ModelStatic, Transaction } from "sequelize";
import {
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
} from "@/models/material-tables";
import type { TableKey, TableRowMap, TableRows } from "../schemas";
import { emptyRows } from "./rows";

/**
 * How each material table maps onto its row model: read a version's rows, write a version's rows, and
 * copy a table's rows from one version to another unchanged (copy-on-write in SQL, no round trip).
 */

async function readSawnSizes(versionId: string, transaction?: Transaction) {
  const rows = await SawnSizeRow.findAll({
    where: { versionId },
    order: [
      ["nominalThickness", "ASC"],
      ["nominalDepth", "ASC"],
    ],
    transaction,
  });
  return rows
    .map((r) => r.get({ plain: true }))
    .map(({ name, nominalThickness, nominalDepth, b, d, A, Sx, Ix, sizeClass }) => ({ name, nominalThickness, nominalDepth, b, d, A, Sx, Ix, sizeClass }));
}

async function readSawnValues(versionId: string, transaction?: Transaction) {
  const rows = await SawnValueRow.findAll({
    where: { versionId },
    order: [
      ["species", "ASC"],
      ["sizeClass", "ASC"],
      ["grade", "ASC"],
      ["nominalDepth", "ASC"],
    ],
    transaction,
  });
  return rows
    .map((r) => r.get({ plain: true }))
    .map(({ species, grade, sizeClass, nominalDepth, Fb, Ft, Fv, FcPerp, Fc, E, Emin, G, source }) =>
      nominalDepth === null
        ? { species, grade, sizeClass, Fb, Ft, Fv, FcPerp, Fc, E, Emin, G, source }
        : { species, grade, sizeClass, nominalDepth, Fb, Ft, Fv, FcPerp, Fc, E, Emin, G, source },
    );
}

async function readSizeFactors(versionId: string, transaction?: Transaction) {
  const rows = await SizeFactorRow.findAll({
    where: { versionId },
    order: [
      ["tableRef", "ASC"],
      ["nominalThickness", "ASC"],
      ["nominalDepth", "ASC"],
    ],
    transaction,
  });
  return rows
    .map((r) => r.get({ plain: true }))
    .map(({ tableRef, grades, nominalDepth, nominalThickness, CF_Fb, CF_Ft, CF_Fc, source }) => ({
      table: tableRef,
      grades,
      nominalDepth,
      nominalThickness,
      CF_Fb,
      CF_Ft,
      CF_Fc,
      source,
    }));
}

async function readEngineered(versionId: string, transaction?: Transaction) {
  const rows = await EngineeredProductRow.findAll({
    where: { versionId },
    order: [
      ["kind", "ASC"],
      ["name", "ASC"],
    ],
    transaction,
  });
  return rows.map((r) => r.get({ plain: true })).map(({ id: _id, versionId: _v, FbNeg, ...product }) => (FbNeg === null ? product : { ...product, FbNeg }));
}

async function readIJoists(versionId: string, transaction?: Transaction) {
  const rows = await IJoistRow.findAll({
    where: { versionId },
    order: [
      ["d", "ASC"],
      ["EI", "ASC"],
      ["name", "ASC"],
    ],
    transaction,
  });
  return rows.map((r) => r.get({ plain: true })).map(({ id: _id, versionId: _v, ...joist }) => joist);
}

async function readColdFormed(versionId: string, transaction?: Transaction) {
  const rows = await CfsSectionRow.findAll({
    where: { versionId },
    order: [
      ["style", "ASC"],
      ["depth", "ASC"],
      ["flange", "ASC"],
      ["mils", "ASC"],
    ],
    transaction,
  });
  return rows.map((r) => r.get({ plain: true })).map(({ id: _id, versionId: _v, ...section }) => section);
}

async function readSteelShapes(versionId: string, transaction?: Transaction) {
  const rows = await SteelShapeRow.findAll({
    where: { versionId },
    order: [
      ["d", "ASC"],
      ["W", "ASC"],
    ],
    transaction,
  });
  return rows.map((r) => r.get({ plain: true })).map(({ id: _id, versionId: _v, ...shape }) => shape);
}

async function readSteelGrades(versionId: string, transaction?: Transaction) {
  const rows = await SteelGradeRow.findAll({ where: { versionId }, order: [["name", "ASC"]], transaction });
  return rows.map((r) => r.get({ plain: true })).map(({ name, Fy, Fu }) => ({ name, Fy, Fu }));
}

async function readCosts(versionId: string, transaction?: Transaction) {
  const rows = await CostRowModel.findAll({ where: { versionId }, order: [["itemKey", "ASC"]], transaction });
  return rows.map((r) => r.get({ plain: true })).map(({ itemKey, costPerFt }) => ({ itemKey, costPerFt }));
}

async function readStockLengths(versionId: string, transaction?: Transaction) {
  const rows = await StockLengthModel.findAll({ where: { versionId }, order: [["material", "ASC"]], transaction });
  return rows.map((r) => r.get({ plain: true })).map(({ material, lengthsFt }) => ({ material, lengthsFt }));
}

/** Every table's rows of one version. */
export async function readVersionRows(versionId: string, transaction?: Transaction): Promise<TableRows> {
  const rows = emptyRows();
  if (transaction) {
    // One connection runs one query at a time: read in turn.
    rows["sawn-sizes"] = await readSawnSizes(versionId, transaction);
    rows["sawn-values"] = await readSawnValues(versionId, transaction);
    rows["size-factors"] = await readSizeFactors(versionId, transaction);
    rows.engineered = await readEngineered(versionId, transaction);
    rows["i-joists"] = await readIJoists(versionId, transaction);
    rows["steel-shapes"] = await readSteelShapes(versionId, transaction);
    rows["steel-grades"] = await readSteelGrades(versionId, transaction);
    rows.costs = await readCosts(versionId, transaction);
    rows["stock-lengths"] = await readStockLengths(versionId, transaction);
    rows["cold-formed"] = await readColdFormed(versionId, transaction);
    return rows;
  }
  [
    rows["sawn-sizes"],
    rows["sawn-values"],
    rows["size-factors"],
    rows.engineered,
    rows["i-joists"],
    rows["steel-shapes"],
    rows["steel-grades"],
    rows.costs,
    rows["stock-lengths"],
    rows["cold-formed"],
  ] = await Promise.all([
    readSawnSizes(versionId),
    readSawnValues(versionId),
    readSizeFactors(versionId),
    readEngineered(versionId),
    readIJoists(versionId),
    readSteelShapes(versionId),
    readSteelGrades(versionId),
    readCosts(versionId),
    readStockLengths(versionId),
    readColdFormed(versionId),
  ]);
  return rows;
}

type RowModel = ModelStatic<
  | SawnSizeRow
  | SawnValueRow
  | SizeFactorRow
  | EngineeredProductRow
  | IJoistRow
  | SteelShapeRow
  | SteelGradeRow
  | CostRowModel
  | StockLengthModel
  | CfsSectionRow
>;

export const ROW_MODELS: Record<TableKey, RowModel> = {
  "sawn-sizes": SawnSizeRow,
  "sawn-values": SawnValueRow,
  "size-factors": SizeFactorRow,
  engineered: EngineeredProductRow,
  "i-joists": IJoistRow,
  "steel-shapes": SteelShapeRow,
  "steel-grades": SteelGradeRow,
  costs: CostRowModel,
  "stock-lengths": StockLengthModel,
  "cold-formed": CfsSectionRow,
};

/** Writes one table's rows for a new version. */
export async function writeTableRows<K extends TableKey>(key: K, versionId: string, rows: TableRowMap[K][], transaction: Transaction): Promise<void> {
  if (rows.length === 0) return;
  switch (key) {
    case "sawn-sizes":
      await SawnSizeRow.bulkCreate(
        (rows as TableRowMap["sawn-sizes"][]).map((r) => ({ ...r, versionId })),
        { transaction },
      );
      return;
    case "sawn-values":
      await SawnValueRow.bulkCreate(
        (rows as TableRowMap["sawn-values"][]).map((r) => ({ ...r, nominalDepth: r.nominalDepth ?? null, versionId })),
        { transaction },
      );
      return;
    case "size-factors":
      await SizeFactorRow.bulkCreate(
        (rows as TableRowMap["size-factors"][]).map(({ table, ...r }) => ({ ...r, tableRef: table, versionId })),
        { transaction },
      );
      return;
    case "engineered":
      await EngineeredProductRow.bulkCreate(
        (rows as TableRowMap["engineered"][]).map((r) => ({ ...r, FbNeg: r.FbNeg ?? null, versionId })),
        { transaction },
      );
      return;
    case "cold-formed":
      await CfsSectionRow.bulkCreate(
        (rows as TableRowMap["cold-formed"][]).map((r) => ({ ...r, versionId })),
        { transaction },
      );
      return;
    case "i-joists":
      await IJoistRow.bulkCreate(
        (rows as TableRowMap["i-joists"][]).map((r) => ({ ...r, versionId })),
        { transaction },
      );
      return;
    case "steel-shapes":
      await SteelShapeRow.bulkCreate(
        (rows as TableRowMap["steel-shapes"][]).map((r) => ({ ...r, versionId })),
        { transaction },
      );
      return;
    case "steel-grades":
      await SteelGradeRow.bulkCreate(
        (rows as TableRowMap["steel-grades"][]).map((r) => ({ ...r, versionId })),
        { transaction },
      );
      return;
    case "costs":
      await CostRowModel.bulkCreate(
        (rows as TableRowMap["costs"][]).map((r) => ({ ...r, versionId })),
        { transaction },
      );
      return;
    case "stock-lengths":
      await StockLengthModel.bulkCreate(
        (rows as TableRowMap["stock-lengths"][]).map((r) => ({ ...r, versionId })),
        { transaction },
      );
      return;
  }
}

/** Copies one table's rows from a version to a new version unchanged, inside the database. */
export async function copyTableRows(key: TableKey, fromVersionId: string, toVersionId: string, transaction: Transaction): Promise<void> {
  const model = ROW_MODELS[key];
  const columns = Object.values(model.getAttributes())
    .map((a) => a.field ?? "")
    .filter((c) => c !== "" && c !== "id" && c !== "version_id")
    .map((c) => `"${c}"`)
    .join(", ");
  const table = model.getTableName();
  const sequelize = model.sequelize;
  if (!sequelize) throw new Error(`model for ${key} is not initialized`);
  await sequelize.query(
    `INSERT INTO "${String(table)}" (id, version_id, ${columns}) SELECT gen_random_uuid(), :to, ${columns} FROM "${String(table)}" WHERE version_id = :from`,
    { replacements: { to: toVersionId, from: fromVersionId }, transaction },
  );
}
