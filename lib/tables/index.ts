import { COLD_FORMED } from "./cold-formed";
import { ENGINEERED } from "./engineered";
import { I_JOISTS } from "./i-joists";
import { SAWN_SIZES } from "./sawn-sizes";
import { beamsStringersCF, SAWN_VALUES, SIZE_FACTORS } from "./sawn-values";
import { STEEL_GRADES, W_SHAPES } from "./steel";
import type {
  CfsSection,
  CostTable,
  EngineeredProduct,
  IJoist,
  MaterialTables,
  SawnDesignValues,
  SawnGrade,
  SawnSize,
  SawnSizeClass,
  SizeFactorRow,
  Species,
  SteelGrade,
  StockLengthRow,
  WShape,
} from "./types";

export type * from "./types";
export { rectangleSection, sawnSection, SAWN_SIZES } from "./sawn-sizes";
export { beamsStringersCF, SAWN_VALUES, SIZE_FACTORS } from "./sawn-values";
export { depthSizeFactor, eminFromE, ENGINEERED, glulamVolumeFactorCV, SUPPLIER_NOTE } from "./engineered";
export { STEEL_GRADES, W_SHAPES } from "./steel";
export { depthWords, I_JOISTS } from "./i-joists";
export { CFS_SOURCE, cfsDimensions, COLD_FORMED, parseDesignation } from "./cold-formed";

export { SAWN_GRADES, SPECIES } from "./types";
export const SAWN_SIZE_CLASSES: readonly SawnSizeClass[] = ["dimension", "beams-stringers"];

/** A member as the design input names it; extra fields (plies, grade of steel) are ignored. */
export type ItemRef =
  | { material: "sawn"; species: Species; grade: SawnGrade; size: string }
  | { material: "engineered"; product: string; width: number; depth: number }
  | { material: "steel"; shape: string }
  | { material: "ijoist"; joist: string }
  | { material: "cfs"; section: string };

/**
 * Key of one stock item in the cost table (cost per foot of one piece or ply).
 * Examples: "sawn|Douglas Fir-Larch|No.2|2x10", "engineered|LVL 1.9E|1.75x11.875", "steel|W8x18".
 */
export function itemKey(item: ItemRef): string {
  switch (item.material) {
    case "sawn":
      return `sawn|${item.species}|${item.grade}|${normalizeSawnSize(item.size)}`;
    case "engineered":
      return `engineered|${item.product}|${item.width}x${item.depth}`;
    case "steel":
      return `steel|${normalizeShape(item.shape)}`;
    case "ijoist":
      return `ijoist|${item.joist}`;
    case "cfs":
      return `cfs|${item.section.trim().toUpperCase()}`;
  }
}

/** Cost per foot from the table's cost column, or undefined where the table has none. */
export function costPerFoot(tables: MaterialTables, item: ItemRef): number | undefined {
  return tables.costs[itemKey(item)];
}

/** A lookup the tables cannot answer; the message lists what they hold. */
export class TableLookupError extends Error {
  /** the input field at fault, e.g. "member.size" */
  readonly field: string;
  readonly available: string[];

  constructor(field: string, message: string, available: string[]) {
    super(`${message}; the tables hold ${available.length > 0 ? available.join(", ") : "none"}`);
    this.name = "TableLookupError";
    this.field = field;
    this.available = available;
  }
}

function unique(values: string[]): string[] {
  return [...new Set(values)];
}

/** "2X10", " 2x10 ", "2×10" → "2x10" */
function normalizeSawnSize(name: string): string {
  return name.trim().toLowerCase().replace(/×/g, "x").replace(/\s+/g, "");
}

/** "w8x18", "W8X18", "W 8 x 18" → "W8x18" */
function normalizeShape(name: string): string {
  return name.trim().toUpperCase().replace(/×/g, "X").replace(/\s+/g, "").replace("X", "x");
}

export function findSawnSize(tables: MaterialTables, name: string): SawnSize {
  const wanted = normalizeSawnSize(name);
  const size = tables.sawnSizes.find((s) => s.name === wanted);
  if (!size) {
    throw new TableLookupError(
      "member.size",
      `unknown size "${name}"`,
      tables.sawnSizes.map((s) => s.name),
    );
  }
  return size;
}

