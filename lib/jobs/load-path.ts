/**
 * The load path of a job: each member that bears on another hands it its reactions, load case by
 * load case (D, L, Lr, S, W kept apart, so the carrier's own combinations and pattern live load stay
 * right), and the job is worked out from the top down: joists, then the beams they sit on, then the
 * posts under the beams, then the footings under the posts. Pure (no database): the job service
 * reads the members, calls workOutJob and saves what changed.
 *
 * - Joists or rafters at a spacing bearing on a beam: each support's reaction R (lb, per joist) becomes a
 *   line load w = R / (spacing / 12) plf over the part of the beam they sit on.
 * - A beam or header bearing on a beam: its reaction becomes a point load at its bearing position.
 * - A beam on posts: one post under each of its supports (or those named); each post carries that
 *   support's reaction. Posts on footings: one footing under each post, carrying the post's load
 *   plus the post's own weight (D).
 *
 * Each member is worked out by the one design path (lib/solver/design: checkMember, sizeMember,
 * checkPost, checkFooting); nothing here computes a stress.
 */
import { wetInEffect } from "@/lib/flow/conditions";
import { checkRequest, sizeRequest } from "@/lib/flow/request";
import { formatFeetInches } from "@/lib/flow/length";
import type { FlowState } from "@/lib/flow/state";
import { designSpecOf, summarize, type CarriedLoadSummary, type MemberResultSummary, type SummaryReaction } from "@/lib/flow/summary";
import { checkMember, DesignInputError, sizeMember } from "@/lib/solver/design";
import { checkFooting, FOOTING_SHAPES, type FootingShape } from "@/lib/solver/design/footing";
import { KIND_LABELS, type JobMemberKind, type MemberKind } from "@/lib/solver/design/kinds";
import { checkPost, POST_SIZES, type PostSize } from "@/lib/solver/design/post";
import type { DesignLoad, MemberSpec } from "@/lib/solver/design/schema";
import { LOAD_CASES } from "@/lib/solver/types";
import { findSawnSize, sawnValuesForSize, type MaterialTables, type SawnGrade, type Species } from "@/lib/tables";

/** Where a member sits on the member carrying it. */
export interface Bearing {
  /** which of this member's supports (indices into its sorted supports) rest on the carrier; default: the last one for a member at a spacing on a beam, every one on posts */
  supports?: number[];
  /** joists at a spacing: the part of the carrier they sit on, ft from the carrier's left end (default its whole length) */
  fromFt?: number;
  toFt?: number;
  /** a beam or header on a beam: where it bears, ft from the carrier's left end */
  xFt?: number;
}

export interface PostDesign {
  type: "post";
  size: PostSize;
  plies: number;
  species: Species;
  grade: SawnGrade;
  heightFt: number;
  wet: boolean;
}

export interface FootingDesign {
  type: "footing";
  shape: FootingShape;
  sizeIn: number | null;
  thicknessIn: number;
  soilPsf: number;
  frostDepthIn: number;
  bottomDepthIn: number | null;
}

export type SupportDesign = PostDesign | FootingDesign;
export { POST_SIZES, FOOTING_SHAPES };

export interface PathMember {
  id: string;
  label: string;
  kind: JobMemberKind;
  /** the flow's inputs; null for posts and footings */
  flowState: FlowState | null;
  chosenMember: MemberSpec | null;
  carriedByMemberId: string | null;
  bearing: Bearing | null;
  supportDesign: SupportDesign | null;
  resultSummary: MemberResultSummary | null;
}

/** A saved member (a model row or its view) as the load path reads it. */
export function pathMemberOf(m: {
  id: string;
  label: string;
  kind: JobMemberKind;
  flowState: FlowState | null;
  chosenMember: MemberSpec | null;
  carriedByMemberId?: string | null;
  bearing?: Bearing | null;
  supportDesign?: SupportDesign | null;
  resultSummary: MemberResultSummary | null;
}): PathMember {
  return {
    id: m.id,
    label: m.label,
    kind: m.kind,
    flowState: m.flowState,
    chosenMember: m.chosenMember,
    carriedByMemberId: m.carriedByMemberId ?? null,
    bearing: m.bearing ?? null,
    supportDesign: m.supportDesign ?? null,
    resultSummary: m.resultSummary,
  };
}

