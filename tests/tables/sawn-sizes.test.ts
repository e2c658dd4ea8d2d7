import { describe, expect, test } from "vitest";
import { findSawnSize, STARTER_TABLES } from "@/lib/tables";

// NDS Supplement 2018 Table 1B, "Section Properties of Standard Dressed (S4S) Sawn Lumber":
// dressed b x d (in), A (in²), Sxx (in³), Ixx (in⁴) as printed. From memory of the printed
// table — verify against it. Table 1B prints 4 significant figures, so a value computed from
// b and d must land within half a unit of the 4th figure: at most 0.05% of the value.
const TABLE_1B: [name: string, b: number, d: number, A: number, Sx: number, Ix: number][] = [
  ["2x4", 1.5, 3.5, 5.25, 3.063, 5.359],
  ["2x6", 1.5, 5.5, 8.25, 7.563, 20.8],
  ["2x8", 1.5, 7.25, 10.88, 13.14, 47.63],
  ["2x10", 1.5, 9.25, 13.88, 21.39, 98.93],
  ["2x12", 1.5, 11.25, 16.88, 31.64, 178.0],
  ["4x6", 3.5, 5.5, 19.25, 17.65, 48.53],
  ["4x8", 3.5, 7.25, 25.38, 30.66, 111.1],
  ["4x10", 3.5, 9.25, 32.38, 49.91, 230.8],
  ["4x12", 3.5, 11.25, 39.38, 73.83, 415.3],
  ["6x10", 5.5, 9.5, 52.25, 82.73, 393.0],
  ["6x12", 5.5, 11.5, 63.25, 121.2, 697.1],
];

const FOURTH_FIGURE = 0.0005;

describe("dressed sizes against NDS Supplement 2018 Table 1B", () => {
  test("the tables hold exactly the Table 1B sizes listed here", () => {
    expect(STARTER_TABLES.sawnSizes.map((s) => s.name)).toEqual(TABLE_1B.map(([name]) => name));
  });

  test.each(TABLE_1B)("%s is %f x %f in dressed, A %f, Sx %f, Ix %f as printed", (name, b, d, A, Sx, Ix) => {
    const size = findSawnSize(STARTER_TABLES, name);
    expect(size.b).toBe(b);
    expect(size.d).toBe(d);
    expect(Math.abs(size.A - A) / A).toBeLessThanOrEqual(FOURTH_FIGURE);
    expect(Math.abs(size.Sx - Sx) / Sx).toBeLessThanOrEqual(FOURTH_FIGURE);
    expect(Math.abs(size.Ix - Ix) / Ix).toBeLessThanOrEqual(FOURTH_FIGURE);
  });
});

describe("dressed sizes against physics", () => {
  // Rectangle b x d about its strong axis: A = b·d, S = b·d²/6, I = b·d³/12.
  test.each(STARTER_TABLES.sawnSizes.map((s) => [s.name, s] as const))("%s: A = b·d, Sx = b·d²/6, Ix = b·d³/12", (_, s) => {
    expect(s.A).toBeCloseTo(s.b * s.d, 10);
    expect(s.Sx).toBeCloseTo((s.b * s.d * s.d) / 6, 10);
    expect(s.Ix).toBeCloseTo((s.b * s.d ** 3) / 12, 10);
  });

  // American Softwood Lumber Standard PS 20 dry dressed sizes (common practice): 2 → 1-1/2,
  // 4 → 3-1/2, 6 → 5-1/2; depths 4 → 3-1/2, 6 → 5-1/2, 8 and up → 3/4 less for dimension
  // lumber, 1/2 less for timbers 5 in and thicker.
  test.each(STARTER_TABLES.sawnSizes.map((s) => [s.name, s] as const))("%s dresses as PS 20 gives", (_, s) => {
    const timber = s.nominalThickness >= 5;
    const b = s.nominalThickness - 0.5;
    const d = timber ? s.nominalDepth - 0.5 : s.nominalDepth <= 6 ? s.nominalDepth - 0.5 : s.nominalDepth - 0.75;
    expect(s.b).toBe(b);
    expect(s.d).toBe(d);
    expect(s.sizeClass).toBe(timber ? "beams-stringers" : "dimension");
  });
});
