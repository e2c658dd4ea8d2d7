// Closed forms of the AISC Steel Construction Manual, 15th ed., Table 3-23 "Shears, Moments and
// Deflections" (case numbers and formulas from memory of that table), computed here from the
// formulas and compared to the engine at 1e-9 relative.
import { describe, expect, test } from "vitest";
import { analyzeBeam } from "@/lib/solver/beam";
import { beam, EI, expectClose, fixed, pin, roller } from "./helpers";

const REL = 1e-9;
const IN = 12; // ft → in for deflections computed in ft

describe("simple beams", () => {
  test.each([
    { l: 12, w: 250 },
    { l: 20, w: 40 },
    { l: 7.5, w: 1200 },
  ])("Table 3-23 case 1, simple beam — uniformly distributed load (l=$l ft, w=$w plf)", ({ l, w }) => {
    const a = analyzeBeam(beam(l, [pin(0), roller(l)], [{ type: "udl", from: 0, to: l, w }]));
    const R = (w * l) / 2;
    expectClose(a.reactions[0].F, R, REL);
    expectClose(a.reactions[1].F, R, REL);
    expectClose(a.extremes.Mpos.value, (w * l * l) / 8, REL);
    expectClose(a.extremes.Mpos.x, l / 2, REL);
    expectClose(a.extremes.deflDown.value, ((5 * w * l ** 4) / (384 * EI)) * IN, REL);
    expectClose(a.extremes.deflDown.x, l / 2, 1e-7);
    for (const x of [0.1 * l, 0.3 * l, 0.77 * l]) {
      const s = a.evaluate(x);
      expectClose(s.V, w * (l / 2 - x), REL, R);
      expectClose(s.M, (w * x * (l - x)) / 2, REL);
      expectClose(s.deflection, ((w * x * (l ** 3 - 2 * l * x * x + x ** 3)) / (24 * EI)) * IN, REL);
    }
  });

  test.each([
    { l: 15, W: 3000 },
    { l: 9, W: 800 },
  ])("Table 3-23 case 2, simple beam — load increasing uniformly to one end (l=$l ft, W=$W lb total)", ({ l, W }) => {
    const a = analyzeBeam(beam(l, [pin(0), roller(l)], [{ type: "linear", from: 0, to: l, w1: 0, w2: (2 * W) / l }]));
    expectClose(a.reactions[0].F, W / 3, REL);
    expectClose(a.reactions[1].F, (2 * W) / 3, REL);
    expectClose(a.extremes.Mpos.value, (2 * W * l) / (9 * Math.sqrt(3)), REL);
    expectClose(a.extremes.Mpos.x, l / Math.sqrt(3), 1e-8);
    const dx = (x: number) => ((W * x * (3 * x ** 4 - 10 * l * l * x * x + 7 * l ** 4)) / (180 * EI * l * l)) * IN;
    const xMax = l * Math.sqrt(1 - Math.sqrt(8 / 15));
    expectClose(a.extremes.deflDown.value, dx(xMax), REL);
    expectClose(a.extremes.deflDown.x, xMax, 1e-7);
    expectClose(a.evaluate(0.4 * l).deflection, dx(0.4 * l), REL);
  });

  test.each([
    { a: 3, b: 6, c: 5, w: 300 },
    { a: 0, b: 4, c: 8, w: 500 },
    { a: 6.5, b: 2.5, c: 1, w: 900 },
  ])("Table 3-23 case 4, simple beam — uniform load partially distributed (a=$a, b=$b, c=$c ft)", ({ a: aa, b, c, w }) => {
    const l = aa + b + c;
    const r = analyzeBeam(beam(l, [pin(0), roller(l)], [{ type: "udl", from: aa, to: aa + b, w }]));
    const R1 = (w * b * (2 * c + b)) / (2 * l);
    const R2 = (w * b * (2 * aa + b)) / (2 * l);
    expectClose(r.reactions[0].F, R1, REL);
    expectClose(r.reactions[1].F, R2, REL);
    expectClose(r.extremes.Mpos.value, R1 * (aa + R1 / (2 * w)), REL);
    expectClose(r.extremes.Mpos.x, aa + R1 / w, REL);
    expect(r.extremes.zeroShear).toHaveLength(1);
    expectClose(r.extremes.zeroShear[0], aa + R1 / w, REL);
  });

  test.each([
    { l: 16, P: 2000 },
    { l: 10, P: 650 },
  ])("Table 3-23 case 7, simple beam — concentrated load at center (l=$l)", ({ l, P }) => {
    const a = analyzeBeam(beam(l, [pin(0), roller(l)], [{ type: "point", x: l / 2, P }]));
    expectClose(a.extremes.Mpos.value, (P * l) / 4, REL);
    expectClose(a.extremes.deflDown.value, ((P * l ** 3) / (48 * EI)) * IN, REL);
  });

  test.each([
    { a: 7, b: 3, P: 1500 },
    { a: 11.25, b: 4.75, P: 4200 },
  ])("Table 3-23 case 8, simple beam — concentrated load at any point (a=$a, b=$b ft)", ({ a: aa, b, P }) => {
    const l = aa + b;
    const r = analyzeBeam(beam(l, [pin(0), roller(l)], [{ type: "point", x: aa, P }]));
    expectClose(r.reactions[0].F, (P * b) / l, REL);
    expectClose(r.reactions[1].F, (P * aa) / l, REL);
    expectClose(r.extremes.Mpos.value, (P * aa * b) / l, REL);
    expectClose(r.evaluate(aa).deflection, ((P * aa * aa * b * b) / (3 * EI * l)) * IN, REL);
    // a > b: Δmax = Pab(a+2b)·√(3a(a+2b)) / (27 EI l) at x = √(a(a+2b)/3)
    const xm = Math.sqrt((aa * (aa + 2 * b)) / 3);
    expectClose(r.extremes.deflDown.value, ((P * aa * b * (aa + 2 * b) * Math.sqrt(3 * aa * (aa + 2 * b))) / (27 * EI * l)) * IN, REL);
    expectClose(r.extremes.deflDown.x, xm, 1e-7);
    // the shear is Pb/l left of the load and −Pa/l right of it
    expectClose(r.evaluate(aa - 1e-3).V, (P * b) / l, REL);
    expectClose(r.evaluate(aa).V, (-P * aa) / l, REL);
  });
});

