import { describe, expect, test } from "vitest";
import { expectedHeader, parseTableCsv } from "@/lib/tables/csv/format";

// A CSV line with several problems lists every one of them, each once (no database).

const VALUES_HEADER = expectedHeader("sawn-values").join(",");
const DFL_NO2 = "Douglas Fir-Larch,No.2,dimension,,900,575,180,625,1350,1600000,580000,0.5,NDS Supplement 2018 Table 4A";

describe("every problem of a line, once each", () => {
  test("a word for a number, an unknown species and Fb out of range on one line: three issues, one per column", () => {
    const line = DFL_NO2.replace(",575,", ",lots,").replace("Douglas Fir-Larch", "Oak").replace(",900,", ",90000,");
    const result = parseTableCsv("sawn-values", `${VALUES_HEADER}\n${line}\n`);
    expect(result.rejected).toHaveLength(1);
    const columns = result.rejected[0].issues.map((i) => i.column).sort();
    expect(columns).toEqual(["Fb_psi", "Ft_psi", "species"]);
  });

  test("the same bad value twice in a list is one issue, and no message repeats", () => {
    const header = expectedHeader("stock-lengths").join(",");
    const result = parseTableCsv("stock-lengths", `${header}\nsawn,8;abc;abc;12\n`);
    expect(result.rejected).toHaveLength(1);
    const texts = result.rejected[0].issues.map((i) => `${i.column}: ${i.message}`);
    expect(new Set(texts).size).toBe(texts.length);
    expect(texts).toHaveLength(1);
    expect(texts[0]).toMatch(/^lengths_ft: Stock lengths must be a plain number/);
  });

  test("a blank required value and a bad one elsewhere are both listed", () => {
    const line = DFL_NO2.replace(",180,", ",,").replace(",1350,", ",x,");
    const result = parseTableCsv("sawn-values", `${VALUES_HEADER}\n${line}\n`);
    const columns = result.rejected[0].issues.map((i) => i.column).sort();
    expect(columns).toEqual(["Fc_psi", "Fv_psi"]);
  });
});
