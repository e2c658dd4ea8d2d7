import { describe, expect, test } from "vitest";
import { STARTER_TABLES } from "@/lib/tables";
import fc from "fast-check";
import {
  csvIsClean,
  describeRejectedLine,
  expectedHeader,
  MAX_CSV_BYTES,
  neutraliseCell,
  parseTableCsv,
  restoreCell,
  tableToCsv,
} from "@/lib/tables/csv/format";
import { CsvUploadError, readCsvUpload } from "@/lib/tables/csv/upload";
import { tablesToRows } from "@/lib/tables/db/rows";
import { rowsOf, tablesProblems } from "@/lib/tables/db/validate";
import { parseFlatRow, TABLE_KEYS, type TableKey } from "@/lib/tables/schemas";

// CSV files of the material tables and the row schemas behind them (no database).

const VALUES_HEADER = expectedHeader("sawn-values").join(",");
const DFL_NO2 = "Douglas Fir-Larch,No.2,dimension,,900,575,180,625,1350,1600000,580000,0.5,NDS Supplement 2018 Table 4A";
const HF_NO2 = "Hem-Fir,No.2,dimension,,850,525,150,405,1300,1300000,470000,0.43,NDS Supplement 2018 Table 4A";

describe("parseTableCsv", () => {
  test("a good file gives every row, typed", () => {
    const result = parseTableCsv("sawn-values", `${VALUES_HEADER}\n${DFL_NO2}\n${HF_NO2}\n`);
    expect(csvIsClean(result)).toBe(true);
    expect(result.rows).toHaveLength(2);
    expect(result.rows[0]).toMatchObject({ species: "Douglas Fir-Larch", grade: "No.2", Fb: 900, E: 1_600_000, G: 0.5 });
    expect(result.rows[0]).not.toHaveProperty("nominalDepth");
  });

  test("Fb of 90,000 psi is refused, naming the line and the column", () => {
    const bad = DFL_NO2.replace(",900,", ",90000,");
    const result = parseTableCsv("sawn-values", `${VALUES_HEADER}\n${HF_NO2}\n${bad}\n`);
    expect(csvIsClean(result)).toBe(false);
    expect(result.rejected).toEqual([{ line: 3, issues: [{ column: "Fb_psi", message: "Fb must be at most 10,000 psi", value: "90000" }] }]);
    expect(describeRejectedLine(result.rejected[0])).toBe("line 3, Fb_psi: Fb must be at most 10,000 psi (got 90000)");
  });

  test.each([
    ["a word for a number", DFL_NO2.replace(",575,", ",lots,"), "Ft_psi", /plain number/],
    ["a thousands separator", DFL_NO2.replace(",1600000,", ',"1,600,000",'), "E_psi", /plain number/],
    ["an unknown species", DFL_NO2.replace("Douglas Fir-Larch", "Oak"), "species", /one of/],
    ["Emin above E", DFL_NO2.replace(",580000,", ",1700000,"), "Emin_psi", /less than E/],
    ["a blank required value", DFL_NO2.replace(",180,", ",,"), "Fv_psi", /required/],
  ])("%s is rejected with its column", (_label, line, column, message) => {
    const result = parseTableCsv("sawn-values", `${VALUES_HEADER}\n${line}\n`);
    expect(result.rejected).toHaveLength(1);
    expect(result.rejected[0].line).toBe(2);
    expect(result.rejected[0].issues[0].column).toBe(column);
    expect(result.rejected[0].issues[0].message).toMatch(message);
  });

  test("every bad line is listed by its own number, counting blank lines and quoted line breaks", () => {
    const text = [
      VALUES_HEADER,
      DFL_NO2,
      "",
      HF_NO2.replace(",850,", ",-5,"),
      DFL_NO2.replace("NDS Supplement 2018 Table 4A", '"NDS Supplement 2018\nTable 4A"').replace(",No.2,", ",No.1,"),
      "Hem-Fir,No.2",
    ].join("\r\n");
    const result = parseTableCsv("sawn-values", text);
    expect(result.rejected.map((r) => r.line)).toEqual([4, 7]);
    expect(result.rejected[1].issues[0].message).toMatch(/2 values/);
    expect(result.rows).toHaveLength(2);
  });

  test("a row repeated in one file is rejected on its second line", () => {
    const result = parseTableCsv("sawn-values", `${VALUES_HEADER}\n${DFL_NO2}\n${DFL_NO2}\n`);
    expect(result.rejected).toEqual([{ line: 3, issues: [{ column: "(row)", message: expect.stringMatching(/already given on line 2/) }] }]);
  });

  test.each([
    ["an empty file", "", /empty/],
    ["a header only", `${VALUES_HEADER}\n`, /no rows/],
    ["another table's header", `${expectedHeader("steel-grades").join(",")}\nA36,36,58\n`, /missing columns species/],
    ["an extra column", `${VALUES_HEADER},color\n${DFL_NO2},red\n`, /unknown column color/],
    ["an unclosed quote", `${VALUES_HEADER}\n"Douglas Fir-Larch,No.2\n`, /not valid CSV/],
    ["a binary-looking text", "\u0001\u0002PNG\n", /does not match/],
  ])("%s is refused as a whole file", (_label, text, message) => {
    const result = parseTableCsv("sawn-values", text);
    expect(result.fileError).toMatch(message);
    expect(result.rows).toEqual([]);
    expect(csvIsClean(result)).toBe(false);
  });

  test("columns may come in any order and the file may start with a byte order mark", () => {
    const header = expectedHeader("steel-grades");
    const result = parseTableCsv("steel-grades", `\uFEFF${[...header].reverse().join(",")}\n65,50,A992\n`);
    expect(result.rows).toEqual([{ name: "A992", Fy: 50, Fu: 65 }]);
  });

  test.each(TABLE_KEYS.map((k) => [k]))("%s: the starter table downloads and reads back unchanged", (table: TableKey) => {
    const rows = rowsOf(tablesToRows(STARTER_TABLES), table);
    const result = parseTableCsv(table, tableToCsv(table, rows));
    expect(result.fileError).toBeNull();
    expect(result.rejected).toEqual([]);
    expect(result.rows).toEqual(rows);
  });
});

