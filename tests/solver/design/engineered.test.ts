import { describe, expect, test } from "vitest";
import { checkMember, type WoodFactors } from "@/lib/solver/design";
import { findEngineered, STARTER_TABLES } from "@/lib/tables";

/** Engineered lumber from the team's table ("typical values — confirm with the supplier's published values"). */
const span = (lengthFt: number) => ({
  lengthFt,
  supports: [
    { x: 0, type: "pin" },
    { x: lengthFt, type: "roller" },
  ],
  tributaryFt: 7,
  loads: [
    { type: "area", case: "D", psf: 15 },
    { type: "area", case: "L", psf: 40 },
  ],
  bearingIn: 3,
  conditions: { selfWeight: false },
});

describe("LVL, PSL and glulam headers and beams", () => {
  test("2-ply 1-3/4 x 11-7/8 LVL 1.9E over 14 ft: Fb' = Fb (12/d)^0.136 CD, hand check", () => {
    const lvl = findEngineered(STARTER_TABLES, "LVL 1.9E");
    const r = checkMember({ ...span(14), member: { material: "engineered", product: "LVL 1.9E", width: 1.75, depth: 11.875, plies: 2 } }, STARTER_TABLES);
    const CF = Math.min((12 / 11.875) ** 0.136, 1.18); // depth factor typical of LVL literature (the table's rule)
    const w = 55 * 7; // plf
    const S = (3.5 * 11.875 ** 2) / 6;
    const fb = (((w * 14 ** 2) / 8) * 12) / S;
    const bending = r.checks.find((c) => c.name === "bending");
    expect(bending?.ratio).toBeCloseTo(fb / (lvl.Fb * CF * 1.0), 3);
    expect((r.factors as WoodFactors).CF).toBeCloseTo(CF, 4);
    expect((r.factors as WoodFactors).Cr).toBe(1); // no repetitive factor for SCL here
    const I = (3.5 * 11.875 ** 3) / 12;
    const liveDefl = (5 * ((40 * 7) / 12) * 168 ** 4) / (384 * lvl.E * I);
    expect(r.checks.find((c) => c.name === "deflection-live")?.demand).toBeCloseTo(liveDefl, 3);
    expect(r.assumptions.join(" ")).toMatch(/confirm with the supplier/);
  });

  test("glulam 5-1/8 x 12 over 24 ft: CV = (21/24)^(1/10) < CL = 1 governs Fb' (NDS 2018 §5.3.6)", () => {
    const g = findEngineered(STARTER_TABLES, "Glulam 24F-V4 DF");
    const r = checkMember({ ...span(24), member: { material: "engineered", product: "Glulam 24F-V4 DF", width: 5.125, depth: 12 } }, STARTER_TABLES);
    const CV = (21 / 24) ** 0.1;
    const f = r.factors as WoodFactors;
    expect(f.CV).toBeCloseTo(CV, 4);
    expect(r.checks.find((c) => c.name === "bending")?.capacity).toBeCloseTo(g.Fb * CV, 0);
  });

  // NDS Supplement 2018 Table 5A: an unbalanced glulam carries Fbx− where the tension zone is in compression
  // (moment that hogs over the support of an overhang). 5-1/8 x 12 24F-V4, 12 ft span and an 8 ft overhang,
  // 15 + 40 psf over 7 ft: the hogging moment at the support, live load on the overhang, is w a²/2 by statics.
  test("glulam overhang: the moment that hogs is checked against Fbx−, computed by hand", () => {
    const g = findEngineered(STARTER_TABLES, "Glulam 24F-V4 DF");
    expect(g.FbNeg).toBeLessThan(g.Fb);
    const r = checkMember(
      {
        ...span(20),
        supports: [
          { x: 0, type: "pin" },
          { x: 12, type: "roller" },
        ],
        member: { material: "engineered", product: "Glulam 24F-V4 DF", width: 5.125, depth: 12 },
      },
      STARTER_TABLES,
    );
    const w = 55 * 7; // plf, D + L
    const Mhog = (w * 8 ** 2) / 2; // lb-ft at the support
    const S = (5.125 * 12 ** 2) / 6;
    const fb = (Mhog * 12) / S;
    const bending = r.checks.find((c) => c.name === "bending");
    expect(bending?.x).toBeCloseTo(12, 1);
    expect(bending?.demand).toBeCloseTo(fb, 0);
    // CD 1.0 (D + L), CV = 1 (no region longer than 21 ft at d = 12, b = 5-1/8). The hogging moment puts the
    // bottom edge in compression on both sides of the support: along the 8 ft overhang and back into the 12 ft
    // span up to where the moment changes sign. That edge is braced only at the supports, so the longer side
    // governs: lu = 12 ft, CL by NDS 2018 §3.3.3 (this check read CL = 1 before the bottom edge was told apart
    // from the top): le by Table 3.3.3 (7 ≤ lu/d ≤ 14.3: 1.63 lu + 3d), RB = √(le d/b²), FbE = 1.20 Emin'/RB²,
    // Fb* = Fbx− (Eq. 3.3-6).
    const luIn = 144;
    const leIn = 1.63 * luIn + 3 * 12;
    const RB = Math.sqrt((leIn * 12) / 5.125 ** 2);
    const FbE = (1.2 * g.Emin) / RB ** 2;
    const a = (1 + FbE / g.FbNeg!) / 1.9;
    const CL = a - Math.sqrt(a * a - FbE / g.FbNeg! / 0.95);
    expect(CL).toBeLessThan(1);
    expect(bending?.capacity).toBeCloseTo(g.FbNeg! * CL, 0);
    expect(bending?.ratio).toBeCloseTo(fb / (g.FbNeg! * CL), 3);
    expect(bending?.ratio).toBeGreaterThan(fb / g.Fb + 0.1);
    expect(bending?.note).toMatch(/bottom edge in compression, braced only at the supports \(lu = 12 ft\)/);
    expect(r.assumptions.join(" ")).toMatch(/Fbx− for moment that hogs/);
  });

  test("glulam braced only at the ends: the smaller of CL and CV is used, never both", () => {
    const r = checkMember(
      {
        ...span(24),
        member: { material: "engineered", product: "Glulam 24F-V4 DF", width: 3.125, depth: 12 },
        conditions: { selfWeight: false, unbracedLengthFt: 24 },
      },
      STARTER_TABLES,
    );
    const f = r.factors as WoodFactors;
    const CV = f.CV ?? 1;
    expect(f.CL).toBeLessThan(CV);
    expect(r.checks.find((c) => c.name === "bending")?.capacity).toBeCloseTo(2400 * f.CL, 0);
  });

  test("LRFD for wood: Fb' = Fb KF 2.54 φ 0.85 λ 0.8 against 1.2D + 1.6L (NDS 2018 Appendix N)", () => {
    const input = { ...span(12), member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12", plies: 3 }, method: "lrfd" };
    const r = checkMember(input, STARTER_TABLES);
    const bending = r.checks.find((c) => c.name === "bending");
    expect(bending?.combination).toEqual({ name: "1.2D+1.6L", factors: { D: 1.2, L: 1.6 } });
    expect(bending?.capacity).toBeCloseTo(900 * 1.0 * 1.15 * 2.54 * 0.85 * 0.8, 0);
    const wu = (1.2 * 15 + 1.6 * 40) * 7;
    const S = (4.5 * 11.25 ** 2) / 6;
    expect(bending?.demand).toBeCloseTo((((wu * 144) / 8) * 12) / S, 0);
  });

  test("PSL is one piece: two plies are refused, naming the field", () => {
    expect(() =>
      checkMember({ ...span(12), member: { material: "engineered", product: "PSL 2.0E", width: 3.5, depth: 11.875, plies: 2 } }, STARTER_TABLES),
    ).toThrow(/member.plies/);
  });
});
