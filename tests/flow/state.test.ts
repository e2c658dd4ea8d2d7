import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { designLoads, sizeFamily, sizeRequest } from "@/lib/flow/request";
import { flowStateIssues, parseFlowState } from "@/lib/flow/schema";
import { mainSpanFt, MEMBER_KINDS, overhangs, withMainSpan, withOverhang, type FlowState } from "@/lib/flow/state";
import { spanWords } from "@/lib/flow/summary";
import { decodeFlowState, encodeFlowState, readStoredLocation, resolveFlowStart, storeLocation } from "@/lib/flow/url";
import { sizeInputSchema } from "@/lib/solver/design/schema";
import { sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

describe("defaults per kind", () => {
  test.each(MEMBER_KINDS.map((k) => [k]))("%s: a valid state the design route accepts as it is", (kind) => {
    const state = defaultFlowState(kind);
    expect(flowStateIssues(state)).toEqual([]);
    const parsed = sizeInputSchema.safeParse(sizeRequest(state));
    expect(parsed.success ? [] : parsed.error.issues).toEqual([]);
  });

  test.each(MEMBER_KINDS.map((k) => [k]))("%s: the starting inputs have an answer in the starter tables", (kind) => {
    const out = sizeMember(sizeRequest(defaultFlowState(kind)), STARTER_TABLES);
    expect(out.passing.length).toBeGreaterThan(0);
    expect(out.passing[0].ratio).toBeLessThanOrEqual(1);
  });

  test("floor joist: 16 in, 40 psf live, 10 psf dead (IRC 2021 Table R301.5), L/360 live", () => {
    const s = defaultFlowState("floor-joist");
    expect(s.width).toEqual({ mode: "spacing", spacingIn: 16 });
    expect(s.areaLoads.map((a) => [a.case, a.psf])).toEqual([
      ["L", 40],
      ["D", 10],
    ]);
    expect(s.limits.live).toBe(360);
  });

  test("header: a tributary width, roof loads with snow and the wall above as a line load", () => {
    const s = defaultFlowState("header");
    expect(s.width.mode).toBe("tributary");
    expect(s.snow.on).toBe(true);
    expect(s.lineLoads.map((l) => l.case)).toEqual(["D"]);
    const loads = designLoads(s);
    expect(loads.some((l) => l.type === "snow")).toBe(true);
  });
});

describe("span and overhang edits keep the layout", () => {
  test("a new span moves the far support, the member's end and full-length loads with it", () => {
    const s = withMainSpan(defaultFlowState("header"), 10);
    expect(s.lengthFt).toBe(10);
    expect(s.supports.map((x) => x.x)).toEqual([0, 10]);
    expect(s.lineLoads[0]).toMatchObject({ from: 0, to: 10 });
    expect(mainSpanFt(s)).toBe(10);
  });

  test("overhangs on both ends: supports shift right for a left overhang; spans stay", () => {
    let s: FlowState = withMainSpan(defaultFlowState("deck-joist"), 11);
    s = withOverhang(s, "right", 1.5);
    s = withOverhang(s, "left", 2);
    expect(overhangs(s)).toEqual({ left: 2, right: 1.5 });
    expect(mainSpanFt(s)).toBe(11);
    expect(s.lengthFt).toBe(14.5);
  });

  test("the span in words: one span, two spans, an overhang", () => {
    expect(spanWords(withMainSpan(defaultFlowState("header"), 10))).toBe(`10' 0" span`);
    const twoSpans: FlowState = {
      ...withMainSpan(defaultFlowState("floor-joist"), 12),
      supports: [
        { x: 0, type: "pin" },
        { x: 7, type: "roller" },
        { x: 12, type: "roller" },
      ],
    };
    expect(spanWords(twoSpans)).toBe(`spans 7' 0" + 5' 0"`);
    expect(spanWords(withOverhang(withMainSpan(defaultFlowState("deck-joist"), 11), "right", 1.5))).toBe(`11' 0" span with 1' 6" overhang`);
  });

  test("point loads stay on the member when it gets shorter", () => {
    const s: FlowState = { ...withMainSpan(defaultFlowState("beam"), 14), pointLoads: [{ id: "p1", label: "Post", x: 12, P: 2000, case: "D" }] };
    const shorter = withMainSpan(s, 8);
    expect(shorter.pointLoads[0].x).toBeLessThanOrEqual(8);
  });
});

describe("URL and local storage", () => {
  test("a state survives the address bar, labels with any characters included", () => {
    const s: FlowState = { ...defaultFlowState("beam"), pointLoads: [{ id: "p1", label: "Post — 6×6 “north”", x: 3.5, P: 4200, case: "L" }] };
    const encoded = encodeFlowState(s);
    expect(encoded).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(decodeFlowState(encoded)).toEqual(s);
  });

  test.each([
    ["garbled", "%%%"],
    ["not JSON", encodeFlowState(defaultFlowState("beam")).slice(0, 20)],
    ["empty", ""],
  ])("a %s state is ignored", (_name, text) => {
    expect(decodeFlowState(text)).toBeNull();
  });

  test("a state that breaks the schema is refused with the field named", () => {
    const bad = { ...defaultFlowState("beam"), lengthFt: 250 };
    expect(parseFlowState(bad)).toBeNull();
    expect(flowStateIssues(bad)).toContainEqual({ path: "lengthFt", message: "must be 200 ft or less" });
  });

  test("where the flow starts: URL first, then ?kind= (resuming the same kind), then storage, then step 1", () => {
    const header = withMainSpan(defaultFlowState("header"), 9);
    const stored = storeLocation({ state: header, step: "loads" });
    expect(resolveFlowStart({ s: encodeFlowState(defaultFlowState("rafter")), step: "material" }, stored)).toMatchObject({
      from: "url",
      location: { step: "material", state: { kind: "rafter" } },
    });
    expect(resolveFlowStart({ kind: "header" }, stored)).toMatchObject({ from: "storage", location: { step: "loads", state: { lengthFt: 9 } } });
    expect(resolveFlowStart({ kind: "floor-joist" }, stored)).toMatchObject({ from: "kind", location: { step: "span", state: { kind: "floor-joist" } } });
    expect(resolveFlowStart({}, stored)).toMatchObject({ from: "storage" });
    expect(resolveFlowStart({}, null)).toMatchObject({ from: "new", location: { step: "kind" } });
    expect(readStoredLocation("{not json")).toBeNull();
  });
});

describe("the design request", () => {
  test.each([
    [{ family: "any" }, { material: "any" }],
    [{ family: "sawn" }, { material: "sawn", species: "Hem-Fir", grade: "No.1", plies: [1] }],
    [
      { family: "built-up", plies: 0 },
      { material: "sawn", species: "Hem-Fir", grade: "No.1", plies: [2, 3, 4] },
    ],
    [
      { family: "built-up", plies: 3 },
      { material: "sawn", species: "Hem-Fir", grade: "No.1", plies: [3] },
    ],
    [{ family: "engineered", product: "" }, { material: "engineered" }],
    [{ family: "steel" }, { material: "steel", grade: "A992" }],
  ] as const)("material %j → family %j", (m, family) => {
    expect(
      sizeFamily({ family: m.family, species: "Hem-Fir", grade: "No.1", plies: "plies" in m ? m.plies : 1, product: "product" in m ? m.product : "" }),
    ).toEqual(family);
  });
});
