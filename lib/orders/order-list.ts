/**
 * A job's order list: the pieces to order from the yard for the members as they are now, grouped by
 * species and grade (or product, or steel) and then by size and length, as a yard takes an order, and
 * priced from the cost table where it holds a price. Computed from the members every time (never stored),
 * so a changed member changes the list. Pure: plain data in, plain data out.
 */
import { formatFeetInches, formatInches } from "@/lib/flow/length";
import type { FlowState, MemberKind } from "@/lib/flow/state";
import { overhangs, sortedSupports, spansFt } from "@/lib/flow/state";
import type { MemberResultSummary } from "@/lib/flow/summary";
import type { MemberSpec } from "@/lib/solver/design/schema";
import { costPerFoot, type ItemRef } from "@/lib/tables";
import type { MaterialTables, SawnGrade, Species, StockMaterial } from "@/lib/tables/types";
import type { BuiltFootings, BuiltPosts, BuiltSupport, BuiltUnder, SupportPlace } from "./load-path-supports";
import {
  blockingRows,
  blocksPerPiece,
  blocksPerRow,
  concreteToOrder,
  DEFAULT_SAWN_STOCK_FT,
  footingCubicYards,
  joistCount,
  KING_STUDS_PER_END,
  padCubicYards,
  spacerStrips,
  SPACER_IN,
  stockLengthFor,
  stripsPerSheet,
  studSizeFor,
} from "./rules";

/** What an order needs of a member beyond its sizing (Member columns; all optional). */
export interface OrderDetails {
  runWidthFt: number | null;
  postHeightFt: number | null;
  postSize: string | null;
  footingDiameterIn: number | null;
  footingDepthIn: number | null;
}

export const NO_ORDER_DETAILS: OrderDetails = { runWidthFt: null, postHeightFt: null, postSize: null, footingDiameterIn: null, footingDepthIn: null };

export interface OrderMember {
  label: string;
  kind: MemberKind;
  flowState: FlowState;
  /** the member to build (chosen on the answer screen, or the saved answer's) */
  spec: MemberSpec | null;
  summary: MemberResultSummary | null;
  details: OrderDetails;
  /** how many of its supports stand on posts and footings built in the job's load path (counted from there, not from `details`) */
  builtUnder?: BuiltUnder;
}

export type OrderUnit = "pcs" | "sheets" | "cu yd";

export interface OrderLine {
  /** "Douglas Fir-Larch No.2", "LVL 2.0E", "Steel", "Sheet goods", "Concrete" */
  group: string;
  /** "2x10", "1-3/4" x 11-7/8"", "W8x18", "1/2 in plywood, 4x8", "Footing concrete" */
  item: string;
  /** length of each piece, ft; null for sheets and concrete */
  lengthFt: number | null;
  quantity: number;
  unit: OrderUnit;
  /** what the pieces are for: "J1 floor joists: 13 joists" */
  uses: string[];
  notes: string[];
  /** $ per foot of one piece from the cost table; null when the table has no price */
  costPerFt: number | null;
  /** $ for the line; null when unpriced */
  price: number | null;
}

export interface OrderGroup {
  name: string;
  lines: OrderLine[];
  /** $ of the priced lines */
  subtotal: number;
  unpriced: number;
}

export interface OrderList {
  groups: OrderGroup[];
  /** $ of every priced line */
  total: number;
  /** lines without a price */
  unpriced: number;
  /** what the list could not count and what to add to count it */
  missing: string[];
  /** the material tables version the stock lengths and prices came from */
  tablesVersion: string;
}

export interface OrderOptions {
  /** stud length for jack and king studs, ft (an 8 ft wall: common practice) */
  studLengthFt?: number;
  /** the posts and footings built and checked in the job's load path (lib/orders/load-path-supports.ts) */
  supports?: readonly BuiltSupport[];
}

