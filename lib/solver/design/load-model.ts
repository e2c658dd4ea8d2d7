/**
 * The analysis behind the design checks, built once per layout and load set and shared by every
 * candidate member: each load case (and, for pattern live load, each region's live load) is analyzed
 * once with a reference stiffness, and every combination is formed by superposition. The member's
 * own weight is a separate unit load, scaled per candidate; deflections scale with EI_REF/(E'·I).
 *
 * Pattern live load (ASCE 7 §4.3.3, 7-16 and 7-22 alike): at each station the live load of a region is counted where
 * it makes that station's value worse, which is the worst of every on/off arrangement of the regions.
 *
 * Units: x in ft, V and reactions in lb, M in lb-ft, deflection in in (positive down), as in the solver.
 */
import { makeAnalysis, prepareBeam, respond, type PreparedBeam } from "../beam";
import { LOAD_CASES, type Combination, type Load, type LoadCase, type NamedCombination, type Support } from "../types";

/** reference stiffness of the shared analyses: E psi and I in^4 */
export const E_REF = 1_000_000;
export const I_REF = 1000;

export interface ModelRegion {
  from: number;
  to: number;
  kind: "span" | "overhang-left" | "overhang-right";
  length: number;
  /** station index range, inclusive */
  i0: number;
  i1: number;
}

/**
 * A length of the member between lateral braces of one edge, checked against the moment that puts
 * that edge in compression: the top edge against moment that sags, the bottom edge against moment
 * that hogs (over an interior support, along an overhang, or under uplift).
 *
 * Top edge: braced continuously (unbraced length 0: sheathing or decking fastened along it) or at
 * the supports and at braces every unbracedFt. With braces at a spacing that does not divide a
 * region, the segment of that length is tried at several places along the region (where the braces
 * fall is not known): the checks take the worst placement.
 *
 * Bottom edge: sheathing, decking and top-edge braces do not hold it, so it is braced only at the
 * supports (one segment per region; an overhang's free end is not braced), unless the input says
 * it is braced along its length (a ceiling fastened directly to it).
 */
export interface BendingSegment {
  from: number;
  to: number;
  region: number;
  /** the edge this segment is about: "top" checks moment that sags, "bottom" moment that hogs */
  edge: "top" | "bottom";
  /** unbraced length of that edge, ft (0 when continuously braced) */
  luFt: number;
  /** free end of an overhang: Cb = 1.0 (AISC 360-16 §F1) */
  cantilever: boolean;
  i0: number;
  i1: number;
  /** stations at the quarter, middle and three-quarter points */
  iA: number;
  iB: number;
  iC: number;
}

export interface CaseArrays {
  M: Float64Array;
  V: Float64Array;
  D: Float64Array;
  /** reaction F per support, lb (up positive) */
  R: Float64Array;
}

export interface ComboEnvelope {
  name: string;
  factors: Combination;
  /** factor on dead load, applied to the member's own weight */
  fD: number;
  Mmax: Float64Array;
  Mmin: Float64Array;
  Vmax: Float64Array;
  Vmin: Float64Array;
  Dmax: Float64Array;
  Dmin: Float64Array;
  Rmax: Float64Array;
  Rmin: Float64Array;
}

export interface LoadModel {
  length: number;
  supports: Support[];
  xs: Float64Array;
  regions: ModelRegion[];
  segments: BendingSegment[];
  /** cases with at least one load (D always) */
  cases: LoadCase[];
  patterned: boolean;
  /** per case, every load of the case at factor 1 (no self-weight) */
  perCase: Partial<Record<LoadCase, CaseArrays>>;
  /** 1 plf of dead load over the whole member */
  selfWeight: CaseArrays;
  envelopes(combos: NamedCombination[]): ComboEnvelope[];
  /** stand-ins for "no moment of this sign" (−∞ as a max, +∞ as a min), for peakOnEdge */
  noMoment: { hi: Float64Array; lo: Float64Array };
}

export interface LoadModelInput {
  length: number;
  supports: Support[];
  loads: (Load & { case: LoadCase })[];
  /** top edge's brace spacing, ft; 0 = continuously braced */
  unbracedFt: number;
  /** bottom edge braced along its length (a ceiling fastened directly to it); otherwise only at the supports */
  bottomBraced?: boolean;
  /** split live load by region for pattern loading */
  pattern: boolean;
  /** stations per region */
  stationsPerRegion?: number;
  /** where the member's own weight (1 plf, dead) lies, ft; default the whole member */
  selfWeightSpans?: [number, number][];
  /** further stations to evaluate exactly, ft (e.g. shear sections at d from a support face) */
  extraStations?: number[];
  /** loads the caller derived from the user's (pieces of a cut load), not counted against the user's limit */
  internalLoads?: number;
}

