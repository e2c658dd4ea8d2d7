import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { checkRequest, designBase, limitsFor, sizeRequest } from "@/lib/flow/request";
import { parseFlowState } from "@/lib/flow/schema";
import { spanFromRoughOpeningFt, withMainSpan, type FlowState } from "@/lib/flow/state";
import { answerFacts } from "@/lib/flow/summary";
import { checkMember, sizeMember } from "@/lib/solver/design";
import { sizeInputSchema } from "@/lib/solver/design/schema";
import { STARTER_TABLES } from "@/lib/tables";

// The flow's state as the design input: the load basis, the kind, the wall and the incised question.
describe("what the flow sends", () => {
  test("the older map by default, named on the request; the kind goes with it", () => {
    const base = designBase(defaultFlowState("rafter"));
    expect(base.loadStandard).toBe("ASCE 7-16");
    expect(base.kind).toBe("rafter");
    expect(sizeInputSchema.safeParse(sizeRequest(defaultFlowState("rafter"))).success).toBe(true);
  });

  test("a state saved before the basis was asked (no loadStandard) parses and reads as the default", () => {
    const { loadStandard: _ls, incised: _inc, ...older } = defaultFlowState("header");
    void _ls;
    void _inc;
    const parsed = parseFlowState(older);
    expect(parsed).not.toBeNull();
    expect(designBase(parsed as FlowState).loadStandard).toBe("ASCE 7-16");
  });

  test("incised is left to the engine until the builder answers; then it is sent as said", () => {
    const deck = defaultFlowState("deck-joist");
    expect(designBase(deck).conditions.incised).toBeUndefined();
    expect(designBase({ ...deck, incised: false }).conditions.incised).toBe(false);
    expect(designBase({ ...deck, incised: true }).conditions.incised).toBe(true);
  });

  test("joists say whether they share the load; beams and headers leave Cr to the engine's plies rule", () => {
    expect(designBase(defaultFlowState("floor-joist")).conditions.repetitive).toBe(true);
    expect(designBase(defaultFlowState("beam")).conditions.repetitive).toBeUndefined();
  });

  test("a header goes in a 2x4 wall by default; a header by its rough opening sends the opening", () => {
    const h = defaultFlowState("header");
    expect(designBase(h).wallFraming).toBe("2x4");
    const ro = 5;
    const byOpening: FlowState = { ...withMainSpan(h, spanFromRoughOpeningFt(ro, h.bearingIn)), roughOpeningFt: ro };
    const base = designBase(byOpening);
    expect(base.roughOpeningFt).toBe(5);
    expect(base.length).toBeUndefined();
    const r = sizeMember(sizeRequest(byOpening), STARTER_TABLES);
    expect(r.roughOpening?.spanFt).toBeCloseTo(5.25, 12);
    expect(r.passing.every((p) => p.assembly.fits === true)).toBe(true);
  });

  test("the answer's facts name the basis, the assembly and the lumber, as the crew link and sheet print them", () => {
    const h = defaultFlowState("header");
    const size = sizeMember(sizeRequest(h), STARTER_TABLES);
    const built = size.passing.find((p) => p.member.material === "sawn" && p.assembly.plies === 2);
    if (!built) throw new Error("expected a 2-ply sawn header to pass");
    const check = checkMember(checkRequest(h, built.member), STARTER_TABLES);
    const facts = answerFacts(check);
    expect(facts[0]).toBe("Snow basis: ASCE 7-16, ground snow from the map in the 2021 code or older, counted in full (D + S)");
    expect(facts).toContain(`Assemble: ${built.assembly.words}, fills a 2x4 wall`);
    expect(built.assembly.words).toMatch(/with 1\/2 in spacer$/);
    const deck = defaultFlowState("deck-joist");
    const hf: FlowState = { ...deck, material: { ...deck.material, species: "Hem-Fir" } };
    const deckSize = sizeMember(sizeRequest(hf), STARTER_TABLES);
    const deckCheck = checkMember(checkRequest(hf, deckSize.passing[0].member), STARTER_TABLES);
    expect(answerFacts(deckCheck).some((f) => /^Lumber: treated Hem-Fir assumed incised/.test(f))).toBe(true);
  });

  test("deflection limits go as the preset they match, so the answer cites IRC 2021 Table R301.7 and IBC 2021 Table 1604.3", () => {
    expect(limitsFor(defaultFlowState("floor-joist"))).toEqual({ preset: "floor" });
    expect(limitsFor(defaultFlowState("rafter"))).toEqual({ preset: "ceiling-flexible" });
    expect(limitsFor({ ...defaultFlowState("beam"), limits: { live: 300, total: 200 } })).toEqual({ live: 300, total: 200 });
    const j = defaultFlowState("floor-joist");
    const size = sizeMember(sizeRequest(j), STARTER_TABLES);
    const check = checkMember(checkRequest(j, size.passing[0].member), STARTER_TABLES);
    expect(check.limits.source).toMatch(/IRC 2021 Table R301\.7.*IBC 2021 Table 1604\.3.*footnote d not applied/);
  });
});
