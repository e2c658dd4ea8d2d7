/**
 * Sawn wood posts and built-up stud columns in axial compression (ASD): NDS 2018 §3.6–3.7 (column
 * stability factor Cp from the effective length and Emin'), §3.10.1 (end grain bearing on the post),
 * §3.10.2 (the beam above bearing on the post's top, Fc⊥ of the beam), §15.3 (built-up columns, Kf),
 * under each ASCE 7 ASD combination of the loads by case the post carries. Pure: pass the tables in.
 *
 * Units: ft for heights, in for sections, lb for loads, psi for stresses. Steel columns (HSS, pipe)
 * are not held in the tables and are not checked here.
 */
import { asdCombinations } from "../asce7/combinations";
import { DEFAULT_LOAD_STANDARD, type LoadStandard } from "../asce7/standard";
import {
  BUILT_UP_KF,
  columnStabilityFactorCp,
  criticalBucklingFcE,
  incisingFactorCiCompression,
  loadDurationFactorCD,
  MAX_COLUMN_SLENDERNESS,
  wetServiceFactorCM,
  wetServiceFactorCMCompression,
  woodDensity,
} from "../nds/nds-2018";
import { LOAD_CASES, type LoadCase } from "../types";
import { findSawnValues, sawnSection, sizeFactorFor, TableLookupError, type MaterialTables, type SawnGrade, type SawnSize, type Species } from "@/lib/tables";
import { DesignInputError } from "./errors";
import type { DesignCheck } from "./types";

/** Post sizes the check takes: solid sawn posts, and studs nailed into a column (plies 2 to 4). */
export const POST_SIZES = ["4x4", "4x6", "6x6", "2x4", "2x6"] as const;
export type PostSize = (typeof POST_SIZES)[number];
export const STUD_COLUMN_SIZES: readonly PostSize[] = ["2x4", "2x6"];

/** Loads by case at the top of a post (or the top of a footing), lb, downward positive. */
export type LoadsByCase = Partial<Record<LoadCase, number>>;

export interface PostInput {
  size: PostSize;
  /** studs in a built-up column (2x4, 2x6 only); 1 for a solid post */
  plies: number;
  species: Species;
  grade: SawnGrade;
  /** unbraced height, ft (top of footing to underside of beam where nothing braces it between) */
  heightFt: number;
  /** effective length factor Ke, NDS 2018 Appendix G; 1.0 for a post pinned top and bottom */
  Ke?: number;
  /** wet service (a deck post outdoors) */
  wet: boolean;
  /** treated and incised (Ci); not given: incised when wet and not Southern Pine (NDS 2018 §4.3.8, common practice) */
  incised?: boolean;
  /** the loads by case at the post's top, lb */
  loads: LoadsByCase;
  /** the member above: its width across the post (in) and its reference Fc⊥ (psi), for the bearing of the beam on the post */
  above?: { widthIn: number; FcPerpPsi: number; wet: boolean; label: string } | null;
  loadStandard?: LoadStandard;
}

export interface PostOutput {
  pass: boolean;
  ratio: number;
  governing: DesignCheck["name"] | "slenderness" | null;
  /** "6x6 No.2 Hem-Fir post, 8' 0" tall" style label built by the caller; here the plain member words */
  memberLabel: string;
  checks: DesignCheck[];
  /** the factors used, by name, for the detail screen and the tests */
  factors: {
    Fc: number;
    CF: number;
    CM: number;
    Ci: number;
    Emin: number;
    EminPrime: number;
    CMEmin: number;
    CiEmin: number;
    leIn: number;
    /** the least dimension, in, and le/d */
    dIn: number;
    leOverD: number;
    FcE: number;
    /** Cp at the governing combination's CD (Kf included for built-up columns) */
    Cp: number;
    Kf: number;
    CD: number;
    areaIn2: number;
  };
  /** the largest service load on the post (its governing ASD combination), lb, and the post's own weight, lb */
  maxLoadLb: number;
  maxLoadCombination: string;
  selfWeightLb: number;
  source: string;
  assumptions: string[];
}

function postSection(size: PostSize, plies: number): { section: SawnSize; b: number; d: number; A: number; builtUp: boolean } {
  const builtUp = STUD_COLUMN_SIZES.includes(size);
  const section =
    size === "6x6"
      ? sawnSection(6, 6, 5.5, 5.5, "beams-stringers")
      : size === "4x4"
        ? sawnSection(4, 4, 3.5, 3.5, "dimension")
        : size === "4x6"
          ? sawnSection(4, 6, 3.5, 5.5, "dimension")
          : size === "2x4"
            ? sawnSection(2, 4, 1.5, 3.5, "dimension")
            : sawnSection(2, 6, 1.5, 5.5, "dimension");
  const b = builtUp ? section.b * plies : section.b;
  const d = section.d;
  return { section, b: Math.min(b, d), d: Math.max(b, d), A: b * d, builtUp };
}

