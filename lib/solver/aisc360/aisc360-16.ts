/**
 * ANSI/AISC 360-16, Specification for Structural Steel Buildings — doubly symmetric I-shapes
 * (W-shapes) bent about the major axis, and their shear. Units: kip and in (ksi, kip-in, kip)
 * inside this module; the design layer converts from lb and ft at its edge.
 */

/** Modulus of elasticity of steel, AISC 360-16 §B4 / symbols: E = 29,000 ksi. */
export const E_STEEL_KSI = 29000;

/** Safety and resistance factors, AISC 360-16 §F1 and §G1 / G2.1(a). */
export const OMEGA_B = 1.67;
export const PHI_B = 0.9;
export const OMEGA_V_ROLLED = 1.5;
export const PHI_V_ROLLED = 1.0;
export const OMEGA_V = 1.67;
export const PHI_V = 0.9;
/** Web local yielding §J10.2 and web crippling §J10.3 */
export const OMEGA_WLY = 1.5;
export const PHI_WLY = 1.0;
export const OMEGA_WCR = 2.0;
export const PHI_WCR = 0.75;

/** AISC 360-16 Eq. F1-1: Cb = 12.5 Mmax / (2.5 Mmax + 3 MA + 4 MB + 3 MC), absolute values over the unbraced segment. */
export function ltbModifierCb(Mmax: number, MA: number, MB: number, MC: number): number {
  const m = Math.abs(Mmax);
  if (m === 0) return 1.0;
  return (12.5 * m) / (2.5 * m + 3 * Math.abs(MA) + 4 * Math.abs(MB) + 3 * Math.abs(MC));
}

/** AISC 360-16 Eq. F2-1: Mp = Fy Zx (kip-in). */
export function plasticMomentMp(FyKsi: number, ZxIn3: number): number {
  return FyKsi * ZxIn3;
}

/** AISC 360-16 Eq. F2-5: Lp = 1.76 ry √(E/Fy) (in). */
export function limitingLengthLp(ryIn: number, FyKsi: number, E = E_STEEL_KSI): number {
  return 1.76 * ryIn * Math.sqrt(E / FyKsi);
}

/**
 * AISC 360-16 Eq. F2-6: Lr = 1.95 rts (E / 0.7Fy) √( Jc/(Sx ho) + √((Jc/(Sx ho))² + 6.76 (0.7Fy/E)²) ) (in),
 * c = 1 for doubly symmetric I-shapes (Eq. F2-8a).
 */
export function limitingLengthLr(s: { rts: number; J: number; Sx: number; ho: number }, FyKsi: number, E = E_STEEL_KSI, c = 1): number {
  const jc = (s.J * c) / (s.Sx * s.ho);
  const f = (0.7 * FyKsi) / E;
  return 1.95 * s.rts * (E / (0.7 * FyKsi)) * Math.sqrt(jc + Math.sqrt(jc * jc + 6.76 * f * f));
}

/** AISC 360-16 Eq. F2-4: Fcr = Cb π² E / (Lb/rts)² √(1 + 0.078 Jc/(Sx ho) (Lb/rts)²) (ksi). */
export function criticalStressFcr(s: { rts: number; J: number; Sx: number; ho: number }, LbIn: number, Cb: number, E = E_STEEL_KSI, c = 1): number {
  const lr = LbIn / s.rts;
  return ((Cb * Math.PI * Math.PI * E) / (lr * lr)) * Math.sqrt(1 + 0.078 * ((s.J * c) / (s.Sx * s.ho)) * lr * lr);
}

export interface WShapeFlexureProps {
  Zx: number;
  Sx: number;
  ry: number;
  rts: number;
  J: number;
  ho: number;
}

/**
 * Nominal flexural strength for yielding and lateral-torsional buckling, AISC 360-16 §F2.2
 * (Eqs. F2-1 to F2-3), kip-in: Lb ≤ Lp → Mp; Lp < Lb ≤ Lr → Cb [Mp − (Mp − 0.7 Fy Sx)(Lb − Lp)/(Lr − Lp)] ≤ Mp;
 * Lb > Lr → Fcr Sx ≤ Mp.
 */
export function nominalFlexureLTB(s: WShapeFlexureProps, FyKsi: number, LbIn: number, Cb: number, E = E_STEEL_KSI): number {
  const Mp = plasticMomentMp(FyKsi, s.Zx);
  const Lp = limitingLengthLp(s.ry, FyKsi, E);
  if (LbIn <= Lp) return Mp;
  const Lr = limitingLengthLr(s, FyKsi, E);
  if (LbIn <= Lr) {
    return Math.min(Mp, Cb * (Mp - (Mp - 0.7 * FyKsi * s.Sx) * ((LbIn - Lp) / (Lr - Lp))));
  }
  return Math.min(Mp, criticalStressFcr(s, LbIn, Cb, E) * s.Sx);
}

/** Flange slenderness limits, AISC 360-16 Table B4.1b case 10: λpf = 0.38 √(E/Fy), λrf = 1.0 √(E/Fy). */
export function flangeSlendernessLimits(FyKsi: number, E = E_STEEL_KSI): { lambdaP: number; lambdaR: number } {
  return { lambdaP: 0.38 * Math.sqrt(E / FyKsi), lambdaR: 1.0 * Math.sqrt(E / FyKsi) };
}

