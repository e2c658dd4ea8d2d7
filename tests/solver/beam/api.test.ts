// The parts of the analysis API that the design checks and the diagrams lean on: many stations at
// once, the exact moment extremes over an unbraced length, span results, and the piece list.
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { analyzeBeam } from "@/lib/solver/beam";
import { beamArb } from "./arbitraries";
import { beam, EI, expectClose, fixed, pin, roller } from "./helpers";

describe("evaluateMany", () => {
  test("gives exactly what evaluate gives, for sorted and unsorted stations", () => {
    fc.assert(
      fc.property(beamArb, fc.array(fc.integer({ min: 0, max: 1000 }), { minLength: 1, maxLength: 60 }), (input, ks) => {
        const a = analyzeBeam(input);
        const xs = ks.map((k) => (k / 1000) * input.length);
        for (const order of [xs, [...xs].sort((p, q) => p - q)]) {
          const many = a.evaluateMany(order);
          const bad: number[] = [];
          order.forEach((x, i) => {
            const s = a.evaluate(x);
            if (s.V !== many.V[i] || s.M !== many.M[i] || s.slope !== many.slope[i] || s.deflection !== many.deflection[i]) bad.push(x);
          });
          expect(bad).toEqual([]);
        }
      }),
      { numRuns: 300 },
    );
  });

  test("a station off the member is refused", () => {
    const a = analyzeBeam(beam(10, [pin(0), roller(10)], [{ type: "point", x: 5, P: 100 }]));
    expect(() => a.evaluate(10.5)).toThrow(RangeError);
    expect(() => a.evaluateMany([1, Number.NaN])).toThrow(RangeError);
  });
});

describe("momentExtremeBetween (exact, for an unbraced length)", () => {
  test("bounds every value inside [a, b] and is reached inside it", () => {
    fc.assert(
      fc.property(beamArb, fc.integer({ min: 0, max: 999 }), fc.integer({ min: 1, max: 1000 }), (input, ka, kb) => {
        fc.pre(kb > ka);
        const a = (ka / 1000) * input.length;
        const b = (kb / 1000) * input.length;
        const r = analyzeBeam(input);
        const { max, min } = r.momentExtremeBetween(a, b);
        const scale = Math.max(Math.abs(r.extremes.Mpos.value), Math.abs(r.extremes.Mneg.value), 1e-9);
        expect(max.x).toBeGreaterThanOrEqual(a);
        expect(max.x).toBeLessThanOrEqual(b);
        const over: number[] = [];
        for (let i = 1; i < 200; i++) {
          const m = r.evaluate(a + ((b - a) * i) / 200).M;
          if (m > max.value + 1e-9 * scale || m < min.value - 1e-9 * scale) over.push(m);
        }
        expect(over).toEqual([]);
        expect(max.value).toBeLessThanOrEqual(r.extremes.Mpos.value + 1e-9 * scale);
        expect(min.value).toBeGreaterThanOrEqual(r.extremes.Mneg.value - 1e-9 * scale);
      }),
      { numRuns: 300 },
    );
  });

  test("simple span under uniform load, unbraced from 2 ft to 5 ft of 12 ft: M = wx(l−x)/2 at the ends of that length (AISC Manual 15th ed., Table 3-23 case 1)", () => {
    const w = 150;
    const l = 12;
    const r = analyzeBeam(beam(l, [pin(0), roller(l)], [{ type: "udl", from: 0, to: l, w }]));
    const M = (x: number) => (w * x * (l - x)) / 2;
    const e = r.momentExtremeBetween(2, 5);
    expectClose(e.max.value, M(5), 1e-12);
    expectClose(e.min.value, M(2), 1e-12);
    expectClose(r.momentExtremeBetween(4, 9).max.value, (w * l * l) / 8, 1e-12);
  });
});

describe("span results", () => {
  test("a deck beam with overhangs: kinds, lengths and span/deflection ratios", () => {
    const r = analyzeBeam(beam(18, [pin(2), roller(14)], [{ type: "udl", from: 0, to: 18, w: 120 }]));
    expect(r.spans.map((s) => [s.kind, s.from, s.to, s.length])).toEqual([
      ["overhang-left", 0, 2, 2],
      ["span", 2, 14, 12],
      ["overhang-right", 14, 18, 4],
    ]);
    for (const s of r.spans) expectClose(s.ratio ?? 0, (s.length * 12) / Math.abs(s.deflection.value), 1e-12);
    expect(r.spans[2].deflection.x).toBe(18);
  });

  test("a lone fixed support inside the member: two cantilevers", () => {
    const r = analyzeBeam(
      beam(
        10,
        [fixed(4)],
        [
          { type: "point", x: 0, P: 100 },
          { type: "point", x: 10, P: 100 },
        ],
      ),
    );
    expect(r.spans.map((s) => s.kind)).toEqual(["overhang-left", "overhang-right"]);
    // AISC Manual 15th ed., Table 3-23 case 22 on each side: Δ = Pl³/(3EI)
    expectClose(r.spans[0].deflection.value, ((100 * 4 ** 3) / (3 * EI)) * 12, 1e-9);
    expectClose(r.spans[1].deflection.value, ((100 * 6 ** 3) / (3 * EI)) * 12, 1e-9);
  });

  test("no load: no deflection and no ratio", () => {
    const r = analyzeBeam(beam(10, [pin(0), roller(10)], []));
    expect(r.spans[0].ratio).toBeNull();
    expect(r.extremes.zeroShear).toEqual([]);
  });
});

describe("segments", () => {
  test("cover the member without gaps and break at every load point and support", () => {
    const r = analyzeBeam(
      beam(
        20,
        [pin(0), roller(8), roller(20)],
        [
          { type: "point", x: 3, P: 500 },
          { type: "linear", from: 5, to: 11, w1: 0, w2: 300 },
          { type: "moment", x: 15, M: 800 },
        ],
      ),
    );
    const xs = r.segments.flatMap((s) => [s.x0, s.x1]);
    expect([...new Set(xs)]).toEqual([0, 3, 5, 8, 11, 15, 20]);
    for (let i = 1; i < r.segments.length; i++) expect(r.segments[i].x0).toBe(r.segments[i - 1].x1);
    for (const s of r.segments) {
      expect(s.V).toHaveLength(3);
      expect(s.M).toHaveLength(4);
      expect(s.slope).toHaveLength(5);
      expect(s.deflection).toHaveLength(6);
    }
  });
});
