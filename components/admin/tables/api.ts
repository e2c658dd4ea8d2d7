import type { CsvRejectedLine } from "@/lib/tables/csv/format";
import type { ChangeSummary, TableChange } from "@/lib/tables/db/diff";
import type { TablesVersionDetail, TablesVersionInfo } from "@/lib/tables/db/queries";
import type { FieldSpec, FlatRow, TableKey } from "@/lib/tables/schemas";

/** Shapes the admin table routes answer with, and the fetch helpers the admin table components share. */

export type { ChangeSummary, CsvRejectedLine, FieldSpec, FlatRow, TableChange, TableKey, TablesVersionDetail, TablesVersionInfo };

export interface TableResponse {
  table: { key: TableKey; title: string; description: string; fields: FieldSpec[]; summary: string[]; tableSource: string | null };
  version: TablesVersionInfo | null;
  rows: { key: string; values: FlatRow }[];
}

export interface CommitResponse {
  created: boolean;
  version: TablesVersionInfo | null;
  counts: { added: number; changed: number; removed: number };
  message: string;
}

export interface PreviewResponse {
  table: TableKey;
  title: string;
  fileName: string;
  mode: "merge" | "replace";
  ok: boolean;
  fileError: string | null;
  rejected: CsvRejectedLine[];
  acceptedRows: number;
  lineCount: number;
  baseVersion: { id: string; number: number | null } | null;
  changes: TableChange | null;
}

export interface ErrorResponse {
  error: string;
  issues?: { path: string; message: string }[];
  rejected?: CsvRejectedLine[];
  fileError?: string | null;
}

export type Answer<T> = { ok: true; status: number; body: T } | { ok: false; status: number; body: ErrorResponse };

/** fetch, reading the JSON answer either way; a dropped connection becomes status 0 with a plain message. */
export async function call<T>(url: string, init?: RequestInit): Promise<Answer<T>> {
  let res: Response;
  try {
    res = await fetch(url, { ...init, headers: { accept: "application/json", ...init?.headers } });
  } catch {
    return { ok: false, status: 0, body: { error: "no connection; nothing was changed. Try again." } };
  }
  const body = (await res.json().catch(() => ({ error: `the server answered ${res.status}` }))) as T | ErrorResponse;
  return res.ok ? { ok: true, status: res.status, body: body as T } : { ok: false, status: res.status, body: body as ErrorResponse };
}

export async function fetchJson<T>(url: string): Promise<T> {
  const answer = await call<T>(url);
  if (!answer.ok) throw new Error(answer.body.error);
  return answer.body;
}

export function sendJson(method: "POST" | "PUT" | "DELETE", body: unknown): RequestInit {
  return { method, body: JSON.stringify(body), headers: { "content-type": "application/json" } };
}

export const SOURCE_LABEL: Record<TablesVersionInfo["source"], string> = {
  seed: "Starter tables",
  edit: "Edited",
  import: "CSV import",
  restore: "Restored",
};

/** "1 added, 2 changed" (or "no rows changed") */
export function countsText(counts: { added: number; changed: number; removed: number }): string {
  const parts = [
    counts.added ? `${counts.added} added` : "",
    counts.changed ? `${counts.changed} changed` : "",
    counts.removed ? `${counts.removed} removed` : "",
  ].filter(Boolean);
  return parts.length > 0 ? parts.join(", ") : "no rows changed";
}

/** "line 3 — Fb_psi: Fb must be at most 10,000 psi (got 90000)" */
export function rejectedText(line: CsvRejectedLine): string[] {
  return line.issues.map((i) => `${i.column === "(row)" ? "" : `${i.column}: `}${i.message}${i.value ? ` (got ${i.value})` : ""}`);
}
