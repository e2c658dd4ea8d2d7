import type { Sequelize, Transaction } from "sequelize";
import { TableVersion, type TableVersionSource } from "@/models/material-tables";
import { TABLE_KEYS, TABLE_SPECS, type TableKey, type TableRowMap, type TableRows } from "../schemas";
import type { MaterialTables } from "../types";
import { noteNewVersion } from "./cache";
import { diffRows, indexRows, isEmptySummary, type ChangeSummary } from "./diff";
import { TablesChangeError } from "./errors";
import { getVersionInfo, loadVersionRows, type TablesVersionInfo } from "./queries";
import { copyTableRows, readVersionRows, writeTableRows } from "./registry";
import { emptyRows, rowsToTables, tablesToRows } from "./rows";

/**
 * Every change to the tables goes through commitVersion: in one transaction it takes a lock that
 * serializes writers, reads the current version, builds the next set of rows, and — when anything
 * changed — writes version N+1 with the change summary, a fresh copy of the changed tables' rows and an
 * in-database copy of the others. Published versions are never updated. A change that changes nothing
 * writes no version.
 */

/** PostgreSQL NOTIFY channel; the payload is the new version's id (see lib/tables/current.ts). */
export const TABLE_VERSIONS_CHANNEL = "spanlark_table_versions";

export interface Actor {
  id: string;
  email: string;
}

export interface CommitOptions {
  source: TableVersionSource;
  note: string;
  actor: Actor | null;
  /** the version the change was made against; a different current version is a 409 (someone else changed the tables) */
  baseVersionId?: string;
  restoredFromId?: string;
}

export type CommitResult =
  { created: true; version: TablesVersionInfo; summary: ChangeSummary } | { created: false; version: TablesVersionInfo | null; summary: ChangeSummary };

function sequelizeOf(): Sequelize {
  const sequelize = TableVersion.sequelize;
  if (!sequelize) throw new Error("the material table models are not initialized (call initModels)");
  return sequelize;
}

export async function commitVersion(
  options: CommitOptions,
  build: (current: TableRows, transaction: Transaction) => Promise<TableRows> | TableRows,
): Promise<CommitResult> {
  const sequelize = sequelizeOf();
  const outcome = await sequelize.transaction(async (transaction) => {
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext(:channel))", { replacements: { channel: TABLE_VERSIONS_CHANNEL }, transaction });
    const current = await TableVersion.findOne({ attributes: ["id", "number"], order: [["number", "DESC"]], transaction });
    if (options.baseVersionId && current?.id !== options.baseVersionId) {
      throw new TablesChangeError(409, "the tables changed since you opened them; reload to see the newest version, then make your change again", {
        currentVersionId: current?.id ?? null,
      });
    }
    if (!current && options.source !== "seed") {
      throw new TablesChangeError(409, "the database holds no version of the tables yet; publish the starter tables first (run the seeders)");
    }
    const before = current ? await readVersionRows(current.id, transaction) : emptyRows();
    const after = await build(before, transaction);
    const summary = diffRows(before, after);
    if (isEmptySummary(summary)) return { created: false as const, id: current?.id ?? null, summary, after };

    const version = await TableVersion.create(
      {
        number: (current?.number ?? 0) + 1,
        source: options.source,
        note: options.note.trim(),
        createdById: options.actor?.id ?? null,
        createdByEmail: options.actor?.email ?? null,
        restoredFromId: options.restoredFromId ?? null,
        summary,
        rowsAdded: summary.added,
        rowsChanged: summary.changed,
        rowsRemoved: summary.removed,
      },
      { transaction },
    );
    for (const key of TABLE_KEYS) {
      if (summary.tables[key] || !current) await writeTableRows(key, version.id, after[key], transaction);
      else await copyTableRows(key, current.id, version.id, transaction);
    }
    // Delivered to every listening process when (and only if) the transaction commits.
    await sequelize.query("SELECT pg_notify(:channel, :id)", { replacements: { channel: TABLE_VERSIONS_CHANNEL, id: version.id }, transaction });
    return { created: true as const, id: version.id, summary, after };
  });

  if (outcome.created) {
    const tables: MaterialTables = rowsToTables(outcome.id, outcome.after);
    noteNewVersion(tables);
    const version = await getVersionInfo(outcome.id);
    if (!version) throw new Error(`version ${outcome.id} vanished after commit`);
    return { created: true, version, summary: outcome.summary };
  }
  return { created: false, version: outcome.id ? await getVersionInfo(outcome.id) : null, summary: outcome.summary };
}

