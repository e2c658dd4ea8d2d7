/**
 * Cold-formed steel members, AISI S100-16 (North American Specification for the Design of Cold-Formed
 * Steel Structural Members, 2016 edition): section properties of lipped C-sections (S) and tracks (T)
 * from their dimensions, effective widths (Appendix 1), flexure (§F2 global, §F3 local by effective
 * width), shear (§G2), web crippling (§G5) and combined bending and web crippling (§H3).
 *
 * Units: in, kip, ksi unless a name says otherwise. One function per equation, named by its symbol.
 * Section geometry follows the industry designation (e.g. 800S162-54): depth and flange width out to
 * out, design thickness = minimum base steel thickness / 0.95, inside corner radius max(3/32 − t/2, 1.5t)
 * (read in a published copy of the SSMA product catalog's steel thickness table; see lib/tables/cold-formed.ts).
 */

/** Modulus of elasticity, shear modulus (ksi) and Poisson's ratio of steel (AISI S100-16 §A1.3 symbols). */
export const E_CFS_KSI = 29_500;
export const G_CFS_KSI = 11_300;
export const POISSON = 0.3;

/** Safety and resistance factors (AISI S100-16). */
export const OMEGA_FLEXURE = 1.67; // §F2 / §F3
export const PHI_FLEXURE = 0.9;
export const OMEGA_SHEAR = 1.6; // §G2.1
export const PHI_SHEAR = 0.95;
/** §H3: combined bending and web crippling. Ω = 1.70; φ 0.90 taken (the lower of the readings seen). */
export const OMEGA_H3 = 1.7;
export const PHI_H3 = 0.9;

export interface CfsDimensions {
  /** S = lipped C-section (stud or joist), T = track (no lips) */
  style: "S" | "T";
  /** out-to-out depth, in (a track's designation gives the inside depth; pass depth + 2t) */
  D: number;
  /** out-to-out flange width, in */
  B: number;
  /** out-to-out lip length, in (0 for a track) */
  lip: number;
  /** design thickness, in */
  t: number;
  /** inside corner radius, in */
  R: number;
}

/** One straight piece of the midline: ends (x, y), thickness; part names the element it belongs to. */
interface Piece {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  t: number;
}

const ARC_STEPS = 12;

/**
 * The midline as a chain of points, top lip tip to bottom lip tip (web at x = t/2, flanges toward +x,
 * y up from mid-depth), corners as arcs of midline radius R + t/2 cut into short chords.
 */
export function midlinePoints(s: CfsDimensions): [number, number][] {
  const { D, B, lip, t, R } = s;
  const r = R + t / 2;
  const xw = t / 2;
  const xl = B - t / 2;
  const yf = D / 2 - t / 2;
  const pts: [number, number][] = [];
  const arc = (cx: number, cy: number, a0: number, a1: number) => {
    for (let k = 0; k <= ARC_STEPS; k++) {
      const a = a0 + ((a1 - a0) * k) / ARC_STEPS;
      pts.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
    }
  };
  if (s.style === "S" && lip > 0) {
    pts.push([xl, D / 2 - lip]);
    arc(xl - r, yf - r, 0, Math.PI / 2);
  } else {
    pts.push([B, yf]); // a track's flange runs to its free edge
  }
  arc(xw + r, yf - r, Math.PI / 2, Math.PI);
  arc(xw + r, -yf + r, Math.PI, (3 * Math.PI) / 2);
  if (s.style === "S" && lip > 0) {
    arc(xl - r, -yf + r, (3 * Math.PI) / 2, 2 * Math.PI);
    pts.push([xl, -D / 2 + lip]);
  } else {
    pts.push([B, -yf]);
  }
  return pts;
}

export interface GrossProperties {
  A: number;
  /** centroid from the web's outside face, in */
  xc: number;
  Ix: number;
  Sx: number;
  Iy: number;
  rx: number;
  ry: number;
  /** St. Venant torsion constant J = Σ l t³ / 3, in⁴ */
  J: number;
  /** warping constant, in⁶ */
  Cw: number;
  /** shear center from the centroid along x, in (negative: beyond the web) */
  xo: number;
  /** polar radius of gyration about the shear center, in (AISI S100-16 §F2.1.1: r0 = √(rx² + ry² + xo²)) */
  r0: number;
}

function piecesOf(pts: [number, number][], t: number): Piece[] {
  const out: Piece[] = [];
  for (let i = 1; i < pts.length; i++) {
    const [x1, y1] = pts[i - 1];
    const [x2, y2] = pts[i];
    if (Math.hypot(x2 - x1, y2 - y1) > 1e-12) out.push({ x1, y1, x2, y2, t });
  }
  return out;
}

