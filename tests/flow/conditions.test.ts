import { describe, expect, test } from "vitest";
import { POST } from "@/app/api/size/route";
import { conditionQuestions, wetInEffect } from "@/lib/flow/conditions";
import { defaultFlowState } from "@/lib/flow/defaults";
import { checkRequest, designBase, sizeRequest } from "@/lib/flow/request";
import type { FlowState, MaterialFamily } from "@/lib/flow/state";
import { checkMember, DesignInputError, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";
import { getCurrentTables } from "@/lib/tables/current";

// Wet service (CM), incising (Ci) and repetitive members (Cr) are wood's adjustment factors, NDS 2018
// §4.3.3, §4.3.8, §4.3.9; AISC 360-16 and AISI S100-16 have no moisture or repetitive-member factor.
const withFamily = (state: FlowState, family: MaterialFamily): FlowState => ({ ...state, material: { ...state.material, family, plies: 0, product: "" } });
/** Every wood-only answer set the "wrong" way, as a state keeps it after the builder switches to steel. */
const soaked = (state: FlowState): FlowState => ({ ...state, wet: true, repetitive: true, incised: true });

const post = (body: unknown) =>
  POST(new Request("http://localhost/api/size", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) }), {
    params: Promise.resolve({}),
  });

describe("only the questions that apply to the material", () => {
  test.each([
    ["sawn joists", "floor-joist", "sawn", { wet: "all", repetitive: "all", incised: "all" }],
    ["built-up deck beam", "deck-beam", "built-up", { wet: "all", repetitive: "no", incised: "all" }],
    ["engineered joists", "floor-joist", "engineered", { wet: "all", repetitive: "no", incised: "no" }],
    ["I-joists (dry service only)", "floor-joist", "ijoist", { wet: "no", repetitive: "no", incised: "no" }],
    ["W-shape header", "header", "steel", { wet: "no", repetitive: "no", incised: "no" }],
    ["cold-formed joists", "floor-joist", "cfs", { wet: "no", repetitive: "no", incised: "no" }],
    ["any material, joists: wood's questions, named as wood's", "floor-joist", "any", { wet: "wood", repetitive: "wood", incised: "wood" }],
  ] as const)("%s", (_label, kind, family, expected) => {
    expect(conditionQuestions(soaked(withFamily(defaultFlowState(kind), family)))).toEqual(expected);
  });

  test("a header (no joist spacing) is never asked whether joists share the load; untreated lumber is not asked about slits", () => {
    const h = withFamily(defaultFlowState("header"), "sawn");
    expect(conditionQuestions(h)).toEqual({ wet: "all", repetitive: "no", incised: "no" });
  });

  test("steel and cold-formed requests carry none of wood's answers, whatever the state kept", () => {
    for (const family of ["steel", "cfs"] as const) {
      for (const kind of ["header", "floor-joist", "deck-joist"] as const) {
        const c = designBase(soaked(withFamily(defaultFlowState(kind), family))).conditions;
        expect(c?.wet, `${family} ${kind}`).toBeUndefined();
        expect(c?.repetitive, `${family} ${kind}`).toBeUndefined();
        expect(c?.incised, `${family} ${kind}`).toBeUndefined();
        expect(wetInEffect(soaked(withFamily(defaultFlowState(kind), family)))).toBe(false);
      }
    }
    // wood still sends them as said
    const wood = designBase(soaked(defaultFlowState("deck-joist"))).conditions;
    expect(wood).toMatchObject({ wet: true, repetitive: true, incised: true });
  });

  test("a wet I-joist state no longer empties the search: I-joists are sized dry, as APA PRI-400 allows only", () => {
    const j = soaked(withFamily(defaultFlowState("floor-joist"), "ijoist"));
    const r = sizeMember(sizeRequest(j), STARTER_TABLES);
    expect(r.passing.length).toBeGreaterThan(0);
    expect(r.passing.every((p) => p.member.material === "ijoist")).toBe(true);
    // nor do sawn lumber's incised and Cr words ride along with an I-joist search
    expect(r.assumptions.some((a) => /incised|Cr = /.test(a))).toBe(false);
  });
});

describe("the server takes wood's conditions on steel and ignores them the same way", () => {
  test("a W-shape beam sized with wet, repetitive and incised given is the same answer as without them", () => {
    const h = withFamily(defaultFlowState("beam"), "steel");
    const clean = sizeRequest(h);
    const stuffed = { ...clean, conditions: { ...clean.conditions, wet: true, repetitive: true, incised: true } };
    const a = sizeMember(clean, STARTER_TABLES);
    const b = sizeMember(stuffed, STARTER_TABLES);
    expect(a.passing.length).toBeGreaterThan(0);
    expect(b.passing.map((p) => [p.member, p.ratio])).toEqual(a.passing.map((p) => [p.member, p.ratio]));
    expect(b.assumptions).toEqual(a.assumptions);
    const ca = checkMember(checkRequest(h, a.passing[0].member), STARTER_TABLES);
    const cb = checkMember({ ...checkRequest(h, a.passing[0].member), conditions: stuffed.conditions }, STARTER_TABLES);
    expect(cb.checks).toEqual(ca.checks);
  });

  test("the phone (sizeMember offline) and POST /api/size give the same steel answer from a state with wet set", async () => {
    const state = soaked(withFamily(defaultFlowState("header"), "cfs"));
    const body = sizeRequest(state);
    const res = await post(body);
    expect(res.status).toBe(200);
    const online = (await res.json()) as ReturnType<typeof sizeMember>;
    const offline = sizeMember(body, await getCurrentTables());
    expect(online.passing.map((p) => [p.member, p.ratio, p.check?.answer])).toEqual(offline.passing.map((p) => [p.member, p.ratio, p.check?.answer]));
    expect(online.assumptions).toEqual(offline.assumptions);
  });

  test("bad input is still a 400 naming the field", async () => {
    const body = sizeRequest(withFamily(defaultFlowState("header"), "steel"));
    const res = await post({ ...body, conditions: { ...body.conditions, wet: "yes" } });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { issues: { path: string }[] }).issues.map((i) => i.path)).toContain("conditions.wet");
    // a wet I-joist checked directly is refused with the field named, not silently passed
    const j = defaultFlowState("floor-joist");
    expect(() =>
      checkMember({ ...checkRequest(j, { material: "ijoist", joist: "PRI-40 11-7/8", stiffeners: false }), conditions: { wet: true } }, STARTER_TABLES),
    ).toThrow(DesignInputError);
  });
});
