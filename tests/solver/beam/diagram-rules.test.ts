// The trade's rules of shear and moment diagrams (common practice, as taught in every statics and
// strength-of-materials course), checked on a table of layouts and on random beams.
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { analyzeBeam, type BeamAnalysis } from "@/lib/solver/beam";
import type { BeamInput, Load } from "@/lib/solver/types";
import { beamArb, loadScale } from "./arbitraries";
import { beam, EI, expectClose, fixed, pin, roller } from "./helpers";

const layouts: { name: string; input: BeamInput }[] = [
  {
    name: "simple span with a post load, a partial wall and a hip (triangular) load",
    input: beam(
      16,
      [pin(0), roller(16)],
      [
        { type: "point", x: 5, P: 2200 },
        { type: "udl", from: 8, to: 13, w: 350 },
        { type: "linear", from: 0, to: 6, w1: 0, w2: 240 },
      ],
    ),
  },
  {
    name: "deck beam with overhangs at both ends",
    input: beam(
      20,
      [pin(2.5), roller(16)],
      [
        { type: "udl", from: 0, to: 20, w: 180 },
        { type: "point", x: 20, P: 400 },
        { type: "moment", x: 9, M: 1500 },
      ],
    ),
  },
  {
    name: "joists continuous over three spans with a clockwise couple",
    input: beam(
      36,
      [pin(0), roller(12), roller(24), roller(36)],
      [
        { type: "udl", from: 0, to: 36, w: 60 },
        { type: "moment", x: 18, M: -900 },
        { type: "point", x: 30, P: 700 },
      ],
    ),
  },
];

const simplySupportedOrFree: { name: string; input: BeamInput }[] = [
  layouts[0],
  layouts[1],
  {
    name: "cantilever, free right end",
    input: beam(
      6,
      [fixed(0)],
      [
        { type: "udl", from: 1, to: 6, w: 90 },
        { type: "point", x: 4, P: 300 },
      ],
    ),
  },
];

describe("common practice: both diagrams start and end at zero on a free or simply supported beam", () => {
  test.each(simplySupportedOrFree)("$name", ({ input }) => {
    const a = analyzeBeam(input);
    const scale = loadScale(input);
    const L = input.length;
    // Left end: before anything acts, V = 0 and M = 0; the diagrams then step by what acts at
    // x = 0 (a reaction, a load, a fixed end's moment, a couple).
    const at = (x: number) => ({
      F: a.reactions.filter((r) => r.x === x).reduce((s, r) => s + r.F, 0),
      Mr: a.reactions.filter((r) => r.x === x).reduce((s, r) => s + r.M, 0),
      P: input.loads.reduce((s, ld) => s + (ld.type === "point" && ld.x === x ? ld.P : 0), 0),
      C: input.loads.reduce((s, ld) => s + (ld.type === "moment" && ld.x === x ? ld.M : 0), 0),
    });
    const s0 = at(0);
    expectClose(a.evaluate(0).V - s0.F + s0.P, 0, 1e-9, scale);
    expectClose(a.evaluate(0).M - s0.Mr - s0.C, 0, 1e-9, scale * L);
    // Right end: the value just left of the end, plus what acts there, closes to 0.
    const sL = at(L);
    expectClose(a.evaluate(L).V + sL.F - sL.P, 0, 1e-9, scale);
    expectClose(a.evaluate(L).M + sL.Mr + sL.C, 0, 1e-9, scale * L);
    // A pin, roller or free end carries no moment.
    if (!input.supports.some((sp) => sp.x === 0 && sp.type === "fixed")) expectClose(a.evaluate(0).M - s0.C, 0, 1e-9, scale * L);
    if (!input.supports.some((sp) => sp.x === L && sp.type === "fixed")) expectClose(a.evaluate(L).M + sL.C, 0, 1e-9, scale * L);
  });
});

