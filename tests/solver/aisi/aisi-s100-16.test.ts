import { describe, expect, test } from "vitest";
import {
  bendingCripplingRatio,
  chainProperties,
  E_CFS_KSI,
  effectiveSection,
  effectiveWidth,
  elasticLtbStressFcre,
  flatWidths,
  globalBucklingStressFn,
  grossProperties,
  nominalShearVn,
  webCripplingPn,
  type CfsDimensions,
} from "@/lib/solver/aisi/aisi-s100-16";

// 800S162-54: design thickness 0.0566 in, inside radius 0.0849 in, lip 0.5 in (SSMA product catalog
// steel thickness and stiffening lip tables, read in a published copy: publicdocs.santa-ana.org doc 402229 p. 143).
const S800: CfsDimensions = { style: "S", D: 8, B: 1.625, lip: 0.5, t: 0.0566, R: 0.0849 };

describe("thin-walled section properties (textbook closed forms, computed here)", () => {
  // A plain channel with square corners, midline web h and flanges b, thickness t. Timoshenko & Gere,
  // Theory of Elastic Stability (2nd ed.), and every steel design text: shear center e = 3b²/(6b + h)
  // from the web's midline, Cw = t b³ h² (3b + 2h) / (12 (6b + h)), J = Σ b t³/3. Tolerance 1e-9 relative.
  test.each([
    [2, 6, 0.1],
    [1.625, 8, 0.0566],
    [3, 12, 0.25],
  ])("channel b=%s h=%s t=%s: shear center, Cw, J, Ix", (b, h, t) => {
    const g = chainProperties(
      [
        [b, h / 2],
        [0, h / 2],
        [0, -h / 2],
        [b, -h / 2],
      ],
      t,
    );
    const e = (3 * b * b) / (6 * b + h);
    expect(g.xc + g.xo).toBeCloseTo(-e, 9);
    expect(g.Cw / ((t * b ** 3 * h * h * (3 * b + 2 * h)) / (12 * (6 * b + h)))).toBeCloseTo(1, 9);
    expect(g.J).toBeCloseTo(((2 * b + h) * t ** 3) / 3, 12);
    // Ix by the linear method: t h³/12 + 2 b t (h/2)²
    expect(g.Ix).toBeCloseTo((t * h ** 3) / 12 + 2 * b * t * (h / 2) ** 2, 9);
  });

  test("800S162-54 gross area equals t × (flats + four quarter arcs of midline radius R + t/2) (AISI linear method)", () => {
    const { h, w, d } = flatWidths(S800);
    const r = S800.R + S800.t / 2;
    const A = S800.t * (h + 2 * w + 2 * d + 4 * ((Math.PI * r) / 2));
    const g = grossProperties(S800);
    // the arcs are cut into chords: 0.1 % tolerance
    expect(g.A / A).toBeCloseTo(1, 3);
    // the section is symmetric about x: Sx = Ix / (D/2)
    expect(g.Sx).toBeCloseTo(g.Ix / 4, 9);
  });
});

describe("effective width, AISI S100-16 Appendix 1 (Winter's formula computed here)", () => {
  test.each([
    [1.342, 0.0566, 50, 4],
    [7.717, 0.0566, 50, 4],
    [0.3585, 0.0566, 50, 0.43],
    [1.0, 0.1017, 10, 4],
  ])("w=%s t=%s f=%s k=%s", (w, t, f, k) => {
    const lambda = (1.052 / Math.sqrt(k)) * (w / t) * Math.sqrt(f / 29_500);
    const rho = lambda <= 0.673 ? 1 : (1 - 0.22 / lambda) / lambda;
    expect(effectiveWidth(w, t, f, k)).toBeCloseTo(Math.min(1, rho) * w, 12);
  });

  test("the effective section is the gross section at low stress and shrinks as the stress grows", () => {
    const g = grossProperties(S800);
    const low = effectiveSection(S800, 5);
    expect(low.Ie / g.Ix).toBeCloseTo(1, 2);
    const mid = effectiveSection(S800, 33);
    const hi = effectiveSection(S800, 50);
    expect(hi.Se).toBeLessThan(mid.Se);
    expect(mid.Se).toBeLessThan(g.Sx);
    // the neutral axis moves toward the tension flange when the compression side loses width
    expect(hi.shift).toBeGreaterThan(0);
  });
});

