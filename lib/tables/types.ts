/**
 * Shapes of the material tables the design checks read.
 *
 * The same shapes come from two places: the starter data that ships in lib/tables (read by the
 * CLI with no database) and a published version in PostgreSQL (read by the app). Units: inches,
 * in^2, in^3, in^4, in^6, psi, ksi for steel strengths, lb/ft for weights, lb/ft^3 for densities.
 */

/** Species and grades of sawn lumber: one list each, every schema, choice and type built from them. */
export const SPECIES = ["Douglas Fir-Larch", "Hem-Fir", "Spruce-Pine-Fir", "Southern Pine"] as const;
export type Species = (typeof SPECIES)[number];
export const SAWN_GRADES = ["Select Structural", "No.1", "No.2", "No.3"] as const;
export type SawnGrade = (typeof SAWN_GRADES)[number];
export type SawnSizeClass = "dimension" | "beams-stringers";

/** A dressed (surfaced dry) sawn size, e.g. 2x10 = 1.5 x 9.25 in. */
export interface SawnSize {
  /** nominal name, e.g. "2x10" */
  name: string;
  nominalThickness: number;
  nominalDepth: number;
  /** dressed thickness b, in */
  b: number;
  /** dressed depth d, in */
  d: number;
  /** in^2 */
  A: number;
  /** in^3, about the strong axis */
  Sx: number;
  /** in^4, about the strong axis */
  Ix: number;
  sizeClass: SawnSizeClass;
}

/** Reference design values for one species, grade and size class (NDS Supplement tables). */
export interface SawnDesignValues {
  species: Species;
  grade: SawnGrade;
  sizeClass: SawnSizeClass;
  /** psi */
  Fb: number;
  Ft: number;
  Fv: number;
  FcPerp: number;
  Fc: number;
  E: number;
  Emin: number;
  /** specific gravity G, oven-dry */
  G: number;
  /**
   * nominal depth (in) the row applies to, where the table gives values by width (NDS Supplement
   * Table 4B, Southern Pine); absent = every depth of the size class
   */
  nominalDepth?: number;
  /** where the numbers come from, e.g. "NDS Supplement 2018, Table 4A" */
  source: string;
}

/** Size factor CF for Fb by grade and nominal depth (and thickness where the table splits it). */
export interface SizeFactorRow {
  /** which design value table the factor belongs to */
  table: "4A" | "4B" | "4D";
  grades: SawnGrade[];
  nominalDepth: number;
  /** nominal thickness 2-3 in or 4 in where the table splits by thickness; 0 = any */
  nominalThickness: number;
  CF_Fb: number;
  CF_Ft: number;
  CF_Fc: number;
  source: string;
}

export type EngineeredKind = "LVL" | "PSL" | "glulam";

export type EngineeredSizeRule =
  | { type: "none" }
  /** CF = (refDepth / d)^exponent, capped at maxFactor (typical of LVL and PSL literature) */
  | { type: "depth"; refDepthIn: number; exponent: number; maxFactor: number }
  /** glulam volume factor, NDS 5.3.6: CV = (21/L)^(1/x) (12/d)^(1/x) (5.125/b)^(1/x) <= 1 */
  | { type: "volume"; x: number };

export interface EngineeredProduct {
  name: string;
  kind: EngineeredKind;
  /** psi */
  Fb: number;
  /**
   * bending with the tension zone stressed in compression (negative moment over a support or on
   * a cantilever), psi: glulam Fbx- of unbalanced layups; absent = same as Fb
   */
  FbNeg?: number;
  Fv: number;
  FcPerp: number;
  E: number;
  Emin: number;
  sizeRule: EngineeredSizeRule;
  /** widths of one ply, in */
  widths: number[];
  depths: number[];
  /** lb/ft^3 */
  density: number;
  note: string;
  source: string;
}

/**
 * A prefabricated wood I-joist by the open performance standard's generic designation (APA PRI-400,
 * e.g. "PRI-40" at 11-7/8 in), with the published ASD design properties for normal load duration and
 * dry service. Capacities are the member's own (not stresses): it is checked against them, not the
 * sawn-lumber formulas.
 */