describe("row schemas", () => {
  test("the starter tables pass every schema, with no repeated keys", () => {
    expect(tablesProblems(tablesToRows(STARTER_TABLES))).toEqual([]);
  });

  // A dressed 2x10 is 1.5 x 9.25 in (NDS Supplement 2018, Table 1B); the section properties are computed here.
  const b = 1.5;
  const d = 9.25;
  const good = { name: "2x10", nominal_thickness_in: "2", nominal_depth_in: "10", b_in: `${b}`, d_in: `${d}`, size_class: "dimension" };
  test.each([
    ["exact b·d, b·d²/6, b·d³/12", b * d, (b * d * d) / 6, (b * d ** 3) / 12, []],
    ["Sx entered as b·d³/12 by mistake", b * d, (b * d ** 3) / 12, (b * d ** 3) / 12, ["Sx_in3"]],
    ["A 1% off", b * d * 1.01, (b * d * d) / 6, (b * d ** 3) / 12, ["A_in2"]],
  ])("a sawn size with %s", (_label, A, Sx, Ix, columns) => {
    const parsed = parseFlatRow("sawn-sizes", { ...good, A_in2: `${A}`, Sx_in3: `${Sx}`, Ix_in4: `${Ix}` });
    expect(parsed.ok ? [] : parsed.issues.map((i) => i.column)).toEqual(columns);
  });

  test("a W-shape whose weight does not match its area at 490 lb/ft³ is refused", () => {
    // W8x18: A 5.26 in² → 5.26 × 490 / 144 = 17.9 lb/ft (AISC Shapes Database v15.0); 81 lb/ft is a slipped digit.
    const shape = STARTER_TABLES.steel.find((s) => s.name === "W8x18");
    if (!shape) throw new Error("no W8x18 in the starter tables");
    expect(Math.abs((shape.A * 490) / 144 - shape.W) / shape.W).toBeLessThan(0.02);
    expect(parseTableCsv("steel-shapes", tableToCsv("steel-shapes", [shape])).rejected).toEqual([]);
    const result = parseTableCsv("steel-shapes", tableToCsv("steel-shapes", [{ ...shape, W: 81 }]));
    expect(result.rejected[0].issues).toEqual([expect.objectContaining({ column: "W_plf", message: expect.stringMatching(/490/) })]);
  });

  test("engineered rows carry their size rule through the flat columns", () => {
    const lvl = STARTER_TABLES.engineered.find((p) => p.kind === "LVL");
    if (!lvl) throw new Error("no LVL in the starter tables");
    const text = tableToCsv("engineered", [lvl]).replace(",depth,12,", ",depth,,");
    const result = parseTableCsv("engineered", text);
    expect(result.rejected[0].issues.map((i) => i.column)).toEqual(["size_ref_depth_in"]);
  });
});

describe("readCsvUpload", () => {
  const file = (content: BlobPart, name: string, type: string) => new File([content], name, { type });

  test("a CSV file is read as text", async () => {
    expect(await readCsvUpload(file("a,b\n1,2\n", "grades.csv", "text/csv"))).toBe("a,b\n1,2\n");
    expect(await readCsvUpload(file("a,b\n", "grades.txt", "text/csv"))).toBe("a,b\n");
    expect(await readCsvUpload(file("a,b\n", "GRADES.CSV", ""))).toBe("a,b\n");
  });

  test.each([
    ["larger than 1 MB", () => file("x".repeat(MAX_CSV_BYTES + 1), "big.csv", "text/csv"), 413],
    ["an image", () => file(new Uint8Array([0x89, 0x50, 0x4e, 0x47]), "photo.png", "image/png"), 415],
    ["binary named .csv", () => file(new Uint8Array([0x61, 0x00, 0x62]), "table.csv", "text/csv"), 415],
    ["not UTF-8", () => file(new Uint8Array([0x61, 0xff, 0xfe, 0x62]), "table.csv", "text/csv"), 415],
    ["empty", () => file("", "table.csv", "text/csv"), 400],
  ])("a file %s is refused", async (_label, make, status) => {
    const error = await readCsvUpload(make()).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(CsvUploadError);
    expect((error as CsvUploadError).status).toBe(status);
  });
});

