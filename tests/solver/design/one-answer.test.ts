import { describe, expect, test } from "vitest";
import { asdCombinations } from "@/lib/solver/asce7/combinations";
import { checkMember, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

/**
 * One answer, computed once: the sizing search gives its best members' whole checks (the same as
 * /api/check), each combination named with its factors, and the diagrams the screens draw.
 */
// a segment's polynomial (coefficients in ascending powers of ξ = x − x0) at ξ, by Horner's rule
const polyValue = (c: number[], xi: number) => c.reduceRight((v, k) => v * xi + k, 0);

const problem = {
  lengthFt: 8,
  supports: [
    { x: 0, type: "pin" },
    { x: 8, type: "roller" },
  ],
  tributaryFt: 6,
  loads: [
    { type: "area", case: "D", psf: 15 },
    { type: "area", case: "L", psf: 40 },
  ],
  conditions: { selfWeight: true },
  limits: { live: 360, total: 240 },
};

describe("the sizing search's best members carry their whole check", () => {
  const size = sizeMember({ ...problem, member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" }, limit: 6, fullChecks: 3 }, STARTER_TABLES);

  test("the first three passing members have it, the rest do not", () => {
    expect(size.passing.length).toBeGreaterThan(3);
    expect(size.passing.slice(0, 3).every((p) => p.check !== undefined)).toBe(true);
    expect(size.passing.slice(3).every((p) => p.check === undefined)).toBe(true);
  });

  test.each([0, 1, 2])("member %i: the same check as checking it on its own", (i) => {
    const p = size.passing[i];
    expect(p.check).toEqual(checkMember({ ...problem, member: p.member }, STARTER_TABLES));
    expect(p.check?.answer).toBe(p.answer);
  });

  test("without fullChecks the search answers as before, with no checks", () => {
    const plain = sizeMember({ ...problem, member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" }, limit: 6 }, STARTER_TABLES);
    expect(plain.passing.every((p) => p.check === undefined)).toBe(true);
  });
});

describe("each check names its combination with the factors", () => {
  const check = checkMember({ ...problem, member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 2 } }, STARTER_TABLES);

  test("the factors are those of ASCE 7-22 §2.4.1 for that name (the live-only deflection combination: L alone)", () => {
    const byName = new Map(asdCombinations().map((c) => [c.name, c.factors]));
    for (const c of check.checks) {
      if (!c.combination) continue;
      if (c.name === "deflection-live") expect(c.combination).toEqual({ name: "L", factors: { L: 1 } });
      else expect(c.combination.factors).toEqual(byName.get(c.combination.name));
    }
  });

  // Simply supported beam, uniform load (AISC Steel Construction Manual 15th ed., Table 3-23 case 1, from memory):
  // Mmax = wL²/8 at midspan, Vmax = wL/2, Δmax = 5wL⁴/(384EI).
  test("the diagrams are the simple-span formulas under the combinations the checks name", () => {
    const d = check.diagrams!;
    const bending = check.checks.find((c) => c.name === "bending")!;
    const total = check.checks.find((c) => c.name === "deflection-total")!;
    expect(d.strength.combination).toEqual(bending.combination);
    expect(d.service.combination).toEqual(total.combination);
    const lineLoad = (f: Record<string, number | undefined>) => d.loads.reduce((sum, l) => sum + (l.type === "udl" ? l.w * (f[l.case] ?? 0) : 0), 0);
    const L = 8;
    const w = lineLoad(d.strength.combination.factors);
    const M = d.strength.moment.find((e) => e.label === "Largest moment")!;
    expect(Math.abs(M.value - (w * L * L) / 8)).toBeLessThan(1e-6 * M.value);
    expect(M.x).toBeCloseTo(L / 2, 6);
    expect(Math.abs(Math.abs(d.strength.shear[0].value) - (w * L) / 2)).toBeLessThan(1e-6 * w * L);
    // fb = M/S with S of two dressed 2x10 plies (1.5 in × 9.25 in, NDS Supplement 2018 Table 1B)
    const S = (2 * 1.5 * 9.25 ** 2) / 6;
    expect(bending.demand).toBeCloseTo((M.value * 12) / S, 0);
    const ws = lineLoad(d.service.combination.factors);
    const delta = (5 * (ws / 12) * (L * 12) ** 4) / (384 * d.EPsi * d.IIn4);
    const sag = d.service.deflection.find((e) => e.label === "Largest sag")!;
    // extremes are given to 1e-6 of their unit (here in)
    expect(Math.abs(sag.value - delta)).toBeLessThanOrEqual(1e-6);
    expect(total.demand).toBeCloseTo(delta, 3);
    const seg = d.strength.segments.find((s) => s.x0 <= L / 2 && s.x1 >= L / 2)!;
    expect(Math.abs(polyValue(seg.M, L / 2 - seg.x0) - (w * L * L) / 8)).toBeLessThan(1e-6 * M.value);
    // the reactions under the service combination: wL/2 each
    for (const r of d.service.reactions) expect(r.F).toBeCloseTo((ws * L) / 2, 3);
  });
});
