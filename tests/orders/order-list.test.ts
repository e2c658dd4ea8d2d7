import { describe, expect, test } from "vitest";
import Papa from "papaparse";
import { defaultFlowState } from "@/lib/flow/defaults";
import { checkRequest, sizeRequest } from "@/lib/flow/request";
import { withMainSpan, withOverhang, type FlowState } from "@/lib/flow/state";
import { summarize } from "@/lib/flow/summary";
import { orderListMail } from "@/lib/mail/templates/order-list";
import { orderCsv } from "@/lib/orders/csv";
import { buildOrderList, cutLengthFt, NO_ORDER_DETAILS, type OrderDetails, type OrderLine, type OrderMember } from "@/lib/orders/order-list";
import { blockingRows, blocksPerPiece, concreteToOrder, footingCubicYards, joistCount, stockLengthFor, stripsPerSheet, studSizeFor } from "@/lib/orders/rules";
import { checkMember, sizeMember } from "@/lib/solver/design";
import type { MemberSpec } from "@/lib/solver/design/schema";
import { STARTER_TABLES } from "@/lib/tables";
import type { MaterialTables } from "@/lib/tables/types";

// Order quantities checked by hand. Every rule here is common practice of house framing (stock lengths 8–24 ft
// in 2 ft steps, a joist at each end of a run, two king studs per header end, rims at both ends of joists, a
// row of blocking at least every 8 ft, 10 % extra concrete), not an engineering value; the arithmetic of each
// expectation is written out beside it.

function member(label: string, state: FlowState, details: Partial<OrderDetails> = {}, spec?: MemberSpec): OrderMember {
  const chosen = spec ?? sizeMember(sizeRequest(state), STARTER_TABLES).passing[0]?.member ?? null;
  const summary = chosen ? summarize(state, checkMember(checkRequest(state, chosen), STARTER_TABLES)) : null;
  return { label, kind: state.kind, flowState: state, spec: chosen, summary, details: { ...NO_ORDER_DETAILS, ...details } };
}

function lines(list: ReturnType<typeof buildOrderList>): OrderLine[] {
  return list.groups.flatMap((g) => g.lines);
}

function find(list: ReturnType<typeof buildOrderList>, item: string, lengthFt: number | null, use: RegExp): OrderLine {
  const line = lines(list).find((l) => l.item === item && l.lengthFt === lengthFt && l.uses.some((u) => use.test(u)));
  if (!line) throw new Error(`no line ${item} @ ${lengthFt} for ${use}: ${JSON.stringify(lines(list).map((l) => [l.item, l.lengthFt, l.uses]))}`);
  return line;
}

