import { describe, expect, test } from "vitest";
import { answerLine, supportWords } from "@/lib/solver/design/answer-line";
import { checkMember, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

const dfl = (size: string, plies = 1) => ({ material: "sawn" as const, species: "Douglas Fir-Larch", grade: "No.2", size, plies });

describe("what the supports need, in words", () => {
  test.each([
    { studs: [2, 2], words: "2 jack studs each end" },
    { studs: [1, 1], words: "1 jack stud each end" },
    { studs: [2, 3], words: "2 jack studs at support 1, 3 jack studs at support 2" },
  ])("jack studs $studs → $words", ({ studs, words }) => {
    expect(
      supportWords(
        studs.map((jackStuds) => ({ jackStuds, requiredBearing: 1 })),
        "studs",
      ),
    ).toBe(words);
  });

  test("no studs: the bearing, never under 1-1/2 in (IRC 2021 R502.6)", () => {
    expect(supportWords([{ jackStuds: null, requiredBearing: 0.4 }])).toBe(`1-1/2" bearing at the support`);
    expect(
      supportWords([
        { jackStuds: null, requiredBearing: 2.3 },
        { jackStuds: null, requiredBearing: 1 },
      ]),
    ).toBe(`2-5/16" bearing each end`);
    const three = [0.4, 2.3, 0.9].map((b) => ({ jackStuds: null, requiredBearing: b }));
    expect(supportWords(three)).toBe(`2-5/16" bearing at each support`);
  });
});

describe("the answer line follows the kind of member", () => {
  const two = (jackStuds: number | null, requiredBearing: number) => [
    { jackStuds, requiredBearing },
    { jackStuds, requiredBearing },
  ];

  test.each([
    { kind: "header", spacingIn: undefined, line: "3-ply 2x12 No.2 — 2 jack studs each end" },
    { kind: "beam", spacingIn: undefined, line: `3-ply 2x12 No.2 — 2-3/8" bearing each end` },
    { kind: "deck-beam", spacingIn: undefined, line: `3-ply 2x12 No.2 — 2-3/8" bearing on each post` },
    { kind: "floor-joist", spacingIn: 16, line: `3-ply 2x12 No.2 at 16 in o.c. — 2-3/8" bearing each end on the plate, beam or hanger` },
    { kind: "deck-joist", spacingIn: 16, line: `3-ply 2x12 No.2 at 16 in o.c. — 2-3/8" bearing each end on the plate, beam or hanger` },
    { kind: "rafter", spacingIn: 24, line: `3-ply 2x12 No.2 at 24 in o.c. — 2-3/8" bearing each end on the plate, beam or hanger` },
    { kind: undefined, spacingIn: 16, line: `3-ply 2x12 No.2 at 16 in o.c. — 2-3/8" bearing each end on the plate, beam or hanger` },
    { kind: undefined, spacingIn: undefined, line: `3-ply 2x12 No.2 — 2-3/8" bearing each end` },
  ] as const)("$kind at $spacingIn in: $line", ({ kind, spacingIn, line }) => {
    expect(answerLine({ spec: dfl("2x12", 3), label: "3-ply 2x12 Douglas Fir-Larch No.2", kind, spacingIn, supports: two(2, 2.35) })).toBe(line);
  });

  test("a beam in a stud wall gets jack studs; a spacer between plies is named", () => {
    expect(
      answerLine({
        spec: dfl("2x10", 2),
        label: "2-ply 2x10 Douglas Fir-Larch No.2",
        kind: "beam",
        inStudWall: true,
        assembly: { plies: 2, spacerIn: 0.5 },
        supports: two(2, 2),
      }),
    ).toBe(`2-ply 2x10 No.2 with 1/2" spacer — 2 jack studs each end`);
  });
});

describe("the routes' answer is the same line", () => {
  const joist = {
    member: dfl("2x10"),
    lengthFt: 12,
    supports: [
      { x: 0, type: "pin" },
      { x: 12, type: "roller" },
    ],
    spacingIn: 16,
    loads: [
      { type: "area", case: "D", psf: 10 },
      { type: "area", case: "L", psf: 40 },
    ],
  };

  test("a floor joist is never told to stand on a jack stud", () => {
    const r = checkMember({ ...joist, kind: "floor-joist" }, STARTER_TABLES);
    expect(r.pass).toBe(true);
    expect(r.answer).toBe(`2x10 No.2 at 16 in o.c. — 1-1/2" bearing each end on the plate, beam or hanger`);
    expect(r.answer).not.toMatch(/jack stud/);
  });

  test("a header with 3 in of bearingIn: the jack studs cover the bearing the check used (two 1-1/2 in studs)", () => {
    const header = {
      ...joist,
      member: dfl("2x10", 2),
      kind: "header",
      spacingIn: undefined,
      tributaryFt: 4,
      bearingIn: 3,
      lengthFt: 5,
      supports: [
        { x: 0, type: "pin" },
        { x: 5, type: "roller" },
      ],
    };
    const r = checkMember(header, STARTER_TABLES);
    const bearing = r.checks.find((c) => c.name === "bearing")!;
    expect(bearing.ratio).toBeLessThan(1);
    for (const x of r.reactions) expect(x.jackStuds! * 1.5).toBeGreaterThanOrEqual(header.bearingIn);
    // a header sits in a 2x4 wall unless told: two 1-1/2 in plies and a 1/2 in spacer fill its 3-1/2 in
    expect(r.answer).toBe(`2-ply 2x10 No.2 with 1/2" spacer — ${r.reactions[0].jackStuds} jack studs each end`);
  });

  test("an unknown kind is refused naming the field and the allowed values", () => {
    expect(() => checkMember({ ...joist, kind: "girder" }, STARTER_TABLES)).toThrow(/kind/);
    try {
      checkMember({ ...joist, kind: "girder" }, STARTER_TABLES);
    } catch (err) {
      const issues = (err as { issues: { path: string; message: string }[] }).issues;
      expect(issues).toEqual([{ path: "kind", message: expect.stringContaining('"floor-joist", "header", "beam", "deck-joist", "deck-beam", "rafter"') }]);
    }
  });

  test("the sizing search writes the same line for each member", () => {
    const size = sizeMember(
      { ...joist, member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" }, kind: "floor-joist", fullChecks: 2 },
      STARTER_TABLES,
    );
    for (const p of size.passing.slice(0, 2)) expect(p.answer).toBe(p.check!.answer);
    expect(size.passing[0].answer).toMatch(/ at 16 in o\.c\. — 1-1\/2" bearing each end on the plate, beam or hanger$/);
  });
});