export interface WorkedOut {
  summary: MemberResultSummary | null;
  chosen: MemberSpec | null;
  /** framing members: the inputs as worked out (psf loads dropped where joists deliver them) and the loads carried onto it */
  state?: FlowState;
  carried?: DesignLoad[];
}

/** Load cases with their reactions, lb. */
type ByCase = Partial<Record<(typeof LOAD_CASES)[number], number>>;

function scale(byCase: ByCase, f: number): ByCase {
  const out: ByCase = {};
  for (const c of LOAD_CASES) if (byCase[c] !== undefined && byCase[c] !== 0) out[c] = (byCase[c] ?? 0) * f;
  return out;
}

function add(a: ByCase, b: ByCase): ByCase {
  const out: ByCase = { ...a };
  for (const c of LOAD_CASES) if (b[c] !== undefined) out[c] = (out[c] ?? 0) + (b[c] ?? 0);
  return out;
}

/**
 * Why carrierId may not carry memberId, or null: a member cannot bear on itself, nor on a member
 * that (through any chain) bears on it.
 */
export function cycleIssue(members: readonly Pick<PathMember, "id" | "carriedByMemberId">[], memberId: string, carrierId: string | null): string | null {
  if (carrierId === null) return null;
  if (carrierId === memberId) return "a member cannot carry itself";
  const byId = new Map(members.map((m) => [m.id, m]));
  const seen = new Set<string>();
  let at: string | null = carrierId;
  while (at !== null && !seen.has(at)) {
    if (at === memberId) return "that member already bears on this one (directly or through others): loads would go round in a circle";
    seen.add(at);
    at = byId.get(at)?.carriedByMemberId ?? null;
  }
  return null;
}

/** The members in the order they are worked out: every member after all members that bear on it. */
export function checkOrder(members: readonly Pick<PathMember, "id" | "carriedByMemberId">[]): string[] {
  const ids = new Set(members.map((m) => m.id));
  const waiting = new Map<string, number>();
  for (const m of members) waiting.set(m.id, 0);
  for (const m of members)
    if (m.carriedByMemberId && ids.has(m.carriedByMemberId)) waiting.set(m.carriedByMemberId, (waiting.get(m.carriedByMemberId) ?? 0) + 1);
  const ready = members.filter((m) => waiting.get(m.id) === 0).map((m) => m.id);
  const carrierOf = new Map(members.map((m) => [m.id, m.carriedByMemberId]));
  const order: string[] = [];
  while (ready.length > 0) {
    const id = ready.shift() as string;
    order.push(id);
    const c = carrierOf.get(id);
    if (c && ids.has(c)) {
      const n = (waiting.get(c) ?? 0) - 1;
      waiting.set(c, n);
      if (n === 0) ready.push(c);
    }
  }
  // a cycle (refused when links are made) leaves members out: work them out last, alone
  for (const m of members) if (!order.includes(m.id)) order.push(m.id);
  return order;
}

function kindWords(kind: JobMemberKind): string {
  return kind === "post" ? "posts" : kind === "footing" ? "footings" : `${KIND_LABELS[kind as MemberKind].toLowerCase()}s`;
}

/** "J1 deck joists" for J1, "J1 deck joists" (not "… deck joists deck joists") where the name says the kind already. */
function nameWithKind(m: Pick<PathMember, "label" | "kind">, singular = false): string {
  const words = singular ? kindWords(m.kind).replace(/s$/, "") : kindWords(m.kind);
  return m.label.toLowerCase().includes(kindWords(m.kind).replace(/s$/, "")) ? m.label : `${m.label} ${words}`;
}