describe("flexure, shear and web crippling (AISI S100-16 equations computed here)", () => {
  test("§F2.1: Fn from Fcre in its three ranges", () => {
    const Fy = 50;
    expect(globalBucklingStressFn(3 * Fy, Fy)).toBe(Fy);
    const Fcre = 1.5 * Fy;
    expect(globalBucklingStressFn(Fcre, Fy)).toBeCloseTo((10 / 9) * Fy * (1 - (10 * Fy) / (36 * Fcre)), 12);
    expect(globalBucklingStressFn(0.4 * Fy, Fy)).toBe(0.4 * Fy);
  });

  test("§F2.1.1: Fcre of a C-section bent about its symmetry axis, Cb = 1, Lb = 8 ft", () => {
    const g = grossProperties(S800);
    const L = 96;
    const sey = (Math.PI ** 2 * E_CFS_KSI) / (L / g.ry) ** 2;
    const st = (11_300 * g.J + (Math.PI ** 2 * E_CFS_KSI * g.Cw) / (L * L)) / (g.A * g.r0 ** 2);
    expect(elasticLtbStressFcre(g, g.Sx, L, 1)).toBeCloseTo(((g.r0 * g.A) / g.Sx) * Math.sqrt(sey * st), 9);
    // r0 about the shear center: rx² + ry² + xo²
    expect(g.r0 ** 2).toBeCloseTo(g.rx ** 2 + g.ry ** 2 + g.xo ** 2, 9);
  });

  test("§G2.1: shear of an unreinforced web, kv = 5.34, E = 29,500 ksi, μ = 0.3", () => {
    const { h } = flatWidths(S800);
    const t = S800.t;
    const Vy = 0.6 * h * t * 50;
    const Vcr = h * t * ((Math.PI ** 2 * 29_500 * 5.34) / (12 * (1 - 0.09) * (h / t) ** 2));
    const lv = Math.sqrt(Vy / Vcr);
    const expected = lv <= 0.815 ? Vy : lv <= 1.227 ? 0.815 * Math.sqrt(Vcr * Vy) : Vcr;
    expect(nominalShearVn(h, t, 50).Vn).toBeCloseTo(expected, 9);
    // an 8 in, 54 mil web is slender: elastic shear buckling governs
    expect(lv).toBeGreaterThan(1.227);
  });

  // Table G5-2 (C-sections, fastened to the support), as the AISIS100.jl package holds it
  // (runtosolve/AISIS100.jl, src/assets/AISI_S100_16_Table_G5_2.csv): [C, CR, CN, Ch].
  test.each([
    ["end-one-flange", 4, 0.14, 0.35, 0.02],
    ["interior-one-flange", 13, 0.23, 0.14, 0.01],
    ["end-two-flange", 7.5, 0.08, 0.12, 0.048],
    ["interior-two-flange", 20, 0.1, 0.08, 0.031],
  ] as const)("§G5 Eq. G5-1, %s, N = 1.5 in, Fy 50 ksi", (c, C, CR, CN, Ch) => {
    const { h } = flatWidths(S800);
    const { t, R } = S800;
    const Pn = C * t * t * 50 * (1 - CR * Math.sqrt(R / t)) * (1 + CN * Math.sqrt(1.5 / t)) * (1 - Ch * Math.sqrt(h / t));
    expect(webCripplingPn(S800, 50, 1.5, c)).toBeCloseTo(Pn, 12);
  });

  test("§G5: a web more slender than h/t = 200 is outside Eq. G5-1 (a bearing stiffener is needed)", () => {
    expect(webCripplingPn({ style: "S", D: 8, B: 1.625, lip: 0.5, t: 0.0346, R: 0.0764 }, 33, 1.5, "end-one-flange")).toBeNull();
  });

  test("§H3 Eq. H3-1: 0.91 P/Pn + M/Mnℓo against 1.33/Ω (Ω = 1.70) or 1.33φ", () => {
    expect(bendingCripplingRatio(1, 4, 10, 40, false)).toBeCloseTo((0.91 * 0.25 + 0.25) / (1.33 / 1.7), 12);
    expect(bendingCripplingRatio(1, 4, 10, 40, true)).toBeCloseTo((0.91 * 0.25 + 0.25) / (1.33 * 0.9), 12);
  });
});