describe("common practice: a concentrated force is a step of the same size and sense in the shear diagram", () => {
  test.each(layouts)("$name", ({ input }) => {
    const a = analyzeBeam(input);
    const h = 1e-6 * input.length;
    for (const ld of input.loads) {
      if (ld.type !== "point" || ld.x === 0 || ld.x === input.length) continue;
      const R = a.reactions.filter((r) => Math.abs(r.x - ld.x) < 1e-12).reduce((s, r) => s + r.F, 0);
      const step = a.evaluate(ld.x).V - a.evaluate(ld.x - h).V;
      expectClose(step, -ld.P + R, 1e-5, loadScale(input)); // down load: down step (over h the udl adds O(h))
    }
    for (const r of a.reactions) {
      if (r.x === 0 || r.x === input.length) continue;
      const P = input.loads.reduce((s, ld) => s + (ld.type === "point" && ld.x === r.x ? ld.P : 0), 0);
      expectClose(a.evaluate(r.x).V - a.evaluate(r.x - h).V, r.F - P, 1e-5, loadScale(input)); // up reaction: up step
    }
  });
});

describe("common practice: the load is the slope of the shear diagram, the shear the slope of the moment diagram", () => {
  function loadAt(loads: Load[], x: number): number {
    let w = 0;
    for (const ld of loads) {
      if (ld.type === "udl" && x > ld.from && x < ld.to) w += ld.w;
      if (ld.type === "linear" && x > ld.from && x < ld.to) w += ld.w1 + ((ld.w2 - ld.w1) * (x - ld.from)) / (ld.to - ld.from);
    }
    return w;
  }
  test.each(layouts)("$name: dV/dx = −w, dM/dx = V, d(slope)/dx = −M/EI, d(deflection)/dx = slope", ({ input }) => {
    const a = analyzeBeam(input);
    for (const seg of a.segments) {
      const mid = (seg.x0 + seg.x1) / 2;
      const xi = mid - seg.x0;
      const d = (c: number[]) => c.slice(1).reduce((s, ck, k) => s + (k + 1) * ck * xi ** k, 0);
      const v = (c: number[]) => c.reduce((s, ck, k) => s + ck * xi ** k, 0);
      expectClose(d(seg.V), -loadAt(input.loads, mid), 1e-9, 1e-6);
      expectClose(d(seg.M), v(seg.V), 1e-9, 1e-6);
      expectClose(d(seg.slope), -v(seg.M) / EI, 1e-9, 1e-15);
      expectClose(d(seg.deflection) / 12, v(seg.slope), 1e-9, 1e-15);
    }
  });
});

describe("common practice: a clockwise couple is an upward step in the moment diagram", () => {
  test.each([
    { C: 1200, x: 5 },
    { C: -800, x: 11 },
  ])("C = $C lb-ft at x = $x ft on a 14 ft simple span", ({ C, x }) => {
    const a = analyzeBeam(
      beam(
        14,
        [pin(0), roller(14)],
        [
          { type: "moment", x, M: C },
          { type: "udl", from: 0, to: 14, w: 100 },
        ],
      ),
    );
    const h = 1e-7;
    expectClose(a.evaluate(x).M - a.evaluate(x - h).M, C, 1e-6);
    // and the shear does not step there (over h it changes by the line load only: −w·h)
    expectClose(a.evaluate(x).V - a.evaluate(x - h).V, -100 * h, 1e-6);
  });
});

/**
 * M at z is a local maximum (or minimum) from both sides; where a couple also acts at z, M steps
 * there, so each side is compared with its own one-sided limit.
 */
