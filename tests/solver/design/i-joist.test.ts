import { describe, expect, test } from "vitest";
import { checkMember } from "@/lib/solver/design/check";
import { endReactionCapacity, uniformDeflectionIn } from "@/lib/solver/design/i-joist";
import { sizeMember } from "@/lib/solver/design/size";
import { findIJoist, STARTER_TABLES } from "@/lib/tables";

// Wood I-joists checked against their published capacities (APA PRI-400 design properties; NDS 2018
// Chapter 7). The worked example: a PRI-40 9-1/2 joist over a 13.5 ft simple span at 16 in o.c. with
// 40 psf live and 15 psf dead (woodengineering.com, "Shear Deflection – Prefab Wood I-Joist", reading
// EI = 184 × 10⁶ lbf-in² and K = 4.94 × 10⁶ lbf from ICC-ES ESR-1405). Each figure is computed here
// from the published formulas: Δ = 5wL⁴/384EI + wL²/K, M = wL²/8, V = R = wL/2.

const T = STARTER_TABLES;
const SPAN = 13.5;

function floor(joist: string, extra: Record<string, unknown> = {}) {
  return {
    member: { material: "ijoist", joist },
    lengthFt: SPAN,
    supports: [
      { x: 0, type: "pin" },
      { x: SPAN, type: "roller" },
    ],
    spacingIn: 16,
    loads: [
      { type: "area", case: "L", psf: 40 },
      { type: "area", case: "D", psf: 15 },
    ],
    bearingIn: 1.75,
    conditions: { selfWeight: false },
    limits: { live: 480, total: 240 },
    ...extra,
  };
}

describe("PRI-40 9-1/2 at 16 in o.c. over 13.5 ft (worked example, formulas computed here)", () => {
  const j = findIJoist(T, "PRI-40 9-1/2");
  const r = checkMember(floor("PRI-40 9-1/2"), T);
  const check = (name: string) => r.checks.find((c) => c.name === name)!;
  const wL = (40 * 16) / 12;
  const wT = (55 * 16) / 12;

  test("live load deflection = 5wL⁴/384EI + wL²/K, within 0.5 %", () => {
    const w = wL / 12;
    const L = SPAN * 12;
    const bending = (5 * w * L ** 4) / (384 * j.EI);
    const shear = (w * L * L) / j.K;
    expect(shear / bending).toBeGreaterThan(0.05); // shear deflection is not negligible in an I-joist
    expect(uniformDeflectionIn(wL, SPAN, j.EI, j.K)).toBeCloseTo(bending + shear, 10);
    expect(Math.abs(check("deflection-live").demand - (bending + shear)) / (bending + shear)).toBeLessThanOrEqual(0.005);
    expect(check("deflection-live").capacity).toBeCloseTo((SPAN * 12) / 480, 3);
  });

  test("total load deflection the same way with 55 psf", () => {
    const expected = uniformDeflectionIn(wT, SPAN, j.EI, j.K);
    expect(Math.abs(check("deflection-total").demand - expected) / expected).toBeLessThanOrEqual(0.005);
  });

  test("moment wL²/8 against M' = 2,735 lbf-ft × CD 1.0 (D+L)", () => {
    const M = (wT * SPAN * SPAN) / 8;
    expect(check("bending").demand).toBeCloseTo(M, -1);
    expect(check("bending").capacity).toBe(2735);
    expect(check("bending").ratio).toBeCloseTo(M / 2735, 3);
  });

  test("shear wL/2 against V' = 1,120 lbf; end reaction wL/2 against 1,080 lbf at 1-3/4 in bearing", () => {
    const V = (wT * SPAN) / 2;
    expect(check("shear").demand).toBeCloseTo(V, -1);
    expect(check("shear").capacity).toBe(1120);
    expect(check("bearing").demand).toBeCloseTo(V, -1);
    expect(check("bearing").capacity).toBe(1080);
    expect(r.pass).toBe(true);
  });

  test("the answer names the source and says what the maker's values do", () => {
    expect(r.member.sources[0]).toMatch(/APA PRI-400/);
    expect(r.member.section.EI).toBe(184e6);
    expect(r.assumptions.join(" ")).toMatch(/shear deflection/);
  });

  test("load duration: a snow load raises M' by CD = 1.15 (NDS 2018 Table 2.3.2)", () => {
    const snow = checkMember(
      floor("PRI-40 9-1/2", {
        loads: [
          { type: "udl", case: "S", from: 0, to: SPAN, w: 100 },
          { type: "udl", case: "D", from: 0, to: SPAN, w: 20 },
        ],
        spacingIn: undefined,
      }),
      T,
    );
    const b = snow.checks.find((c) => c.name === "bending")!;
    expect(b.combination?.name).toMatch(/^D\+(\d*\.?\d*)S$/); // ASCE 7-22 §2.4.1 names it with its snow factor
    expect(b.capacity).toBe(Math.round(2735 * 1.15));
  });
});