/** The supports of a member that rest on its carrier: as given, else the last (joists onto a beam) or every one (onto posts). */
export function bearingSupports(member: PathMember, carrierKind: JobMemberKind): number[] {
  const n = member.resultSummary?.reactions.length ?? member.flowState?.supports.length ?? 0;
  const given = member.bearing?.supports?.filter((i) => Number.isInteger(i) && i >= 0 && i < n);
  if (given && given.length > 0) return given;
  if (carrierKind === "post") return Array.from({ length: n }, (_, i) => i);
  return n > 0 ? [n - 1] : [];
}

/**
 * The loads the members bearing on a beam put on it, as design loads and as words. `solved` holds the
 * bearers' answers (worked out before the carrier).
 */
export function carriedLoads(
  carrier: PathMember,
  bearers: readonly PathMember[],
  solved: ReadonlyMap<string, WorkedOut>,
): { loads: DesignLoad[]; words: CarriedLoadSummary[] } {
  const loads: DesignLoad[] = [];
  const words: CarriedLoadSummary[] = [];
  const length = carrier.flowState?.lengthFt ?? 0;
  for (const b of bearers) {
    const s = solved.get(b.id)?.summary;
    if (!s || !b.flowState) continue;
    for (const j of bearingSupports({ ...b, resultSummary: s }, carrier.kind)) {
      const r = s.reactions[j];
      if (!r?.byCase) continue;
      if (b.flowState.width.mode === "spacing") {
        const spacingFt = b.flowState.width.spacingIn / 12;
        const from = Math.max(0, Math.min(length, b.bearing?.fromFt ?? 0));
        const to = Math.max(from, Math.min(length, b.bearing?.toFt ?? length));
        const w = scale(r.byCase, 1 / spacingFt);
        for (const c of LOAD_CASES) if (w[c]) loads.push({ type: "udl", case: c, from, to, w: w[c] as number });
        words.push({
          fromMemberId: b.id,
          words: `from ${nameWithKind(b)} @ ${b.flowState.width.spacingIn} in, ${formatFeetInches(from)} to ${formatFeetInches(to)}`,
          type: "udl",
          from,
          to,
          byCase: roundCases(w),
        });
      } else {
        const x = Math.max(0, Math.min(length, b.bearing?.xFt ?? length / 2));
        for (const c of LOAD_CASES) if (r.byCase[c]) loads.push({ type: "point", case: c, x, P: r.byCase[c] as number });
        words.push({
          fromMemberId: b.id,
          words: `from ${nameWithKind(b, true)} at ${formatFeetInches(x)}`,
          type: "point",
          from: x,
          to: x,
          byCase: roundCases(r.byCase),
        });
      }
    }
  }
  return { loads, words };
}

function roundCases(v: ByCase): ByCase {
  const out: ByCase = {};
  for (const c of LOAD_CASES) if (v[c] !== undefined) out[c] = Math.round((v[c] ?? 0) * 10) / 10;
  return out;
}

/** "D 470 lb + L 1,800 lb": a load by case, as the carrier lists it. */
function caseWords(v: ByCase): string {
  const parts = LOAD_CASES.filter((c) => (v[c] ?? 0) !== 0).map((c) => `${c} ${Math.round(v[c] ?? 0).toLocaleString("en-US")} lb`);
  return parts.length > 0 ? parts.join(" + ") : "0 lb";
}

function sumCases(v: ByCase): number {
  return LOAD_CASES.reduce((n, c) => n + (v[c] ?? 0), 0);
}

/**
 * Works one framing member out with the loads carried onto it: the chosen member is checked; when it no
 * longer passes, the flow's material family is sized again and the best that passes is taken (so the job
 * says "now 3-ply"); when nothing passes, the chosen member stays and shows as failing.
 */
