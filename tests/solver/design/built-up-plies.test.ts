import { describe, expect, test } from "vitest";
import { answerFacts } from "@/lib/flow/summary";
import { checkMember, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

// Built-up beams are plies of 2x lumber nailed through (common practice: a 16d nail, 3-1/2 in long, joins two 1-1/2 in
// plies; it does not reach through two 3-1/2 in plies). The search offers multi-ply members in 2x only; a member asked
// for by name in thicker plies is still checked, and the answer says its plies are bolted or screwed, not nailed.

const T = STARTER_TABLES;
const request = (member: Record<string, unknown>) => ({
  kind: "beam",
  member,
  lengthFt: 10,
  supports: [
    { x: 0, type: "pin" },
    { x: 10, type: "roller" },
  ],
  tributaryFt: 8,
  loads: [
    { type: "area", case: "L", psf: 40 },
    { type: "area", case: "D", psf: 10 },
  ],
  bearingIn: 3,
});

describe("built-up plies", () => {
  test("the search offers plies of 2x only: no 2-, 3- or 4-ply 3x or 4x among the passing members", () => {
    const r = sizeMember(request({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" }), T);
    const multi = r.passing.map((p) => p.member).filter((m) => m.material === "sawn" && m.plies > 1);
    expect(multi.length).toBeGreaterThan(0);
    for (const m of multi) expect(m.material === "sawn" && m.size.startsWith("2x")).toBe(true);
    expect(r.passing.some((p) => p.member.material === "sawn" && p.member.size === "4x12" && p.member.plies === 1)).toBe(true);
  });

  test("asked for as built-up plies, no single 3x or 4x is offered (a single piece is what the sawn family is for)", () => {
    const r = sizeMember(request({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", plies: [2, 3, 4] }), T);
    expect(r.passing.length).toBeGreaterThan(0);
    for (const p of r.passing) if (p.member.material === "sawn" && p.member.plies === 1) expect(p.member.size).toMatch(/^[68]x/);
  });

  test("asked for by name, 2-ply 4x12 is checked, and its plies are said to be bolted or screwed", () => {
    const r = checkMember(request({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "4x12", plies: 2 }), T);
    expect(answerFacts(r).join("\n")).toMatch(/Assemble: 2-ply 4x12, plies bolted or screwed together/);
    const nailed = checkMember(request({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12", plies: 3 }), T);
    expect(answerFacts(nailed).join("\n")).toMatch(/Assemble: 3-ply 2x12, plies nailed together/);
  });
});