describe("beams overhanging one support", () => {
  test.each([
    { l: 12, a: 3, w: 200 },
    { l: 10, a: 4, w: 75 },
  ])("Table 3-23 case 24, beam overhanging one support — uniformly distributed load (l=$l, a=$a)", ({ l, a, w }) => {
    const r = analyzeBeam(beam(l + a, [pin(0), roller(l)], [{ type: "udl", from: 0, to: l + a, w }]));
    expectClose(r.reactions[0].F, (w * (l * l - a * a)) / (2 * l), REL);
    expectClose(r.reactions[1].F, (w * (l + a) ** 2) / (2 * l), REL);
    const x1 = (l / 2) * (1 - (a * a) / (l * l));
    expectClose(r.extremes.Mpos.value, (w * (l + a) ** 2 * (l - a) ** 2) / (8 * l * l), REL);
    expectClose(r.extremes.Mpos.x, x1, REL);
    expectClose(r.extremes.Mneg.value, (-w * a * a) / 2, REL);
    expectClose(r.extremes.Mneg.x, l, REL);
    // Δ at the free end = wa(4a²l − l³ + 3a³)/(24EI), upward when negative
    expectClose(r.evaluate(l + a).deflection, ((w * a * (4 * a * a * l - l ** 3 + 3 * a ** 3)) / (24 * EI)) * IN, REL, 1e-3);
    expect(r.spans.map((s) => s.kind)).toEqual(["span", "overhang-right"]);
  });

  test.each([
    { l: 12, a: 4, P: 900 },
    { l: 8, a: 2, P: 300 },
    { l: 0.5, a: 150, P: 10 },
  ])("Table 3-23 case 26, beam overhanging one support — concentrated load at end of overhang (l=$l, a=$a)", ({ l, a, P }) => {
    const r = analyzeBeam(beam(l + a, [pin(0), roller(l)], [{ type: "point", x: l + a, P }]));
    expectClose(r.reactions[0].F, (-P * a) / l, REL); // pulls down: the beam must be held down
    expectClose(r.reactions[1].F, (P * (l + a)) / l, REL);
    expectClose(r.extremes.Mneg.value, -P * a, REL);
    // between supports the beam lifts: Δ = Pal²/(9√3 EI) at x = l/√3
    expectClose(r.extremes.deflUp.value, (-(P * a * l * l) / (9 * Math.sqrt(3) * EI)) * IN, REL);
    expectClose(r.extremes.deflUp.x, l / Math.sqrt(3), 1e-7);
    expectClose(r.extremes.deflDown.value, ((P * a * a * (l + a)) / (3 * EI)) * IN, REL);
    expectClose(r.extremes.deflDown.x, l + a, REL);
  });
});