export function workOutFraming(state: FlowState, chosen: MemberSpec | null, carried: readonly DesignLoad[], tables: MaterialTables): WorkedOut {
  let spec = chosen;
  if (spec) {
    const check = checkMember(checkRequest(state, spec, carried), tables);
    if (check.pass) return { summary: summarize(state, check), chosen: spec };
  }
  const size = sizeMember(sizeRequest(state, carried), tables);
  const best = size.passing[0]?.member ?? null;
  if (best) spec = best;
  if (!spec) return { summary: null, chosen: null };
  const check = checkMember(checkRequest(state, spec, carried), tables);
  const summary = summarize(state, check);
  if (!check.pass) summary.problems = [`Nothing in the tables for this material passes: ${check.verdict}`];
  return { summary, chosen: spec };
}

interface PostLoad {
  byCase: ByCase;
  from: string;
  above: { widthIn: number; FcPerpPsi: number; wet: boolean; label: string } | null;
}

function widthOfSpec(spec: MemberSpec, tables: MaterialTables): { widthIn: number; FcPerpPsi: number } | null {
  if (spec.material !== "sawn") return null;
  try {
    const size = findSawnSize(tables, spec.size);
    const v = sawnValuesForSize(tables, spec.species as Species, spec.grade as SawnGrade, spec.size);
    return { widthIn: size.b * (spec.plies ?? 1), FcPerpPsi: v.FcPerp };
  } catch {
    return null;
  }
}

function postLoads(post: PathMember, bearers: readonly PathMember[], solved: ReadonlyMap<string, WorkedOut>, tables: MaterialTables): PostLoad[] {
  const out: PostLoad[] = [];
  for (const b of bearers) {
    const w = solved.get(b.id);
    const s = w?.summary;
    if (!s) continue;
    const spec = w.chosen ?? designSpecOf(s);
    const width = spec ? widthOfSpec(spec, tables) : null;
    for (const j of bearingSupports({ ...b, resultSummary: s }, "post")) {
      const r = s.reactions[j];
      if (!r?.byCase) continue;
      out.push({
        byCase: r.byCase,
        from: `${b.label} at ${formatFeetInches(r.x)}`,
        above: width ? { ...width, wet: b.flowState ? wetInEffect(b.flowState) : false, label: b.label } : null,
      });
    }
  }
  return out;
}

function postSummary(post: PathMember, design: PostDesign, loads: PostLoad[], tables: MaterialTables): MemberResultSummary | null {
  if (loads.length === 0) return null;
  const results = loads.map((l) => checkPost({ ...design, loads: l.byCase, above: l.above }, tables));
  let worstI = 0;
  results.forEach((r, i) => {
    if (r.ratio > results[worstI].ratio) worstI = i;
  });
  const worst = results[worstI];
  const pass = results.every((r) => r.pass);
  const count = loads.length;
  const what = design.plies > 1 ? `${design.plies}-ply ${design.size} stud column` : `${design.size} post`;
  const headline = `${count} × ${what}${count > 1 ? "s" : ""} ${design.grade}, ${formatFeetInches(design.heightFt)} tall — ${pass ? "OK" : "Over"} ${Math.round(worst.ratio * 100)}%`;
  const reactions: SummaryReaction[] = loads.map((l, i) => ({
    x: i,
    type: "pin",
    maxDown: results[i].maxLoadLb + results[i].selfWeightLb,
    maxDownCombination: results[i].maxLoadCombination,
    uplift: 0,
    bearing: 0,
    requiredBearing: 0,
    jackStuds: null,
    byCase: add(l.byCase, { D: results[i].selfWeightLb }),
  }));
  const problems = results.flatMap((r, i) => (r.pass ? [] : [`post under ${loads[i].from}: ${r.governing} ${Math.round(r.ratio * 100)}%`]));
  return {
    memberLabel: `${what} ${design.grade} ${design.species}`,
    headline,
    spec: { material: "sawn", species: design.species, grade: design.grade, size: design.size, plies: design.plies },
    pass,
    governing: worst.governing,
    ratio: worst.ratio,
    checks: worst.checks.map((c) => ({
      name: c.name,
      ratio: c.ratio,
      demand: c.demand,
      capacity: c.capacity,
      unit: c.unit,
      combination: c.combination?.name ?? null,
    })),
    reactions,
    spanFt: design.heightFt,
    lengthFt: design.heightFt,
    tables: tables.version,
    computedAt: new Date().toISOString(),
    facts: [
      `Column stability NDS 2018 §3.7: le/d ${worst.factors.leOverD.toFixed(1)}, Cp ${worst.factors.Cp.toFixed(3)} (worst post)`,
      ...worst.assumptions,
      ...loads.map(
        (l, i) =>
          `Post ${i + 1} under ${l.from}: ${Math.round(sumCases(l.byCase)).toLocaleString("en-US")} lb (all cases), ${Math.round(results[i].ratio * 100)}%`,
      ),
    ],
    carried: loads.map((l, i) => ({
      fromMemberId: post.id,
      words: `post ${i + 1}: ${caseWords(l.byCase)} from ${l.from}`,
      type: "point",
      from: i,
      to: i,
      byCase: roundCases(l.byCase),
    })),
    problems,
  };
}

