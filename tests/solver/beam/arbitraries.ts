import fc from "fast-check";
import type { BeamInput, Load, LoadCase, Support, SupportType } from "@/lib/solver/types";

const CASES: LoadCase[] = ["D", "L", "Lr", "S", "W"];

/**
 * A stable random layout: two or more distinct supports, or one fixed support. Supports sit on a
 * grid of 1/50 of the length (no two closer than 2% of it, as on any real member).
 */
export const layoutArb = fc
  .record({
    length: fc.oneof(
      fc.integer({ min: 2, max: 60 }),
      fc.integer({ min: 100, max: 20_000 }).map((k) => k / 100),
    ),
    cantilever: fc.boolean(),
    slots: fc.uniqueArray(fc.integer({ min: 0, max: 50 }), { minLength: 2, maxLength: 6 }),
    types: fc.array(fc.constantFrom<SupportType>("pin", "roller", "fixed"), { minLength: 6, maxLength: 6 }),
  })
  .map(({ length, cantilever, slots, types }) => {
    const supports: Support[] = cantilever ? [{ x: (slots[0] / 50) * length, type: "fixed" }] : slots.map((s, i) => ({ x: (s / 50) * length, type: types[i] }));
    return { length, supports };
  });

function loadArb(length: number): fc.Arbitrary<Load> {
  const pos = fc.integer({ min: 0, max: 400 }).map((k) => (k / 400) * length);
  // magnitudes to 0.01 of a unit: no denormal or zero-width nonsense, zero allowed
  const mag = (m: number) => fc.integer({ min: -100 * m, max: 100 * m }).map((k) => k / 100);
  const c = fc.constantFrom(...CASES);
  const range = fc
    .uniqueArray(fc.integer({ min: 0, max: 400 }), { minLength: 2, maxLength: 2 })
    .map(([a, b]) => [(Math.min(a, b) / 400) * length, (Math.max(a, b) / 400) * length] as const);
  return fc.oneof(
    fc.record({ x: pos, P: mag(5000), c }).map(({ x, P, c: lc }): Load => ({ type: "point", x, P, case: lc })),
    fc.record({ r: range, w: mag(800), c }).map(({ r, w, c: lc }): Load => ({ type: "udl", from: r[0], to: r[1], w, case: lc })),
    fc.record({ r: range, w1: mag(800), w2: mag(800), c }).map(({ r, w1, w2, c: lc }): Load => ({ type: "linear", from: r[0], to: r[1], w1, w2, case: lc })),
    fc.record({ x: pos, M: mag(8000), c }).map(({ x, M, c: lc }): Load => ({ type: "moment", x, M, case: lc })),
  );
}

/** A random stable beam with 1 to 8 loads of every kind and case. */
export const beamArb: fc.Arbitrary<BeamInput> = layoutArb.chain(({ length, supports }) =>
  fc
    .record({
      loads: fc.array(loadArb(length), { minLength: 1, maxLength: 8 }),
      E: fc.constantFrom(1_000_000, 1_600_000, 2_000_000, 29_000_000),
      I: fc.integer({ min: 50, max: 20_000 }).map((k) => k / 10),
    })
    .map(({ loads, E, I }) => ({ length, E, I, supports, loads })),
);

/** Σ|P| + Σ∫|w| + Σ|C|/L: the scale of the loads, lb. */
export function loadScale(input: BeamInput): number {
  let s = 0;
  for (const ld of input.loads) {
    if (ld.type === "point") s += Math.abs(ld.P);
    else if (ld.type === "moment") s += Math.abs(ld.M) / input.length;
    else if (ld.type === "udl") s += Math.abs(ld.w) * (ld.to - ld.from);
    else s += ((Math.abs(ld.w1) + Math.abs(ld.w2)) / 2) * (ld.to - ld.from);
  }
  return s;
}

/**
 * Absolute floors for comparing results that should be 0 (roundoff of the load scale S, lb):
 * V ~ S, M ~ S·L, slope ~ S·L²/EI, deflection ~ S·L³/EI (in), each times 1e-12.
 */
export function roundoffFloors(input: BeamInput, S = loadScale(input)): { V: number; M: number; slope: number; deflection: number } {
  const L = input.length;
  const EI = (input.E * input.I) / 144;
  return { V: 1e-12 * S, M: 1e-12 * S * L, slope: (1e-12 * S * L * L) / EI, deflection: ((1e-12 * S * L ** 3) / EI) * 12 };
}
