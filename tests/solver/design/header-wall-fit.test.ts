import { describe, expect, test } from "vitest";
import { checkMember, DesignInputError, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

/**
 * Headers that fit the wall (common practice): in a 2x4 wall (3-1/2 in) two 1-1/2 in plies with a
 * 1/2 in spacer between them, or a solid member 3 to 3-1/2 in wide; in a 2x6 wall (5-1/2 in) three
 * plies with two 1/2 in spacers, or a solid member 5 to 5-1/2 in wide. A rough opening becomes the span
 * by adding half the bearing at each end.
 */
const header = (extra: Record<string, unknown> = {}) => ({
  kind: "header",
  roughOpeningFt: 5,
  tributaryFt: 13,
  bearingIn: 3,
  loads: [
    { type: "area", preset: "roof-dead" },
    { type: "area", preset: "roof-live" },
    { type: "snow", pg: 30 },
    { type: "udl", case: "D", from: 0, to: 5.25, w: 80 },
  ],
  ...extra,
});

describe("a 5 ft 0 in rough opening with the flow's default header loads", () => {
  test("span = opening + half the 3 in bearing each end = 5 ft 3 in, and the result says so", () => {
    const r = sizeMember({ ...header(), member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" } }, STARTER_TABLES);
    expect(r.roughOpening?.spanFt).toBeCloseTo(5 + 3 / 12, 12);
    expect(r.roughOpening?.note).toBe("span 5 ft 3 in = rough opening 5 ft 0 in + half of the 3 in bearing at each end");
  });

  test("in a 2x4 wall (the default for a header) only 2-ply with a 1/2 in spacer or 3-1/2 in solids are offered, never 4-ply 2x4", () => {
    const r = sizeMember({ ...header(), member: { material: "any" }, limit: 200 }, STARTER_TABLES);
    expect(r.wallFraming).toBe("2x4");
    expect(r.passing.length).toBeGreaterThan(0);
    expect(r.notFittingWall).toBeGreaterThan(0);
    for (const p of [...r.passing, ...r.failing]) {
      expect(p.assembly.fits).toBe(true);
      expect(p.assembly.widthIn).toBeLessThanOrEqual(3.5);
      expect(p.assembly.widthIn).toBeGreaterThanOrEqual(3.0);
      if (p.member.material === "sawn" && p.assembly.plies > 1) {
        expect(p.assembly).toMatchObject({ plies: 2, spacers: 1, spacerIn: 0.5, wallFraming: "2x4" });
        expect(p.assembly.words).toMatch(/^2-ply 2x\d+ with 1\/2 in spacer$/);
      }
    }
    expect(r.passing.some((p) => p.label.startsWith("4-ply 2x4"))).toBe(false);
  });

  test("in a 2x6 wall: three plies with two 1/2 in spacers (5-1/2 in)", () => {
    const r = sizeMember(
      { ...header({ wallFraming: "2x6" }), member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" }, limit: 50 },
      STARTER_TABLES,
    );
    const built = r.passing.filter((p) => p.assembly.plies > 1);
    expect(built.length).toBeGreaterThan(0);
    for (const p of built) expect(p.assembly).toMatchObject({ plies: 3, spacers: 2, widthIn: 5.5 });
  });

  test("a check of a member that does not fill the wall says so", () => {
    const r = checkMember({ ...header(), member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x4", plies: 4 } }, STARTER_TABLES);
    expect(r.assembly.fits).toBe(false);
    expect(r.assumptions.join(" ")).toMatch(/does not fill a 2x4 wall/);
  });

  test("span and rough opening together are refused, naming roughOpeningFt", () => {
    try {
      checkMember(
        {
          ...header(),
          lengthFt: 6,
          supports: [
            { x: 0, type: "pin" },
            { x: 6, type: "roller" },
          ],
          member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 2 },
        },
        STARTER_TABLES,
      );
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(DesignInputError);
      expect((err as DesignInputError).issues[0].path).toBe("roughOpeningFt");
    }
  });
});
