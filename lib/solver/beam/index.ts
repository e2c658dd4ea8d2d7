/**
 * Spanlark's exact beam analysis (issue 3): a straight Euler–Bernoulli member with constant EI,
 * any number of pin, roller and fixed supports, and point, uniform, linearly varying and couple loads.
 *
 * ## Sign convention (stated once, here)
 * x runs from the left end of the member, in ft.
 * - Loads: P, w, w1, w2 are positive downward; an applied couple M is positive clockwise.
 * - Reactions: F is positive upward; a reaction M is positive clockwise, like applied couples
 *   (0 at a pin or roller).
 * - Shear V is positive when the forces to the left of the cut add up to an upward resultant.
 * - Moment M is positive when sagging (compression at the top).
 * - Deflection is positive downward, in inches; slope is positive clockwise (deflection growing
 *   to the right), in radians.
 * - At a station where V or M jumps, the value just to the right is reported (at the right end,
 *   the value just to the left). Two positions closer than 1e-9 of the length are one point.
 *
 * Worked example: a 10 ft simple span (pin at 0, roller at 10) with P = 1000 lb down at 4 ft.
 * Reactions F = +600 lb at 0 and +400 lb at 10 (both up, M = 0). V = +600 lb left of the load and
 * −400 lb right of it, so evaluate(4).V = −400. M rises to +2400 lb-ft (sagging) at 4 ft. The beam
 * deflects down (positive deflection); the slope is positive at 0 (the deflection grows to the
 * right, the end turns clockwise) and negative at 10.
 * A clockwise couple of 500 lb-ft at 4 ft instead makes M step up by 500 lb-ft there.
 *
 * Internal units are lb and ft (EI = E·I/144 in lb·ft²); deflection is converted to inches at the
 * edge. Loads with no case count as dead load (D).
 */
import type { BeamInput, Combination, LoadCase, Reaction, Station } from "../types";
import { makeAnalysis, type BeamAnalysis, type BeamExtremes, type Segment, type SpanResult } from "./analysis";
import { ANALYSIS_NOT_CHECKED as NOT_CHECKED, CAUTION } from "@/lib/caution";
import { BeamInputError } from "./errors";
import { prepareBeam, respond, type PreparedBeam } from "./prepare";

export type { BeamAnalysis, BeamExtremes, Segment, SpanResult, StationArrays } from "./analysis";
export { BeamInputError, BeamInstabilityError, type InputIssue } from "./errors";
export { LIMITS, geometryIssues } from "./checks";
export { prepareBeam, respond, combineResponses, type PreparedBeam, type Response, type Piece, type Region } from "./prepare";
export { makeAnalysis } from "./analysis";

/** Weight of each load piece: its case's factor (every case 1 when no factors are given). */
export function pieceWeights(prep: PreparedBeam, factors?: Combination): Float64Array {
  const w = new Float64Array(prep.pieces.length);
  for (let i = 0; i < w.length; i++) {
    const c: LoadCase = prep.pieces[i].loadCase;
    w[i] = factors ? (factors[c] ?? 0) : 1;
  }
  return w;
}

/**
 * Analyses one beam. `factors` scales each load by its case's factor (a case left out counts 0);
 * without it every load counts once. Throws BeamInputError (a field and its reason) or
 * BeamInstabilityError (why the supports cannot hold the beam, and what to add). `internalLoads`
 * counts loads the caller added itself (a member's own weight), which the load limit does not count.
 */
export function analyzeBeam(input: BeamInput, factors?: Combination, internalLoads = 0): BeamAnalysis {
  const prep = prepareBeam(input, internalLoads);
  return makeAnalysis(prep, respond(prep, pieceWeights(prep, factors)));
}

/** The JSON answer of `npm run solve` and POST /api/solve. */
export interface SolveOutput {
  units: { x: "ft"; F: "lb"; V: "lb"; M: "lb-ft"; slope: "rad"; deflection: "in" };
  reactions: Reaction[];
  at: Station[];
  extremes: BeamExtremes;
  spans: SpanResult[];
  segments: Segment[];
  notChecked: string;
  caution: string;
}

function allFinite(v: unknown): boolean {
  if (typeof v === "number") return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allFinite);
  if (v && typeof v === "object") return Object.values(v).every(allFinite);
  return true;
}

/** Every load with factor 1, whatever its case; stations in the order of input.at. */
export function solve(input: BeamInput): SolveOutput {
  const a = analyzeBeam(input);
  const out: SolveOutput = {
    units: { x: "ft", F: "lb", V: "lb", M: "lb-ft", slope: "rad", deflection: "in" },
    reactions: a.reactions,
    at: (input.at ?? []).map((x) => a.evaluate(x)),
    extremes: a.extremes,
    spans: a.spans,
    segments: a.segments,
    notChecked: NOT_CHECKED,
    caution: CAUTION,
  };
  if (!allFinite(out)) {
    throw new BeamInputError([{ path: "E", message: "the results are too large to represent — check the units of E (psi), I (in^4) and the loads" }]);
  }
  return out;
}
