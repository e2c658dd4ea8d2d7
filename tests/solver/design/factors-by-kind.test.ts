import { describe, expect, test } from "vitest";
import { checkMember, type SteelFactors, type WoodFactors } from "@/lib/solver/design";
import { beamStabilityFactorCL, criticalBucklingFbE, effectiveLengthLe, slendernessRatioRB } from "@/lib/solver/nds/nds-2018";
import { limitingLengthLr } from "@/lib/solver/aisc360/aisc360-16";
import { findSawnSize, sawnValuesForSize, sizeFactorFor, STARTER_TABLES } from "@/lib/tables";

/**
 * Factors the member's use decides: the repetitive member factor Cr (NDS 2018 §4.3.9), the incising
 * factor Ci (NDS 2018 §4.3.8, Table 4.3.8), and the unbraced length checked (NDS 2018 §3.3.3 for wood,
 * AISC 360-16 §F2 for steel). Design values from the starter tables (NDS Supplement 2018 Table 4A).
 */

const sawn = (size: string, plies: number, species = "Douglas Fir-Larch") => ({ material: "sawn", species, grade: "No.2", size, plies });
const simple = (L: number) => ({
  lengthFt: L,
  supports: [
    { x: 0, type: "pin" },
    { x: L, type: "roller" },
  ],
});

describe("Cr, NDS 2018 §4.3.9: at least three members joined by a load-distributing element", () => {
  const beam = (plies: number, conditions: Record<string, unknown>, extra: Record<string, unknown> = {}) =>
    checkMember(
      {
        member: sawn("2x10", plies),
        ...simple(10),
        tributaryFt: 6,
        loads: [{ type: "area", case: "L", psf: 40 }],
        conditions: { selfWeight: false, ...conditions },
        ...extra,
      },
      STARTER_TABLES,
    );
  test.each([
    // plies, conditions, kind, spacing?, Cr, why
    [2, { repetitive: true }, undefined, 1.0, "a 2-ply beam flagged repetitive has no spacing: not a repetitive system"],
    [3, { repetitive: false }, undefined, 1.0, "explicit false is honored for 3 plies"],
    [3, {}, undefined, 1.15, "3 plies through-nailed by default, the assumption written out"],
    [4, {}, "beam", 1.15, "4 plies"],
    [2, {}, "beam", 1.0, "2 plies never by the built-up rule"],
  ])("%i plies %o kind %s → Cr %f (%s)", (plies, conditions, kind, Cr, _why) => {
    void _why;
    const r = beam(plies, conditions, kind ? { kind } : {});
    const f = r.factors as WoodFactors;
    expect(f.Cr).toBe(Cr);
    // Fb' = Fb CD CF Cr with CD = 1.0 (L), CF = 1.1 (2x10)
    expect(r.checks.find((c) => c.name === "bending")?.capacity).toBeCloseTo(900 * 1.1 * Cr, 1);
    if (plies >= 3 && Cr > 1) expect(r.assumptions.join(" ")).toMatch(/plies through-nailed.*NDS 2018 §4\.3\.9/);
  });

  test.each([
    ["floor-joist", 16, undefined, 1.15],
    ["rafter", 24, undefined, 1.15],
    ["deck-joist", 16, false, 1.0],
    ["floor-joist", 32, undefined, 1.0],
    ["header", 16, undefined, 1.0],
  ])("kind %s at %i in, repetitive %s → Cr %f", (kind, spacing, repetitive, Cr) => {
    const r = checkMember(
      {
        member: sawn("2x10", 1),
        ...simple(12),
        spacingIn: spacing,
        kind,
        loads: [{ type: "area", case: "L", psf: 40 }],
        conditions: { selfWeight: false, ...(repetitive === undefined ? {} : { repetitive }) },
      },
      STARTER_TABLES,
    );
    expect((r.factors as WoodFactors).Cr).toBe(Cr);
  });
});

describe("Ci, NDS 2018 §4.3.8: treated fir and spruce incised by default in wet service and on decks", () => {
  const deckJoist = (species: string, conditions: Record<string, unknown> = {}) =>
    checkMember(
      {
        member: { material: "sawn", species, grade: "No.2", size: "2x8" },
        ...simple(11),
        spacingIn: 16,
        kind: "deck-joist",
        loads: [
          { type: "area", case: "L", psf: 40 },
          { type: "area", case: "D", psf: 10 },
        ],
        conditions: { wet: true, selfWeight: false, ...conditions },
      },
      STARTER_TABLES,
    );

  test.each([
    ["Hem-Fir", {}, true],
    ["Douglas Fir-Larch", {}, true],
    ["Spruce-Pine-Fir", {}, true],
    ["Southern Pine", {}, false],
    ["Hem-Fir", { incised: false }, false],
    ["Southern Pine", { incised: true }, true],
  ])("%s %o → incised %s, said in the assumptions", (species, cond, incised) => {
    const r = deckJoist(species, cond);
    const f = r.factors as WoodFactors;
    expect(f.incised).toBe(incised);
    expect(f.Ci).toEqual(incised ? { Fb: 0.8, Fv: 0.8, FcPerp: 1.0, E: 0.95 } : { Fb: 1, Fv: 1, FcPerp: 1, E: 1 });
    expect(r.assumptions.some((a) => a.includes(incised ? "incised" : "not incised"))).toBe(true);
  });

  test("Hem-Fir No.2 2x8 deck joist: Fb' = Fb CM CF Ci Cr and E' = E CM Ci (hand figures, 0.1 psi / 1 psi)", () => {
    const r = deckJoist("Hem-Fir");
    const v = sawnValuesForSize(STARTER_TABLES, "Hem-Fir", "No.2", "2x8");
    const CF = sizeFactorFor(STARTER_TABLES, "Hem-Fir", "No.2", "2x8").CF_Fb;
    // wet service, Table 4A: CM = 1.0 on Fb where Fb CF ≤ 1150 psi, 0.9 on E
    const CMFb = v.Fb * CF <= 1150 ? 1.0 : 0.85;
    expect(r.checks.find((c) => c.name === "bending")?.capacity).toBeCloseTo(v.Fb * 1.0 * CMFb * CF * 0.8 * 1.15, 1);
    expect((r.factors as WoodFactors).EPrime).toBeCloseTo(v.E * 0.9 * 0.95, 0);
  });
});