describe("counting rules (common practice), by hand", () => {
  test.each([
    { label: "9.5 ft → one 10 ft piece", need: 9.5, stock: [8, 10, 12], piece: 10, pieces: 1 },
    { label: "exactly 12 ft → 12 ft", need: 12, stock: [8, 10, 12, 14], piece: 12, pieces: 1 },
    { label: "30 ft in 8–24 → two pieces of ≥ 15 ft → 16 ft", need: 30, stock: [8, 10, 12, 14, 16, 18, 20, 22, 24], piece: 16, pieces: 2 },
    { label: "no stock lengths: cut to length, up to the next foot (13.2 → 14)", need: 13.2, stock: [], piece: 14, pieces: 1 },
  ])("stock length: $label", ({ need, stock, piece, pieces }) => {
    const choice = stockLengthFor(need, stock);
    expect(choice.pieceFt).toBe(piece);
    expect(choice.pieces).toBe(pieces);
  });

  test.each([
    { widthFt: 16, spacingIn: 16, joists: 13 }, // 192 in / 16 = 12 spaces + 1
    { widthFt: 12, spacingIn: 16, joists: 10 }, // 144 / 16 = 9 spaces + 1
    { widthFt: 10, spacingIn: 16, joists: 9 }, // 120 / 16 = 7.5 → 8 spaces (last one short) + 1
    { widthFt: 20, spacingIn: 24, joists: 11 }, // 240 / 24 = 10 + 1
  ])("joists across $widthFt ft at $spacingIn in o.c.: $joists", ({ widthFt, spacingIn, joists }) => {
    expect(joistCount(widthFt, spacingIn)).toBe(joists);
  });

  test.each([
    { spanFt: 8, rows: 0 }, // one 8 ft gap is allowed
    { spanFt: 13.5, rows: 1 }, // two gaps of 6.75 ft
    { spanFt: 17, rows: 2 }, // three gaps of 5.67 ft (two would be 8.5 ft)
    { spanFt: 24, rows: 2 }, // three gaps of 8 ft
  ])("blocking rows in a $spanFt ft span: $rows", ({ spanFt, rows }) => {
    expect(blockingRows(spanFt)).toBe(rows);
  });

  test("blocks from a piece and spacer strips from a sheet, a 1/8 in kerf at each cut", () => {
    // 16 in o.c. less 1-1/2 in = 14-1/2 in blocks: (96 + 1/8) / (14.5 + 1/8) = 6.57 → 6 per 8 ft piece
    expect(blocksPerPiece(14.5, 8)).toBe(6);
    // 9-1/4 in strips from a 48 in sheet: (48 + 1/8) / (9.25 + 1/8) = 5.13 → 5
    expect(stripsPerSheet(9.25)).toBe(5);
  });

  test("footing concrete: π (D/2)² H / 46,656 yd³ per footing, plus 10 %, up to the next 0.01", () => {
    const each = footingCubicYards(12, 36);
    expect(each).toBeCloseTo((Math.PI * 36 * 36) / 46656, 12); // 0.08727 yd³
    expect(concreteToOrder(2 * each)).toBe(0.2); // 0.17453 × 1.1 = 0.19199 → 0.20
    expect(concreteToOrder(3 * footingCubicYards(16, 48))).toBe(0.69); // π × 8² × 48 = 9,651 in³ = 0.20686 yd³; × 3 × 1.1 = 0.68263 → 0.69
  });

  test("stud size follows the header's thickness: 2-ply 2x + 1/2 in spacer = 3-1/2 in → 2x4; 3-ply = 4-1/2 in → 2x6", () => {
    expect(studSizeFor(2 * 1.5 + 0.5)).toBe("2x4");
    expect(studSizeFor(3 * 1.5)).toBe("2x6");
  });
});

