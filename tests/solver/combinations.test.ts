// ASCE/SEI 7-22 basic load combinations (§2.4.1 ASD, §2.3.1 LRFD) and envelopes with pattern live load.
// ASCE 7-22 §2.4.1 snow terms as STRUCTURE magazine excerpts them ("ASCE 7-22 Flat Roof Snow Load versus
// Minimum Snow Load", structuremag.org): 3a. D + (Lr or 0.7S or R); 4a. D + 0.75L + 0.75(Lr or 0.7S or R);
// 6a. D + 0.75L + 0.75(0.6W) + 0.75(Lr or 0.7S or R).
import { describe, expect, test } from "vitest";
import { asdCombinations, LRFD_SNOW_COMPANION_22, lrfdCombinations } from "@/lib/solver/asce7/combinations";
import { analyzeBeam } from "@/lib/solver/beam";
import { envelope } from "@/lib/solver/envelope";
import type { BeamInput, LoadCase } from "@/lib/solver/types";
import { E, I, expectClose } from "./beam/helpers";

describe("ASCE 7-22 §2.4.1 ASD basic combinations", () => {
  test.each([
    {
      cases: ["D", "L"] as LoadCase[],
      // (1) D; (2) D + L; the rest add nothing new without Lr, S or W
      want: [{ D: 1 }, { D: 1, L: 1 }],
    },
    {
      cases: ["D", "L", "S"] as LoadCase[],
      // (3) D + 0.7S; (4) D + 0.75L + 0.75(0.7S)
      want: [{ D: 1 }, { D: 1, L: 1 }, { D: 1, S: 0.7 }, { D: 1, L: 0.75, S: 0.75 * 0.7 }],
    },
    {
      cases: ["D", "Lr", "W"] as LoadCase[],
      // (3) D + Lr; (5) D + 0.6W; (6) D + 0.75(0.6W) + 0.75Lr; (7) 0.6D + 0.6W
      // ((4) D + 0.75Lr and (6) D + 0.75(0.6W) alone lie between D and (3) or (5): they never govern)
      want: [{ D: 1 }, { D: 1, Lr: 1 }, { D: 1, W: 0.6 }, { D: 1, W: 0.75 * 0.6, Lr: 0.75 }, { D: 0.6, W: 0.6 }],
    },
  ])("cases $cases", ({ cases, want }) => {
    const got = asdCombinations(cases, "ASCE 7-22");
    expect(got).toHaveLength(want.length);
    for (const [i, c] of got.entries()) {
      expect(Object.keys(c.factors).sort()).toEqual(Object.keys(want[i]).sort());
      for (const [k, v] of Object.entries(want[i])) expectClose(c.factors[k as LoadCase] ?? 0, v, 1e-12);
    }
    expect(new Set(got.map((c) => c.name)).size).toBe(got.length);
  });

  test("the names read like the standard's", () => {
    expect(asdCombinations(["D", "L", "S"], "ASCE 7-22").map((c) => c.name)).toEqual(["D", "D+L", "D+0.7S", "D+0.75L+0.525S"]);
  });
});

// ASCE 7-16 §2.4.1 as reproduced on a public code page (callout.app, "ASCE 7 §2.4.1"):
// (1) D; (2) D + L; (3) D + (Lr or S or R); (4) D + 0.75L + 0.75(Lr or S or R); (5) D + 0.6W;
// (6) D + 0.75L + 0.75(0.6W) + 0.75(Lr or S or R); (7) 0.6D + 0.6W. Snow at full value.
describe("ASCE 7-16 §2.4.1 ASD basic combinations: S at full value (the default basis)", () => {
  test("D, L, S: D + S and D + 0.75L + 0.75S", () => {
    const got = asdCombinations(["D", "L", "S"], "ASCE 7-16");
    expect(got.map((c) => c.factors)).toEqual([{ D: 1 }, { D: 1, L: 1 }, { D: 1, S: 1 }, { D: 1, L: 0.75, S: 0.75 }]);
    expect(got.map((c) => c.name)).toEqual(["D", "D+L", "D+S", "D+0.75L+0.75S"]);
  });
  test("the default edition is ASCE 7-16", () => {
    expect(asdCombinations(["D", "S"])).toEqual(asdCombinations(["D", "S"], "ASCE 7-16"));
    expect(lrfdCombinations(["D", "S"])).toEqual(lrfdCombinations(["D", "S"], "ASCE 7-16"));
  });
  test("every S factor of 7-22 is 0.7 times the 7-16 one in ASD", () => {
    const a = asdCombinations(["D", "L", "Lr", "S", "W"], "ASCE 7-16");
    const b = asdCombinations(["D", "L", "Lr", "S", "W"], "ASCE 7-22");
    expect(a).toHaveLength(b.length);
    a.forEach((c, i) => expectClose(b[i].factors.S ?? 0, 0.7 * (c.factors.S ?? 0), 1e-12));
  });
});