/**
 * Thin-walled open-section properties of a chain of straight pieces (midline, thickness t): area,
 * moments of inertia, J, and the shear center and warping constant from the sectorial coordinate
 * (Vlasov's theory of thin-walled open sections).
 */
export function chainProperties(pts: [number, number][], t: number): GrossProperties {
  const ps = piecesOf(pts, t);
  let A = 0;
  let Sx = 0;
  let Sy = 0;
  for (const p of ps) {
    const L = Math.hypot(p.x2 - p.x1, p.y2 - p.y1);
    A += L * p.t;
    Sx += L * p.t * ((p.x1 + p.x2) / 2);
    Sy += L * p.t * ((p.y1 + p.y2) / 2);
  }
  const xc = Sx / A;
  const yc = Sy / A;
  let Ixx = 0; // ∫ Y² dA (about the x axis)
  let Iyy = 0; // ∫ X² dA
  let Ixy = 0;
  let J = 0;
  for (const p of ps) {
    const L = Math.hypot(p.x2 - p.x1, p.y2 - p.y1);
    const X1 = p.x1 - xc;
    const X2 = p.x2 - xc;
    const Y1 = p.y1 - yc;
    const Y2 = p.y2 - yc;
    const k = (L * p.t) / 3;
    Ixx += k * (Y1 * Y1 + Y1 * Y2 + Y2 * Y2);
    Iyy += k * (X1 * X1 + X1 * X2 + X2 * X2);
    Ixy += (L * p.t * (2 * X1 * Y1 + X1 * Y2 + X2 * Y1 + 2 * X2 * Y2)) / 6;
    J += (L * p.t ** 3) / 3;
  }
  // sectorial coordinate about a pole, along the chain
  const sectorial = (px: number, py: number): number[] => {
    const w = [0];
    for (let i = 1; i < pts.length; i++) {
      const [xa, ya] = pts[i - 1];
      const [xb, yb] = pts[i];
      w.push(w[i - 1] + ((xa - px) * (yb - py) - (xb - px) * (ya - py)));
    }
    return w;
  };
  const wc = sectorial(xc, yc);
  let IwX = 0;
  let IwY = 0;
  for (let i = 1; i < pts.length; i++) {
    const L = Math.hypot(pts[i][0] - pts[i - 1][0], pts[i][1] - pts[i - 1][1]);
    const X1 = pts[i - 1][0] - xc;
    const X2 = pts[i][0] - xc;
    const Y1 = pts[i - 1][1] - yc;
    const Y2 = pts[i][1] - yc;
    IwX += (L * t * (wc[i - 1] * (2 * X1 + X2) + wc[i] * (X1 + 2 * X2))) / 6;
    IwY += (L * t * (wc[i - 1] * (2 * Y1 + Y2) + wc[i] * (Y1 + 2 * Y2))) / 6;
  }
  // the pole (shear center) that makes the sectorial products with X and Y vanish
  const det = Iyy * Ixx - Ixy * Ixy;
  const ax = (Iyy * IwY - Ixy * IwX) / det;
  const ay = (Ixy * IwY - Ixx * IwX) / det;
  const ws = sectorial(xc + ax, yc + ay);
  let wBar = 0;
  for (let i = 1; i < pts.length; i++) {
    const L = Math.hypot(pts[i][0] - pts[i - 1][0], pts[i][1] - pts[i - 1][1]);
    wBar += (L * t * (ws[i - 1] + ws[i])) / 2;
  }
  wBar /= A;
  let Cw = 0;
  for (let i = 1; i < pts.length; i++) {
    const L = Math.hypot(pts[i][0] - pts[i - 1][0], pts[i][1] - pts[i - 1][1]);
    const a = ws[i - 1] - wBar;
    const b = ws[i] - wBar;
    Cw += ((L * t) / 3) * (a * a + a * b + b * b);
  }
  const rx = Math.sqrt(Ixx / A);
  const ry = Math.sqrt(Iyy / A);
  const depthHalf = Math.max(...pts.map(([, y]) => Math.abs(y - yc))) + t / 2;
  return { A, xc, Ix: Ixx, Sx: Ixx / depthHalf, Iy: Iyy, rx, ry, J, Cw, xo: ax, r0: Math.sqrt(rx * rx + ry * ry + ax * ax) };
}

/** Gross properties of a C-section or track from its dimensions, rounded corners included. */
export function grossProperties(s: CfsDimensions): GrossProperties {
  const g = chainProperties(midlinePoints(s), s.t);
  // Sx to the outside fiber, D/2 from mid-depth (the section is symmetric about its x axis)
  return { ...g, Sx: g.Ix / (s.D / 2) };
}

