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
import type { LoadStandard } from "@/lib/solver/asce7/standard";
import type { MemberKind, WallFraming } from "@/lib/solver/design/kinds";
import { DEFLECTION_PRESETS } from "@/lib/solver/design/presets";
import type { DeflectionPresetId } from "@/lib/solver/design/schema";
import { mainSpanFt, overhangs, sortedSupports, wallOf, type FlowMaterial, type FlowState } from "./state";

/** The size family the search is limited to. */
export type SizeFamilyRequest =
  | { material: "any" }
  | { material: "sawn"; species: string; grade: string; plies: number[] }
  | { material: "engineered"; product?: string }
  | { material: "ijoist"; series?: string; stiffeners: boolean }
  | { material: "steel"; grade: string };

export interface DesignRequestBase {
  /** absent when the span comes from roughOpeningFt */
  length?: number;
  supports?: { x: number; type: "pin" | "roller" | "fixed" }[];
  roughOpeningFt?: number;
  spacing?: number;
  tributary?: number;
  loads: DesignLoad[];
  bearing: number;
  conditions: { wet: boolean; incised?: boolean; repetitive?: boolean; unbracedLength: number; selfWeight: boolean };
  /** a preset (so the answer cites its source) when the flow's numbers are one, else the numbers */
  limits: { preset: DeflectionPresetId } | { live: number; total: number };
  method: "asd";
  loadStandard: LoadStandard;
  kind: MemberKind;
  wallFraming?: WallFraming;
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

/**
 * The deflection limits as a preset when the flow's numbers are one (floors for floor and deck members,
 * the roof presets for headers and rafters), so the answer and sheet cite IRC R301.7 / IBC 1604.3.
 */
export function limitsFor(state: FlowState): DesignRequestBase["limits"] {
  const matches = DEFLECTION_PRESETS.filter((p) => p.live === state.limits.live && p.total === state.limits.total);
  const roof = state.kind === "rafter" || state.kind === "header";
  const pick = matches.find((p) => (roof ? p.id.startsWith("ceiling") || p.id.startsWith("roof") : p.id.startsWith("floor"))) ?? matches[0];
  return pick ? { preset: pick.id } : { live: state.limits.live, total: state.limits.total };
}

/** The rough opening to send, when the builder gave one and the member is still a simple span of that size. */
export function roughOpeningToSend(state: FlowState): number | undefined {
  const ro = state.roughOpeningFt;
  if (ro === null || ro === undefined || state.kind !== "header" || state.supports.length !== 2) return undefined;
  const { left, right } = overhangs(state);
  if (left > 1e-9 || right > 1e-9 || Math.abs(mainSpanFt(state) - (ro + state.bearingIn / 12)) > 1 / 192) return undefined;
  return ro;
}

export function designBase(state: FlowState): DesignRequestBase {
  const width = state.width.mode === "spacing" ? { spacing: state.width.spacingIn } : { tributary: state.width.tributaryFt };
  const ro = roughOpeningToSend(state);
  const wall = wallOf(state);
  return {
    ...(ro !== undefined ? { roughOpeningFt: ro } : { length: state.lengthFt, supports: sortedSupports(state.supports) }),
    ...width,
    loads: designLoads(state),
    bearing: state.bearingIn,
    conditions: {
      wet: state.wet,
      // not said: the engine's default by species (NDS 2018 §4.3.8)
      ...(state.incised === true || state.incised === false ? { incised: state.incised } : {}),
      // joists say whether they share the load; beams and headers take the engine's rule (3+ plies, NDS 2018 §4.3.9)
      ...(state.width.mode === "spacing" ? { repetitive: state.repetitive } : {}),
      unbracedLength: state.unbracedFt,
      selfWeight: state.selfWeight,
    },
    limits: limitsFor(state),
    method: "asd",
    loadStandard: state.loadStandard ?? "ASCE 7-16",
    kind: state.kind,
    ...(wall ? { wallFraming: wall } : {}),
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
 * ASCE 7 generator names them (either edition); a nested factor such as 0.75(0.6W) multiplies out.
 */
export function combinationFactors(name: string): Combination | null {
  const known = [...asdCombinations([...LOAD_CASES], "ASCE 7-16"), ...asdCombinations([...LOAD_CASES], "ASCE 7-22")].find((c) => c.name === name);
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
  const loads: Load[] = takeDown(base.loads, state.lengthFt, width, base.loadStandard).map((t) => t.load);
  if (state.selfWeight && check.member.weightPlf > 0) loads.push({ type: "udl", case: "D", from: 0, to: state.lengthFt, w: check.member.weightPlf });
  // an I-joist gives its EI, not a section: the diagram's bending deflection from EI (shear deflection is in the check)
  const EI = check.member.section.EI;
  if (EI !== undefined && EI > 0) return { length: state.lengthFt, E: EI, I: 1, supports: sortedSupports(state.supports), loads };
  const factors = check.factors as { EPrime?: number };
  const E = typeof factors.EPrime === "number" && factors.EPrime > 0 ? factors.EPrime : 29_000_000;
  return { length: state.lengthFt, E, I: check.member.section.I, supports: sortedSupports(state.supports), loads };
}
