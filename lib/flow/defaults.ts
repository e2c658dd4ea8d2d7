/**
 * Sensible starting inputs for each kind of member, so a builder who only types the span gets a
 * reasonable answer. Every value can be changed in the flow. Load values come from the occupancy
 * presets (IRC 2021 Table R301.5 and the common-practice dead loads in lib/solver/asce7/loads).
 */
import { findOccupancyPreset } from "@/lib/solver/asce7/loads";
import type { FlowAreaLoad, FlowLineLoad, FlowState, MemberKind } from "./state";

function presetLoad(presetId: string): FlowAreaLoad {
  const preset = findOccupancyPreset(presetId);
  if (!preset) throw new Error(`unknown occupancy preset ${presetId}`);
  return { id: `a-${presetId}`, preset: preset.id, label: preset.label, case: preset.case, psf: preset.psf };
}

const SIMPLE = (lengthFt: number): Pick<FlowState, "lengthFt" | "supports"> => ({
  lengthFt,
  supports: [
    { x: 0, type: "pin" },
    { x: lengthFt, type: "roller" },
  ],
});

/** A wall standing on the header: studs, plates and finishes of about 10 psf over the wall's height (common practice). */
const WALL_ABOVE = (lengthFt: number): FlowLineLoad => ({
  id: "l-wall",
  label: "Wall above (studs, plates, finishes)",
  from: 0,
  to: lengthFt,
  w: 80,
  case: "D",
});

const BASE: Omit<FlowState, "kind" | "lengthFt" | "supports" | "width" | "areaLoads" | "material"> = {
  version: 1,
  snow: { on: false, groundPsf: 30, exposure: "partially-exposed", thermal: "heated" },
  pointLoads: [],
  lineLoads: [],
  bearingIn: 1.5,
  limits: { live: 360, total: 240 },
  wet: false,
  repetitive: false,
  unbracedFt: 0,
  bottomBraced: false,
  selfWeight: true,
  loadStandard: "ASCE 7-16",
  incised: null,
};

/** The starting state for a kind of member. */
export function defaultFlowState(kind: MemberKind): FlowState {
  switch (kind) {
    case "floor-joist":
      return {
        ...BASE,
        kind,
        ...SIMPLE(12),
        width: { mode: "spacing", spacingIn: 16 },
        areaLoads: [presetLoad("living"), presetLoad("floor-dead")],
        material: { family: "sawn", species: "Douglas Fir-Larch", grade: "No.2", plies: 1, product: "" },
        repetitive: true,
      };
    case "header":
      return {
        ...BASE,
        kind,
        ...SIMPLE(6),
        width: { mode: "tributary", tributaryFt: 13 },
        areaLoads: [presetLoad("roof-dead"), presetLoad("roof-live")],
        snow: { ...BASE.snow, on: true },
        lineLoads: [WALL_ABOVE(6)],
        material: { family: "built-up", species: "Douglas Fir-Larch", grade: "No.2", plies: 0, product: "" },
        limits: { live: 240, total: 180 },
        bearingIn: 3,
        wallFraming: "2x4",
        roughOpeningFt: null,
      };
    case "beam":
      return {
        ...BASE,
        kind,
        // a girder on posts about 10 ft apart (common practice): built up of 2x plies it is a 3-ply 2x12
        ...SIMPLE(10),
        width: { mode: "tributary", tributaryFt: 12 },
        areaLoads: [presetLoad("living"), presetLoad("floor-dead")],
        material: { family: "built-up", species: "Douglas Fir-Larch", grade: "No.2", plies: 0, product: "" },
        bearingIn: 3,
      };
    case "deck-joist":
      return {
        ...BASE,
        kind,
        ...SIMPLE(12),
        width: { mode: "spacing", spacingIn: 16 },
        areaLoads: [presetLoad("deck"), presetLoad("floor-dead")],
        material: { family: "sawn", species: "Southern Pine", grade: "No.2", plies: 1, product: "" },
        wet: true,
        repetitive: true,
      };
    case "deck-beam":
      return {
        ...BASE,
        kind,
        lengthFt: 10,
        supports: [
          { x: 1, type: "pin" },
          { x: 9, type: "roller" },
        ],
        width: { mode: "tributary", tributaryFt: 6 },
        areaLoads: [presetLoad("deck"), presetLoad("floor-dead")],
        material: { family: "built-up", species: "Southern Pine", grade: "No.2", plies: 0, product: "" },
        bearingIn: 3.5,
        wet: true,
      };
    case "rafter":
      return {
        ...BASE,
        kind,
        ...SIMPLE(12),
        width: { mode: "spacing", spacingIn: 24 },
        areaLoads: [presetLoad("roof-dead"), presetLoad("roof-live")],
        snow: { ...BASE.snow, on: true },
        material: { family: "sawn", species: "Douglas Fir-Larch", grade: "No.2", plies: 1, product: "" },
        // IRC 2021 Table R301.7: L/240 with a flexible ceiling finish; total L/180, IBC 2021 Table 1604.3 (roof members, nonplaster ceiling)
        limits: { live: 240, total: 180 },
        repetitive: true,
      };
  }
}

/** Why each default is what it is, shown beside the inputs. */
export const KIND_HINTS: Readonly<Record<MemberKind, string>> = {
  "floor-joist": "Joists at 16 in, 40 psf live and 10 psf dead (IRC 2021 Table R301.5), L/360 under live load.",
  header: "A header in a bearing wall: roof over a 13 ft tributary width, snow from 30 psf ground snow, 80 plf of wall above.",
  beam: "A beam carrying floor joists from both sides: half of each joist span, 12 ft in all.",
  "deck-joist": "Deck joists at 16 in, 40 psf live and 10 psf dead, treated lumber in wet service.",
  "deck-beam": "A beam on two posts, 1 ft past each post, carrying half of 12 ft deck joists.",
  rafter: "Rafters at 24 in under roof dead load, roof live load and snow, measured on the level (horizontal span).",
};
