import { describe, expect, test } from "vitest";
import { flatUseFactorCfu, wetServiceFactorCM } from "@/lib/solver/nds/nds-2018";

// The adjustment factors printed beside the NDS Supplement 2018 design value tables, checked against
// open-source published copies read with the search tool. The factors live with the NDS rules in
// lib/solver/nds; their sources are the tables' footnotes, so the checks sit with the tables.

describe("wet service factor CM (NDS Supplement 2018 Tables 4A, 4B, 4D, 5A)", () => {
  // Table 4A footnote, as Kodestruct's NDS wet service code (GetDimensionalLumberC_M, "when (Fb)(CF)
  // ≤ 1,150 psi, CM = 1.0") and xcfem/xc dimensional_lumber.py reproduce it: Fb 0.85 unless
  // Fb·CF ≤ 1,150 psi, Fv 0.97, Fc⊥ 0.67, E and Emin 0.9.
  test.each([
    [990, 1.0],
    [1150, 1.0],
    [1151, 0.85],
    [1500, 0.85],
  ])("Table 4A: Fb·CF = %i psi → CM for Fb %f; Fv 0.97, Fc⊥ 0.67, E 0.9", (fbcf, fb) => {
    expect(wetServiceFactorCM("4A", true, fbcf)).toEqual({ Fb: fb, Fv: 0.97, FcPerp: 0.67, E: 0.9 });
  });

  // Table 4B (Southern Pine): the footnote's own wording could not be read in any stored copy (searched
  // for "when Fb ≤ 1,150 psi" and its variants). Kodestruct applies the Table 4A rule to Table 4B. So
  // Spanlark keeps testing Fb·CF against 1,150 psi, the reading that never gives the larger factor: for
  // a No.1 4x10 (Fb 1,050 psi, CF 1.1 for 4" thick 8" and wider) that is 1,155 psi → 0.85.
  test("Table 4B: Southern Pine No.1 4x10 wet keeps CM = 0.85 on Fb (Fb·CF = 1,050 × 1.1 = 1,155 psi)", () => {
    expect(1050 * 1.1).toBeGreaterThan(1150);
    expect(wetServiceFactorCM("4B", true, 1050 * 1.1).Fb).toBe(0.85);
    expect(wetServiceFactorCM("4B", true, 1050).Fb).toBe(1.0);
  });

  // Table 4D (timbers 5"x5" and larger), as Kodestruct (GetTimberC_M) and xcfem/xc
  // (getWetServiceFactor, sawn lumber) reproduce it: Fb, Fv, E 1.0; Fc⊥ 0.67 (Fc 0.91 not used here).
  test("Table 4D: Fb 1.0, Fv 1.0, Fc⊥ 0.67, E 1.0", () => {
    expect(wetServiceFactorCM("4D", true)).toEqual({ Fb: 1.0, Fv: 1.0, FcPerp: 0.67, E: 1.0 });
  });

  // Table 5A (glulam), as xcfem/xc getWetServiceFactor reproduces it (moisture content 16% or more):
  // Fb 0.8, Fv 0.875, Fc⊥ 0.53, E and Emin 0.833.
  test("Table 5A glulam: Fb 0.8, Fv 0.875, Fc⊥ 0.53, E 0.833", () => {
    expect(wetServiceFactorCM("glulam", true)).toEqual({ Fb: 0.8, Fv: 0.875, FcPerp: 0.53, E: 0.833 });
  });

  test("dry service: every factor 1.0", () => {
    for (const t of ["4A", "4B", "4D", "glulam"] as const) expect(wetServiceFactorCM(t, false, 5000)).toEqual({ Fb: 1, Fv: 1, FcPerp: 1, E: 1 });
  });
});

describe("flat use factor Cfu (NDS Supplement 2018 Table 4A)", () => {
  // As xcfem/xc dimensional_lumber.py reproduces it (flat_use_y3 for 2" & 3" thick, flat_use_y4 for
  // 4" thick), by nominal width. The 4" thick, 10" and wider entry is left out: that published copy reads
  // 1.05 at 10" rising to 1.1 beyond, Spanlark holds 1.1 (from memory). Spanlark bends every member
  // edgewise, so Cfu is 1.0 in every answer today; the entry stays flagged in the report until read.
  test.each([
    [2, 1.0, 1.0],
    [3, 1.0, 1.0],
    [4, 1.1, 1.0],
    [5, 1.1, 1.05],
    [6, 1.15, 1.05],
    [8, 1.15, 1.05],
    [10, 1.2, null],
    [12, 1.2, null],
  ])('width %i in: %f (2" & 3" thick), %s (4" thick)', (width, thin, thick) => {
    expect(flatUseFactorCfu(width, 2, true)).toBe(thin);
    if (thick !== null) expect(flatUseFactorCfu(width, 4, true)).toBe(thick);
    expect(flatUseFactorCfu(width, 2, false)).toBe(1.0);
  });
});
