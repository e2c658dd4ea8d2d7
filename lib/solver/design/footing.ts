/**
 * A plain concrete spread footing under one post, sized for the soil: the largest service (ASD)
 * load on it plus its own weight over the plan area must not pass the soil's allowable bearing
 * pressure. IRC 2021 §R401.4.1 and Table R401.4.1 (presumptive load-bearing values, 1,500 psf where
 * the soil is not known), §R403.1.1 (spread footings at least 6 in thick; projections at least 2 in
 * and not more than the thickness), §R403.1.4 (bottom at least 12 in below undisturbed ground and
 * below the frost depth the local code sets). Pure. Units: lb, psf, in, ft² for areas.
 */
import { asdCombinations } from "../asce7/combinations";
import { DEFAULT_LOAD_STANDARD, type LoadStandard } from "../asce7/standard";
import { LOAD_CASES, type LoadCase } from "../types";
import { DesignInputError } from "./errors";
import type { LoadsByCase } from "./post";

/**
 * IRC 2021 Table R401.4.1 presumptive load-bearing values of foundation materials, psf. Read in a
 * published copy quoting the IRC table (experts123.com, "Table R401.4.1 Presumptive load-bearing
 * values…") and in IBC 2012 Table 1806.2 as reproduced on what-when-how.com (same five classes and values).
 */
export const SOIL_CLASSES = [
  { id: "bedrock", words: "Crystalline bedrock", psf: 12000 },
  { id: "rock", words: "Sedimentary and foliated rock", psf: 4000 },
  { id: "gravel", words: "Sandy gravel and/or gravel (GW and GP)", psf: 3000 },
  { id: "sand", words: "Sand, silty sand, clayey sand, silty gravel and clayey gravel (SW, SP, SM, SC, GM and GC)", psf: 2000 },
  { id: "clay", words: "Clay, sandy clay, silty clay, clayey silt, silt and sandy silt (CL, ML, MH and CH)", psf: 1500 },
] as const;
export const DEFAULT_SOIL_PSF = 1500;
export const SOIL_TABLE_SOURCE = "IRC 2021 Table R401.4.1; read in a published copy (experts123.com) and IBC 2012 Table 1806.2 (what-when-how.com)";

/** Concrete unit weight, pcf (normal-weight plain concrete; common practice). */
export const CONCRETE_PCF = 150;
/** IRC 2021 §R403.1.1: spread footings at least 6 in thick; projection at least 2 in. */
export const MIN_FOOTING_THICKNESS_IN = 6;
export const MIN_PROJECTION_IN = 2;
/** IRC 2021 §R403.1.4: the bottom at least 12 in below undisturbed ground. */
export const MIN_FOOTING_DEPTH_IN = 12;

export const FOOTING_SHAPES = ["round", "square"] as const;
export type FootingShape = (typeof FOOTING_SHAPES)[number];

export interface FootingInput {
  shape: FootingShape;
  /** diameter (round) or side (square), in; not given: the smallest whole inch that works */
  sizeIn?: number | null;
  thicknessIn: number;
  /** allowable soil bearing pressure, psf */
  soilPsf: number;
  /** frost depth the local code sets, in (0 where there is none) */
  frostDepthIn: number;
  /** how deep the footing's bottom is set below grade, in; not given: the frost depth or 12 in, whichever is deeper */
  bottomDepthIn?: number | null;
  /** the post's width on the footing, in (for the projection) */
  postWidthIn: number;
  /** loads by case at the footing's top (the post's load and its own weight in D), lb */
  loads: LoadsByCase;
  loadStandard?: LoadStandard;
}

export interface FootingOutput {
  pass: boolean;
  ratio: number;
  /** "18 in round × 8 in thick, bottom 36 in below grade" */
  answer: string;
  shape: FootingShape;
  sizeIn: number;
  thicknessIn: number;
  bottomDepthIn: number;
  /** plan area given and needed, ft² */
  areaFt2: number;
  requiredAreaFt2: number;
  /** largest service load on the footing (governing ASD combination) and the footing's own weight, lb */
  loadLb: number;
  loadCombination: string;
  selfWeightLb: number;
  soilPsf: number;
  /** what does not pass, in words (empty when it passes) */
  problems: string[];
  source: string;
}

/** Plan area of a round (diameter) or square (side) footing, ft². */
export function footingAreaFt2(shape: FootingShape, sizeIn: number): number {
  return shape === "round" ? (Math.PI * sizeIn * sizeIn) / 4 / 144 : (sizeIn * sizeIn) / 144;
}

/**
 * Plan area the soil needs, ft²: A = (P + Wf) / q, Wf = A · t · γc, so A = P / (q − t·γc).
 * Example: P = 4,200 lb, q = 1,500 psf, t = 10 in → A = 4,200 / (1,500 − 125) = 3.05 ft².
 */