/**
 * Reference design values for a species, grade and size class. Where the table gives values by
 * width (Southern Pine, NDS Supplement Table 4B) the nominal depth picks the row: the narrowest
 * width class that holds it (a 5 in depth reads the 5"–6" row), and depths past the widest row
 * read the widest (Table 4B: wider than 12 in takes the 12 in values, with CF 0.9 from
 * sizeFactorFor).
 */
export function findSawnValues(tables: MaterialTables, species: Species, grade: SawnGrade, sizeClass: SawnSizeClass, nominalDepth?: number): SawnDesignValues {
  const ofSpecies = tables.sawnValues.filter((v) => v.species === species);
  if (ofSpecies.length === 0) {
    throw new TableLookupError("member.species", `unknown species "${species}"`, unique(tables.sawnValues.map((v) => v.species)));
  }
  const ofClass = ofSpecies.filter((v) => v.sizeClass === sizeClass);
  if (ofClass.length === 0) {
    throw new TableLookupError("member.size", `no ${sizeClass} values for ${species}`, unique(ofSpecies.map((v) => `${v.sizeClass} sizes`)));
  }
  const rows = ofClass.filter((v) => v.grade === grade);
  if (rows.length === 0) {
    throw new TableLookupError("member.grade", `no grade "${grade}" for ${species} ${sizeClass}`, unique(ofClass.map((v) => v.grade)));
  }
  const byDepth = rows.filter((v) => v.nominalDepth !== undefined).sort((a, b) => (a.nominalDepth ?? 0) - (b.nominalDepth ?? 0));
  if (byDepth.length === 0) return rows[0];
  if (nominalDepth === undefined) {
    throw new TableLookupError(
      "member.size",
      `${species} ${grade} ${sizeClass} values depend on the depth; give the nominal depth`,
      byDepth.map((v) => `${v.nominalDepth} in`),
    );
  }
  return byDepth.find((v) => (v.nominalDepth ?? 0) >= nominalDepth) ?? byDepth[byDepth.length - 1];
}

/** Reference design values for a named size, e.g. ("Southern Pine", "No.2", "2x10"). */
export function sawnValuesForSize(tables: MaterialTables, species: Species, grade: SawnGrade, sizeName: string): SawnDesignValues {
  const size = findSawnSize(tables, sizeName);
  return findSawnValues(tables, species, grade, size.sizeClass, size.nominalDepth);
}

export interface SizeFactors {
  CF_Fb: number;
  CF_Ft: number;
  CF_Fc: number;
  table: SizeFactorRow["table"];
  source: string;
}

/**
 * Size factors CF for Fb, Ft and Fc of a sawn size:
 * - dimension lumber of Douglas Fir-Larch, Hem-Fir, Spruce-Pine-Fir: NDS Supplement Table 4A,
 *   by nominal depth and, for Fb, thickness (2" & 3" vs 4");
 * - Southern Pine dimension lumber: Table 4B footnote (size already in the values; 1.1 on Fb
 *   for 4" thick 8" and wider; 0.9 wider than 12");
 * - beams and stringers: Table 4D, CF = (12/d)^(1/9) on Fb for d > 12 in, else 1.0.
 * Example: Douglas Fir-Larch No.2 2x10 → CF_Fb 1.1, CF_Ft 1.1, CF_Fc 1.0.
 */
