import Papa from "papaparse";
import { NUMBER_TEXT, parseFlatRow, rowToFlat, TABLE_SPECS, type FlatRow, type RowIssue, type TableKey, type TableRowMap } from "../schemas";

/**
 * CSV files of the material tables. One file holds one table: a header line naming every column of that
 * table (any order; see TABLE_SPECS[table].fields for the names, units in the names: Fb_psi, d_in, A_in2),
 * then one row per line. Numbers are plain decimals (no thousands separators); lists (engineered widths
 * and depths, size factor grades) are separated by ";"; an optional value is left blank. UTF-8, comma
 * separated, quoted with " where a value holds a comma. Download a table to get a file in this shape.
 * A downloaded cell that a spreadsheet would run as a formula (it begins with = + - @, a tab or a carriage
 * return, and is not a plain number) carries a leading single quote; reading a file drops that quote again.
 */

export const MAX_CSV_BYTES = 1024 * 1024;
export const MAX_CSV_ROWS = 5000;

export interface CsvLineIssue extends RowIssue {
  /** the cell as written, where one cell is at fault */
  value?: string;
}

export interface CsvRejectedLine {
  /** 1-based line number in the file (the header is line 1) */
  line: number;
  issues: CsvLineIssue[];
}

export interface CsvParseResult<K extends TableKey> {
  table: K;
  /** rows that passed every check, in file order */
  rows: TableRowMap[K][];
  /** every line that failed, with each reason */
  rejected: CsvRejectedLine[];
  /** a problem with the file as a whole (header, size, no rows); nothing in it can be applied */
  fileError: string | null;
  /** data lines read (blank lines not counted) */
  lineCount: number;
}

export function csvIsClean<K extends TableKey>(result: CsvParseResult<K>): boolean {
  return result.fileError === null && result.rejected.length === 0 && result.rows.length > 0;
}

export function expectedHeader(table: TableKey): string[] {
  return TABLE_SPECS[table].fields.map((f) => f.name);
}

function fileError<K extends TableKey>(table: K, message: string, lineCount = 0): CsvParseResult<K> {
  return { table, rows: [], rejected: [], fileError: message, lineCount };
}