/** How many places an unbraced segment shorter than its region is tried at (evenly, both ends included). */
export const BRACE_PLACEMENTS = 16;

function arraysOf(prep: PreparedBeam, xs: Float64Array, weights: Float64Array): CaseArrays {
  const resp = respond(prep, weights);
  const a = makeAnalysis(prep, resp).evaluateMany(xs);
  const R = new Float64Array(prep.supports.length);
  for (let i = 0; i < R.length; i++) R[i] = resp.reactions[2 * i];
  return { M: a.M, V: a.V, D: a.deflection, R };
}

function zeros(n: number, ns: number): CaseArrays {
  return { M: new Float64Array(n), V: new Float64Array(n), D: new Float64Array(n), R: new Float64Array(ns) };
}

function nearestIndex(xs: Float64Array, x: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] < x) lo = mid;
    else hi = mid;
  }
  return Math.abs(xs[lo] - x) <= Math.abs(xs[hi] - x) ? lo : hi;
}

export function buildLoadModel(input: LoadModelInput): LoadModel {
  const { length: L, supports } = input;
  const swSpans = (input.selfWeightSpans ?? [[0, L]]).filter(([a, b]) => b - a > 1e-9 * Math.max(L, 1));
  const swFirst = input.loads.length;
  const isSelfWeight = (source: number) => source >= swFirst;
  const loads: Load[] = [...input.loads, ...swSpans.map(([from, to]): Load => ({ type: "udl", from, to, w: 1, case: "D" }))];
  const prep = prepareBeam({ length: L, E: E_REF, I: I_REF, supports, loads }, swSpans.length + (input.internalLoads ?? 0));
  const eps = Math.max(1e-7 * L, 1e-9);
  const perRegion = input.stationsPerRegion ?? 48;

  // Bending segments. Top edge: supports brace it; braces every unbracedFt in between are checked at
  // the spacing given, the segment slid along the region (its worst place governs). Bottom edge: braced
  // at the supports only (or along its length when the input says so), one segment per region. In an
  // overhang every segment takes Cb = 1.0 (free end, AISC 360-16 §F1).
  const rawSegs: { from: number; to: number; region: number; edge: "top" | "bottom"; luFt: number; cantilever: boolean }[] = [];
  prep.regions.forEach((r, ri) => {
    const len = r.to - r.from;
    const lb = input.unbracedFt;
    const cantilever = r.kind !== "span";
    if (lb <= 0 || lb >= len - 1e-9 * Math.max(L, 1)) {
      rawSegs.push({ from: r.from, to: r.to, region: ri, edge: "top", luFt: lb > 0 ? len : 0, cantilever });
    } else {
      for (let k = 0; k <= BRACE_PLACEMENTS; k++) {
        const from = r.from + ((len - lb) * k) / BRACE_PLACEMENTS;
        rawSegs.push({ from, to: from + lb, region: ri, edge: "top", luFt: lb, cantilever });
      }
    }
    rawSegs.push({ from: r.from, to: r.to, region: ri, edge: "bottom", luFt: input.bottomBraced ? 0 : len, cantilever });
  });

  const pts: number[] = [0, L];
  for (const p of prep.bp) {
    if (p - eps > 0) pts.push(p - eps);
    if (p + eps < L) pts.push(p + eps);
  }
  for (const r of prep.regions) {
    for (let k = 1; k < perRegion; k++) pts.push(r.from + ((r.to - r.from) * k) / perRegion);
  }
  for (const s of rawSegs) {
    for (const f of [0.25, 0.5, 0.75]) pts.push(s.from + (s.to - s.from) * f);
    if (s.from - eps > 0) pts.push(s.from + eps);
    if (s.to + eps < L) pts.push(s.to - eps);
  }
  for (const x of input.extraStations ?? []) if (x >= 0 && x <= L) pts.push(x);
  pts.sort((a, b) => a - b);
  const uniq: number[] = [];
  for (const p of pts) if (uniq.length === 0 || p - uniq[uniq.length - 1] > eps / 4) uniq.push(p);
  const xs = Float64Array.from(uniq);
  const n = xs.length;

  const rangeOf = (from: number, to: number): [number, number] => {
    let i0 = 0;
    while (i0 < n - 1 && xs[i0] < from - eps / 2) i0++;
    let i1 = n - 1;
    while (i1 > 0 && xs[i1] > to + eps / 2) i1--;
    return [i0, i1];
  };
  const regions: ModelRegion[] = prep.regions.map((r) => {
    const [i0, i1] = rangeOf(r.from, r.to);
    return { from: r.from, to: r.to, kind: r.kind, length: r.to - r.from, i0, i1 };
  });
  const segments: BendingSegment[] = rawSegs.map((s) => {
    const [i0, i1] = rangeOf(s.from, s.to);
    const q = (f: number) => nearestIndex(xs, s.from + (s.to - s.from) * f);
    return { ...s, i0, i1, iA: q(0.25), iB: q(0.5), iC: q(0.75) };
  });

  const np = prep.pieces.length;
  const ns = supports.length;
  const present = new Set<LoadCase>(["D"]);
  for (const l of input.loads) present.add(l.case);
  const cases = LOAD_CASES.filter((c) => present.has(c));

  const pieceWeights = (pick: (i: number) => boolean) => {
    const w = new Float64Array(np);
    for (let i = 0; i < np; i++) w[i] = pick(i) ? 1 : 0;
    return w;
  };
  const perCase: Partial<Record<LoadCase, CaseArrays>> = {};
  for (const c of cases) {
    const w = pieceWeights((i) => !isSelfWeight(prep.pieces[i].source) && prep.pieces[i].loadCase === c);
    perCase[c] = w.some((v) => v !== 0) ? arraysOf(prep, xs, w) : zeros(n, ns);
  }
  const swWeights = pieceWeights((i) => isSelfWeight(prep.pieces[i].source));
  const selfWeight = swWeights.some((v) => v !== 0) ? arraysOf(prep, xs, swWeights) : zeros(n, ns);

  const patterned = input.pattern && prep.regions.length > 1 && present.has("L");
  const liveByRegion: CaseArrays[] = [];
  if (patterned) {
    prep.regions.forEach((_, ri) => {
      const w = pieceWeights((i) => !isSelfWeight(prep.pieces[i].source) && prep.pieces[i].loadCase === "L" && prep.pieces[i].region === ri);
      if (w.some((v) => v !== 0)) liveByRegion.push(arraysOf(prep, xs, w));
    });
  }

  function envelopes(combos: NamedCombination[]): ComboEnvelope[] {
    return combos.map((combo) => {
      const buf = new Float64Array(6 * n + 2 * ns);
      const env: ComboEnvelope = {
        name: combo.name,
        factors: combo.factors,
        fD: combo.factors.D ?? 0,
        Mmax: buf.subarray(0, n),
        Mmin: buf.subarray(n, 2 * n),
        Vmax: buf.subarray(2 * n, 3 * n),
        Vmin: buf.subarray(3 * n, 4 * n),
        Dmax: buf.subarray(4 * n, 5 * n),
        Dmin: buf.subarray(5 * n, 6 * n),
        Rmax: buf.subarray(6 * n, 6 * n + ns),
        Rmin: buf.subarray(6 * n + ns, 6 * n + 2 * ns),
      };
      for (const c of cases) {
        const f = combo.factors[c] ?? 0;
        if (f === 0) continue;
        if (c === "L" && patterned) for (const a of liveByRegion) addPattern(env, a, f, n, ns);
        else addFixed(env, perCase[c] as CaseArrays, f, n, ns);
      }
      return env;
    });
  }

  const noMoment = { hi: new Float64Array(n).fill(-Infinity), lo: new Float64Array(n).fill(Infinity) };
  return { length: L, supports, xs, regions, segments, cases, patterned, perCase, selfWeight, envelopes, noMoment };
}