function replaceTable<K extends TableKey>(rows: TableRows, key: K, next: TableRowMap[K][]): TableRows {
  return { ...rows, [key]: next };
}

export interface SaveRowInput<K extends TableKey> {
  table: K;
  row: TableRowMap[K];
  /** the key of the row being edited; absent = a new row */
  originalKey?: string;
}

/** Adds a row, or replaces the row with originalKey, as a new version. */
export async function saveRow<K extends TableKey>(input: SaveRowInput<K>, options: Omit<CommitOptions, "source">): Promise<CommitResult> {
  const spec = TABLE_SPECS[input.table];
  const newKey = spec.keyOf(input.row);
  return commitVersion({ ...options, source: "edit" }, (current) => {
    const rows: TableRowMap[K][] = current[input.table];
    const existing = indexRows(input.table, rows);
    if (input.originalKey !== undefined) {
      if (!existing.has(input.originalKey)) throw new TablesChangeError(404, `no row "${input.originalKey}" in ${spec.title}`);
      if (newKey !== input.originalKey && existing.has(newKey)) {
        throw new TablesChangeError(409, `${spec.title} already has a row "${newKey}"; edit that row instead`);
      }
      return replaceTable(
        current,
        input.table,
        rows.map((r) => (spec.keyOf(r) === input.originalKey ? input.row : r)),
      );
    }
    if (existing.has(newKey)) throw new TablesChangeError(409, `${spec.title} already has a row "${newKey}"; edit that row instead`);
    return replaceTable(current, input.table, [...rows, input.row]);
  });
}

/** Removes one row as a new version. */
export async function deleteRow<K extends TableKey>(table: K, key: string, options: Omit<CommitOptions, "source">): Promise<CommitResult> {
  const spec = TABLE_SPECS[table];
  return commitVersion({ ...options, source: "edit" }, (current) => {
    const rows: TableRowMap[K][] = current[table];
    if (!rows.some((r) => spec.keyOf(r) === key)) throw new TablesChangeError(404, `no row "${key}" in ${spec.title}`);
    return replaceTable(
      current,
      table,
      rows.filter((r) => spec.keyOf(r) !== key),
    );
  });
}

/**
 * "merge": each imported row is added, or replaces the row with the same key; other rows stay.
 * "replace": the table becomes exactly the imported rows.
 */
export type ImportMode = "merge" | "replace";
export const IMPORT_MODES: readonly ImportMode[] = ["merge", "replace"];

/** Applies already-validated imported rows to one table; the rows must have distinct keys. */
export function applyImport<K extends TableKey>(current: TableRows, table: K, imported: TableRowMap[K][], mode: ImportMode): TableRows {
  if (mode === "replace") return replaceTable(current, table, imported);
  const spec = TABLE_SPECS[table];
  const before: TableRowMap[K][] = current[table];
  const incoming = indexRows(table, imported);
  const kept = before.map((r) => incoming.get(spec.keyOf(r)) ?? r);
  const existing = indexRows(table, before);
  const added = imported.filter((r) => !existing.has(spec.keyOf(r)));
  return replaceTable(current, table, [...kept, ...added]);
}

/** Imports rows into one table as one new version (or none, when the rows change nothing). */
export async function importRows<K extends TableKey>(
  table: K,
  rows: TableRowMap[K][],
  mode: ImportMode,
  options: Omit<CommitOptions, "source">,
): Promise<CommitResult> {
  return commitVersion({ ...options, source: "import" }, (current) => applyImport(current, table, rows, mode));
}

/** Publishes a copy of an earlier version as the newest version. */
export async function restoreVersion(versionId: string, options: Omit<CommitOptions, "source" | "restoredFromId">): Promise<CommitResult> {
  return commitVersion({ ...options, source: "restore", restoredFromId: versionId }, async (_current, transaction) => {
    const target = await loadVersionRows(versionId, transaction);
    if (!target) throw new TablesChangeError(404, "no such version of the tables");
    return target;
  });
}

/** Loads tables as the first version when there is none yet (the seeder); returns null when versions exist. */
export async function seedTables(tables: MaterialTables, note: string): Promise<CommitResult | null> {
  if ((await TableVersion.count()) > 0) return null;
  return commitVersion({ source: "seed", note, actor: null }, () => tablesToRows(tables));
}
