import { describe, expect, test } from "vitest";
import { checkMember, DesignInputError, largestSpan, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

const base = {
  member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10" },
  lengthFt: 12,
  supports: [
    { x: 0, type: "pin" },
    { x: 12, type: "roller" },
  ],
  spacingIn: 16,
  loads: [{ type: "area", case: "L", psf: 40 }],
};

function issuesOf(fn: () => unknown): { path: string; message: string }[] {
  try {
    fn();
  } catch (err) {
    if (err instanceof DesignInputError) return err.issues;
    throw err;
  }
  throw new Error("expected a DesignInputError");
}

describe("bad input names the field and the reason", () => {
  test.each([
    [
      "unknown species lists the species the tables hold",
      { ...base, member: { ...base.member, species: "Oak" } },
      "member.species",
      /Douglas Fir-Larch, Hem-Fir, Spruce-Pine-Fir, Southern Pine/,
    ],
    ["unknown size lists the sizes", { ...base, member: { ...base.member, size: "2x9" } }, "member.size", /2x4, 2x6, 2x8, 2x10, 2x12/],
    ["unknown grade lists the grades", { ...base, member: { ...base.member, grade: "Stud" } }, "member.grade", /Select Structural, No\.1, No\.2, No\.3/],
    ["unknown W-shape lists the shapes", { ...base, member: { material: "steel", shape: "W8x99" } }, "member.shape", /W8x18/],
    [
      "unknown engineered product lists the products",
      { ...base, member: { material: "engineered", product: "LVL 9E", depth: 11.875 } },
      "member.product",
      /LVL 1\.9E/,
    ],
    ["engineered depth not made", { ...base, member: { material: "engineered", product: "LVL 1.9E", depth: 10 } }, "member.depth", /11\.875 in/],
    ["spacing and tributary both", { ...base, tributaryFt: 4 }, "tributaryFt", /not both/],
    ["neither spacing nor tributary with area loads", { ...base, spacingIn: undefined }, "spacingIn", /area loads \(psf\) need spacingIn/],
    ["bearing 0", { ...base, bearingIn: 0 }, "bearingIn", /greater than 0/],
    ["member shorter than its supports", { ...base, lengthFt: 10 }, "supports.1.x", /must be on the member, between 0 and 10 ft \(got 12\)/],
    ["a load off the member", { ...base, loads: [{ type: "point", case: "L", x: 14, P: 100 }] }, "loads.0.x", /must be on the member/],
    ["an area load without a case", { ...base, loads: [{ type: "area", psf: 40 }] }, "loads.0.case", /case and psf, or a preset/],
    ["an unknown load case", { ...base, loads: [{ type: "area", case: "X", psf: 40 }] }, "loads.0", /./],
    ["one pin cannot hold the member", { ...base, supports: [{ x: 0, type: "pin" }] }, "supports", /unstable/],
    ["five plies", { ...base, member: { ...base.member, plies: 5 } }, "member.plies", /1 to 4 plies/],
    [
      "LVL in wet service",
      { ...base, member: { material: "engineered", product: "LVL 1.9E", depth: 11.875 }, conditions: { wet: true } },
      "conditions.wet",
      /dry service only/,
    ],
    ["method not asd or lrfd", { ...base, method: "lsd" }, "method", /"asd" or "lrfd"/],
  ])("%s", (_label, input, path, message) => {
    const issues = issuesOf(() => checkMember(input, STARTER_TABLES));
    const hit = issues.find((i) => i.path === path || i.path.startsWith(`${path}.`));
    expect(hit, JSON.stringify(issues)).toBeDefined();
    expect(hit?.message).toMatch(message);
  });

  test("size: an unknown species in the family lists the species", () => {
    const { size: _s, ...family } = base.member;
    void _s;
    const issues = issuesOf(() => sizeMember({ ...base, member: { ...family, species: "Teak" } }, STARTER_TABLES));
    expect(issues[0].path).toBe("member.species");
    expect(issues[0].message).toMatch(/the tables hold Douglas Fir-Larch/);
  });

  test("size: spacing and tributary both", () => {
    const issues = issuesOf(() => sizeMember({ ...base, member: { material: "steel" }, tributaryFt: 3 }, STARTER_TABLES));
    expect(issues.map((i) => i.path)).toContain("tributaryFt");
  });

  test("span: the member must be named in full", () => {
    const issues = issuesOf(() => largestSpan({ ...base, member: { material: "sawn", species: "Hem-Fir", grade: "No.2" } }, STARTER_TABLES));
    expect(issues[0].path).toBe("member.size");
  });
});

describe("supports are capped at the schema, before the pairwise checks", () => {
  // 16,000 supports at distinct and at repeated positions: the cap must speak alone. Had the cross-field
  // check run, repeated positions would add "another support … is already at" issues (it compares every pair).
  test.each([
    ["distinct positions", (i: number) => (12 * i) / 16_000],
    ["all at one position", () => 6],
  ])("16,000 supports, %s: one issue on supports naming the cap, for check, size and span", (_label, xOf) => {
    const supports = Array.from({ length: 16_000 }, (_, i) => ({ x: xOf(i), type: "pin" }));
    const input = { ...base, supports };
    for (const run of [
      () => checkMember(input, STARTER_TABLES),
      () => sizeMember({ ...input, member: { material: "sawn" } }, STARTER_TABLES),
      () => largestSpan(input, STARTER_TABLES),
    ]) {
      const issues = issuesOf(run);
      expect(issues).toEqual([{ path: "supports", message: "at most 20 supports" }]);
    }
  });

  test("20 supports are still accepted", () => {
    const supports = Array.from({ length: 20 }, (_, i) => ({ x: (12 * i) / 19, type: i === 0 ? "pin" : "roller" }));
    expect(() => checkMember({ ...base, supports }, STARTER_TABLES)).not.toThrow();
  });
});
