/**
 * The results of one analysis, read from the field of exact polynomial pieces built by respond().
 * Extremes come from the roots of the pieces' derivatives (plus the piece ends), never from sampling.
 */
import type { Extreme, Reaction, Station } from "../types";
import { BeamInputError } from "./errors";
import { polyAt, quadraticRootsIn, rootsFromCritical, bracketedRoot } from "./poly";
import { OFF_D, OFF_M, OFF_S, OFF_V, STRIDE, type PreparedBeam, type RegionKind, type Response } from "./prepare";

/** One exact polynomial piece between two breakpoints; coefficients in ξ = x − x0 (ft), ascending powers. */
export interface Segment {
  x0: number;
  x1: number;
  /** lb */
  V: number[];
  /** lb-ft */
  M: number[];
  /** rad */
  slope: number[];
  /** in (ξ still in ft) */
  deflection: number[];
}

export interface SpanResult {
  from: number;
  to: number;
  kind: RegionKind;
  /** ft */
  length: number;
  Mpos: Extreme;
  Mneg: Extreme;
  /** largest |δ| in the span, sign kept, in */
  deflection: Extreme;
  /** length·12/|δ| (span/deflection), null when δ is 0 */
  ratio: number | null;
}

export interface BeamExtremes {
  /** largest M (sagging positive), lb-ft */
  Mpos: Extreme;
  /** smallest M (most hogging), lb-ft */
  Mneg: Extreme;
  /** largest |V|, sign kept, lb (either side of a jump) */
  Vabs: Extreme;
  /** largest deflection (down), in; 0 or more since supports do not move */
  deflDown: Extreme;
  /** smallest deflection (most upward), in; 0 or less */
  deflUp: Extreme;
  /** ft, where V changes sign (inside a piece or across a step) */
  zeroShear: number[];
  /** ft, where M changes sign */
  inflection: number[];
}

/** Station values as parallel arrays, for many stations without an object per station. */
export interface StationArrays {
  x: Float64Array;
  V: Float64Array;
  M: Float64Array;
  slope: Float64Array;
  deflection: Float64Array;
}

export interface BeamAnalysis {
  /** in the order of input.supports */
  reactions: Reaction[];
  /** V, M, slope, deflection at x (ft); just to the right of a jump (just to the left at the right end) */
  evaluate(x: number): Station;
  /**
   * The same for many stations, written into parallel arrays; pass `out` (arrays at least
   * xs.length long, e.g. from an earlier call) to allocate nothing. Ascending stations are fastest.
   */
  evaluateMany(xs: ArrayLike<number>, out?: StationArrays): StationArrays;
  segments: Segment[];
  extremes: BeamExtremes;
  spans: SpanResult[];
  /** exact largest and smallest M on [a, b] (ft), e.g. over an unbraced length */
  momentExtremeBetween(a: number, b: number): { max: Extreme; min: Extreme };
}

const SEG_FIELDS = 10;
const scratchA: number[] = [];
const scratchB: number[] = [];
const scratchC: number[] = [];

class Analysis implements BeamAnalysis {
  readonly reactions: Reaction[];
  private readonly prep: PreparedBeam;
  private readonly field: Float64Array;
  private segCache: Segment[] | null = null;
  private extCache: BeamExtremes | null = null;
  private spanCache: SpanResult[] | null = null;
  private perSeg: number[] | null = null;

  constructor(prep: PreparedBeam, resp: Response) {
    this.prep = prep;
    this.field = resp.field;
    for (let i = 0; i < resp.field.length; i++) if (!Number.isFinite(resp.field[i])) throw overflow();
    this.reactions = prep.supports.map((s, i) => {
      const F = resp.reactions[2 * i];
      const M = resp.reactions[2 * i + 1];
      if (!Number.isFinite(F) || !Number.isFinite(M)) throw overflow();
      return { x: s.x, F, M };
    });
  }

  private segAt(x: number): number {
    const { bp, nseg, tol, length } = this.prep;
    if (!(x >= -tol && x <= length + tol)) {
      throw new RangeError(`x = ${x} ft is off the member (0 to ${length} ft)`);
    }
    let lo = 0;
    let hi = nseg - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (bp[mid] <= x + tol) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  }

  evaluate(x: number): Station {
    const s = this.segAt(x);
    const xi = Math.min(Math.max(x - this.prep.bp[s], 0), this.prep.bp[s + 1] - this.prep.bp[s]);
    const o = s * STRIDE;
    const f = this.field;
    return {
      x,
      V: polyAt(f, o + OFF_V, 2, xi),
      M: polyAt(f, o + OFF_M, 3, xi),
      slope: polyAt(f, o + OFF_S, 4, xi),
      deflection: polyAt(f, o + OFF_D, 5, xi),
    };
  }

