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

/** The three-rectangle idealization: two flanges bf x tf and a web tw x (d − 2tf), no fillets. */
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

// AISC Shapes Database v15.0 as ronkok/Hurmet publishes it (site/ce/AISC-v15-wideFlanges.csv, read
// with the search tool): A, d, bf, tw, tf, kdes, Ix, Zx, Sx, rx, Iy, Zy, Sy, ry, J, Cw, rts. Every field
// of every Spanlark row must equal the published figure.
type Published = [
  name: string,
  A: number,
  d: number,
  bf: number,
  tw: number,
  tf: number,
  kdes: number,
  Ix: number,
  Zx: number,
  Sx: number,
  rx: number,
  Iy: number,
  Zy: number,
  Sy: number,
  ry: number,
  J: number,
  Cw: number,
  rts: number,
];
const AISC_V15_HURMET: Published[] = [
  ["W12x35", 10.3, 12.5, 6.56, 0.3, 0.52, 0.82, 285, 51.2, 45.6, 5.25, 24.5, 11.5, 7.47, 1.54, 0.741, 879, 1.79],
  ["W12x30", 8.79, 12.3, 6.52, 0.26, 0.44, 0.74, 238, 43.1, 38.6, 5.21, 20.3, 9.56, 6.24, 1.52, 0.457, 720, 1.77],
  ["W12x26", 7.65, 12.2, 6.49, 0.23, 0.38, 0.68, 204, 37.2, 33.4, 5.17, 17.3, 8.17, 5.34, 1.51, 0.3, 607, 1.75],
  ["W12x22", 6.48, 12.3, 4.03, 0.26, 0.425, 0.725, 156, 29.3, 25.4, 4.91, 4.66, 3.66, 2.31, 0.848, 0.293, 164, 1.04],
  ["W12x19", 5.57, 12.2, 4.01, 0.235, 0.35, 0.65, 130, 24.7, 21.3, 4.82, 3.76, 2.98, 1.88, 0.822, 0.18, 131, 1.02],
  ["W12x16", 4.71, 12.0, 3.99, 0.22, 0.265, 0.565, 103, 20.1, 17.1, 4.67, 2.82, 2.26, 1.41, 0.773, 0.103, 96.9, 0.983],
  ["W12x14", 4.16, 11.9, 3.97, 0.2, 0.225, 0.525, 88.6, 17.4, 14.9, 4.62, 2.36, 1.9, 1.19, 0.753, 0.0704, 80.4, 0.961],
  ["W10x33", 9.71, 9.73, 7.96, 0.29, 0.435, 0.935, 171, 38.8, 35.0, 4.19, 36.6, 14.0, 9.2, 1.94, 0.583, 791, 2.2],
  ["W10x30", 8.84, 10.5, 5.81, 0.3, 0.51, 0.81, 170, 36.6, 32.4, 4.38, 16.7, 8.84, 5.75, 1.37, 0.622, 414, 1.6],
  ["W10x26", 7.61, 10.3, 5.77, 0.26, 0.44, 0.74, 144, 31.3, 27.9, 4.35, 14.1, 7.5, 4.89, 1.36, 0.402, 345, 1.58],
  ["W10x22", 6.49, 10.2, 5.75, 0.24, 0.36, 0.66, 118, 26.0, 23.2, 4.27, 11.4, 6.1, 3.97, 1.33, 0.239, 275, 1.55],
  ["W10x19", 5.62, 10.2, 4.02, 0.25, 0.395, 0.695, 96.3, 21.6, 18.8, 4.14, 4.29, 3.35, 2.14, 0.874, 0.233, 104, 1.06],
  ["W10x17", 4.99, 10.1, 4.01, 0.24, 0.33, 0.63, 81.9, 18.7, 16.2, 4.05, 3.56, 2.8, 1.78, 0.845, 0.156, 85.1, 1.04],
  ["W10x15", 4.41, 9.99, 4.0, 0.23, 0.27, 0.57, 68.9, 16.0, 13.8, 3.95, 2.89, 2.3, 1.45, 0.81, 0.104, 68.3, 1.01],
  ["W10x12", 3.54, 9.87, 3.96, 0.19, 0.21, 0.51, 53.8, 12.6, 10.9, 3.9, 2.18, 1.74, 1.1, 0.785, 0.0547, 50.9, 0.983],
  ["W8x31", 9.13, 8.0, 8.0, 0.285, 0.435, 0.829, 110, 30.4, 27.5, 3.47, 37.1, 14.1, 9.27, 2.02, 0.536, 530, 2.26],
  ["W8x28", 8.25, 8.06, 6.54, 0.285, 0.465, 0.859, 98.0, 27.2, 24.3, 3.45, 21.7, 10.1, 6.63, 1.62, 0.537, 312, 1.84],
  ["W8x24", 7.08, 7.93, 6.5, 0.245, 0.4, 0.794, 82.7, 23.1, 20.9, 3.42, 18.3, 8.57, 5.63, 1.61, 0.346, 259, 1.81],
  ["W8x21", 6.16, 8.28, 5.27, 0.25, 0.4, 0.7, 75.3, 20.4, 18.2, 3.49, 9.77, 5.69, 3.71, 1.26, 0.282, 152, 1.46],
  ["W8x18", 5.26, 8.14, 5.25, 0.23, 0.33, 0.63, 61.9, 17.0, 15.2, 3.43, 7.97, 4.66, 3.04, 1.23, 0.172, 122, 1.43],
  ["W8x15", 4.44, 8.11, 4.02, 0.245, 0.315, 0.615, 48.0, 13.6, 11.8, 3.29, 3.41, 2.67, 1.7, 0.876, 0.137, 51.8, 1.06],
  ["W8x13", 3.84, 7.99, 4.0, 0.23, 0.255, 0.555, 39.6, 11.4, 9.91, 3.21, 2.73, 2.15, 1.37, 0.843, 0.0871, 40.8, 1.03],
  ["W8x10", 2.96, 7.89, 3.94, 0.17, 0.205, 0.505, 30.8, 8.87, 7.81, 3.22, 2.09, 1.66, 1.06, 0.841, 0.0426, 30.9, 1.01],
  ["W6x25", 7.34, 6.38, 6.08, 0.32, 0.455, 0.705, 53.4, 18.9, 16.7, 2.7, 17.1, 8.56, 5.61, 1.52, 0.461, 150, 1.74],
  ["W6x20", 5.87, 6.2, 6.02, 0.26, 0.365, 0.615, 41.4, 14.9, 13.4, 2.66, 13.3, 6.72, 4.41, 1.5, 0.24, 113, 1.7],
  ["W6x15", 4.43, 5.99, 5.99, 0.23, 0.26, 0.51, 29.1, 10.8, 9.72, 2.56, 9.32, 4.75, 3.11, 1.45, 0.101, 76.5, 1.66],
  ["W6x12", 3.55, 6.03, 4.0, 0.23, 0.28, 0.53, 22.1, 8.3, 7.31, 2.49, 2.99, 2.32, 1.5, 0.918, 0.0903, 24.7, 1.08],
  ["W6x9", 2.68, 5.9, 3.94, 0.17, 0.215, 0.465, 16.4, 6.23, 5.56, 2.47, 2.2, 1.72, 1.11, 0.905, 0.0405, 17.7, 1.06],
];

