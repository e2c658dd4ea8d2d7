import { describe, expect, test } from "vitest";
import { checkMember } from "@/lib/solver/design";
import { analyzeBeam } from "@/lib/solver/beam";
import { findSawnSize, sawnValuesForSize, STARTER_TABLES } from "@/lib/tables";
import type { Load } from "@/lib/solver/types";

/**
 * Shear with loads near supports left out, NDS 2018 §3.4.3.1:
 * (a) uniformly distributed loads within d of the support may be ignored;
 * (b) concentrated loads within d of the support may be multiplied by x/d, x from the support face.
 * The support face is half the bearing length from the support's center line. Hand figures below,
 * fv = 3V/2A (NDS 2018 Eq. 3.4-2), Fv' = Fv × CD (NDS 2018 Table 2.3.2: CD = 1.0 for L).
 */
const s = findSawnSize(STARTER_TABLES, "2x10"); // d = 9.25 in, A = 13.875 in²
const v = sawnValuesForSize(STARTER_TABLES, "Douglas Fir-Larch", "No.2", "2x10");
const bearing = 3; // in → face 1.5 in from the center line

function joist(length: number, loads: Record<string, unknown>[], supports?: { x: number; type: string }[], ignore = true) {
  return {
    member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10" },
    lengthFt: length,
    supports: supports ?? [
      { x: 0, type: "pin" },
      { x: length, type: "roller" },
    ],
    loads,
    bearingIn: bearing,
    conditions: { selfWeight: false, shearIgnoreLoadsNearSupports: ignore, repetitive: false },
    limits: { live: null, total: null },
  };
}
const shear = (r: ReturnType<typeof checkMember>) => r.checks.find((c) => c.name === "shear");

describe("NDS 2018 §3.4.3.1(b): a point load within d of the face counts at x/d, never dropped", () => {
  // 10 ft span, P = 4000 lb (L) at a = 9 in from the left support's center: x = 9 − 1.5 = 7.5 in from the face,
  // x/d = 7.5/9.25 = 0.8108. V at the left face = 0.8108 × 4000 × (10 − 0.75)/10 = 3000 lb.
  const a = 0.75;
  const P = 4000;
  const r = checkMember(joist(10, [{ type: "point", case: "L", x: a, P }]), STARTER_TABLES);
  const k = (a * 12 - bearing / 2) / s.d;
  const V = k * P * ((10 - a) / 10);

  test("V = (x/d) P (L − a)/L; fv = 3V/2A (tolerance 0.1 psi)", () => {
    expect(shear(r)?.demand).toBeCloseTo((1.5 * V) / s.A, 1);
    expect(shear(r)?.capacity).toBeCloseTo(v.Fv * 1.0, 1);
    expect(shear(r)?.note).toMatch(/x\/d/);
  });

  test("the member fails on shear (a careless reading that drops the load passes it)", () => {
    expect(shear(r)?.ratio).toBeGreaterThan(1);
    expect(r.pass).toBe(false);
    // the load dropped, as before: |V(d)| = |R − P| = P a / L, far below
    expect((1.5 * ((P * a) / 10)) / s.A).toBeLessThan((shear(r)?.demand ?? 0) / 5);
  });

  test("a point load on the bearing itself (x ≤ 0) goes straight into the support", () => {
    const onBearing = checkMember(joist(10, [{ type: "point", case: "L", x: 0.1, P }]), STARTER_TABLES);
    expect(shear(onBearing)?.demand).toBeCloseTo(0, 6);
  });

  test("without the option every load counts: V = R = P (L − a)/L", () => {
    const full = checkMember(joist(10, [{ type: "point", case: "L", x: a, P }], undefined, false), STARTER_TABLES);
    expect(shear(full)?.demand).toBeCloseTo((1.5 * P * ((10 - a) / 10)) / s.A, 1);
  });
});

describe("§3.4.3.1(a) and the section at exactly d from each face (uniform load)", () => {
  // Simple span, w uniform: V(d) = w (L/2 − z), z = (bearing/2 + d)/12 ft, at both ends, for any span
  // (the station grid never rounds it: 13.7 ft is not a multiple of anything the grid uses).
  test.each([10, 13.7, 7.3])("span %f ft, w = 400 plf (tolerance 0.05 psi, the reported rounding)", (L) => {
    const w = 400;
    const r = checkMember(joist(L, [{ type: "udl", case: "L", from: 0, to: L, w }]), STARTER_TABLES);
    const z = (bearing / 2 + s.d) / 12;
    const V = w * (L / 2 - z);
    const fv = (1.5 * V) / s.A;
    expect(shear(r)?.demand).toBeCloseTo(fv, 1);
  });

  test("an unsymmetric load: the right-hand support's section governs and is read exactly", () => {
    // w1 = 100 plf on the left half, 600 plf on the right half of 12.3 ft; R_right by statics,
    // V at d from the right face = R_right − 600 z.
    const L = 12.3;
    const loads = [
      { type: "udl", case: "L", from: 0, to: L / 2, w: 100 },
      { type: "udl", case: "L", from: L / 2, to: L, w: 600 },
    ];
    const r = checkMember(joist(L, loads), STARTER_TABLES);
    const z = (bearing / 2 + s.d) / 12;
    // Loads within z of each support left out: the beam carries 100 plf on [z, L/2] and 600 plf on [L/2, L − z].
    const W1 = 100 * (L / 2 - z);
    const W2 = 600 * (L / 2 - z);
    const Rright = (W1 * (z + (L / 2 - z) / 2) + W2 * (L / 2 + (L / 2 - z) / 2)) / L;
    expect(shear(r)?.demand).toBeCloseTo((1.5 * Rright) / s.A, 1);
    expect(shear(r)?.x).toBeCloseTo(L - z, 3); // x is reported to 0.001 ft
  });

  test("every support of a continuous member: the same loads solved by the general beam solver", () => {
    // Two spans of 9 ft, 300 plf: the shear design value is the largest |V| of the beam with the loads
    // within d of each face taken out (solved independently here with analyzeBeam).
    const supports = [
      { x: 0, type: "pin" as const },
      { x: 9, type: "roller" as const },
      { x: 18, type: "roller" as const },
    ];
    const z = (bearing / 2 + s.d) / 12;
    const pieces: [number, number][] = [
      [z, 9 - z],
      [9 + z, 18 - z],
    ];
    const loads: Load[] = pieces.map(([from, to]) => ({ type: "udl", from, to, w: 300, case: "L" }));
    const ref = analyzeBeam({ length: 18, E: 1.6e6, I: s.Ix, supports, loads });
    const Vref = Math.max(...[0, 9 - 1e-9, 9, 18 - 1e-9].map((x) => Math.abs(ref.evaluate(x).V)));
    const r = checkMember(
      {
        ...joist(18, [{ type: "udl", case: "L", from: 0, to: 18, w: 300 }], supports),
        conditions: { selfWeight: false, shearIgnoreLoadsNearSupports: true, repetitive: false, patternLiveLoad: false },
      },
      STARTER_TABLES,
    );
    expect(shear(r)?.demand).toBeCloseTo((1.5 * Vref) / s.A, 1);
    // the interior support governs, read at d from its face
    expect(Math.min(Math.abs((shear(r)?.x ?? 0) - (9 - z)), Math.abs((shear(r)?.x ?? 0) - (9 + z)))).toBeLessThan(1e-3);
  });
});