  evaluateMany(xs: ArrayLike<number>, out?: StationArrays): StationArrays {
    const n = xs.length;
    let r = out;
    if (!r) {
      // one buffer for the five arrays: a large typed array's buffer is costly to allocate
      const buf = new Float64Array(5 * n);
      r = {
        x: buf.subarray(0, n),
        V: buf.subarray(n, 2 * n),
        M: buf.subarray(2 * n, 3 * n),
        slope: buf.subarray(3 * n, 4 * n),
        deflection: buf.subarray(4 * n),
      };
    }
    const f = this.field;
    const { bp, nseg, tol } = this.prep;
    const X = r.x;
    const Vo = r.V;
    const Mo = r.M;
    const So = r.slope;
    const Do = r.deflection;
    let s = 0;
    for (let i = 0; i < n; i++) {
      const x = xs[i];
      // stations in ascending order walk forward from the last piece; others (and bad x) search
      if (!(x >= bp[s] - tol && x <= bp[s + 1] + tol)) s = this.segAt(x);
      while (s + 1 < nseg && bp[s + 1] <= x + tol) s++;
      let xi = x - bp[s];
      if (xi < 0) xi = 0;
      const o = s * STRIDE;
      X[i] = x;
      Vo[i] = f[o] + xi * (f[o + 1] + xi * f[o + 2]);
      Mo[i] = f[o + 3] + xi * (f[o + 4] + xi * (f[o + 5] + xi * f[o + 6]));
      So[i] = f[o + 7] + xi * (f[o + 8] + xi * (f[o + 9] + xi * (f[o + 10] + xi * f[o + 11])));
      Do[i] = f[o + 12] + xi * (f[o + 13] + xi * (f[o + 14] + xi * (f[o + 15] + xi * (f[o + 16] + xi * f[o + 17]))));
    }
    return r;
  }

  get segments(): Segment[] {
    if (this.segCache) return this.segCache;
    const { bp, nseg } = this.prep;
    const f = this.field;
    const segs: Segment[] = [];
    for (let s = 0; s < nseg; s++) {
      const o = s * STRIDE;
      segs.push({
        x0: bp[s],
        x1: bp[s + 1],
        V: Array.from(f.subarray(o + OFF_V, o + OFF_V + 3)),
        M: Array.from(f.subarray(o + OFF_M, o + OFF_M + 4)),
        slope: Array.from(f.subarray(o + OFF_S, o + OFF_S + 5)),
        deflection: Array.from(f.subarray(o + OFF_D, o + OFF_D + 6)),
      });
    }
    this.segCache = segs;
    return segs;
  }

