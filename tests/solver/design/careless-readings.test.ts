import { describe, expect, test } from "vitest";
import { checkMember } from "@/lib/solver/design";
import { findSawnSize, sawnValuesForSize, sizeFactorFor, STARTER_TABLES } from "@/lib/tables";

/**
 * Members a careless tool would pass. Each passes on the wrong reading (shown) and fails on the
 * right one (asserted pass: false), with the hand figure that decides it worked in the test.
 */
const simple = (L: number) => ({
  lengthFt: L,
  supports: [
    { x: 0, type: "pin" },
    { x: L, type: "roller" },
  ],
});
const dfl = (size: string, plies = 1) => ({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size, plies });
const bendingOf = (r: ReturnType<typeof checkMember>) => r.checks.find((c) => c.name === "bending");

describe("careless readings that pass an undersized member", () => {
  test("ground snow from the older map read as strength level (0.7S): 2-ply 2x8 header, 6 ft, pg 50 psf (ASCE 7-16 §2.4.1, §7.3)", () => {
    const input = {
      member: dfl("2x8", 2),
      ...simple(6),
      tributaryFt: 13,
      bearingIn: 3,
      loads: [
        { type: "area", case: "D", psf: 15 },
        { type: "snow", pg: 50 },
      ],
      limits: { live: 240, total: 180 },
    };
    // S = 0.7 × 50 = 35 psf × 13 ft = 455 plf; D = 195 plf + own weight; D + S with CD 1.15 (NDS 2018 Table 2.3.2)
    const r = checkMember(input, STARTER_TABLES);
    const s = findSawnSize(STARTER_TABLES, "2x8");
    const w = 195 + r.member.weightPlf + 455;
    const fb = (((w * 36) / 8) * 12) / (2 * s.Sx);
    const Fb = 900 * 1.15 * 1.2; // CF 1.2 for 2x8, Cr 1.0 (two plies)
    expect(bendingOf(r)?.demand).toBeCloseTo(fb, 1);
    expect(fb / Fb).toBeGreaterThan(1);
    expect(r.pass).toBe(false);
    expect(checkMember({ ...input, loadStandard: "ASCE 7-22" }, STARTER_TABLES).pass).toBe(true);
  });

  test("a point load within d of a support dropped from shear (NDS 2018 §3.4.3.1(b)): 4000 lb 9 in from the support", () => {
    const input = {
      member: dfl("2x10"),
      ...simple(10),
      bearingIn: 3,
      loads: [{ type: "point", case: "L", x: 0.75, P: 4000 }],
      conditions: { selfWeight: false, shearIgnoreLoadsNearSupports: true },
      limits: { live: null, total: null },
    };
    const s = findSawnSize(STARTER_TABLES, "2x10");
    const V = ((0.75 * 12 - 1.5) / s.d) * 4000 * (9.25 / 10);
    const r = checkMember(input, STARTER_TABLES);
    expect((1.5 * V) / s.A / 180).toBeGreaterThan(1);
    expect(r.pass).toBe(false);
  });

  test("Cr for a 2-ply beam flagged repetitive (NDS 2018 §4.3.9 needs three members): 2-ply 2x10, 8.5 ft, 8 ft tributary", () => {
    const input = {
      member: dfl("2x10", 2),
      ...simple(8.5),
      tributaryFt: 8,
      loads: [
        { type: "area", case: "L", psf: 40 },
        { type: "area", case: "D", psf: 12 },
      ],
      conditions: { repetitive: true },
      limits: { live: null, total: null },
    };
    const r = checkMember(input, STARTER_TABLES);
    const fbFb = (bendingOf(r)?.demand ?? 0) / (900 * 1.1);
    expect(fbFb).toBeGreaterThan(1);
    expect(fbFb / 1.15).toBeLessThan(1); // what Cr = 1.15 would have shown
    expect(r.pass).toBe(false);
  });

  test("Cr for 3 plies when the input says repetitive: false (honored): 3-ply 2x10, 10 ft", () => {
    const input = {
      member: dfl("2x10", 3),
      ...simple(10),
      tributaryFt: 8,
      loads: [
        { type: "area", case: "L", psf: 40 },
        { type: "area", case: "D", psf: 12 },
      ],
      conditions: { repetitive: false },
      limits: { live: null, total: null },
    };
    const r = checkMember(input, STARTER_TABLES);
    expect(bendingOf(r)?.capacity).toBeCloseTo(900 * 1.1, 1);
    expect(r.pass).toBe(false);
    expect(checkMember({ ...input, conditions: {} }, STARTER_TABLES).pass).toBe(true);
  });

  test("treated Hem-Fir deck joist taken as not incised (NDS 2018 §4.3.8): No.2 2x8 at 16 in, 11 ft", () => {
    const input = {
      member: { material: "sawn", species: "Hem-Fir", grade: "No.2", size: "2x8" },
      kind: "deck-joist",
      ...simple(11),
      spacingIn: 16,
      loads: [
        { type: "area", case: "L", psf: 40 },
        { type: "area", case: "D", psf: 10 },
      ],
      conditions: { wet: true },
      limits: { preset: "floor" },
    };
    const v = sawnValuesForSize(STARTER_TABLES, "Hem-Fir", "No.2", "2x8");
    const CF = sizeFactorFor(STARTER_TABLES, "Hem-Fir", "No.2", "2x8").CF_Fb;
    const r = checkMember(input, STARTER_TABLES);
    expect(bendingOf(r)?.capacity).toBeCloseTo(v.Fb * CF * 0.8 * 1.15, 1);
    expect(r.pass).toBe(false);
    expect(checkMember({ ...input, conditions: { wet: true, incised: false } }, STARTER_TABLES).pass).toBe(true);
  });

  test("braces said to be 10 ft apart on a 14 ft W12x14 checked at 7 ft (AISC 360-16 §F2)", () => {
    const input = {
      member: { material: "steel", shape: "W12x14" },
      ...simple(14),
      bearingIn: 4,
      loads: [
        { type: "udl", case: "D", from: 0, to: 14, w: 250 },
        { type: "udl", case: "L", from: 0, to: 14, w: 600 },
      ],
      conditions: { selfWeight: false, unbracedLengthFt: 10 },
      limits: { live: null, total: null },
    };
    expect(checkMember(input, STARTER_TABLES).pass).toBe(false);
    expect(checkMember({ ...input, conditions: { selfWeight: false, unbracedLengthFt: 7 } }, STARTER_TABLES).pass).toBe(true);
  });

  test("a rafter sized on 0.7 of the table's snow: DF-L No.2 2x8 at 24 in, 13 ft (IRC 2021 Table R802.4.1(3) allows 12 ft 6 in)", () => {
    const input = {
      member: dfl("2x8"),
      kind: "rafter",
      ...simple(13),
      spacingIn: 24,
      loads: [
        { type: "snow", pg: 30 / 0.7 },
        { type: "area", case: "D", psf: 10 },
      ],
      conditions: { selfWeight: false },
      limits: { live: 180, total: null },
    };
    // pg = 42.9 psf → pf = 0.7 × 42.9 = 30 psf (the table's roof snow); D + S = 40 psf × 2 ft = 80 plf
    const s = findSawnSize(STARTER_TABLES, "2x8");
    const fb = (((80 * 13 ** 2) / 8) * 12) / s.Sx;
    expect(fb / (900 * 1.2 * 1.15 * 1.15)).toBeGreaterThan(1);
    expect(checkMember(input, STARTER_TABLES).pass).toBe(false);
    expect(checkMember({ ...input, loadStandard: "ASCE 7-22" }, STARTER_TABLES).pass).toBe(true);
  });
});
