import Papa from "papaparse";
import { describe, expect, test } from "vitest";
import { formatFeetInches } from "@/lib/flow/length";
import type { FootingSpec } from "@/lib/flow/summary";
import { workOutJob, type Bearing, type FootingDesign, type PostDesign } from "@/lib/jobs/load-path";
import { orderCsv } from "@/lib/orders/csv";
import { jobOrderList, type JobOrderMember } from "@/lib/orders/job-order";
import { NO_ORDER_DETAILS, type OrderDetails, type OrderLine, type OrderList } from "@/lib/orders/order-list";
import { concreteToOrder, DEFAULT_SAWN_STOCK_FT, footingCubicYards, padCubicYards, stockLengthFor } from "@/lib/orders/rules";
import { costPerFoot, itemKey, STARTER_TABLES } from "@/lib/tables";
import type { MaterialTables } from "@/lib/tables/types";
import { WRENFIELD_BEAM, WRENFIELD_JOISTS } from "../support/wrenfield-deck";

// The order list of a job whose load path builds the posts and footings: an invented deck (the Wrenfield Road
// deck of tests/jobs/load-path.test.ts) worked out by the load path, then counted. The counting rules are common
// practice (a post per support, stock lengths 8–24 ft in 2 ft steps, a footing under each post, 10 % extra
// concrete); each expectation is worked out here from the inputs and the designed sizes, not pasted.

const J1_STATE = WRENFIELD_JOISTS;
const B1_STATE = WRENFIELD_BEAM;
const POST: PostDesign = { type: "post", size: "6x6", plies: 1, species: "Douglas Fir-Larch", grade: "No.2", heightFt: 8, wet: true };
const FOOTING: FootingDesign = { type: "footing", shape: "round", sizeIn: null, thicknessIn: 10, soilPsf: 1500, frostDepthIn: 36, bottomDepthIn: null };
/** what a builder types on the beam's "For the order list" (the unchecked fallback) */
const TYPED: OrderDetails = { ...NO_ORDER_DETAILS, postHeightFt: 4, postSize: "4x4", footingDiameterIn: 12, footingDepthIn: 36 };

interface DeckOptions {
  post?: PostDesign | null;
  footing?: FootingDesign | null;
  beamDetails?: OrderDetails;
  beamBearing?: Bearing | null;
}

function row(m: Partial<JobOrderMember> & Pick<JobOrderMember, "id" | "label" | "kind">): JobOrderMember {
  return {
    flowState: null,
    chosenMember: null,
    carriedByMemberId: null,
    bearing: null,
    supportDesign: null,
    resultSummary: null,
    orderDetails: NO_ORDER_DETAILS,
    ...m,
  };
}

/** The deck as the job holds it after the load path worked it out (answers saved on each member). */
function deck({ post = POST, footing = FOOTING, beamDetails = NO_ORDER_DETAILS, beamBearing = null }: DeckOptions = {}): JobOrderMember[] {
  const members: JobOrderMember[] = [
    row({
      id: "j1",
      label: "J1 deck joists",
      kind: "deck-joist",
      flowState: J1_STATE,
      carriedByMemberId: "b1",
      bearing: { supports: [1], fromFt: 0, toFt: 24 },
    }),
    row({
      id: "b1",
      label: "B1 deck beam",
      kind: "deck-beam",
      flowState: B1_STATE,
      carriedByMemberId: post ? "p1" : null,
      bearing: beamBearing,
      orderDetails: beamDetails,
    }),
  ];
  if (post) members.push(row({ id: "p1", label: "P1 deck posts", kind: "post", supportDesign: post, carriedByMemberId: footing ? "f1" : null }));
  if (post && footing) members.push(row({ id: "f1", label: "F1 footings", kind: "footing", supportDesign: footing }));
  const solved = workOutJob(members, STARTER_TABLES, () => null);
  return members.map((m) => ({ ...m, resultSummary: solved.get(m.id)?.summary ?? null, chosenMember: solved.get(m.id)?.chosen ?? null }));
}

