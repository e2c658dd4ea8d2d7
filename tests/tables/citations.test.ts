import { describe, expect, test } from "vitest";
import { STARTER_TABLES } from "@/lib/tables";
import { citationOf, distinctSources, FROM_MEMORY, isFromMemory } from "@/lib/tables/citations";
import { TABLE_SPECS } from "@/lib/tables/schemas";

// Every starter row names its table and edition, and either where it was checked or that it is from
// memory. The rows no readable copy confirmed are exactly the ones listed in lib/tables beside them.

const T = STARTER_TABLES;
const rowSources: [string, string][] = [
  ...T.sawnValues.map((v) => [`${v.species} ${v.grade} ${v.sizeClass} ${v.nominalDepth ?? ""}`, v.source] as [string, string]),
  ...T.sizeFactors.map((f) => [`CF ${f.table} ${f.nominalDepth}x${f.nominalThickness}`, f.source] as [string, string]),
  ...T.engineered.map((e) => [e.name, e.source] as [string, string]),
  ...T.steel.map((s) => [s.name, s.source] as [string, string]),
  ...T.iJoists.map((j) => [j.name, j.source] as [string, string]),
  ...(T.coldFormed ?? []).map((s) => [s.name, s.source] as [string, string]),
];

describe("every starter row cites its source", () => {
  test.each(rowSources)("%s: names a table and edition and says whether and where it was checked", (_, source) => {
    expect(source).toMatch(
      /NDS Supplement 2018, Table (4A|4B|4D|5A)|AISC Shapes Database v15\.0|typical values for this E grade|APA PRI-400|SSMA product catalog steel thickness and lip tables/,
    );
    expect(source).toMatch(/checked against|from memory — verify/);
    expect(source.length).toBeLessThanOrEqual(300);
  });

  test("tables without a source column carry one for the whole table", () => {
    expect(TABLE_SPECS["sawn-sizes"].tableSource).toMatch(/NDS Supplement 2018, Table 1B/);
    expect(TABLE_SPECS["steel-grades"].tableSource).toMatch(/Table 2-4/);
  });

  test("the flagged rows are Table 4D Hem-Fir Select Structural and No.1 beams and stringers, the glulam rows and the unchecked LVL", () => {
    const flagged = rowSources.filter(([, s]) => isFromMemory(s)).map(([name]) => name);
    const hemFirBeams = T.sawnValues.filter((v) => v.sizeClass === "beams-stringers" && v.species === "Hem-Fir").length;
    expect(hemFirBeams).toBe(3);
    // Hem-Fir No.2 was checked against a published worked problem (tests/tables/sawn-values.test.ts)
    expect(flagged.filter((n) => n.includes("beams-stringers"))).toHaveLength(hemFirBeams - 1);
    expect(flagged.some((n) => n.startsWith("Hem-Fir No.2 beams-stringers"))).toBe(false);
    expect(flagged.some((n) => n.startsWith("Douglas Fir-Larch") && n.includes("beams-stringers"))).toBe(false);
    expect(flagged.filter((n) => n.startsWith("Glulam"))).toHaveLength(T.engineered.filter((e) => e.kind === "glulam").length);
    expect(flagged).toContain("LVL 1.9E");
    expect(flagged).not.toContain("LVL 2.0E");
    expect(flagged.some((n) => n.startsWith("W"))).toBe(false);
    expect(flagged.some((n) => n.startsWith("Spruce-Pine-Fir") || n.startsWith("Southern Pine"))).toBe(false);
  });
});

describe("citation words", () => {
  test("an answer shows the citation only", () => {
    expect(citationOf("NDS Supplement 2018, Table 4A; checked against a published copy")).toBe("NDS Supplement 2018, Table 4A");
    expect(citationOf("NDS Supplement 2018, Table 4D, Beams and Stringers; from memory — verify against the printed table")).toBe(
      "NDS Supplement 2018, Table 4D, Beams and Stringers",
    );
    expect(citationOf("NDS Supplement 2018, Table 4A (from memory — verify against the printed table)")).toBe("NDS Supplement 2018, Table 4A");
    expect(citationOf("plain words")).toBe("plain words");
  });

  test("the flag reads the same everywhere", () => {
    expect(FROM_MEMORY).toBe("from memory — verify");
    expect(isFromMemory("x; From memory — verify")).toBe(true);
    expect(isFromMemory("x; checked against y")).toBe(false);
  });

  test("distinct sources: each once, flagged last", () => {
    const out = distinctSources(["b; from memory — verify", "a; checked", "b; from memory — verify", "c; checked"]);
    expect(out).toEqual([
      { source: "a; checked", fromMemory: false },
      { source: "c; checked", fromMemory: false },
      { source: "b; from memory — verify", fromMemory: true },
    ]);
  });
});