  /** Per segment: Mmax, x, Mmin, x, V (largest |V|), x, Dmax, x, Dmin, x. */
  private segmentExtremes(): number[] {
    if (this.perSeg) return this.perSeg;
    const { bp, nseg } = this.prep;
    const f = this.field;
    const out: number[] = new Array<number>(nseg * SEG_FIELDS).fill(0);
    for (let s = 0; s < nseg; s++) {
      const o = s * STRIDE;
      const x0 = bp[s];
      const h = bp[s + 1] - x0;
      const e = s * SEG_FIELDS;
      // M: ends and the zeros of V = dM/dx.
      scratchA.length = 0;
      quadraticRootsIn(f[o], f[o + 1], f[o + 2], 0, h, scratchA);
      let mMax = f[o + OFF_M];
      let mMaxX = 0;
      let mMin = mMax;
      let mMinX = 0;
      const mEnd = polyAt(f, o + OFF_M, 3, h);
      for (let i = 0; i <= scratchA.length; i++) {
        const xi = i < scratchA.length ? scratchA[i] : h;
        const v = i < scratchA.length ? polyAt(f, o + OFF_M, 3, xi) : mEnd;
        if (v > mMax) {
          mMax = v;
          mMaxX = xi;
        }
        if (v < mMin) {
          mMin = v;
          mMinX = xi;
        }
      }
      out[e] = mMax;
      out[e + 1] = x0 + mMaxX;
      out[e + 2] = mMin;
      out[e + 3] = x0 + mMinX;
      // V: ends and the zero of dV/dx = −q.
      let vBest = f[o];
      let vBestX = 0;
      const vEnd = polyAt(f, o + OFF_V, 2, h);
      if (Math.abs(vEnd) > Math.abs(vBest)) {
        vBest = vEnd;
        vBestX = h;
      }
      if (f[o + 2] !== 0) {
        const xr = -f[o + 1] / (2 * f[o + 2]);
        if (xr > 0 && xr < h) {
          const v = polyAt(f, o + OFF_V, 2, xr);
          if (Math.abs(v) > Math.abs(vBest)) {
            vBest = v;
            vBestX = xr;
          }
        }
      }
      out[e + 4] = vBest;
      out[e + 5] = x0 + vBestX;
      // Deflection: ends and the zeros of the slope, bracketed between the zeros of M.
      scratchB.length = 0;
      rootsFromCritical(f, o + OFF_M, 3, 0, h, scratchA, scratchB);
      scratchC.length = 0;
      rootsFromCritical(f, o + OFF_S, 4, 0, h, scratchB, scratchC);
      let dMax = f[o + OFF_D];
      let dMaxX = 0;
      let dMin = dMax;
      let dMinX = 0;
      for (let i = 0; i <= scratchC.length; i++) {
        const xi = i < scratchC.length ? scratchC[i] : h;
        const v = polyAt(f, o + OFF_D, 5, xi);
        if (v > dMax) {
          dMax = v;
          dMaxX = xi;
        }
        if (v < dMin) {
          dMin = v;
          dMinX = xi;
        }
      }
      out[e + 6] = dMax;
      out[e + 7] = x0 + dMaxX;
      out[e + 8] = dMin;
      out[e + 9] = x0 + dMinX;
    }
    this.perSeg = out;
    return out;
  }

  /** Aggregates segment extremes over [segFrom, segTo); ties go to the leftmost position. */
  private aggregate(segFrom: number, segTo: number, field: number, mode: "max" | "min" | "abs", tol: number): Extreme {
    const per = this.segmentExtremes();
    let best = per[segFrom * SEG_FIELDS + field];
    let bestX = per[segFrom * SEG_FIELDS + field + 1];
    for (let s = segFrom + 1; s < segTo; s++) {
      const v = per[s * SEG_FIELDS + field];
      const better = mode === "max" ? v > best + tol : mode === "min" ? v < best - tol : Math.abs(v) > Math.abs(best) + tol;
      if (better) {
        best = v;
        bestX = per[s * SEG_FIELDS + field + 1];
      }
    }
    return { value: Math.abs(best) <= tol ? 0 : best, x: bestX };
  }

  private scales(): { m: number; v: number; d: number } {
    const per = this.segmentExtremes();
    let m = 0;
    let v = 0;
    let d = 0;
    for (let e = 0; e < per.length; e += SEG_FIELDS) {
      m = Math.max(m, Math.abs(per[e]), Math.abs(per[e + 2]));
      v = Math.max(v, Math.abs(per[e + 4]));
      d = Math.max(d, Math.abs(per[e + 6]), Math.abs(per[e + 8]));
    }
    return { m, v, d };
  }

  get extremes(): BeamExtremes {
    if (this.extCache) return this.extCache;
    const n = this.prep.nseg;
    const sc = this.scales();
    const tm = 1e-12 * sc.m;
    const tv = 1e-12 * sc.v;
    const td = 1e-12 * sc.d;
    this.extCache = {
      Mpos: this.aggregate(0, n, 0, "max", tm),
      Mneg: this.aggregate(0, n, 2, "min", tm),
      Vabs: this.aggregate(0, n, 4, "abs", tv),
      deflDown: this.aggregate(0, n, 6, "max", td),
      deflUp: this.aggregate(0, n, 8, "min", td),
      zeroShear: this.signChanges(OFF_V, 2, 1e-10 * sc.v),
      inflection: this.signChanges(OFF_M, 3, 1e-10 * sc.m),
    };
    return this.extCache;
  }