export function sizeFactorFor(tables: MaterialTables, species: Species, grade: SawnGrade, size: string | SawnSize): SizeFactors {
  const s = typeof size === "string" ? findSawnSize(tables, size) : size;
  const table: SizeFactorRow["table"] = s.sizeClass === "beams-stringers" ? "4D" : species === "Southern Pine" ? "4B" : "4A";
  const rows = tables.sizeFactors.filter((r) => r.table === table && r.grades.includes(grade));

  if (table === "4D") {
    const r = rows.find((row) => row.nominalDepth === s.nominalDepth);
    if (r) return { CF_Fb: r.CF_Fb, CF_Ft: r.CF_Ft, CF_Fc: r.CF_Fc, table, source: r.source };
    return {
      CF_Fb: beamsStringersCF(s.d),
      CF_Ft: 1.0,
      CF_Fc: 1.0,
      table,
      source: "NDS Supplement 2018, Table 4D size factor CF = (12/d)^(1/9) for d > 12 in",
    };
  }

  const thickness = s.nominalThickness <= 3 ? 2 : 4;
  const fitsThickness = rows.filter((r) => r.nominalThickness === 0 || r.nominalThickness === thickness);
  const depths = unique(fitsThickness.map((r) => String(r.nominalDepth)))
    .map(Number)
    .sort((a, b) => a - b);
  const depth = depths.find((d) => d >= s.nominalDepth) ?? depths[depths.length - 1];
  const r = fitsThickness.find((row) => row.nominalDepth === depth);
  if (!r) {
    throw new TableLookupError(
      "member.size",
      `no Table ${table} size factor for ${grade} ${s.name}`,
      unique(tables.sizeFactors.filter((row) => row.table === table).map((row) => `${row.nominalThickness}x${row.nominalDepth}`)),
    );
  }
  return { CF_Fb: r.CF_Fb, CF_Ft: r.CF_Ft, CF_Fc: r.CF_Fc, table, source: r.source };
}

export function findEngineered(tables: MaterialTables, name: string): EngineeredProduct {
  const wanted = name.trim().toLowerCase();
  const product = tables.engineered.find((p) => p.name.toLowerCase() === wanted);
  if (!product) {
    throw new TableLookupError(
      "member.product",
      `unknown engineered product "${name}"`,
      tables.engineered.map((p) => p.name),
    );
  }
  return product;
}

/** "pri-40 11-7/8", "PRI-40 11-7/8 " → the I-joist row; an unknown name lists what the tables hold. */
export function findIJoist(tables: MaterialTables, name: string): IJoist {
  const norm = (v: string) => v.trim().toLowerCase().replace(/\s+/g, " ");
  const joist = tables.iJoists.find((j) => norm(j.name) === norm(name));
  if (!joist)
    throw new TableLookupError(
      "member.joist",
      `unknown I-joist "${name}"`,
      tables.iJoists.map((j) => j.name),
    );
  return joist;
}

/** "800s162-54", " 800S162-54 " → the cold-formed section row; an unknown name lists what the tables hold. */
export function findCfsSection(tables: MaterialTables, name: string, field = "member.section"): CfsSection {
  const wanted = name.trim().toUpperCase();
  const rows = tables.coldFormed ?? [];
  const section = rows.find((s) => s.name.toUpperCase() === wanted);
  if (!section)
    throw new TableLookupError(
      field,
      `unknown cold-formed section "${name}"`,
      rows.filter((s) => s.style === "S").map((s) => s.name),
    );
  return section;
}

/** Throws unless the product is made in this width (one ply) and depth, in inches. */
export function checkEngineeredSize(product: EngineeredProduct, widthIn: number, depthIn: number): void {
  const near = (a: number, b: number) => Math.abs(a - b) < 1e-6;
  if (!product.widths.some((w) => near(w, widthIn))) {
    throw new TableLookupError(
      "member.width",
      `${product.name} is not made ${widthIn} in wide`,
      product.widths.map((w) => `${w} in`),
    );
  }
  if (!product.depths.some((d) => near(d, depthIn))) {
    throw new TableLookupError(
      "member.depth",
      `${product.name} is not made ${depthIn} in deep`,
      product.depths.map((d) => `${d} in`),
    );
  }
}

export function findWShape(tables: MaterialTables, name: string): WShape {
  const wanted = normalizeShape(name);
  const shape = tables.steel.find((s) => s.name === wanted);
  if (!shape) {
    throw new TableLookupError(
      "member.shape",
      `unknown shape "${name}"`,
      tables.steel.map((s) => s.name),
    );
  }
  return shape;
}

export function findSteelGrade(tables: MaterialTables, name: string): SteelGrade {
  const wanted = name.trim().toUpperCase();
  const grade = tables.steelGrades.find((g) => g.name.toUpperCase() === wanted);
  if (!grade) {
    throw new TableLookupError(
      "member.grade",
      `unknown steel grade "${name}"`,
      tables.steelGrades.map((g) => g.name),
    );
  }
  return grade;
}

