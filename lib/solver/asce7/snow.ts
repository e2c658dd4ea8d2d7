/**
 * ASCE/SEI 7 Chapter 7, snow loads — the simple flat-roof path only (no drift, sliding, unbalanced
 * or rain-on-snow loads), in the 2016 or the 2022 edition. Pressures in psf.
 *
 * ASCE 7-16 §7.3, Eq. 7.3-1: pf = 0.7 Ce Ct Is pg, with pg from the allowable-stress ground snow map
 * (the one IRC 2021 and earlier print); §7.3.4: pm = Is pg (pg ≤ 20 psf) or 20 Is (pg > 20 psf).
 * ASCE 7-22 §7.3 keeps the form with a strength-level pg (its risk-category maps replace Is; Is stays
 * a parameter here, default 1.0). The combinations then take S at full value (7-16) or 0.7S (7-22) in ASD.
 */
import { DEFAULT_LOAD_STANDARD, type LoadStandard } from "./standard";

/** Exposure factor Ce, ASCE 7-16 and 7-22 Table 7.3-1, surface roughness C (open terrain, the usual house lot). */
export const EXPOSURE_CE = { "fully-exposed": 0.9, "partially-exposed": 1.0, sheltered: 1.1 } as const;
export type RoofExposure = keyof typeof EXPOSURE_CE;

/** Thermal factor Ct, ASCE 7-16 and 7-22 Table 7.3-2 (heated structure 1.0; ventilated cold roof 1.1; unheated 1.2). */
export const THERMAL_CT = { heated: 1.0, "cold-ventilated": 1.1, unheated: 1.2 } as const;
export type RoofThermal = keyof typeof THERMAL_CT;

/** Plain words for the exposure and thermal choices (never the internal code on a sheet). */
export const EXPOSURE_WORDS: Readonly<Record<RoofExposure, string>> = {
  "fully-exposed": "fully exposed to wind",
  "partially-exposed": "partly sheltered by trees or buildings",
  sheltered: "sheltered",
};
export const THERMAL_WORDS: Readonly<Record<RoofThermal, string>> = {
  heated: "heated building",
  "cold-ventilated": "cold ventilated roof",
  unheated: "unheated building",
};

export interface FlatRoofSnowInput {
  /** ground snow load, psf (ASCE 7-16 Fig. 7.2-1, allowable-stress basis; ASCE 7-22 Fig. 7.2-1, strength level) */
  pg: number;
  /** exposure factor Ce; default 1.0 (partially exposed) */
  Ce?: number;
  /** thermal factor Ct; default 1.0 (heated) */
  Ct?: number;
  /** importance factor Is, ASCE 7-16 Table 1.5-2; default 1.0 (risk category II, houses) */
  Is?: number;
}

/** ASCE 7-16 Eq. 7.3-1 (and ASCE 7-22 Eq. 7.3-1 with Is = 1): pf = 0.7 Ce Ct Is pg (psf). Example: pg = 30, defaults → 21 psf. */
export function flatRoofSnowPf({ pg, Ce = 1.0, Ct = 1.0, Is = 1.0 }: FlatRoofSnowInput): number {
  return 0.7 * Ce * Ct * Is * pg;
}

/** ASCE 7-16 §7.3.4: minimum snow load for low-slope roofs pm = Is pg when pg ≤ 20 psf, 20 Is when pg > 20 psf. */
export function minimumRoofSnowPm(pg: number, Is = 1.0): number {
  return pg <= 20 ? Is * pg : 20 * Is;
}

export interface FlatRoofSnow {
  pf: number;
  pm: number;
  /** the roof snow S used: max(pf, pm), psf */
  ps: number;
  standard: LoadStandard;
  /** the clauses, e.g. "ASCE 7-16 Eq. 7.3-1, §7.3.4" */
  clause: string;
}

/** Roof snow for design on a low-slope roof: the larger of pf and pm, in the edition given. */
export function designFlatRoofSnow(input: FlatRoofSnowInput, standard: LoadStandard = DEFAULT_LOAD_STANDARD): FlatRoofSnow {
  const pf = flatRoofSnowPf(input);
  const pm = minimumRoofSnowPm(input.pg, input.Is ?? 1.0);
  return { pf, pm, ps: Math.max(pf, pm), standard, clause: standard === "ASCE 7-22" ? "ASCE 7-22 Eq. 7.3-1, §7.3.4" : "ASCE 7-16 Eq. 7.3-1, §7.3.4" };
}
