import { z } from "zod";
import { SAWN_GRADES, SPECIES } from "./types";
import type {
  CfsSection,
  EngineeredKind,
  EngineeredProduct,
  IJoist,
  SawnDesignValues,
  SawnSize,
  SawnSizeClass,
  SizeFactorRow,
  SteelGrade,
  StockLengthRow,
  WShape,
} from "./types";
import { SAWN_SIZES_SOURCE } from "./sawn-sizes";
import { STEEL_GRADES_SOURCE } from "./steel";

/**
 * The row schemas of the material tables, shared by the admin edit form (its yup schema is built from
 * the same field specs), the row routes and the CSV import. One spec per column: its CSV header (also
 * the form field name), label, unit and bounds. Bounds are sanity limits wide enough for every product a
 * house framer meets and tight enough to catch a slipped digit or a wrong unit (Fb 90,000 psi is
 * refused). No server-only imports: the browser form reads these specs too.
 */

export const TABLE_KEYS = [
  "sawn-sizes",
  "sawn-values",
  "size-factors",
  "engineered",
  "i-joists",
  "steel-shapes",
  "steel-grades",
  "costs",
  "stock-lengths",
  "cold-formed",
] as const;
export type TableKey = (typeof TABLE_KEYS)[number];

export function isTableKey(value: string): value is TableKey {
  return (TABLE_KEYS as readonly string[]).includes(value);
}

/** One entry of the cost table: cost per foot of one piece (or ply) of a stock item. */
export interface CostRow {
  /** see itemKey in lib/tables, e.g. "sawn|Douglas Fir-Larch|No.2|2x10" */
  itemKey: string;
  /** US dollars per foot */
  costPerFt: number;
}

export interface TableRowMap {
  "sawn-sizes": SawnSize;
  "sawn-values": SawnDesignValues;
  "size-factors": SizeFactorRow;
  engineered: EngineeredProduct;
  "i-joists": IJoist;
  "steel-shapes": WShape;
  "steel-grades": SteelGrade;
  costs: CostRow;
  "stock-lengths": StockLengthRow;
  "cold-formed": CfsSection;
}

export type TableRows = { [K in TableKey]: TableRowMap[K][] };

export type FieldKind = "number" | "text" | "choice" | "numberList" | "choiceList";

export interface FieldSpec {
  /** the column header in CSV files and the field name in the edit form */
  name: string;
  label: string;
  unit?: string;
  kind: FieldKind;
  min?: number;
  max?: number;
  choices?: readonly string[];
  /** a blank cell is allowed */
  optional?: boolean;
  maxLength?: number;
  hint?: string;
  /** where the value sits in a row ("Fb", "sizeRule.exponent"), to name the column of a row issue */
  path: string;
}

/** A row as text, one string per column (a CSV record or the edit form's values). */
export type FlatRow = Record<string, string>;

export const SPECIES_CHOICES = SPECIES;
export const GRADE_CHOICES = SAWN_GRADES;
export const SIZE_CLASS_CHOICES = ["dimension", "beams-stringers"] as const satisfies readonly SawnSizeClass[];
export const ENGINEERED_KIND_CHOICES = ["LVL", "PSL", "glulam"] as const satisfies readonly EngineeredKind[];
export const SIZE_FACTOR_TABLE_CHOICES = ["4A", "4B", "4D"] as const satisfies readonly SizeFactorRow["table"][];
export const SIZE_RULE_CHOICES = ["none", "depth", "volume"] as const;

/** "10000" → "10,000"; small numbers keep their decimals. */
export function formatBound(value: number): string {
  return value.toLocaleString("en-US", { maximumFractionDigits: 6 });
}

function withUnit(value: number, unit: string | undefined): string {
  return unit ? `${formatBound(value)} ${unit}` : formatBound(value);
}

function num(f: FieldSpec) {
  let s = z.number({ error: `${f.label} must be a number` }).finite(`${f.label} must be a finite number`);
  if (f.min !== undefined) s = s.min(f.min, `${f.label} must be at least ${withUnit(f.min, f.unit)}`);
  if (f.max !== undefined) s = s.max(f.max, `${f.label} must be at most ${withUnit(f.max, f.unit)}`);
  return s;
}

function text(f: FieldSpec) {
  const max = f.maxLength ?? 200;
  const s = z
    .string({ error: `${f.label} must be text` })
    .trim()
    .max(max, `${f.label} must be at most ${max} characters`);
  return f.optional ? s : s.min(1, `${f.label} is required`);
}

function choice<const T extends readonly [string, ...string[]]>(f: FieldSpec, values: T) {
  return z.enum(values, { error: `${f.label} must be one of: ${values.join(", ")}` });
}

function numList(f: FieldSpec) {
  return z.array(num(f), { error: `${f.label} must be a list of numbers` }).min(1, `${f.label} needs at least one value`);
}

/** Relative closeness for the cross-checks between properties. */
function near(actual: number, expected: number, tolerance: number): boolean {
  return Math.abs(actual - expected) <= tolerance * Math.abs(expected);
}

function spec(fields: FieldSpec[]): Record<string, FieldSpec> {
  return Object.fromEntries(fields.map((f) => [f.path, f]));
}

// ---------------------------------------------------------------------------------------------------
// Dressed sawn sizes (NDS Supplement Table 1B shape of data)