/** The stock lengths of a material family from the tables; sawn lumber falls back to 8–24 ft. */
export function stockLengthsOf(tables: MaterialTables, material: StockMaterial): readonly number[] {
  const row = tables.stockLengths?.find((r) => r.material === material);
  if (row && row.lengthsFt.length > 0) return row.lengthsFt;
  return material === "sawn" ? DEFAULT_SAWN_STOCK_FT : [];
}

/** Kinds whose member is one of many across a floor, deck or roof. */
const REPEATED: readonly MemberKind[] = ["floor-joist", "deck-joist", "rafter"];
/** Kinds that get rim joists at both ends and blocking between (common practice); rafters get neither here. */
const FRAMED_FLOOR: readonly MemberKind[] = ["floor-joist", "deck-joist"];
/** Kinds that may stand on posts. */
const ON_POSTS: readonly MemberKind[] = ["deck-beam", "beam"];

const POST_SIZES = ["4x4", "4x6", "6x6", "8x8"] as const;
export const POST_SIZE_CHOICES: readonly string[] = POST_SIZES;
export const DEFAULT_POST_SIZE = "6x6";

interface Piece {
  group: string;
  item: string;
  lengthFt: number | null;
  quantity: number;
  unit: OrderUnit;
  use: string;
  note?: string;
  ref: ItemRef | null;
  /** order of sizes inside a group: depth in, then width */
  sortKey: number;
  /** keeps pieces of the same item on their own line (posts checked on the load path apart from typed ones) */
  tag?: string;
}

function sawnGroup(species: string, grade: string): string {
  return `${species} ${grade}`;
}

function nominal(size: string): { t: number; d: number } {
  const m = /^(\d+)x(\d+)$/.exec(size.trim());
  return m ? { t: Number(m[1]), d: Number(m[2]) } : { t: 0, d: 0 };
}

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** The length a member is cut to: its whole length plus the bearing at each end that sits on a support (no overhang there). */
export function cutLengthFt(state: FlowState, summary: MemberResultSummary | null): number {
  const hang = overhangs(state);
  const ends = sortedSupports(state.supports);
  if (ends.length === 0) return state.lengthFt;
  const reactions = summary?.reactions ?? [];
  const bearingAt = (i: number): number => {
    const studs = reactions[i]?.jackStuds;
    // a header sits on its jack studs, 1-1/2 in each; any other member on its bearing length
    return (studs !== null && studs !== undefined && state.kind === "header" ? studs * 1.5 : state.bearingIn) / 12;
  };
  let length = state.lengthFt;
  if (hang.left < 1e-9) length += bearingAt(0);
  if (hang.right < 1e-9) length += bearingAt(Math.max(0, reactions.length - 1));
  return length;
}

