/**
 * Members as the design checks see them: section, reference values and the size factor, read from
 * the material tables the caller passes (starter data in the CLI, the published version in the app).
 */
import {
  checkEngineeredSize,
  costPerFoot,
  depthSizeFactor,
  findEngineered,
  findCfsSection,
  findIJoist,
  findSawnSize,
  findSawnValues,
  findSteelGrade,
  findWShape,
  sizeFactorFor,
  TableLookupError,
  type ItemRef,
} from "@/lib/tables";
import type { MaterialTables, SawnGrade, Species, SteelGrade, WShape } from "@/lib/tables/types";
import { woodDensity, type WetServiceTable } from "../nds/nds-2018";
import { DesignInputError } from "./errors";
import type { CfsMember } from "./cold-formed";
import type { IJoistMember } from "./i-joist";
import type { MemberSpec } from "./schema";

/** Moisture content assumed for the weight of sawn lumber, percent (NDS: dry service is 19 % or less). */
export const SAWN_WEIGHT_MOISTURE_PCT = 19;

export interface WoodMember {
  kind: "wood";
  spec: MemberSpec;
  label: string;
  material: "sawn" | "engineered";
  plies: number;
  /** one ply's width, in */
  plyWidth: number;
  /** total width of all plies, in */
  b: number;
  d: number;
  A: number;
  S: number;
  I: number;
  weightPlf: number;
  /** reference design values, psi */
  Fb: number;
  Fv: number;
  FcPerp: number;
  E: number;
  Emin: number;
  /** size factor on Fb (sawn CF, LVL/PSL depth factor); 1.0 for glulam (see volumeX) */
  CF: number;
  /** glulam volume factor exponent x (NDS 2018 Eq. 5.3-1), absent otherwise */
  volumeX?: number;
  /** glulam Fbx− (tension zone stressed in compression: moment that hogs over a support or on an overhang), psi; absent: Fb both ways */
  FbNeg?: number;
  wetTable: WetServiceTable | "scl";
  /** dimension lumber 2–4 in thick: Ci and Cr apply */
  dimensionLumber: boolean;
  nominalThickness: number;
  nominalDepth: number;
  sources: string[];
  note?: string;
  costPerFoot?: number;
}

export interface SteelMember {
  kind: "steel";
  spec: MemberSpec;
  label: string;
  shape: WShape;
  grade: SteelGrade;
  d: number;
  I: number;
  weightPlf: number;
  sources: string[];
  costPerFoot?: number;
}

export type DesignMember = WoodMember | SteelMember | IJoistMember | CfsMember;

function lookup<T>(fn: () => T, pathPrefix = ""): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof TableLookupError) throw new DesignInputError([{ path: pathPrefix + err.field, message: err.message }]);
    throw err;
  }
}

const pliesLabel = (n: number) => (n > 1 ? `${n}-ply ` : "");

/** Resolves a member named in the input against the tables; unknown names list what the tables hold. */
export function resolveMember(spec: MemberSpec, tables: MaterialTables): DesignMember {
  return lookup(() => resolveMemberUnchecked(spec, tables));
}