/** Flat widths of the elements, in: web h, flange w, lip d (between the corners). */
export function flatWidths(s: CfsDimensions): { h: number; w: number; d: number } {
  const c = s.R + s.t;
  return { h: s.D - 2 * c, w: s.B - (s.style === "S" ? 2 * c : c), d: s.style === "S" ? Math.max(0, s.lip - c) : 0 };
}

// ---------------------------------------------------------------------------------------------------
// Appendix 1: effective width of elements

/** Slenderness factor λ, Appendix 1 Eq. 1.1-2: λ = (1.052/√k)(w/t)√(f/E). */
export function slendernessLambda(w: number, t: number, f: number, k: number, E = E_CFS_KSI): number {
  return (1.052 / Math.sqrt(k)) * (w / t) * Math.sqrt(Math.max(f, 0) / E);
}

/** Reduction factor ρ, Appendix 1 Eq. 1.1-3: 1 for λ ≤ 0.673, else (1 − 0.22/λ)/λ. */
export function reductionRho(lambda: number): number {
  return lambda <= 0.673 ? 1 : Math.min(1, (1 - 0.22 / lambda) / lambda);
}

/** Effective width of a uniformly compressed element, Appendix 1 §1.1.1 (stiffened, k = 4) and §1.2.1 (unstiffened, k = 0.43). */
export function effectiveWidth(w: number, t: number, f: number, k: number): number {
  return reductionRho(slendernessLambda(w, t, f, k)) * w;
}

/**
 * Web under a stress gradient, Appendix 1 §1.1.2: f1 compression (+) at the compression edge, f2 at the
 * other edge (tension negative). Returns the effective widths b1 (from the compression edge) and b2
 * (next to the neutral axis), and the compressed part's width.
 */
export function webEffectiveWidths(h: number, t: number, f1: number, f2: number, ho: number, bo: number): { b1: number; b2: number; compressed: number } {
  const psi = Math.abs(f2 / f1); // §1.1.2 ψ = |f2/f1|
  const k = 4 + 2 * (1 + psi) ** 3 + 2 * (1 + psi); // §1.1.2 k for a web under a stress gradient
  const be = effectiveWidth(h, t, f1, k);
  const compressed = f2 < 0 ? h / (1 + psi) : h;
  const b1 = be / (3 + psi); // §1.1.2 b1
  let b2: number;
  if (ho / bo <= 4)
    b2 = psi > 0.236 ? be / 2 : be - b1; // §1.1.2 b2 for ho/bo ≤ 4
  else b2 = be / (1 + psi) - b1; // §1.1.2 b2 for ho/bo > 4
  return { b1, b2, compressed };
}

/**
 * Compression flange with a simple lip, Appendix 1 §1.3: the flange's effective width b and the lip's
 * reduced effective width ds, at stress f.
 */
export function edgeStiffenedFlange(w: number, d: number, t: number, f: number): { b: number; ds: number; k: number } {
  const S = 1.28 * Math.sqrt(E_CFS_KSI / f); // Eq. 1.3-1
  const dsPrime = effectiveWidth(d, t, f, 0.43); // the lip as an unstiffened element (§1.2.1), at f (conservative)
  if (w / t <= 0.328 * S) return { b: w, ds: dsPrime, k: 4 }; // §1.3: fully effective flange
  const Ia = Math.min(399 * t ** 4 * (w / t / S - 0.328) ** 3, t ** 4 * ((115 * (w / t)) / S + 5)); // §1.3 Ia
  const Is = (d ** 3 * t) / 12; // lip at 90°
  const RI = Math.min(1, Is / Ia);
  const n = Math.max(1 / 3, 0.582 - w / t / (4 * S));
  const Dw = d / w;
  const k = Math.min(4, Dw <= 0.25 ? 3.57 * RI ** n + 0.43 : (4.82 - (5 * d) / w) * RI ** n + 0.43); // Table 1.3-1
  return { b: effectiveWidth(w, t, f, k), ds: dsPrime * RI, k };
}

export interface EffectiveSection {
  /** effective moment of inertia about x, in⁴ */
  Ie: number;
  /** effective section modulus to the extreme compression fiber, in³ */
  Se: number;
  /** neutral axis below mid-depth, in */
  shift: number;
}

/**
 * Effective section in bending about x with the top flange in compression at stress f (ksi) there:
 * compression flange, its lip and the web reduced by Appendix 1; corners and the tension side whole.
 * The neutral axis is found by iteration (the linear method with midline dimensions and corner arcs).
 */