function footingSummary(
  footing: PathMember,
  design: FootingDesign,
  loads: { byCase: ByCase; from: string; postWidthIn: number }[],
  tables: MaterialTables,
): MemberResultSummary | null {
  if (loads.length === 0) return null;
  const results = loads.map((l) =>
    checkFooting({
      shape: design.shape,
      sizeIn: design.sizeIn,
      thicknessIn: design.thicknessIn,
      soilPsf: design.soilPsf,
      frostDepthIn: design.frostDepthIn,
      bottomDepthIn: design.bottomDepthIn,
      postWidthIn: l.postWidthIn,
      loads: l.byCase,
    }),
  );
  // one size for all when the builder gave none: the largest the worst footing needs
  const size = design.sizeIn ?? Math.max(...results.map((r) => r.sizeIn));
  const final = design.sizeIn === null ? loads.map((l) => checkFooting({ ...design, sizeIn: size, postWidthIn: l.postWidthIn, loads: l.byCase })) : results;
  let worstI = 0;
  final.forEach((r, i) => {
    if (r.ratio > final[worstI].ratio) worstI = i;
  });
  const worst = final[worstI];
  const pass = final.every((r) => r.pass);
  const count = loads.length;
  return {
    memberLabel: `${worst.answer}, on ${design.soilPsf.toLocaleString("en-US")} psf soil`,
    headline: `${count} × ${worst.answer} — ${pass ? "OK" : "Over"} ${Math.round(worst.ratio * 100)}%`,
    spec: { material: "footing", shape: worst.shape, sizeIn: worst.sizeIn, thicknessIn: worst.thicknessIn, bottomDepthIn: worst.bottomDepthIn },
    pass,
    governing: "soil",
    ratio: worst.ratio,
    checks: final.map((r, i) => ({
      name: `soil under footing ${i + 1}`,
      ratio: r.ratio,
      demand: Math.round(r.loadLb + r.selfWeightLb),
      capacity: Math.round(r.areaFt2 * r.soilPsf),
      unit: "lb",
      combination: r.loadCombination,
    })),
    reactions: [],
    spanFt: 0,
    lengthFt: 0,
    tables: tables.version,
    computedAt: new Date().toISOString(),
    facts: [
      `Soil: ${design.soilPsf.toLocaleString("en-US")} psf allowable (${worst.source})`,
      `Area needed ${worst.requiredAreaFt2.toFixed(2)} ft² for the worst footing (${worst.loadLb.toLocaleString("en-US")} lb + ${worst.selfWeightLb} lb concrete at 150 pcf); given ${worst.areaFt2.toFixed(2)} ft²`,
      `Frost depth ${design.frostDepthIn} in as entered; IRC 2021 R403.1.1 and R403.1.4`,
      ...loads.map((l, i) => `Footing ${i + 1} under ${l.from}: ${final[i].loadLb.toLocaleString("en-US")} lb, ${Math.round(final[i].ratio * 100)}%`),
    ],
    carried: loads.map((l, i) => ({
      fromMemberId: footing.id,
      words: `footing ${i + 1}: ${caseWords(l.byCase)} from ${l.from}`,
      type: "point",
      from: i,
      to: i,
      byCase: roundCases(l.byCase),
    })),
    problems: final.flatMap((r, i) => r.problems.map((p) => `footing ${i + 1}: ${p}`)),
  };
}

