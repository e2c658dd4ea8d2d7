/**
 * The sizing flow's state: everything the user has told us, in the trade's units (lengths in ft,
 * spacing and bearing in in, area loads in psf, line loads in plf, point loads in lb). It is the
 * whole input of a member: it lives in the URL and local storage while the flow is open and is
 * saved as a member's `flowState` in a job. Pure: no React, no I/O.
 */
import type { FlowState } from "./schema";
import type { WallFraming } from "@/lib/solver/design/kinds";
import type { SupportType } from "@/lib/solver/types";

/** The longest member the flow takes, ft (the solver's limit). */
export const MAX_LENGTH_FT = 200;

export { KIND_LABELS, MEMBER_KINDS, type MemberKind } from "@/lib/solver/design/kinds";

/**
 * The support types in words: the textbook name (pinned, on rollers, fixed) with what it means on site, in our
 * own words. `short` goes in lists and sheets ("pinned at 0' 0\""), `site` beside it where there is room.
 */
export const SUPPORT_WORDS: Readonly<Record<SupportType, { name: string; short: string; site: string }>> = {
  pin: { name: "Pinned", short: "pinned", site: "bears on a post or wall and cannot slide off it" },
  roller: { name: "On rollers", short: "on rollers", site: "rests on its bearing, free to slide along it" },
  fixed: { name: "Fixed", short: "fixed", site: "built in at the end, so it cannot turn" },
};

export const FLOW_STEPS = ["kind", "span", "loads", "material", "answer"] as const;
export type FlowStepId = (typeof FLOW_STEPS)[number];
export const STEP_TITLES: Readonly<Record<FlowStepId, string>> = {
  kind: "What are you sizing?",
  span: "Span and supports",
  loads: "Loads",
  material: "Material",
  answer: "Answer",
};

/**
 * The state's parts, inferred from the schema (lib/flow/schema.ts) so the type and the check of what
 * comes from outside cannot drift apart. Units: lengths and positions in ft, spacing and bearing in in,
 * area loads in psf, line loads in plf, point loads in lb (downward), deflection limits as n of L/n.
 */
export type { FlowState } from "./schema";
export type FlowSupport = FlowState["supports"][number];
/** Joists share a floor by their spacing (in); beams and headers carry a tributary width (ft). */
export type FlowWidth = FlowState["width"];
export type FlowAreaLoad = FlowState["areaLoads"][number];
/** Roof snow from ground snow by ASCE 7 Chapter 7's flat-roof path, carried over the width. */
export type FlowSnow = FlowState["snow"];
export type FlowPointLoad = FlowState["pointLoads"][number];
/** A uniform line load over all or part of the member (a wall on it, a partial load). */
export type FlowLineLoad = FlowState["lineLoads"][number];
export type FlowMaterial = FlowState["material"];
export type FlowLimits = FlowState["limits"];

export const MATERIAL_FAMILIES = ["any", "sawn", "built-up", "engineered", "ijoist", "steel", "cfs"] as const;
export type MaterialFamily = (typeof MATERIAL_FAMILIES)[number];

/** The wall a member of this state must fit, or null. */
export function wallOf(state: Pick<FlowState, "kind" | "wallFraming">): WallFraming | null {
  const w = state.wallFraming ?? (state.kind === "header" ? "2x4" : "none");
  return w === "none" ? null : w;
}

/** The span a rough opening gives: the opening plus half the bearing at each end, ft. */
export function spanFromRoughOpeningFt(openingFt: number, bearingIn: number): number {
  return openingFt + bearingIn / 12;
}

/** Where the flow is: the state plus the step on screen. */
export interface FlowLocation {
  state: FlowState;
  step: FlowStepId;
}

let counter = 0;
/** A short id for a load row: unique within one state, stable across reloads once stored. */
export function newLoadId(prefix: string): string {
  counter += 1;
  return `${prefix}${Date.now().toString(36)}${counter.toString(36)}`;
}

/** The span between the first two supports (the clear span a builder measures), ft. */
export function mainSpanFt(state: FlowState): number {
  const xs = sortedSupports(state.supports).map((s) => s.x);
  if (xs.length < 2) return state.lengthFt;
  return xs[1] - xs[0];
}

export function sortedSupports(supports: readonly FlowSupport[]): FlowSupport[] {
  return [...supports].sort((a, b) => a.x - b.x);
}

/** Overhang past the first support (left) and past the last one (right), ft. */
export function overhangs(state: FlowState): { left: number; right: number } {
  const xs = sortedSupports(state.supports).map((s) => s.x);
  if (xs.length === 0) return { left: 0, right: 0 };
  return { left: xs[0], right: state.lengthFt - xs[xs.length - 1] };
}

/** The spans between consecutive supports, ft. */
export function spansFt(state: FlowState): number[] {
  const xs = sortedSupports(state.supports).map((s) => s.x);
  const spans: number[] = [];
  for (let i = 1; i < xs.length; i++) spans.push(xs[i] - xs[i - 1]);
  return spans;
}

/**
 * Sets the span between the first two supports, keeping the overhangs and moving every support and
 * load to the right of the second support by the same amount.
 */
export function withMainSpan(state: FlowState, spanFt: number): FlowState {
  const sorted = sortedSupports(state.supports);
  if (sorted.length < 2) {
    return {
      ...state,
      lengthFt: spanFt,
      supports: [
        { x: 0, type: "pin" },
        { x: spanFt, type: "roller" },
      ],
    };
  }
  const delta = spanFt - (sorted[1].x - sorted[0].x);
  const pivot = sorted[1].x;
  const shift = (x: number) => (x >= pivot - 1e-9 ? x + delta : x);
  return {
    ...state,
    lengthFt: state.lengthFt + delta,
    supports: state.supports.map((s) => ({ ...s, x: shift(s.x) })),
    pointLoads: state.pointLoads.map((p) => ({ ...p, x: clamp(shift(p.x), 0, state.lengthFt + delta) })),
    lineLoads: keepOnMember(state.lineLoads.map((l) => fitLine(l, state.lengthFt, state.lengthFt + delta))),
  };
}