export function effectiveSection(s: CfsDimensions, f: number): EffectiveSection {
  const { D, t, R } = s;
  const r = R + t / 2;
  const c = R + t;
  const { h, w, d } = flatWidths(s);
  const yFlange = D / 2 - t / 2;
  // corners: quarter arcs, area π r t / 2, centroid 0.637 r from the arc's center (toward the corner)
  const cornerA = (Math.PI * r * t) / 2;
  const cornerOff = 0.637 * r;
  const yCornerTop = yFlange - r + cornerOff;
  const cornerIo = 0.149 * r ** 3 * t; // own I of a quarter arc about its centroid (linear method)
  type El = { A: number; y: number; Io: number };
  const whole: El[] = [];
  // tension side: bottom flange flat, corners, lip flat; web handled with the gradient
  whole.push({ A: w * t, y: -yFlange, Io: 0 });
  const corners = s.style === "S" && d > 0 ? 2 : 1;
  for (let k = 0; k < corners; k++) {
    whole.push({ A: cornerA, y: -yCornerTop, Io: cornerIo });
    whole.push({ A: cornerA, y: yCornerTop, Io: cornerIo });
  }
  if (s.style === "S" && d > 0) whole.push({ A: d * t, y: -(D / 2 - c - d / 2), Io: (t * d ** 3) / 12 });
  let shift = 0;
  let els: El[] = [];
  for (let iter = 0; iter < 30; iter++) {
    const yna = -shift;
    els = [...whole];
    // compression flange and lip
    if (s.style === "S" && d > 0) {
      const fl = edgeStiffenedFlange(w, d, t, f);
      els.push({ A: fl.b * t, y: yFlange, Io: 0 });
      els.push({ A: fl.ds * t, y: D / 2 - c - fl.ds / 2, Io: (t * fl.ds ** 3) / 12 });
    } else {
      els.push({ A: effectiveWidth(w, t, f, 0.43) * t, y: yFlange, Io: 0 });
    }
    // web: flat from y = D/2 − c down to −(D/2 − c); stresses in proportion to the distance from the axis
    const yTopFiber = D / 2 - yna;
    const f1 = (f * (D / 2 - c - yna)) / yTopFiber;
    const f2 = (-f * (yna + D / 2 - c)) / yTopFiber;
    const web = webEffectiveWidths(h, t, f1, f2, D, s.B);
    const top = D / 2 - c;
    if (web.b1 + web.b2 >= web.compressed) {
      els.push({ A: h * t, y: 0, Io: (t * h ** 3) / 12 });
    } else {
      // effective b1 from the top, b2 above the neutral axis, the whole tension part
      els.push({ A: web.b1 * t, y: top - web.b1 / 2, Io: (t * web.b1 ** 3) / 12 });
      els.push({ A: web.b2 * t, y: yna + web.b2 / 2, Io: (t * web.b2 ** 3) / 12 });
      const tens = yna + (D / 2 - c);
      els.push({ A: tens * t, y: yna - tens / 2, Io: (t * tens ** 3) / 12 });
    }
    const A = els.reduce((a, e) => a + e.A, 0);
    const yBar = els.reduce((a, e) => a + e.A * e.y, 0) / A;
    const next = -yBar;
    if (Math.abs(next - shift) < 1e-7) {
      shift = next;
      break;
    }
    shift = next;
  }
  const yna = -shift;
  const Ie = els.reduce((a, e) => a + e.Io + e.A * (e.y - yna) ** 2, 0);
  // the linear method's corner figures differ from the arc by a few parts in ten thousand: never above the gross section
  const g = grossProperties(s);
  return { Ie: Math.min(Ie, g.Ix), Se: Math.min(Ie / (D / 2 - yna), g.Sx), shift };
}

// ---------------------------------------------------------------------------------------------------
// Chapter F: flexure

/** Elastic lateral-torsional buckling stress of a singly-symmetric section bent about its symmetry axis, §F2.1.1 Eq. F2.1.1-1, ksi. */
export function elasticLtbStressFcre(g: GrossProperties, Sf: number, LbIn: number, Cb: number, E = E_CFS_KSI, G = G_CFS_KSI): number {
  if (LbIn <= 0) return Infinity;
  const sigmaEy = (Math.PI ** 2 * E) / (LbIn / g.ry) ** 2; // §F2.1.1 σey, Ky = 1
  const sigmaT = (G * g.J + (Math.PI ** 2 * E * g.Cw) / LbIn ** 2) / (g.A * g.r0 ** 2); // §F2.1.1 σt, Kt = 1
  return ((Cb * g.r0 * g.A) / Sf) * Math.sqrt(sigmaEy * sigmaT);
}