const SAWN_SIZE_FIELDS: FieldSpec[] = [
  { name: "name", path: "name", label: "Size", kind: "text", maxLength: 20, hint: "nominal thickness x depth, e.g. 2x10" },
  { name: "nominal_thickness_in", path: "nominalThickness", label: "Nominal thickness", unit: "in", kind: "number", min: 1, max: 12 },
  { name: "nominal_depth_in", path: "nominalDepth", label: "Nominal depth", unit: "in", kind: "number", min: 2, max: 24 },
  { name: "b_in", path: "b", label: "Dressed thickness b", unit: "in", kind: "number", min: 0.5, max: 12 },
  { name: "d_in", path: "d", label: "Dressed depth d", unit: "in", kind: "number", min: 1, max: 24 },
  { name: "A_in2", path: "A", label: "Area A", unit: "in²", kind: "number", min: 0.5, max: 300, hint: "b·d" },
  { name: "Sx_in3", path: "Sx", label: "Section modulus Sx", unit: "in³", kind: "number", min: 0.1, max: 1500, hint: "b·d²/6" },
  { name: "Ix_in4", path: "Ix", label: "Moment of inertia Ix", unit: "in⁴", kind: "number", min: 0.1, max: 15000, hint: "b·d³/12" },
  { name: "size_class", path: "sizeClass", label: "Size class", kind: "choice", choices: SIZE_CLASS_CHOICES },
];
const SS = spec(SAWN_SIZE_FIELDS);

/** Tolerance on A, Sx, Ix against b·d, b·d²/6, b·d³/12: the starter data computes them exactly; 0.5% allows rounded entries. */
const RECTANGLE_TOLERANCE = 0.005;

export const sawnSizeSchema: z.ZodType<SawnSize> = z
  .object({
    name: text(SS.name).regex(/^\d+x\d+$/, "Size must be nominal thickness x depth, e.g. 2x10"),
    nominalThickness: num(SS.nominalThickness),
    nominalDepth: num(SS.nominalDepth),
    b: num(SS.b),
    d: num(SS.d),
    A: num(SS.A),
    Sx: num(SS.Sx),
    Ix: num(SS.Ix),
    sizeClass: choice(SS.sizeClass, SIZE_CLASS_CHOICES),
  })
  .superRefine((r, ctx) => {
    if (r.name !== `${r.nominalThickness}x${r.nominalDepth}`) {
      ctx.addIssue({ code: "custom", path: ["name"], message: `Size must match the nominal thickness and depth: ${r.nominalThickness}x${r.nominalDepth}` });
    }
    const checks: [keyof SawnSize, number, string][] = [
      ["A", r.b * r.d, "b·d"],
      ["Sx", (r.b * r.d ** 2) / 6, "b·d²/6"],
      ["Ix", (r.b * r.d ** 3) / 12, "b·d³/12"],
    ];
    for (const [key, expected, formula] of checks) {
      const actual = r[key] as number;
      if (!near(actual, expected, RECTANGLE_TOLERANCE)) {
        ctx.addIssue({
          code: "custom",
          path: [key],
          message: `${SS[key].label} must equal ${formula} = ${formatBound(Number(expected.toFixed(3)))} ${SS[key].unit} (within 0.5%)`,
        });
      }
    }
  });

// ---------------------------------------------------------------------------------------------------
// Reference design values for sawn lumber (NDS Supplement Tables 4A, 4B, 4D shape of data)

const SAWN_VALUE_FIELDS: FieldSpec[] = [
  { name: "species", path: "species", label: "Species", kind: "choice", choices: SPECIES_CHOICES },
  { name: "grade", path: "grade", label: "Grade", kind: "choice", choices: GRADE_CHOICES },
  { name: "size_class", path: "sizeClass", label: "Size class", kind: "choice", choices: SIZE_CLASS_CHOICES },
  {
    name: "nominal_depth_in",
    path: "nominalDepth",
    label: "Nominal depth",
    unit: "in",
    kind: "number",
    min: 2,
    max: 24,
    optional: true,
    hint: "only where the table gives values by width (Southern Pine); blank = every depth",
  },
  { name: "Fb_psi", path: "Fb", label: "Fb", unit: "psi", kind: "number", min: 50, max: 10_000, hint: "bending" },
  { name: "Ft_psi", path: "Ft", label: "Ft", unit: "psi", kind: "number", min: 25, max: 8_000, hint: "tension parallel to grain" },
  { name: "Fv_psi", path: "Fv", label: "Fv", unit: "psi", kind: "number", min: 25, max: 1_000, hint: "shear parallel to grain" },
  { name: "FcPerp_psi", path: "FcPerp", label: "Fc⊥", unit: "psi", kind: "number", min: 50, max: 2_000, hint: "compression perpendicular to grain" },
  { name: "Fc_psi", path: "Fc", label: "Fc", unit: "psi", kind: "number", min: 50, max: 10_000, hint: "compression parallel to grain" },
  { name: "E_psi", path: "E", label: "E", unit: "psi", kind: "number", min: 100_000, max: 4_000_000, hint: "modulus of elasticity" },
  { name: "Emin_psi", path: "Emin", label: "Emin", unit: "psi", kind: "number", min: 30_000, max: 2_000_000, hint: "for stability" },
  { name: "G", path: "G", label: "Specific gravity G", kind: "number", min: 0.25, max: 1 },
  { name: "source", path: "source", label: "Source", kind: "text", maxLength: 300, hint: "standard, edition and table" },
];
const SV = spec(SAWN_VALUE_FIELDS);

function eminBelowE(r: { E: number; Emin: number }, ctx: z.RefinementCtx): void {
  if (r.Emin >= r.E) ctx.addIssue({ code: "custom", path: ["Emin"], message: "Emin must be less than E" });
}

export const sawnValuesSchema: z.ZodType<SawnDesignValues> = z
  .object({
    species: choice(SV.species, SPECIES_CHOICES),
    grade: choice(SV.grade, GRADE_CHOICES),
    sizeClass: choice(SV.sizeClass, SIZE_CLASS_CHOICES),
    nominalDepth: num(SV.nominalDepth).optional(),
    Fb: num(SV.Fb),
    Ft: num(SV.Ft),
    Fv: num(SV.Fv),
    FcPerp: num(SV.FcPerp),
    Fc: num(SV.Fc),
    E: num(SV.E),
    Emin: num(SV.Emin),
    G: num(SV.G),
    source: text(SV.source),
  })
  .superRefine(eminBelowE);

// ---------------------------------------------------------------------------------------------------
// Size factors CF