function addFixed(env: ComboEnvelope, a: CaseArrays, f: number, n: number, ns: number): void {
  for (let i = 0; i < n; i++) {
    const m = f * a.M[i];
    const v = f * a.V[i];
    const d = f * a.D[i];
    env.Mmax[i] += m;
    env.Mmin[i] += m;
    env.Vmax[i] += v;
    env.Vmin[i] += v;
    env.Dmax[i] += d;
    env.Dmin[i] += d;
  }
  for (let j = 0; j < ns; j++) {
    env.Rmax[j] += f * a.R[j];
    env.Rmin[j] += f * a.R[j];
  }
}

/** A region's live load counts where it makes the value larger (max) or smaller (min). */
function addPattern(env: ComboEnvelope, a: CaseArrays, f: number, n: number, ns: number): void {
  for (let i = 0; i < n; i++) {
    const m = f * a.M[i];
    const v = f * a.V[i];
    const d = f * a.D[i];
    if (m > 0) env.Mmax[i] += m;
    else env.Mmin[i] += m;
    if (v > 0) env.Vmax[i] += v;
    else env.Vmin[i] += v;
    if (d > 0) env.Dmax[i] += d;
    else env.Dmin[i] += d;
  }
  for (let j = 0; j < ns; j++) {
    const r = f * a.R[j];
    if (r > 0) env.Rmax[j] += r;
    else env.Rmin[j] += r;
  }
}