// ASCE 7-16 §2.3.1 (LRFD) as reproduced on public pages of the 2016 text (idecad wiki, "ASCE 7-16 Section 2.3.1"):
// 1.4D; 1.2D + 1.6L + 0.5(Lr or S); 1.2D + 1.6(Lr or S) + (L or 0.5W); 1.2D + 1.0W + L + 0.5(Lr or S); 0.9D + 1.0W.
describe("ASCE 7-16 §2.3.1 LRFD basic combinations", () => {
  test("D, L, S: 1.6S leading, 0.5S as a companion", () => {
    const got = lrfdCombinations(["D", "L", "S"], "ASCE 7-16");
    expect(got.map((c) => c.name)).toEqual(["1.4D", "1.2D+1.6L", "1.2D+1.6L+0.5S", "1.2D+1.6S+L"]);
  });
});

// ASCE 7-22 §2.3.1: strength-level snow leads at 1.0S, φRn = 1.2D + 1.0S (STRUCTURE magazine, February 2022,
// "Ground Snow Loads for ASCE 7-22", Eqn. 1). Companion 0.3S as an open-source published copy of the 2022
// strength combinations lists them (exact-string search, repository not named): "2a-2: 1.2D + 1.6L + 0.3S",
// "3a-3: 1.2D + 1.0S + L", "3a-4: 1.2D + 1.0S + 0.5W", "4a-2: 1.2D + 1.0W + L + 0.3S".
describe("ASCE 7-22 §2.3.1 LRFD basic combinations", () => {
  test("D and L: 1.4D and 1.2D + 1.6L", () => {
    expect(lrfdCombinations(["D", "L"]).map((c) => c.factors)).toEqual([{ D: 1.4 }, { D: 1.2, L: 1.6 }]);
  });
  test("D, L, S: snow is strength level, 1.0S leading and 0.3S as a companion, as published", () => {
    const got = lrfdCombinations(["D", "L", "S"], "ASCE 7-22");
    expect(got.map((c) => c.name)).toEqual(["1.4D", "1.2D+1.6L", "1.2D+1.6L+0.3S", "1.2D+S+L"]);
    const lead = got.find((c) => c.name === "1.2D+S+L")!;
    expect(lead.factors).toEqual({ D: 1.2, S: 1, L: 1 });
    expect(LRFD_SNOW_COMPANION_22).toBe(0.3);
  });
  test("D, L, S, W: 1.2D + 1.0S + 0.5W and 1.2D + 1.0W + L + 0.3S are among them, as published", () => {
    const got = lrfdCombinations(["D", "L", "S", "W"], "ASCE 7-22").map((c) => c.factors);
    expect(got).toContainEqual({ D: 1.2, S: 1, W: 0.5 });
    expect(got).toContainEqual({ D: 1.2, W: 1, L: 1, S: 0.3 });
    expect(got).toContainEqual({ D: 1.2, L: 1.6, S: 0.3 });
  });
  test("D, S alone: 1.2D + 1.0S, the published strength-level equation", () => {
    expect(lrfdCombinations(["D", "S"], "ASCE 7-22").map((c) => c.factors)).toContainEqual({ D: 1.2, S: 1 });
  });
  test("wind uplift combination 0.9D + 1.0W is present when W is", () => {
    expect(lrfdCombinations(["D", "W"]).map((c) => c.name)).toContain("0.9D+W");
  });
});

const l = 12;
const wD = 15;
const wL = 40;
function twoSpan(wLive: number): BeamInput {
  return {
    length: 2 * l,
    E,
    I,
    supports: [
      { x: 0, type: "pin" },
      { x: l, type: "roller" },
      { x: 2 * l, type: "roller" },
    ],
    loads: [
      { type: "udl", from: 0, to: 2 * l, w: wD, case: "D" },
      { type: "udl", from: 0, to: 2 * l, w: wLive, case: "L" },
    ],
  };
}