describe("formula-like cells in downloaded CSV", () => {
  // OWASP "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): cells beginning with = + - @, tab or
  // carriage return are run as formulas by spreadsheet programs; prefixing a single quote makes them text.
  test.each([
    ['=HYPERLINK("http://evil.example","table")', '\'=HYPERLINK("http://evil.example","table")'],
    ["+SUM(1,2)", "'+SUM(1,2)"],
    ["-2+3+cmd|' /C calc'!A0", "'-2+3+cmd|' /C calc'!A0"],
    ["@SUM(1,2)", "'@SUM(1,2)"],
    ["\t=1+1", "'\t=1+1"],
    ["\r=1+1", "'\r=1+1"],
    ["-", "'-"],
    ["'=1+1 (already quoted once)", "''=1+1 (already quoted once)"],
  ])("%j is written as %j", (cell, written) => {
    expect(neutraliseCell(cell)).toBe(written);
    expect(restoreCell(written)).toBe(cell);
  });

  test.each([
    ["a negative number stays a number", "-12.5"],
    ["a negative number in scientific notation", "-1.5e-3"],
    ["a signed positive number", "+4"],
    ["a species name with a hyphen inside", "Douglas Fir-Larch"],
    ["a quote not before a formula character", "'No.2"],
    ["blank", ""],
  ])("%s is written as it is", (_label, cell) => {
    expect(neutraliseCell(cell)).toBe(cell);
    expect(restoreCell(cell)).toBe(cell);
  });

  test("restoreCell(neutraliseCell(x)) is x for any text (property, fast-check)", () => {
    const risky = fc.tuple(fc.constantFrom("", "'", "''"), fc.constantFrom("", "=", "+", "-", "@", "\t", "\r"), fc.string());
    fc.assert(
      fc.property(risky, ([quotes, lead, rest]) => {
        const cell = `${quotes}${lead}${rest}`;
        const written = neutraliseCell(cell);
        expect(restoreCell(written)).toBe(cell);
        // what a spreadsheet sees never starts a formula
        expect(/^[=+\-@\t\r]/.test(written) && !/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(written)).toBe(false);
      }),
      { numRuns: 500 },
    );
  });

  test("a downloaded table with formula-like text reads back to the same rows", () => {
    const rows = rowsOf(tablesToRows(STARTER_TABLES), "sawn-values").slice(0, 3);
    const tricky = [
      { ...rows[0], source: '=HYPERLINK("http://evil.example","NDS")' },
      { ...rows[1], source: "-see NDS Supplement 2018 Table 4A" },
      { ...rows[2], source: "@NDS 2018" },
    ];
    const csv = tableToCsv("sawn-values", tricky);
    const lines = csv.trim().split("\n").slice(1);
    expect(lines[0]).toContain(`"'=HYPERLINK(""http://evil.example"",""NDS"")"`);
    expect(lines[1]).toContain(",'-see NDS");
    expect(lines[2]).toContain(",'@NDS 2018");
    for (const line of lines) expect(line.split(",").some((cell) => /^[=+@]/.test(cell))).toBe(false);
    const back = parseTableCsv("sawn-values", csv);
    expect(back.rejected).toEqual([]);
    expect(back.rows).toEqual(tricky);
  });

  test("a number quoted by another program's escaping is read as the number, and checked as one", () => {
    // A spreadsheet or tool that quotes every leading "-" turns -5 into '-5: the import undoes it, so the bound
    // check (not the "plain number" check) answers, and names the value it read.
    const result = parseTableCsv("sawn-values", `${VALUES_HEADER}\n${HF_NO2.replace(",850,", ",'-5,")}\n`);
    expect(result.rejected).toHaveLength(1);
    expect(result.rejected[0].issues[0]).toMatchObject({ column: "Fb_psi", value: "-5" });
    expect(result.rejected[0].issues[0].message).not.toMatch(/plain number/);
  });

  test("every starter table still downloads and reads back unchanged", () => {
    const rows = tablesToRows(STARTER_TABLES);
    for (const table of TABLE_KEYS) {
      const back = parseTableCsv(table, tableToCsv(table, rowsOf(rows, table)));
      expect(back.rejected).toEqual([]);
      expect(back.rows).toEqual(rowsOf(rows, table));
    }
  });
});
