import type { Transaction } from "sequelize";
import { TableVersion, type TableVersionSource } from "@/models/material-tables";
import type { MaterialTables } from "../types";
import type { TableRows } from "../schemas";
import { diffRows, type ChangeSummary } from "./diff";
import { readVersionRows } from "./registry";
import { rowsToTables } from "./rows";

/** A published version of the tables as the history shows it. */
export interface TablesVersionInfo {
  id: string;
  /** 1, 2, 3… in the order published; the highest is current */
  number: number;
  source: TableVersionSource;
  note: string;
  /** ISO 8601 */
  createdAt: string;
  /** null for the seeded starter version */
  createdBy: { id: string | null; email: string } | null;
  restoredFrom: { id: string; number: number | null } | null;
  counts: { added: number; changed: number; removed: number };
}

export interface TablesVersionDetail extends TablesVersionInfo {
  /** the change from the version before (for version 1: every row added) */
  summary: ChangeSummary;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isVersionId(value: string): boolean {
  return UUID.test(value);
}

function info(v: TableVersion, restoredFromNumber: number | null): TablesVersionInfo {
  return {
    id: v.id,
    number: v.number,
    source: v.source,
    note: v.note,
    createdAt: v.createdAt.toISOString(),
    createdBy: v.createdByEmail ? { id: v.createdById, email: v.createdByEmail } : null,
    restoredFrom: v.restoredFromId ? { id: v.restoredFromId, number: restoredFromNumber } : null,
    counts: { added: v.rowsAdded, changed: v.rowsChanged, removed: v.rowsRemoved },
  };
}

const LIST_ATTRIBUTES = [
  "id",
  "number",
  "source",
  "note",
  "createdById",
  "createdByEmail",
  "restoredFromId",
  "rowsAdded",
  "rowsChanged",
  "rowsRemoved",
  "createdAt",
] as const;

async function numbersOf(ids: string[]): Promise<Map<string, number>> {
  if (ids.length === 0) return new Map();
  const rows = await TableVersion.findAll({ where: { id: ids }, attributes: ["id", "number"] });
  return new Map(rows.map((r) => [r.id, r.number]));
}

/** The current (highest-numbered) version's id; one probe of the unique index on number. */
export async function currentVersionId(transaction?: Transaction): Promise<string | null> {
  const row = await TableVersion.findOne({ attributes: ["id"], order: [["number", "DESC"]], transaction });
  return row?.id ?? null;
}

/** Versions newest first, without their change detail. */
export async function listVersions(options: { limit?: number; offset?: number } = {}): Promise<{ versions: TablesVersionInfo[]; total: number }> {
  const { rows, count } = await TableVersion.findAndCountAll({
    attributes: [...LIST_ATTRIBUTES],
    order: [["number", "DESC"]],
    limit: options.limit ?? 50,
    offset: options.offset ?? 0,
  });
  const numbers = await numbersOf(rows.flatMap((r) => (r.restoredFromId ? [r.restoredFromId] : [])));
  return { versions: rows.map((r) => info(r, r.restoredFromId ? (numbers.get(r.restoredFromId) ?? null) : null)), total: count };
}

export async function getVersionInfo(id: string): Promise<TablesVersionInfo | null> {
  if (!isVersionId(id)) return null;
  const row = await TableVersion.findByPk(id, { attributes: [...LIST_ATTRIBUTES] });
  if (!row) return null;
  const numbers = await numbersOf(row.restoredFromId ? [row.restoredFromId] : []);
  return info(row, row.restoredFromId ? (numbers.get(row.restoredFromId) ?? null) : null);
}

export async function getVersionDetail(id: string): Promise<TablesVersionDetail | null> {
  if (!isVersionId(id)) return null;
  const row = await TableVersion.findByPk(id);
  if (!row) return null;
  const numbers = await numbersOf(row.restoredFromId ? [row.restoredFromId] : []);
  return { ...info(row, row.restoredFromId ? (numbers.get(row.restoredFromId) ?? null) : null), summary: row.summary as ChangeSummary };
}

/** Every table's rows of a version, or null when there is no such version. */
export async function loadVersionRows(id: string, transaction?: Transaction): Promise<TableRows | null> {
  if (!isVersionId(id)) return null;
  const exists = await TableVersion.findByPk(id, { attributes: ["id"], transaction });
  if (!exists) return null;
  return readVersionRows(id, transaction);
}

/** A version as the design checks read it (MaterialTables.version = the version id), or null. */
export async function loadVersion(id: string): Promise<MaterialTables | null> {
  const rows = await loadVersionRows(id);
  return rows ? rowsToTables(id, rows) : null;
}

/** What changed from version `fromId` to version `toId`; null when either is missing. */
export async function diffVersions(fromId: string, toId: string): Promise<ChangeSummary | null> {
  const [from, to] = await Promise.all([loadVersionRows(fromId), loadVersionRows(toId)]);
  if (!from || !to) return null;
  return diffRows(from, to);
}