const SIZE_FACTOR_FIELDS: FieldSpec[] = [
  { name: "table", path: "table", label: "NDS Supplement table", kind: "choice", choices: SIZE_FACTOR_TABLE_CHOICES },
  { name: "grades", path: "grades", label: "Grades", kind: "choiceList", choices: GRADE_CHOICES, hint: "in a CSV file, separated by ;" },
  { name: "nominal_depth_in", path: "nominalDepth", label: "Nominal depth", unit: "in", kind: "number", min: 2, max: 24 },
  {
    name: "nominal_thickness_in",
    path: "nominalThickness",
    label: "Nominal thickness",
    unit: "in",
    kind: "number",
    min: 0,
    max: 12,
    hint: "0 = any thickness",
  },
  { name: "CF_Fb", path: "CF_Fb", label: "CF on Fb", kind: "number", min: 0.3, max: 2 },
  { name: "CF_Ft", path: "CF_Ft", label: "CF on Ft", kind: "number", min: 0.3, max: 2 },
  { name: "CF_Fc", path: "CF_Fc", label: "CF on Fc", kind: "number", min: 0.3, max: 2 },
  { name: "source", path: "source", label: "Source", kind: "text", maxLength: 300 },
];
const SF = spec(SIZE_FACTOR_FIELDS);

export const sizeFactorSchema: z.ZodType<SizeFactorRow> = z.object({
  table: choice(SF.table, SIZE_FACTOR_TABLE_CHOICES),
  grades: z
    .array(choice(SF.grades, GRADE_CHOICES), { error: "Grades must be a list" })
    .min(1, "Grades needs at least one grade")
    .refine((g) => new Set(g).size === g.length, "Grades lists a grade twice"),
  nominalDepth: num(SF.nominalDepth),
  nominalThickness: num(SF.nominalThickness),
  CF_Fb: num(SF.CF_Fb),
  CF_Ft: num(SF.CF_Ft),
  CF_Fc: num(SF.CF_Fc),
  source: text(SF.source),
});

// ---------------------------------------------------------------------------------------------------
// Engineered lumber (LVL, PSL, glulam)

const ENGINEERED_FIELDS: FieldSpec[] = [
  { name: "name", path: "name", label: "Product", kind: "text", maxLength: 80 },
  { name: "kind", path: "kind", label: "Kind", kind: "choice", choices: ENGINEERED_KIND_CHOICES },
  { name: "Fb_psi", path: "Fb", label: "Fb", unit: "psi", kind: "number", min: 500, max: 10_000, hint: "bending" },
  {
    name: "FbNeg_psi",
    path: "FbNeg",
    label: "Fb, compression zone stressed in tension",
    unit: "psi",
    kind: "number",
    min: 100,
    max: 10_000,
    optional: true,
    hint: "glulam Fbx− of unbalanced layups; blank = same as Fb",
  },
  { name: "Fv_psi", path: "Fv", label: "Fv", unit: "psi", kind: "number", min: 50, max: 1_000, hint: "shear" },
  { name: "FcPerp_psi", path: "FcPerp", label: "Fc⊥", unit: "psi", kind: "number", min: 100, max: 2_500, hint: "bearing" },
  { name: "E_psi", path: "E", label: "E", unit: "psi", kind: "number", min: 500_000, max: 4_000_000 },
  { name: "Emin_psi", path: "Emin", label: "Emin", unit: "psi", kind: "number", min: 200_000, max: 2_500_000 },
  {
    name: "size_rule",
    path: "sizeRule.type",
    label: "Size rule",
    kind: "choice",
    choices: SIZE_RULE_CHOICES,
    hint: "depth: CF = (ref/d)^n; volume: glulam CV",
  },
  {
    name: "size_ref_depth_in",
    path: "sizeRule.refDepthIn",
    label: "Reference depth",
    unit: "in",
    kind: "number",
    min: 1,
    max: 72,
    optional: true,
    hint: "depth rule only",
  },
  { name: "size_exponent", path: "sizeRule.exponent", label: "Size exponent n", kind: "number", min: 0, max: 1, optional: true, hint: "depth rule only" },
  {
    name: "size_max_factor",
    path: "sizeRule.maxFactor",
    label: "Largest size factor",
    kind: "number",
    min: 1,
    max: 1.5,
    optional: true,
    hint: "depth rule only",
  },
  {
    name: "volume_x",
    path: "sizeRule.x",
    label: "Volume factor exponent x",
    kind: "number",
    min: 1,
    max: 50,
    optional: true,
    hint: "volume rule only: 10, or 20 for Southern Pine",
  },
  { name: "widths_in", path: "widths", label: "Widths", unit: "in", kind: "numberList", min: 0.5, max: 12, hint: "one ply; in a CSV file, separated by ;" },
  { name: "depths_in", path: "depths", label: "Depths", unit: "in", kind: "numberList", min: 2, max: 72, hint: "in a CSV file, separated by ;" },
  { name: "density_pcf", path: "density", label: "Density", unit: "lb/ft³", kind: "number", min: 15, max: 70 },
  { name: "note", path: "note", label: "Note", kind: "text", maxLength: 300, optional: true },
  { name: "source", path: "source", label: "Source", kind: "text", maxLength: 300 },
];
const EN = spec(ENGINEERED_FIELDS);

const sizeRuleSchema = z.discriminatedUnion(
  "type",
  [
    z.object({ type: z.literal("none") }),
    z.object({
      type: z.literal("depth"),
      refDepthIn: num(EN["sizeRule.refDepthIn"]),
      exponent: num(EN["sizeRule.exponent"]),
      maxFactor: num(EN["sizeRule.maxFactor"]),
    }),
    z.object({ type: z.literal("volume"), x: num(EN["sizeRule.x"]) }),
  ],
  { error: `Size rule must be one of: ${SIZE_RULE_CHOICES.join(", ")}` },
);

