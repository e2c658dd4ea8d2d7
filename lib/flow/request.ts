/**
 * The flow's state as the design routes' JSON (issue 4 contract: POST /api/size and /api/check),
 * and the pieces the answer screen needs to draw the diagrams of the chosen member. Pure.
 */
import { EXPOSURE_CE, THERMAL_CT } from "@/lib/solver/asce7/snow";
import { asdCombinations } from "@/lib/solver/asce7/combinations";
import { takeDown } from "@/lib/solver/design/take-down";
import type { DesignLoad, MemberSpec } from "@/lib/solver/design/schema";
import type { CheckOutput } from "@/lib/solver/design/check";
import { LOAD_CASES, type BeamInput, type Combination, type Load, type LoadCase } from "@/lib/solver/types";
import { sortedSupports, type FlowMaterial, type FlowState } from "./state";

/** The size family the search is limited to. */
export type SizeFamilyRequest =
  | { material: "any" }
  | { material: "sawn"; species: string; grade: string; plies: number[] }
  | { material: "engineered"; product?: string }
  | { material: "ijoist"; series?: string; stiffeners: boolean }
  | { material: "steel"; grade: string };

export interface DesignRequestBase {
  length: number;
  supports: { x: number; type: "pin" | "roller" | "fixed" }[];
  spacing?: number;
  tributary?: number;
  loads: DesignLoad[];
  bearing: number;
  conditions: { wet: boolean; incised: boolean; repetitive: boolean; unbracedLength: number; selfWeight: boolean };
  limits: { live: number; total: number };
  method: "asd";
}

export type SizeRequest = DesignRequestBase & { member: SizeFamilyRequest; limit: number; failures: number };
export type CheckRequest = DesignRequestBase & { member: MemberSpec };

export function sizeFamily(material: FlowMaterial): SizeFamilyRequest {
  switch (material.family) {
    case "any":
      return { material: "any" };
    case "sawn":
      return { material: "sawn", species: material.species, grade: material.grade, plies: [1] };
    case "built-up":
      return { material: "sawn", species: material.species, grade: material.grade, plies: material.plies > 0 ? [material.plies] : [2, 3, 4] };
    case "engineered":
      return material.product ? { material: "engineered", product: material.product } : { material: "engineered" };
    case "ijoist":
      return material.product ? { material: "ijoist", series: material.product, stiffeners: false } : { material: "ijoist", stiffeners: false };
    case "steel":
      return { material: "steel", grade: "A992" };
  }
}

/** The loads as the design input takes them: area loads, snow from ground snow, then line and point loads. */
export function designLoads(state: FlowState): DesignLoad[] {
  const loads: DesignLoad[] = [];
  for (const a of state.areaLoads) if (a.psf > 0) loads.push({ type: "area", case: a.case, psf: a.psf });
  if (state.snow.on && state.snow.groundPsf > 0) {
    loads.push({ type: "snow", pg: state.snow.groundPsf, Ce: EXPOSURE_CE[state.snow.exposure], Ct: THERMAL_CT[state.snow.thermal] });
  }
  for (const l of state.lineLoads) loads.push({ type: "udl", case: l.case, from: l.from, to: l.to, w: l.w });
  for (const p of state.pointLoads) loads.push({ type: "point", case: p.case, x: p.x, P: p.P });
  return loads;
}

export function designBase(state: FlowState): DesignRequestBase {
  const width = state.width.mode === "spacing" ? { spacing: state.width.spacingIn } : { tributary: state.width.tributaryFt };
  return {
    length: state.lengthFt,
    supports: sortedSupports(state.supports),
    ...width,
    loads: designLoads(state),
    bearing: state.bearingIn,
    conditions: { wet: state.wet, incised: false, repetitive: state.repetitive, unbracedLength: state.unbracedFt, selfWeight: state.selfWeight },
    limits: { live: state.limits.live, total: state.limits.total },
    method: "asd",
  };
}

export function sizeRequest(state: FlowState): SizeRequest {
  return { ...designBase(state), member: sizeFamily(state.material), limit: 12, failures: 3 };
}

export function checkRequest(state: FlowState, member: MemberSpec): CheckRequest {
  return { ...designBase(state), member };
}

/**
 * Factors of a combination from its name ("D+0.75L+0.75S" → { D: 1, L: 0.75, S: 0.75 }), as the
 * ASCE 7-22 generator names them; a nested factor such as 0.75(0.6W) multiplies out.
 */
export function combinationFactors(name: string): Combination | null {
  const known = asdCombinations([...LOAD_CASES]).find((c) => c.name === name);
  if (known) return known.factors;
  const factors: Combination = {};
  for (const term of name.split("+")) {
    const m = /^\s*(\d*\.?\d*)\s*(?:\(\s*(\d*\.?\d*)\s*)?(D|L|Lr|S|W)\s*\)?\s*$/.exec(term);
    if (!m) return null;
    const f = (m[1] ? Number(m[1]) : 1) * (m[2] ? Number(m[2]) : 1);
    const c = m[3] as LoadCase;
    factors[c] = (factors[c] ?? 0) + f;
  }
  return factors;
}

/**
 * The beam the diagrams draw for a checked member: the taken-down loads with their cases, the
 * member's own weight as dead load when counted, its E′ (or 29,000 ksi for steel) and I.
 */
export function diagramBeam(state: FlowState, check: CheckOutput): BeamInput {
  const base = designBase(state);
  const width = state.width.mode === "spacing" ? { spacingIn: state.width.spacingIn } : { tributaryFt: state.width.tributaryFt };
  const loads: Load[] = takeDown(base.loads, state.lengthFt, width).map((t) => t.load);
  if (state.selfWeight && check.member.weightPlf > 0) loads.push({ type: "udl", case: "D", from: 0, to: state.lengthFt, w: check.member.weightPlf });
  // an I-joist gives its EI, not a section: the diagram's bending deflection from EI (shear deflection is in the check)
  const EI = check.member.section.EI;
  if (EI !== undefined && EI > 0) return { length: state.lengthFt, E: EI, I: 1, supports: base.supports, loads };
  const factors = check.factors as { EPrime?: number };
  const E = typeof factors.EPrime === "number" && factors.EPrime > 0 ? factors.EPrime : 29_000_000;
  return { length: state.lengthFt, E, I: check.member.section.I, supports: base.supports, loads };
}
