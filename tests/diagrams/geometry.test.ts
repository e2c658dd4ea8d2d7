import { describe, expect, test } from "vitest";
import { analyzeBeam } from "@/lib/solver/beam";
import { chainVertices, diagramChain, jumpsOf, polyValue, type BezierChain, type DiagramSegment } from "@/lib/diagrams/geometry";
import { diagramPath, diagramScales } from "@/components/diagrams/beam-diagram";

const E = 1_600_000; // psi
const I = 178; // in^4, a 2x12 (NDS Supplement 2018 Table 1B, 177.98 in^4)
const EI = (E * I) / 144; // lb·ft²

/** A point on the cubic Bézier piece ending at index i of the chain, at parameter t. */
function bezierAt(chain: BezierChain, i: number, t: number): [number, number] {
  const p0 = i === 0 ? chain.start : chain.pieces[i - 1][2];
  const [c1, c2, p3] = chain.pieces[i];
  const u = 1 - t;
  const b = (a: number, b1: number, b2: number, c: number) => u * u * u * a + 3 * u * u * t * b1 + 3 * u * t * t * b2 + t * t * t * c;
  return [b(p0[0], c1[0], c2[0], p3[0]), b(p0[1], c1[1], c2[1], p3[1])];
}

function valueAt(segments: DiagramSegment[], key: "V" | "M" | "deflection", x: number): number {
  const seg = segments.find((s) => x >= s.x0 && x <= s.x1) ?? segments[segments.length - 1];
  return polyValue(seg[key], x - seg.x0);
}

describe("a step in the shear diagram at each point load (common practice: a concentrated force is a step of its own size and sense)", () => {
  const L = 10;
  const loads = [
    { x: 3, P: 1000 },
    { x: 7, P: 600 },
  ];
  const a = analyzeBeam({
    length: L,
    E,
    I,
    supports: [
      { x: 0, type: "pin" },
      { x: L, type: "roller" },
    ],
    loads: loads.map((l) => ({ type: "point" as const, ...l })),
  });
  const chain = diagramChain(a.segments, "V");
  const vertices = chainVertices(chain);
  // statics: R1 = ΣP(L − a)/L
  const R1 = loads.reduce((s, l) => s + (l.P * (L - l.x)) / L, 0);

  test.each(loads)("drops by $P lb at x = $x ft, drawn as a vertical line", ({ x, P }) => {
    const jump = jumpsOf(a.segments, "V").find((j) => Math.abs(j.x - x) < 1e-9);
    expect(jump).toBeDefined();
    if (!jump) return;
    expect(jump.to - jump.from).toBeCloseTo(-P, 6);
    const i = vertices.findIndex((v, k) => k > 0 && Math.abs(v[0] - x) < 1e-12 && Math.abs(vertices[k - 1][0] - x) < 1e-12);
    expect(i).toBeGreaterThan(0);
    expect(vertices[i - 1][1]).toBeCloseTo(jump.from, 6);
    expect(vertices[i][1]).toBeCloseTo(jump.to, 6);
  });

  test("rises from 0 to R1 at the left support and returns to 0 at the right", () => {
    expect(vertices[0]).toEqual([0, 0]);
    expect(vertices[1][0]).toBe(0);
    expect(vertices[1][1]).toBeCloseTo(R1, 6);
    expect(vertices[vertices.length - 1]).toEqual([L, 0]);
  });

  test("is flat between loads (no load on the member there)", () => {
    for (let i = 0; i < chain.pieces.length; i++) {
      const [x] = bezierAt(chain, i, 0.5);
      if (Math.abs(x - 3) < 1e-9 || Math.abs(x - 7) < 1e-9 || x === 0 || x === L) continue;
      const [, y] = bezierAt(chain, i, 0.5);
      expect(y).toBeCloseTo(valueAt(a.segments, "V", x), 6);
    }
  });
});