/** Global buckling stress Fn from Fcre, §F2.1 Eq. F2.1-2 to F2.1-4, ksi. */
export function globalBucklingStressFn(Fcre: number, Fy: number): number {
  if (Fcre >= 2.78 * Fy) return Fy; // Eq. F2.1-2
  if (Fcre > 0.56 * Fy) return (10 / 9) * Fy * (1 - (10 * Fy) / (36 * Fcre)); // Eq. F2.1-3
  return Fcre; // Eq. F2.1-4
}

/** Nominal flexural strength for yielding and global buckling, §F2.1 Eq. F2.1-1: Mne = Sf Fn ≤ My, kip-in. */
export function nominalMne(Sf: number, Fn: number, Fy: number): number {
  return Math.min(Sf * Fn, Sf * Fy);
}

/** Local buckling interacting with yielding and global buckling, effective width method §F3.1 Eq. F3.1-1: Mnℓ = Se Fn, kip-in. */
export function nominalMnl(s: CfsDimensions, Fn: number): number {
  return effectiveSection(s, Fn).Se * Fn;
}

// ---------------------------------------------------------------------------------------------------
// Chapter G: shear and web crippling

/** Nominal shear strength of a web without holes, §G2.1 (Eq. G2.1-1 to -3), kv = 5.34 (no transverse stiffeners, §G2.3), kip. */
export function nominalShearVn(h: number, t: number, Fy: number, E = E_CFS_KSI): { Vn: number; lambdaV: number; Vy: number; Vcr: number } {
  const Aw = h * t; // Eq. G2.1-5
  const Vy = 0.6 * Aw * Fy; // Eq. G2.1-4
  const kv = 5.34; // §G2.3, unreinforced web
  const Fcr = (Math.PI ** 2 * E * kv) / (12 * (1 - POISSON ** 2) * (h / t) ** 2); // Eq. G2.3-2
  const Vcr = Aw * Fcr; // Eq. G2.3-1
  const lambdaV = Math.sqrt(Vy / Vcr);
  const Vn = lambdaV <= 0.815 ? Vy : lambdaV <= 1.227 ? 0.815 * Math.sqrt(Vcr * Vy) : Vcr; // Eq. G2.1-1, -2, -3
  return { Vn, lambdaV, Vy, Vcr };
}

export type CripplingCase = "end-one-flange" | "interior-one-flange" | "end-two-flange" | "interior-two-flange";

/**
 * Table G5-2 (single-web channel and C-section members, fastened to the support, stiffened or partially
 * stiffened flanges): C, CR, CN, Ch, ASD Ω, LRFD φ and the limit on R/t. Read in the AISIS100.jl
 * package's copy of the table (runtosolve/AISIS100.jl, src/assets/AISI_S100_16_Table_G5_2.csv).
 */
export const WEB_CRIPPLING_C_FASTENED: Readonly<
  Record<CripplingCase, { C: number; CR: number; CN: number; Ch: number; omega: number; phi: number; RtMax: number }>
> = {
  "end-one-flange": { C: 4, CR: 0.14, CN: 0.35, Ch: 0.02, omega: 1.75, phi: 0.85, RtMax: 9 },
  "interior-one-flange": { C: 13, CR: 0.23, CN: 0.14, Ch: 0.01, omega: 1.65, phi: 0.9, RtMax: 5 },
  "end-two-flange": { C: 7.5, CR: 0.08, CN: 0.12, Ch: 0.048, omega: 1.75, phi: 0.85, RtMax: 12 },
  "interior-two-flange": { C: 20, CR: 0.1, CN: 0.08, Ch: 0.031, omega: 1.75, phi: 0.85, RtMax: 12 },
};

/**
 * Nominal web crippling strength of one web, §G5 Eq. G5-1 (θ = 90°), kip; null where the section lies
 * outside the equation's limits (h/t ≤ 200, N/t ≤ 210, N/h ≤ 2.0, R/t within the table's limit).
 */
export function webCripplingPn(s: CfsDimensions, Fy: number, N: number, c: CripplingCase): number | null {
  const { h } = flatWidths(s);
  const { t, R } = s;
  const k = WEB_CRIPPLING_C_FASTENED[c];
  if (h / t > 200 || R / t > k.RtMax) return null;
  const Nuse = Math.min(N, 210 * t, 2 * h); // longer bearing is not credited beyond the limits
  return k.C * t * t * Fy * (1 - k.CR * Math.sqrt(R / t)) * (1 + k.CN * Math.sqrt(Nuse / t)) * (1 - k.Ch * Math.sqrt(h / t)); // Eq. G5-1
}