/** Pieces of the member itself (and of its repeats, rims and blocking), for the material family it is. */
function memberPieces(m: OrderMember, tables: MaterialTables, missing: string[], studLengthFt: number): Piece[] {
  const spec = m.spec;
  if (!spec) {
    missing.push(`${m.label}: no size chosen yet — open it and pick the member to build.`);
    return [];
  }
  const pieces: Piece[] = [];
  const cut = cutLengthFt(m.flowState, m.summary);
  const repeated = REPEATED.includes(m.kind) && m.flowState.width.mode === "spacing";
  const spacingIn = m.flowState.width.mode === "spacing" ? m.flowState.width.spacingIn : 0;
  const width = m.details.runWidthFt;
  let count = 1;
  if (repeated) {
    if (width && width > 0) count = joistCount(width, spacingIn);
    else {
      missing.push(
        `${m.label}: add the ${m.kind === "rafter" ? "roof" : m.kind === "deck-joist" ? "deck" : "floor"} width the ${m.kind === "rafter" ? "rafters" : "joists"} repeat across to count them (one is listed).`,
      );
    }
  }
  const what = repeated ? (m.kind === "rafter" ? "rafters" : "joists") : "";
  const plies = spec.material === "steel" || spec.material === "ijoist" ? 1 : spec.material === "cfs" ? (spec.assembly === "single" ? 1 : 2) : spec.plies;

  if (spec.material === "sawn") {
    const stock = stockLengthFor(cut, stockLengthsOf(tables, "sawn"));
    const group = sawnGroup(spec.species, spec.grade);
    const ref: ItemRef = { material: "sawn", species: spec.species as Species, grade: spec.grade as SawnGrade, size: spec.size };
    const { t, d } = nominal(spec.size);
    const sortKey = d * 100 + t;
    const useWords = repeated ? `${m.label}: ${plural(count, what.slice(0, -1), what)}` : `${m.label}${plies > 1 ? `: ${plies} plies` : ""}`;
    pieces.push({
      group,
      item: spec.size,
      lengthFt: stock.pieceFt,
      quantity: count * plies * stock.pieces,
      unit: "pcs",
      use: useWords,
      note:
        stock.pieces > 1
          ? `${m.label} is longer than the longest stock length: ${stock.pieces} pieces per ${plies > 1 ? "ply" : "member"}, joined only over a support`
          : undefined,
      ref,
      sortKey,
    });
    const size = tables.sawnSizes.find((s) => s.name === spec.size);
    if (m.kind === "header") pieces.push(...headerExtras(m, spec, size?.b ?? 1.5, size?.d ?? 0, cut, tables, studLengthFt));
    if (FRAMED_FLOOR.includes(m.kind) && width && width > 0) {
      pieces.push(...floorExtras(m, group, spec.size, ref, sortKey, count, spacingIn, size?.b ?? 1.5, width, tables));
    }
    return pieces;
  }

  if (spec.material === "engineered") {
    const product = tables.engineered.find((p) => p.name === spec.product);
    const widthIn = spec.width ?? product?.widths[0] ?? 0;
    const stock = stockLengthFor(cut, stockLengthsOf(tables, "engineered"));
    pieces.push({
      group: spec.product,
      item: `${formatInches(widthIn)} x ${formatInches(spec.depth)}`,
      lengthFt: stock.pieceFt,
      quantity: count * plies * stock.pieces,
      unit: "pcs",
      use: repeated ? `${m.label}: ${plural(count, what.slice(0, -1), what)}` : `${m.label}${plies > 1 ? `: ${plies} plies` : ""}`,
      note: stock.stocked ? undefined : "cut to length (no stock lengths in the tables)",
      ref: { material: "engineered", product: spec.product, width: widthIn, depth: spec.depth },
      sortKey: spec.depth * 100 + widthIn,
    });
    if (m.kind === "header") missing.push(`${m.label}: jack and king studs for an engineered header are not listed; add them with the wall's studs.`);
    return pieces;
  }

  if (spec.material === "ijoist") {
    // I-joists come from the engineered lumber yard: its stock lengths, else cut to length
    const joist = tables.iJoists.find((j) => j.name === spec.joist);
    const stock = stockLengthFor(cut, stockLengthsOf(tables, "engineered"));
    const depthIn = joist?.d ?? 0;
    pieces.push({
      group: "Wood I-joists",
      item: spec.joist,
      lengthFt: stock.pieceFt,
      quantity: count * stock.pieces,
      unit: "pcs",
      use: repeated ? `${m.label}: ${plural(count, what.slice(0, -1), what)}` : m.label,
      note: stock.stocked ? undefined : "cut to length (no stock lengths in the tables)",
      ref: { material: "ijoist", joist: spec.joist },
      sortKey: depthIn,
    });
    if (FRAMED_FLOOR.includes(m.kind) && width && width > 0) {
      const rim = stockLengthFor(width, stockLengthsOf(tables, "engineered"));
      pieces.push({
        group: "Wood I-joists",
        item: `Rim board ${depthIn ? formatInches(depthIn) : ""} deep`.replace("  ", " "),
        lengthFt: rim.pieceFt,
        quantity: 2 * rim.pieces,
        unit: "pcs",
        use: `${m.label}: rim board at both ends${rim.pieces > 1 ? `, ${rim.pieces} pieces each` : ""}`,
        note: "blocking and web stiffeners for I-joists follow the maker's details: not listed",
        ref: null,
        sortKey: depthIn + 0.5,
      });
    }
    return pieces;
  }

  if (spec.material === "cfs") {
    // cold-formed steel is ordered cut to length; bearing stiffeners and screws as the answer and the maker's details say
    pieces.push({
      group: "Cold-formed steel",
      item: spec.section,
      lengthFt: Math.ceil(cut),
      quantity: count * plies,
      unit: "pcs",
      use: m.label,
      note: "cut to length",
      ref: { material: "cfs", section: spec.section },
      sortKey: 0,
    });
    return pieces;
  }

  const stock = stockLengthFor(cut, stockLengthsOf(tables, "steel"));
  pieces.push({
    group: `Steel ${spec.grade}`,
    item: spec.shape,
    lengthFt: stock.pieceFt,
    quantity: count * stock.pieces,
    unit: "pcs",
    use: m.label,
    note: stock.stocked ? "cut to length" : "cut to length (no stock lengths in the tables)",
    ref: { material: "steel", shape: spec.shape },
    sortKey: 0,
  });
  return pieces;
}

