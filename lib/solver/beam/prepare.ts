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
import { geometryIssues, SAME_POINT } from "./checks";
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
  fDof: Int32Array;
  fVal: Float64Array;
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
  bp: Float64Array;
  nseg: number;
  /** node index at a breakpoint, or -1 */
  bpNode: Int32Array;
  nodeX: Float64Array;
  ndof: number;
  K: Float64Array;
  free: Int32Array;
  chol: Float64Array;
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

function lowerBound(a: Float64Array, x: number): number {
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
export function bpIndex(bp: Float64Array, x: number, tol: number): number {
  const i = lowerBound(bp, x - tol);
  return i < bp.length && Math.abs(bp[i] - x) <= tol ? i : Math.min(i, bp.length - 1);
}

function stabilityCheck(input: BeamInput): void {
  const s = input.supports;
  if (s.length === 0) {
    throw new BeamInstabilityError("unstable: the beam has no supports — add at least two supports, or one fixed support");
  }
  if (s.length === 1 && s[0].type !== "fixed") {
    throw new BeamInstabilityError(
      `unstable: the beam can rotate about the support at x = ${formatFt(s[0].x)} ft — add a second support or make it fixed`,
    );
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

/** Validates, checks stability, and builds the breakpoints, the factored stiffness and the load pieces. */
export function prepareBeam(input: BeamInput): PreparedBeam {
  const issues = geometryIssues(input);
  if (issues.length) throw new BeamInputError(issues);
  stabilityCheck(input);

  const L = input.length;
  const tol = SAME_POINT * L;
  const EI = (input.E * input.I) / 144;

  // Breakpoints: ends, supports, load points and load ends, merged within tol.
  const raw: number[] = [0, L];
  for (const s of input.supports) raw.push(s.x);
  for (const ld of input.loads) {
    if (ld.type === "point" || ld.type === "moment") raw.push(ld.x);
    else raw.push(ld.from, ld.to);
  }
  raw.sort((a, b) => a - b);
  const merged: number[] = [];
  for (const x of raw) if (merged.length === 0 || x - merged[merged.length - 1] > tol) merged.push(x);
  merged[merged.length - 1] = L;
  merged[0] = 0;
  const bp = Float64Array.from(merged);
  const nbp = bp.length;
  const nseg = nbp - 1;

  // Nodes: member ends and supports.
  const bpNode = new Int32Array(nbp).fill(-1);
  bpNode[0] = 1;
  bpNode[nbp - 1] = 1;
  const supBp = input.supports.map((s) => bpIndex(bp, s.x, tol));
  for (const b of supBp) bpNode[b] = 1;
  const nodeXs: number[] = [];
  for (let b = 0; b < nbp; b++) if (bpNode[b] === 1) bpNode[b] = nodeXs.push(bp[b]) - 1;
  const nodeX = Float64Array.from(nodeXs);
  const nn = nodeX.length;
  const ndof = 2 * nn;

  // Stiffness: dof 2n is the deflection (down), 2n+1 the slope (clockwise) at node n.
  const K = new Float64Array(ndof * ndof);
  for (let e = 0; e < nn - 1; e++) {
    const Le = nodeX[e + 1] - nodeX[e];
    const c = EI / (Le * Le * Le);
    const k = [
      [12, 6 * Le, -12, 6 * Le],
      [6 * Le, 4 * Le * Le, -6 * Le, 2 * Le * Le],
      [-12, -6 * Le, 12, -6 * Le],
      [6 * Le, 2 * Le * Le, -6 * Le, 4 * Le * Le],
    ];
    for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) K[(2 * e + i) * ndof + 2 * e + j] += c * k[i][j];
  }
  const restrained = new Uint8Array(ndof);
  const supports: PreparedSupport[] = input.supports.map((s, i) => {
    const node = bpNode[supBp[i]];
    restrained[2 * node] = 1;
    if (s.type === "fixed") restrained[2 * node + 1] = 1;
    return { x: bp[supBp[i]], type: s.type, node, bp: supBp[i] };
  });
  const freeList: number[] = [];
  for (let d = 0; d < ndof; d++) if (!restrained[d]) freeList.push(d);
  const free = Int32Array.from(freeList);
  const nf = free.length;

  // Cholesky factor of K_ff (lower triangle, row-major); a vanishing pivot means a mechanism.
  const chol = new Float64Array(nf * nf);
  let diagMax = 0;
  for (let i = 0; i < nf; i++) diagMax = Math.max(diagMax, Math.abs(K[free[i] * ndof + free[i]]));
  for (let i = 0; i < nf; i++) for (let j = 0; j <= i; j++) chol[i * nf + j] = K[free[i] * ndof + free[j]];
  for (let j = 0; j < nf; j++) {
    let d = chol[j * nf + j];
    for (let k = 0; k < j; k++) d -= chol[j * nf + k] * chol[j * nf + k];
    if (!(d > 1e-11 * diagMax)) {
      const n = free[j] >> 1;
      throw new BeamInstabilityError(
        `unstable: the beam can move freely at x = ${formatFt(nodeX[n])} ft — add a support or make one fixed`,
      );
    }
    d = Math.sqrt(d);
    chol[j * nf + j] = d;
    for (let i = j + 1; i < nf; i++) {
      let s = chol[i * nf + j];
      for (let k = 0; k < j; k++) s -= chol[i * nf + k] * chol[j * nf + k];
      chol[i * nf + j] = s / d;
    }
  }

  // Regions: overhangs and spans between supports, left to right.
  const supXs = supports.map((s) => s.x).sort((a, b) => a - b);
  const regions: Region[] = [];
  const addRegion = (from: number, to: number, kind: RegionKind) => {
    const spanNo = kind === "span" ? regions.filter((r) => r.kind === "span").length + 1 : 0;
    regions.push({ from, to, kind, spanNo, segFrom: bpIndex(bp, from, tol), segTo: bpIndex(bp, to, tol) });
  };
  if (supXs[0] > 0) addRegion(0, supXs[0], "overhang-left");
  for (let i = 0; i + 1 < supXs.length; i++) addRegion(supXs[i], supXs[i + 1], "span");
  if (supXs[supXs.length - 1] < L) addRegion(supXs[supXs.length - 1], L, "overhang-right");
  const regionOf = (x: number): number => {
    for (let r = 0; r < regions.length; r++) if (x < regions[r].to - tol) return r;
    return regions.length - 1;
  };

  // Load pieces with their consistent nodal loads.
  const pieces: Piece[] = [];
  const N = new Float64Array(8);
  const elemOf = (x: number): number => {
    let e = 0;
    while (e < nn - 2 && x >= nodeX[e + 1]) e++;
    return e;
  };
  input.loads.forEach((ld, source) => {
    const loadCase: LoadCase = ld.case ?? "D";
    if (ld.type === "point" || ld.type === "moment") {
      const b = bpIndex(bp, ld.x, tol);
      const x = bp[b];
      const dofs: number[] = [];
      const vals: number[] = [];
      const moment = ld.type === "moment";
      const mag = moment ? ld.M : ld.P;
      if (bpNode[b] >= 0) {
        dofs.push(2 * bpNode[b] + (moment ? 1 : 0));
        vals.push(mag);
      } else {
        const e = elemOf(x);
        shape(x - nodeX[e], nodeX[e + 1] - nodeX[e], N);
        for (let i = 0; i < 4; i++) {
          dofs.push(2 * e + i);
          vals.push(mag * N[moment ? 4 + i : i]);
        }
      }
      pieces.push({
        source,
        loadCase,
        region: regionOf(x),
        fDof: Int32Array.from(dofs),
        fVal: Float64Array.from(vals),
        bp: b,
        dV: moment ? 0 : -mag,
        dM: moment ? mag : 0,
        segFrom: 0,
        segTo: 0,
        xa: 0,
        wa: 0,
        k: 0,
      });
      return;
    }
    const b0 = bpIndex(bp, ld.from, tol);
    const b1 = bpIndex(bp, ld.to, tol);
    const x0 = bp[b0];
    const x1 = bp[b1];
    const w1 = ld.type === "udl" ? ld.w : ld.w1;
    const w2 = ld.type === "udl" ? ld.w : ld.w2;
    const k = (w2 - w1) / (x1 - x0);
    // Split at supports so that each region can be loaded on its own (pattern live load).
    const cuts = [x0];
    for (const sx of supXs) if (sx > x0 + tol && sx < x1 - tol) cuts.push(sx);
    cuts.push(x1);
    for (let c = 0; c + 1 < cuts.length; c++) {
      const a = cuts[c];
      const bEnd = cuts[c + 1];
      const dofs: number[] = [];
      const vals: number[] = [];
      for (let e = 0; e < nn - 1; e++) {
        const lo = Math.max(a, nodeX[e]);
        const hi = Math.min(bEnd, nodeX[e + 1]);
        if (hi - lo <= tol) continue;
        const Le = nodeX[e + 1] - nodeX[e];
        const acc = [0, 0, 0, 0];
        const half = (hi - lo) / 2;
        const mid = (hi + lo) / 2;
        for (let g = 0; g < 3; g++) {
          const x = mid + half * GAUSS_T[g];
          const w = w1 + k * (x - x0);
          shape(x - nodeX[e], Le, N);
          for (let i = 0; i < 4; i++) acc[i] += GAUSS_W[g] * half * w * N[i];
        }
        for (let i = 0; i < 4; i++) {
          dofs.push(2 * e + i);
          vals.push(acc[i]);
        }
      }
      pieces.push({
        source,
        loadCase,
        region: regionOf(a),
        fDof: Int32Array.from(dofs),
        fVal: Float64Array.from(vals),
        bp: -1,
        dV: 0,
        dM: 0,
        segFrom: bpIndex(bp, a, tol),
        segTo: bpIndex(bp, bEnd, tol),
        xa: x0,
        wa: w1,
        k,
      });
    }
  });

  return { length: L, EI, tol, bp, nseg, bpNode, nodeX, ndof, K, free, chol, supports, regions, pieces };
}

/** Solves the beam for the pieces with the given weights (weight 0 skips a piece). */
export function respond(prep: PreparedBeam, weights: ArrayLike<number>): Response {
  const { bp, nseg, bpNode, ndof, K, free, chol, supports, pieces, EI } = prep;
  const nbp = nseg + 1;
  const f = new Float64Array(ndof);
  const jumpV = new Float64Array(nbp);
  const jumpM = new Float64Array(nbp);
  const q = new Float64Array(2 * nseg);
  for (let p = 0; p < pieces.length; p++) {
    const c = weights[p];
    if (c === 0) continue;
    const pc = pieces[p];
    for (let i = 0; i < pc.fDof.length; i++) f[pc.fDof[i]] += c * pc.fVal[i];
    if (pc.bp >= 0) {
      jumpV[pc.bp] += c * pc.dV;
      jumpM[pc.bp] += c * pc.dM;
    } else {
      for (let s = pc.segFrom; s < pc.segTo; s++) {
        q[2 * s] += c * (pc.wa + pc.k * (bp[s] - pc.xa));
        q[2 * s + 1] += c * pc.k;
      }
    }
  }
  // Solve K_ff d_f = f_f with the Cholesky factor.
  const nf = free.length;
  const y = new Float64Array(nf);
  for (let i = 0; i < nf; i++) {
    let s = f[free[i]];
    for (let k = 0; k < i; k++) s -= chol[i * nf + k] * y[k];
    y[i] = s / chol[i * nf + i];
  }
  for (let i = nf - 1; i >= 0; i--) {
    let s = y[i];
    for (let k = i + 1; k < nf; k++) s -= chol[k * nf + i] * y[k];
    y[i] = s / chol[i * nf + i];
  }
  const d = new Float64Array(ndof);
  for (let i = 0; i < nf; i++) d[free[i]] = y[i];

  // Reactions r = K d − f at the restrained dofs; F is up (the dof is down), M clockwise.
  const reactions = new Float64Array(2 * supports.length);
  for (let i = 0; i < supports.length; i++) {
    const s = supports[i];
    const rowV = 2 * s.node * ndof;
    let rv = -f[2 * s.node];
    for (let j = 0; j < ndof; j++) rv += K[rowV + j] * d[j];
    reactions[2 * i] = -rv;
    jumpV[s.bp] -= rv;
    if (s.type === "fixed") {
      const rowT = rowV + ndof;
      let rt = -f[2 * s.node + 1];
      for (let j = 0; j < ndof; j++) rt += K[rowT + j] * d[j];
      reactions[2 * i + 1] = rt;
      jumpM[s.bp] += rt;
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
    V += jumpV[s];
    M += jumpM[s];
    const node = bpNode[s];
    if (node >= 0) {
      yv = d[2 * node];
      th = d[2 * node + 1];
    }
    const q0 = q[2 * s];
    const q1 = q[2 * s + 1];
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
    const s2 = -V * inv / 2;
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