function isLocalExtreme(a: BeamAnalysis, z: number, input: BeamInput, tol: number): boolean {
  const L = input.length;
  // Probe no further than halfway to the next reported zero-shear point, support or couple: two zero-shear
  // points can sit a hair apart (a crossing just left of a support where V jumps back), and a crossing can sit
  // a hair from a couple (M steps there); a wider probe would step over the other point or the step.
  const steps = [...input.supports.map((s) => s.x), ...input.loads.flatMap((l) => (l.type === "moment" ? [l.x] : []))];
  const gaps = [...a.extremes.zeroShear, ...steps].map((p) => Math.abs(p - z)).filter((d) => d > 1e-12 * L);
  const h = Math.min(1e-4 * L, 0.5 * Math.min(Infinity, ...gaps));
  const lim = Math.min(1e-7 * L, h / 10);
  const leftLim = a.evaluate(Math.max(z - lim, 0)).M;
  const left = a.evaluate(Math.max(z - h, 0)).M;
  const rightLim = a.evaluate(z).M;
  const right = a.evaluate(Math.min(z + h, L)).M;
  const max = leftLim >= left - tol && rightLim >= right - tol;
  const min = leftLim <= left + tol && rightLim <= right + tol;
  return max || min;
}

describe("common practice: the moment has a local extreme where the shear crosses zero", () => {
  test.each(layouts)("$name", ({ input }) => {
    const a = analyzeBeam(input);
    expect(a.extremes.zeroShear.length).toBeGreaterThan(0);
    for (const z of a.extremes.zeroShear) expect(isLocalExtreme(a, z, input, 0)).toBe(true);
  });

  test("on random beams: at every reported zero-shear point M is a local extreme", () => {
    fc.assert(
      fc.property(beamArb, (input) => {
        const a = analyzeBeam(input);
        const tol = 1e-9 * Math.max(Math.abs(a.extremes.Mpos.value), Math.abs(a.extremes.Mneg.value));
        for (const z of a.extremes.zeroShear) expect(isLocalExtreme(a, z, input, tol)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  test("a crossing 0.0005 in right of a couple (M steps there): a local extreme on its own side", () => {
    // found by the random test above (seed 485676344): the shear crosses zero at x = 7.315044 ft, a couple of
    // −3,731.67 lb-ft acts at 7.315 ft; a probe of 0.0038 ft stepped over the couple's step
    const input: BeamInput = {
      length: 38,
      E: 1_000_000,
      I: 5,
      supports: [
        { x: 37.24, type: "roller" },
        { x: 2.28, type: "fixed" },
        { x: 24.32, type: "fixed" },
        { x: 3.8, type: "fixed" },
      ],
      loads: [
        { type: "udl", from: 0, to: 10.64, w: 30.83 },
        { type: "linear", from: 0.095, to: 22.23, w1: 0, w2: -64.6 },
        { type: "moment", x: 7.315, M: -3731.67 },
      ],
    };
    const a = analyzeBeam(input);
    expect(a.extremes.zeroShear.some((z) => z > 7.315 && z < 7.3151)).toBe(true);
    const tol = 1e-9 * Math.max(Math.abs(a.extremes.Mpos.value), Math.abs(a.extremes.Mneg.value));
    for (const z of a.extremes.zeroShear) expect(isLocalExtreme(a, z, input, tol)).toBe(true);
  });

  test("a crossing 0.0075 in left of a support where the shear jumps back: both are extremes", () => {
    // found by the random test above: a maximum at x = 3.98325 ft and a minimum at the support at 3.984 ft
    const input: BeamInput = {
      length: 33.2,
      E: 1_000_000,
      I: 5,
      supports: [
        { x: 23.904, type: "roller" },
        { x: 2.656, type: "roller" },
        { x: 25.232, type: "fixed" },
        { x: 15.272, type: "fixed" },
        { x: 3.984, type: "pin" },
        { x: 7.304, type: "roller" },
      ],
      loads: [
        { type: "udl", from: 0.913, to: 4.648, w: 2, case: "D" },
        { type: "point", x: 6.391, P: 5.58, case: "D" },
      ],
    };
    const a = analyzeBeam(input);
    expect(a.extremes.zeroShear.some((z) => z > 3.983 && z < 3.9839)).toBe(true);
    for (const z of a.extremes.zeroShear) expect(isLocalExtreme(a, z, input, 1e-12)).toBe(true);
  });
});