/** Web slenderness limit for flexure, AISC 360-16 Table B4.1b case 15: λpw = 3.76 √(E/Fy). */
export function webCompactLimit(FyKsi: number, E = E_STEEL_KSI): number {
  return 3.76 * Math.sqrt(E / FyKsi);
}

/**
 * Compression flange local buckling, AISC 360-16 §F3.2, kip-in. Compact flange → Mp (no limit);
 * noncompact: Eq. F3-1 Mn = Mp − (Mp − 0.7 Fy Sx)(λ − λpf)/(λrf − λpf); slender: Eq. F3-2 Mn = 0.9 E kc Sx / λ²,
 * kc = 4/√(h/tw) within 0.35–0.76.
 */
export function nominalFlexureFLB(s: { Zx: number; Sx: number; bf_2tf: number; h_tw: number }, FyKsi: number, E = E_STEEL_KSI): number {
  const Mp = plasticMomentMp(FyKsi, s.Zx);
  const { lambdaP, lambdaR } = flangeSlendernessLimits(FyKsi, E);
  const lambda = s.bf_2tf;
  if (lambda <= lambdaP) return Mp;
  if (lambda <= lambdaR) return Mp - (Mp - 0.7 * FyKsi * s.Sx) * ((lambda - lambdaP) / (lambdaR - lambdaP));
  const kc = Math.min(0.76, Math.max(0.35, 4 / Math.sqrt(s.h_tw)));
  return (0.9 * E * kc * s.Sx) / (lambda * lambda);
}

export interface ShearStrength {
  /** kip */
  Vn: number;
  Cv1: number;
  omega: number;
  phi: number;
  /** which paragraph applied */
  clause: "G2.1(a)" | "G2.1(b)";
}

/**
 * Nominal shear strength, AISC 360-16 Eq. G2-1: Vn = 0.6 Fy Aw Cv1, Aw = d tw. Rolled I-shapes with
 * h/tw ≤ 2.24 √(E/Fy): Cv1 = 1.0, Ωv = 1.50, φv = 1.00 (§G2.1(a)). Otherwise §G2.1(b) with kv = 5.34:
 * h/tw ≤ 1.10 √(kv E/Fy) → Cv1 = 1.0 (Eq. G2-3), else Cv1 = 1.10 √(kv E/Fy)/(h/tw) (Eq. G2-4); Ωv = 1.67, φv = 0.90.
 */
export function nominalShearVn(s: { d: number; tw: number; h_tw: number }, FyKsi: number, E = E_STEEL_KSI): ShearStrength {
  const Aw = s.d * s.tw;
  if (s.h_tw <= 2.24 * Math.sqrt(E / FyKsi)) {
    return { Vn: 0.6 * FyKsi * Aw, Cv1: 1.0, omega: OMEGA_V_ROLLED, phi: PHI_V_ROLLED, clause: "G2.1(a)" };
  }
  const kv = 5.34;
  const lim = 1.1 * Math.sqrt((kv * E) / FyKsi);
  const Cv1 = s.h_tw <= lim ? 1.0 : lim / s.h_tw;
  return { Vn: 0.6 * FyKsi * Aw * Cv1, Cv1, omega: OMEGA_V, phi: PHI_V, clause: "G2.1(b)" };
}

/**
 * Web local yielding under a concentrated force or reaction, AISC 360-16 §J10.2, kip:
 * Eq. J10-2 Rn = Fy tw (2.5 k + lb) when the force is within d of the member end; Eq. J10-3 Rn = Fy tw (5k + lb) otherwise.
 */
export function webLocalYieldingRn(s: { tw: number; kdes: number }, FyKsi: number, lbIn: number, nearEnd: boolean): number {
  return FyKsi * s.tw * ((nearEnd ? 2.5 : 5) * s.kdes + lbIn);
}

/**
 * Web crippling, AISC 360-16 §J10.3, kip (Qf = 1.0 for W-shapes):
 * away from the end (≥ d/2): Eq. J10-4 Rn = 0.80 tw² [1 + 3 (lb/d)(tw/tf)^1.5] √(E Fy tf / tw);
 * near the end, lb/d ≤ 0.2: Eq. J10-5a with 0.40 in place of 0.80; lb/d > 0.2: Eq. J10-5b Rn = 0.40 tw² [1 + (4 lb/d − 0.2)(tw/tf)^1.5] √(E Fy tf / tw).
 */
export function webCripplingRn(s: { d: number; tw: number; tf: number }, FyKsi: number, lbIn: number, nearEnd: boolean, E = E_STEEL_KSI): number {
  const root = Math.sqrt((E * FyKsi * s.tf) / s.tw);
  const ratio = Math.pow(s.tw / s.tf, 1.5);
  if (!nearEnd) return 0.8 * s.tw * s.tw * (1 + 3 * (lbIn / s.d) * ratio) * root;
  if (lbIn / s.d <= 0.2) return 0.4 * s.tw * s.tw * (1 + 3 * (lbIn / s.d) * ratio) * root;
  return 0.4 * s.tw * s.tw * (1 + ((4 * lbIn) / s.d - 0.2) * ratio) * root;
}