/** A sawn header's spacer (2-ply 2x only), jack studs under each end and king studs beside them. */
function headerExtras(
  m: OrderMember,
  spec: Extract<MemberSpec, { material: "sawn" }>,
  bIn: number,
  dIn: number,
  cut: number,
  tables: MaterialTables,
  studLengthFt: number,
): Piece[] {
  const pieces: Piece[] = [];
  let thickness = spec.plies * bIn;
  if (spec.plies === 2 && Math.abs(bIn - 1.5) < 1e-9 && dIn > 0) {
    thickness += SPACER_IN;
    const strips = spacerStrips(cut);
    pieces.push({
      group: "Sheet goods",
      item: `1/2 in plywood spacer strips, ${formatInches(dIn)} wide x 8 ft`,
      lengthFt: null,
      quantity: strips,
      unit: "pcs",
      use: `${m.label}: spacer between the plies`,
      note: `${stripsPerSheet(dIn)} strips rip from one 4x8 sheet`,
      ref: null,
      sortKey: dIn,
    });
  }
  const reactions = m.summary?.reactions ?? [];
  const ends = reactions.length >= 2 ? [reactions[0], reactions[reactions.length - 1]] : [];
  const jacks = ends.reduce((n, r) => n + (r.jackStuds ?? 0), 0);
  const kings = ends.length * KING_STUDS_PER_END;
  if (jacks + kings > 0) {
    const studSize = studSizeFor(thickness);
    const studRef: ItemRef = { material: "sawn", species: spec.species as Species, grade: "No.2", size: studSize };
    const { t, d } = nominal(studSize);
    pieces.push({
      group: sawnGroup(spec.species, "No.2"),
      item: studSize,
      lengthFt: stockLengthFor(studLengthFt, stockLengthsOf(tables, "sawn")).pieceFt,
      quantity: jacks + kings,
      unit: "pcs",
      use: `${m.label}: ${plural(jacks, "jack stud")} and ${plural(kings, "king stud")}`,
      ref: studRef,
      sortKey: d * 100 + t,
    });
  }
  return pieces;
}

/** Rim joists across both ends of the joists and rows of blocking between them, of the joist's size (common practice). */
function floorExtras(
  m: OrderMember,
  group: string,
  size: string,
  ref: ItemRef,
  sortKey: number,
  joists: number,
  spacingIn: number,
  bIn: number,
  widthFt: number,
  tables: MaterialTables,
): Piece[] {
  const pieces: Piece[] = [];
  const stock = stockLengthsOf(tables, "sawn");
  const rim = stockLengthFor(widthFt, stock);
  pieces.push({
    group,
    item: size,
    lengthFt: rim.pieceFt,
    quantity: 2 * rim.pieces,
    unit: "pcs",
    use: `${m.label}: rim joists at both ends${rim.pieces > 1 ? `, ${rim.pieces} pieces each` : ""}`,
    ref,
    sortKey,
  });
  const rows = spansFt(m.flowState).reduce((n, span) => n + blockingRows(span), 0);
  if (rows > 0 && joists > 1) {
    const blocks = rows * blocksPerRow(joists);
    const blockIn = spacingIn - bIn;
    const piece = stock[0] ?? 8;
    const perPiece = blocksPerPiece(blockIn, piece);
    if (perPiece > 0) {
      pieces.push({
        group,
        item: size,
        lengthFt: piece,
        quantity: Math.ceil(blocks / perPiece),
        unit: "pcs",
        use: `${m.label}: ${plural(rows, "row")} of blocking, ${blocks} blocks ${formatInches(blockIn)} long (${perPiece} a piece)`,
        ref,
        sortKey,
      });
    }
  }
  return pieces;
}