/**
 * Bearing stiffener (a C-section or track screwed to the web) in a C-section flexural member:
 * Pn = 0.7(Pwc + Ae Fy) ≥ Pwc, φ = 0.90. The AISI S100 bearing-stiffener provision for C-section flexural
 * members, read in a published copy of the Colombian code that adopts AISI S100-2007 as its Title F:
 * NSR-10 §F.4.3.3.7.2, Eq. F.4.3.3-72 (a public repository's text of that title, found with search).
 * Its AISI clause number (§C3.7.2 in S100-2007) is from memory. Stated for two-flange loading; Pwc = the
 * joist's web crippling strength (Eq. G5-1, single web, end or interior; 0 here where the web is outside
 * its limits), Ae = the stiffener's effective area in uniform compression at its Fy. Limits of the provision: full bearing of the stiffener (else Pn is halved),
 * a C-section or track stiffener at least 3-1/2 in deep and 33 mil, at least 3 screws to the web, the first
 * screw at least d/8 from the flanges, stiffener length at least d − 3/8 in, bearing at least 1-1/2 in.
 * The ASD Ω = 1.70 is from memory — verify (the published copy is LRFD only). Its S100-16 clause number
 * could not be read.
 */
export function bearingStiffenerPn(Pwc: number, Ae: number, Fys: number): number {
  return Math.max(0.7 * (Pwc + Ae * Fys), Pwc); // NSR-10 Eq. F.4.3.3-72 (AISI S100 bearing stiffener in a C-section)
}
export const OMEGA_STIFFENER = 1.7;
export const PHI_STIFFENER = 0.9;
/** The provision's shortest bearing, in (limit 6 of the list above). */
export const STIFFENER_MIN_BEARING_IN = 1.5;

/** Effective area of a track or C-section under uniform compression at f (web §1.1.1, flanges §1.2.1 or §1.3), in². */
export function effectiveAreaUniform(s: CfsDimensions, f: number): number {
  const { h, w, d } = flatWidths(s);
  const r = s.R + s.t / 2;
  const corners = (s.style === "S" && d > 0 ? 4 : 2) * ((Math.PI * r * s.t) / 2);
  const web = effectiveWidth(h, s.t, f, 4) * s.t;
  if (s.style === "S" && d > 0) {
    const fl = edgeStiffenedFlange(w, d, s.t, f);
    return corners + web + 2 * (fl.b + fl.ds) * s.t;
  }
  return corners + web + 2 * effectiveWidth(w, s.t, f, 0.43) * s.t;
}

// ---------------------------------------------------------------------------------------------------
// Chapter H: combined bending and shear, combined bending and web crippling

/** §H2 Eq. H2-1 (unreinforced webs): √((M/Maℓo)² + (V/Va)²) ≤ 1.0, M and V at the same place, Maℓo and Va the available strengths. */
export function bendingShearRatio(M: number, Malo: number, V: number, Va: number): number {
  return Math.sqrt((M / Malo) ** 2 + (V / Va) ** 2); // Eq. H2-1
}

/**
 * §H3 Eq. H3-1 (shapes with single unreinforced webs): 0.91 (P/Pn) + (M/Mnℓo) ≤ 1.33/Ω (ASD) or 1.33 φ
 * (LRFD), P and M the required strengths at the same place. Returns the ratio of the left side to the
 * limit (≤ 1 passes).
 */
export function bendingCripplingRatio(P: number, Pn: number, M: number, Mnlo: number, lrfd: boolean): number {
  const lhs = 0.91 * (P / Pn) + M / Mnlo; // Eq. H3-1
  return lhs / (lrfd ? 1.33 * PHI_H3 : 1.33 / OMEGA_H3);
}

/** Moment gradient factor Cb, §F2.1.1: 12.5 Mmax / (2.5 Mmax + 3 MA + 4 MB + 3 MC) (absolute values). */
export function momentGradientCb(Mmax: number, MA: number, MB: number, MC: number): number {
  const m = Math.abs(Mmax);
  if (m === 0) return 1;
  return (12.5 * m) / (2.5 * m + 3 * Math.abs(MA) + 4 * Math.abs(MB) + 3 * Math.abs(MC));
}

// ---------------------------------------------------------------------------------------------------
// §F4: distortional buckling of a lipped C-section in bending (the compression flange and its lip
// rotating about the flange-web corner), with the elastic moment Mcrd by the closed-form method of
// Appendix 2 §2.3.3.3 (C- and Z-sections). Checked, equation by equation, against the published copy in
// runtosolve/AISIS100.jl (src/v16.jl: table23131, app23331 to app23336, f411).