function lines(list: OrderList): OrderLine[] {
  return list.groups.flatMap((g) => g.lines);
}

function footingSpec(members: JobOrderMember[]): FootingSpec {
  const spec = members.find((m) => m.id === "f1")?.resultSummary?.spec;
  if (spec?.material !== "footing") throw new Error("F1 was not worked out");
  return spec;
}

const concreteOf = (list: OrderList) => lines(list).find((l) => l.item === "Footing concrete");

describe("footing pad volume (cylinder or square prism, 46,656 in³ to the yd³)", () => {
  test.each([
    { shape: "round" as const, sizeIn: 18, thicknessIn: 10, in3: Math.PI * 9 * 9 * 10 },
    { shape: "round" as const, sizeIn: 24, thicknessIn: 8, in3: Math.PI * 12 * 12 * 8 },
    { shape: "square" as const, sizeIn: 24, thicknessIn: 12, in3: 24 * 24 * 12 },
  ])("$sizeIn in $shape × $thicknessIn in", ({ shape, sizeIn, thicknessIn, in3 }) => {
    expect(padCubicYards(shape, sizeIn, thicknessIn)).toBeCloseTo(in3 / 46656, 12);
  });
  test("a round pad is the footing cylinder of the typed rule", () => {
    expect(padCubicYards("round", 16, 48)).toBe(footingCubicYards(16, 48));
  });
});