/** Sets the overhang past the last support (right) or before the first (left), ft. */
export function withOverhang(state: FlowState, side: MemberEnd, overhangFt: number): FlowState {
  const sorted = sortedSupports(state.supports);
  if (sorted.length === 0) return state;
  if (side === "right") {
    const newLength = sorted[sorted.length - 1].x + overhangFt;
    return {
      ...state,
      lengthFt: newLength,
      pointLoads: state.pointLoads.map((p) => ({ ...p, x: clamp(p.x, 0, newLength) })),
      lineLoads: keepOnMember(state.lineLoads.map((l) => fitLine(l, state.lengthFt, newLength))),
    };
  }
  const delta = overhangFt - sorted[0].x;
  const newLength = state.lengthFt + delta;
  return {
    ...state,
    lengthFt: newLength,
    supports: state.supports.map((s) => ({ ...s, x: s.x + delta })),
    pointLoads: state.pointLoads.map((p) => ({ ...p, x: clamp(p.x + delta, 0, newLength) })),
    lineLoads: keepOnMember(
      state.lineLoads.map((l) => {
        const wasFull = l.from <= 1e-9 && l.to >= state.lengthFt - 1e-9;
        return wasFull ? { ...l, from: 0, to: newLength } : { ...l, from: clamp(l.from + delta, 0, newLength), to: clamp(l.to + delta, 0, newLength) };
      }),
    ),
  };
}

export type MemberEnd = "left" | "right";

/** The overhang a tap adds: 2 ft, a usual deck joist overhang and inside a quarter of a 12 ft back span (common practice). */
export const DEFAULT_OVERHANG_FT = 2;

/** How close a moved support may come to its neighbor, ft (1 in): two supports at one point are refused by the solver. */
export const SUPPORT_GAP_FT = 1 / 12;

/** The longest overhang an end can take before the whole member passes MAX_LENGTH_FT, ft. */
export function maxOverhangFt(state: FlowState, end: MemberEnd): number {
  if (state.supports.length === 0) return 0;
  return Math.max(0, MAX_LENGTH_FT - (state.lengthFt - overhangs(state)[end]));
}

/**
 * Gives one end an overhang of `lengthFt` (to the nearest 1/16 in, at most maxOverhangFt) by lengthening the
 * member past its end support. Supports and loads keep their places on the rest of the member; for a left
 * overhang every position moves right by the overhang, as it is measured from the new left end. An overhang
 * already there takes the new length. Example: a 12 ft simple span, addOverhang(s, "right", 2) → a 14 ft
 * member on supports at 0 and 12 ft.
 */
export function addOverhang(state: FlowState, end: MemberEnd, lengthFt: number = DEFAULT_OVERHANG_FT): FlowState {
  if (state.supports.length === 0 || !Number.isFinite(lengthFt) || lengthFt <= 0) return state;
  return withOverhang(state, end, clamp(snapFt(lengthFt), 0, maxOverhangFt(state, end)));
}

/** Cuts the member off at its end support, so that end has no overhang: a line load only on the overhang goes, a post on it moves to the new end. */
export function removeOverhang(state: FlowState, end: MemberEnd): FlowState {
  return withOverhang(state, end, 0);
}

/** Where a support may go, ft from the left end: on the member and at least SUPPORT_GAP_FT from either neighbor. */
export function supportRange(state: FlowState, index: number): { min: number; max: number } {
  const here = state.supports[index];
  if (!here) return { min: 0, max: state.lengthFt };
  const others = state.supports.filter((_, i) => i !== index).map((s) => s.x);
  const before = others.filter((x) => x <= here.x);
  const after = others.filter((x) => x > here.x);
  const min = before.length > 0 ? Math.max(...before) + SUPPORT_GAP_FT : 0;
  const max = after.length > 0 ? Math.min(...after) - SUPPORT_GAP_FT : state.lengthFt;
  return { min: clamp(min, 0, state.lengthFt), max: clamp(max, 0, state.lengthFt) };
}

/**
 * Moves one support (by its index in state.supports) to `x` ft from the left end, to the nearest 1/16 in. It
 * stays on the member and does not pass or touch a neighbor; the member's length does not change, so moving an
 * end support inward makes an overhang.
 */
export function moveSupport(state: FlowState, index: number, x: number): FlowState {
  if (!state.supports[index] || !Number.isFinite(x)) return state;
  const { min, max } = supportRange(state, index);
  if (min > max) return state;
  const to = clamp(snapFt(x), min, max);
  return { ...state, supports: state.supports.map((s, i) => (i === index ? { ...s, x: to } : s)) };
}

function fitLine(l: FlowLineLoad, oldLength: number, newLength: number): FlowLineLoad {
  const wasFull = l.from <= 1e-9 && l.to >= oldLength - 1e-9;
  if (wasFull) return { ...l, from: 0, to: newLength };
  return { ...l, from: clamp(l.from, 0, newLength), to: clamp(l.to, 0, newLength) };
}

/** Line loads left with no length (they were only on a part of the member that was cut off) are dropped. */
function keepOnMember(lines: FlowLineLoad[]): FlowLineLoad[] {
  return lines.filter((l) => l.to - l.from > 1e-9);
}

export function clamp(x: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, x));
}

/** Rounds a position to the nearest 1/16 in, as a tape reads. */
export function snapFt(x: number): number {
  return Math.round(x * 12 * 16) / (12 * 16);
}
