/**
 * An independent reference: Macaulay's method (double integration of the bending moment written
 * with singularity functions <x − a>ⁿ), the unknown reactions and the left-end deflection and slope
 * solved from the support conditions and global equilibrium with mathjs `lusolve`.
 * It shares no code with the engine (which uses direct stiffness and piecewise polynomials).
 * Units: lb, ft; EI in lb·ft²; deflection returned in in, like the engine.
 */
import { lusolve } from "mathjs";
import type { BeamInput } from "@/lib/solver/types";

/** <x − a>ⁿ, with the step <x − a>⁰ = 1 from x = a on (the value just to the right). */
function mac(x: number, a: number, n: number): number {
  if (x < a) return 0;
  return n === 0 ? 1 : (x - a) ** n;
}

interface Term {
  /** coefficient times <x − a>ⁿ in M(x) (lb-ft) */
  c: number;
  a: number;
  n: number;
}

/** Σ c·<x−a>ⁿ integrated `times` times (each integral of <x−a>ⁿ is <x−a>ⁿ⁺¹/(n+1)). */
function integrate(terms: Term[], x: number, times: number): number {
  let s = 0;
  for (const t of terms) {
    let c = t.c;
    let n = t.n;
    for (let k = 0; k < times; k++) {
      n += 1;
      c /= n;
    }
    s += c * mac(x, t.a, n);
  }
  return s;
}

/** Load terms of M(x) (sagging positive) and, separately, the terms of V(x) = dM/dx. */
function loadTerms(input: BeamInput): { M: Term[]; V: Term[] } {
  const M: Term[] = [];
  const V: Term[] = [];
  for (const ld of input.loads) {
    if (ld.type === "point") {
      M.push({ c: -ld.P, a: ld.x, n: 1 });
      V.push({ c: -ld.P, a: ld.x, n: 0 });
    } else if (ld.type === "moment") {
      M.push({ c: ld.M, a: ld.x, n: 0 });
    } else {
      const w1 = ld.type === "udl" ? ld.w : ld.w1;
      const w2 = ld.type === "udl" ? ld.w : ld.w2;
      const k = (w2 - w1) / (ld.to - ld.from);
      M.push({ c: -w1 / 2, a: ld.from, n: 2 }, { c: -k / 6, a: ld.from, n: 3 }, { c: w2 / 2, a: ld.to, n: 2 }, { c: k / 6, a: ld.to, n: 3 });
      V.push({ c: -w1, a: ld.from, n: 1 }, { c: -k / 2, a: ld.from, n: 2 }, { c: w2, a: ld.to, n: 1 }, { c: k / 2, a: ld.to, n: 2 });
    }
  }
  return { M, V };
}

export interface ReferenceResult {
  reactions: { F: number; M: number }[];
  at(x: number): { V: number; M: number; slope: number; deflection: number };
}

export function macaulayReference(input: BeamInput): ReferenceResult {
  const EI = (input.E * input.I) / 144;
  const L = input.length;
  const sup = input.supports;
  const fixedIdx = sup.map((s, i) => (s.type === "fixed" ? i : -1)).filter((i) => i >= 0);
  const loads = loadTerms(input);
  // Unknowns: R_i (up), C_j (clockwise, fixed supports), Y0 = EI·y(0), T0 = EI·θ(0).
  const nR = sup.length;
  const nC = fixedIdx.length;
  const n = nR + nC + 2;
  const unknownTerms = (col: number): Term[] => {
    if (col < nR) return [{ c: 1, a: sup[col].x, n: 1 }];
    if (col < nR + nC) return [{ c: 1, a: sup[fixedIdx[col - nR]].x, n: 0 }];
    return [];
  };
  // EI·y(x) = Y0 + T0·x − ∬M ; EI·θ(x) = T0 − ∫M
  const A: number[][] = [];
  const b: number[] = [];
  const rowY = (x: number) => {
    const row = Array.from({ length: n }, (_, c) => (c < nR + nC ? -integrate(unknownTerms(c), x, 2) : c === nR + nC ? 1 : x));
    A.push(row);
    b.push(integrate(loads.M, x, 2));
  };
  const rowT = (x: number) => {
    const row = Array.from({ length: n }, (_, c) => (c < nR + nC ? -integrate(unknownTerms(c), x, 1) : c === nR + nC ? 0 : 1));
    A.push(row);
    b.push(integrate(loads.M, x, 1));
  };
  for (const s of sup) rowY(s.x);
  for (const j of fixedIdx) rowT(sup[j].x);
  // Equilibrium: V and M vanish just past the right end (x = L with every step taken).
  // Point loads and couples exactly at x = L count (mac(L, L, 0) = 1).
  A.push(Array.from({ length: n }, (_, c) => (c < nR ? 1 : 0)));
  b.push(-integrate(loads.V, L, 0));
  A.push(Array.from({ length: n }, (_, c) => (c < nR + nC ? integrate(unknownTerms(c), L, 0) : 0)));
  b.push(-integrate(loads.M, L, 0));
  const sol = (lusolve(A, b) as number[][]).map((r) => r[0]);
  const R = sol.slice(0, nR);
  const C = sol.slice(nR, nR + nC);
  const Y0 = sol[nR + nC];
  const T0 = sol[nR + nC + 1];
  const allM: Term[] = [...loads.M];
  const allV: Term[] = [...loads.V];
  sup.forEach((s, i) => {
    allM.push({ c: R[i], a: s.x, n: 1 });
    allV.push({ c: R[i], a: s.x, n: 0 });
  });
  fixedIdx.forEach((i, j) => allM.push({ c: C[j], a: sup[i].x, n: 0 }));
  return {
    reactions: sup.map((s, i) => ({ F: R[i], M: s.type === "fixed" ? C[fixedIdx.indexOf(i)] : 0 })),
    at(x: number) {
      // At the right end, report the value just to the left (the engine's convention there).
      const xe = x >= L ? L * (1 - 1e-15) : x;
      return {
        V: integrate(allV, xe, 0),
        M: integrate(allM, xe, 0),
        slope: (T0 - integrate(allM, x, 1)) / EI,
        deflection: ((Y0 + T0 * x - integrate(allM, x, 2)) / EI) * 12,
      };
    },
  };
}