describe("envelopes with pattern live load (common practice for continuous joists)", () => {
  test("two equal spans: patterns all spans, span 1, span 2; each extreme matches a direct analysis", () => {
    const input = twoSpan(wL);
    const env = envelope(input, asdCombinations(["D", "L"]));
    const labels = env.runs.map((r) => `${r.combination.name} / ${r.pattern}`);
    expect(labels).toEqual(["D / all spans", "D+L / all spans", "D+L / span 1", "D+L / span 2"]);
    // The largest sagging moment comes from live load on one span only (AISC Manual 15th ed.,
    // Table 3-23 case 29 plus case 33 for the dead load) — checked by analyzing that layout directly.
    const direct = analyzeBeam({ ...input, loads: [input.loads[0], { type: "udl", from: 0, to: l, w: wL, case: "L" }] });
    expectClose(env.Mmax.value, direct.extremes.Mpos.value, 1e-9);
    expect(env.runs[env.Mmax.run].pattern).toBe("span 1");
    // Two-span closed forms: D+L everywhere gives −(wD+wL)l²/8 over the center support ...
    expectClose(env.Mmin.value, (-(wD + wL) * l * l) / 8, 1e-9);
    expect(env.runs[env.Mmin.run].pattern).toBe("all spans");
    // ... and the center reaction 10(wD+wL)l/8; the end reaction is least with live load on the far span
    expectClose(env.reactions[1].maxDown.F, (10 * (wD + wL) * l) / 8, 1e-9);
    expectClose(env.reactions[0].maxUp.F, (3 * wD * l) / 8 - (wL * l) / 16, 1e-9);
    expect(env.runs[env.reactions[0].maxUp.run].pattern).toBe("span 2");
  });

  test("heavy live load on one span lifts the far end: the uplift is reported with its run", () => {
    const env = envelope(twoSpan(400), asdCombinations(["D", "L"]));
    const R = (3 * wD * l) / 8 - (400 * l) / 16;
    expect(R).toBeLessThan(0);
    expectClose(env.reactions[2].maxUp.F, R, 1e-9);
    expect(env.runs[env.reactions[2].maxUp.run].pattern).toBe("span 1");
    expect(env.deflUp.value).toBeLessThan(0);
  });

  test("four spans: alternate spans and the pairs beside each interior support", () => {
    const input: BeamInput = {
      length: 48,
      E,
      I,
      supports: [0, 12, 24, 36, 48].map((x) => ({ x, type: "roller" as const })),
      loads: [
        { type: "udl", from: 0, to: 48, w: 10, case: "D" },
        { type: "udl", from: 0, to: 48, w: 40, case: "L" },
      ],
    };
    const env = envelope(input, [{ name: "D+L", factors: { D: 1, L: 1 } }]);
    expect(env.runs.map((r) => r.pattern)).toEqual(["all spans", "spans 1,3", "spans 2,4", "spans 1-2", "spans 2-3", "spans 3-4"]);
    // every run is the direct analysis of its own layout (superposition is exact)
    const direct = analyzeBeam({
      ...input,
      loads: [input.loads[0], { type: "udl", from: 12, to: 24, w: 40, case: "L" }, { type: "udl", from: 24, to: 36, w: 40, case: "L" }],
    });
    const run = env.runs[4].analysis;
    for (const x of [3, 13.7, 24, 30.2, 47]) expectClose(run.evaluate(x).M, direct.evaluate(x).M, 1e-9, 1000);
  });

  test("without patterning, one run per combination", () => {
    const env = envelope(twoSpan(wL), asdCombinations(["D", "L"]), { pattern: false });
    expect(env.runs.map((r) => r.pattern)).toEqual(["all spans", "all spans"]);
  });

  test("an overhang is patterned like a span", () => {
    const input: BeamInput = {
      length: 16,
      E,
      I,
      supports: [
        { x: 0, type: "pin" },
        { x: 12, type: "roller" },
      ],
      loads: [
        { type: "udl", from: 0, to: 16, w: 10, case: "D" },
        { type: "udl", from: 0, to: 16, w: 40, case: "L" },
      ],
    };
    const env = envelope(input, [{ name: "D+L", factors: { D: 1, L: 1 } }]);
    expect(env.runs.map((r) => r.pattern)).toEqual(["all spans", "span 1", "right overhang"]);
    // live load on the backspan alone lifts the tip most; on the overhang alone, it bears hardest on
    // the support next to it is no less than with all spans loaded, and the backspan sags least
    expect(env.runs[env.deflUp.run].pattern).toBe("span 1");
    expectClose(env.deflUp.x, 16, 1e-12);
    expect(env.runs[env.deflDown.run].pattern).not.toBe("right overhang");
    expect(env.runs[env.reactions[0].maxUp.run].pattern).toBe("right overhang");
  });
});
