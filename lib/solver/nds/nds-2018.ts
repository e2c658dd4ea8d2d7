/**
 * National Design Specification for Wood Construction, 2018 edition (AWC NDS 2018), ASD.
 *
 * One function per equation or table, named with the NDS symbol. Units: psi for stresses and
 * moduli, in for section dimensions and bearing lengths, ft only where named (`luFt`).
 * Every factor a user or a local code may change is a parameter with the NDS default.
 */
import type { LoadCase } from "../types";

/** Load duration factor CD by load case, NDS 2018 Table 2.3.2 (permanent, ten years, two months, seven days, ten minutes). */
export const LOAD_DURATION_CD: Readonly<Record<LoadCase, number>> = { D: 0.9, L: 1.0, S: 1.15, Lr: 1.25, W: 1.6 };

/**
 * NDS 2018 §2.3.2 — CD of a combination is that of its shortest-duration load (the largest CD
 * among the cases with a non-zero factor). Example: D+0.75L+0.75S → 1.15.
 */
export function loadDurationFactorCD(factors: Partial<Record<LoadCase, number>>, table: Readonly<Record<LoadCase, number>> = LOAD_DURATION_CD): number {
  let cd = 0;
  for (const [c, f] of Object.entries(factors) as [LoadCase, number][]) {
    if (f !== 0 && table[c] > cd) cd = table[c];
  }
  return cd === 0 ? table.D : cd;
}

/** Which design-value table the member's values come from; it sets the wet service factors. */
export type WetServiceTable = "4A" | "4B" | "4D" | "glulam";

export interface WetServiceFactors {
  Fb: number;
  Fv: number;
  FcPerp: number;
  E: number;
}

/**
 * Wet service factor CM, NDS Supplement 2018 Tables 4A/4B/4D adjustment notes and Table 5A for
 * glulam. For dimension lumber CM for Fb is 1.0 when Fb·CF ≤ 1150 psi (Table 4A's wording). Table 4B's
 * own footnote could not be read in any stored copy; its values are already size-specific, so it may
 * test Fb alone, which would give 1.0 where Fb ≤ 1150 < Fb·CF (4" thick, 8" and wider). Until it is
 * read, Southern Pine takes the Table 4A test, the reading that never gives the larger factor.
 * Example: Table 4A, Fb·CF = 990 psi, wet → { Fb: 1.0, Fv: 0.97, FcPerp: 0.67, E: 0.9 }.
 */
export function wetServiceFactorCM(table: WetServiceTable, wet: boolean, FbTimesCF = Infinity): WetServiceFactors {
  if (!wet) return { Fb: 1, Fv: 1, FcPerp: 1, E: 1 };
  switch (table) {
    case "4A":
    case "4B":
      return { Fb: FbTimesCF <= 1150 ? 1.0 : 0.85, Fv: 0.97, FcPerp: 0.67, E: 0.9 };
    case "4D":
      return { Fb: 1.0, Fv: 1.0, FcPerp: 0.67, E: 1.0 };
    case "glulam":
      return { Fb: 0.8, Fv: 0.875, FcPerp: 0.53, E: 0.833 };
  }
}

/**
 * Temperature factor Ct, NDS 2018 Table 2.3.3, for sustained temperatures T (°F) and dry (wet = false)
 * or wet service. Example: 110 °F, dry → Fb 0.8, E 0.9.
 */
export function temperatureFactorCt(tempF = 70, wet = false): { Fb: number; Fv: number; FcPerp: number; E: number } {
  if (tempF <= 100) return { Fb: 1, Fv: 1, FcPerp: 1, E: 1 };
  if (tempF <= 125) return wet ? { Fb: 0.7, Fv: 0.7, FcPerp: 0.7, E: 0.9 } : { Fb: 0.8, Fv: 0.8, FcPerp: 0.8, E: 0.9 };
  if (tempF <= 150) return wet ? { Fb: 0.5, Fv: 0.5, FcPerp: 0.5, E: 0.9 } : { Fb: 0.7, Fv: 0.7, FcPerp: 0.7, E: 0.9 };
  throw new RangeError("NDS 2018 Table 2.3.3 covers sustained temperatures up to 150 °F");
}

/**
 * Incising factor Ci for dimension lumber, NDS 2018 §4.3.8 and Table 4.3.8: 0.80 on Fb, Ft, Fc, Fv;
 * 0.95 on E, Emin; 1.00 on Fc⊥. Treated Douglas Fir-Larch, Hem-Fir and Spruce-Pine-Fir are usually
 * incised so the preservative enters; Southern Pine takes it without (common practice).
 */
export function incisingFactorCi(incised: boolean): { Fb: number; Fv: number; FcPerp: number; E: number } {
  return incised ? { Fb: 0.8, Fv: 0.8, FcPerp: 1.0, E: 0.95 } : { Fb: 1, Fv: 1, FcPerp: 1, E: 1 };
}