describe("the curves pass through the computed extremes", () => {
  const L = 14;
  const w = 120; // plf
  const a = analyzeBeam({
    length: L,
    E,
    I,
    supports: [
      { x: 0, type: "pin" },
      { x: L, type: "roller" },
    ],
    loads: [{ type: "udl", from: 0, to: L, w }],
  });

  // AISC Steel Construction Manual 15th ed., Table 3-23 case 1 (simple beam, uniform load):
  // Mmax = wL²/8 at L/2; Δmax = 5wL⁴/384EI at L/2.
  test.each([
    { key: "M" as const, x: L / 2, value: (w * L * L) / 8, unitTol: 1e-6 },
    { key: "deflection" as const, x: L / 2, value: ((5 * w * L ** 4) / (384 * EI)) * 12, unitTol: 1e-9 },
  ])("$key has a vertex at ($x ft, handbook value)", ({ key, x, value, unitTol }) => {
    const extreme = key === "M" ? a.extremes.Mpos : a.extremes.deflDown;
    expect(extreme.x).toBeCloseTo(x, 9);
    expect(extreme.value / value).toBeCloseTo(1, 9);
    const chain = diagramChain(a.segments, key, [extreme.x]);
    const hit = chainVertices(chain).find((v) => Math.abs(v[0] - extreme.x) < 1e-12);
    expect(hit).toBeDefined();
    if (hit) expect(Math.abs(hit[1] - value)).toBeLessThan(unitTol * Math.abs(value) + 1e-12);
  });

  test("the moment curve is the polynomial itself between vertices (exact Bézier of degree ≤ 3)", () => {
    const chain = diagramChain(a.segments, "M", [a.extremes.Mpos.x]);
    for (let i = 0; i < chain.pieces.length; i++) {
      for (const t of [0.17, 0.5, 0.83]) {
        const [x, y] = bezierAt(chain, i, t);
        expect(y).toBeCloseTo(valueAt(a.segments, "M", x), 6);
      }
    }
  });

  test("the deflection curve stays within 1/10,000 of the largest deflection between vertices", () => {
    const chain = diagramChain(a.segments, "deflection", [a.extremes.deflDown.x]);
    const scale = a.extremes.deflDown.value;
    for (let i = 0; i < chain.pieces.length; i++) {
      const [x, y] = bezierAt(chain, i, 0.5);
      expect(Math.abs(y - valueAt(a.segments, "deflection", x))).toBeLessThan(1e-4 * scale);
    }
  });
});

describe("overhang and partial loads", () => {
  // a deck joist: 10 ft back span, 2 ft overhang, partial load on the back span and a post load at the tip
  const a = analyzeBeam({
    length: 12,
    E,
    I,
    supports: [
      { x: 0, type: "pin" },
      { x: 10, type: "roller" },
    ],
    loads: [
      { type: "udl", from: 2, to: 8, w: 100 },
      { type: "point", x: 12, P: 300 },
    ],
  });

  test("the shear steps at the interior support by the reaction and at the tip back to 0", () => {
    const jumps = jumpsOf(a.segments, "V");
    const atSupport = jumps.find((j) => Math.abs(j.x - 10) < 1e-9);
    expect(atSupport).toBeDefined();
    if (atSupport) expect(atSupport.to - atSupport.from).toBeCloseTo(a.reactions[1].F, 6);
    const chain = diagramChain(a.segments, "V");
    const v = chainVertices(chain);
    // just left of the tip V = +300 lb (the tip load is the only force right of the cut), then the chain closes to 0
    expect(v[v.length - 2][1]).toBeCloseTo(300, 6);
    expect(v[v.length - 1]).toEqual([12, 0]);
  });

  test("the moment is hogging over the support: −P·a = −300 × 2 lb-ft (statics)", () => {
    expect(valueAt(a.segments, "M", 10)).toBeCloseTo(-600, 6);
    const chain = diagramChain(a.segments, "M", [a.extremes.Mneg.x]);
    const hit = chainVertices(chain).find((p) => Math.abs(p[0] - 10) < 1e-12);
    expect(hit?.[1]).toBeCloseTo(-600, 6);
  });

  test("the SVG path is one move and one cubic per piece, inside the drawing", () => {
    const chain = diagramChain(a.segments, "M", [a.extremes.Mpos.x, a.extremes.Mneg.x]);
    const scales = diagramScales(12, { min: a.extremes.Mneg.value, max: a.extremes.Mpos.value }, "M");
    const d = diagramPath(chain, scales);
    expect(d.match(/M/g)?.length).toBe(1);
    expect(d.match(/C/g)?.length).toBe(chain.pieces.length);
    const numbers = d.match(/-?\d+(\.\d+)?(e-?\d+)?/g)?.map(Number) ?? [];
    expect(numbers.every((n) => Number.isFinite(n) && n >= -1 && n <= 421)).toBe(true);
  });
});
