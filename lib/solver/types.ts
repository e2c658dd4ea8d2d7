/**
 * Public types of the beam analysis engine (the solver contract).
 *
 * Units at this boundary are the trade's imperial units: lengths in ft, forces in lb,
 * line loads in plf (lb/ft), couples in lb-ft, E in psi, I in in^4, deflection in in,
 * slope in radians. Sign convention: see lib/solver/beam/index.ts (stated once there).
 */

/** Support types and load cases: one list each, every schema and type built from them. */
export const SUPPORT_TYPES = ["pin", "roller", "fixed"] as const;
export type SupportType = (typeof SUPPORT_TYPES)[number];

/** Load cases as ASCE 7 names them. */
export const LOAD_CASES = ["D", "L", "Lr", "S", "W"] as const;
export type LoadCase = (typeof LOAD_CASES)[number];

/** "must be one of "D", "L", "Lr", "S", "W"": the message every schema gives for a word not on its list. */
export function oneOfMessage(list: readonly string[]): string {
  return `must be one of ${list.map((w) => `"${w}"`).join(", ")}`;
}

/** "must be "pin", "roller" or "fixed"". */
export function eitherMessage(list: readonly string[]): string {
  const q = list.map((w) => `"${w}"`);
  return `must be ${q.slice(0, -1).join(", ")} or ${q[q.length - 1]}`;
}

export interface Support {
  /** position along the member, ft from the left end */
  x: number;
  type: SupportType;
}

export type Load =
  | { type: "point"; x: number; P: number; case?: LoadCase }
  | { type: "udl"; from: number; to: number; w: number; case?: LoadCase }
  | { type: "linear"; from: number; to: number; w1: number; w2: number; case?: LoadCase }
  | { type: "moment"; x: number; M: number; case?: LoadCase };

export interface BeamInput {
  /** ft */
  length: number;
  /** psi */
  E: number;
  /** in^4 */
  I: number;
  supports: Support[];
  loads: Load[];
  /** stations to report, ft */
  at?: number[];
}

/** Factors by load case, e.g. { D: 1.2, L: 1.6 }. A case left out has factor 0. */
export type Combination = Partial<Record<LoadCase, number>>;

export interface NamedCombination {
  /** e.g. "D+0.75L+0.75S" */
  name: string;
  factors: Combination;
}

export interface Reaction {
  x: number;
  /** lb, positive upward */
  F: number;
  /** lb-ft, positive clockwise; 0 at a pin or roller */
  M: number;
}

export interface Station {
  x: number;
  V: number;
  M: number;
  slope: number;
  deflection: number;
}

export interface Extreme {
  value: number;
  x: number;
}
