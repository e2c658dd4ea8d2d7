/**
 * The flow's state as the design routes' JSON (POST /api/size, and the check the server runs when a
 * member is saved or a sheet is made). Pure.
 */
import { EXPOSURE_CE, THERMAL_CT } from "@/lib/solver/asce7/snow";
import type { LoadStandard } from "@/lib/solver/asce7/standard";
import { DEFLECTION_PRESETS } from "@/lib/solver/design/presets";
import type { z } from "zod";
import type { checkFieldsSchema, DesignLoad, MemberSpec, sizeFamilySchema, sizeFieldsSchema } from "@/lib/solver/design/schema";
import { conditionQuestions } from "./conditions";
import { mainSpanFt, overhangs, sortedSupports, wallOf, type FlowMaterial, type FlowState } from "./state";

/** The request bodies, typed by the server's own schemas (what /api/size and /api/check accept). */
export type SizeFamilyRequest = z.input<typeof sizeFamilySchema>;
export type SizeRequest = z.input<typeof sizeFieldsSchema>;
export type CheckRequest = z.input<typeof checkFieldsSchema>;
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
    case "cfs":
      // the product field holds the flange width asked for ("" = every width)
      return Number(material.product) > 0 ? { material: "cfs", flanges: [Number(material.product)] } : { material: "cfs" };
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

/**
 * The design input of a state. `carried` are loads other members put on this one (their reactions,
 * by case, as line or point loads: see lib/jobs/load-path.ts); they are added to the state's own.
 */
export function designBase(state: FlowState, carried: readonly DesignLoad[] = []): DesignRequestBase {
  const width = state.width.mode === "spacing" ? { spacingIn: state.width.spacingIn } : { tributaryFt: state.width.tributaryFt };
  const ro = roughOpeningToSend(state);
  const wall = wallOf(state);
  // with a rough opening the span is the opening plus half the bearing at each end, exactly
  const span = ro !== undefined ? ro + state.bearingIn / 12 : undefined;
  const standard: LoadStandard = state.loadStandard ?? "ASCE 7-16";
  const asked = conditionQuestions(state);
  return {
    ...(span !== undefined && ro !== undefined
      ? {
          roughOpeningFt: ro,
          lengthFt: span,
          supports: [
            { x: 0, type: "pin" as const },
            { x: span, type: "roller" as const },
          ],
        }
      : { lengthFt: state.lengthFt, supports: sortedSupports(state.supports) }),
    ...width,
    loads: [...designLoads(state), ...carried],
    bearingIn: state.bearingIn,
    conditions: {
      // only the questions that apply to the material go (lib/flow/conditions.ts): steel is never sent wet
      ...(asked.wet !== "no" ? { wet: state.wet } : {}),
      // not said: the engine's default by species (NDS 2018 §4.3.8)
      ...(asked.incised !== "no" && (state.incised === true || state.incised === false) ? { incised: state.incised } : {}),
      // joists say whether they share the load; beams and headers take the engine's rule (3+ plies, NDS 2018 §4.3.9)
      ...(asked.repetitive !== "no" ? { repetitive: state.repetitive } : {}),
      unbracedLengthFt: state.unbracedFt,
      bottomEdgeBraced: state.bottomBraced === true,
      selfWeight: state.selfWeight,
    },
    limits: limitsFor(state),
    method: "asd",
    loadStandard: standard,
    kind: state.kind,
    ...(wall ? { wallFraming: wall } : {}),
  };
}

/** How many passing members the flow asks for, each with its whole check (any of them may be chosen). */
const SIZE_LIMIT = 12;

export function sizeRequest(state: FlowState, carried: readonly DesignLoad[] = []): SizeRequest {
  return { ...designBase(state, carried), member: sizeFamily(state.material), limit: SIZE_LIMIT, failures: 3, fullChecks: SIZE_LIMIT };
}

export function checkRequest(state: FlowState, member: MemberSpec, carried: readonly DesignLoad[] = []): CheckRequest {
  return { ...designBase(state, carried), member };
}