export const engineeredSchema: z.ZodType<EngineeredProduct> = z
  .object({
    name: text(EN.name),
    kind: choice(EN.kind, ENGINEERED_KIND_CHOICES),
    Fb: num(EN.Fb),
    FbNeg: num(EN.FbNeg).optional(),
    Fv: num(EN.Fv),
    FcPerp: num(EN.FcPerp),
    E: num(EN.E),
    Emin: num(EN.Emin),
    sizeRule: sizeRuleSchema,
    widths: numList(EN.widths),
    depths: numList(EN.depths),
    density: num(EN.density),
    note: z.string().trim().max(300, "Note must be at most 300 characters"),
    source: text(EN.source),
  })
  .superRefine(eminBelowE);

// ---------------------------------------------------------------------------------------------------
// Steel W-shapes (AISC Shapes Database shape of data)

const STEEL_SHAPE_FIELDS: FieldSpec[] = [
  { name: "name", path: "name", label: "Shape", kind: "text", maxLength: 20, hint: "e.g. W8x18" },
  { name: "W_plf", path: "W", label: "Weight W", unit: "lb/ft", kind: "number", min: 4, max: 800 },
  { name: "A_in2", path: "A", label: "Area A", unit: "in²", kind: "number", min: 1, max: 250 },
  { name: "d_in", path: "d", label: "Depth d", unit: "in", kind: "number", min: 3, max: 45 },
  { name: "tw_in", path: "tw", label: "Web thickness tw", unit: "in", kind: "number", min: 0.1, max: 4 },
  { name: "bf_in", path: "bf", label: "Flange width bf", unit: "in", kind: "number", min: 2, max: 20 },
  { name: "tf_in", path: "tf", label: "Flange thickness tf", unit: "in", kind: "number", min: 0.1, max: 6 },
  { name: "kdes_in", path: "kdes", label: "Design k", unit: "in", kind: "number", min: 0.2, max: 7 },
  { name: "Ix_in4", path: "Ix", label: "Ix", unit: "in⁴", kind: "number", min: 1, max: 50_000 },
  { name: "Zx_in3", path: "Zx", label: "Zx", unit: "in³", kind: "number", min: 0.5, max: 5_000 },
  { name: "Sx_in3", path: "Sx", label: "Sx", unit: "in³", kind: "number", min: 0.5, max: 5_000 },
  { name: "rx_in", path: "rx", label: "rx", unit: "in", kind: "number", min: 0.5, max: 20 },
  { name: "Iy_in4", path: "Iy", label: "Iy", unit: "in⁴", kind: "number", min: 0.1, max: 10_000 },
  { name: "Zy_in3", path: "Zy", label: "Zy", unit: "in³", kind: "number", min: 0.1, max: 2_000 },
  { name: "Sy_in3", path: "Sy", label: "Sy", unit: "in³", kind: "number", min: 0.1, max: 2_000 },
  { name: "ry_in", path: "ry", label: "ry", unit: "in", kind: "number", min: 0.3, max: 6 },
  { name: "J_in4", path: "J", label: "Torsional constant J", unit: "in⁴", kind: "number", min: 0.001, max: 2_000 },
  { name: "Cw_in6", path: "Cw", label: "Warping constant Cw", unit: "in⁶", kind: "number", min: 1, max: 2_000_000 },
  { name: "rts_in", path: "rts", label: "rts", unit: "in", kind: "number", min: 0.3, max: 7 },
  { name: "ho_in", path: "ho", label: "ho", unit: "in", kind: "number", min: 2, max: 45, hint: "distance between flange centroids" },
  { name: "bf_2tf", path: "bf_2tf", label: "bf/2tf", kind: "number", min: 1, max: 20 },
  { name: "h_tw", path: "h_tw", label: "h/tw", kind: "number", min: 1, max: 70 },
  { name: "source", path: "source", label: "Source", kind: "text", maxLength: 300 },
];
const ST = spec(STEEL_SHAPE_FIELDS);

/** Steel density, lb/ft³ (common practice; the AISC tables use 490). */
const STEEL_PCF = 490;

export const steelShapeSchema: z.ZodType<WShape> = z
  .object({
    name: text(ST.name).regex(/^W\d+x\d+(\.\d+)?$/, "Shape must be named like W8x18"),
    W: num(ST.W),
    A: num(ST.A),
    d: num(ST.d),
    tw: num(ST.tw),
    bf: num(ST.bf),
    tf: num(ST.tf),
    kdes: num(ST.kdes),
    Ix: num(ST.Ix),
    Zx: num(ST.Zx),
    Sx: num(ST.Sx),
    rx: num(ST.rx),
    Iy: num(ST.Iy),
    Zy: num(ST.Zy),
    Sy: num(ST.Sy),
    ry: num(ST.ry),
    J: num(ST.J),
    Cw: num(ST.Cw),
    rts: num(ST.rts),
    ho: num(ST.ho),
    bf_2tf: num(ST.bf_2tf),
    h_tw: num(ST.h_tw),
    source: text(ST.source),
  })
  .superRefine((r, ctx) => {
    // Cross-checks that catch a slipped digit or a wrong unit; tolerances allow the tables' rounding.
    const weight = (r.A * STEEL_PCF) / 144;
    if (!near(r.W, weight, 0.05)) {
      ctx.addIssue({ code: "custom", path: ["W"], message: `Weight W must be near A × 490 lb/ft³ = ${weight.toFixed(1)} lb/ft (within 5%)` });
    }
    if (!near(r.Sx, r.Ix / (r.d / 2), 0.03)) {
      ctx.addIssue({ code: "custom", path: ["Sx"], message: `Sx must be near Ix/(d/2) = ${(r.Ix / (r.d / 2)).toFixed(2)} in³ (within 3%)` });
    }
    if (r.Zx < r.Sx) ctx.addIssue({ code: "custom", path: ["Zx"], message: "Zx must not be less than Sx" });
    if (!near(r.bf_2tf, r.bf / (2 * r.tf), 0.03)) {
      ctx.addIssue({ code: "custom", path: ["bf_2tf"], message: `bf/2tf must be near ${(r.bf / (2 * r.tf)).toFixed(2)} from bf and tf (within 3%)` });
    }
    if (r.ho >= r.d) ctx.addIssue({ code: "custom", path: ["ho"], message: "ho must be less than the depth d" });
  });