describe("W-shapes against the AISC Shapes Database v15.0 (ronkok/Hurmet extraction)", () => {
  test("every Spanlark shape is in the published list", () => {
    const published = new Set(AISC_V15_HURMET.map(([name]) => name));
    for (const s of shapes) expect(published.has(s.name)).toBe(true);
  });

  test.each(AISC_V15_HURMET.filter(([name]) => shapes.some((s) => s.name === name)))("%s: every published field matches", (name, ...values) => {
    const s = shapes.find((x) => x.name === name)!;
    const ours = [s.A, s.d, s.bf, s.tw, s.tf, s.kdes, s.Ix, s.Zx, s.Sx, s.rx, s.Iy, s.Zy, s.Sy, s.ry, s.J, s.Cw, s.rts];
    expect(ours).toEqual(values);
    expect(s.source).toMatch(/checked against/);
  });

  // ho, bf/2tf and h/tw are not in that file: AISC defines them from the dimensions (ho = d − tf,
  // bf/2tf, h/tw with h = d − 2 kdes for rolled shapes); the database rounds to 3 figures.
  test.each(rows)("%s: ho = d − tf, bf/2tf and h/tw = (d − 2 kdes)/tw to the database's rounding", (_, s) => {
    expect(Math.abs(s.ho - (s.d - s.tf))).toBeLessThanOrEqual(0.051);
    expect(Math.abs(s.bf_2tf - s.bf / (2 * s.tf)) / s.bf_2tf).toBeLessThanOrEqual(0.01);
    expect(Math.abs(s.h_tw - (s.d - 2 * s.kdes) / s.tw) / s.h_tw).toBeLessThanOrEqual(0.02);
  });
});
