import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { checkRequest } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";
import { jackStudsUnder, summarize } from "@/lib/flow/summary";
import { sheetMember } from "@/lib/sheets/snapshot";
import { checkMember } from "@/lib/solver/design";
import type { MemberSpec } from "@/lib/solver/design/schema";
import { STARTER_TABLES } from "@/lib/tables";

// Jack studs are what the crew builds under a header, and under a beam in a stud wall (its ends sit on studs:
// common practice). The headline counts them, so the answer screen's support rows, the saved summary (crew link,
// job page, order list) and the job sheet must show the same counts, not the bearing length alone.
describe("a beam in a stud wall: every view shows the jack studs the headline counts", () => {
  const beam = (wallFraming: FlowState["wallFraming"]): FlowState => ({
    ...defaultFlowState("beam"),
    wallFraming,
    lengthFt: 6,
    supports: [
      { x: 0, type: "pin" },
      { x: 6, type: "roller" },
    ],
  });
  const spec: MemberSpec = { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12", plies: 3 };

  test.each([
    ["in a 2x6 wall", "2x6" as const, true],
    ["not in a wall", "none" as const, false],
  ])("%s", (_label, wall, inWall) => {
    const state = beam(wall);
    expect(jackStudsUnder(state)).toBe(inWall);
    const check = checkMember(checkRequest(state, spec), STARTER_TABLES);
    const summary = summarize(state, check);
    const sheet = sheetMember({ id: "m1", label: "B1", kind: state.kind, flowState: state, chosenMember: spec, savedTables: null }, spec, STARTER_TABLES);
    if (inWall) {
      expect(summary.headline).toMatch(/jack studs? each end/);
      const n = Number(/(\d+) jack studs? each end/.exec(summary.headline)?.[1]);
      expect(summary.reactions.map((r) => r.jackStuds)).toEqual([n, n]);
      expect(sheet.reactions.map((r) => r.jackStuds)).toEqual([n, n]);
    } else {
      expect(summary.headline).not.toMatch(/jack stud/);
      expect(summary.reactions.every((r) => r.jackStuds === null)).toBe(true);
      expect(sheet.reactions.every((r) => r.jackStuds === null)).toBe(true);
    }
  });

  test("a header always; joists never", () => {
    expect(jackStudsUnder(defaultFlowState("header"))).toBe(true);
    expect(jackStudsUnder(defaultFlowState("floor-joist"))).toBe(false);
    expect(jackStudsUnder(defaultFlowState("deck-beam"))).toBe(false);
  });
});
