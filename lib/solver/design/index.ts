/** Member design checks and sizing (issue 4). Pure: pass the material tables in. */
export { checkMember, evaluateMember, NOT_CHECKED, CAUTION, type CheckOutput, type MemberSummary, type Evaluation } from "./check";
export { sizeMember, largestSpan, candidateSpecs, type SizeOutput, type SizeCandidateResult, type SizeFailure, type SpanOutput } from "./size";
export { DesignInputError, type DesignIssue } from "./errors";
export { DESIGN_RULES, DESIGN_RULES_CHANGE } from "./rules";
export {
  checkInputSchema,
  sizeInputSchema,
  spanInputSchema,
  memberSchema,
  type CheckInput,
  type SizeInput,
  type SpanInput,
  type MemberSpec,
  type SizeFamily,
  type DesignLoad,
} from "./schema";
export { DEFLECTION_PRESETS, resolveLimits, type DeflectionPreset } from "./presets";
export type { DesignCheck, SupportReaction, CheckName } from "./types";
export type { WoodFactors } from "./wood";
export type { SteelFactors } from "./steel";
export { OCCUPANCY_PRESETS, type AreaLoadPreset } from "../asce7/loads";
export { EXPOSURE_CE, THERMAL_CT, designFlatRoofSnow, flatRoofSnowPf } from "../asce7/snow";
