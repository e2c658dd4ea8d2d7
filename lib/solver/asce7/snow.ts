/**
 * ASCE/SEI 7-22 Chapter 7, snow loads — the simple flat-roof path only (no drift, sliding,
 * unbalanced or rain-on-snow loads). Pressures in psf.
 */

/** Exposure factor Ce, ASCE 7-22 Table 7.3-1, surface roughness C (open terrain, the usual house lot). */
export const EXPOSURE_CE = { "fully-exposed": 0.9, "partially-exposed": 1.0, sheltered: 1.1 } as const;
export type RoofExposure = keyof typeof EXPOSURE_CE;

/** Thermal factor Ct, ASCE 7-22 Table 7.3-2 (heated structure with an unventilated roof, R < 25, 1.0; ventilated cold roof 1.1; unheated 1.2). */
export const THERMAL_CT = { heated: 1.0, "cold-ventilated": 1.1, unheated: 1.2 } as const;
export type RoofThermal = keyof typeof THERMAL_CT;

/** The exposure and the building's heat in a builder's words (the flow's choices, the sheet's inputs). */
export const EXPOSURE_WORDS: Readonly<Record<RoofExposure, string>> = {
  "fully-exposed": "Fully exposed",
  "partially-exposed": "Partially exposed",
  sheltered: "Sheltered by trees or buildings",
};
export const THERMAL_WORDS: Readonly<Record<RoofThermal, string>> = {
  heated: "Heated, unventilated",
  "cold-ventilated": "Cold, ventilated",
  unheated: "Unheated",
};

export interface FlatRoofSnowInput {
  /** ground snow load for the site's risk category, psf (ASCE 7-22 §7.2, Figs. 7.2-1) */
  pg: number;
  /** exposure factor Ce; default 1.0 (partially exposed) */
  Ce?: number;
  /** thermal factor Ct; default 1.0 (heated) */
  Ct?: number;
  /**
   * importance factor Is; default 1.0. ASCE 7-22 maps ground snow per risk category and drops Is from
   * Eq. 7.3-1 (7-16 kept it); it stays a parameter for local codes still on the older form.
   */
  Is?: number;
}

/** ASCE 7-22 Eq. 7.3-1: flat-roof snow load pf = 0.7 Ce Ct Is pg (psf). Example: pg = 30, defaults → 21 psf. */
export function flatRoofSnowPf({ pg, Ce = 1.0, Ct = 1.0, Is = 1.0 }: FlatRoofSnowInput): number {
  return 0.7 * Ce * Ct * Is * pg;
}

/** ASCE 7-22 §7.3.4: minimum snow load for low-slope roofs pm = Is pg when pg ≤ 20 psf, 20 Is when pg > 20 psf. */
export function minimumRoofSnowPm(pg: number, Is = 1.0): number {
  return pg <= 20 ? Is * pg : 20 * Is;
}

/** Roof snow for design on a low-slope roof: the larger of pf and pm (ASCE 7-22 §7.3). */
export function designFlatRoofSnow(input: FlatRoofSnowInput): { pf: number; pm: number; ps: number } {
  const pf = flatRoofSnowPf(input);
  const pm = minimumRoofSnowPm(input.pg, input.Is ?? 1.0);
  return { pf, pm, ps: Math.max(pf, pm) };
}