describe("cantilevers", () => {
  test.each([
    { l: 6, w: 120 },
    { l: 3.5, w: 400 },
  ])("Table 3-23 case 19, cantilever — uniformly distributed load (l=$l)", ({ l, w }) => {
    const r = analyzeBeam(beam(l, [fixed(0)], [{ type: "udl", from: 0, to: l, w }]));
    expectClose(r.reactions[0].F, w * l, REL);
    expectClose(r.reactions[0].M, (-w * l * l) / 2, REL); // counterclockwise holds the beam up
    expectClose(r.extremes.Mneg.value, (-w * l * l) / 2, REL);
    expectClose(r.extremes.deflDown.value, ((w * l ** 4) / (8 * EI)) * IN, REL);
    expectClose(r.extremes.deflDown.x, l, REL);
    const x = 0.35 * l; // from the free end in the handbook: Δx = w(x⁴ − 4l³x + 3l⁴)/(24EI)
    expectClose(r.evaluate(l - x).deflection, ((w * (x ** 4 - 4 * l ** 3 * x + 3 * l ** 4)) / (24 * EI)) * IN, REL);
  });

  test.each([
    { l: 5, P: 700 },
    { l: 8, P: 150 },
  ])("Table 3-23 case 22, cantilever — concentrated load at free end (l=$l)", ({ l, P }) => {
    const r = analyzeBeam(beam(l, [fixed(0)], [{ type: "point", x: l, P }]));
    expectClose(r.reactions[0].F, P, REL);
    expectClose(r.extremes.Mneg.value, -P * l, REL);
    expectClose(r.extremes.deflDown.value, ((P * l ** 3) / (3 * EI)) * IN, REL);
    const x = 0.6 * l; // from the free end: Δx = P(2l³ − 3l²x + x³)/(6EI)
    expectClose(r.evaluate(l - x).deflection, ((P * (2 * l ** 3 - 3 * l * l * x + x ** 3)) / (6 * EI)) * IN, REL);
  });

  test.each([{ l: 9, b: 5, P: 400 }])("Table 3-23 case 21, cantilever — concentrated load at any point (l=$l, b=$b from the fixed end)", ({ l, b, P }) => {
    const r = analyzeBeam(beam(l, [fixed(0)], [{ type: "point", x: b, P }]));
    expectClose(r.reactions[0].M, -P * b, REL);
    expectClose(r.extremes.deflDown.value, ((P * b * b * (3 * l - b)) / (6 * EI)) * IN, REL);
  });
});

