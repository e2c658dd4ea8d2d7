// The percent a builder reads beside a check (lib/solver/design/ratio-percent.ts). The rule it keeps is the unity
// check (common practice: a member passes when demand / capacity <= 1): the shown number must never put a pass at
// 100% unless it is exactly at the limit, nor a failure at 100% or under.
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { ratioPercent } from "@/lib/solver/design/ratio-percent";
import { verdictWords } from "@/lib/solver/design/check";
import { ratioPercent as sheetPercent } from "@/lib/sheets/format";

describe("ratioPercent", () => {
  test.each([
    [0, "0"],
    [0.5, "50"],
    [0.9949, "99"],
    [0.995, "99.5"],
    [0.996, "99.6"],
    [0.99999, "99.9"],
    [1, "100"],
    [1.00001, "100.1"],
    [1.004, "100.4"],
    [1.005, "100.5"],
    [1.006, "101"],
    [1.13, "113"],
  ])("%s reads %s percent", (ratio, text) => {
    expect(ratioPercent(ratio)).toBe(text);
  });

  test("for any ratio: a pass below 1 reads under 100, a failure reads over 100, and the number is within 0.5 of the ratio", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 3, noNaN: true }), (ratio) => {
        const shown = Number(ratioPercent(ratio));
        if (ratio < 1) expect(shown).toBeLessThan(100);
        if (ratio === 1) expect(shown).toBe(100);
        if (ratio > 1) expect(shown).toBeGreaterThan(100);
        expect(Math.abs(shown - ratio * 100)).toBeLessThanOrEqual(0.5 + 1e-9);
      }),
    );
  });

  test("the answer line and the sheets use the same rule", () => {
    expect(verdictWords({ pass: true, ratio: 0.996, governing: "bending" })).toBe("OK 99.6% (bending)");
    expect(verdictWords({ pass: false, ratio: 1.004, governing: "shear" })).toBe("Over 100.4% (shear)");
    expect(sheetPercent(0.996)).toBe("99.6%");
    expect(sheetPercent(1.004)).toBe("100.4%");
    expect(sheetPercent(0.6373)).toBe("64%");
  });
});
