import { describe, expect, test } from "vitest";
import { STARTER_TABLES } from "@/lib/tables";

// Physics checks of the W-shape rows (AISC Shapes Database v15.0, Steel Construction Manual
// 15th ed., Table 1-1): every tabulated property must agree with what the shape's own
// dimensions give. Dimensions in the database are printed to 3 significant figures, so a
// computed value can sit a few tenths of a percent either side of the tabulated one.

const shapes = STARTER_TABLES.steel;
const rows = shapes.map((s) => [s.name, s] as const);

/** density of structural steel, lb/ft³ (AISC Manual 15th ed., Table 17-12; common practice 490) */
const STEEL_DENSITY_PCF = 490;

/** The three-rectangle idealisation: two flanges bf x tf and a web tw x (d − 2tf), no fillets. */
function threeRectangles(d: number, bf: number, tf: number, tw: number) {
  const hw = d - 2 * tf;
  const A = 2 * bf * tf + hw * tw;
  const Ix = (bf * d ** 3 - (bf - tw) * hw ** 3) / 12;
  const Sx = Ix / (d / 2);
  const Zx = bf * tf * (d - tf) + (tw * hw * hw) / 4;
  return { A, Ix, Sx, Zx };
}

/**
 * The four web-to-flange fillets, radius r ≈ kdes − tf. Each is a square r x r less a quarter
 * circle: area (1 − π/4) r², centroid 0.2234 r from the flange face (the spandrel centroid,
 * (10 − 3π)/(12 − 3π) · r). Returns their area and their contribution to Ix (parallel axis; the
 * fillet's own inertia is negligible).
 */
function fillets(d: number, tf: number, kdes: number) {
  const r = kdes - tf;
  const one = (1 - Math.PI / 4) * r * r;
  const y = d / 2 - tf - ((10 - 3 * Math.PI) / (12 - 3 * Math.PI)) * r;
  return { A: 4 * one, Ix: 4 * one * y * y };
}

describe("W-shapes: the starter set", () => {
  test("holds 20 or more shapes from W6 to W12, every field a positive number", () => {
    expect(shapes.length).toBeGreaterThanOrEqual(20);
    for (const s of shapes) {
      expect(s.name).toMatch(/^W(6|8|10|12)x\d+(\.\d+)?$/);
      const numeric = Object.entries(s).filter(([key]) => key !== "name" && key !== "source");
      expect(numeric).toHaveLength(21);
      for (const [, value] of numeric) expect(value).toBeGreaterThan(0);
      expect(s.source).toMatch(/AISC Shapes Database v15\.0/);
    }
  });

  test("names its nominal weight", () => {
    for (const s of shapes) expect(Number(s.name.split("x")[1])).toBe(s.W);
  });
});

describe("W-shapes against physics", () => {
  // weight per foot = A (in²) × 490 lb/ft³ / 144 in²/ft²; within 2% (the nominal weight is rounded
  // to a whole pound and A to 3 significant figures).
  test.each(rows)("%s weight matches its area at 490 lb/ft³ within 2%", (_, s) => {
    const w = (s.A * STEEL_DENSITY_PCF) / 144;
    expect(Math.abs(w - s.W) / s.W).toBeLessThanOrEqual(0.02);
  });

  // Fillet allowance: the three rectangles leave out the four web-to-flange fillets, which add
  // area close to the flanges, so the computed Ix, Sx, Zx and A are lower than tabulated. For
  // W6–W12 shapes the fillets carry 1–4% of Ix; 6% below tabulated is the allowance. The upper
  // bound, 0.5% above tabulated, covers rounding of d, bf, tf, tw to 3 significant figures.
  test.each(rows)("%s Ix, Sx, Zx and A from d, bf, tf, tw (three rectangles) within the fillet allowance", (_, s) => {
    const c = threeRectangles(s.d, s.bf, s.tf, s.tw);
    for (const [computed, tabulated] of [
      [c.Ix, s.Ix],
      [c.Sx, s.Sx],
      [c.Zx, s.Zx],
      [c.A, s.A],
    ]) {
      expect(computed).toBeLessThanOrEqual(tabulated * 1.005);
      expect(computed).toBeGreaterThanOrEqual(tabulated * 0.94);
    }
  });

  // With the fillets put back (radius from kdes) the section should close on the tabulated
  // values to within rounding: 1.5% on Ix, 1% on A.
  test.each(rows)("%s Ix and A with the fillets from kdes within 1.5% and 1%", (_, s) => {
    const c = threeRectangles(s.d, s.bf, s.tf, s.tw);
    const f = fillets(s.d, s.tf, s.kdes);
    expect(Math.abs(c.Ix + f.Ix - s.Ix) / s.Ix).toBeLessThanOrEqual(0.015);
    expect(Math.abs(c.A + f.A - s.A) / s.A).toBeLessThanOrEqual(0.01);
  });

  test.each(rows)("%s bf/2tf and h/tw (h = d − 2 kdes) match their dimensions within rounding", (_, s) => {
    expect(Math.abs(s.bf / (2 * s.tf) - s.bf_2tf) / s.bf_2tf).toBeLessThanOrEqual(0.005);
    expect(Math.abs((s.d - 2 * s.kdes) / s.tw - s.h_tw) / s.h_tw).toBeLessThanOrEqual(0.01);
  });

  // AISC 360-16 Eq. F2-7: rts² = sqrt(Iy Cw) / Sx.
  test.each(rows)("%s rts² ≈ sqrt(Iy·Cw)/Sx within 2%", (_, s) => {
    const rts2 = Math.sqrt(s.Iy * s.Cw) / s.Sx;
    expect(Math.abs(rts2 - s.rts ** 2) / s.rts ** 2).toBeLessThanOrEqual(0.02);
  });

  // ho is the distance between flange centroids: d − tf. d is printed to 3 significant figures
  // (±0.05 in at 12 in), so 0.6% is the tolerance.
  test.each(rows)("%s ho ≈ d − tf", (_, s) => {
    expect(Math.abs(s.d - s.tf - s.ho) / s.ho).toBeLessThanOrEqual(0.006);
  });

  // For a doubly symmetric I-shape Cw = Iy ho² / 4 (AISC 360-16 Commentary F2); radii of
  // gyration r = sqrt(I/A); Sy = Iy / (bf/2).
  test.each(rows)("%s Cw, rx, ry and Sy agree with Iy, Ix, A, ho, bf within 2%", (_, s) => {
    expect(Math.abs((s.Iy * s.ho ** 2) / 4 - s.Cw) / s.Cw).toBeLessThanOrEqual(0.02);
    expect(Math.abs(Math.sqrt(s.Ix / s.A) - s.rx) / s.rx).toBeLessThanOrEqual(0.02);
    expect(Math.abs(Math.sqrt(s.Iy / s.A) - s.ry) / s.ry).toBeLessThanOrEqual(0.02);
    expect(Math.abs(s.Iy / (s.bf / 2) - s.Sy) / s.Sy).toBeLessThanOrEqual(0.02);
  });
});

describe("steel grades", () => {
  // ASTM A992 and A36 minimum strengths, AISC Steel Construction Manual 15th ed., Table 2-4.
  test.each([
    ["A992", 50, 65],
    ["A36", 36, 58],
  ])("%s: Fy %d ksi, Fu %d ksi", (name, Fy, Fu) => {
    const grade = STARTER_TABLES.steelGrades.find((g) => g.name === name);
    expect(grade).toEqual({ name, Fy, Fu });
  });
});
