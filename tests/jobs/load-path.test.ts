import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import type { FlowState } from "@/lib/flow/state";
import { scheduleRow } from "@/lib/crew/schedule";
import { designSpecOf } from "@/lib/flow/summary";
import { checkOrder, cycleIssue, workOutJob, type PathMember } from "@/lib/jobs/load-path";
import { woodDensity } from "@/lib/solver/nds/nds-2018";
import { STARTER_TABLES, findSawnSize, findSawnValues } from "@/lib/tables";

/**
 * An invented deck worked out as one job and checked by hand (the Wrenfield Road deck):
 *
 *   J1 deck joists: 12 ft simple span at 16 in, 40 psf live (IRC 2021 Table R301.5, decks) + 10 psf dead,
 *      bearing on the ledger at 0 and on B1 at 12 ft, all along B1 (0 to 24 ft).
 *   B1 deck beam: 24 ft, three 8 ft spans on posts at 0, 8, 16 and 24 ft, carrying only J1.
 *   P1: a 6x6 No.2 Douglas Fir-Larch post, 8 ft tall, wet, under each support of B1.
 *   F1: a round footing under each post, 10 in thick, on 1,500 psf soil (IRC 2021 Table R401.4.1, clay), frost 36 in.
 *
 * Own weights of the joists and the beam are left out (selfWeight off) so every number is a hand figure;
 * the posts' own weight is counted onto the footings (NDS Supplement 2018 §3.1.3 density, G = 0.50 at 19 %).
 */
const J1_STATE: FlowState = {
  ...defaultFlowState("deck-joist"),
  areaLoads: [
    { id: "l", preset: "deck", label: "Deck", case: "L", psf: 40 },
    { id: "d", preset: "floor-dead", label: "Dead", case: "D", psf: 10 },
  ],
  selfWeight: false,
};
const B1_STATE: FlowState = {
  ...defaultFlowState("deck-beam"),
  lengthFt: 24,
  supports: [
    { x: 0, type: "pin" },
    { x: 8, type: "roller" },
    { x: 16, type: "roller" },
    { x: 24, type: "roller" },
  ],
  // typed tributary loads are ignored once joists bear on the beam (they would count the deck twice)
  width: { mode: "tributary", tributaryFt: 6 },
  selfWeight: false,
};

function deck(): PathMember[] {
  return [
    {
      id: "j1",
      label: "J1",
      kind: "deck-joist",
      flowState: J1_STATE,
      chosenMember: null,
      carriedByMemberId: "b1",
      bearing: { supports: [1], fromFt: 0, toFt: 24 },
      supportDesign: null,
      resultSummary: null,
    },
    {
      id: "b1",
      label: "B1",
      kind: "deck-beam",
      flowState: B1_STATE,
      chosenMember: null,
      carriedByMemberId: "p1",
      bearing: null,
      supportDesign: null,
      resultSummary: null,
    },
    {
      id: "p1",
      label: "P1",
      kind: "post",
      flowState: null,
      chosenMember: null,
      carriedByMemberId: "f1",
      bearing: null,
      supportDesign: { type: "post", size: "6x6", plies: 1, species: "Douglas Fir-Larch", grade: "No.2", heightFt: 8, wet: true },
      resultSummary: null,
    },
    {
      id: "f1",
      label: "F1",
      kind: "footing",
      flowState: null,
      chosenMember: null,
      carriedByMemberId: null,
      bearing: null,
      supportDesign: { type: "footing", shape: "round", sizeIn: null, thicknessIn: 10, soilPsf: 1500, frostDepthIn: 36, bottomDepthIn: null },
      resultSummary: null,
    },
  ];
}

/**
 * Three equal spans L with a uniform load w_i on span i (textbook three-moment equation, supports at the
 * same level, EI constant): 4m1 + m2 = (w1 + w2)L²/4, m1 + 4m2 = (w2 + w3)L²/4 (hogging moments m ≥ 0);
 * reactions from each span's statics. Uniform w on all spans gives 0.4wL, 1.1wL, 1.1wL, 0.4wL.
 */
function threeSpanReactions(w: [number, number, number], L: number): number[] {
  const a = ((w[0] + w[1]) * L * L) / 4;
  const b = ((w[1] + w[2]) * L * L) / 4;
  const m1 = (4 * a - b) / 15;
  const m2 = (4 * b - a) / 15;
  return [
    (w[0] * L) / 2 - m1 / L,
    (w[0] * L) / 2 + m1 / L + (w[1] * L) / 2 + (m1 - m2) / L,
    (w[1] * L) / 2 + (m2 - m1) / L + (w[2] * L) / 2 + m2 / L,
    (w[2] * L) / 2 - m2 / L,
  ];
}