describe("beams fixed at one end, supported at the other (propped cantilevers)", () => {
  test.each([
    { l: 14, w: 300 },
    { l: 6, w: 80 },
  ])("Table 3-23 case 12, uniformly distributed load (l=$l)", ({ l, w }) => {
    const r = analyzeBeam(beam(l, [roller(0), fixed(l)], [{ type: "udl", from: 0, to: l, w }]));
    expectClose(r.reactions[0].F, (3 * w * l) / 8, REL);
    expectClose(r.reactions[1].F, (5 * w * l) / 8, REL);
    expectClose(r.reactions[1].M, (w * l * l) / 8, REL); // clockwise at the right-hand fixed end
    expectClose(r.extremes.Mneg.value, (-w * l * l) / 8, REL);
    expectClose(r.extremes.Mpos.value, (9 * w * l * l) / 128, REL);
    expectClose(r.extremes.Mpos.x, (3 * l) / 8, REL);
    const dx = (x: number) => ((w * x * (l ** 3 - 3 * l * x * x + 2 * x ** 3)) / (48 * EI)) * IN;
    const xm = (l * (1 + Math.sqrt(33))) / 16;
    expectClose(r.extremes.deflDown.value, dx(xm), REL);
    expectClose(r.extremes.deflDown.x, xm, 1e-7);
    expectClose(r.extremes.inflection[0], (3 * l) / 4, REL);
  });

  test.each([{ l: 10, P: 1000 }])("Table 3-23 case 13, concentrated load at center (l=$l)", ({ l, P }) => {
    const r = analyzeBeam(beam(l, [roller(0), fixed(l)], [{ type: "point", x: l / 2, P }]));
    expectClose(r.reactions[0].F, (5 * P) / 16, REL);
    expectClose(r.reactions[1].F, (11 * P) / 16, REL);
    expectClose(r.extremes.Mneg.value, (-3 * P * l) / 16, REL);
    expectClose(r.extremes.Mpos.value, (5 * P * l) / 32, REL);
    expectClose(r.evaluate(l / 2).deflection, ((7 * P * l ** 3) / (768 * EI)) * IN, REL);
  });
});

describe("beams fixed at both ends", () => {
  test.each([
    { l: 18, w: 500 },
    { l: 4, w: 60 },
  ])("Table 3-23 case 15, uniformly distributed load (l=$l)", ({ l, w }) => {
    const r = analyzeBeam(beam(l, [fixed(0), fixed(l)], [{ type: "udl", from: 0, to: l, w }]));
    expectClose(r.reactions[0].F, (w * l) / 2, REL);
    expectClose(r.reactions[0].M, (-w * l * l) / 12, REL);
    expectClose(r.reactions[1].M, (w * l * l) / 12, REL);
    expectClose(r.extremes.Mneg.value, (-w * l * l) / 12, REL);
    expectClose(r.extremes.Mpos.value, (w * l * l) / 24, REL);
    expectClose(r.extremes.deflDown.value, ((w * l ** 4) / (384 * EI)) * IN, REL);
    expectClose(r.extremes.inflection[0], (l / 2) * (1 - 1 / Math.sqrt(3)), REL);
  });

  test.each([
    { a: 4, b: 8, P: 2500 },
    { a: 5, b: 5, P: 100 },
  ])("Table 3-23 case 18, concentrated load at any point (a=$a, b=$b)", ({ a, b, P }) => {
    const l = a + b;
    const r = analyzeBeam(beam(l, [fixed(0), fixed(l)], [{ type: "point", x: a, P }]));
    expectClose(r.reactions[0].F, (P * b * b * (3 * a + b)) / l ** 3, REL);
    expectClose(r.reactions[1].F, (P * a * a * (a + 3 * b)) / l ** 3, REL);
    expectClose(r.evaluate(0).M, (-P * a * b * b) / (l * l), REL);
    expectClose(r.evaluate(l).M, (-P * a * a * b) / (l * l), REL);
    expectClose(r.evaluate(a).M, (2 * P * a * a * b * b) / l ** 3, REL);
    expectClose(r.evaluate(a).deflection, ((P * a ** 3 * b ** 3) / (3 * EI * l ** 3)) * IN, REL);
  });
});