// ---------------------------------------------------------------------------------------------------
// Wood I-joists (APA PRI-400 shape of data: capacities, not stresses)

const I_JOIST_FIELDS: FieldSpec[] = [
  { name: "name", path: "name", label: "I-joist", kind: "text", maxLength: 60, hint: "designation and depth, e.g. PRI-40 11-7/8" },
  { name: "series", path: "series", label: "Series", kind: "text", maxLength: 40, hint: "e.g. PRI-40, or the supplier's series" },
  { name: "d_in", path: "d", label: "Depth d", unit: "in", kind: "number", min: 7, max: 30 },
  { name: "flange_width_in", path: "flangeWidth", label: "Flange width", unit: "in", kind: "number", min: 1, max: 4 },
  { name: "EI_lb_in2", path: "EI", label: "EI", unit: "lbf-in²", kind: "number", min: 50e6, max: 5e9, hint: "bending stiffness" },
  { name: "M_lb_ft", path: "M", label: "Moment M", unit: "lbf-ft", kind: "number", min: 500, max: 40_000, hint: "allowable, normal load duration" },
  { name: "V_lb", path: "V", label: "Shear V", unit: "lbf", kind: "number", min: 300, max: 6_000 },
  {
    name: "IR_lb",
    path: "IR",
    label: "Intermediate reaction",
    unit: "lbf",
    kind: "number",
    min: 300,
    max: 10_000,
    hint: "3-1/2 in bearing, no web stiffeners",
  },
  { name: "ER_175_lb", path: "ER175", label: "End reaction, 1-3/4 in", unit: "lbf", kind: "number", min: 200, max: 6_000, hint: "no web stiffeners" },
  { name: "ER_175_stiff_lb", path: "ER175Stiffened", label: "End reaction, 1-3/4 in, stiffened", unit: "lbf", kind: "number", min: 200, max: 6_000 },
  { name: "ER_4_lb", path: "ER4", label: "End reaction, 4 in", unit: "lbf", kind: "number", min: 200, max: 8_000, hint: "no web stiffeners" },
  { name: "ER_4_stiff_lb", path: "ER4Stiffened", label: "End reaction, 4 in, stiffened", unit: "lbf", kind: "number", min: 200, max: 8_000 },
  { name: "K_lb", path: "K", label: "Shear deflection coefficient K", unit: "lbf", kind: "number", min: 1e6, max: 5e7 },
  { name: "weight_plf", path: "weightPlf", label: "Weight", unit: "lb/ft", kind: "number", min: 1, max: 15 },
  { name: "source", path: "source", label: "Source", kind: "text", maxLength: 300, hint: "standard or supplier, edition and table" },
];
const IJ = spec(I_JOIST_FIELDS);

export const iJoistSchema: z.ZodType<IJoist> = z
  .object({
    name: text(IJ.name),
    series: text(IJ.series),
    d: num(IJ.d),
    flangeWidth: num(IJ.flangeWidth),
    EI: num(IJ.EI),
    M: num(IJ.M),
    V: num(IJ.V),
    IR: num(IJ.IR),
    ER175: num(IJ.ER175),
    ER175Stiffened: num(IJ.ER175Stiffened),
    ER4: num(IJ.ER4),
    ER4Stiffened: num(IJ.ER4Stiffened),
    K: num(IJ.K),
    weightPlf: num(IJ.weightPlf),
    source: text(IJ.source),
  })
  .superRefine((r, ctx) => {
    if (r.ER4 < r.ER175) ctx.addIssue({ code: "custom", path: ["ER4"], message: "End reaction at 4 in must not be less than at 1-3/4 in" });
    if (r.ER175Stiffened < r.ER175)
      ctx.addIssue({ code: "custom", path: ["ER175Stiffened"], message: "A stiffened end reaction must not be less than the unstiffened one" });
    if (r.ER4Stiffened < r.ER4)
      ctx.addIssue({ code: "custom", path: ["ER4Stiffened"], message: "A stiffened end reaction must not be less than the unstiffened one" });
  });

// ---------------------------------------------------------------------------------------------------
// Cold-formed steel C-sections and tracks (designation, dimensions, Fy and the properties computed from them)

export const CFS_STYLES = ["S", "T"] as const;

