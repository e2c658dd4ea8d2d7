import { describe, expect, test } from "vitest";
import {
  bearingAreaFactorCb,
  beamStabilityFactorCL,
  criticalBucklingFbE,
  effectiveLengthLe,
  loadDurationFactorCD,
  repetitiveMemberFactorCr,
  slendernessRatioRB,
  volumeFactorCV,
  wetServiceFactorCM,
  woodDensity,
  timeEffectFactorLambda,
  incisingFactorCi,
  sizeFactorBeamsCF,
} from "@/lib/solver/nds/nds-2018";
import { resolveMember } from "@/lib/solver/design/member";
import { STARTER_TABLES } from "@/lib/tables";
import type { WoodMember } from "@/lib/solver/design/member";

describe("NDS 2018 factors", () => {
  // NDS 2018 Table 2.3.2: permanent 0.9, ten years 1.0, two months (snow) 1.15, seven days (roof live) 1.25, ten minutes (wind) 1.6.
  test.each([
    ["D", { D: 1 }, 0.9],
    ["D+L", { D: 1, L: 1 }, 1.0],
    ["D+0.7S", { D: 1, S: 0.7 }, 1.15],
    ["D+0.75L+0.525S", { D: 1, L: 0.75, S: 0.525 }, 1.15],
    ["D+Lr", { D: 1, Lr: 1 }, 1.25],
    ["0.6D+0.6W", { D: 0.6, W: 0.6 }, 1.6],
    ["S factor 0 is not present", { D: 1, L: 1, S: 0 }, 1.0],
  ])("CD of %s (NDS 2018 §2.3.2, shortest duration governs)", (_n, f, cd) => {
    expect(loadDurationFactorCD(f)).toBe(cd);
  });

  test("CD table is a parameter a local code may change", () => {
    expect(loadDurationFactorCD({ D: 1, S: 1 }, { D: 0.9, L: 1, S: 1.0, Lr: 1.25, W: 1.6 })).toBe(1.0);
  });

  // NDS 2018 Table N3 (time effect factor λ), the three rows the tool uses.
  test.each([
    ["1.4D", { D: 1.4 }, 0.6],
    ["1.2D+1.6L", { D: 1.2, L: 1.6 }, 0.8],
    ["1.2D+1.0W+L", { D: 1.2, W: 1, L: 1 }, 1.0],
  ])("λ of %s (NDS 2018 Table N3)", (_n, f, lambda) => {
    expect(timeEffectFactorLambda(f)).toBe(lambda);
  });

  // NDS Supplement 2018 Table 4A adjustment factors: wet service CM, Fb 0.85 unless Fb·CF ≤ 1150 psi.
  test.each([
    ["Fb·CF 990 psi keeps CM = 1.0 on Fb", 990, 1.0],
    ["Fb·CF 1650 psi takes 0.85", 1650, 0.85],
  ])("CM wet, Table 4A: %s", (_n, fbcf, cm) => {
    const f = wetServiceFactorCM("4A", true, fbcf);
    expect(f.Fb).toBe(cm);
    expect(f).toMatchObject({ Fv: 0.97, FcPerp: 0.67, E: 0.9 });
  });

  test("Ci for incised dimension lumber, NDS 2018 Table 4.3.8", () => {
    expect(incisingFactorCi(true)).toEqual({ Fb: 0.8, Fv: 0.8, FcPerp: 1.0, E: 0.95 });
  });

  // NDS 2018 §4.3.9: 3 or more members in contact qualify by themselves; 1–2 plies need the repetitive system.
  test.each([
    [1, true, 16, 1.15],
    [1, true, 32, 1.0],
    [1, false, undefined, 1.0],
    [2, false, undefined, 1.0],
    [3, false, undefined, 1.15],
    [4, false, undefined, 1.15],
  ])("Cr for %i plies, repetitive %s, spacing %s in", (plies, rep, spacing, cr) => {
    expect(repetitiveMemberFactorCr({ dimensionLumber: true, plies, repetitiveSystem: rep, spacingIn: spacing })).toBe(cr);
  });

  // NDS 2018 Table 3.3.3 footnote 1 (any loading): the three ranges of lu/d.
  test.each([
    [5 * 12, 11.25, 2.06 * 60],
    [8 * 12, 11.25, 1.63 * 96 + 3 * 11.25],
    [16 * 12, 9.25, 1.84 * 192],
  ])("le for lu = %f in, d = %f in (NDS 2018 Table 3.3.3)", (lu, d, le) => {
    expect(effectiveLengthLe(lu, d)).toBeCloseTo(le, 9);
  });

  test("CL for a 3-ply 2x12 DF-L No.2 header braced at 4 ft, by NDS 2018 Eqs. 3.3-5 and 3.3-6 worked here", () => {
    // lu = 48 in, d = 11.25, lu/d = 4.27 < 7 → le = 2.06 × 48 = 98.88 in; b = 4.5 in
    const le = 2.06 * 48;
    const RB = Math.sqrt((le * 11.25) / (4.5 * 4.5));
    const Emin = 580_000; // NDS Supplement 2018 Table 4A, DF-L No.2 (from memory)
    const FbE = (1.2 * Emin) / (RB * RB);
    const FbStar = 900 * 1.0 * 1.0 * 1.15; // Fb CD CF(2x12) Cr
    const ratio = FbE / FbStar;
    const CL = (1 + ratio) / 1.9 - Math.sqrt(((1 + ratio) / 1.9) ** 2 - ratio / 0.95);
    expect(slendernessRatioRB(effectiveLengthLe(48, 11.25), 11.25, 4.5)).toBeCloseTo(RB, 9);
    expect(criticalBucklingFbE(Emin, RB)).toBeCloseTo(FbE, 6);
    expect(beamStabilityFactorCL(FbStar, FbE)).toBeCloseTo(CL, 9);
    expect(CL).toBeGreaterThan(0.95);
    expect(CL).toBeLessThan(1);
  });

  test("CL falls with slenderness and never exceeds 1.0", () => {
    let last = 1;
    for (const RB of [5, 10, 20, 30, 40, 50]) {
      const cl = beamStabilityFactorCL(1000, criticalBucklingFbE(580_000, RB));
      expect(cl).toBeLessThanOrEqual(last);
      last = cl;
    }
  });

  // NDS 2018 §3.10.4, Eq. 3.10-2 and its table of Cb (0.5 in 1.75, 1 in 1.38, 1.5 in 1.25, 2 in 1.19, 3 in 1.13, 4 in 1.10, 6 in or more 1.00).
  test.each([
    [0.5, 1.75],
    [1, 1.375],
    [1.5, 1.25],
    [2, 1.1875],
    [3, 1.125],
    [4, 1.09375],
    [6, 1.0],
  ])("Cb for lb = %f in away from the end", (lb, cb) => {
    expect(bearingAreaFactorCb(lb, 12)).toBeCloseTo(cb, 6);
  });

  test("Cb is 1.0 within 3 in of the member end (NDS 2018 §3.10.4)", () => {
    expect(bearingAreaFactorCb(1.5, 0)).toBe(1);
  });

  test("CV for a 5-1/8 x 18 glulam over 24 ft, NDS 2018 Eq. 5.3-1", () => {
    expect(volumeFactorCV(24, 18, 5.125, 10)).toBeCloseTo(((21 / 24) * (12 / 18)) ** 0.1, 9);
    expect(volumeFactorCV(10, 9, 3.125, 10)).toBe(1);
  });

  test("CF for beams and stringers deeper than 12 in, NDS 2018 Eq. 4.3-1", () => {
    expect(sizeFactorBeamsCF(13.5)).toBeCloseTo((12 / 13.5) ** (1 / 9), 9);
    expect(sizeFactorBeamsCF(11.5)).toBe(1);
  });

  test("density of Douglas Fir-Larch (G = 0.50) at 19 % moisture, NDS Supplement 2018 §3.1.3 formula", () => {
    expect(woodDensity(0.5, 19)).toBeCloseTo(62.4 * (0.5 / (1 + 0.5 * 0.009 * 19)) * 1.19, 9);
    expect(woodDensity(0.5, 19)).toBeCloseTo(34.2, 1);
  });
});

