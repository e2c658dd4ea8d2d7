// What the conflict message lists as changed between the member a phone opened and the member as it is now
// (lib/offline/member-change.ts). The expected words are built here from the inputs; lengths as a tape reads
// (feet and inches, common practice).
import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { withMainSpan } from "@/lib/flow/state";
import type { MemberSnapshot } from "@/lib/offline/answers";
import { memberChanges } from "@/lib/offline/member-change";

const base: MemberSnapshot = { label: "H2 stair header", flowState: withMainSpan(defaultFlowState("header"), 6), chosenMember: null, headline: null };

describe("what changed in a member since the phone opened it", () => {
  test("nothing the builder set: no lines", () => {
    expect(memberChanges(base, { ...base, headline: "2-ply 2x8 No.2" })).toEqual([]);
  });

  test("the name and the span, each with was and now", () => {
    const now: MemberSnapshot = { ...base, label: "H2 stair header (office)", flowState: withMainSpan(defaultFlowState("header"), 10) };
    expect(memberChanges(base, now)).toEqual([`name: was “H2 stair header”, now “H2 stair header (office)”`, `span: was 6' 0", now 10' 0"`]);
  });

  test("a load added is named as the loads changing, with the counts", () => {
    const a = base.flowState!;
    const extra = { id: "p1", label: "post above", x: 3, P: 1200, case: "D" as const };
    const now: MemberSnapshot = { ...base, flowState: { ...a, pointLoads: [...a.pointLoads, extra] } };
    const before = a.areaLoads.length + a.pointLoads.length + a.lineLoads.length + (a.snow.on ? 1 : 0);
    expect(memberChanges(base, now)).toEqual([`loads: were ${before}, now ${before + 1} (added, removed or changed)`]);
  });

  test("the chosen member", () => {
    const now: MemberSnapshot = { ...base, chosenMember: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 2 } as never };
    const lines = memberChanges(base, now);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toBe("chosen member: was the best that passes, now 2-ply 2x10 No.2 Douglas Fir-Larch");
  });
});