const CFS_FIELDS: FieldSpec[] = [
  { name: "name", path: "name", label: "Designation", kind: "text", maxLength: 40, hint: "depth, S or T, flange, mils, e.g. 800S162-54" },
  { name: "style", path: "style", label: "Style", kind: "choice", choices: CFS_STYLES, hint: "S = lipped C-section (joist or stud), T = track" },
  { name: "depth_in", path: "depth", label: "Depth", unit: "in", kind: "number", min: 1.5, max: 16, hint: "S: out to out; T: inside to inside" },
  { name: "flange_in", path: "flange", label: "Flange width", unit: "in", kind: "number", min: 1, max: 4 },
  { name: "lip_in", path: "lip", label: "Lip", unit: "in", kind: "number", min: 0, max: 1.5, hint: "0 for a track" },
  { name: "mils", path: "mils", label: "Thickness", unit: "mil", kind: "number", min: 18, max: 150, hint: "minimum base steel thickness" },
  { name: "t_in", path: "t", label: "Design thickness t", unit: "in", kind: "number", min: 0.015, max: 0.2, hint: "minimum thickness / 0.95" },
  { name: "R_in", path: "R", label: "Inside corner radius", unit: "in", kind: "number", min: 0.02, max: 0.4 },
  { name: "Fy_ksi", path: "Fy", label: "Fy, yield", unit: "ksi", kind: "number", min: 33, max: 80 },
  { name: "A_in2", path: "A", label: "Area A", unit: "in²", kind: "number", min: 0.05, max: 5 },
  { name: "Ix_in4", path: "Ix", label: "Ix, gross", unit: "in⁴", kind: "number", min: 0.05, max: 200 },
  { name: "Sx_in3", path: "Sx", label: "Sx, gross", unit: "in³", kind: "number", min: 0.02, max: 40 },
  { name: "Iy_in4", path: "Iy", label: "Iy, gross", unit: "in⁴", kind: "number", min: 0.001, max: 20 },
  { name: "Sxe_in3", path: "Sxe", label: "Sxe, effective at Fy", unit: "in³", kind: "number", min: 0.01, max: 40 },
  { name: "Ixe_in4", path: "Ixe", label: "Ixe, effective at Fy", unit: "in⁴", kind: "number", min: 0.05, max: 200 },
  { name: "J_in4", path: "J", label: "Torsion constant J", unit: "in⁴", kind: "number", min: 0, max: 1 },
  { name: "Cw_in6", path: "Cw", label: "Warping constant Cw", unit: "in⁶", kind: "number", min: 0, max: 500 },
  { name: "weight_plf", path: "weightPlf", label: "Weight", unit: "lb/ft", kind: "number", min: 0.2, max: 20 },
  { name: "source", path: "source", label: "Source", kind: "text", maxLength: 300, hint: "table and edition; where it was checked" },
];
const CF = spec(CFS_FIELDS);

export const cfsSectionSchema: z.ZodType<CfsSection> = z
  .object({
    name: text(CF.name),
    style: choice(CF.style, CFS_STYLES),
    depth: num(CF.depth),
    flange: num(CF.flange),
    lip: num(CF.lip),
    mils: num(CF.mils).int("Thickness must be a whole number of mils"),
    t: num(CF.t),
    R: num(CF.R),
    Fy: num(CF.Fy),
    A: num(CF.A),
    Ix: num(CF.Ix),
    Sx: num(CF.Sx),
    Iy: num(CF.Iy),
    Sxe: num(CF.Sxe),
    Ixe: num(CF.Ixe),
    J: num(CF.J),
    Cw: num(CF.Cw),
    weightPlf: num(CF.weightPlf),
    source: text(CF.source),
  })
  .superRefine((r, ctx) => {
    const m = /^(\d{3,4})([ST])(\d{3})-(\d{2,3})$/.exec(r.name.toUpperCase());
    if (!m) ctx.addIssue({ code: "custom", path: ["name"], message: "Designation must read depth, S or T, flange, dash, mils, e.g. 800S162-54" });
    else {
      if (m[2] !== r.style) ctx.addIssue({ code: "custom", path: ["style"], message: `The designation says ${m[2]}, the style ${r.style}` });
      if (Math.abs(Number(m[1]) / 100 - r.depth) > 0.005)
        ctx.addIssue({ code: "custom", path: ["depth"], message: `The designation says ${Number(m[1]) / 100} in deep` });
      if (Math.abs(Number(m[3]) / 100 - r.flange) > 0.005)
        ctx.addIssue({ code: "custom", path: ["flange"], message: `The designation says a ${Number(m[3]) / 100} in flange` });
      if (Number(m[4]) !== r.mils) ctx.addIssue({ code: "custom", path: ["mils"], message: `The designation says ${m[4]} mil` });
    }
    if (r.style === "S" && r.lip <= 0) ctx.addIssue({ code: "custom", path: ["lip"], message: "A C-section (S) has a lip" });
    if (r.style === "T" && r.lip !== 0) ctx.addIssue({ code: "custom", path: ["lip"], message: "A track (T) has no lip: 0" });
    // design thickness = minimum thickness / 0.95 (AISI S100-16 §A3.4 as the SSMA tables apply it)
    if (!near(r.t, r.mils / 1000 / 0.95, 0.01))
      ctx.addIssue({
        code: "custom",
        path: ["t"],
        message: `Design thickness of ${r.mils} mil is about ${formatBound(r.mils / 1000 / 0.95)} in (minimum / 0.95)`,
      });
    if (r.Sxe > r.Sx * 1.001) ctx.addIssue({ code: "custom", path: ["Sxe"], message: "The effective Sx must not exceed the gross Sx" });
    if (r.Ixe > r.Ix * 1.001) ctx.addIssue({ code: "custom", path: ["Ixe"], message: "The effective Ix must not exceed the gross Ix" });
    const D = r.style === "T" ? r.depth + 2 * r.t : r.depth;
    if (!near(r.Sx, r.Ix / (D / 2), 0.02)) ctx.addIssue({ code: "custom", path: ["Sx"], message: "Sx must be Ix over half the depth (out to out)" });
    if (!near(r.weightPlf, (r.A * 490) / 144, 0.03)) ctx.addIssue({ code: "custom", path: ["weightPlf"], message: "Weight must be A × 490 lb/ft³ (steel)" });
  });

// ---------------------------------------------------------------------------------------------------
// Steel grades

const STEEL_GRADE_FIELDS: FieldSpec[] = [
  { name: "name", path: "name", label: "Grade", kind: "text", maxLength: 20, hint: "e.g. A992" },
  { name: "Fy_ksi", path: "Fy", label: "Fy, yield", unit: "ksi", kind: "number", min: 30, max: 100 },
  { name: "Fu_ksi", path: "Fu", label: "Fu, tensile", unit: "ksi", kind: "number", min: 40, max: 130 },
];
const SG = spec(STEEL_GRADE_FIELDS);

export const steelGradeSchema: z.ZodType<SteelGrade> = z.object({ name: text(SG.name), Fy: num(SG.Fy), Fu: num(SG.Fu) }).superRefine((r, ctx) => {
  if (r.Fu < r.Fy) ctx.addIssue({ code: "custom", path: ["Fu"], message: "Fu must not be less than Fy" });
});

