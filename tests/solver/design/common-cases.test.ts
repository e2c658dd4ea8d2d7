import { describe, expect, test } from "vitest";
import { checkMember, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

/**
 * The two everyday answers, each against a hand check computed here (NDS 2018 ASD; NDS Supplement
 * 2018 Table 4A values for Douglas Fir-Larch No.2: Fb 900, Fv 180, Fc⊥ 625, E 1,600,000 psi, from memory).
 */
describe("14 ft floor joist at 16 in, 40 psf live + 10 psf dead, L/360 and L/240", () => {
  const input = {
    member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" },
    lengthFt: 14,
    supports: [
      { x: 0, type: "pin" },
      { x: 14, type: "roller" },
    ],
    spacingIn: 16,
    loads: [
      { type: "area", preset: "living" },
      { type: "area", preset: "floor-dead" },
    ],
    conditions: { repetitive: true, selfWeight: false },
    limits: { preset: "floor" },
    rank: "weight",
  };
  const r = sizeMember(input, STARTER_TABLES);
  const w = (50 * 16) / 12; // plf
  const M = (w * 14 ** 2) / 8; // lb-ft

  test("lightest passing member is a 2x10, governed by bending at 80 %", () => {
    // 2x10: fb = M·12/S = 1633.3 × 12 / 21.39 = 916 psi; Fb' = 900 × CF 1.1 × Cr 1.15 × CD 1.0 = 1138.5 psi → 0.805
    // deflection L: 5 (53.33/12) 168⁴ / (384 · 1.6e6 · 98.93) = 0.291 in vs 168/360 = 0.467 → 0.624
    const best = r.passing[0];
    expect(best.label).toBe("2x10 Douglas Fir-Larch No.2");
    expect(best.governing).toBe("bending");
    const S = (1.5 * 9.25 ** 2) / 6;
    expect(best.ratio).toBeCloseTo((M * 12) / S / (900 * 1.1 * 1.15), 3);
  });

  test("the 2x8 is the nearest failure, in live load deflection at 130 % (bending would be 120 %)", () => {
    // Δ = 5 (40·16/12/12) 168⁴ / (384 · 1.6e6 · 47.63) = 0.605 in vs 0.467 in → 1.296
    const I = (1.5 * 7.25 ** 3) / 12;
    const f = r.failing.find((x) => x.label === "2x8 Douglas Fir-Larch No.2");
    expect(f?.governing).toBe("deflection-live");
    expect(f?.ratio).toBeCloseTo((5 * ((40 * 16) / 12 / 12) * 168 ** 4) / (384 * 1.6e6 * I) / (168 / 360), 3);
    expect(f?.reason).toMatch(/^deflection-live 130% in L/);
    expect(r.failing[0].ratio).toBeLessThanOrEqual(r.failing[r.failing.length - 1].ratio);
  });

  test("every passing member passes and the ranking is by weight", () => {
    for (let i = 1; i < r.passing.length; i++) expect(r.passing[i].weightPlf).toBeGreaterThanOrEqual(r.passing[i - 1].weightPlf);
    for (const p of r.passing) expect(p.ratio).toBeLessThanOrEqual(1);
    expect(r.candidates).toBeGreaterThan(5);
  });
});

describe("12 ft header under a bearing wall: 8 ft of floor at 15 psf dead + 40 psf live", () => {
  const input = {
    member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" },
    lengthFt: 12,
    supports: [
      { x: 0, type: "pin" },
      { x: 12, type: "roller" },
    ],
    tributaryFt: 8,
    loads: [
      { type: "area", case: "D", psf: 15 },
      { type: "area", case: "L", psf: 40 },
    ],
    bearingIn: 3,
  };
  const r = sizeMember({ ...input, rank: "weight", failures: 100 }, STARTER_TABLES);
  const rho = 62.4 * (0.5 / (1 + 0.5 * 0.009 * 19)) * 1.19; // lb/ft³ at 19 % (NDS Supplement 2018 §3.1.3)

  test("answer: 3-ply 2x12 No.2, bending 99 %, two jack studs each end (the 3 in of bearing the check used)", () => {
    // 3-ply 2x12: own weight 34.21 × 3 × 16.875 / 144 = 12.03 plf; w = 440 + 12.03 = 452.0 plf
    // M = 452.0 × 12² / 8 = 8136 lb-ft; fb = 8136 × 12 / 94.92 = 1028.6 psi;
    // Fb' = 900 × CD 1.0 × CF 1.0 × Cr 1.15 (three plies in contact, NDS 2018 §4.3.9) = 1035 psi → 0.994
    // R = 452.0 × 6 = 2712 lb; required bearing 2712 / (4.5 × 625) = 0.96 in, checked at the 3 in given → two 1-1/2 in jack studs
    const best = r.passing[0];
    expect(best.label).toBe("3-ply 2x12 Douglas Fir-Larch No.2");
    const w = 440 + (rho * 3 * 1.5 * 11.25) / 144;
    const S = (4.5 * 11.25 ** 2) / 6;
    expect(best.ratio).toBeCloseTo((((w * 144) / 8) * 12) / S / (900 * 1.15), 3);
    expect(best.governing).toBe("bending");
    expect(best.supports.map((s) => s.jackStuds)).toEqual([3 / 1.5, 3 / 1.5]);
    expect(best.supports[0].maxDown).toBe(Math.round(w * 6));
  });

  test("the lighter 2-ply 2x12 fails in bending: no repetitive factor for two plies", () => {
    const w = 440 + (rho * 2 * 1.5 * 11.25) / 144;
    const S = (3 * 11.25 ** 2) / 6;
    const f = r.failing.find((x) => x.label === "2-ply 2x12 Douglas Fir-Larch No.2");
    expect(f?.ratio).toBeCloseTo((((w * 144) / 8) * 12) / S / 900, 3);
  });

  test("a steel beam for the same header: W-shapes pass and their checks read AISC 360-16", () => {
    const steel = sizeMember({ ...input, member: { material: "steel" } }, STARTER_TABLES);
    expect(steel.passing.length).toBeGreaterThan(0);
    const best = checkMember(
      { ...input, member: { material: "steel", shape: steel.passing[0].member.material === "steel" ? steel.passing[0].member.shape : "" } },
      STARTER_TABLES,
    );
    expect(best.pass).toBe(true);
    expect(best.checks.map((c) => c.name)).toEqual(expect.arrayContaining(["bending", "shear", "deflection-live", "web-yielding", "web-crippling"]));
  });
});

describe("overhang, uplift and pattern live load", () => {
  // 8 ft back span with a 4 ft overhang (deck joist on a beam); live load on the overhang alone lifts the far end.
  const deck = {
    member: { material: "sawn", species: "Southern Pine", grade: "No.2", size: "2x10" },
    lengthFt: 12,
    supports: [
      { x: 0, type: "pin" },
      { x: 8, type: "roller" },
    ],
    spacingIn: 16,
    loads: [
      { type: "area", case: "L", psf: 40 },
      { type: "area", case: "D", psf: 10 },
    ],
    conditions: { repetitive: true, selfWeight: false, wet: true },
  };
  const r = checkMember(deck, STARTER_TABLES);

  test("uplift at the back support equals the overhang's live load moment less the dead load's, by statics", () => {
    // Pattern: D+L with the live load on the overhang only; moments about the support at 8 ft:
    // R0 · 8 = wD · 12 · (8 − 6) − wL · 4 · (10 − 8)  (D everywhere, centroid 6 ft; L on the overhang, centroid 10 ft)
    const wD = (10 * 16) / 12;
    const wL = (40 * 16) / 12;
    const R0 = (wD * 12 * 2 - wL * 4 * 2) / 8;
    expect(R0).toBeLessThan(0);
    expect(r.reactions[0].uplift).toBe(Math.round(-R0));
    expect(r.reactions[0].upliftCombination).toBe("D+L");
  });

  test("largest downward reaction at the beam: full live load on both spans", () => {
    const wT = (50 * 16) / 12;
    const R8 = (wT * 12 * 6) / 8;
    expect(r.reactions[1].maxDown).toBe(Math.round(R8));
    // jack studs belong to a header's ends; the beam under the joist is an interior support
    expect(r.reactions[0].jackStuds).toBe(1);
    expect(r.reactions[1].jackStuds).toBeNull();
  });

  test("the overhang tip is checked against twice its length", () => {
    const notes = r.checks.filter((c) => c.name.startsWith("deflection")).map((c) => c.note);
    expect(notes.length).toBe(2);
    const tip = checkMember(
      {
        ...deck,
        lengthFt: 18,
        supports: [
          { x: 0, type: "pin" },
          { x: 10, type: "roller" },
        ],
      },
      STARTER_TABLES,
    );
    expect(tip.checks.find((c) => c.name === "deflection-live")?.note).toMatch(/overhang .* 2 × its length/);
  });

  test("wet service: Table 4B CM on Fv 0.97, Fc⊥ 0.67, E 0.9 and Kcr 2.0", () => {
    expect(r.factors).toMatchObject({ CM: { Fv: 0.97, FcPerp: 0.67, E: 0.9 }, Kcr: 2 });
  });
});
