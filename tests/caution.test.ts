import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { CAUTION, NOT_CHECKED } from "@/lib/caution";
import { checkMember, sizeMember } from "@/lib/solver/design";
import { solve } from "@/lib/solver/beam";
import { STARTER_TABLES } from "@/lib/tables";

const member = {
  member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10" },
  lengthFt: 10,
  supports: [
    { x: 0, type: "pin" },
    { x: 10, type: "roller" },
  ],
  spacingIn: 16,
  loads: [{ type: "area", case: "L", psf: 40 }],
};

describe("one caution, one list of what is not checked", () => {
  test("the caution is DESIGN.md's wording, word for word (the README quotes it too)", () => {
    const readme = readFileSync("README.md", "utf8").replace(/\n> /g, " ");
    expect(readme).toContain(CAUTION);
  });

  test("the check, the sizing search and the analysis carry the same caution; the design results the same list", () => {
    const check = checkMember(member, STARTER_TABLES);
    const size = sizeMember({ ...member, member: { material: "sawn" } }, STARTER_TABLES);
    expect(check.caution).toBe(CAUTION);
    expect(size.caution).toBe(CAUTION);
    expect(check.notChecked).toEqual(NOT_CHECKED);
    expect(size.notChecked).toEqual(NOT_CHECKED);
    expect(solve({ length: 10, E: 1.6e6, I: 98.9, supports: member.supports as never, loads: [] }).caution).toBe(CAUTION);
  });

  test("the list names everything DESIGN.md's caution says the tool does not check", () => {
    const words = NOT_CHECKED.join(" ").toLowerCase();
    for (const w of ["connections", "fasteners", "posts", "footings", "lateral loads"]) expect(words).toContain(w);
  });
});
