import { describe, expect, test } from "vitest";
import { columnWords, itemWords, rowWords } from "@/components/admin/tables/words";
import { itemKey } from "@/lib/tables";
import { TABLE_SPECS } from "@/lib/tables/schemas";
import { STARTER_TABLES } from "@/lib/tables";
import { tablesToRows } from "@/lib/tables/db/rows";

// The table history names rows and columns in words, never by the internal key.

describe("history words", () => {
  test.each([
    ["sawn-values", "Douglas Fir-Larch|No.2|dimension|all", "Douglas Fir-Larch No.2, dimension lumber, every depth"],
    ["sawn-values", "Southern Pine|No.1|dimension|10", "Southern Pine No.1, dimension lumber, 10 in nominal depth"],
    ["size-factors", "4A|Select Structural;No.1|10|0", "Table 4A, Select Structural, No.1, 10 in deep"],
    ["costs", "sawn|Hem-Fir|No.2|2x10", "2x10 Hem-Fir No.2"],
    ["costs", "engineered|LVL 2.0E|1.75x11.875", "LVL 2.0E 1-3/4 x 11-7/8 in"],
    ["costs", "steel|W8x18", "W8x18 steel"],
    ["stock-lengths", "sawn", "Sawn lumber"],
    ["sawn-sizes", "2x10", "2x10"],
  ] as const)("%s %s → %s", (table, key, words) => {
    expect(rowWords(table, key)).toBe(words);
  });

  test("no starter row's words hold the | of an internal key", () => {
    const rows = tablesToRows(STARTER_TABLES);
    for (const table of Object.keys(TABLE_SPECS) as (keyof typeof TABLE_SPECS)[]) {
      for (const row of rows[table] as never[]) expect(rowWords(table, TABLE_SPECS[table].keyOf(row))).not.toContain("|");
    }
    expect(itemWords(itemKey({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12" }))).toBe("2x12 Douglas Fir-Larch No.2");
  });

  test("columns by label and unit", () => {
    expect(columnWords("sawn-values", "Fb_psi")).toMatch(/^Fb.* \(psi\)$/);
    expect(columnWords("costs", "cost_per_ft_usd")).toBe("Cost per foot ($/ft)");
  });
});