describe("posts and footings built in the load path are ordered from their design", () => {
  const members = deck();
  const list = jobOrderList(members, STARTER_TABLES);
  const posts = B1_STATE.supports.length; // one post under each support of B1, one footing under each post

  test("the built members pass their checks (the premise of this block)", () => {
    expect(members.find((m) => m.id === "p1")?.resultSummary?.pass).toBe(true);
    expect(members.find((m) => m.id === "f1")?.resultSummary?.pass).toBe(true);
  });

  test("posts: the designed size, species and grade, one per support, at the stock length for their height, priced $/ft × ft × count", () => {
    const line = lines(list).find((l) => l.item === `${POST.size} post`);
    expect(line).toBeDefined();
    expect(list.groups.find((g) => g.lines.includes(line!))?.name).toBe(`${POST.species} ${POST.grade}`);
    expect(line!.quantity).toBe(posts);
    const stock = stockLengthFor(POST.heightFt, DEFAULT_SAWN_STOCK_FT);
    expect(line!.lengthFt).toBe(stock.pieceFt);
    // the starter cost table prices no 6x6: the line says "no price", as every unpriced line does
    expect(costPerFoot(STARTER_TABLES, { material: "sawn", species: POST.species, grade: POST.grade, size: POST.size })).toBeUndefined();
    expect(line!.price).toBeNull();
    // a yard's cost table with a price for it (an invented $4.85/ft): $/ft × stock length × posts
    const ref = { material: "sawn" as const, species: POST.species, grade: POST.grade, size: POST.size };
    const yard: MaterialTables = { ...STARTER_TABLES, costs: { ...STARTER_TABLES.costs, [itemKey(ref)]: 4.85 } };
    const priced = lines(jobOrderList(members, yard)).find((l) => l.item === `${POST.size} post`)!;
    expect(priced.costPerFt).toBe(costPerFoot(yard, ref));
    expect(priced.price).toBeCloseTo(costPerFoot(yard, ref)! * stock.pieceFt * posts, 2);
    expect(line!.notes.join(" ")).toMatch(/checked on the job's load path/);
    expect(line!.notes.join(" ")).not.toMatch(/not checked/);
  });

  test("each post line names the post member, the beam and every support it stands under", () => {
    const use = lines(list)
      .find((l) => l.item === `${POST.size} post`)!
      .uses.join("; ");
    expect(use).toContain(`P1 deck posts: ${posts} posts ${formatFeetInches(POST.heightFt)} tall under B1 deck beam at`);
    for (const s of B1_STATE.supports) expect(use).toContain(formatFeetInches(s.x));
  });

  test("footing concrete: each pad as designed, π (D/2)² t, one under each post, + 10 %", () => {
    const spec = footingSpec(members);
    const each = (Math.PI * (spec.sizeIn / 2) ** 2 * spec.thicknessIn) / 46656;
    const line = concreteOf(list)!;
    expect(line.quantity).toBe(concreteToOrder(posts * each));
    expect(line.uses.join(" ")).toContain(
      `F1 footings: ${posts} footings ${spec.sizeIn} in round × ${spec.thicknessIn} in thick under P1 deck posts (B1 deck beam) at`,
    );
    expect(line.notes.join(" ")).toMatch(/pads as designed/);
    expect(line.notes.join(" ")).not.toMatch(/not checked/);
    expect(line.price).toBeNull();
  });

  test("nothing built is listed as not counted", () => {
    expect(list.missing.filter((m) => /P1|F1/.test(m))).toEqual([]);
  });

  test("the CSV carries them with the member and supports they stand under", () => {
    const rows = Papa.parse<string[]>(orderCsv(list).trim()).data;
    const postRow = rows.find((r) => r[1] === `${POST.size} post`)!;
    expect(postRow[3]).toBe(String(posts));
    expect(postRow[7]).toMatch(/^P1 deck posts: 4 posts 8' 0" tall under B1 deck beam at 0' 0", 8' 0", 16' 0" and 24' 0"$/);
    expect(rows.find((r) => r[1] === "Footing concrete")![7]).toMatch(/^F1 footings: /);
  });

  test("a built stud column orders its studs: plies × columns of the designed 2x", () => {
    const plies = 3;
    const column = deck({ post: { ...POST, size: "2x6", plies } });
    expect(column.find((m) => m.id === "p1")?.resultSummary?.pass).toBe(true);
    const line = lines(jobOrderList(column, STARTER_TABLES)).find((l) => l.uses.some((u) => u.startsWith("P1 deck posts")))!;
    expect(line.item).toBe("2x6");
    expect(line.quantity).toBe(posts * plies);
    expect(line.uses[0]).toContain(`${posts} stud columns of ${plies} 2x6, ${formatFeetInches(POST.heightFt)} tall under B1 deck beam`);
  });
});

describe("no double count; typed numbers only where nothing is built", () => {
  const supports = B1_STATE.supports.length;
  const typedPostStock = stockLengthFor(TYPED.postHeightFt!, DEFAULT_SAWN_STOCK_FT).pieceFt;
  const typedEach = footingCubicYards(TYPED.footingDiameterIn!, TYPED.footingDepthIn!);

  test("posts and footings built under the beam: what is typed on the beam is not counted again", () => {
    const members = deck({ beamDetails: TYPED });
    const list = jobOrderList(members, STARTER_TABLES);
    expect(lines(list).find((l) => l.item === `${TYPED.postSize} post`)).toBeUndefined();
    const spec = footingSpec(members);
    expect(concreteOf(list)!.quantity).toBe(concreteToOrder(supports * padCubicYards(spec.shape, spec.sizeIn, spec.thicknessIn)));
    expect(lines(list).some((l) => l.notes.some((n) => /not checked/.test(n)))).toBe(false);
  });

  test("only three of the beam's four supports on the built posts: the fourth takes the typed post and footing", () => {
    const members = deck({ beamDetails: TYPED, beamBearing: { supports: [0, 1, 2] } });
    const list = jobOrderList(members, STARTER_TABLES);
    expect(lines(list).find((l) => l.item === `${POST.size} post`)?.quantity).toBe(3);
    const typed = lines(list).find((l) => l.item === `${TYPED.postSize} post`)!;
    expect(typed.quantity).toBe(supports - 3);
    expect(typed.lengthFt).toBe(typedPostStock);
    expect(typed.notes.join(" ")).toMatch(/not checked/);
    expect(typed.uses[0]).toMatch(/^B1 deck beam: 1 post not built on the job page/);
    const spec = footingSpec(members);
    expect(concreteOf(list)!.quantity).toBe(concreteToOrder(3 * padCubicYards(spec.shape, spec.sizeIn, spec.thicknessIn) + (supports - 3) * typedEach));
    expect(concreteOf(list)!.notes.join(" ")).toMatch(/typed on a beam are not checked/);
  });

  test("posts built with no footings under them: the typed footings give the concrete, the posts come from the design", () => {
    const list = jobOrderList(deck({ footing: null, beamDetails: TYPED }), STARTER_TABLES);
    expect(lines(list).find((l) => l.item === `${POST.size} post`)?.quantity).toBe(supports);
    expect(lines(list).find((l) => l.item === `${TYPED.postSize} post`)).toBeUndefined();
    expect(concreteOf(list)!.quantity).toBe(concreteToOrder(supports * typedEach));
  });

  test("nothing built: the typed posts and footings as before, each saying they are not checked", () => {
    const list = jobOrderList(deck({ post: null, beamDetails: TYPED }), STARTER_TABLES);
    const typed = lines(list).find((l) => l.item === `${TYPED.postSize} post`)!;
    expect(typed.quantity).toBe(supports);
    expect(typed.uses[0]).toBe(`B1 deck beam: ${supports} posts, ${formatFeetInches(TYPED.postHeightFt!)} tall`);
    expect(concreteOf(list)!.quantity).toBe(concreteToOrder(supports * typedEach));
  });
});

describe("a built post or footing that fails its check is not ordered; the list says why", () => {
  // a 4x4 No.2 post 14 ft tall: le/d = 168 / 3.5 = 48 ≤ 50 (NDS 2018 §3.7.1.4), but Cp is so small that B1's interior reactions are too much
  const slender: PostDesign = { ...POST, size: "4x4", heightFt: 14 };
  const members = deck({ post: slender, beamDetails: TYPED });
  const list = jobOrderList(members, STARTER_TABLES);
  const p1 = members.find((m) => m.id === "p1")!.resultSummary!;

  test("the premise: the load path finds these posts over", () => {
    expect(p1.pass).toBe(false);
    expect(p1.problems?.length).toBeGreaterThan(0);
  });

  test("no failing posts on the list, and the beam's typed posts do not stand in for them", () => {
    expect(lines(list).find((l) => l.item === "4x4 post")).toBeUndefined();
    expect(lines(list).some((l) => l.uses.some((u) => u.startsWith("P1") || u.startsWith("B1 deck beam: 4 posts")))).toBe(false);
  });

  test("'Not counted yet' names them, says they do not pass and why", () => {
    const note = list.missing.find((m) => m.startsWith("P1 deck posts:"));
    expect(note).toMatch(/do NOT pass their check/);
    for (const p of (p1.problems ?? []).slice(0, 2)) expect(note).toContain(p);
  });

  test("a footing too small for its load is left out the same way", () => {
    const small = deck({ footing: { ...FOOTING, sizeIn: 12 } });
    const f1 = small.find((m) => m.id === "f1")!.resultSummary!;
    expect(f1.pass).toBe(false);
    const smallList = jobOrderList(small, STARTER_TABLES);
    expect(concreteOf(smallList)).toBeUndefined();
    expect(smallList.missing.find((m) => m.startsWith("F1 footings:"))).toMatch(/do NOT pass their check.*soil pressure/);
  });

  test("posts with nothing sized on them are named, not counted", () => {
    const bare = [...deck({ post: null }), row({ id: "p2", label: "P2 spare posts", kind: "post", supportDesign: POST })];
    const bareList = jobOrderList(bare, STARTER_TABLES);
    expect(bareList.missing).toContain("P2 spare posts: no sized member stands on these posts yet, so none are counted.");
  });
});
