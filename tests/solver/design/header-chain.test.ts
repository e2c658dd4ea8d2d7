import { describe, expect, test } from "vitest";
import { checkMember, type WoodFactors } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

/**
 * The whole chain on one header, worked by hand (invented job: the Alder Lane garage, a 6 ft window
 * header in the first-floor bearing wall).
 *
 * Member: 2-ply 2x10 Douglas Fir-Larch No.2, 6 ft center to center of bearing, 3 in bearing (two
 * jack studs) at each end, compression edge held by the framing above, dry, 70 °F.
 * NDS Supplement 2018 Table 4A (from memory): Fb 900, Fv 180, Fc⊥ 625, E 1,600,000 psi, CF 1.1 (2x10).
 * Section (Table 1B): b = 3.0 in, d = 9.25 in, A = 27.75 in², S = 42.78 in³, I = 197.86 in⁴.
 *
 * Loads on the header (take-down):
 *   roof dead   15 psf × 14 ft                             = 210 plf  D
 *   roof snow   pg 30 psf → pf = 0.7·1.0·1.0·1.0·30 = 21 psf (ASCE 7-22 Eq. 7.3-1); pm = 20 psf;
 *               21 psf × 14 ft                              = 294 plf  S
 *   floor dead  10 psf × 6 ft                               =  60 plf  D
 *   floor live  40 psf × 6 ft (IRC 2021 Table R301.5)       = 240 plf  L
 *   wall above  (line load)                                 =  80 plf  D
 *   own weight  ρ = 62.4·0.5/(1 + 0.5·0.009·19)·1.19 = 34.21 pcf × 27.75/144 = 6.59 plf D
 *   D = 356.59 plf, L = 240 plf, S = 294 plf
 *
 * ASCE 7-22 §2.4.1 (snow strength level, 0.7S in ASD), each with its own CD (NDS 2018 Table 2.3.2):
 *   D                     356.59 plf, CD 0.90 → w/CD = 396.2
 *   D+L                   596.59 plf, CD 1.00 → 596.6
 *   D+0.7S                562.39 plf, CD 1.15 → 489.0
 *   D+0.75L+0.525S        690.94 plf, CD 1.15 → 600.8  ← governs bending and shear
 * Bending: M = 690.94 × 6² / 8 = 3109.2 lb-ft; fb = 3109.2 × 12 / 42.78 = 872.1 psi;
 *   Fb' = 900 × 1.15 × 1.1 × Cr 1.0 (two plies) = 1138.5 psi → 0.766.
 * Shear: V = 690.94 × 3 = 2072.8 lb; fv = 1.5 × 2072.8 / 27.75 = 112.0 psi; Fv' = 180 × 1.15 = 207 → 0.541.
 * Live deflection (L, 0.7S, 0.75L+0.525S → 334.35 plf): Δ = 5wL⁴/384EI = 0.0308 in; L/360 = 0.200 in.
 * Total deflection (690.94 plf): Δ = 0.0636 in; L/240 = 0.300 in.
 * Bearing: R = 2072.8 lb; fc⊥ = 2072.8 / (3.0 × 3) = 230.3 psi vs Fc⊥' = 625 (Cb = 1.0 at the member end) → 0.369;
 *   required bearing 2072.8 / (3.0 × 625) = 1.11 in; the check used the 3 in given, so the crew builds what it
 *   assumed: two 1-1/2 in jack studs each end (common practice: one jack stud gives 1-1/2 in of bearing).
 * Reactions by case: D 1069.8 lb, L 720 lb, S 882 lb.
 */
const header = {
  kind: "header",
  member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 2 },
  lengthFt: 6,
  supports: [
    { x: 0, type: "pin" },
    { x: 6, type: "roller" },
  ],
  loads: [
    { type: "area", case: "D", psf: 15, tributaryFt: 14 },
    { type: "snow", pg: 30, tributaryFt: 14 },
    { type: "area", case: "D", psf: 10, tributaryFt: 6 },
    { type: "area", preset: "living", tributaryFt: 6 },
    { type: "udl", case: "D", from: 0, to: 6, w: 80 },
  ],
  bearingIn: 3,
  conditions: { repetitive: false, selfWeight: true },
  limits: { live: 360, total: 240 },
  // the hand check below is on the newer, strength-level snow basis; the 7-16 basis has its own test (snow-basis.test.ts)
  loadStandard: "ASCE 7-22",
};