export interface IJoist {
  /** designation and depth, e.g. "PRI-40 11-7/8" */
  name: string;
  /** the performance designation, e.g. "PRI-40" */
  series: string;
  /** depth, in */
  d: number;
  /** flange width, in */
  flangeWidth: number;
  /** bending stiffness EI, lbf-in² */
  EI: number;
  /** allowable moment, lbf-ft */
  M: number;
  /** allowable shear, lbf */
  V: number;
  /** allowable intermediate reaction, 3-1/2 in bearing, no web stiffeners, lbf */
  IR: number;
  /** allowable end reaction at 1-3/4 in bearing, without / with web stiffeners, lbf */
  ER175: number;
  ER175Stiffened: number;
  /** allowable end reaction at 4 in bearing, without / with web stiffeners, lbf (between 1-3/4 and 4 in: straight line) */
  ER4: number;
  ER4Stiffened: number;
  /** shear deflection coefficient K, lbf: uniform load on a simple span deflects 5wL⁴/384EI + wL²/K */
  K: number;
  /** weight allowance, lb/ft */
  weightPlf: number;
  source: string;
}

/**
 * A cold-formed steel section by the industry's standard designation, e.g. "800S162-54": depth in
 * 1/100 in (out to out for S, inside for T), S = lipped C-section (joist or stud), T = track, flange
 * width in 1/100 in, minimum base steel thickness in mils. The dimensions are what the AISI S100-16
 * checks read; the properties are computed from them (gross by the linear method with corner arcs,
 * effective at Fy by Appendix 1) and kept here for the admin screens and the sheet.
 */
export interface CfsSection {
  name: string;
  style: "S" | "T";
  /** designation depth, in (S: out to out; T: inside to inside) */
  depth: number;
  /** flange width, in */
  flange: number;
  /** lip length out to out, in (0 for a track) */
  lip: number;
  /** minimum base steel thickness, mils */
  mils: number;
  /** design thickness, in */
  t: number;
  /** inside corner radius, in */
  R: number;
  /** yield strength, ksi */
  Fy: number;
  /** gross area in², Ix in⁴, Sx in³, Iy in⁴ */
  A: number;
  Ix: number;
  Sx: number;
  Iy: number;
  /** effective section modulus and moment of inertia at Fy in the compression flange */
  Sxe: number;
  Ixe: number;
  /** torsion constant J in⁴, warping constant Cw in⁶ */
  J: number;
  Cw: number;
  /** weight, lb/ft (steel at 490 lb/ft³) */
  weightPlf: number;
  source: string;
}

/** A hot-rolled W-shape with the properties the AISC 360 checks need. */
export interface WShape {
  name: string;
  /** nominal weight, lb/ft */
  W: number;
  A: number;
  d: number;
  tw: number;
  bf: number;
  tf: number;
  /** design k (kdes), in */
  kdes: number;
  Ix: number;
  Zx: number;
  Sx: number;
  rx: number;
  Iy: number;
  Zy: number;
  Sy: number;
  ry: number;
  /** in^4 */
  J: number;
  /** in^6 */
  Cw: number;
  rts: number;
  ho: number;
  /** bf/2tf */
  bf_2tf: number;
  /** h/tw */
  h_tw: number;
  source: string;
}

export interface SteelGrade {
  name: string;
  /** ksi */
  Fy: number;
  Fu: number;
}

/** The material families a yard stocks in set lengths. */
export type StockMaterial = "sawn" | "engineered" | "steel";

/** The lengths the yard stocks one material family in, ft (an order rounds each piece up to one of them). */
export interface StockLengthRow {
  material: StockMaterial;
  lengthsFt: number[];
}

/** An optional cost per foot for the yard's own ranking, keyed by an item key (see itemKey). */
export type CostTable = Record<string, number>;

export interface MaterialTables {
  /** version label, e.g. "starter-2026.1" or a database version id */
  version: string;
  sawnSizes: SawnSize[];
  sawnValues: SawnDesignValues[];
  sizeFactors: SizeFactorRow[];
  engineered: EngineeredProduct[];
  steel: WShape[];
  steelGrades: SteelGrade[];
  iJoists: IJoist[];
  /** cold-formed steel C-sections and tracks; absent in versions published before the table existed */
  coldFormed?: CfsSection[];
  costs: CostTable;
  /** stock lengths by material family, edited with the cost table; absent or empty = the defaults in lib/orders */
  stockLengths?: StockLengthRow[];
}