/** Parses and checks a whole file against one table's columns and row schema. Pure: writes nothing. */
export function parseTableCsv<K extends TableKey>(table: K, input: string): CsvParseResult<K> {
  const spec = TABLE_SPECS[table];
  const text = input.replace(/^\uFEFF/, "").replace(/\r\n?/g, "\n");
  const records: { cells: string[]; line: number }[] = [];
  let quoteError: string | null = null;
  let start = 0;
  let line = 1;
  Papa.parse<string[]>(text, {
    delimiter: ",",
    newline: "\n",
    step: (result) => {
      const end = result.meta.cursor;
      const cells = result.data;
      if (result.errors.length > 0 && quoteError === null) quoteError = `line ${line}: ${result.errors[0].message.toLowerCase()}`;
      if (cells.some((c) => c.trim() !== "")) records.push({ cells, line });
      for (let i = start; i < end && i < text.length; i += 1) if (text.charCodeAt(i) === 10) line += 1;
      start = end;
    },
  });
  if (quoteError) return fileError(table, `the file is not valid CSV: ${quoteError}`);
  if (records.length === 0) return fileError(table, "the file is empty");

  const header = records[0].cells.map((h) => h.trim());
  const expected = expectedHeader(table);
  const missing = expected.filter((name) => !header.includes(name));
  const unknown = header.filter((name) => !expected.includes(name));
  const repeated = header.filter((name, i) => header.indexOf(name) !== i);
  if (missing.length > 0 || unknown.length > 0 || repeated.length > 0) {
    const parts = [
      missing.length > 0 ? `missing column${missing.length > 1 ? "s" : ""} ${missing.join(", ")}` : "",
      unknown.length > 0 ? `unknown column${unknown.length > 1 ? "s" : ""} ${unknown.join(", ")}` : "",
      repeated.length > 0 ? `column${repeated.length > 1 ? "s" : ""} ${repeated.join(", ")} given twice` : "",
    ].filter(Boolean);
    return fileError(table, `the header on line 1 does not match ${spec.title}: ${parts.join("; ")}. Expected: ${expected.join(",")}`);
  }

  const data = records.slice(1);
  if (data.length === 0) return fileError(table, "the file has a header but no rows");
  if (data.length > MAX_CSV_ROWS) return fileError(table, `the file has ${data.length} rows; the most accepted in one file is ${MAX_CSV_ROWS}`, data.length);

  const rows: TableRowMap[K][] = [];
  const rejected: CsvRejectedLine[] = [];
  const firstLineOfKey = new Map<string, number>();
  for (const record of data) {
    if (record.cells.length !== header.length) {
      rejected.push({
        line: record.line,
        issues: [{ column: "(row)", message: `has ${record.cells.length} values; the header has ${header.length} columns` }],
      });
      continue;
    }
    const flat: FlatRow = Object.fromEntries(header.map((name, i) => [name, restoreCell(record.cells[i])]));
    const parsed = parseFlatRow(table, flat);
    if (!parsed.ok) {
      rejected.push({
        line: record.line,
        issues: parsed.issues.map((issue) => (issue.column in flat ? { ...issue, value: flat[issue.column].trim() } : issue)),
      });
      continue;
    }
    const key = spec.keyOf(parsed.row);
    const first = firstLineOfKey.get(key);
    if (first !== undefined) {
      rejected.push({ line: record.line, issues: [{ column: "(row)", message: `repeats the row "${key}" already given on line ${first}` }] });
      continue;
    }
    firstLineOfKey.set(key, record.line);
    rows.push(parsed.row);
  }
  return { table, rows, rejected, fileError: null, lineCount: data.length };
}

// Spreadsheet programs run a cell that begins with = + - @ (or a tab or carriage return) as a formula.
const FORMULA_START = /^[=+\-@\t\r]/;
// A cell already written with our quote (one or more) before such a character.
const QUOTED_FORMULA_START = /^'+[=+\-@\t\r]/;

/**
 * A cell as written to a CSV file: one that a spreadsheet would run as a formula gets a leading single quote,
 * the usual way to make it text ("=HYPERLINK(…)" → "'=HYPERLINK(…)"). A plain number is left alone, so a
 * negative value stays a number in the spreadsheet ("-12.5" is not a formula). A cell that already begins
 * with quotes before such a character gets one more, so restoreCell gives back exactly what was exported.
 */
export function neutraliseCell(cell: string): string {
  if (NUMBER_TEXT.test(cell)) return cell;
  return FORMULA_START.test(cell) || QUOTED_FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/** Undoes neutraliseCell on a cell read from a CSV file: one leading quote before a formula character goes. */
export function restoreCell(cell: string): string {
  return QUOTED_FORMULA_START.test(cell) ? cell.slice(1) : cell;
}

/** One table as a CSV file, in the format parseTableCsv reads back unchanged; formula-like cells neutralized. */
export function tableToCsv<K extends TableKey>(table: K, rows: TableRowMap[K][]): string {
  const fields = expectedHeader(table);
  const data = rows.map((row) => {
    const flat = rowToFlat(table, row);
    return fields.map((name) => neutraliseCell(flat[name]));
  });
  return `${Papa.unparse({ fields, data }, { newline: "\n" })}\n`;
}

/** "line 3, Fb_psi: Fb must be at most 10,000 psi (got 90000)" */
export function describeRejectedLine(rejected: CsvRejectedLine): string {
  return `line ${rejected.line}, ${rejected.issues
    .map((i) => `${i.column === "(row)" ? "" : `${i.column}: `}${i.message}${i.value !== undefined && i.value !== "" ? ` (got ${i.value})` : ""}`)
    .join("; ")}`;
}