// ---------------------------------------------------------------------------------------------------
// Costs per foot (the yard's own prices)

const COST_FIELDS: FieldSpec[] = [
  {
    name: "item_key",
    path: "itemKey",
    label: "Item",
    kind: "text",
    maxLength: 200,
    hint: "sawn|species|grade|size, engineered|product|widthxdepth, ijoist|name, cfs|designation or steel|shape",
  },
  { name: "cost_per_ft_usd", path: "costPerFt", label: "Cost per foot", unit: "$/ft", kind: "number", min: 0, max: 10_000 },
];
const CO = spec(COST_FIELDS);

export const costSchema: z.ZodType<CostRow> = z.object({
  itemKey: text(CO.itemKey).regex(/^(sawn|engineered|steel|ijoist|cfs)\|\S.*$/, "Item must start with sawn|, engineered|, ijoist|, cfs| or steel|"),
  costPerFt: num(CO.costPerFt),
});

// ---------------------------------------------------------------------------------------------------
// Stock lengths (the lengths the yard sells each material family in, edited beside the costs)

export const STOCK_MATERIAL_CHOICES = ["sawn", "engineered", "steel"] as const;

const STOCK_LENGTH_FIELDS: FieldSpec[] = [
  { name: "material", path: "material", label: "Material", kind: "choice", choices: STOCK_MATERIAL_CHOICES },
  {
    name: "lengths_ft",
    path: "lengthsFt",
    label: "Stock lengths",
    unit: "ft",
    kind: "numberList",
    min: 1,
    max: 80,
    hint: "separated by ; e.g. 8;10;12;14;16",
  },
];
const SL = spec(STOCK_LENGTH_FIELDS);

export const stockLengthSchema: z.ZodType<StockLengthRow> = z
  .object({ material: choice(SL.material, STOCK_MATERIAL_CHOICES), lengthsFt: numList(SL.lengthsFt) })
  .superRefine((r, ctx) => {
    if (new Set(r.lengthsFt).size !== r.lengthsFt.length)
      ctx.addIssue({ code: "custom", path: ["lengthsFt"], message: "Stock lengths must not repeat a length" });
  });

// ---------------------------------------------------------------------------------------------------

export interface TableSpec<K extends TableKey = TableKey> {
  key: K;
  title: string;
  /** one line saying what the table holds */
  description: string;
  fields: FieldSpec[];
  schema: z.ZodType<TableRowMap[K]>;
  /** the columns a phone shows under each row's key */
  summary: string[];
  /** the natural key of a row within one version (what an import matches rows on) */
  keyOf(row: TableRowMap[K]): string;
  /** where the starter rows come from, for a table whose rows carry no source column */
  tableSource?: string;
}

export const TABLE_SPECS: { [K in TableKey]: TableSpec<K> } = {
  "sawn-sizes": {
    key: "sawn-sizes",
    title: "Sawn sizes",
    description: "Dressed sizes and section properties of sawn lumber",
    fields: SAWN_SIZE_FIELDS,
    schema: sawnSizeSchema,
    summary: ["b_in", "d_in", "Sx_in3", "Ix_in4"],
    keyOf: (r) => r.name,
    tableSource: SAWN_SIZES_SOURCE,
  },
  "sawn-values": {
    key: "sawn-values",
    title: "Sawn design values",
    description: "Reference design values by species, grade and size class",
    fields: SAWN_VALUE_FIELDS,
    schema: sawnValuesSchema,
    summary: ["Fb_psi", "Fv_psi", "E_psi", "Emin_psi"],
    keyOf: (r) => `${r.species}|${r.grade}|${r.sizeClass}|${r.nominalDepth ?? "all"}`,
  },
  "size-factors": {
    key: "size-factors",
    title: "Size factors",
    description: "Size factors CF by table, grades, depth and thickness",
    fields: SIZE_FACTOR_FIELDS,
    schema: sizeFactorSchema,
    summary: ["CF_Fb", "CF_Ft", "CF_Fc"],
    keyOf: (r) => `${r.table}|${r.grades.join(";")}|${r.nominalDepth}|${r.nominalThickness}`,
  },
  engineered: {
    key: "engineered",
    title: "Engineered lumber",
    description: "LVL, PSL and glulam products with their sizes",
    fields: ENGINEERED_FIELDS,
    schema: engineeredSchema,
    summary: ["Fb_psi", "Fv_psi", "E_psi", "depths_in"],
    keyOf: (r) => r.name,
  },
  "i-joists": {
    key: "i-joists",
    title: "Wood I-joists",
    description: "Prefabricated wood I-joists with their published capacities, EI and K",
    fields: I_JOIST_FIELDS,
    schema: iJoistSchema,
    summary: ["d_in", "M_lb_ft", "V_lb", "EI_lb_in2"],
    keyOf: (r) => r.name,
  },
  "steel-shapes": {
    key: "steel-shapes",
    title: "Steel W-shapes",
    description: "W-shape section properties",
    fields: STEEL_SHAPE_FIELDS,
    schema: steelShapeSchema,
    summary: ["W_plf", "d_in", "Zx_in3", "Ix_in4"],
    keyOf: (r) => r.name,
  },
  "steel-grades": {
    key: "steel-grades",
    title: "Steel grades",
    description: "Yield and tensile strength of steel grades",
    fields: STEEL_GRADE_FIELDS,
    schema: steelGradeSchema,
    summary: ["Fy_ksi", "Fu_ksi"],
    keyOf: (r) => r.name,
    tableSource: STEEL_GRADES_SOURCE,
  },
  costs: {
    key: "costs",
    title: "Costs per foot",
    description: "The yard's cost per foot of each stock item, for ranking",
    fields: COST_FIELDS,
    schema: costSchema,
    summary: ["cost_per_ft_usd"],
    keyOf: (r) => r.itemKey,
  },
  "stock-lengths": {
    key: "stock-lengths",
    title: "Stock lengths",
    description: "The lengths the yard sells each material in, for order lists; sawn lumber without a row is 8 to 24 ft in 2 ft steps",
    fields: STOCK_LENGTH_FIELDS,
    schema: stockLengthSchema,
    summary: ["lengths_ft"],
    keyOf: (r) => r.material,
  },
  "cold-formed": {
    key: "cold-formed",
    title: "Cold-formed steel",
    description: "C-sections (S) and tracks (T) by designation: dimensions, Fy and AISI S100-16 section properties",
    fields: CFS_FIELDS,
    schema: cfsSectionSchema,
    summary: ["Fy_ksi", "Sxe_in3", "Ixe_in4", "weight_plf"],
    keyOf: (r) => r.name,
  },
};