/**
 * Repetitive member factor Cr, NDS 2018 §4.3.9: 1.15 on Fb for dimension lumber 2–4 in thick used as
 * joists, rafters or similar, in contact or at most 24 in on center, at least 3 in number, joined by
 * a load-distributing element. A member at a spacing (joists, rafters) qualifies through the system
 * around it; a member with no spacing (a beam or header) only by being built up of 3 or more plies
 * in contact, nailed together. Two plies never qualify by themselves.
 * Examples: 1 ply at 16 in in a repetitive system → 1.15; 2-ply beam (no spacing) → 1.0; 3-ply beam → 1.15.
 */
export function repetitiveMemberFactorCr(opts: { dimensionLumber: boolean; plies: number; repetitiveSystem: boolean; spacingIn?: number }, Cr = 1.15): number {
  if (!opts.dimensionLumber) return 1.0;
  if (opts.plies >= 3) return Cr;
  if (opts.repetitiveSystem && opts.spacingIn !== undefined && opts.spacingIn <= 24) return Cr;
  return 1.0;
}

/**
 * Flat use factor Cfu, NDS Supplement 2018 Table 4A adjustment factors, for dimension lumber bent
 * about its weak axis (load on the wide face). Edgewise bending (the usual joist or header) → 1.0.
 */
export function flatUseFactorCfu(nominalWidth: number, nominalThickness: number, flat: boolean): number {
  if (!flat) return 1.0;
  const thick4 = nominalThickness >= 4;
  if (nominalWidth <= 3) return 1.0;
  if (nominalWidth <= 4) return thick4 ? 1.0 : 1.1;
  if (nominalWidth <= 5) return thick4 ? 1.05 : 1.1;
  if (nominalWidth <= 6) return thick4 ? 1.05 : 1.15;
  if (nominalWidth <= 8) return thick4 ? 1.05 : 1.15;
  return thick4 ? 1.1 : 1.2;
}

/** Size factor CF for beams and stringers deeper than 12 in, NDS 2018 Eq. 4.3-1: CF = (12/d)^(1/9) ≤ 1.0. */
export function sizeFactorBeamsCF(dIn: number): number {
  return dIn <= 12 ? 1.0 : Math.pow(12 / dIn, 1 / 9);
}

/**
 * Volume factor CV for structural glued laminated timber, NDS 2018 Eq. 5.3-1:
 * CV = (21/L)^(1/x) (12/d)^(1/x) (5.125/b)^(1/x) ≤ 1.0, x = 20 for Southern Pine, 10 otherwise.
 * L in ft between points of zero moment, d and b in in.
 */
export function volumeFactorCV(LFt: number, dIn: number, bIn: number, x = 10): number {
  const cv = Math.pow(21 / LFt, 1 / x) * Math.pow(12 / dIn, 1 / x) * Math.pow(5.125 / bIn, 1 / x);
  return Math.min(1.0, cv);
}

/**
 * Effective unbraced length le, NDS 2018 Table 3.3.3, row for single-span or cantilever members
 * with any loading (footnote 1): le = 2.06 lu (lu/d < 7), 1.63 lu + 3d (7 ≤ lu/d ≤ 14.3), 1.84 lu (lu/d > 14.3).
 * lu and d in in; returns in.
 */
export function effectiveLengthLe(luIn: number, dIn: number): number {
  const r = luIn / dIn;
  if (r < 7) return 2.06 * luIn;
  if (r <= 14.3) return 1.63 * luIn + 3 * dIn;
  return 1.84 * luIn;
}

/** Slenderness ratio for bending members, NDS 2018 Eq. 3.3-5: RB = √(le d / b²), to be ≤ 50. */
export function slendernessRatioRB(leIn: number, dIn: number, bIn: number): number {
  return Math.sqrt((leIn * dIn) / (bIn * bIn));
}

/** Critical buckling design value for bending members, NDS 2018 §3.3.3.8: FbE = 1.20 Emin' / RB². */
export function criticalBucklingFbE(EminPrimePsi: number, RB: number): number {
  return (1.2 * EminPrimePsi) / (RB * RB);
}

/**
 * Beam stability factor CL, NDS 2018 Eq. 3.3-6:
 * CL = (1 + FbE/Fb*)/1.9 − √[((1 + FbE/Fb*)/1.9)² − (FbE/Fb*)/0.95],
 * Fb* = Fb times every applicable factor except Cfu, CV and CL. A compression edge braced
 * continuously (lu = 0) gives CL = 1.0 (§3.3.3.3).
 */
export function beamStabilityFactorCL(FbStarPsi: number, FbEPsi: number): number {
  const a = FbEPsi / FbStarPsi;
  const p = (1 + a) / 1.9;
  return p - Math.sqrt(p * p - a / 0.95);
}