export function resolveMemberUnchecked(spec: MemberSpec, tables: MaterialTables): DesignMember {
  if (spec.material === "steel") {
    const shape = findWShape(tables, spec.shape);
    const grade = findSteelGrade(tables, spec.grade);
    return {
      kind: "steel",
      spec: { ...spec, shape: shape.name, grade: grade.name },
      label: `${shape.name} ${grade.name}`,
      shape,
      grade,
      d: shape.d,
      I: shape.Ix,
      weightPlf: shape.W,
      sources: [shape.source],
      costPerFoot: costPerFoot(tables, { material: "steel", shape: shape.name }),
    };
  }
  if (spec.material === "ijoist") {
    const joist = findIJoist(tables, spec.joist);
    return {
      kind: "ijoist",
      spec: { material: "ijoist", joist: joist.name, stiffeners: spec.stiffeners },
      label: `${joist.name} I-joist${spec.stiffeners ? " with web stiffeners" : ""}`,
      joist,
      stiffeners: spec.stiffeners,
      d: joist.d,
      weightPlf: joist.weightPlf,
      sources: [joist.source],
      costPerFoot: costPerFoot(tables, { material: "ijoist", joist: joist.name }),
    };
  }
  if (spec.material === "cfs") {
    const section = findCfsSection(tables, spec.section);
    if (section.style !== "S")
      throw new DesignInputError([{ path: "member.section", message: `${section.name} is a track: joists, rafters and headers are C-sections (S)` }]);
    const pieces = spec.assembly === "single" ? 1 : 2;
    const unit = costPerFoot(tables, { material: "cfs", section: section.name });
    return {
      kind: "cfs",
      spec: { material: "cfs", section: section.name, assembly: spec.assembly, ...(spec.stiffeners === undefined ? {} : { stiffeners: spec.stiffeners }) },
      label: cfsLabel(section.name, spec.assembly),
      section,
      assembly: spec.assembly,
      stiffeners: spec.stiffeners,
      pieces,
      d: section.depth,
      I: section.Ix * pieces,
      weightPlf: section.weightPlf * pieces,
      sources: [section.source, AISI_SOURCE],
      costPerFoot: unit === undefined ? undefined : unit * pieces,
    };
  }
  if (spec.material === "sawn") {
    const species = checkSpecies(tables, spec.species);
    const grade = checkGrade(tables, species, spec.grade);
    const size = findSawnSize(tables, spec.size);
    const values = findSawnValues(tables, species, grade, size.sizeClass, size.nominalDepth);
    const cf = sizeFactorFor(tables, species, grade, size);
    const n = spec.plies;
    if (n > 1 && size.sizeClass !== "dimension") {
      throw new DesignInputError([
        { path: "member.plies", message: `built-up members are made of dimension lumber (2x and 4x); ${size.name} is a timber, use 1 ply` },
      ]);
    }
    const weightPlf = (woodDensity(values.G, SAWN_WEIGHT_MOISTURE_PCT) * size.A * n) / 144;
    const item: ItemRef = { material: "sawn", species, grade, size: size.name };
    const unitCost = costPerFoot(tables, item);
    return {
      kind: "wood",
      spec: { material: "sawn", species, grade, size: size.name, plies: n },
      label: `${pliesLabel(n)}${size.name} ${species} ${grade}`,
      material: "sawn",
      plies: n,
      plyWidth: size.b,
      b: size.b * n,
      d: size.d,
      A: size.A * n,
      S: size.Sx * n,
      I: size.Ix * n,
      weightPlf,
      Fb: values.Fb,
      Fv: values.Fv,
      FcPerp: values.FcPerp,
      E: values.E,
      Emin: values.Emin,
      CF: cf.CF_Fb,
      wetTable: size.sizeClass === "beams-stringers" ? "4D" : species === "Southern Pine" ? "4B" : "4A",
      dimensionLumber: size.sizeClass === "dimension",
      nominalThickness: size.nominalThickness,
      nominalDepth: size.nominalDepth,
      sources: [values.source, cf.source, "NDS Supplement 2018, Table 1B (section)"],
      costPerFoot: unitCost === undefined ? undefined : unitCost * n,
    };
  }
  const product = findEngineered(tables, spec.product);
  const width = spec.width ?? product.widths[0];
  checkEngineeredSize(product, width, spec.depth);
  const n = spec.plies;
  if (n > 1 && product.kind !== "LVL") {
    throw new DesignInputError([{ path: "member.plies", message: `${product.kind} is used as one piece here; multi-ply members are LVL or sawn lumber` }]);
  }
  const b = width * n;
  const d = spec.depth;
  const CF = product.sizeRule.type === "depth" ? depthSizeFactor(product.sizeRule, d) : 1.0;
  const unitCost = costPerFoot(tables, { material: "engineered", product: product.name, width, depth: d });
  return {
    kind: "wood",
    spec: { material: "engineered", product: product.name, width, depth: d, plies: n },
    label: `${pliesLabel(n)}${fmtIn(width)} x ${fmtIn(d)} ${product.name}`,
    material: "engineered",
    plies: n,
    plyWidth: width,
    b,
    d,
    A: b * d,
    S: (b * d * d) / 6,
    I: (b * d * d * d) / 12,
    weightPlf: (product.density * b * d) / 144,
    Fb: product.Fb,
    Fv: product.Fv,
    FcPerp: product.FcPerp,
    E: product.E,
    Emin: product.Emin,
    CF,
    volumeX: product.sizeRule.type === "volume" ? product.sizeRule.x : undefined,
    ...(product.FbNeg !== undefined ? { FbNeg: product.FbNeg } : {}),
    wetTable: product.kind === "glulam" ? "glulam" : "scl",
    dimensionLumber: false,
    nominalThickness: b,
    nominalDepth: d,
    sources: [product.source],
    note: product.note,
    costPerFoot: unitCost === undefined ? undefined : unitCost * n,
  };
}

/**
 * The same sawn or LVL member with another number of plies: section, weight and cost scale with
 * the plies (saves the table lookups when a search tries 1 to 4 plies of one size).
 */
export function withPlies(m: WoodMember, plies: number): WoodMember {
  const k = plies / m.plies;
  const name = m.label.replace(/^\d+-ply /, "");
  return {
    ...m,
    spec: { ...m.spec, plies } as MemberSpec,
    label: `${pliesLabel(plies)}${name}`,
    plies,
    b: m.b * k,
    A: m.A * k,
    S: m.S * k,
    I: m.I * k,
    weightPlf: m.weightPlf * k,
    costPerFoot: m.costPerFoot === undefined ? undefined : m.costPerFoot * k,
  };
}

/** The checks' standard, as the sheet's sources list it. */
export const AISI_SOURCE =
  "AISI S100-16 (North American Specification for the Design of Cold-Formed Steel Structural Members, 2016); web crippling Table G5-2 checked against a published copy (runtosolve/AISIS100.jl); bearing stiffener Pn = 0.7(Pwc + Ae Fy) ≥ Pwc, φ = 0.90 read in a published copy of AISI S100 as adopted by NSR-10 Title F (§F.4.3.3.7.2), its Ω = 1.70 from memory — verify";

/** "800S162-54", "2-800S162-54 back-to-back header", "2-800S162-54 box header". */
export function cfsLabel(section: string, assembly: "single" | "back-to-back" | "box"): string {
  return assembly === "single" ? section : `2-${section} ${assembly === "box" ? "box" : "back-to-back"} header`;
}

function fmtIn(v: number): string {
  return String(Math.round(v * 1000) / 1000);
}

function checkSpecies(tables: MaterialTables, name: string): Species {
  const held = [...new Set(tables.sawnValues.map((v) => v.species))];
  const hit = held.find((s) => s.toLowerCase() === name.trim().toLowerCase());
  if (!hit) throw new TableLookupError("member.species", `unknown species "${name}"`, held);
  return hit;
}

function checkGrade(tables: MaterialTables, species: Species, name: string): SawnGrade {
  const held = [...new Set(tables.sawnValues.filter((v) => v.species === species).map((v) => v.grade))];
  const norm = (s: string) =>
    s
      .toLowerCase()
      .replace(/[\s.#]/g, "")
      .replace(/^no/, "");
  const hit = held.find((g) => norm(g) === norm(name));
  if (!hit) throw new TableLookupError("member.grade", `unknown grade "${name}" for ${species}`, held);
  return hit;
}
