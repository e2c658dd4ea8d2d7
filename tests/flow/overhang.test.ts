import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { sizeRequest, checkRequest } from "@/lib/flow/request";
import { flowStateIssues, flowStateSchema } from "@/lib/flow/schema";
import {
  addOverhang,
  DEFAULT_OVERHANG_FT,
  MAX_LENGTH_FT,
  MEMBER_KINDS,
  mainSpanFt,
  maxOverhangFt,
  moveSupport,
  overhangs,
  removeOverhang,
  sortedSupports,
  spansFt,
  SUPPORT_GAP_FT,
  supportRange,
  withMainSpan,
  type FlowState,
  type MemberEnd,
} from "@/lib/flow/state";
import { spanWords } from "@/lib/flow/summary";
import { analyzeBeam } from "@/lib/solver/beam";
import { checkMember, sizeInputSchema, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

const SIXTEENTH_FT = 1 / 192;

/** The state is one the flow stores and the design route takes, with every span longer than zero. */
function expectValid(state: FlowState): void {
  expect(flowStateIssues(state)).toEqual([]);
  const request = sizeInputSchema.safeParse(sizeRequest(state));
  expect(request.success ? [] : request.error.issues).toEqual([]);
  for (const span of spansFt(state)) expect(span).toBeGreaterThan(0);
}

const deckJoist = (): FlowState => defaultFlowState("deck-joist");

describe("adding an overhang by a tap", () => {
  test("right end: the member grows by 2 ft past the far support, the supports stay put", () => {
    const before = deckJoist();
    const s = addOverhang(before, "right");
    expect(DEFAULT_OVERHANG_FT).toBe(2);
    expect(s.lengthFt).toBe(before.lengthFt + 2);
    expect(s.supports).toEqual(before.supports);
    expect(overhangs(s)).toEqual({ left: 0, right: 2 });
    expect(mainSpanFt(s)).toBe(12);
    expectValid(s);
  });

  test(`the answer's span words name it: 12' 0" span with 2' 0" overhang`, () => {
    expect(spanWords(addOverhang(deckJoist(), "right"))).toBe(`12' 0" span with 2' 0" overhang`);
    expect(spanWords(addOverhang(deckJoist(), "left"))).toBe(`12' 0" span with 2' 0" overhang`);
    expect(spanWords(addOverhang(addOverhang(deckJoist(), "left"), "right"))).toBe(`12' 0" span with 2' 0" overhang each end`);
    expect(spanWords(addOverhang(addOverhang(deckJoist(), "left", 1.5), "right"))).toBe(`12' 0" span with overhangs 1' 6" left, 2' 0" right`);
    expect(spanWords(deckJoist())).toBe(`12' 0" span`);
  });

  test("left end: every support and load moves right by the overhang, measured from the new left end", () => {
    const before: FlowState = {
      ...deckJoist(),
      pointLoads: [{ id: "p1", label: "Planter", x: 6, P: 400, case: "D" }],
      lineLoads: [
        { id: "l1", label: "Bench", from: 3, to: 5, w: 60, case: "L" },
        { id: "l2", label: "Rail", from: 0, to: 12, w: 15, case: "D" },
      ],
    };
    const s = addOverhang(before, "left", 2);
    expect(s.lengthFt).toBe(14);
    expect(s.supports.map((x) => x.x)).toEqual([2, 14]);
    expect(s.pointLoads[0].x).toBe(8);
    expect(s.lineLoads[0]).toMatchObject({ from: 5, to: 7 });
    // a load over the whole member stays over the whole member
    expect(s.lineLoads[1]).toMatchObject({ from: 0, to: 14 });
    expectValid(s);
  });

  test("a typed length is kept to the nearest 1/16 in, and an overhang already there takes the new length", () => {
    const s = addOverhang(deckJoist(), "right", 1 + 7.03 / 12);
    expect(overhangs(s).right * 192).toBeCloseTo(Math.round((1 + 7.03 / 12) * 192), 9);
    const again = addOverhang(s, "right", 3);
    expect(overhangs(again).right).toBe(3);
    expect(again.lengthFt).toBe(15);
  });

  test.each([0, -2, Number.NaN, Number.POSITIVE_INFINITY])("a length of %s changes nothing", (length) => {
    const before = deckJoist();
    expect(addOverhang(before, "right", length)).toEqual(before);
  });

  test(`the member never passes ${MAX_LENGTH_FT} ft (the schema's limit)`, () => {
    const long = withMainSpan(deckJoist(), 199);
    expect(maxOverhangFt(long, "right")).toBeCloseTo(1, 12);
    const s = addOverhang(long, "right", 2);
    expect(s.lengthFt).toBeCloseTo(MAX_LENGTH_FT, 12);
    expectValid(s);
  });
});

describe("removing an overhang", () => {
  test.each<MemberEnd>(["left", "right"])("%s: adding then removing gives the member back", (end) => {
    const before: FlowState = { ...deckJoist(), pointLoads: [{ id: "p1", label: "Grill", x: 5, P: 250, case: "L" }] };
    const back = removeOverhang(addOverhang(before, end), end);
    expect(back.lengthFt).toBeCloseTo(before.lengthFt, 12);
    expect(back.supports.map((s) => s.x)).toEqual(before.supports.map((s) => s.x));
    expect(back.pointLoads[0].x).toBeCloseTo(5, 12);
  });

  test("a line load only on the overhang goes; a post at the tip moves to the new end", () => {
    const hung = addOverhang(deckJoist(), "right", 2);
    const loaded: FlowState = {
      ...hung,
      pointLoads: [{ id: "p1", label: "Post at the tip", x: 14, P: 300, case: "D" }],
      lineLoads: [{ id: "l1", label: "Planter box", from: 12.5, to: 14, w: 80, case: "D" }],
    };
    expectValid(loaded);
    const s = removeOverhang(loaded, "right");
    expect(s.lengthFt).toBe(12);
    expect(s.lineLoads).toEqual([]);
    expect(s.pointLoads[0].x).toBe(12);
    expectValid(s);
  });

  test("the deck beam's starting overhangs (1 ft past each post) can be removed", () => {
    const s = removeOverhang(removeOverhang(defaultFlowState("deck-beam"), "left"), "right");
    expect(overhangs(s)).toEqual({ left: 0, right: 0 });
    expect(s.supports.map((x) => x.x)).toEqual([0, 8]);
    expectValid(s);
  });
});

describe("moving a support", () => {
  test("it snaps to 1/16 in and stays on the member; the member keeps its length", () => {
    const s = deckJoist();
    const moved = moveSupport(s, 1, 10 + 3.01 / 12);
    expect(moved.lengthFt).toBe(s.lengthFt);
    expect(moved.supports[1].x * 192).toBeCloseTo(Math.round((10 + 3.01 / 12) * 192), 9);
    expect(moveSupport(s, 1, 40).supports[1].x).toBe(12);
    expect(moveSupport(s, 0, -3).supports[0].x).toBe(0);
  });

  test("moving the end support inward makes an overhang of the same member", () => {
    const s = moveSupport(deckJoist(), 1, 10);
    expect(overhangs(s)).toEqual({ left: 0, right: 2 });
    expect(spanWords(s)).toBe(`10' 0" span with 2' 0" overhang`);
    expectValid(s);
  });

  test("it cannot pass or touch its neighbor: it stops 1 in short", () => {
    const three: FlowState = {
      ...deckJoist(),
      supports: [
        { x: 0, type: "pin" },
        { x: 6, type: "roller" },
        { x: 12, type: "roller" },
      ],
    };
    expect(supportRange(three, 1)).toEqual({ min: SUPPORT_GAP_FT, max: 12 - SUPPORT_GAP_FT });
    expect(moveSupport(three, 1, 20).supports[1].x).toBeCloseTo(12 - 1 / 12, 12);
    expect(moveSupport(three, 1, 0).supports[1].x).toBeCloseTo(1 / 12, 12);
    expect(moveSupport(three, 0, 9).supports[0].x).toBeCloseTo(6 - 1 / 12, 12);
    expectValid(moveSupport(three, 1, 20));
  });

  test("an unknown support or a position that is not a number changes nothing", () => {
    const s = deckJoist();
    expect(moveSupport(s, 5, 3)).toEqual(s);
    expect(moveSupport(s, 0, Number.NaN)).toEqual(s);
  });
});

describe("the state stays valid whatever is tapped", () => {
  // a small deterministic generator (mulberry32), so a failure reproduces
  function random(seed: number): () => number {
    let a = seed;
    return () => {
      a = (a + 0x6d2b79f5) | 0;
      let t = Math.imul(a ^ (a >>> 15), 1 | a);
      t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
      return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
    };
  }

  test.each(MEMBER_KINDS.map((k, i) => [k, i + 1]))("%s: 300 random adds, removes and moves (seed %i)", (kind, seed) => {
    const next = random(seed);
    let s: FlowState = {
      ...defaultFlowState(kind),
      pointLoads: [{ id: "p1", label: "Post", x: 3, P: 500, case: "D" }],
      lineLoads: [...defaultFlowState(kind).lineLoads, { id: "l9", label: "Partial", from: 1, to: 2.5, w: 40, case: "L" }],
    };
    for (let step = 0; step < 300; step++) {
      const end: MemberEnd = next() < 0.5 ? "left" : "right";
      const pick = next();
      if (pick < 0.3) s = addOverhang(s, end, next() * 6);
      else if (pick < 0.5) s = removeOverhang(s, end);
      else if (pick < 0.9) s = moveSupport(s, Math.floor(next() * s.supports.length), (next() * 1.4 - 0.2) * s.lengthFt);
      else s = withMainSpan(s, 4 + next() * 16);
      const parsed = flowStateSchema.safeParse(s);
      if (!parsed.success) throw new Error(`step ${step}: ${parsed.error.issues.map((i) => `${i.path.join(".")} ${i.message}`).join("; ")}`);
      const xs = sortedSupports(s.supports).map((x) => x.x);
      for (let i = 1; i < xs.length; i++) expect(xs[i] - xs[i - 1]).toBeGreaterThanOrEqual(SUPPORT_GAP_FT - SIXTEENTH_FT);
    }
    expectValid(s);
  });
});

describe("the answer for a deck joist with a tapped overhang", () => {
  const state = addOverhang(deckJoist(), "right");
  const size = sizeMember(sizeRequest(state), STARTER_TABLES);
  const best = size.passing[0];
  const check = checkMember(checkRequest(state, best.member), STARTER_TABLES);
  // the beam the answer's diagrams were drawn from, as the check carries it
  const d = check.diagrams!;
  const beam = { length: d.lengthFt, E: d.EPsi, I: d.IIn4, supports: d.supports, loads: d.loads };
  const l = 12;
  const a = 2;
  // every load on a deck joist at its spacing is uniform over the whole member; D + L is the service total
  const w = beam.loads.reduce((sum, load) => (load.type === "udl" && (load.case === "D" || load.case === "L") ? sum + load.w : sum), 0);
  const analysis = analyzeBeam(beam, { D: 1, L: 1 });

  test("a member works, and the check reaches the overhang", () => {
    expect(size.passing.length).toBeGreaterThan(0);
    expect(best.ratio).toBeLessThanOrEqual(1);
    expect(beam.length).toBe(14);
    expect(beam.supports.map((s) => s.x)).toEqual([0, 12]);
    expect(beam.loads.every((load) => load.type !== "udl" || (load.from === 0 && load.to === 14))).toBe(true);
    expect(w).toBeGreaterThan(0);
  });

  test.each([
    // AISC Steel Construction Manual 15th ed., Table 3-23 case 24 (beam overhanging one support, uniform load), from memory
    { name: "R1 (back support)", got: () => analysis.reactions[0].F, want: () => (w / (2 * l)) * (l * l - a * a) },
    { name: "R2 (support under the overhang)", got: () => analysis.reactions[1].F, want: () => (w / (2 * l)) * (l + a) ** 2 },
    { name: "M over R2 (hogging)", got: () => analysis.evaluate(l).M, want: () => (-w * a * a) / 2 },
    {
      name: "deflection at the tip, in (negative: the tip lifts as the back span sags)",
      got: () => analysis.evaluate(l + a).deflection,
      want: () => ((w * a * (4 * a * a * l - l ** 3 + 3 * a ** 3)) / (24 * beam.E * beam.I)) * 1728,
    },
  ])("$name matches the textbook formula within 1e-6 relative", ({ got, want }) => {
    const expected = want();
    expect(Math.abs(got() - expected)).toBeLessThanOrEqual(1e-6 * Math.abs(expected));
  });
});
