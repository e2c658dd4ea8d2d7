import { describe, expect, test } from "vitest";
import { areaToLinePlf, findOccupancyPreset, OCCUPANCY_PRESETS } from "@/lib/solver/asce7/loads";
import { designFlatRoofSnow, flatRoofSnowPf, minimumRoofSnowPm } from "@/lib/solver/asce7/snow";
import { DEFLECTION_PRESETS, resolveLimits } from "@/lib/solver/design";
import { takeDown } from "@/lib/solver/design/take-down";

describe("occupancy presets (IRC 2021 Table R301.5)", () => {
  test.each([
    ["living", 40],
    ["sleeping", 30],
    ["deck", 40],
    ["attic-no-storage", 10],
    ["attic-limited-storage", 20],
    ["roof-live", 20],
  ])("%s: %i psf", (id, psf) => {
    const p = findOccupancyPreset(id);
    expect(p?.psf).toBe(psf);
    expect(p?.source).toMatch(/IRC 2021/);
  });

  test("every preset names its source", () => {
    for (const p of OCCUPANCY_PRESETS) expect(p.source.length).toBeGreaterThan(5);
  });
});

describe("flat-roof snow, ASCE 7-22 Eq. 7.3-1 and §7.3.4", () => {
  test.each([
    [30, 1.0, 1.0, 1.0, 0.7 * 30],
    [50, 0.9, 1.1, 1.0, 0.7 * 0.9 * 1.1 * 50],
    [25, 1.1, 1.2, 1.0, 0.7 * 1.1 * 1.2 * 25],
  ])("pg %f, Ce %f, Ct %f, Is %f", (pg, Ce, Ct, Is, pf) => {
    expect(flatRoofSnowPf({ pg, Ce, Ct, Is })).toBeCloseTo(pf, 9);
  });

  test("low-slope minimum pm = pg up to 20 psf, 20 psf above; the design value is the larger", () => {
    expect(minimumRoofSnowPm(15)).toBe(15);
    expect(minimumRoofSnowPm(40)).toBe(20);
    expect(designFlatRoofSnow({ pg: 25 }).ps).toBe(20); // pf = 17.5 < pm = 20
    expect(designFlatRoofSnow({ pg: 40 }).ps).toBeCloseTo(28, 9);
  });
});

describe("take-down of area loads", () => {
  test("40 psf at 16 in → 53.3 plf; 15 psf over 8 ft → 120 plf", () => {
    expect(areaToLinePlf(40, { spacingIn: 16 })).toBeCloseTo(53.333, 3);
    expect(areaToLinePlf(15, { tributaryFt: 8 })).toBe(120);
  });

  test("a load's own tributary width wins over the member's; the note shows the arithmetic", () => {
    const t = takeDown(
      [
        { type: "area", case: "D", psf: 10 },
        { type: "area", case: "S", psf: 25, tributaryFt: 12 },
      ],
      10,
      { tributaryFt: 4 },
    );
    expect(t[0].load).toMatchObject({ type: "udl", case: "D", from: 0, to: 10, w: 40 });
    expect(t[1].load).toMatchObject({ case: "S", w: 300 });
    expect(t[1].note).toBe("S 25 psf × 12 ft = 300 plf");
  });
});

describe("deflection presets", () => {
  test("floors L/360 live and L/240 total by default (IRC 2021 Table R301.7)", () => {
    expect(resolveLimits({})).toMatchObject({ live: 360, total: 240 });
    expect(resolveLimits({ preset: "floor-tile" })).toMatchObject({ live: 480 });
    expect(resolveLimits({ preset: "roof-no-ceiling" })).toMatchObject({ live: 180 });
    expect(resolveLimits({ preset: "floor", live: 600, total: null })).toMatchObject({ live: 600, total: null });
    expect(DEFLECTION_PRESETS.find((p) => p.id === "floor-tile")?.source).toMatch(/common practice/);
  });
});