describe("reference values read through the design member (NDS Supplement 2018)", () => {
  const wood = (spec: Parameters<typeof resolveMember>[0]) => resolveMember(spec, STARTER_TABLES) as WoodMember;

  // NDS Supplement 2018 Table 4A, dimension lumber, values from memory; size factors from the same table.
  test.each([
    ["Douglas Fir-Larch", "No.2", "2x10", 900, 180, 625, 1_600_000, 580_000, 1.1],
    ["Douglas Fir-Larch", "Select Structural", "2x8", 1500, 180, 625, 1_900_000, 690_000, 1.2],
    ["Douglas Fir-Larch", "No.1", "2x12", 1000, 180, 625, 1_700_000, 620_000, 1.0],
    ["Hem-Fir", "No.2", "2x10", 850, 150, 405, 1_300_000, 470_000, 1.1],
    ["Spruce-Pine-Fir", "No.2", "2x6", 875, 135, 425, 1_400_000, 510_000, 1.3],
    ["Douglas Fir-Larch", "No.2", "4x10", 900, 180, 625, 1_600_000, 580_000, 1.2],
  ])("%s %s %s: Fb %i, Fv %i, Fc⊥ %i, E %i, Emin %i, CF %f (Table 4A)", (species, grade, size, Fb, Fv, Fc, E, Emin, CF) => {
    const m = wood({ material: "sawn", species, grade, size, plies: 1 });
    expect(m).toMatchObject({ Fb, Fv, FcPerp: Fc, E, Emin });
    expect(m.CF).toBe(CF);
  });

  // NDS Supplement 2018 Table 4B (Southern Pine, values by width with size already included), from memory.
  test.each([
    ["No.2", "2x10", 800, 1_400_000],
    ["No.2", "2x8", 925, 1_400_000],
    ["Select Structural", "2x10", 1700, 1_800_000],
  ])("Southern Pine %s %s: Fb %i, E %i, CF 1.0 (Table 4B)", (grade, size, Fb, E) => {
    const m = wood({ material: "sawn", species: "Southern Pine", grade, size, plies: 1 });
    expect(m.Fb).toBe(Fb);
    expect(m.E).toBe(E);
    expect(m.CF).toBe(1);
  });

  // NDS Supplement 2018 Table 1B section properties (A, Sx, Ix as printed, to their rounding).
  test.each([
    ["2x8", 10.88, 13.14, 47.63],
    ["2x10", 13.88, 21.39, 98.93],
    ["2x12", 16.88, 31.64, 177.98],
    ["4x10", 32.38, 49.91, 230.84],
  ])("section of %s: A %f, Sx %f, Ix %f (Table 1B)", (size, A, S, I) => {
    const m = wood({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size, plies: 1 });
    expect(m.A).toBeCloseTo(A, 1);
    expect(m.S).toBeCloseTo(S, 1);
    expect(m.I).toBeCloseTo(I, 1);
  });

  test("a 3-ply 2x12 multiplies the section by three", () => {
    const m = wood({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12", plies: 3 });
    expect(m.b).toBe(4.5);
    expect(m.S).toBeCloseTo((3 * (1.5 * 11.25 ** 2)) / 6, 9);
    expect(m.label).toBe("3-ply 2x12 Douglas Fir-Larch No.2");
  });
});