describe("the demo jobs' order lists, by hand", () => {
  // Marsh Lane addition (seeders/20261201120010-demo-jobs.ts): H1 8 ft header, B1 14 ft beam, J1 13.5 ft floor joists over a 16 ft width.
  const h1 = member("H1 kitchen header", withMainSpan(defaultFlowState("header"), 8));
  const b1 = member("B1 family room beam", {
    ...withMainSpan(defaultFlowState("beam"), 14),
    material: { ...defaultFlowState("beam").material, family: "engineered", plies: 0, product: "" },
  });
  const j1 = member("J1 addition floor joists", withMainSpan(defaultFlowState("floor-joist"), 13.5), { runWidthFt: 16 });
  const marsh = buildOrderList([h1, b1, j1], STARTER_TABLES);

  test("J1: 13 joists cut 13.5 ft + 1-1/2 in bearing each end = 13.75 ft → 14 ft stock", () => {
    expect(cutLengthFt(j1.flowState, j1.summary)).toBeCloseTo(13.5 + 2 * (1.5 / 12), 12);
    const spec = j1.spec as Extract<MemberSpec, { material: "sawn" }>;
    const line = find(marsh, spec.size, 14, /J1.*joists/);
    expect(line.quantity).toBe(13 * spec.plies); // joistCount(16 ft, 16 in) = 13
  });

  test("J1: two rim joists of 16 ft (the 16 ft width, one at each end) and one row of blocking", () => {
    const spec = j1.spec as Extract<MemberSpec, { material: "sawn" }>;
    expect(find(marsh, spec.size, 16, /J1.*: rim/).quantity).toBe(2);
    // 13.5 ft span → 1 row; 13 joists → 12 blocks of 14-1/2 in; 6 blocks per 8 ft piece → 2 pieces
    expect(find(marsh, spec.size, 8, /J1.*: 1 row of blocking, 12 blocks/).quantity).toBe(Math.ceil(12 / 6));
  });

  test("H1: its plies at the next stock length, jack studs from the check and two king studs per end", () => {
    const spec = h1.spec as Extract<MemberSpec, { material: "sawn" }>;
    const jacks = h1.summary!.reactions[0].jackStuds! + h1.summary!.reactions[h1.summary!.reactions.length - 1].jackStuds!;
    // 8 ft opening + 1-1/2 in per jack stud at each end
    const cut = 8 + (jacks * 1.5) / 12;
    expect(cutLengthFt(h1.flowState, h1.summary)).toBeCloseTo(cut, 12);
    const stock = [8, 10, 12, 14, 16, 18, 20, 22, 24].find((l) => l >= cut)!;
    expect(find(marsh, spec.size, stock, /H1/).quantity).toBe(spec.plies);
    const studs = lines(marsh).find((l) => l.uses.some((u) => /H1.*: .*jack stud/.test(u)))!;
    expect(studs.quantity).toBe(jacks + 2 * 2);
    expect(studs.lengthFt).toBe(8);
  });

  test("priced from the cost table: price = $/ft × length × quantity; every line without a price says so", () => {
    for (const line of lines(marsh)) {
      if (line.costPerFt !== null && line.lengthFt !== null) expect(line.price).toBeCloseTo(line.costPerFt * line.lengthFt * line.quantity, 2);
      else expect(line.price).toBeNull();
    }
    expect(marsh.total).toBeCloseTo(
      lines(marsh).reduce((s, l) => s + (l.price ?? 0), 0),
      2,
    );
    expect(marsh.unpriced).toBe(lines(marsh).filter((l) => l.price === null).length);
  });

  // Orchard Row deck: DB1 deck beam on two 4 ft 6x6 posts over 12 in x 36 in footings; DJ1 11 ft joists + 1.5 ft overhang over a 12 ft width.
  const db1 = member("DB1 deck beam", defaultFlowState("deck-beam"), { postHeightFt: 4, postSize: "6x6", footingDiameterIn: 12, footingDepthIn: 36 });
  const dj1 = member("DJ1 deck joists", withOverhang(withMainSpan(defaultFlowState("deck-joist"), 11), "right", 1.5), { runWidthFt: 12 });
  const orchard = buildOrderList([db1, dj1], STARTER_TABLES);

  test("DB1: a post under each of its supports, 4 ft → 8 ft stock (the shortest), and 0.20 yd³ of concrete", () => {
    const posts = lines(orchard).find((l) => l.item === "6x6 post")!;
    expect(posts.quantity).toBe(db1.flowState.supports.length);
    expect(posts.lengthFt).toBe(8);
    const concrete = lines(orchard).find((l) => l.unit === "cu yd")!;
    expect(concrete.quantity).toBe(concreteToOrder(db1.flowState.supports.length * footingCubicYards(12, 36)));
    expect(concrete.price).toBeNull();
  });

  test("DJ1: 10 joists (12 ft at 16 in), cut 12.5 ft + 1-1/2 in at the supported end = 12.625 ft → 14 ft", () => {
    const spec = dj1.spec as Extract<MemberSpec, { material: "sawn" }>;
    expect(find(orchard, spec.size, 14, /DJ1.*joists/).quantity).toBe(10);
    expect(find(orchard, spec.size, 12, /DJ1.*: rim/).quantity).toBe(2);
  });

  test("quantities follow the job: a wider floor means more joists, a longer span a longer stock length", () => {
    const wider = buildOrderList([{ ...j1, details: { ...j1.details, runWidthFt: 24 } }], STARTER_TABLES);
    const spec = j1.spec as Extract<MemberSpec, { material: "sawn" }>;
    expect(find(wider, spec.size, 14, /J1.*joists/).quantity).toBe(19); // 288 / 16 = 18 + 1
    // 15 ft + 2 × 1-1/2 in = 15.25 ft → 16 ft: the 13 joists join the two 16 ft rims on one line
    const longer = member("J1", withMainSpan(defaultFlowState("floor-joist"), 15), { runWidthFt: 16 }, j1.spec!);
    expect(find(buildOrderList([longer], STARTER_TABLES), spec.size, 16, /J1.*joists/).quantity).toBe(13 + 2);
  });

  test("a missing width is said in words, and the stock lengths come from the tables when they hold some", () => {
    const noWidth = buildOrderList([{ ...j1, details: NO_ORDER_DETAILS }], STARTER_TABLES);
    expect(noWidth.missing.join(" ")).toMatch(/J1 addition floor joists: add the floor width/);
    const yard: MaterialTables = { ...STARTER_TABLES, stockLengths: [{ material: "sawn", lengthsFt: [12, 16, 20] }] };
    const spec = j1.spec as Extract<MemberSpec, { material: "sawn" }>;
    // 13.75 ft → 16 ft in a 12/16/20 ft yard; the two 16 ft rims share the line
    expect(find(buildOrderList([j1], yard), spec.size, 16, /J1.*joists/).quantity).toBe(13 + 2);
  });
});