export function tableSpec<K extends TableKey>(key: K): TableSpec<K> {
  return TABLE_SPECS[key];
}

// ---------------------------------------------------------------------------------------------------
// Rows as text (CSV records and the edit form) and back

export interface RowIssue {
  /** the column (CSV header / form field name) at fault, or "(row)" */
  column: string;
  message: string;
}

function getPath(row: unknown, path: string): unknown {
  let value: unknown = row;
  for (const part of path.split(".")) {
    if (value === null || typeof value !== "object") return undefined;
    value = (value as Record<string, unknown>)[part];
  }
  return value;
}

function setPath(target: Record<string, unknown>, path: string, value: unknown): void {
  const parts = path.split(".");
  let node = target;
  for (const part of parts.slice(0, -1)) {
    const next = node[part];
    if (next === null || typeof next !== "object") node[part] = {};
    node = node[part] as Record<string, unknown>;
  }
  node[parts[parts.length - 1]] = value;
}

function numberToText(value: number): string {
  return String(value);
}

/** A row as one string per column: numbers as typed, lists joined with ";", absent values blank. */
export function rowToFlat<K extends TableKey>(key: K, row: TableRowMap[K]): FlatRow {
  const flat: FlatRow = {};
  for (const f of TABLE_SPECS[key].fields) {
    const value = getPath(row, f.path);
    if (value === undefined || value === null) flat[f.name] = "";
    else if (Array.isArray(value)) flat[f.name] = value.map((v) => (typeof v === "number" ? numberToText(v) : String(v))).join(";");
    else if (typeof value === "number") flat[f.name] = numberToText(value);
    else flat[f.name] = String(value);
  }
  return flat;
}

// Plain decimal or scientific notation; thousands separators are refused (a "1,5" could mean 1.5 or 15).
export const NUMBER_TEXT = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

function parseNumberText(f: FieldSpec, raw: string): number | RowIssue {
  if (!NUMBER_TEXT.test(raw)) return { column: f.name, message: `${f.label} must be a plain number${f.unit ? ` in ${f.unit}` : ""} (got "${raw}")` };
  return Number(raw);
}

/**
 * Parses one row given as text (a CSV record or the form's values) and checks it against the table's
 * schema. Every issue names its column. Unknown columns are the caller's concern (the CSV header check).
 */
export function parseFlatRow<K extends TableKey>(key: K, flat: FlatRow): { ok: true; row: TableRowMap[K] } | { ok: false; issues: RowIssue[] } {
  const table = TABLE_SPECS[key];
  const draft: Record<string, unknown> = {};
  const issues: RowIssue[] = [];
  for (const f of table.fields) {
    const raw = (flat[f.name] ?? "").trim();
    if (raw === "") {
      if (f.kind === "text" && f.optional) setPath(draft, f.path, "");
      else if (!f.optional) issues.push({ column: f.name, message: `${f.label} is required` });
      continue;
    }
    if (f.kind === "number") {
      const n = parseNumberText(f, raw);
      if (typeof n === "number") setPath(draft, f.path, n);
      else issues.push(n);
    } else if (f.kind === "numberList") {
      const parts = raw
        .split(";")
        .map((p) => p.trim())
        .filter((p) => p !== "");
      const values: number[] = [];
      for (const part of parts) {
        const n = parseNumberText(f, part);
        if (typeof n === "number") values.push(n);
        else issues.push(n);
      }
      setPath(draft, f.path, values);
    } else if (f.kind === "choiceList") {
      setPath(
        draft,
        f.path,
        raw
          .split(";")
          .map((p) => p.trim())
          .filter((p) => p !== ""),
      );
    } else {
      setPath(draft, f.path, raw);
    }
  }
  // The schema runs even when some cells did not read, so every problem of the line is listed at once; a
  // column already reported is not reported again, and no message is repeated.
  const parsed = table.schema.safeParse(draft);
  if (parsed.success && issues.length === 0) return { ok: true, row: parsed.data };
  const byPath = new Map(table.fields.map((f) => [f.path, f.name]));
  const reported = new Set(issues.map((i) => i.column));
  const schemaIssues = parsed.success
    ? []
    : parsed.error.issues.map((issue) => {
        const segments = issue.path.filter((p): p is string => typeof p === "string");
        let column = "(row)";
        for (let n = segments.length; n > 0; n -= 1) {
          const name = byPath.get(segments.slice(0, n).join("."));
          if (name) {
            column = name;
            break;
          }
        }
        if (column === "(row)" && segments[0] === "sizeRule") column = "size_rule";
        return { column, message: issue.message };
      });
  const all = [...issues, ...schemaIssues.filter((i) => !reported.has(i.column))];
  const seen = new Set<string>();
  return { ok: false, issues: all.filter((i) => (seen.has(`${i.column}\u0000${i.message}`) ? false : (seen.add(`${i.column}\u0000${i.message}`), true))) };
}

/** The natural key of a row (TABLE_SPECS[table].keyOf, callable with a table key known only at run time). */
export function rowKey<K extends TableKey>(table: K, row: TableRowMap[K]): string {
  return TABLE_SPECS[table].keyOf(row);
}