describe("the unbraced length given is the one checked, placed where it is worst", () => {
  test("wood: lu = 5 ft on a 12 ft span is checked at 5 ft (not 12/3 = 4 ft): CL by NDS 2018 Eq. 3.3-6", () => {
    const r = checkMember(
      {
        member: sawn("2x10", 1),
        ...simple(12),
        tributaryFt: 2,
        loads: [{ type: "area", case: "L", psf: 40 }],
        conditions: { selfWeight: false, unbracedLengthFt: 5, repetitive: false },
      },
      STARTER_TABLES,
    );
    const s = findSawnSize(STARTER_TABLES, "2x10");
    const v = sawnValuesForSize(STARTER_TABLES, "Douglas Fir-Larch", "No.2", "2x10");
    const le = effectiveLengthLe(60, s.d);
    const RB = slendernessRatioRB(le, s.d, s.b);
    const CL = beamStabilityFactorCL(v.Fb * 1.1 * 1.0, criticalBucklingFbE(v.Emin, RB));
    expect((r.factors as WoodFactors).CL).toBeCloseTo(CL, 3);
    expect(r.checks.find((c) => c.name === "bending")?.note).toMatch(/lu = 5 ft/);
  });

  test("steel: W12x14 over 14 ft, braces said to be 10 ft apart → checked at Lb = 10 ft (AISC 360-16 Eq. F2-3), fails", () => {
    // D 250 plf + L 600 plf: Ma = 850 × 14² / 8 = 20.83 kip-ft. Worst placement of a 10 ft segment: centered on
    // the midspan, Cb = 12.5·49 / (2.5·49 + 3·42.75 + 4·49 + 3·42.75) = 1.065 (M ∝ x(14 − x)).
    const r = checkMember(
      {
        member: { material: "steel", shape: "W12x14" },
        ...simple(14),
        loads: [
          { type: "udl", case: "D", from: 0, to: 14, w: 250 },
          { type: "udl", case: "L", from: 0, to: 14, w: 600 },
        ],
        bearingIn: 4,
        conditions: { selfWeight: false, unbracedLengthFt: 10 },
        limits: { live: null, total: null },
      },
      STARTER_TABLES,
    );
    const sh = STARTER_TABLES.steel.find((x) => x.name === "W12x14");
    if (!sh) throw new Error("W12x14 missing from the starter tables");
    const Fy = 50;
    const E = 29000;
    const Lb = 120;
    const Lr = limitingLengthLr(sh, Fy);
    expect(Lb).toBeGreaterThan(Lr);
    const Cb = (12.5 * 49) / (2.5 * 49 + 3 * 4.5 * 9.5 + 4 * 49 + 3 * 4.5 * 9.5);
    const jc = sh.J / (sh.Sx * sh.ho);
    const Fcr = ((Cb * Math.PI ** 2 * E) / (Lb / sh.rts) ** 2) * Math.sqrt(1 + 0.078 * jc * (Lb / sh.rts) ** 2);
    const Mn = Math.min(Fy * sh.Zx, Fcr * sh.Sx);
    const bending = r.checks.find((c) => c.name === "bending");
    expect((r.factors as SteelFactors).Lb).toBeCloseTo(10, 6);
    expect((r.factors as SteelFactors).Cb).toBeCloseTo(Cb, 2);
    expect(bending?.capacity).toBeCloseTo(Mn / 12 / 1.67, 1);
    expect(bending?.demand).toBeCloseTo((850 * 196) / 8 / 1000, 2);
    expect(r.pass).toBe(false);
    // the answer tells the crew how close the braces must be, as an instruction
    expect(r.bracing.neededFt).not.toBeNull();
    expect(r.bracing.neededFt ?? 99).toBeLessThan(10);
    expect(r.bracing.instruction).toMatch(/^brace the top flange at \d+ ft/);
    const at = (lb: number) =>
      checkMember(
        {
          ...JSON.parse(
            JSON.stringify({
              member: { material: "steel", shape: "W12x14" },
              ...simple(14),
              loads: [
                { type: "udl", case: "D", from: 0, to: 14, w: 250 },
                { type: "udl", case: "L", from: 0, to: 14, w: 600 },
              ],
              bearingIn: 4,
              limits: { live: null, total: null },
            }),
          ),
          conditions: { selfWeight: false, unbracedLengthFt: lb },
        },
        STARTER_TABLES,
      ).pass;
    expect(at(r.bracing.neededFt ?? 0)).toBe(true);
    expect(at((r.bracing.neededFt ?? 0) + 2 / 12)).toBe(false);
  });
});