/** Bearing area factor Cb, NDS 2018 Eq. 3.10-2: Cb = (lb + 0.375)/lb for lb < 6 in at least 3 in from the member's end; else 1.0. */
export function bearingAreaFactorCb(lbIn: number, distanceFromEndIn: number): number {
  if (lbIn >= 6 || distanceFromEndIn < 3) return 1.0;
  return (lbIn + 0.375) / lbIn;
}

/** Bending stress, NDS 2018 Eq. 3.3-2: fb = M/S (M in lb-in, S in in³ → psi). */
export function bendingStressFb(MLbIn: number, SIn3: number): number {
  return MLbIn / SIn3;
}

/** Shear stress in a rectangular member, NDS 2018 Eq. 3.4-2: fv = 3V/(2bd). */
export function shearStressFv(VLb: number, AIn2: number): number {
  return (3 * VLb) / (2 * AIn2);
}

/** Compression perpendicular to grain, NDS 2018 Eq. 3.10-1: fc⊥ = R / Ab (Ab = b × lb). */
export function bearingStressFcPerp(RLb: number, bIn: number, lbIn: number): number {
  return RLb / (bIn * lbIn);
}

/** Creep factor Kcr for long-term deflection, NDS 2018 §3.5.2: 1.5 seasoned lumber, glulam and SCL dry; 2.0 wet service. */
export function creepFactorKcr(wet: boolean): number {
  return wet ? 2.0 : 1.5;
}

/** Long-term deflection, NDS 2018 Eq. 3.5-1: ΔT = Kcr ΔLT + ΔST (ΔLT from the permanent load, ΔST from the rest). */
export function longTermDeflection(deltaLongTermIn: number, deltaShortTermIn: number, Kcr: number): number {
  return Kcr * deltaLongTermIn + deltaShortTermIn;
}

/** Adjusted bending design value (ASD), NDS 2018 Table 4.3.1: Fb' = Fb CD CM Ct CL CF Cfu Ci Cr (CV and CL not combined for glulam, §5.3.6). */
export function adjustedFb(
  Fb: number,
  f: { CD: number; CM: number; Ct: number; CL: number; CF: number; Cfu: number; Ci: number; Cr: number; CV?: number },
): number {
  const stability = f.CV === undefined ? f.CL : Math.min(f.CL, f.CV);
  return Fb * f.CD * f.CM * f.Ct * stability * f.CF * f.Cfu * f.Ci * f.Cr;
}

/** Fb* for the stability factor, NDS 2018 §3.3.3.8: Fb with every factor except Cfu, CV and CL. */
export function referenceFbStar(Fb: number, f: { CD: number; CM: number; Ct: number; CF: number; Ci: number; Cr: number }): number {
  return Fb * f.CD * f.CM * f.Ct * f.CF * f.Ci * f.Cr;
}

/** Adjusted shear design value (ASD), NDS 2018 Table 4.3.1: Fv' = Fv CD CM Ct Ci. */
export function adjustedFv(Fv: number, f: { CD: number; CM: number; Ct: number; Ci: number }): number {
  return Fv * f.CD * f.CM * f.Ct * f.Ci;
}

/** Adjusted compression perpendicular to grain, NDS 2018 Table 4.3.1: Fc⊥' = Fc⊥ CM Ct Ci Cb (no CD). */
export function adjustedFcPerp(FcPerp: number, f: { CM: number; Ct: number; Ci: number; Cb: number }): number {
  return FcPerp * f.CM * f.Ct * f.Ci * f.Cb;
}

/** Adjusted modulus of elasticity, NDS 2018 Table 4.3.1: E' = E CM Ct Ci. */
export function adjustedE(E: number, f: { CM: number; Ct: number; Ci: number }): number {
  return E * f.CM * f.Ct * f.Ci;
}

/** Adjusted modulus for stability, NDS 2018 Table 4.3.1: Emin' = Emin CM Ct Ci CT (CT = 1.0 for bending members). */
export function adjustedEmin(Emin: number, f: { CM: number; Ct: number; Ci: number; CT?: number }): number {
  return Emin * f.CM * f.Ct * f.Ci * (f.CT ?? 1.0);
}

/** LRFD format conversion factor KF, NDS 2018 Table 4.3.1 / Appendix N: Fb 2.54, Fv 2.88, Fc⊥ 1.67, Emin 1.76. */
export const FORMAT_CONVERSION_KF = { Fb: 2.54, Fv: 2.88, FcPerp: 1.67, Emin: 1.76 } as const;
/** LRFD resistance factors φ, NDS 2018 Table N2: bending 0.85, shear 0.75, compression ⊥ 0.90, stability 0.85. */
export const RESISTANCE_PHI = { Fb: 0.85, Fv: 0.75, FcPerp: 0.9, Emin: 0.85 } as const;

