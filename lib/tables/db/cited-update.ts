import { STARTER_TABLES } from "../index";
import { rowToFlat, TABLE_KEYS, TABLE_SPECS, type TableKey, type TableRowMap, type TableRows } from "../schemas";
import type { MaterialTables } from "../types";
import { currentVersionId, loadVersionRows } from "./queries";
import { tablesToRows } from "./rows";
import { commitVersion, type CommitResult } from "./write";

/**
 * Carries the cited starter tables into a database that already holds versions: one NEW version on top
 * of the current one (published versions are never rewritten; jobs saved on an earlier version keep it).
 *
 * Row by row, matched on the table's natural key:
 * - a current row with the starter's numbers takes the starter row (only its source words change);
 * - a current row that still holds the earlier starter's numbers (PREVIOUS_STARTER_VALUES) takes the
 *   corrected starter row;
 * - a current row an admin changed is kept as it is and named in the version's note;
 * - a starter row the current version lacks is added; current rows the starter lacks stay.
 */

export const CITED_UPDATE_NOTE = "Cited material tables: each row names its table, edition and where it was checked";

/** The note of the version that carries the Table 4D Douglas Fir-Larch sources checked against published copies and the lower 24F-V4 Fbx−. */
export const TIMBER_SOURCES_NOTE =
  "Cited material tables: NDS Supplement 2018 Table 4D Douglas Fir-Larch beams and stringers checked against published copies; glulam 24F-V4 Fbx− 1,450 psi (its stress class value, the lower reading)";

/** The note of the version that carries the Table 4D Hem-Fir No.2 source, checked against a published worked problem. */
export const HEM_FIR_TIMBER_NOTE =
  "Cited material tables: NDS Supplement 2018 Table 4D Hem-Fir No.2 beams and stringers checked against a published worked problem";

/** The earlier starter's values that the cited tables correct: [table, row key, column, earlier value]. */
export const PREVIOUS_STARTER_VALUES: [TableKey, string, string, string][] = [
  // NDS Supplement 2018 Table 4A prints 1,250 psi; the first starter tables held 1,150
  ["sawn-values", "Spruce-Pine-Fir|Select Structural|dimension|all", "Fb_psi", "1150"],
  // NDS Supplement 2018 Table 5A: published copies give 24F-V4 Fbx− as 1,850 (the layup) or 1,450 (its
  // stress class 24F-1.8E); the lower is used now that Fbx− is checked; the earlier starter held 1,850
  ["engineered", "Glulam 24F-V4 DF", "FbNeg_psi", "1850"],
];

function numbersOf(key: TableKey, row: unknown): Record<string, string> {
  const flat = rowToFlat(key, row as TableRowMap[typeof key]);
  const { source: _source, ...rest } = flat;
  return rest;
}

function sameNumbers(a: Record<string, string>, b: Record<string, string>): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const k of keys) if (a[k] !== b[k]) return false;
  return true;
}

/** The starter row's numbers with the earlier starter's values put back where the cited tables corrected them. */
function previousNumbers(key: TableKey, rowKey: string, starterNumbers: Record<string, string>): Record<string, string> | null {
  const fixes = PREVIOUS_STARTER_VALUES.filter(([t, k]) => t === key && k === rowKey);
  if (fixes.length === 0) return null;
  const out = { ...starterNumbers };
  for (const [, , column, value] of fixes) out[column] = value;
  return out;
}

export interface CitedUpdate {
  rows: TableRows;
  /** rows an admin had changed, kept as they were: "table: key" */
  kept: string[];
}

function updateTable<K extends TableKey>(key: K, current: TableRowMap[K][], starter: TableRowMap[K][], kept: string[]): TableRowMap[K][] {
  const spec = TABLE_SPECS[key];
  const byKey = new Map(starter.map((r) => [spec.keyOf(r), r] as const));
  const seen = new Set<string>();
  const out = current.map((row) => {
    const k = spec.keyOf(row);
    const next = byKey.get(k);
    if (!next) return row;
    seen.add(k);
    const now = numbersOf(key, row);
    const cited = numbersOf(key, next);
    if (sameNumbers(now, cited)) return next;
    const previous = previousNumbers(key, k, cited);
    if (previous && sameNumbers(now, previous)) return next;
    kept.push(`${spec.title}: ${k.replaceAll("|", " ")}`);
    return row;
  });
  return [...out, ...starter.filter((r) => !seen.has(spec.keyOf(r)))];
}

/** The rows of the cited update over the current rows (pure; see the module comment). Costs are the yard's own and stay. */
export function citedUpdate(current: TableRows, starter: TableRows): CitedUpdate {
  const kept: string[] = [];
  const rows = { ...current };
  for (const key of TABLE_KEYS) {
    if (key === "costs") continue;
    (rows as Record<TableKey, unknown[]>)[key] = updateTable(key, current[key] as never[], starter[key] as never[], kept);
  }
  return { rows, kept };
}

/**
 * Publishes the cited update as a new version when the database holds versions and the update changes
 * anything; returns null when there is no version yet (the seeder then loads the cited tables as version 1).
 */
export async function publishCitedUpdate(tables: MaterialTables = STARTER_TABLES, baseNote: string = CITED_UPDATE_NOTE): Promise<CommitResult | null> {
  const baseVersionId = await currentVersionId();
  if (!baseVersionId) return null;
  const current = await loadVersionRows(baseVersionId);
  if (!current) return null;
  const starter = tablesToRows(tables);
  const { kept } = citedUpdate(current, starter);
  const note = kept.length > 0 ? `${baseNote}. Kept as an admin changed them: ${kept.join("; ")}` : baseNote;
  // against the version just read: a change in between is a 409, not a silent overwrite
  return commitVersion({ source: "seed", note, actor: null, baseVersionId }, (now) => citedUpdate(now, starter).rows);
}