describe("the load path of a deck, worked by hand", () => {
  const solved = workOutJob(deck(), STARTER_TABLES, () => null);
  const j1 = solved.get("j1")?.summary;
  const b1 = solved.get("b1")?.summary;
  const p1 = solved.get("p1")?.summary;
  const f1 = solved.get("f1")?.summary;

  // J1: w = 40 psf × 16/12 ft = 53.33 plf live, 13.33 plf dead; each end R = wL/2 (simple span)
  const spacingFt = 16 / 12;
  const jL = (40 * spacingFt * 12) / 2; // 320 lb
  const jD = (10 * spacingFt * 12) / 2; // 80 lb
  // on B1: R / spacing = 240 plf live, 60 plf dead (= psf × 12 ft / 2, the deck's half span)
  const wL = jL / spacingFt;
  const wD = jD / spacingFt;

  test("the joists' reactions by case (statics, simple span, tolerance 1 lb: the solver rounds to the pound)", () => {
    expect(j1?.reactions[1].byCase?.L).toBeCloseTo(jL, 0);
    expect(j1?.reactions[1].byCase?.D).toBeCloseTo(jD, 0);
  });

  test("the beam carries them as line loads by case, 0 to 24 ft, and says where they come from", () => {
    expect(b1?.carried).toHaveLength(1);
    const c = b1?.carried?.[0];
    expect(c?.words).toBe(`from J1 deck joists @ 16 in, 0' 0" to 24' 0"`);
    expect(c?.byCase.L).toBeCloseTo(wL, 1);
    expect(c?.byCase.D).toBeCloseTo(wD, 1);
    expect(c?.type).toBe("udl");
  });

  test("the beam's reactions: dead 0.4wL / 1.1wL, live at its largest with span-by-span placement (ASCE 7-16 §4.3.3), three-moment equation", () => {
    const dead = threeSpanReactions([wD, wD, wD], 8);
    expect(dead[0]).toBeCloseTo(0.4 * wD * 8, 9);
    expect(dead[1]).toBeCloseTo(1.1 * wD * 8, 9);
    // every placement of live load on the three spans; the largest reaction at each support
    const liveMax = [0, 0, 0, 0];
    for (let mask = 1; mask < 8; mask++) {
      const w: [number, number, number] = [mask & 1 ? wL : 0, mask & 2 ? wL : 0, mask & 4 ? wL : 0];
      threeSpanReactions(w, 8).forEach((r, i) => (liveMax[i] = Math.max(liveMax[i], r)));
    }
    // textbook coefficients for three equal spans: end 0.45wL (spans 1 and 3 loaded), interior 1.2wL (spans 1 and 2)
    expect(liveMax[0]).toBeCloseTo(0.45 * wL * 8, 6);
    expect(liveMax[1]).toBeCloseTo(1.2 * wL * 8, 6);
    b1?.reactions.forEach((r, i) => {
      expect(r.byCase?.D).toBeCloseTo(dead[i], -0.5); // within 1 lb (rounded to the pound)
      expect(r.byCase?.L).toBeCloseTo(liveMax[i], -0.5);
    });
  });

  test("each post's Cp and its ratio (NDS 2018 §3.7.1, Eq. 3.7-1; Table 4D values, CM wet 0.91 on Fc, 1.0 on Emin)", () => {
    const v = findSawnValues(STARTER_TABLES, "Douglas Fir-Larch", "No.2", "beams-stringers");
    const leOverD = (8 * 12) / 5.5;
    const FcStar = v.Fc * 1.0 * 0.91; // CD 1.0 (D+L), CF 1.0, CM 0.91, not incised (timbers)
    const FcE = (0.822 * v.Emin * 1.0) / leOverD ** 2;
    const a = FcE / FcStar;
    const Cp = (1 + a) / 1.6 - Math.sqrt(((1 + a) / 1.6) ** 2 - a / 0.8);
    expect(p1?.facts?.[0]).toContain(`Cp ${Cp.toFixed(3)}`);
    // the interior post carries D 1.1wD·8 + L 1.2wL·8
    const P = 1.1 * wD * 8 + 1.2 * wL * 8;
    const stability = p1?.checks.find((c) => c.name === "stability");
    expect(stability?.ratio).toBeCloseTo(P / 30.25 / (FcStar * Cp), 2);
    // the beam's bearing on the post's top (NDS 2018 §3.10.2): B1's width (plies × the dressed thickness) across 5.5 in, Fc⊥ × CM 0.67 (wet)
    const b1Spec = b1?.spec;
    const widthIn = b1Spec?.material === "sawn" ? b1Spec.plies * findSawnSize(STARTER_TABLES, b1Spec.size).b : 0;
    const fcPerp = findSawnValues(STARTER_TABLES, "Southern Pine", "No.2", "dimension", 10).FcPerp * 0.67;
    const onTop = p1?.checks.filter((c) => c.name === "bearing").map((c) => c.ratio) ?? [];
    expect(Math.max(...onTop)).toBeCloseTo(P / (Math.min(widthIn, 5.5) * 5.5) / fcPerp, 2);
    expect(p1?.pass).toBe(true);
    expect(p1?.reactions).toHaveLength(4);
  });

  test("each footing's area: (P + own weight)/q, IRC 2021 R401.4.1 1,500 psf; 150 pcf concrete (common practice)", () => {
    const v = findSawnValues(STARTER_TABLES, "Douglas Fir-Larch", "No.2", "beams-stringers");
    const postWeight = (woodDensity(v.G, 19) * 30.25 * 8) / 144;
    const P = Math.round(1.1 * wD * 8) + Math.round(postWeight) + Math.round(1.2 * wL * 8);
    const need = P / (1500 - (10 / 12) * 150);
    let d = 12;
    while ((Math.PI * d * d) / 4 / 144 < need) d += 1;
    expect(f1?.memberLabel).toContain(`${d} in round × 10 in thick, bottom 36 in below grade`);
    expect(f1?.checks).toHaveLength(4);
    expect(f1?.pass).toBe(true);
  });

  test("a footing's answer names concrete, not lumber: its own spec, no design spec; the crew schedule reads it", () => {
    expect(f1?.spec).toEqual({ material: "footing", shape: "round", sizeIn: expect.any(Number), thicknessIn: 10, bottomDepthIn: 36 });
    expect(designSpecOf(f1)).toBeNull();
    // a footing saved before it had its own type (a sawn spec of size "footing") reads the same
    expect(designSpecOf({ spec: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "footing", plies: 1 } })).toBeNull();
    // the post keeps its real lumber
    expect(designSpecOf(p1)).toEqual({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "6x6", plies: 1 });
    const row = scheduleRow({ id: "f1", label: "F1", kind: "footing", resultSummary: f1 ?? null });
    expect(row.headline).toMatch(/round × 10 in thick/);
    expect(row.verdict?.pass).toBe(true);
  });

  test("the members are worked out top down, joists first", () => {
    expect(checkOrder(deck())).toEqual(["j1", "b1", "p1", "f1"]);
  });
});

