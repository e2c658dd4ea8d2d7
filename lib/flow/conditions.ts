/**
 * Which service questions apply to the material the builder chose. Wet service, incising and
 * repetitive members change wood's design values only (NDS 2018 §4.3.3 CM, §4.3.8 Ci, §4.3.9 Cr); a
 * W-shape or a cold-formed C-section is checked the same wet or dry. The flow asks only what applies,
 * the request sends only what applies, and the sheet lists only what applies, so the phone (offline)
 * and the server answer the same request. Pure.
 */
import type { FlowState, MaterialFamily } from "./state";

/**
 * How a question applies: `all` to every candidate, `wood` only to the wood among them (the "any
 * material" search, where it is worded as about wood), `no` to none (not asked, not sent).
 */
export type Applies = "all" | "wood" | "no";

export interface ConditionQuestions {
  /** wet service: sawn, built-up and engineered wood (glulam; LVL and PSL are dry service only) */
  wet: Applies;
  /** joists share the load (Cr): sawn dimension lumber joists at 24 in or less */
  repetitive: Applies;
  /** treated lumber incised (Ci): sawn dimension lumber when treated (wet, or a deck member) */
  incised: Applies;
}

const WET: Readonly<Record<MaterialFamily, Applies>> = {
  any: "wood",
  sawn: "all",
  "built-up": "all",
  engineered: "all",
  // I-joists are dry service only (APA PRI-400): never sent wet, the flow says so instead of asking
  ijoist: "no",
  steel: "no",
  cfs: "no",
};

const SAWN: Readonly<Record<MaterialFamily, Applies>> = {
  any: "wood",
  sawn: "all",
  "built-up": "all",
  engineered: "no",
  ijoist: "no",
  steel: "no",
  cfs: "no",
};

/** Whether the state's member is treated lumber: said to be wet, or a deck member. */
export function isTreated(state: Pick<FlowState, "kind" | "wet" | "material">): boolean {
  return wetApplies(state.material.family) !== "no" && (state.wet || state.kind === "deck-joist" || state.kind === "deck-beam");
}

function wetApplies(family: MaterialFamily): Applies {
  return WET[family];
}

/** The questions to ask (and send) for a state. */
export function conditionQuestions(state: Pick<FlowState, "kind" | "wet" | "material" | "width">): ConditionQuestions {
  const family = state.material.family;
  return {
    wet: WET[family],
    repetitive: state.width.mode === "spacing" ? SAWN[family] : "no",
    incised: isTreated(state) ? SAWN[family] : "no",
  };
}

/** Wet service as the checks take it: the builder's answer where it applies, dry otherwise. */
export function wetInEffect(state: Pick<FlowState, "kind" | "wet" | "material" | "width">): boolean {
  return conditionQuestions(state).wet !== "no" && state.wet;
}