/** Geometric properties of the compression flange and lip, Table 2.3.1.3-1 (simple lip at 90°), from centerline widths b and d, in. */
export interface DistortionalFlange {
  Af: number;
  Jf: number;
  Ixf: number;
  Iyf: number;
  Ixyf: number;
  Cwf: number;
  xof: number;
  hxf: number;
  yof: number;
}

/** Table 2.3.1.3-1 (C-section, lip at 90°): the flange-and-lip properties from centerline flange width b and lip length d, in. */
export function distortionalFlangeProperties(b: number, d: number, t: number): DistortionalFlange {
  const Af = (b + d) * t; // Table 2.3.1.3-1 Af
  const Jf = (b * t ** 3) / 3 + (d * t ** 3) / 3; // Table 2.3.1.3-1 Jf
  const Ixf = (t * (t * t * b * b + 4 * b * d ** 3 + t * t * b * d + d ** 4)) / (12 * (b + d)); // Table 2.3.1.3-1 Ixf
  const Iyf = (t * (b ** 4 + 4 * d * b ** 3)) / (12 * (b + d)); // Table 2.3.1.3-1 Iyf
  const Ixyf = (t * b * b * d * d) / (4 * (b + d)); // Table 2.3.1.3-1 Ixyf
  const xof = (b * b) / (2 * (b + d)); // Table 2.3.1.3-1 xof
  const hxf = -(b * b + 2 * d * b) / (2 * (b + d)); // Table 2.3.1.3-1 hxf
  const yof = -(d * d) / (2 * (b + d)); // Table 2.3.1.3-1 yof = hyf
  return { Af, Jf, Ixf, Iyf, Ixyf, Cwf: 0, xof, hxf, yof };
}

/** Critical unrestrained half-wavelength of distortional buckling in bending, Appendix 2 Eq. 2.3.3.3-4 (Lcrd), in; ho = out-to-out web depth. */
export function distortionalLcrd(f: DistortionalFlange, ho: number, t: number, mu = POISSON): number {
  const e = f.xof - f.hxf;
  const flange = f.Ixf * e * e + f.Cwf - ((f.Ixyf * f.Ixyf) / f.Iyf) * e * e;
  return (((4 * Math.PI ** 4 * ho * (1 - mu * mu)) / t ** 3) * flange + (Math.PI ** 4 * ho ** 4) / 720) ** 0.25; // Eq. 2.3.3.3-4
}

/** Elastic rotational stiffness of the flange, Appendix 2 Eq. 2.3.1.3-3 (kφfe), kip-in/rad/in. */
export function kPhiFe(f: DistortionalFlange, L: number, E = E_CFS_KSI, G = G_CFS_KSI): number {
  const e = f.xof - f.hxf;
  return (Math.PI / L) ** 4 * (E * f.Ixf * e * e + E * f.Cwf - E * ((f.Ixyf * f.Ixyf) / f.Iyf) * e * e) + (Math.PI / L) ** 2 * G * f.Jf; // Eq. 2.3.1.3-3
}

/** Elastic rotational stiffness of the web in bending, Appendix 2 Eq. 2.3.3.3-5 (kφwe), kip-in/rad/in. */
export function kPhiWeBending(ho: number, t: number, L: number, E = E_CFS_KSI, mu = POISSON): number {
  return ((E * t ** 3) / (12 * (1 - mu * mu))) * (3 / ho + (Math.PI / L) ** 2 * ((19 * ho) / 60) + (Math.PI / L) ** 4 * (ho ** 3 / 240)); // Eq. 2.3.3.3-5
}

/** Geometric rotational stiffness of the flange (divided by the stress), Appendix 2 Eq. 2.3.1.3-5 (k̃φfg), in². */
export function kPhiFgTilde(f: DistortionalFlange, L: number): number {
  const e = f.xof - f.hxf;
  const r = f.Ixyf / f.Iyf;
  return (Math.PI / L) ** 2 * (f.Af * (e * e * r * r - 2 * f.yof * e * r + f.hxf * f.hxf + f.yof * f.yof) + f.Ixf + f.Iyf); // Eq. 2.3.1.3-5
}

/** Geometric rotational stiffness of the web in bending (divided by the stress), Appendix 2 Eq. 2.3.3.3-6 (k̃φwg), ξweb = (f1 − f2)/f1, in². */
export function kPhiWgTildeBending(ho: number, t: number, L: number, xiWeb: number): number {
  const a = L / ho;
  const num = (45360 * (1 - xiWeb) + 62160) * a * a + 448 * Math.PI ** 2 + (1 / (a * a)) * (53 + 3 * (1 - xiWeb)) * Math.PI ** 4;
  const den = Math.PI ** 4 + 28 * Math.PI ** 2 * a * a + 420 * a ** 4;
  return ((ho * t * Math.PI ** 2) / 13440) * (num / den); // Eq. 2.3.3.3-6
}

