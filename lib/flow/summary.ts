/**
 * The answer of a sized member as saved in a job (`Member.resultSummary`): what to build, the check
 * that governs, a ratio per check, and what each support needs. The crew link and the job sheet
 * read it, so they show the same numbers as the answer screen. Pure.
 */
import type { CheckOutput } from "@/lib/solver/design/check";
import type { LoadStandard } from "@/lib/solver/asce7/standard";
import type { FootingShape } from "@/lib/solver/design/footing";
import type { MemberSpec } from "@/lib/solver/design/schema";
import type { LoadCase, SupportType } from "@/lib/solver/types";
import { jackStudsApply } from "@/lib/solver/design/answer-line";
import { pliesNailed } from "@/lib/solver/design/assembly";
import { formatFeetInches } from "./length";
import { mainSpanFt, overhangs, spansFt, wallOf, type FlowState } from "./state";

export interface SummaryReaction {
  /** ft from the left end */
  x: number;
  type: SupportType;
  /** largest downward reaction over the service combinations, lb */
  maxDown: number;
  maxDownCombination: string;
  /** largest uplift, lb (0 when none) */
  uplift: number;
  /** bearing length given and needed, in */
  bearing: number;
  requiredBearing: number;
  /** 1-1/2 in jack studs under this end (headers, beams in a stud wall), null where they do not apply */
  jackStuds: number | null;
  /** unfactored reaction by load case, lb (what this support hands down the load path; absent in answers saved before it was recorded) */
  byCase?: Partial<Record<LoadCase, number>>;
}

/** A load another member of the job puts on this one, as the carrier shows it ("from J1 floor joists @ 16 in, 0 to 14 ft"). */
export interface CarriedLoadSummary {
  fromMemberId: string;
  /** "from J1 deck joists @ 16 in, 0' 0" to 24' 0"" */
  words: string;
  type: "udl" | "point";
  /** ft on this member: from..to for a line load, x for a point load */
  from: number;
  to: number;
  /** plf (line) or lb (point), by case */
  byCase: Partial<Record<LoadCase, number>>;
}

/** How an answer changed when the job was worked out again (a member it carries, or the tables, changed). */
export interface AnswerChange {
  /** the headline before */
  was: string;
  wasPass: boolean;
  /** why it was worked out again, e.g. "J1 deck joists changed" or "new material tables" */
  reason: string;
  at: string;
}

/** A footing as the load path sizes it: concrete by its shape and plan size, no lumber. */
export interface FootingSpec {
  material: "footing";
  shape: FootingShape;
  /** diameter (round) or side (square), in */
  sizeIn: number;
  thicknessIn: number;
  /** how deep its bottom is set below grade, in */
  bottomDepthIn: number;
}

/** What a saved answer says to build: a framing member or post (a design spec), or a footing. */
export type SummarySpec = MemberSpec | FootingSpec;

/**
 * The design spec of a saved answer, null for a footing (footings saved before they had their own
 * type carry a sawn spec of size "footing": read as a footing too).
 */
export function designSpecOf(summary: Pick<MemberResultSummary, "spec"> | null | undefined): MemberSpec | null {
  const spec = summary?.spec;
  if (!spec || spec.material === "footing") return null;
  if (spec.material === "sawn" && spec.size === "footing") return null;
  return spec;
}

export interface MemberResultSummary {
  /** "3-ply 2x12 No.2 Douglas Fir-Larch" */
  memberLabel: string;
  /** the answer in one line: "3-ply 2x12 No.2 — 2 jack studs each end" */
  headline: string;
  spec: SummarySpec;
  pass: boolean;
  governing: string | null;
  ratio: number;
  checks: { name: string; ratio: number; demand: number; capacity: number; unit: string; combination: string | null }[];
  reactions: SummaryReaction[];
  /** the clear span between the first two supports and the whole length, ft */
  spanFt: number;
  lengthFt: number;
  /** material tables version the answer came from */
  tables: string;
  /** the edition of the design rules it was worked out on (absent in answers saved before editions were recorded) */
  rules?: string;
  /** when the answer was worked out, ISO 8601 */
  computedAt: string;
  /** the ASCE 7 edition the answer was worked on (absent in answers saved before it was recorded: ASCE 7-22) */
  loadStandard?: LoadStandard;
  /** the basis and assumptions the crew must know, in words (see answerFacts) */
  facts?: string[];
  /** loads other members of the job put on this one (the load path), each naming where it comes from */
  carried?: CarriedLoadSummary[];
  /** set when the answer changed on a recheck the builder did not make here; cleared when they mark it seen */
  change?: AnswerChange | null;
  /** why a member fails, in words, where a check's name does not say it (posts, footings, nothing passes) */
  problems?: string[];
}

/** The load basis in words, as the answer, crew link and sheet say it. */
export function basisWords(standard: LoadStandard, hasSnow: boolean): string {
  if (!hasSnow) return `Load combinations: ${standard}`;
  return standard === "ASCE 7-22"
    ? "Snow basis: ASCE 7-22, ground snow from the newer risk-based map (2024 code), counted at 0.7 (D + 0.7S)"
    : "Snow basis: ASCE 7-16, ground snow from the map in the 2021 code or older, counted in full (D + S)";
}

/** How the plies are held together: nailed (2x plies) or, thicker, bolted or screwed (not designed here). */
function pliesFastened(check: CheckOutput): string {
  const spec = check.member.spec;
  return spec.material === "sawn" && !pliesNailed(spec.size)
    ? "plies bolted or screwed together (a nail does not reach through them; the fastening is not designed here)"
    : "plies nailed together";
}

