/**
 * The flow's state as the design routes' JSON (POST /api/size, and the check the server runs when a
 * member is saved or a sheet is made). Pure.
 */
import { EXPOSURE_CE, THERMAL_CT } from "@/lib/solver/asce7/snow";
import type { MemberKind } from "@/lib/solver/design/kinds";
import { deflectionPreset } from "@/lib/solver/design/presets";
import type { z } from "zod";
import type { checkInputSchema, DeflectionPresetId, DesignLoad, MemberSpec, sizeFamilySchema, sizeInputSchema } from "@/lib/solver/design/schema";
import { sortedSupports, type FlowMaterial, type FlowState } from "./state";

/** The request bodies, typed by the server's own schemas (what /api/size and /api/check accept). */
export type SizeFamilyRequest = z.input<typeof sizeFamilySchema>;
export type SizeRequest = z.input<typeof sizeInputSchema>;
export type CheckRequest = z.input<typeof checkInputSchema>;
export type DesignRequestBase = Omit<CheckRequest, "member">;

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

/** The deflection preset a kind of member starts from (so the answer names the right row of the table). */
const KIND_LIMITS: Record<MemberKind, DeflectionPresetId> = {
  "floor-joist": "floor",
  "deck-joist": "floor",
  "deck-beam": "floor",
  beam: "floor",
  header: "other",
  rafter: "ceiling-flexible",
};

/** The preset for the kind, with the builder's numbers only where they differ from it. */
function limitsFor(state: FlowState): { preset: DeflectionPresetId; live?: number; total?: number } {
  const preset = deflectionPreset(KIND_LIMITS[state.kind]);
  return {
    preset: preset.id,
    ...(state.limits.live !== preset.live ? { live: state.limits.live } : {}),
    ...(state.limits.total !== preset.total ? { total: state.limits.total } : {}),
  };
}

export function designBase(state: FlowState): DesignRequestBase {
  const width = state.width.mode === "spacing" ? { spacingIn: state.width.spacingIn } : { tributaryFt: state.width.tributaryFt };
  return {
    lengthFt: state.lengthFt,
    supports: sortedSupports(state.supports),
    ...width,
    loads: designLoads(state),
    bearingIn: state.bearingIn,
    conditions: { wet: state.wet, incised: false, repetitive: state.repetitive, unbracedLengthFt: state.unbracedFt, selfWeight: state.selfWeight },
    limits: limitsFor(state),
    method: "asd",
    kind: state.kind,
  };
}

/** How many passing members the flow asks for, each with its whole check (any of them may be chosen). */
const SIZE_LIMIT = 12;

export function sizeRequest(state: FlowState): SizeRequest {
  return { ...designBase(state), member: sizeFamily(state.material), limit: SIZE_LIMIT, failures: 3, fullChecks: SIZE_LIMIT };
}

export function checkRequest(state: FlowState, member: MemberSpec): CheckRequest {
  return { ...designBase(state), member };
}
