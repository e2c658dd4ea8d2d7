import { rowToFlat, TABLE_KEYS, TABLE_SPECS, type FlatRow, type TableKey, type TableRowMap, type TableRows } from "../schemas";

/** One column whose value changed, as the CSV file would show it. */
export interface FieldChange {
  column: string;
  before: string;
  after: string;
}

export interface RowChange {
  /** the row's natural key (see TABLE_SPECS[table].keyOf) */
  key: string;
  before?: FlatRow;
  after?: FlatRow;
  /** for a changed row: only the columns that changed */
  fields?: FieldChange[];
}

export interface TableChange {
  added: RowChange[];
  changed: RowChange[];
  removed: RowChange[];
}

/** What a version changed against the one before it: stored with the version, shown in the history. */
export interface ChangeSummary {
  tables: Partial<Record<TableKey, TableChange>>;
  added: number;
  changed: number;
  removed: number;
}

export function emptySummary(): ChangeSummary {
  return { tables: {}, added: 0, changed: 0, removed: 0 };
}

/** Rows of one table keyed by natural key, in their order; a second row with the same key is a caller's bug. */
export function indexRows<K extends TableKey>(key: K, rows: TableRowMap[K][]): Map<string, TableRowMap[K]> {
  const spec = TABLE_SPECS[key];
  const map = new Map<string, TableRowMap[K]>();
  for (const row of rows) map.set(spec.keyOf(row), row);
  return map;
}

export function diffTable<K extends TableKey>(key: K, before: TableRowMap[K][], after: TableRowMap[K][]): TableChange {
  const old = indexRows(key, before);
  const now = indexRows(key, after);
  const change: TableChange = { added: [], changed: [], removed: [] };
  for (const [rowKey, row] of now) {
    const previous = old.get(rowKey);
    const afterFlat = rowToFlat(key, row);
    if (!previous) {
      change.added.push({ key: rowKey, after: afterFlat });
      continue;
    }
    const beforeFlat = rowToFlat(key, previous);
    const fields = Object.keys(afterFlat)
      .filter((column) => beforeFlat[column] !== afterFlat[column])
      .map((column) => ({ column, before: beforeFlat[column], after: afterFlat[column] }));
    if (fields.length > 0) change.changed.push({ key: rowKey, before: beforeFlat, after: afterFlat, fields });
  }
  for (const [rowKey, row] of old) {
    if (!now.has(rowKey)) change.removed.push({ key: rowKey, before: rowToFlat(key, row) });
  }
  return change;
}

/** The changes from one set of tables to another, table by table; unchanged tables are left out. */
export function diffRows(before: TableRows, after: TableRows): ChangeSummary {
  const summary = emptySummary();
  for (const key of TABLE_KEYS) {
    const change = diffTableOf(key, before, after);
    const count = change.added.length + change.changed.length + change.removed.length;
    if (count === 0) continue;
    summary.tables[key] = change;
    summary.added += change.added.length;
    summary.changed += change.changed.length;
    summary.removed += change.removed.length;
  }
  return summary;
}

function diffTableOf<K extends TableKey>(key: K, before: TableRows, after: TableRows): TableChange {
  return diffTable(key, before[key], after[key]);
}

export function isEmptySummary(summary: ChangeSummary): boolean {
  return summary.added + summary.changed + summary.removed === 0;
}
