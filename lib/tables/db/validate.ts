import { TABLE_KEYS, TABLE_SPECS, type TableKey, type TableRowMap, type TableRows } from "../schemas";

export function rowsOf<K extends TableKey>(rows: TableRows, key: K): TableRowMap[K][] {
  return rows[key];
}

function checkTable<K extends TableKey>(key: K, rows: TableRowMap[K][], found: string[]): void {
  const spec = TABLE_SPECS[key];
  const seen = new Set<string>();
  rows.forEach((row, i) => {
    const result = spec.schema.safeParse(row);
    if (!result.success) {
      found.push(`${spec.title} row ${i + 1}: ${result.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`).join("; ")}`);
    }
    const rowKey = spec.keyOf(row);
    if (seen.has(rowKey)) found.push(`${spec.title} row ${i + 1}: a second row "${rowKey}"`);
    seen.add(rowKey);
  });
}

/** Every row that fails its table's schema or repeats a key, as readable lines; empty when all is well. */
export function tablesProblems(rows: TableRows): string[] {
  const found: string[] = [];
  for (const key of TABLE_KEYS) checkTable(key, rowsOf(rows, key), found);
  return found;
}