describe("header under a bearing wall with roof snow and a floor above (hand check in the comment)", () => {
  const r = checkMember(header, STARTER_TABLES);
  const byName = (n: string) => r.checks.find((c) => c.name === n);

  const rho = 62.4 * (0.5 / (1 + 0.5 * 0.009 * 19)) * 1.19;
  const sw = (rho * 2 * 1.5 * 9.25) / 144;
  const D = 210 + 60 + 80 + sw;
  const wGov = D + 0.75 * 240 + 0.75 * 0.7 * 294;
  const S = (2 * 1.5 * 9.25 ** 2) / 6;
  const I = (2 * 1.5 * 9.25 ** 3) / 12;
  const A = 2 * 1.5 * 9.25;

  test("own weight and take-down", () => {
    expect(sw).toBeCloseTo(6.59, 2);
    expect(r.loads.find((l) => l.case === "S")?.w).toBeCloseTo(294, 6);
    expect(r.member.weightPlf).toBeCloseTo(sw, 2);
  });

  test.each([
    ["bending", "D+0.75L+0.525S", () => (((wGov * 36) / 8) * 12) / S / (900 * 1.15 * 1.1)],
    ["shear", "D+0.75L+0.525S", () => (1.5 * wGov * 3) / A / (180 * 1.15)],
    ["deflection-live", "0.75L+0.525S", () => (5 * ((0.75 * 240 + 0.525 * 294) / 12) * 72 ** 4) / (384 * 1.6e6 * I) / (72 / 360)],
    ["deflection-total", "D+0.75L+0.525S", () => (5 * (wGov / 12) * 72 ** 4) / (384 * 1.6e6 * I) / (72 / 240)],
    ["bearing", "D+0.75L+0.525S", () => (wGov * 3) / (3 * 3) / 625],
  ])("%s ratio and governing combination %s", (name, combo, ratio) => {
    const c = byName(name);
    expect(c?.combination?.name).toBe(combo);
    expect(c?.ratio).toBeCloseTo(ratio(), 3);
  });

  test("hand figures: fb 872 psi vs Fb' 1138.5 psi, fv 112 psi vs 207 psi, Δ live 0.031 in", () => {
    expect(byName("bending")?.demand).toBeCloseTo(872.1, 0);
    expect(byName("bending")?.capacity).toBeCloseTo(1138.5, 1);
    expect(byName("shear")?.demand).toBeCloseTo(112.0, 0);
    expect(byName("deflection-live")?.demand).toBeCloseTo(0.0308, 3);
    expect(r.pass).toBe(true);
    expect(r.governing).toBe("bending");
  });

  test("factors reported: CD 1.15, CF 1.1, Cr 1.0 for two plies, CL 1.0, Kcr 1.5", () => {
    const f = r.factors as WoodFactors;
    expect(f).toMatchObject({ CD: 1.15, CF: 1.1, Cr: 1, CL: 1, Kcr: 1.5, shearLoadsNearSupportsIgnored: false });
  });

  test("reactions for the crew: each end 2073 lb down in D+0.75L+0.525S, no uplift, two jack studs (the 3 in the bearing check used)", () => {
    for (const rx of r.reactions) {
      expect(rx.maxDown).toBe(Math.round(wGov * 3));
      expect(rx.maxDownCombination).toBe("D+0.75L+0.525S");
      expect(rx.uplift).toBe(0);
      expect(rx.byCase).toEqual({ D: Math.round(D * 3), L: 720, S: 882 });
      expect(rx.requiredBearing).toBeCloseTo((wGov * 3) / (3 * 625), 2);
      expect(rx.jackStuds).toBe(3 / 1.5);
    }
  });

  test("the answer line for the crew", () => {
    // in the default 2x4 wall: two 1-1/2 in plies and a 1/2 in spacer fill 3-1/2 in
    expect(r.answer).toBe('2-ply 2x10 No.2 with 1/2" spacer — 2 jack studs each end');
    expect(r.verdict).toBe("OK 77% (bending)");
  });

  test("the result carries the caution and what is not checked", () => {
    expect(r.caution).toMatch(/^Preliminary sizing for typical house framing/);
    expect(r.notChecked.join(" ")).toMatch(/connections/i);
    expect(r.assumptions.join(" ")).toMatch(/every load counted/);
  });
});
