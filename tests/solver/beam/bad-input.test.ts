// Every bad input of issue 3 §5 gets a clear message naming the field and the reason; layouts that
// cannot carry load say why and what to add. Checked through the shared zod schema (the CLI's and
// the route's boundary) and through analyzeBeam itself (for callers inside lib/).
import { describe, expect, test } from "vitest";
import { analyzeBeam, BeamInputError, BeamInstabilityError } from "@/lib/solver/beam";
import { beamInputSchema } from "@/lib/solver/schema";
import { zodIssues as issuesOf } from "@/lib/zod-issues";
import type { BeamInput } from "@/lib/solver/types";

const ok = {
  length: 10,
  E: 1_600_000,
  I: 178,
  supports: [
    { x: 0, type: "pin" },
    { x: 10, type: "roller" },
  ],
  loads: [{ type: "udl", from: 0, to: 10, w: 100 }],
};

function withField(patch: Record<string, unknown>): unknown {
  return { ...ok, ...patch };
}

/** The messages a caller sees: the schema's issues, or analyzeBeam's error. */
function messages(json: unknown): string[] {
  const parsed = beamInputSchema.safeParse(json);
  if (!parsed.success) return issuesOf(parsed.error).map((i) => `${i.path}: ${i.message}`);
  try {
    analyzeBeam(parsed.data as BeamInput);
    return [];
  } catch (err) {
    if (err instanceof BeamInputError || err instanceof BeamInstabilityError) return err.message.split("\n");
    throw err;
  }
}

const many = <T>(n: number, f: (i: number) => T): T[] => Array.from({ length: n }, (_, i) => f(i));

describe("layouts that cannot carry load", () => {
  test.each([
    {
      name: "a single pin",
      json: withField({ supports: [{ x: 4, type: "pin" }] }),
      want: "unstable: the beam can rotate about the support at x = 4 ft — add a second support or make it fixed",
    },
    {
      name: "a single roller",
      json: withField({ supports: [{ x: 2.5, type: "roller" }] }),
      want: "unstable: the beam can rotate about the support at x = 2.5 ft — add a second support or make it fixed",
    },
    {
      name: "no support on the member",
      json: withField({ supports: [] }),
      want: "unstable: the beam has no supports — add at least two supports, or one fixed support",
    },
  ])("$name", ({ json, want }) => {
    expect(messages(json)).toEqual([want]);
    expect(() => analyzeBeam(json as BeamInput)).toThrow(BeamInstabilityError);
  });

  test("supports all off the member: each is named", () => {
    expect(
      messages(
        withField({
          supports: [
            { x: -2, type: "pin" },
            { x: 12, type: "roller" },
          ],
        }),
      ),
    ).toEqual(["supports.0.x: must be on the member, between 0 and 10 ft (got -2)", "supports.1.x: must be on the member, between 0 and 10 ft (got 12)"]);
  });

  test("two supports at one point (a mechanism in disguise)", () => {
    expect(
      messages(
        withField({
          supports: [
            { x: 4, type: "pin" },
            { x: 4, type: "roller" },
          ],
        }),
      ),
    ).toEqual(["supports.1.x: another support (supports.0) is already at x = 4 ft"]);
  });
});

describe("limits and field checks", () => {
  test.each([
    {
      name: "length over 200 ft",
      json: withField({
        length: 250,
        supports: [
          { x: 0, type: "pin" },
          { x: 250, type: "roller" },
        ],
        loads: [],
      }),
      want: ["length: must be at most 200 ft"],
    },
    { name: "length 0", json: withField({ length: 0 }), want: ["length: must be greater than 0 ft"] },
    { name: "length missing", json: { ...ok, length: undefined }, want: ["length: is required (ft)"] },
    { name: "length as text", json: withField({ length: "12 ft" }), want: ["length: must be a finite number (ft)"] },
    { name: "E not positive", json: withField({ E: 0 }), want: ["E: must be greater than 0 psi"] },
    { name: "I negative", json: withField({ I: -3 }), want: ["I: must be greater than 0 in^4"] },
    {
      name: "E infinite (1e999 in JSON)",
      json: JSON.parse('{"length":10,"E":1e999,"I":178,"supports":[],"loads":[]}'),
      want: ["E: must be a finite number (psi)"],
    },
    { name: "E·I too small to represent", json: withField({ E: 1e-200, I: 1e-200 }), want: ["E: E·I is out of range — check the units: E in psi, I in in^4"] },
    {
      name: "more than 20 supports",
      json: withField({ supports: many(21, (i) => ({ x: i * 0.4, type: "roller" })) }),
      want: ["supports: at most 20 supports"],
    },
    {
      name: "more than 200 loads",
      json: withField({ loads: many(201, (i) => ({ type: "point", x: (i % 10) + 0.5, P: 10 })) }),
      want: ["loads: at most 200 loads"],
    },
    {
      name: "support type unknown",
      json: withField({
        supports: [
          { x: 0, type: "hinge" },
          { x: 10, type: "pin" },
        ],
      }),
      want: ['supports.0.type: must be "pin", "roller" or "fixed"'],
    },
    {
      name: "load type unknown",
      json: withField({ loads: [{ type: "snowdrift", x: 3 }] }),
      want: ['loads.0.type: must be "point", "udl", "linear" or "moment"'],
    },
    {
      name: "load case unknown",
      json: withField({ loads: [{ type: "point", x: 3, P: 100, case: "E" }] }),
      want: ['loads.0.case: must be one of "D", "L", "Lr", "S", "W"'],
    },
    {
      name: "point load off the member",
      json: withField({ loads: [{ type: "point", x: 10.5, P: 100 }] }),
      want: ["loads.0.x: must be on the member, between 0 and 10 ft (got 10.5)"],
    },
    { name: "couple without M", json: withField({ loads: [{ type: "moment", x: 3 }] }), want: ["loads.0.M: is required (lb-ft)"] },
    { name: "from after to", json: withField({ loads: [{ type: "udl", from: 6, to: 2, w: 50 }] }), want: ["loads.0.to: must be greater than from (6 ft)"] },
    {
      name: "from equal to to",
      json: withField({ loads: [{ type: "linear", from: 3, to: 3, w1: 0, w2: 50 }] }),
      want: ["loads.0.to: must be greater than from (3 ft)"],
    },
    {
      name: "udl past the end",
      json: withField({ loads: [{ type: "udl", from: 2, to: 11, w: 50 }] }),
      want: ["loads.0.to: must be on the member, between 0 and 10 ft (got 11)"],
    },
    { name: "station off the member", json: withField({ at: [0, 5, 14] }), want: ["at.2: must be on the member, between 0 and 10 ft (got 14)"] },
    { name: "not an object", json: "span 12", want: [": must be a JSON object with length, E, I, supports and loads"] },
    {
      name: "loads too large to represent",
      json: withField({
        loads: [
          { type: "point", x: 5, P: 1e308 },
          { type: "point", x: 5.5, P: 1e308 },
        ],
      }),
      want: ["E: the results are too large to represent — check the units of E (psi), I (in^4) and the loads"],
    },
  ])("$name", ({ json, want }) => {
    expect(messages(json)).toEqual(want);
  });

  test("analyzeBeam given non-finite numbers directly names the field", () => {
    const bad = { ...ok, loads: [{ type: "point", x: Number.NaN, P: 5 }] } as BeamInput;
    expect(() => analyzeBeam(bad)).toThrow("loads.0.x: must be a finite number (ft)");
  });

  test("a good beam passes with no messages", () => {
    expect(messages(ok)).toEqual([]);
  });
});