export interface Peak {
  /** largest absolute value, sign dropped */
  value: number;
  x: number;
  /** index of the station it was found at */
  i: number;
}

/**
 * Largest |base + k·unit| over stations i0..i1, where base is the envelope's max (hi) or min (lo)
 * array; refined by the vertex of a parabola through the neighbouring stations (exact for the
 * quadratic moment under uniform load).
 */
export function peakAbs(xs: Float64Array, hi: Float64Array, lo: Float64Array, unit: Float64Array, k: number, i0: number, i1: number, refine = true): Peak {
  let best = -1;
  let bi = i0;
  let useHi = true;
  for (let i = i0; i <= i1; i++) {
    const a = hi[i] + k * unit[i];
    const b = -(lo[i] + k * unit[i]);
    if (a > best) {
      best = a;
      bi = i;
      useHi = true;
    }
    if (b > best) {
      best = b;
      bi = i;
      useHi = false;
    }
  }
  let x = xs[bi];
  if (refine && bi > i0 && bi < i1) {
    const x0 = xs[bi - 1];
    const x1 = xs[bi];
    const x2 = xs[bi + 1];
    const minGap = 1e-4 * (xs[xs.length - 1] - xs[0]);
    if (x1 - x0 > minGap && x2 - x1 > minGap) {
      const y0 = useHi ? hi[bi - 1] + k * unit[bi - 1] : -(lo[bi - 1] + k * unit[bi - 1]);
      const y1 = best;
      const y2 = useHi ? hi[bi + 1] + k * unit[bi + 1] : -(lo[bi + 1] + k * unit[bi + 1]);
      const d1 = (y1 - y0) / (x1 - x0);
      const d2 = (y2 - y1) / (x2 - x1);
      const c2 = (d2 - d1) / (x2 - x0);
      if (c2 < 0) {
        // Newton form p(x) = y0 + d1 (x − x0) + c2 (x − x0)(x − x1); p'(x*) = 0
        const vertexX = (x0 + x1) / 2 - d1 / (2 * c2);
        if (vertexX > x0 && vertexX < x2) {
          const yv = y0 + d1 * (vertexX - x0) + c2 * (vertexX - x0) * (vertexX - x1);
          if (yv > best && yv < best * 1.05 + 1e-12) {
            best = yv;
            x = vertexX;
          }
        }
      }
    }
  }
  return { value: Math.max(best, 0), x, i: bi };
}

/**
 * Largest moment over a bending segment that puts the segment's edge in compression, with the
 * member's own weight (k × unit) added: moment that sags for the top edge, moment that hogs for
 * the bottom edge (value positive either way, 0 when the segment has none of that sign).
 */
export function peakOnEdge(model: LoadModel, env: ComboEnvelope, k: number, seg: BendingSegment): Peak {
  return seg.edge === "top"
    ? peakAbs(model.xs, env.Mmax, model.noMoment.lo, model.selfWeight.M, k, seg.i0, seg.i1)
    : peakAbs(model.xs, model.noMoment.hi, env.Mmin, model.selfWeight.M, k, seg.i0, seg.i1);
}

/**
 * A moment below which an edge is not taken to be in compression: a millionth of the largest moment
 * over the member and the given combinations (the supports of a simple span read ±1e-12, not 0).
 */
export function momentNoise(model: LoadModel, envs: ComboEnvelope[], swPlf: number): number {
  let top = 0;
  for (const env of envs) {
    const p = peakAbs(model.xs, env.Mmax, env.Mmin, model.selfWeight.M, env.fD * swPlf, 0, model.xs.length - 1, false);
    if (p.value > top) top = p.value;
  }
  return 1e-6 * top;
}

/** Whether any of the given combinations makes the member hog anywhere (so its bottom edge is in compression somewhere). */
export function hogsAnywhere(model: LoadModel, envs: ComboEnvelope[], swPlf: number): boolean {
  const noise = momentNoise(model, envs, swPlf);
  return envs.some((env) => env.Mmin.some((m, i) => m + env.fD * swPlf * model.selfWeight.M[i] < -noise));
}
