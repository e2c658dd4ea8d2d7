import "server-only";
import { BODY_LIMITS, HttpError, readBodyBytes } from "@/lib/http";
import { getCurrentTables } from "../current";
import { csvIsClean, parseTableCsv, type CsvParseResult } from "../csv/format";
import { checkUploadLength, CsvUploadError, readCsvUpload } from "../csv/upload";
import { TABLE_SPECS, type TableKey } from "../schemas";
import type { MaterialTables } from "../types";
import { importFields } from "./admin-schemas";
import { diffTable, type TableChange } from "./diff";
import { isVersionId } from "./queries";
import { tablesToRows } from "./rows";
import { rowsOf } from "./validate";
import { applyImport, type ImportMode } from "./write";

/** A CSV upload read from a multipart form: the checked file, its rows, and the form's other fields. */
export interface ReadUpload<K extends TableKey> {
  fileName: string;
  mode: ImportMode;
  note: string | undefined;
  baseVersionId: string | undefined;
  parsed: CsvParseResult<K>;
}

export async function readUpload<K extends TableKey>(req: Request, table: K): Promise<ReadUpload<K>> {
  try {
    return await readCheckedUpload(req, table);
  } catch (err) {
    if (err instanceof CsvUploadError) throw new HttpError(err.status, err.message);
    throw err;
  }
}

async function readCheckedUpload<K extends TableKey>(req: Request, table: K): Promise<ReadUpload<K>> {
  checkUploadLength(req);
  // Read with a running count (BODY_LIMITS.csvImport), then parse the form from what was read.
  const body = await readBodyBytes(req, BODY_LIMITS.csvImport);
  let form: FormData;
  try {
    form = await new Request(req.url, { method: "POST", headers: req.headers, body }).formData();
  } catch {
    throw new HttpError(400, "send the file as multipart/form-data with a field named file");
  }
  const file = form.get("file");
  if (!(file instanceof File)) throw new HttpError(400, "choose a CSV file to upload (form field file)", { issues: [{ path: "file", message: "no file" }] });
  const fields = importFields.parse({
    mode: form.get("mode") ?? undefined,
    note: form.get("note") ?? undefined,
    baseVersionId: form.get("baseVersionId") || undefined,
  });
  const text = await readCsvUpload(file);
  return { fileName: file.name, mode: fields.mode, note: fields.note, baseVersionId: fields.baseVersionId, parsed: parseTableCsv(table, text) };
}

export interface ImportPreview {
  table: TableKey;
  title: string;
  fileName: string;
  mode: ImportMode;
  /** true when the file can be applied as it is */
  ok: boolean;
  fileError: string | null;
  rejected: CsvParseResult<TableKey>["rejected"];
  acceptedRows: number;
  lineCount: number;
  /** the version the preview compared with; pass it back as baseVersionId when applying */
  baseVersion: { id: string; number: number | null } | null;
  /** what applying would change (only when ok) */
  changes: TableChange | null;
}

/** Compares a clean upload with the current tables, writing nothing. */
export async function previewUpload<K extends TableKey>(
  table: K,
  upload: ReadUpload<K>,
  currentNumber: (id: string) => Promise<number | null>,
): Promise<ImportPreview> {
  const { parsed } = upload;
  const ok = csvIsClean(parsed);
  const current: MaterialTables = await getCurrentTables();
  const baseVersion = isVersionId(current.version) ? { id: current.version, number: await currentNumber(current.version) } : null;
  let changes: TableChange | null = null;
  if (ok) {
    const before = tablesToRows(current);
    const after = applyImport(before, table, parsed.rows, upload.mode);
    changes = diffTable(table, rowsOf(before, table), rowsOf(after, table));
  }
  return {
    table,
    title: TABLE_SPECS[table].title,
    fileName: upload.fileName,
    mode: upload.mode,
    ok,
    fileError: parsed.fileError,
    rejected: parsed.rejected,
    acceptedRows: parsed.rows.length,
    lineCount: parsed.lineCount,
    baseVersion,
    changes,
  };
}