/** Moment gradient factor of distortional buckling, Appendix 2 Eq. 2.3.3.3-3: 1 + 0.4(L/Lm)^0.7(1 + M1/M2)^0.7, 1.0 to 1.3 (M1/M2 < 0 in single curvature). */
export function distortionalBeta(L: number, Lm: number, M1overM2: number): number {
  return Math.min(1.3, Math.max(1, 1 + 0.4 * (L / Lm) ** 0.7 * Math.max(0, 1 + M1overM2) ** 0.7)); // Eq. 2.3.3.3-3
}

export interface DistortionalInput {
  /** distance between discrete restraints of the compression flange against distortional buckling, in (Infinity: none) */
  Lm: number;
  /** rotational stiffness from restraining elements at the flange-web corner, kip-in/rad/in (0: unrestrained) */
  kPhi: number;
  /** moment gradient factor, 1.0 to 1.3 (1.0 is always permitted) */
  beta: number;
}

export interface DistortionalResult {
  /** the critical unrestrained half-wavelength and the length used L = min(Lcrd, Lm), in */
  Lcrd: number;
  L: number;
  /** elastic distortional buckling stress, ksi, and moment Mcrd = Sf Fcrd, kip-in */
  Fcrd: number;
  Mcrd: number;
  /** yield moment Sfy Fy, kip-in */
  My: number;
  lambdaD: number;
  /** nominal flexural strength for distortional buckling, kip-in */
  Mnd: number;
}

/**
 * Nominal flexural strength for distortional buckling, §F4.1 Eq. F4.1-1 (λd ≤ 0.673: My) and F4.1-2, λd = √(My/Mcrd), kip-in.
 * Eq. F4.1-2 read as printed gives up to 1.00016 My for 0.673 < λd < 0.67321 (the limit is rounded); Mnd is held to My
 * there, the conservative reading, as ρ is held to 1 in Appendix 1 Eq. 1.1-3 above.
 */
export function nominalMnd(My: number, Mcrd: number): { Mnd: number; lambdaD: number } {
  const lambdaD = Math.sqrt(My / Mcrd); // Eq. F4.1-3
  if (lambdaD <= 0.673) return { Mnd: My, lambdaD }; // Eq. F4.1-1
  const r = Math.sqrt(Mcrd / My);
  return { Mnd: Math.min(My, (1 - 0.22 * r) * r * My), lambdaD }; // Eq. F4.1-2, never above My
}

/**
 * Distortional buckling of one lipped C-section bent about its x axis (web symmetric about the neutral
 * axis: ξweb = 2), AISI S100-16 §F4.1 with Mcrd by Appendix 2 §2.3.3.3: Fcrd = β(kφfe + kφwe + kφ)/(k̃φfg + k̃φwg)
 * (Eq. 2.3.3.3-2), Mcrd = Sf Fcrd (Eq. 2.3.3.3-1), Sf the gross section modulus to the compression fiber.
 * null for a section without lips (the provision covers flanges with edge stiffeners).
 */
export function distortionalStrength(
  s: CfsDimensions,
  Fy: number,
  input: DistortionalInput,
  g: GrossProperties = grossProperties(s),
): DistortionalResult | null {
  if (s.style !== "S" || s.lip <= 0) return null;
  const { t } = s;
  const b = s.B - t; // centerline flange width (out-to-out less t/2 at each side)
  const d = s.lip - t / 2; // centerline lip length
  const ho = s.D; // out-to-out web depth
  const f = distortionalFlangeProperties(b, d, t);
  const Lcrd = distortionalLcrd(f, ho, t);
  const L = Math.min(Lcrd, input.Lm > 0 ? input.Lm : Infinity); // §2.3.3.3: L = min(Lcrd, Lm)
  const xiWeb = 2; // §2.3.3.3 ξweb = (f1 − f2)/f1, f2 = −f1 for a section symmetric about its bending axis
  const Fcrd = (input.beta * (kPhiFe(f, L) + kPhiWeBending(ho, t, L) + input.kPhi)) / (kPhiFgTilde(f, L) + kPhiWgTildeBending(ho, t, L, xiWeb)); // Eq. 2.3.3.3-2
  const Sf = g.Sx;
  const Mcrd = Sf * Fcrd; // Eq. 2.3.3.3-1
  const My = Sf * Fy; // §F4.1 My = Sfy Fy
  const { Mnd, lambdaD } = nominalMnd(My, Mcrd);
  return { Lcrd, L, Fcrd, Mcrd, My, lambdaD, Mnd };
}
