import type { MaterialTables } from "../types";
import type { CostRow, TableRows } from "../schemas";

/**
 * MaterialTables (what the design checks read) and TableRows (one list of rows per table, what the
 * admin pages, the CSV files and the version history work on) are the same data; these convert.
 */

export function tablesToRows(tables: MaterialTables): TableRows {
  const costs: CostRow[] = Object.entries(tables.costs)
    .map(([itemKey, costPerFt]) => ({ itemKey, costPerFt }))
    .sort((a, b) => a.itemKey.localeCompare(b.itemKey));
  return {
    "sawn-sizes": tables.sawnSizes,
    "sawn-values": tables.sawnValues,
    "size-factors": tables.sizeFactors,
    engineered: tables.engineered,
    "i-joists": tables.iJoists,
    "steel-shapes": tables.steel,
    "steel-grades": tables.steelGrades,
    costs,
    "stock-lengths": tables.stockLengths ?? [],
    "cold-formed": tables.coldFormed ?? [],
  };
}

export function rowsToTables(version: string, rows: TableRows): MaterialTables {
  return {
    version,
    sawnSizes: rows["sawn-sizes"],
    sawnValues: rows["sawn-values"],
    sizeFactors: rows["size-factors"],
    engineered: rows.engineered,
    iJoists: rows["i-joists"],
    steel: rows["steel-shapes"],
    steelGrades: rows["steel-grades"],
    costs: Object.fromEntries(rows.costs.map((c) => [c.itemKey, c.costPerFt])),
    stockLengths: rows["stock-lengths"],
    coldFormed: rows["cold-formed"],
  };
}

export function emptyRows(): TableRows {
  return {
    "sawn-sizes": [],
    "sawn-values": [],
    "size-factors": [],
    engineered: [],
    "i-joists": [],
    "steel-shapes": [],
    "steel-grades": [],
    costs: [],
    "stock-lengths": [],
    "cold-formed": [],
  };
}