describe("CSV", () => {
  test("a cell starting with = + - @ is written as text (leading apostrophe), and the file reads back line for line", () => {
    const evil = member('=HYPERLINK("http://x")', withMainSpan(defaultFlowState("header"), 6));
    const list = buildOrderList(
      [
        evil,
        member("+1 deck", withMainSpan(defaultFlowState("header"), 6)),
        member("@sum", withMainSpan(defaultFlowState("header"), 6)),
        member("-2", withMainSpan(defaultFlowState("header"), 6)),
      ],
      STARTER_TABLES,
    );
    const csv = orderCsv(list);
    const rows = Papa.parse<string[]>(csv.trim(), { skipEmptyLines: true }).data;
    expect(rows[0]).toEqual(["group", "item", "length_ft", "quantity", "unit", "cost_per_ft_usd", "price_usd", "for", "notes"]);
    const cells = rows.slice(1).flat();
    for (const cell of cells) expect(cell).not.toMatch(/^[=+\-@]/);
    expect(cells.some((c) => c.startsWith("'=HYPERLINK"))).toBe(true);
    expect(rows.length - 2).toBe(lines(list).length); // header and total line
    expect(cells.filter((c) => c.includes("no price in the cost table")).length).toBe(lines(list).filter((l) => l.price === null).length);
  });
});

describe("the e-mail to the yard", () => {
  test("every line in the body says which members its pieces are for, and a member's name in HTML stays text", () => {
    const h1 = member("H1 <b>kitchen</b> header", withMainSpan(defaultFlowState("header"), 8));
    const j1 = member("J1 addition floor joists", withMainSpan(defaultFlowState("floor-joist"), 13.5), { runWidthFt: 16 });
    const list = buildOrderList([h1, j1], STARTER_TABLES);
    const mail = orderListMail({ jobName: "Marsh Lane addition", senderName: "Dana", list });
    for (const line of lines(list)) for (const use of line.uses) expect(mail.text).toContain(use);
    expect(mail.text).toMatch(/for J1 addition floor joists/);
    expect(mail.html).toContain("H1 &lt;b&gt;kitchen&lt;/b&gt; header");
    expect(mail.html).not.toContain("<b>kitchen</b>");
  });
});
