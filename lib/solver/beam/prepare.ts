/**
 * Geometry, stiffness and load bookkeeping shared by every analysis of one beam layout.
 *
 * Internal units: lb and ft (EI in lb·ft², deflection in ft until it is stored in in).
 * Method: direct stiffness with Euler–Bernoulli (Hermite) elements whose nodes are the member
 * ends and the supports. With consistent nodal loads these elements give the exact nodal
 * displacements for any load, so the support reactions are exact; V and M then follow exactly
 * from statics, and slope and deflection from integrating M/EI between breakpoints, restarting at
 * every node from its solved displacement. Breakpoints are the nodes, load points and load ends;
 * between two breakpoints every result is one polynomial (V degree 2, M 3, slope 4, deflection 5).
 */
import type { BeamInput, LoadCase, SupportType } from "../types";
import { geometryIssues, LIMITS, SAME_POINT } from "./checks";
import { BeamInputError, BeamInstabilityError, formatFt } from "./errors";

/** Per segment in a field: V (3 coefficients), M (4), slope (5), deflection in in (6). */
export const STRIDE = 18;
export const OFF_V = 0;
export const OFF_M = 3;
export const OFF_S = 7;
export const OFF_D = 12;

export type RegionKind = "span" | "overhang-left" | "overhang-right";

export interface Region {
  from: number;
  to: number;
  kind: RegionKind;
  /** 1-based number among the regions of kind "span", 0 for an overhang */
  spanNo: number;
  segFrom: number;
  segTo: number;
}

/** A load, or the part of a distributed load inside one region, ready to be applied with a weight. */
export interface Piece {
  source: number;
  loadCase: LoadCase;
  region: number;
  /** consistent nodal loads for weight 1 (dof index, value) */
  fDof: number[];
  fVal: number[];
  /** concentrated pieces: breakpoint index and its jumps in V and M; -1 for distributed */
  bp: number;
  dV: number;
  dM: number;
  /** distributed pieces: segments [segFrom, segTo), intensity wa at xa (plf) and slope k (plf/ft) */
  segFrom: number;
  segTo: number;
  xa: number;
  wa: number;
  k: number;
}

export interface PreparedSupport {
  x: number;
  type: SupportType;
  node: number;
  bp: number;
}

export interface PreparedBeam {
  length: number;
  /** lb·ft² */
  EI: number;
  tol: number;
  // Plain arrays, not typed arrays: allocating many small typed arrays costs more than the
  // arithmetic of a small beam.
  bp: number[];
  nseg: number;
  /** node index at a breakpoint, or -1 */
  bpNode: number[];
  nodeX: number[];
  ndof: number;
  /** stiffness, row-major ndof × ndof */
  K: number[];
  free: number[];
  /** Cholesky factor of K_ff, row-major, lower triangle */
  chol: number[];
  supports: PreparedSupport[];
  regions: Region[];
  pieces: Piece[];
}

/** What a set of weighted loads does: the field of polynomial coefficients and the reactions. */
export interface Response {
  field: Float64Array;
  /** per support in input order: F (lb, up), M (lb-ft, clockwise) */
  reactions: Float64Array;
}