/**
 * Time effect factor λ, NDS 2018 Table N3, from the combination's factors: 0.6 for dead load alone,
 * 1.0 when wind is present, 0.8 otherwise (live load from occupancy, snow, roof live).
 * Storage live load (0.7) and impact (1.25) are left to the caller through `override`.
 */
export function timeEffectFactorLambda(factors: Partial<Record<LoadCase, number>>, override?: number): number {
  if (override !== undefined) return override;
  const present = (c: LoadCase) => (factors[c] ?? 0) !== 0;
  if (present("W")) return 1.0;
  if (!present("L") && !present("S") && !present("Lr")) return 0.6;
  return 0.8;
}

/**
 * Moisture-dependent density, NDS Supplement 2018 §3.1.3 and NDS 2018 Commentary:
 * ρ = 62.4 [G / (1 + G × 0.009 × m.c.)] [1 + m.c./100] lb/ft³, m.c. in percent.
 * Example: G = 0.50, m.c. = 19 → 34.2 lb/ft³.
 */
export function woodDensity(G: number, moisturePct = 19): number {
  return 62.4 * (G / (1 + G * 0.009 * moisturePct)) * (1 + moisturePct / 100);
}

/**
 * Wet service factor CM on Fc and Emin (compression members), NDS Supplement 2018 adjustment notes:
 * Table 4A/4B dimension lumber Fc 0.8 (1.0 where Fc·CF ≤ 750 psi), Emin 0.9; Table 4D timbers
 * 5 in and thicker Fc 0.91, Emin 1.0. Example: 4x4 No.2 Douglas Fir-Larch, Fc·CF = 1,553 psi, wet → Fc 0.8.
 */
export function wetServiceFactorCMCompression(table: WetServiceTable, wet: boolean, FcTimesCF = Infinity): { Fc: number; Emin: number } {
  if (!wet) return { Fc: 1, Emin: 1 };
  switch (table) {
    case "4A":
    case "4B":
      return { Fc: FcTimesCF <= 750 ? 1.0 : 0.8, Emin: 0.9 };
    case "4D":
      return { Fc: 0.91, Emin: 1.0 };
    case "glulam":
      return { Fc: 0.73, Emin: 0.833 };
  }
}

/** Incising factor Ci on Fc and Emin, NDS 2018 Table 4.3.8: 0.80 on Fc, 0.95 on Emin. */
export function incisingFactorCiCompression(incised: boolean): { Fc: number; Emin: number } {
  return incised ? { Fc: 0.8, Emin: 0.95 } : { Fc: 1, Emin: 1 };
}

/** Critical buckling design value for compression members, NDS 2018 §3.7.1: FcE = 0.822 Emin' / (le/d)². */
export function criticalBucklingFcE(EminPrimePsi: number, leOverD: number): number {
  return (0.822 * EminPrimePsi) / (leOverD * leOverD);
}

/**
 * Column stability factor Cp, NDS 2018 Eq. 3.7-1:
 * Cp = (1 + FcE/Fc*)/(2c) − √[((1 + FcE/Fc*)/(2c))² − (FcE/Fc*)/c],
 * Fc* = Fc times every applicable factor except Cp; c = 0.8 for sawn lumber (0.85 round poles, 0.9
 * glulam and structural composite lumber). Example: Fc* = 1,242 psi, FcE = 658 psi → Cp = 0.454.
 */
export function columnStabilityFactorCp(FcStarPsi: number, FcEPsi: number, c = 0.8): number {
  const a = FcEPsi / FcStarPsi;
  const p = (1 + a) / (2 * c);
  return p - Math.sqrt(p * p - a / c);
}

/** Largest slenderness ratio of a solid column, NDS 2018 §3.7.1.4: le/d shall not exceed 50. */
export const MAX_COLUMN_SLENDERNESS = 50;

/**
 * Built-up column factor Kf, NDS 2018 §15.3.2 (Eq. 15.3-1): 0.6 for nailed, 0.75 for bolted laminations
 * (multiplies Cp where the laminations may slip). Checked against a published description of the clause:
 * Simpson Strong-Tie's engineering blog "Designing Built-Up Columns" (seblog.strongtie.com, September
 * 2015, the NDS of that time; the same words in a published "Wood Column Introduction" copy on scribd):
 * "The NDS assigns nailed built-up intermediate columns a 60% efficiency and bolted built-up intermediate
 * columns a 75% efficiency". That the 2018 edition keeps the factors is from memory. The blog gives the
 * efficiency as 1.0 about the strong axis and 0.60–0.75 about the weak one; Spanlark applies Kf in both
 * directions, the reading that never gives the larger capacity, and takes nailed (0.6) for a stud column.
 */
export const BUILT_UP_KF = { nailed: 0.6, bolted: 0.75 } as const;