  /**
   * Where V (deg 2) or M (deg 3) changes sign along the member: inside a monotone piece (a root),
   * across a step, or across a stretch where it is zero (its start). Values within tol count as 0.
   */
  private signChanges(off: number, deg: 2 | 3, tol: number): number[] {
    const { bp, nseg, length } = this.prep;
    const f = this.field;
    const found: number[] = [];
    let lastSign = 0;
    let zeroStart = -1;
    let prevX = 0;
    let prevVal = 0;
    let prevSeg = -1;
    for (let s = 0; s < nseg; s++) {
      const o = s * STRIDE;
      const x0 = bp[s];
      const h = bp[s + 1] - x0;
      scratchA.length = 0;
      if (deg === 2) {
        if (f[o + 2] !== 0) {
          const xr = -f[o + 1] / (2 * f[o + 2]);
          if (xr > 0 && xr < h) scratchA.push(xr);
        }
      } else {
        quadraticRootsIn(f[o], f[o + 1], f[o + 2], 0, h, scratchA);
      }
      for (let i = -1; i <= scratchA.length; i++) {
        const xi = i < 0 ? 0 : i < scratchA.length ? scratchA[i] : h;
        const v = polyAt(f, o + off, deg, xi);
        const sg = v > tol ? 1 : v < -tol ? -1 : 0;
        if (sg === 0) {
          if (zeroStart < 0) zeroStart = x0 + xi;
        } else {
          if (lastSign !== 0 && sg !== lastSign) {
            let root: number;
            if (zeroStart >= 0) root = zeroStart;
            else if (prevSeg === s && i >= 0) root = x0 + bracketedRoot(f, o + off, deg, prevX - x0, xi, prevVal, v);
            else root = x0;
            if (root > 1e-9 * length && root < length * (1 - 1e-9)) found.push(root);
          }
          lastSign = sg;
          zeroStart = -1;
        }
        prevX = x0 + xi;
        prevVal = v;
        prevSeg = s;
      }
    }
    return found;
  }

  get spans(): SpanResult[] {
    if (this.spanCache) return this.spanCache;
    const sc = this.scales();
    const per = this.segmentExtremes();
    this.spanCache = this.prep.regions.map((r) => {
      let dBest = 0;
      let dX = r.from;
      for (let s = r.segFrom; s < r.segTo; s++) {
        const e = s * SEG_FIELDS;
        if (per[e + 6] > Math.abs(dBest) + 1e-12 * sc.d) {
          dBest = per[e + 6];
          dX = per[e + 7];
        }
        if (-per[e + 8] > Math.abs(dBest) + 1e-12 * sc.d) {
          dBest = per[e + 8];
          dX = per[e + 9];
        }
      }
      const length = r.to - r.from;
      return {
        from: r.from,
        to: r.to,
        kind: r.kind,
        length,
        Mpos: this.aggregate(r.segFrom, r.segTo, 0, "max", 1e-12 * sc.m),
        Mneg: this.aggregate(r.segFrom, r.segTo, 2, "min", 1e-12 * sc.m),
        deflection: { value: clean(dBest), x: dX },
        ratio: Math.abs(dBest) > 1e-12 ? (length * 12) / Math.abs(dBest) : null,
      };
    });
    return this.spanCache;
  }

  momentExtremeBetween(a: number, b: number): { max: Extreme; min: Extreme } {
    const { bp, tol } = this.prep;
    if (!(b > a)) throw new RangeError(`momentExtremeBetween: need a < b (got ${a}, ${b})`);
    const s0 = this.segAt(a);
    const s1 = this.segAt(b);
    const f = this.field;
    let max: Extreme = { value: -Infinity, x: a };
    let min: Extreme = { value: Infinity, x: a };
    const consider = (s: number, xi: number) => {
      const v = polyAt(f, s * STRIDE + OFF_M, 3, xi);
      const x = Math.min(Math.max(bp[s] + xi, a), b);
      if (v > max.value) max = { value: v, x };
      if (v < min.value) min = { value: v, x };
    };
    for (let s = s0; s <= s1; s++) {
      const h = bp[s + 1] - bp[s];
      const lo = Math.max(a - bp[s], 0);
      const hi = Math.min(b - bp[s], h);
      if (hi - lo <= tol && !(s === s0 && s === s1)) continue;
      const o = s * STRIDE;
      consider(s, lo);
      scratchA.length = 0;
      quadraticRootsIn(f[o], f[o + 1], f[o + 2], lo, hi, scratchA);
      for (const xi of scratchA) consider(s, xi);
      consider(s, hi);
    }
    return { max: { value: clean(max.value), x: max.x }, min: { value: clean(min.value), x: min.x } };
  }
}

function clean(v: number): number {
  return v === 0 ? 0 : v;
}

function overflow(): BeamInputError {
  return new BeamInputError([{ path: "E", message: "the results are too large to represent — check the units of E (psi), I (in^4) and the loads" }]);
}

export function makeAnalysis(prep: PreparedBeam, resp: Response): BeamAnalysis {
  return new Analysis(prep, resp);
}