describe("no cycles on the load path", () => {
  const members = deck();
  test.each([
    ["a member on itself", "b1", "b1", "a member cannot carry itself"],
    ["the beam on the joists that bear on it", "b1", "j1", "loads would go round in a circle"],
    ["the footing on the joists (three links round)", "f1", "j1", "loads would go round in a circle"],
  ])("%s is refused", (_what, member, carrier, message) => {
    expect(cycleIssue(members, member, carrier)).toContain(message);
  });
  test("a new carrier below is allowed", () => {
    expect(cycleIssue(members, "j1", "p1")).toBeNull();
  });
});

describe("a change flows down and is flagged", () => {
  test("longer joists load the beam more; the beam, posts and footings are worked out again and say so", () => {
    const first = workOutJob(deck(), STARTER_TABLES, () => null);
    const saved = deck().map((m) => ({ ...m, resultSummary: first.get(m.id)?.summary ?? null, chosenMember: first.get(m.id)?.chosen ?? null }));
    const longer = saved.map((m) =>
      m.id === "j1"
        ? {
            ...m,
            flowState: {
              ...J1_STATE,
              lengthFt: 16,
              supports: [
                { x: 0, type: "pin" as const },
                { x: 16, type: "roller" as const },
              ],
            },
          }
        : m,
    );
    const again = workOutJob(longer, STARTER_TABLES, (m) => (m.id === "j1" ? null : "J1 deck joists changed"));
    const b1Before = first.get("b1")?.summary;
    const b1After = again.get("b1")?.summary;
    // 16 ft joists: the deck's half span grows from 6 to 8 ft, so B1's line load by 8/6
    expect(b1After?.carried?.[0].byCase.L).toBeCloseTo((40 * 16) / 2, 0); // 1 lb: reactions are rounded to the pound
    expect(b1After?.reactions[1].byCase?.L).toBeGreaterThan(b1Before?.reactions[1].byCase?.L ?? Infinity);
    const f1After = again.get("f1")?.summary;
    expect(f1After?.memberLabel).not.toBe(first.get("f1")?.summary?.memberLabel);
    expect(f1After?.change?.was).toBe(first.get("f1")?.summary?.headline);
    expect(f1After?.change?.reason).toBe("J1 deck joists changed");
    expect(again.get("j1")?.summary?.change ?? null).toBeNull();
  });

  test("a chosen member that no longer passes and nothing in its family passes shows as failing with the reason", () => {
    const members = deck().map((m) =>
      m.id === "p1"
        ? {
            ...m,
            supportDesign: {
              type: "post" as const,
              size: "4x4" as const,
              plies: 1,
              species: "Hem-Fir" as const,
              grade: "No.2" as const,
              heightFt: 14,
              wet: true,
            },
          }
        : m,
    );
    const solved = workOutJob(members, STARTER_TABLES, () => null);
    const p = solved.get("p1")?.summary;
    expect(p?.pass).toBe(false);
    expect(p?.headline).toMatch(/Over \d+%/);
    expect(p?.problems?.length).toBeGreaterThan(0);
  });
});