function lowerBound(a: readonly number[], x: number): number {
  let lo = 0;
  let hi = a.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (a[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Index of the breakpoint at x (within the same-point tolerance). */
export function bpIndex(bp: readonly number[], x: number, tol: number): number {
  const i = lowerBound(bp, x - tol);
  return i < bp.length && Math.abs(bp[i] - x) <= tol ? i : Math.min(i, bp.length - 1);
}

function stabilityCheck(input: BeamInput): void {
  const s = input.supports;
  if (s.length === 0) {
    throw new BeamInstabilityError("unstable: the beam has no supports — add at least two supports, or one fixed support");
  }
  if (s.length === 1 && s[0].type !== "fixed") {
    throw new BeamInstabilityError(`unstable: the beam can rotate about the support at x = ${formatFt(s[0].x)} ft — add a second support or make it fixed`);
  }
}

const GAUSS_T = [-Math.sqrt(3 / 5), 0, Math.sqrt(3 / 5)];
const GAUSS_W = [5 / 9, 8 / 9, 5 / 9];

/**
 * Hermite shape functions of an element of length Le at local t, and their t-derivatives
 * (for couples). Order: v_i, θ_i, v_j, θ_j.
 */
function shape(t: number, Le: number, out: Float64Array): void {
  const r = t / Le;
  const r2 = r * r;
  const r3 = r2 * r;
  out[0] = 1 - 3 * r2 + 2 * r3;
  out[1] = Le * (r - 2 * r2 + r3);
  out[2] = 3 * r2 - 2 * r3;
  out[3] = Le * (-r2 + r3);
  out[4] = (-6 * r + 6 * r2) / Le;
  out[5] = 1 - 4 * r + 3 * r2;
  out[6] = (6 * r - 6 * r2) / Le;
  out[7] = -2 * r + 3 * r2;
}

/** Ascending sort in place; insertion sort for the short lists of a beam (no runtime call). */
function sortAscending(a: number[], n: number): void {
  if (n > 48) {
    a.sort((p, q) => p - q);
    return;
  }
  for (let i = 1; i < n; i++) {
    const v = a[i];
    let j = i - 1;
    while (j >= 0 && a[j] > v) {
      a[j + 1] = a[j];
      j--;
    }
    a[j + 1] = v;
  }
}

function elementOf(nodeX: readonly number[], x: number): number {
  let e = 0;
  while (e < nodeX.length - 2 && x >= nodeX[e + 1]) e++;
  return e;
}

function regionOf(regions: Region[], x: number, tol: number): number {
  for (let r = 0; r < regions.length; r++) if (x < regions[r].to - tol) return r;
  return regions.length - 1;
}

function addRegion(regions: Region[], bp: readonly number[], tol: number, from: number, to: number, kind: RegionKind): void {
  let spanNo = 0;
  if (kind === "span") {
    spanNo = 1;
    for (const r of regions) if (r.kind === "span") spanNo++;
  }
  regions.push({ from, to, kind, spanNo, segFrom: bpIndex(bp, from, tol), segTo: bpIndex(bp, to, tol) });
}

const N = new Float64Array(8);

function concentratedPiece(
  source: number,
  loadCase: LoadCase,
  region: number,
  b: number,
  bpNode: readonly number[],
  nodeX: readonly number[],
  x: number,
  mag: number,
  moment: boolean,
): Piece {
  let fDof: number[];
  let fVal: number[];
  if (bpNode[b] >= 0) {
    fDof = [2 * bpNode[b] + (moment ? 1 : 0)];
    fVal = [mag];
  } else {
    const e = elementOf(nodeX, x);
    shape(x - nodeX[e], nodeX[e + 1] - nodeX[e], N);
    fDof = [2 * e, 2 * e + 1, 2 * e + 2, 2 * e + 3];
    const o = moment ? 4 : 0;
    fVal = [mag * N[o], mag * N[o + 1], mag * N[o + 2], mag * N[o + 3]];
  }
  return { source, loadCase, region, fDof, fVal, bp: b, dV: moment ? 0 : -mag, dM: moment ? mag : 0, segFrom: 0, segTo: 0, xa: 0, wa: 0, k: 0 };
}

/** Consistent nodal loads of w(x) = w1 + k(x − x0) over [a, b], by 3-point Gauss (exact: degree 4). */
function distributedPiece(
  source: number,
  loadCase: LoadCase,
  region: number,
  bp: readonly number[],
  tol: number,
  nodeX: readonly number[],
  a: number,
  b: number,
  x0: number,
  w1: number,
  k: number,
): Piece {
  const nn = nodeX.length;
  let count = 0;
  for (let e = 0; e < nn - 1; e++) if (Math.min(b, nodeX[e + 1]) - Math.max(a, nodeX[e]) > tol) count++;
  const fDof: number[] = new Array<number>(4 * count).fill(0);
  const fVal: number[] = new Array<number>(4 * count).fill(0);
  let c = 0;
  for (let e = 0; e < nn - 1; e++) {
    const lo = Math.max(a, nodeX[e]);
    const hi = Math.min(b, nodeX[e + 1]);
    if (hi - lo <= tol) continue;
    const Le = nodeX[e + 1] - nodeX[e];
    const half = (hi - lo) / 2;
    const mid = (hi + lo) / 2;
    for (let i = 0; i < 4; i++) fDof[c + i] = 2 * e + i;
    for (let g = 0; g < 3; g++) {
      const x = mid + half * GAUSS_T[g];
      const w = GAUSS_W[g] * half * (w1 + k * (x - x0));
      shape(x - nodeX[e], Le, N);
      for (let i = 0; i < 4; i++) fVal[c + i] += w * N[i];
    }
    c += 4;
  }
  return {
    source,
    loadCase,
    region,
    fDof,
    fVal,
    bp: -1,
    dV: 0,
    dM: 0,
    segFrom: bpIndex(bp, a, tol),
    segTo: bpIndex(bp, b, tol),
    xa: x0,
    wa: w1,
    k,
  };
}

/**
 * Validates, checks stability, and builds the breakpoints, the factored stiffness and the load pieces.
 * `internalLoads` is how many loads the caller added itself (a member's own weight) on top of the
 * user's, so they do not count against the user's limit.
 */
export function prepareBeam(input: BeamInput, internalLoads = 0): PreparedBeam {
  const issues = geometryIssues(input, LIMITS.maxLoads + internalLoads);
  if (issues.length) throw new BeamInputError(issues);
  stabilityCheck(input);

  const L = input.length;
  const tol = SAME_POINT * L;
  const EI = (input.E * input.I) / 144;
  if (!(EI > 0 && EI < Infinity)) {
    throw new BeamInputError([{ path: "E", message: "E·I is out of range — check the units: E in psi, I in in^4" }]);
  }
  const loads = input.loads;
  const inSup = input.supports;

  // Breakpoints: ends, supports, load points and load ends, merged within tol.
  let nraw = 2 + inSup.length;
  for (const ld of loads) nraw += ld.type === "point" || ld.type === "moment" ? 1 : 2;
  const raw: number[] = new Array<number>(nraw);
  let r = 0;
  raw[r++] = 0;
  raw[r++] = L;
  for (const sp of inSup) raw[r++] = sp.x;
  for (const ld of loads) {
    if (ld.type === "point" || ld.type === "moment") raw[r++] = ld.x;
    else {
      raw[r++] = ld.from;
      raw[r++] = ld.to;
    }
  }
  sortAscending(raw, nraw);
  let nbp = 0;
  for (let i = 0; i < nraw; i++) if (nbp === 0 || raw[i] - raw[nbp - 1] > tol) raw[nbp++] = raw[i];
  raw.length = nbp;
  const bp = raw;
  bp[0] = 0;
  bp[nbp - 1] = L;
  const nseg = nbp - 1;

  // Nodes: member ends and supports.
  const bpNode: number[] = new Array<number>(nbp).fill(-1);
  bpNode[0] = 1;
  bpNode[nbp - 1] = 1;
  const supBp: number[] = new Array<number>(inSup.length);
  for (let i = 0; i < inSup.length; i++) {
    supBp[i] = bpIndex(bp, inSup[i].x, tol);
    bpNode[supBp[i]] = 1;
  }
  let nn = 0;
  for (let b = 0; b < nbp; b++) if (bpNode[b] === 1) nn++;
  const ndof = 2 * nn;
  const nodeX: number[] = new Array<number>(nn).fill(0);
  nn = 0;
  for (let b = 0; b < nbp; b++) {
    if (bpNode[b] === 1) {
      nodeX[nn] = bp[b];
      bpNode[b] = nn++;
    }
  }

  // Stiffness: dof 2n is the deflection (down), 2n+1 the slope (clockwise) at node n.
  const K: number[] = new Array<number>(ndof * ndof).fill(0);
  for (let e = 0; e < nn - 1; e++) {
    const Le = nodeX[e + 1] - nodeX[e];
    const c = EI / (Le * Le * Le);
    const a = 12 * c;
    const bq = 6 * Le * c;
    const d4 = 4 * Le * Le * c;
    const d2 = 2 * Le * Le * c;
    const r0 = 2 * e * ndof + 2 * e;
    const r1 = r0 + ndof;
    const r2 = r1 + ndof;
    const r3 = r2 + ndof;
    K[r0] += a;
    K[r0 + 1] += bq;
    K[r0 + 2] -= a;
    K[r0 + 3] += bq;
    K[r1] += bq;
    K[r1 + 1] += d4;
    K[r1 + 2] -= bq;
    K[r1 + 3] += d2;
    K[r2] -= a;
    K[r2 + 1] -= bq;
    K[r2 + 2] += a;
    K[r2 + 3] -= bq;
    K[r3] += bq;
    K[r3 + 1] += d2;
    K[r3 + 2] -= bq;
    K[r3 + 3] += d4;
  }
  const restrained: number[] = new Array<number>(ndof).fill(0);
  const supports: PreparedSupport[] = [];
  for (let i = 0; i < inSup.length; i++) {
    const node = bpNode[supBp[i]];
    restrained[2 * node] = 1;
    if (inSup[i].type === "fixed") restrained[2 * node + 1] = 1;
    supports.push({ x: bp[supBp[i]], type: inSup[i].type, node, bp: supBp[i] });
  }
  let nf = 0;
  for (let d = 0; d < ndof; d++) if (!restrained[d]) nf++;
  const free: number[] = new Array<number>(nf).fill(0);
  nf = 0;
  for (let d = 0; d < ndof; d++) if (!restrained[d]) free[nf++] = d;

  // Cholesky factor of K_ff (lower triangle, row-major); a vanishing pivot means a mechanism.
  const chol: number[] = new Array<number>(nf * nf).fill(0);
  let diagMax = 0;
  for (let i = 0; i < nf; i++) diagMax = Math.max(diagMax, Math.abs(K[free[i] * ndof + free[i]]));
  for (let i = 0; i < nf; i++) for (let j = 0; j <= i; j++) chol[i * nf + j] = K[free[i] * ndof + free[j]];
  for (let j = 0; j < nf; j++) {
    // a pivot that vanishes against its own diagonal term means the dof is not held (scale-free test)
    const kjj = chol[j * nf + j];
    let d = kjj;
    for (let k = 0; k < j; k++) d -= chol[j * nf + k] * chol[j * nf + k];
    if (!(d > 1e-11 * kjj && kjj > 0 && diagMax > 0)) {
      const n = free[j] >> 1;
      throw new BeamInstabilityError(`unstable: the beam can move freely at x = ${formatFt(nodeX[n])} ft — add a support or make one fixed`);
    }
    d = Math.sqrt(d);
    chol[j * nf + j] = d;
    for (let i = j + 1; i < nf; i++) {
      let sum = chol[i * nf + j];
      for (let k = 0; k < j; k++) sum -= chol[i * nf + k] * chol[j * nf + k];
      chol[i * nf + j] = sum / d;
    }
  }

  // Regions: overhangs and spans between supports, left to right.
  const supXs: number[] = new Array<number>(supports.length).fill(0);
  for (let i = 0; i < supports.length; i++) supXs[i] = supports[i].x;
  sortAscending(supXs, supXs.length);
  const ns = supXs.length;
  const regions: Region[] = [];
  if (supXs[0] > 0) addRegion(regions, bp, tol, 0, supXs[0], "overhang-left");
  for (let i = 0; i + 1 < ns; i++) addRegion(regions, bp, tol, supXs[i], supXs[i + 1], "span");
  if (supXs[ns - 1] < L) addRegion(regions, bp, tol, supXs[ns - 1], L, "overhang-right");

  // Load pieces with their consistent nodal loads; distributed loads are cut at the supports.
  const pieces: Piece[] = [];
  for (let source = 0; source < loads.length; source++) {
    const ld = loads[source];
    const loadCase: LoadCase = ld.case ?? "D";
    if (ld.type === "point" || ld.type === "moment") {
      const b = bpIndex(bp, ld.x, tol);
      const moment = ld.type === "moment";
      pieces.push(concentratedPiece(source, loadCase, regionOf(regions, bp[b], tol), b, bpNode, nodeX, bp[b], moment ? ld.M : ld.P, moment));
      continue;
    }
    const x0 = bp[bpIndex(bp, ld.from, tol)];
    const x1 = bp[bpIndex(bp, ld.to, tol)];
    const w1 = ld.type === "udl" ? ld.w : ld.w1;
    const w2 = ld.type === "udl" ? ld.w : ld.w2;
    const k = (w2 - w1) / (x1 - x0);
    let a = x0;
    for (let i = 0; i <= ns; i++) {
      const cut = i < ns ? supXs[i] : x1;
      if (i < ns && !(cut > a + tol && cut < x1 - tol)) continue;
      pieces.push(distributedPiece(source, loadCase, regionOf(regions, a, tol), bp, tol, nodeX, a, cut, x0, w1, k));
      a = cut;
    }
  }

  return { length: L, EI, tol, bp, nseg, bpNode, nodeX, ndof, K, free, chol, supports, regions, pieces };
}

/** Solves the beam for the pieces with the given weights (weight 0 skips a piece). */
export function respond(prep: PreparedBeam, weights: ArrayLike<number>): Response {
  const { bp, nseg, bpNode, ndof, K, free, chol, supports, pieces, EI } = prep;
  const nbp = nseg + 1;
  const nf = free.length;
  // One scratch array with fixed offsets (no views: creating a typed-array view costs more than
  // the arithmetic here): f | jumpV | jumpM | q | y | d.
  const w: number[] = new Array<number>(2 * ndof + 2 * nbp + 2 * nseg + nf).fill(0);
  const F0 = 0;
  const JV = ndof;
  const JM = JV + nbp;
  const Q = JM + nbp;
  const Y = Q + 2 * nseg;
  const D = Y + nf;
  for (let p = 0; p < pieces.length; p++) {
    const c = weights[p];
    if (c === 0) continue;
    const pc = pieces[p];
    for (let i = 0; i < pc.fDof.length; i++) w[F0 + pc.fDof[i]] += c * pc.fVal[i];
    if (pc.bp >= 0) {
      w[JV + pc.bp] += c * pc.dV;
      w[JM + pc.bp] += c * pc.dM;
    } else {
      for (let s = pc.segFrom; s < pc.segTo; s++) {
        w[Q + 2 * s] += c * (pc.wa + pc.k * (bp[s] - pc.xa));
        w[Q + 2 * s + 1] += c * pc.k;
      }
    }
  }
  // Solve K_ff d_f = f_f with the Cholesky factor.
  for (let i = 0; i < nf; i++) {
    let s = w[F0 + free[i]];
    for (let k = 0; k < i; k++) s -= chol[i * nf + k] * w[Y + k];
    w[Y + i] = s / chol[i * nf + i];
  }
  for (let i = nf - 1; i >= 0; i--) {
    let s = w[Y + i];
    for (let k = i + 1; k < nf; k++) s -= chol[k * nf + i] * w[Y + k];
    w[Y + i] = s / chol[i * nf + i];
  }
  for (let i = 0; i < nf; i++) w[D + free[i]] = w[Y + i];

  // Reactions r = K d − f at the restrained dofs; F is up (the dof is down), M clockwise.
  const reactions = new Float64Array(2 * supports.length);
  for (let i = 0; i < supports.length; i++) {
    const s = supports[i];
    const rowV = 2 * s.node * ndof;
    let rv = -w[F0 + 2 * s.node];
    for (let j = 0; j < ndof; j++) rv += K[rowV + j] * w[D + j];
    reactions[2 * i] = -rv;
    w[JV + s.bp] -= rv;
    if (s.type === "fixed") {
      const rowT = rowV + ndof;
      let rt = -w[F0 + 2 * s.node + 1];
      for (let j = 0; j < ndof; j++) rt += K[rowT + j] * w[D + j];
      reactions[2 * i + 1] = rt;
      w[JM + s.bp] += rt;
    }
  }

  // Statics from the left end for V and M; integrate −M/EI for slope and deflection.
  const field = new Float64Array(nseg * STRIDE);
  const inv = 1 / EI;
  let V = 0;
  let M = 0;
  let th = 0;
  let yv = 0;
  for (let s = 0; s < nseg; s++) {
    V += w[JV + s];
    M += w[JM + s];
    const node = bpNode[s];
    if (node >= 0) {
      yv = w[D + 2 * node];
      th = w[D + 2 * node + 1];
    }
    const q0 = w[Q + 2 * s];
    const q1 = w[Q + 2 * s + 1];
    const h = bp[s + 1] - bp[s];
    const o = s * STRIDE;
    field[o + OFF_V] = V;
    field[o + OFF_V + 1] = -q0;
    field[o + OFF_V + 2] = -q1 / 2;
    field[o + OFF_M] = M;
    field[o + OFF_M + 1] = V;
    field[o + OFF_M + 2] = -q0 / 2;
    field[o + OFF_M + 3] = -q1 / 6;
    const s1 = -M * inv;
    const s2 = (-V * inv) / 2;
    const s3 = (q0 * inv) / 6;
    const s4 = (q1 * inv) / 24;
    field[o + OFF_S] = th;
    field[o + OFF_S + 1] = s1;
    field[o + OFF_S + 2] = s2;
    field[o + OFF_S + 3] = s3;
    field[o + OFF_S + 4] = s4;
    const d2 = s1 / 2;
    const d3 = s2 / 3;
    const d4 = s3 / 4;
    const d5 = s4 / 5;
    field[o + OFF_D] = 12 * yv;
    field[o + OFF_D + 1] = 12 * th;
    field[o + OFF_D + 2] = 12 * d2;
    field[o + OFF_D + 3] = 12 * d3;
    field[o + OFF_D + 4] = 12 * d4;
    field[o + OFF_D + 5] = 12 * d5;
    const Vn = V + h * (-q0 + h * (-q1 / 2));
    const Mn = M + h * (V + h * (-q0 / 2 + h * (-q1 / 6)));
    const thn = th + h * (s1 + h * (s2 + h * (s3 + h * s4)));
    yv = yv + h * (th + h * (d2 + h * (d3 + h * (d4 + h * d5))));
    th = thn;
    V = Vn;
    M = Mn;
  }
  return { field, reactions };
}

/** out = Σ c_i · r_i (fields and reactions); the layouts must come from the same PreparedBeam. */
export function combineResponses(parts: readonly Response[], coefs: ArrayLike<number>): Response {
  const field = new Float64Array(parts[0].field.length);
  const reactions = new Float64Array(parts[0].reactions.length);
  for (let i = 0; i < parts.length; i++) {
    const c = coefs[i];
    if (c === 0) continue;
    const pf = parts[i].field;
    const pr = parts[i].reactions;
    for (let j = 0; j < field.length; j++) field[j] += c * pf[j];
    for (let j = 0; j < reactions.length; j++) reactions[j] += c * pr[j];
  }
  return { field, reactions };
}