interface Concrete {
  yd3: number;
  use: string;
}

/**
 * Posts under each support of a beam on posts, and a round footing under each, from the numbers typed on the
 * beam (not checked): only for the supports that do not stand on posts and footings built in the load path.
 */
function typedPostPieces(m: OrderMember, tables: MaterialTables, missing: string[]): { pieces: Piece[]; concrete: Concrete | null } {
  const none = { pieces: [], concrete: null };
  if (!ON_POSTS.includes(m.kind)) return none;
  const supports = m.flowState.supports.length;
  const posts = Math.max(0, supports - (m.builtUnder?.posts ?? 0));
  const footings = Math.max(0, supports - (m.builtUnder?.footings ?? 0));
  const rest = (n: number) => (n < supports ? ` not built on the job page` : "");
  const d = m.details;
  const pieces: Piece[] = [];
  if (posts > 0 && d.postHeightFt && d.postHeightFt > 0) {
    const size = d.postSize && POST_SIZE_CHOICES.includes(d.postSize) ? d.postSize : DEFAULT_POST_SIZE;
    const species = m.spec?.material === "sawn" ? m.spec.species : null;
    const stock = stockLengthFor(d.postHeightFt, stockLengthsOf(tables, "sawn"));
    const { t, d: depth } = nominal(size);
    pieces.push({
      group: species ? sawnGroup(species, "No.2") : "Posts",
      item: `${size} post`,
      lengthFt: stock.pieceFt,
      quantity: posts * stock.pieces,
      unit: "pcs",
      use: `${m.label}: ${plural(posts, "post")}${rest(posts)}, ${formatFeetInches(d.postHeightFt)} tall`,
      note: "post size is the builder's choice here and not checked: add the posts on the job page to have them checked",
      ref: species ? { material: "sawn", species: species as Species, grade: "No.2", size } : null,
      sortKey: depth * 100 + t,
      tag: "typed",
    });
  } else if (posts > 0 && m.kind === "deck-beam") {
    missing.push(`${m.label}: add the post height to list its ${plural(posts, "post")}${rest(posts)}.`);
  }
  if (footings > 0 && d.footingDiameterIn && d.footingDepthIn) {
    return {
      pieces,
      concrete: {
        yd3: footings * footingCubicYards(d.footingDiameterIn, d.footingDepthIn),
        use: `${m.label}: ${plural(footings, "footing")}${rest(footings)}, ${formatInches(d.footingDiameterIn)} across, ${formatInches(d.footingDepthIn)} deep (typed, not checked)`,
      },
    };
  }
  if (footings > 0 && m.kind === "deck-beam") missing.push(`${m.label}: add the footing diameter and depth to list the concrete.`);
  return { pieces, concrete: null };
}