/**
 * What the answer rests on, in the words the answer screen, the crew link and the sheet all print:
 * the load basis, how the member is assembled in its wall, whether treated lumber was taken as
 * incised, a span found from a rough opening, and any bracing the member needs.
 */
export function answerFacts(check: CheckOutput): string[] {
  const facts = [
    basisWords(
      check.loadStandard,
      check.loads.some((l) => l.case === "S"),
    ),
  ];
  const a = check.assembly;
  if (a.wallFraming !== null) facts.push(`Assemble: ${a.words}, ${a.fits ? "fills" : "does NOT fill"} a ${a.wallFraming} wall`);
  else if (a.plies > 1) facts.push(`Assemble: ${a.words}, ${pliesFastened(check)}`);
  const f = check.factors as { incisedBasis?: string; incised?: boolean };
  if (typeof f.incisedBasis === "string" && (f.incised === true || /treated|as given/.test(f.incisedBasis))) facts.push(`Lumber: ${f.incisedBasis}`);
  if (check.roughOpening) facts.push(`Span: ${check.roughOpening.note}`);
  if (check.bracing.instruction) facts.push(`Bracing: ${check.bracing.instruction}`);
  if (check.bracing.bottomEdge) facts.push(`Bracing: ${check.bracing.bottomEdge}`);
  for (const b of check.pointBearing ?? []) facts.push(`Bearing: ${b.words}`);
  return facts;
}

export { shortLabel } from "@/lib/solver/design/answer-line";

/**
 * Whether the crew builds jack studs under this member's ends, by the answer line's own rule (a header, or a
 * beam in a stud wall): the answer screen, the saved summary and the sheet read it so they agree with the headline.
 */
export function jackStudsUnder(state: Pick<FlowState, "kind" | "width" | "wallFraming">): boolean {
  return jackStudsApply(state.kind, spacingOf(state), wallOf(state) !== null);
}

/** The spacing to name in the answer line, when the member is one of many at a spacing. */
export function spacingOf(state: Pick<FlowState, "width">): number | undefined {
  return state.width.mode === "spacing" ? state.width.spacingIn : undefined;
}

export function summarize(state: FlowState, check: CheckOutput, computedAt: Date = new Date()): MemberResultSummary {
  const reactions: SummaryReaction[] = check.reactions.map((r) => ({
    x: r.x,
    type: r.type,
    maxDown: r.maxDown,
    maxDownCombination: r.maxDownCombination,
    uplift: r.uplift,
    bearing: r.bearing,
    requiredBearing: r.requiredBearing,
    jackStuds: jackStudsUnder(state) ? r.jackStuds : null,
    // handed down the load path: live load at its largest here with span-by-span placement (never the smaller full-span value)
    byCase: r.liveMax !== undefined ? { ...r.byCase, L: r.liveMax } : r.byCase,
  }));
  return {
    memberLabel: check.member.label,
    headline: check.answer,
    spec: check.member.spec,
    pass: check.pass,
    governing: check.governing,
    ratio: check.ratio,
    checks: check.checks.map((c) => ({
      name: c.name,
      ratio: c.ratio,
      demand: c.demand,
      capacity: c.capacity,
      unit: c.unit,
      combination: c.combination?.name ?? null,
    })),
    reactions,
    spanFt: mainSpanFt(state),
    lengthFt: state.lengthFt,
    tables: check.tables,
    rules: check.rules,
    computedAt: computedAt.toISOString(),
    loadStandard: check.loadStandard,
    facts: answerFacts(check),
  };
}

/**
 * The span as a builder says it: "10' 0" span", "spans 7' 0" + 5' 0"", "12' 0" span with 2' 0" overhang",
 * "12' 0" span with 2' 0" overhang each end", "12' 0" span with overhangs 2' 0" left, 1' 6" right";
 * on a single support, "6' 0" cantilever".
 */
export function spanWords(state: FlowState): string {
  const spans = spansFt(state);
  if (spans.length === 0) {
    const hang = overhangs(state);
    const arms = [hang.left, hang.right].filter((h) => h > 1e-9);
    return arms.length > 1 ? `cantilevers ${arms.map(formatFeetInches).join(" + ")}` : `${formatFeetInches(state.lengthFt)} cantilever`;
  }
  const main = spans.length > 1 ? `spans ${spans.map(formatFeetInches).join(" + ")}` : `${formatFeetInches(spans[0])} span`;
  const { left, right } = overhangs(state);
  const hasLeft = left > 1e-9;
  const hasRight = right > 1e-9;
  if (hasLeft && hasRight) {
    const l = formatFeetInches(left);
    const r = formatFeetInches(right);
    return l === r ? `${main} with ${l} overhang each end` : `${main} with overhangs ${l} left, ${r} right`;
  }
  if (hasLeft || hasRight) return `${main} with ${formatFeetInches(hasLeft ? left : right)} overhang`;
  return main;
}

/** "Changed since you last looked: now 3-ply 2x12 No.2 …, was … — J1 deck joists changed", as the job page and the crew link say it; null when nothing changed. */
export function changeWords(s: Pick<MemberResultSummary, "change" | "memberLabel" | "pass">): string | null {
  if (!s.change) return null;
  return `Changed since you last looked: now ${s.memberLabel}${s.pass ? "" : " (does NOT pass)"}, was ${s.change.was} — ${s.change.reason}`;
}