export function requiredFootingAreaFt2(loadLb: number, soilPsf: number, thicknessIn: number, concretePcf = CONCRETE_PCF): number {
  const net = soilPsf - (thicknessIn / 12) * concretePcf;
  if (net <= 0) return Infinity;
  return loadLb / net;
}

/** Sizes or checks one footing under its post. */
export function checkFooting(input: FootingInput): FootingOutput {
  const issues: { path: string; message: string }[] = [];
  if (!(input.soilPsf >= 500 && input.soilPsf <= 12000)) issues.push({ path: "soilPsf", message: "must be 500 to 12,000 psf" });
  if (!(input.thicknessIn >= 1 && input.thicknessIn <= 48)) issues.push({ path: "thicknessIn", message: "must be 1 to 48 in" });
  if (!(input.frostDepthIn >= 0 && input.frostDepthIn <= 120)) issues.push({ path: "frostDepthIn", message: "must be 0 to 120 in" });
  if (input.sizeIn != null && !(input.sizeIn >= 6 && input.sizeIn <= 120)) issues.push({ path: "sizeIn", message: "must be 6 to 120 in" });
  if (issues.length > 0) throw new DesignInputError(issues);

  const standard = input.loadStandard ?? DEFAULT_LOAD_STANDARD;
  const cases = LOAD_CASES.filter((c) => (input.loads[c] ?? 0) !== 0);
  let load = { P: 0, name: "D" };
  for (const combo of asdCombinations(cases.length > 0 ? cases : (["D"] as LoadCase[]), standard)) {
    let P = 0;
    for (const c of LOAD_CASES) P += (combo.factors[c] ?? 0) * (input.loads[c] ?? 0);
    if (P > load.P) load = { P, name: combo.name };
  }
  const required = requiredFootingAreaFt2(load.P, input.soilPsf, input.thicknessIn);
  let size = input.sizeIn ?? null;
  if (size === null) {
    const minSize = input.postWidthIn + 2 * MIN_PROJECTION_IN;
    size = Math.max(12, Math.ceil(minSize));
    while (footingAreaFt2(input.shape, size) < required && size < 120) size += 1;
  }
  const area = footingAreaFt2(input.shape, size);
  const selfWeight = area * (input.thicknessIn / 12) * CONCRETE_PCF;
  const pressure = (load.P + selfWeight) / area;
  const bottom = input.bottomDepthIn ?? Math.max(input.frostDepthIn, MIN_FOOTING_DEPTH_IN);
  const projection = (size - input.postWidthIn) / 2;
  const problems: string[] = [];
  if (pressure > input.soilPsf) problems.push(`soil pressure ${Math.round(pressure)} psf is over the ${input.soilPsf} psf allowed (IRC 2021 R401.4.1)`);
  if (input.thicknessIn < MIN_FOOTING_THICKNESS_IN) problems.push(`thinner than the ${MIN_FOOTING_THICKNESS_IN} in IRC 2021 R403.1.1 asks`);
  if (projection < MIN_PROJECTION_IN)
    problems.push(`projects ${projection.toFixed(1)} in past the post, less than ${MIN_PROJECTION_IN} in (IRC 2021 R403.1.1)`);
  if (projection > input.thicknessIn) {
    problems.push(`projects ${projection.toFixed(1)} in past the post, more than its ${input.thicknessIn} in thickness (IRC 2021 R403.1.1): make it thicker`);
  }
  if (bottom < MIN_FOOTING_DEPTH_IN) problems.push(`bottom ${bottom} in below grade, less than ${MIN_FOOTING_DEPTH_IN} in (IRC 2021 R403.1.4)`);
  if (bottom < input.frostDepthIn) problems.push(`bottom ${bottom} in below grade, above the ${input.frostDepthIn} in frost depth (IRC 2021 R403.1.4.1)`);
  const ratio = Math.round((pressure / input.soilPsf) * 1000) / 1000;
  const shapeWords = input.shape === "round" ? `${size} in round` : `${size} x ${size} in square`;
  return {
    pass: problems.length === 0,
    ratio,
    answer: `${shapeWords} × ${input.thicknessIn} in thick, bottom ${bottom} in below grade`,
    shape: input.shape,
    sizeIn: size,
    thicknessIn: input.thicknessIn,
    bottomDepthIn: bottom,
    areaFt2: area,
    requiredAreaFt2: required,
    loadLb: Math.round(load.P),
    loadCombination: load.name,
    selfWeightLb: Math.round(selfWeight),
    soilPsf: input.soilPsf,
    problems,
    source: SOIL_TABLE_SOURCE,
  };
}