/** "0' 0" and 8' 0"", "0' 0", 8' 0" and 16' 0"" */
function listWords(items: readonly string[]): string {
  return items.length <= 1 ? (items[0] ?? "") : `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}

/** "under B1 deck beam at 0' 0" and 8' 0"; under B2 at 4' 0"": the places grouped by the member they stand under. */
function placeWords(places: readonly SupportPlace[]): string {
  const byUnder = new Map<string, string[]>();
  for (const p of places) byUnder.set(p.under, [...(byUnder.get(p.under) ?? []), p.at]);
  return [...byUnder.entries()].map(([under, ats]) => `under ${under} at ${listWords(ats)}`).join("; ");
}

/** What a built post or footing that cannot be ordered as it is lacks, in words; null when it can be ordered. */
function notOrderable(s: BuiltSupport): string | null {
  const what = s.type === "post" ? "posts" : "footings";
  if (s.places.length === 0) {
    return s.type === "post"
      ? `${s.label}: no sized member stands on these posts yet, so none are counted.`
      : `${s.label}: no posts with an answer stand on these footings yet, so no concrete is counted.`;
  }
  if (s.pass === null) return `${s.label}: these ${what} have not been checked yet (open the job page to work them out), so they are not counted.`;
  if (!s.pass) {
    const shown = s.problems.slice(0, 2);
    const more = s.problems.length - shown.length;
    const why = shown.length > 0 ? ` (${shown.join("; ")}${more > 0 ? `; ${more} more on the job page` : ""})` : "";
    return `${s.label}: these ${what} do NOT pass their check${why}, so they are not ordered. Change them on the job page until they pass and the list counts them.`;
  }
  return null;
}

/** Post pieces of posts built and checked in the load path: the designed size, species and grade, at the stock length their height needs. */
function builtPostPieces(s: BuiltPosts, tables: MaterialTables): Piece[] {
  const { size, plies, species, grade, heightFt } = s.design;
  const count = s.places.length;
  const stock = stockLengthFor(heightFt, stockLengthsOf(tables, "sawn"));
  // a post is one piece from footing to beam: taller than the longest stock length, it is ordered cut to length, never joined
  const lengthFt = stock.pieces > 1 ? Math.ceil(heightFt - 1e-9) : stock.pieceFt;
  const studColumn = plies > 1;
  const { t, d } = nominal(size);
  const where = placeWords(s.places);
  return [
    {
      group: sawnGroup(species, grade),
      item: studColumn ? size : `${size} post`,
      lengthFt,
      quantity: count * (studColumn ? plies : 1),
      unit: "pcs",
      use: studColumn
        ? `${s.label}: ${plural(count, "stud column")} of ${plies} ${size}, ${formatFeetInches(heightFt)} tall ${where}`
        : `${s.label}: ${plural(count, "post")} ${formatFeetInches(heightFt)} tall ${where}`,
      note:
        stock.pieces > 1
          ? "checked on the job's load path; taller than the longest stock length: order each post in one piece, cut to length"
          : "checked on the job's load path",
      ref: { material: "sawn", species, grade, size },
      sortKey: d * 100 + t,
      tag: "load path",
    },
  ];
}

/** The concrete of footings built and checked in the load path: each pad as designed. */
function builtFootingConcrete(s: BuiltFootings): Concrete | null {
  const spec = s.spec;
  if (!spec) return null;
  const count = s.places.length;
  const shape = spec.shape === "round" ? `${spec.sizeIn} in round` : `${spec.sizeIn} x ${spec.sizeIn} in square`;
  return {
    yd3: count * padCubicYards(spec.shape, spec.sizeIn, spec.thicknessIn),
    use: `${s.label}: ${plural(count, "footing")} ${shape} × ${spec.thicknessIn} in thick ${placeWords(s.places)}`,
  };
}

function lineKey(p: Pick<Piece, "group" | "item" | "lengthFt" | "unit" | "tag">): string {
  return `${p.group}\u0000${p.item}\u0000${p.lengthFt ?? ""}\u0000${p.unit}\u0000${p.tag ?? ""}`;
}

/** The order list for members as they are now, priced from `tables.costs` where it has the item. */
export function buildOrderList(members: readonly OrderMember[], tables: MaterialTables, options: OrderOptions = {}): OrderList {
  const studLengthFt = options.studLengthFt ?? 8;
  const missing: string[] = [];
  const pieces: Piece[] = [];
  const typedConcrete: Concrete[] = [];
  const builtConcrete: Concrete[] = [];
  for (const m of members) {
    pieces.push(...memberPieces(m, tables, missing, studLengthFt));
    const posts = typedPostPieces(m, tables, missing);
    pieces.push(...posts.pieces);
    if (posts.concrete) typedConcrete.push(posts.concrete);
  }
  // built posts and footings are ordered only when they pass their check; otherwise "Not counted yet" says why
  for (const s of options.supports ?? []) {
    const problem = notOrderable(s);
    if (problem) missing.push(problem);
    else if (s.type === "post") pieces.push(...builtPostPieces(s, tables));
    else {
      const concrete = builtFootingConcrete(s);
      if (concrete) builtConcrete.push(concrete);
    }
  }

  const lines = new Map<string, OrderLine & { sortKey: number }>();
  for (const p of pieces) {
    const key = lineKey(p);
    const cost = p.ref ? (costPerFoot(tables, p.ref) ?? null) : null;
    const held = lines.get(key);
    if (held) {
      held.quantity += p.quantity;
      held.uses.push(p.use);
      if (p.note && !held.notes.includes(p.note)) held.notes.push(p.note);
    } else {
      lines.set(key, {
        group: p.group,
        item: p.item,
        lengthFt: p.lengthFt,
        quantity: p.quantity,
        unit: p.unit,
        uses: [p.use],
        notes: p.note ? [p.note] : [],
        costPerFt: cost,
        price: null,
        sortKey: p.sortKey,
      });
    }
  }
  for (const line of lines.values()) {
    line.price = line.costPerFt !== null && line.lengthFt !== null ? Math.round(line.costPerFt * line.lengthFt * line.quantity * 100) / 100 : null;
  }
  const concrete = [...builtConcrete, ...typedConcrete];
  const volume = concrete.reduce((sum, c) => sum + c.yd3, 0);
  if (volume > 0) {
    const notes = [`${volume.toFixed(3)} cu yd of footings plus 10% (common practice)`];
    if (builtConcrete.length > 0) {
      notes.push(
        "the checked footings are the pads as designed, plain concrete (the design names no reinforcing); a pier or form from the pad up to grade is not designed here and not counted",
      );
    }
    if (typedConcrete.length > 0) notes.push("the footings typed on a beam are not checked: add them on the job page to have them checked");
    lines.set("concrete", {
      group: "Concrete",
      item: "Footing concrete",
      lengthFt: null,
      quantity: concreteToOrder(volume),
      unit: "cu yd",
      uses: concrete.map((c) => c.use),
      notes,
      costPerFt: null,
      price: null,
      sortKey: 0,
    });
  }

  const byGroup = new Map<string, (OrderLine & { sortKey: number })[]>();
  for (const line of lines.values()) byGroup.set(line.group, [...(byGroup.get(line.group) ?? []), line]);
  const rank = (name: string) => (name === "Concrete" ? 2 : name === "Sheet goods" ? 1 : 0);
  const groups: OrderGroup[] = [...byGroup.entries()]
    .sort(([a], [b]) => rank(a) - rank(b) || a.localeCompare(b))
    .map(([name, groupLines]) => {
      const sorted = groupLines.sort((a, b) => a.sortKey - b.sortKey || a.item.localeCompare(b.item) || (a.lengthFt ?? 0) - (b.lengthFt ?? 0));
      const plain = sorted.map(({ sortKey: _s, ...line }) => line);
      return {
        name,
        lines: plain,
        subtotal: Math.round(plain.reduce((sum, l) => sum + (l.price ?? 0), 0) * 100) / 100,
        unpriced: plain.filter((l) => l.price === null).length,
      };
    });
  return {
    groups,
    total: Math.round(groups.reduce((sum, g) => sum + g.subtotal, 0) * 100) / 100,
    unpriced: groups.reduce((n, g) => n + g.unpriced, 0),
    missing,
    tablesVersion: tables.version,
  };
}

/** "$1,234.50" */
export function formatDollars(amount: number): string {
  return amount.toLocaleString("en-US", { style: "currency", currency: "USD" });
}

/** "16 ft" */
export function formatStockLength(lengthFt: number | null): string {
  return lengthFt === null ? "" : `${Number.isInteger(lengthFt) ? lengthFt : lengthFt.toFixed(1)} ft`;
}
