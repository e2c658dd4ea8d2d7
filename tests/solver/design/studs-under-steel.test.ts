import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { sizeRequest } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";
import { checkMember, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

/**
 * A steel header in a wood stud wall bears on jack studs. The wood under it is checked in compression
 * perpendicular to grain, NDS 2018 §3.10.2: fc⊥ = R / (b · lb) ≤ Fc⊥′, so lb = R / (b · Fc⊥′); at a
 * member's end Cb = 1 (§3.10.4 applies only 3 in or more from the end). The wall's species is not asked:
 * Hem-Fir's Fc⊥ = 405 psi, the least of the species the tables hold (NDS Supplement 2018 Table 4A,
 * dimension lumber, every grade: the table source lib/tables/sawn-values.ts already cites, checked
 * against the published copy in xcfem/xc). Studs are 1-1/2 in thick (a 2x's dressed thickness, common
 * practice), counted to cover the longer of the bearing needed and the bearing given.
 */
const HEM_FIR_FC_PERP_PSI = 405; // NDS Supplement 2018 Table 4A, Hem-Fir, all grades
const STUD_IN = 1.5; // common practice: 2x dressed thickness

const steelHeader = (member: Record<string, unknown>, wallFraming: "2x4" | "2x6", extra: Record<string, unknown> = {}) => ({
  kind: "header",
  member,
  wallFraming,
  lengthFt: 10,
  supports: [
    { x: 0, type: "pin" },
    { x: 10, type: "roller" },
  ],
  tributaryFt: 1,
  // 300 plf dead + 700 plf live over 10 ft; own weight left out so R is exact: (300 + 700) × 10 / 2 = 5,000 lb (D + L, ASCE 7-16 §2.4.1)
  loads: [
    { type: "udl", case: "D", from: 0, to: 10, w: 300 },
    { type: "udl", case: "L", from: 0, to: 10, w: 700 },
  ],
  bearingIn: 1.5,
  conditions: { selfWeight: false },
  ...extra,
});

describe("jack studs under a steel header in a stud wall", () => {
  test("a W6x9 in a 2x6 wall: the wood under its flange needs R / (bf · Fc⊥), counted in studs", () => {
    const shape = STARTER_TABLES.steel.find((s) => s.name === "W6x9");
    if (!shape) throw new Error("W6x9 missing from the tables");
    // AISC Shapes Database v15.0: W6x9 bf = 3.94 in (the tables' value; narrower than the 5-1/2 in wall)
    expect(shape.bf).toBeCloseTo(3.94, 2);
    const R = ((300 + 700) * 10) / 2;
    const woodIn = R / (shape.bf * HEM_FIR_FC_PERP_PSI); // 5000 / (3.94 × 405) = 3.13 in
    const check = checkMember(steelHeader({ material: "steel", shape: "W6x9" }, "2x6"), STARTER_TABLES);
    const ends = check.reactions;
    expect(ends).toHaveLength(2);
    for (const r of ends) {
      expect(r.maxDown).toBeCloseTo(R, 6);
      expect(r.studs?.woodIn).toBeCloseTo(woodIn, 2);
      expect(r.studs?.widthIn).toBeCloseTo(shape.bf, 9);
      const needed = Math.max(woodIn, r.studs?.steelIn ?? 0);
      expect(r.requiredBearing).toBeCloseTo(needed, 2);
      expect(r.jackStuds).toBe(Math.ceil(Math.max(needed, 1.5) / STUD_IN - 1e-9));
    }
    // 3.13 in of wood bearing: 3 studs (4-1/2 in), where 1-1/2 in given would need 1
    expect(ends[0].jackStuds).toBe(3);
    expect(check.answer).toBe("W6x9 — 3 jack studs each end");
    // the bearing in inches stays in the detail, with the basis
    expect(check.assumptions.some((a) => /jack studs under a steel member in a 2x6 wall.*Fc⊥ = 405 psi \(Hem-Fir/.test(a))).toBe(true);
  });

  test("two C-sections back to back in a 2x4 wall bear with both flanges: b = 2 × 1.62 in", () => {
    const R = 5000;
    const flangesIn = 2 * 1.62; // the S162 flange: the designation's 162 = 1.62 in (SFIA/AISI designation system, common practice)
    const woodIn = R / (flangesIn * HEM_FIR_FC_PERP_PSI); // 5000 / (3.24 × 405) = 3.81 in
    // 5 ft span, 600 plf dead + 1,400 plf live: R = 2,000 × 5 / 2 = 5,000 lb again
    const short = {
      lengthFt: 5,
      supports: [
        { x: 0, type: "pin" },
        { x: 5, type: "roller" },
      ],
      loads: [
        { type: "udl", case: "D", from: 0, to: 5, w: 600 },
        { type: "udl", case: "L", from: 0, to: 5, w: 1400 },
      ],
      bearingIn: 3,
    };
    const check = checkMember(steelHeader({ material: "cfs", section: "800S162-97", assembly: "back-to-back" }, "2x4", short), STARTER_TABLES);
    expect(check.reactions[0].maxDown).toBeCloseTo(R, 6);
    for (const r of check.reactions) {
      expect(r.studs?.widthIn).toBeCloseTo(flangesIn, 2);
      expect(r.studs?.woodIn).toBeCloseTo(woodIn, 1);
      // the steel's own need is the bearing its web crippling check used (AISI S100-16 §G5): 3 in
      expect(r.studs?.steelIn).toBe(3);
      expect(r.jackStuds).toBe(Math.ceil(Math.max(woodIn, 3) / STUD_IN - 1e-9));
    }
    expect(check.reactions[0].jackStuds).toBe(3);
    expect(check.answer).toMatch(/^2-800S162-97 back-to-back.* — 3 jack studs each end$/);
  });

  test("LRFD reads the factored reaction against Fc⊥ × KF 1.67 × φ 0.90 (NDS 2018 Table 2.3.5 and §2.3.6)", () => {
    const Ru = 1.2 * 300 * 5 + 1.6 * 700 * 5; // ASCE 7-16 §2.3.1 combination 2, lb
    const bf = 3.94;
    const woodIn = Ru / (bf * HEM_FIR_FC_PERP_PSI * 1.67 * 0.9);
    const check = checkMember(steelHeader({ material: "steel", shape: "W6x9" }, "2x6", { method: "lrfd" }), STARTER_TABLES);
    expect(check.reactions[0].studs?.woodIn).toBeCloseTo(woodIn, 2);
  });

  test("the sizing path answers steel headers in a wall with jack studs, as the wood headers do", () => {
    const h = defaultFlowState("header");
    const steel: FlowState = { ...h, wallFraming: "2x6", material: { ...h.material, family: "steel", plies: 0 } };
    const r = sizeMember(sizeRequest(steel), STARTER_TABLES);
    expect(r.passing.length).toBeGreaterThan(0);
    for (const p of r.passing) expect(p.check?.answer ?? "").toMatch(/^W\d+x\d+ — \d jack studs? each end$/);
    const cfs: FlowState = { ...h, material: { ...h.material, family: "cfs", plies: 0 } };
    const c = sizeMember(sizeRequest(cfs), STARTER_TABLES);
    expect(c.passing.length).toBeGreaterThan(0);
    for (const p of c.passing) expect(p.check?.answer ?? "").toMatch(/ — \d jack studs? each end$/);
  });

  test("a steel beam not in a wall still answers with inches of bearing", () => {
    const b = defaultFlowState("beam");
    const r = sizeMember(sizeRequest({ ...b, material: { ...b.material, family: "steel", plies: 0 } }), STARTER_TABLES);
    expect(r.passing[0].check?.answer).toMatch(/bearing each end$/);
    expect(r.passing[0].supports.every((s) => s.jackStuds === null)).toBe(true);
  });
});