/**
 * Checks a post or stud column under its loads by case. Each ASD combination (ASCE 7 §2.4.1, in the
 * edition given) gives P and its CD (NDS 2018 §2.3.2); Cp is worked out at that CD (Fc* carries CD).
 *
 * Example (checked in tests/solver/design/post.test.ts): a 4x4 No.2 Hem-Fir post 8 ft tall, wet and
 * incised, D 1,000 lb + L 4,000 lb → le/d = 96/3.5 = 27.4, Fc* = 1,300·1.15·0.8·0.8 = 957 psi,
 * Emin' = 470,000·0.9·0.95 = 401,850 psi, FcE = 0.822·401,850/27.4² = 439 psi, Cp = 0.404.
 */
export function checkPost(input: PostInput, tables: MaterialTables): PostOutput {
  const issues: { path: string; message: string }[] = [];
  if (!(input.heightFt > 0 && input.heightFt <= 30)) issues.push({ path: "heightFt", message: "must be more than 0 and at most 30 ft" });
  const builtUp = STUD_COLUMN_SIZES.includes(input.size);
  if (builtUp && !(Number.isInteger(input.plies) && input.plies >= 2 && input.plies <= 4)) {
    issues.push({ path: "plies", message: "a stud column takes 2 to 4 studs" });
  }
  if (!builtUp && input.plies !== 1) issues.push({ path: "plies", message: "a solid post is 1 piece" });
  if (issues.length > 0) throw new DesignInputError(issues);

  const { section, b, A } = postSection(input.size, input.plies);
  let values;
  let CFrow;
  try {
    values = findSawnValues(tables, input.species, input.grade, section.sizeClass, section.nominalDepth);
    CFrow = sizeFactorFor(tables, input.species, input.grade, section);
  } catch (err) {
    if (err instanceof TableLookupError) throw new DesignInputError([{ path: err.field.replace(/^member\./, ""), message: err.message }]);
    throw err;
  }
  const table = CFrow.table;
  const incised = input.incised ?? (input.wet && input.species !== "Southern Pine" && section.sizeClass === "dimension");
  const CF = CFrow.CF_Fc;
  const cm = wetServiceFactorCMCompression(table, input.wet, values.Fc * CF);
  const ci = incisingFactorCiCompression(incised);
  const Ke = input.Ke ?? 1.0;
  const leIn = Ke * input.heightFt * 12;
  // NDS 2018 §3.7.1.3: the larger le/d governs; for a square-ended post pinned both ways that is the least dimension
  const dIn = b;
  const leOverD = leIn / dIn;
  const EminPrime = values.Emin * cm.Emin * ci.Emin;
  const FcE = criticalBucklingFcE(EminPrime, leOverD);
  const Kf = builtUp ? BUILT_UP_KF.nailed : 1.0;
  const FcBase = values.Fc * CF * cm.Fc * ci.Fc;

  const selfWeightLb = (woodDensity(values.G, input.wet ? 19 : 15) * A * input.heightFt) / 144;
  const standard = input.loadStandard ?? DEFAULT_LOAD_STANDARD;
  const cases = LOAD_CASES.filter((c) => (input.loads[c] ?? 0) !== 0);
  const combos = asdCombinations(cases.length > 0 ? cases : ["D"], standard);
  let worst = { ratio: -1, P: 0, fc: 0, Fc: 0, CD: 0.9, Cp: 1, name: "D", factors: { D: 1 } as Partial<Record<LoadCase, number>> };
  let maxLoad = { P: 0, name: "D" };
  let endBearing = { ratio: -1, fc: 0, F: 0, name: "D", factors: { D: 1 } as Partial<Record<LoadCase, number>> };
  for (const combo of combos) {
    let P = 0;
    for (const c of LOAD_CASES) P += (combo.factors[c] ?? 0) * (input.loads[c] ?? 0);
    // the post's own weight at its base is the footing's load; the post itself is checked at its top
    if (P > maxLoad.P) maxLoad = { P, name: combo.name };
    const CD = loadDurationFactorCD(combo.factors);
    const FcStar = FcBase * CD;
    const Cp = Kf * columnStabilityFactorCp(FcStar, FcE);
    const FcPrime = FcStar * Cp;
    const fc = P / A;
    const ratio = fc / FcPrime;
    if (fc / FcStar > endBearing.ratio) endBearing = { ratio: fc / FcStar, fc, F: FcStar, name: combo.name, factors: combo.factors };
    if (ratio > worst.ratio) worst = { ratio, P, fc, Fc: FcPrime, CD, Cp, name: combo.name, factors: combo.factors };
  }

  const checks: DesignCheck[] = [];
  const round = (v: number, n = 3) => Math.round(v * 10 ** n) / 10 ** n;
  checks.push({
    name: "stability",
    demand: round(worst.fc, 1),
    capacity: round(worst.Fc, 1),
    unit: "psi",
    ratio: round(worst.ratio),
    combination: { name: worst.name, factors: worst.factors },
    x: null,
    note: `compression with column stability, NDS 2018 §3.7: le/d = ${leOverD.toFixed(1)}, Cp = ${worst.Cp.toFixed(3)}${builtUp ? ` (Kf ${Kf}, nailed, §15.3)` : ""}, P = ${Math.round(worst.P)} lb`,
  });
  checks.push({
    name: "bearing",
    demand: round(endBearing.fc, 1),
    capacity: round(endBearing.F, 1),
    unit: "psi",
    ratio: round(endBearing.ratio),
    combination: { name: endBearing.name, factors: endBearing.factors },
    x: null,
    note: "end grain bearing on the post's ends, NDS 2018 §3.10.1 (Fc* without Cp)",
  });
  if (input.above) {
    const contact = Math.min(input.above.widthIn, b) * (builtUp ? section.d : Math.max(b, section.d));
    const cmPerp = wetServiceFactorCM("4A", input.above.wet).FcPerp;
    const FcPerp = input.above.FcPerpPsi * cmPerp;
    checks.push({
      name: "bearing",
      demand: round(maxLoad.P / contact, 1),
      capacity: round(FcPerp, 1),
      unit: "psi",
      ratio: round(maxLoad.P / contact / FcPerp),
      combination: { name: maxLoad.name, factors: combos.find((c) => c.name === maxLoad.name)?.factors ?? { D: 1 } },
      x: null,
      note: `${input.above.label} bearing on the post's top, NDS 2018 §3.10.2: Fc⊥ over ${contact.toFixed(2)} in² (Cb 1.0)`,
    });
  }
  const slender = leOverD / MAX_COLUMN_SLENDERNESS;
  const all = [...checks.map((c) => ({ name: c.name as PostOutput["governing"], ratio: c.ratio })), { name: "slenderness" as const, ratio: slender }];
  const gov = all.reduce((a, c) => (c.ratio > a.ratio ? c : a));
  const pass = all.every((c) => c.ratio <= 1.0);
  const words = builtUp ? `${input.plies}-ply ${input.size} stud column` : `${input.size} post`;
  const assumptions = [
    `Pinned at top and bottom (Ke ${Ke}), braced nowhere between: le = ${(leIn / 12).toFixed(2)} ft`,
    input.wet ? "Wet service (outdoors): CM on Fc and Emin, NDS Supplement 2018" : "Dry service",
    incised ? "Treated and incised: Ci 0.80 on Fc, 0.95 on Emin (NDS 2018 §4.3.8)" : "Not incised",
    "Axial load only: no bending from a beam off the post's center, wind or a rail (not checked)",
  ];
  if (section.sizeClass === "beams-stringers") {
    assumptions.push(
      "6x6 read with the Beams and Stringers values of NDS Supplement Table 4D (its Posts and Timbers values are not held; Fc is the lower of the two)",
    );
  }
  return {
    pass,
    ratio: round(gov.ratio),
    governing: gov.name,
    memberLabel: `${words} ${input.grade} ${input.species}`,
    checks,
    factors: {
      Fc: values.Fc,
      CF,
      CM: cm.Fc,
      Ci: ci.Fc,
      Emin: values.Emin,
      EminPrime,
      CMEmin: cm.Emin,
      CiEmin: ci.Emin,
      leIn,
      dIn,
      leOverD,
      FcE,
      Cp: worst.Cp,
      Kf,
      CD: worst.CD,
      areaIn2: A,
    },
    maxLoadLb: Math.round(maxLoad.P),
    maxLoadCombination: maxLoad.name,
    selfWeightLb: Math.round(selfWeightLb),
    source: values.source,
    assumptions,
  };
}