// Demo prices, invented: not any yard's prices. Sawn lumber by board foot (nominal
// thickness × nominal depth / 12 per foot), steel by weight, engineered lumber by section area.
const DEMO_SAWN_PER_BOARD_FOOT: Record<Species, number> = {
  "Douglas Fir-Larch": 1.1,
  "Hem-Fir": 1.0,
  "Spruce-Pine-Fir": 0.95,
  "Southern Pine": 1.05,
};
const DEMO_GRADE_MULTIPLIER: Record<SawnGrade, number> = { "Select Structural": 1.35, "No.1": 1.1, "No.2": 1.0, "No.3": 0.8 };
const DEMO_TIMBER_MULTIPLIER = 1.6;
const DEMO_STEEL_PER_LB = 1.35;
const DEMO_ENGINEERED_PER_SQ_IN: Record<EngineeredProduct["kind"], number> = { LVL: 0.3, PSL: 0.32, glulam: 0.28 };
/** invented demo price of an I-joist per foot and inch of depth (stiffer series cost more) */
const DEMO_IJOIST_PER_FT_PER_IN = 0.22;
/** invented demo price of cold-formed steel framing per pound (light gauge costs more per pound than W-shapes) */
const DEMO_CFS_PER_LB = 1.6;

const cents = (x: number) => Math.round(x * 100) / 100;

function demoCosts(): CostTable {
  const costs: CostTable = {};
  for (const v of SAWN_VALUES) {
    for (const size of SAWN_SIZES.filter((s) => s.sizeClass === v.sizeClass)) {
      const key = itemKey({ material: "sawn", species: v.species, grade: v.grade, size: size.name });
      const boardFeetPerFoot = (size.nominalThickness * size.nominalDepth) / 12;
      const timber = size.sizeClass === "beams-stringers" ? DEMO_TIMBER_MULTIPLIER : 1;
      costs[key] = cents(boardFeetPerFoot * DEMO_SAWN_PER_BOARD_FOOT[v.species] * DEMO_GRADE_MULTIPLIER[v.grade] * timber);
    }
  }
  for (const p of ENGINEERED) {
    for (const width of p.widths) {
      for (const depth of p.depths) {
        costs[itemKey({ material: "engineered", product: p.name, width, depth })] = cents(width * depth * DEMO_ENGINEERED_PER_SQ_IN[p.kind]);
      }
    }
  }
  for (const s of W_SHAPES) {
    costs[itemKey({ material: "steel", shape: s.name })] = cents(s.W * DEMO_STEEL_PER_LB);
  }
  for (const j of I_JOISTS) {
    costs[itemKey({ material: "ijoist", joist: j.name })] = cents(DEMO_IJOIST_PER_FT_PER_IN * j.d * (1 + j.EI / 2e9));
  }
  for (const s of COLD_FORMED) {
    costs[itemKey({ material: "cfs", section: s.name })] = cents(s.weightPlf * DEMO_CFS_PER_LB);
  }
  return costs;
}

/**
 * The starter tables that ship with the code: read by the CLI without a database and loaded by
 * the seeders. Sources are named beside each block of data in the modules above.
 */
/**
 * Sawn lumber stocked 8 to 24 ft in 2 ft steps (common practice at lumber yards). Engineered lumber and
 * steel have no starter row: they are ordered cut to length until the team adds the yard's lengths.
 */
export const STARTER_STOCK_LENGTHS: StockLengthRow[] = [{ material: "sawn", lengthsFt: [8, 10, 12, 14, 16, 18, 20, 22, 24] }];

export const STARTER_TABLES: MaterialTables = {
  version: "starter-2026.3",
  sawnSizes: SAWN_SIZES,
  sawnValues: SAWN_VALUES,
  sizeFactors: SIZE_FACTORS,
  engineered: ENGINEERED,
  steel: W_SHAPES,
  steelGrades: STEEL_GRADES,
  iJoists: I_JOISTS,
  costs: demoCosts(),
  stockLengths: STARTER_STOCK_LENGTHS,
  coldFormed: COLD_FORMED,
};