describe("reaction capacities from the table", () => {
  const j = findIJoist(T, "PRI-40 14");
  test("end reaction: straight line between 1-3/4 and 4 in bearing (APA), stiffened where the table gives more", () => {
    expect(endReactionCapacity(j, 1.75, false)).toBe(1200);
    expect(endReactionCapacity(j, 4, false)).toBe(1550);
    expect(endReactionCapacity(j, 4, true)).toBe(1710);
    expect(endReactionCapacity(j, 2.875, false)).toBeCloseTo(1200 + (350 * 1.125) / 2.25, 9);
    expect(endReactionCapacity(j, 6, false)).toBe(1550);
    expect(endReactionCapacity(j, 1.5, false)).toBeNull();
  });

  test("1-1/2 in bearing given: checked at 1-3/4 in and the answer asks for 1-3/4 in", () => {
    const r = checkMember(floor("PRI-40 9-1/2", { bearingIn: 1.5 }), T);
    expect(r.reactions.map((x) => x.requiredBearing)).toEqual([1.75, 1.75]);
    expect(r.answer).toMatch(/ — 1-3\/4" bearing each end/);
    expect(r.checks.find((c) => c.name === "bearing")!.note).toMatch(/less than the 1.75 in/);
  });

  test("a two-span joist: the middle support is checked against the intermediate reaction at 3-1/2 in", () => {
    const r = checkMember(
      floor("PRI-40 11-7/8", {
        lengthFt: 28,
        supports: [
          { x: 0, type: "pin" },
          { x: 14, type: "roller" },
          { x: 28, type: "roller" },
        ],
        bearingIn: 3.5,
      }),
      T,
    );
    const mid = r.reactions[1];
    expect(mid.requiredBearing).toBe(3.5);
    // continuous over two equal spans, uniform load: the middle reaction is 1.25 wL (AISC Manual 15th ed. Table 3-23, case 29)
    const w = (55 * 16) / 12;
    expect(mid.maxDown).toBeGreaterThanOrEqual(Math.round(1.25 * w * 14) - 1);
    // over the middle support it hogs: the bottom flange is in compression and the published moment
    // capacity holds with it braced (NDS 2018 §7.3.5, CL = 1.0 only when braced): the answer asks for it
    expect(r.bracing.bottomEdge).toBe(
      "brace the I-joist's bottom flange where it hogs (it is in compression there, and the check counts on it braced): blocking panels or a rim at the interior support",
    );
    expect(r.assumptions.join(" ")).toMatch(/bottom flange, in compression where the joist hogs, taken as braced/);
  });

  test("a simple span never hogs under gravity load: no bottom-flange line", () => {
    const r = checkMember(floor("PRI-40 9-1/2"), T);
    expect(r.bracing.bottomEdge).toBeNull();
    expect(r.assumptions.join(" ")).not.toMatch(/bottom flange/);
  });

  test("an overhang hogs over its support: the bottom flange there must be braced", () => {
    const r = checkMember(
      floor("PRI-40 11-7/8", {
        lengthFt: 16,
        supports: [
          { x: 0, type: "pin" },
          { x: 14, type: "roller" },
        ],
        bearingIn: 3.5,
      }),
      T,
    );
    expect(r.bracing.bottomEdge).toMatch(
      /blocking panels or a rim at the support next to the overhang; along the overhang, a ceiling fastened to the bottom flange/,
    );
    expect(r.bracing.bottomEdge).not.toMatch(/interior support/);
  });
});

describe("sizing a floor with I-joists", () => {
  const request = {
    member: { material: "ijoist" },
    lengthFt: 16,
    supports: [
      { x: 0, type: "pin" },
      { x: 16, type: "roller" },
    ],
    spacingIn: 16,
    loads: [
      { type: "area", case: "L", psf: 40 },
      { type: "area", case: "D", psf: 10 },
    ],
    bearingIn: 1.75,
    limits: { live: 480, total: 240 },
  };

  test("every passing joist passes its own check; the lightest is named as a framer orders it", () => {
    const out = sizeMember(request, T);
    expect(out.passingCount).toBeGreaterThan(0);
    expect(out.failing.length).toBeGreaterThan(0);
    for (const p of out.passing) expect(checkMember({ ...request, member: p.member }, T).pass).toBe(true);
    const best = out.passing[0];
    expect(best.member.material).toBe("ijoist");
    expect(best.answer).toMatch(/^(9-1\/2|11-7\/8|14|16) in PRI-\d0 at 16 in o\.c\. — 1-3\/4" bearing each end on the plate, beam or hanger$/);
  });

  test("a 9-1/2 in PRI-20 fails 16 ft at L/480 on its deflection with shear", () => {
    const r = checkMember({ ...request, member: { material: "ijoist", joist: "PRI-20 9-1/2" } }, T);
    expect(r.pass).toBe(false);
    expect(r.governing).toBe("deflection-live");
  });

  test("wet service leaves I-joists out of the search and is refused for one joist, naming the field", () => {
    const wet = { ...request, conditions: { wet: true } };
    expect(sizeMember(wet, T).candidates).toBe(0);
    expect(() => checkMember({ ...wet, member: { material: "ijoist", joist: "PRI-40 11-7/8" } }, T)).toThrow(/dry service/);
  });

  test("an unknown joist names the field and lists the table", () => {
    expect(() => checkMember({ ...request, member: { material: "ijoist", joist: "PRI-99 12" } }, T)).toThrow(
      /unknown I-joist "PRI-99 12"; the tables hold PRI-20 9-1\/2/,
    );
  });
});