describe("continuous beams", () => {
  test.each([
    { l: 12, w: 100 },
    { l: 16, w: 45 },
  ])("Table 3-23, continuous beam — two equal spans — uniformly distributed load (l=$l)", ({ l, w }) => {
    const r = analyzeBeam(beam(2 * l, [pin(0), roller(l), roller(2 * l)], [{ type: "udl", from: 0, to: 2 * l, w }]));
    expectClose(r.reactions[0].F, (3 * w * l) / 8, REL);
    expectClose(r.reactions[1].F, (10 * w * l) / 8, REL);
    expectClose(r.reactions[2].F, (3 * w * l) / 8, REL);
    expectClose(r.extremes.Mneg.value, (-w * l * l) / 8, REL);
    expectClose(r.extremes.Mpos.value, (9 * w * l * l) / 128, REL);
    expectClose(r.extremes.Mpos.x, (3 * l) / 8, REL);
    const xm = (l * (15 - Math.sqrt(33))) / 16; // mirror of case 12's maximum
    expectClose(r.spans[0].deflection.value, ((w * (l - xm) * (l ** 3 - 3 * l * (l - xm) ** 2 + 2 * (l - xm) ** 3)) / (48 * EI)) * IN, REL);
    expect(r.spans).toHaveLength(2);
    expectClose(r.spans[1].Mpos.value, (9 * w * l * l) / 128, REL);
  });

  test.each([{ l: 10, w: 200 }])("Table 3-23 case 29, continuous beam — two equal spans — uniform load on one span (l=$l)", ({ l, w }) => {
    const r = analyzeBeam(beam(2 * l, [pin(0), roller(l), roller(2 * l)], [{ type: "udl", from: 0, to: l, w }]));
    expectClose(r.reactions[0].F, (7 * w * l) / 16, REL);
    expectClose(r.reactions[1].F, (5 * w * l) / 8, REL);
    expectClose(r.reactions[2].F, (-w * l) / 16, REL);
    expectClose(r.extremes.Mpos.value, (49 * w * l * l) / 512, REL);
    expectClose(r.extremes.Mpos.x, (7 * l) / 16, REL);
    expectClose(r.extremes.Mneg.value, (-w * l * l) / 16, REL);
  });

  test.each([{ l: 10, P: 1000 }])("Table 3-23 case 30, continuous beam — two equal spans — concentrated load at center of one span (l=$l)", ({ l, P }) => {
    const r = analyzeBeam(beam(2 * l, [pin(0), roller(l), roller(2 * l)], [{ type: "point", x: l / 2, P }]));
    expectClose(r.reactions[0].F, (13 * P) / 32, REL);
    expectClose(r.reactions[1].F, (11 * P) / 16, REL);
    expectClose(r.reactions[2].F, (-3 * P) / 32, REL);
    expectClose(r.extremes.Mpos.value, (13 * P * l) / 64, REL);
    expectClose(r.extremes.Mneg.value, (-3 * P * l) / 32, REL);
  });

  test.each([
    { l: 12, w: 100 },
    { l: 8, w: 333 },
  ])(
    "AISC Manual 15th ed., continuous beam — three equal spans — uniformly distributed load (coefficients 0.4, 1.1, 0.08, 0.025, −0.100; from memory) (l=$l)",
    ({ l, w }) => {
      const r = analyzeBeam(beam(3 * l, [pin(0), roller(l), roller(2 * l), roller(3 * l)], [{ type: "udl", from: 0, to: 3 * l, w }]));
      expectClose(r.reactions[0].F, (2 * w * l) / 5, REL);
      expectClose(r.reactions[1].F, (11 * w * l) / 10, REL);
      expectClose(r.extremes.Mneg.value, (-w * l * l) / 10, REL);
      expectClose(r.spans[0].Mpos.value, (2 * w * l * l) / 25, REL);
      expectClose(r.spans[0].Mpos.x, (2 * l) / 5, REL);
      expectClose(r.spans[1].Mpos.value, (w * l * l) / 40, REL);
      expectClose(r.spans[1].Mpos.x, 1.5 * l, REL);
    },
  );
});
