import { MAX_CSV_BYTES } from "./format";

/** An upload refused before its rows are read: wrong size or type, or not text. */
export class CsvUploadError extends Error {
  constructor(
    readonly status: 400 | 411 | 413 | 415,
    message: string,
  ) {
    super(message);
    this.name = "CsvUploadError";
  }
}

const CSV_TYPES = ["text/csv", "application/csv", "text/comma-separated-values", "application/vnd.ms-excel"];
/** Room for the multipart framing and the small text fields beside the file. */
export const FORM_OVERHEAD_BYTES = 16 * 1024;

function kb(bytes: number): string {
  return `${Math.ceil(bytes / 1024).toLocaleString("en-US")} KB`;
}

/** Refuses a request body too large to hold an accepted file, before reading it. */
export function checkUploadLength(req: Request): void {
  const length = req.headers.get("content-length");
  if (length === null) throw new CsvUploadError(411, "the upload must state its length (Content-Length)");
  const bytes = Number(length);
  if (!Number.isFinite(bytes) || bytes < 0) throw new CsvUploadError(400, "the upload's Content-Length is not a number");
  if (bytes > MAX_CSV_BYTES + FORM_OVERHEAD_BYTES) {
    throw new CsvUploadError(413, `the file is too large (${kb(bytes)}); the largest accepted is ${kb(MAX_CSV_BYTES)}`);
  }
}

/**
 * Checks an uploaded file and returns its text: at most MAX_CSV_BYTES, named .csv or sent as text/csv,
 * UTF-8 text with no NUL bytes. Whether it is the right CSV is parseTableCsv's question.
 */
export async function readCsvUpload(file: File): Promise<string> {
  if (file.size === 0) throw new CsvUploadError(400, "the file is empty");
  if (file.size > MAX_CSV_BYTES) throw new CsvUploadError(413, `the file is too large (${kb(file.size)}); the largest accepted is ${kb(MAX_CSV_BYTES)}`);
  const type = file.type.split(";")[0].trim().toLowerCase();
  const named = file.name.toLowerCase().endsWith(".csv");
  if (!named && !CSV_TYPES.includes(type)) {
    throw new CsvUploadError(415, `only CSV files are accepted (a .csv name or type text/csv); "${file.name}" is ${type || "of no stated type"}`);
  }
  const bytes = new Uint8Array(await file.arrayBuffer());
  if (bytes.includes(0)) throw new CsvUploadError(415, `"${file.name}" is not a text file`);
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new CsvUploadError(415, `"${file.name}" is not UTF-8 text; save it as CSV UTF-8`);
  }
}