const POST_WIDTH_IN: Readonly<Record<PostSize, number>> = { "4x4": 3.5, "4x6": 3.5, "6x6": 5.5, "2x4": 3.5, "2x6": 5.5 };

/**
 * Works the whole job out, top down. Returns each member's new answer; `reasonFor(id)` names why a
 * member other than the one the builder just changed was worked out again (for the change flag), or
 * null where no flag is wanted (the member the builder edited).
 */
export function workOutJob(members: readonly PathMember[], tables: MaterialTables, reasonFor: (m: PathMember) => string | null): Map<string, WorkedOut> {
  const byId = new Map(members.map((m) => [m.id, m]));
  const solved = new Map<string, WorkedOut>();
  for (const id of checkOrder(members)) {
    const m = byId.get(id) as PathMember;
    const bearers = members.filter((b) => b.carriedByMemberId === m.id);
    let out: WorkedOut;
    try {
      if (m.flowState) {
        const { loads, words } = carriedLoads(m, bearers, solved);
        // joists at a spacing deliver the floor or deck itself: the carrier's own psf loads over a typed tributary width would count it twice
        const fromJoists = bearers.some((b) => b.flowState?.width.mode === "spacing");
        const state = fromJoists ? { ...m.flowState, areaLoads: [], snow: { ...m.flowState.snow, on: false } } : m.flowState;
        out = { ...workOutFraming(state, m.chosenMember, loads, tables), state, carried: loads };
        if (out.summary && words.length > 0) {
          out.summary.carried = words;
          if (fromJoists)
            out.summary.facts = [...(out.summary.facts ?? []), "Loads: from the joists bearing on it (its own psf loads and tributary width are not used)"];
        }
      } else if (m.supportDesign?.type === "post") {
        out = { summary: postSummary(m, m.supportDesign, postLoads(m, bearers, solved, tables), tables), chosen: null };
      } else if (m.supportDesign?.type === "footing") {
        const loads = bearers.flatMap((p) => {
          const s = solved.get(p.id)?.summary;
          const width = p.supportDesign?.type === "post" ? POST_WIDTH_IN[p.supportDesign.size] * (p.supportDesign.plies > 1 ? 1 : 1) : 5.5;
          return (s?.reactions ?? []).map((r, i) => ({ byCase: r.byCase ?? {}, from: `post ${i + 1} of ${p.label}`, postWidthIn: width }));
        });
        out = { summary: footingSummary(m, m.supportDesign, loads, tables), chosen: null };
      } else {
        out = { summary: m.resultSummary, chosen: m.chosenMember };
      }
    } catch (err) {
      if (!(err instanceof DesignInputError)) throw err;
      const base = m.resultSummary;
      out = { summary: base ? { ...base, pass: false, problems: err.issues.map((i) => `${i.path}: ${i.message}`) } : null, chosen: m.chosenMember };
    }
    const before = m.resultSummary;
    if (out.summary) {
      const reason = reasonFor(m);
      const changed = before !== null && (before.memberLabel !== out.summary.memberLabel || before.pass !== out.summary.pass);
      const change =
        changed && reason ? { was: before.headline, wasPass: before.pass, reason, at: new Date().toISOString() } : changed ? null : (before?.change ?? null);
      if (change) out.summary.change = change;
      else delete out.summary.change;
    }
    solved.set(id, out);
  }
  return solved;
}
