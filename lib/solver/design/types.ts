/** Output shapes of the design checks (`npm run check`, POST /api/check) and the sizing search. */
import type { Combination, SupportType } from "../types";

/** A load combination as the checks used it: its name ("D+0.75L+0.75S") and its factors by case. */
export interface CombinationRef {
  name: string;
  factors: Combination;
}

/** Every check a member can carry, in the order a reader meets them (words for each: ./check-words.ts). */
export const CHECK_NAMES = [
  "bending",
  "shear",
  "deflection-live",
  "deflection-total",
  "bearing",
  "stability",
  "web-yielding",
  "web-crippling",
  "web-compactness",
  "bending-crippling",
  "bending-shear",
  "flange-roll",
  "thickness-scope",
] as const;
export type CheckName = (typeof CHECK_NAMES)[number];

export interface DesignCheck {
  name: CheckName;
  /** the largest demand found (stress, moment, force or deflection) */
  demand: number;
  /** what the member is allowed at that place and in that combination */
  capacity: number;
  /** unit of demand and capacity: "psi", "kip-ft", "kip", "lb", "in" */
  unit: string;
  /** demand / capacity; the check passes at 1.0 or less */
  ratio: number;
  /** the load combination that governs, e.g. { name: "D+L", factors: { D: 1, L: 1 } }; deflection-live names only the live part */
  combination: CombinationRef | null;
  /** where along the member, ft; null where the check is not at one place */
  x: number | null;
  /** plain words on what was checked, e.g. "span 1, L/360 = 0.47 in" */
  note: string;
}

export interface SupportReaction {
  /** ft */
  x: number;
  type: SupportType;
  /** largest downward reaction over the service (ASD) combinations, lb (the support pushes up) */
  maxDown: number;
  maxDownCombination: string;
  /** largest uplift over the service combinations, lb, 0 when the member never lifts */
  uplift: number;
  upliftCombination: string | null;
  /** unfactored reaction by load case, lb (D includes the member's own weight when counted) */
  byCase: Partial<Record<"D" | "L" | "Lr" | "S" | "W", number>>;
  /** with live load placed span by span: the largest live reaction here, lb, where it is more than byCase.L (what a carrier below must take) */
  liveMax?: number;
  /** bearing length given, in */
  bearing: number;
  /** bearing length the member needs here, in (steel: for web local yielding and web crippling; 48 means more than 48 in) */
  requiredBearing: number;
  /** supports at the ends of a wood member, or of a steel member in a stud wall: 1-1/2 in jack studs needed under this end; null otherwise */
  jackStuds: number | null;
  /** a steel member in a stud wall: the bearing the wood under it needs and the steel's own, in; the width it bears with, in; the wood's Fc⊥ used, psi */
  studs?: { woodIn: number; steelIn: number; widthIn: number; FcPerpPsi: number };
  /** cold-formed steel: a bearing stiffener is needed at this support (the answer says so) */
  bearingStiffener?: boolean;
}

/** A check as the material modules write it: the combination by name, resolved to its factors once per member. */
export type NamedCheck = Omit<DesignCheck, "combination"> & { combination: string | null };
