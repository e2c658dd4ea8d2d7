/**
 * A job sheet's snapshot: the job's members worked out once, when the sheet is saved, and kept as JSON.
 * Reprinting (the page, the PDF) reads only this: no solver, no tables, no member rows. So a sheet prints
 * the same numbers after the tables are edited or the member is changed. Pure: no database, no React.
 */
import { CAUTION, CAUTION_TITLE, notCheckedFor } from "@/lib/caution";
import { formatFeetInches, formatInches } from "@/lib/flow/length";
import { conditionQuestions } from "@/lib/flow/conditions";
import { checkRequest } from "@/lib/flow/request";
import { KIND_LABELS, mainSpanFt, sortedSupports, SUPPORT_WORDS, wallOf, type FlowState, type MemberKind } from "@/lib/flow/state";
import { answerFacts, jackStudsUnder } from "@/lib/flow/summary";
import { EXPOSURE_CE, EXPOSURE_WORDS, THERMAL_CT, THERMAL_WORDS } from "@/lib/solver/asce7/snow";
import { LOAD_STANDARD_WORDS } from "@/lib/solver/asce7/standard";
import type { Segment } from "@/lib/solver/beam";
import { ratioPercent } from "@/lib/sheets/format";
import type { SupportType } from "@/lib/solver/types";
import { checkMember, type CheckOutput } from "@/lib/solver/design/check";
import type { DesignLoad, MemberSpec } from "@/lib/solver/design/schema";
import type { DesignCheck, SupportReaction } from "@/lib/solver/design/types";
import { distinctSources } from "@/lib/tables/citations";
import type { MaterialTables } from "@/lib/tables/types";

export const SNAPSHOT_FORMAT = 1;

export interface SheetExtreme {
  x: number;
  value: number;
  label: string;
}

export interface SheetDiagram {
  quantity: "V" | "M" | "deflection";
  title: string;
  unit: string;
  /** the load combination drawn, e.g. "D+L" */
  combination: string;
  segments: Segment[];
  extremes: SheetExtreme[];
}

export type SheetCheck = Omit<DesignCheck, "combination"> & { combination: string | null };

export interface SheetMember {
  id: string;
  label: string;
  kind: MemberKind;
  kindLabel: string;
  /** "3-ply 2x12 No.2 — 2 jack studs each end" */
  headline: string;
  memberLabel: string;
  pass: boolean;
  governing: string | null;
  ratio: number;
  spanFt: number;
  lengthFt: number;
  supports: { x: number; type: SupportType }[];
  /** the inputs in words, in order: [what, value] */
  inputs: [string, string][];
  /** the inputs as the flow holds them (for reference; never recomputed) */
  flowState: FlowState;
  loads: CheckOutput["loads"];
  /** the checks, each combination by its name */
  checks: SheetCheck[];
  reactions: SupportReaction[];
  /** adjustment factors and design values, [symbol, value] */
  factors: [string, string][];
  limits: CheckOutput["limits"];
  assumptions: string[];
  /** the load basis and what the crew must know, as the answer screen and crew link say them (absent on sheets saved before) */
  facts?: string[];
  diagrams: SheetDiagram[];
  /** set when the member's saved answer came from other tables than this sheet's */
  note: string | null;
  /** where the member's design values come from, each as its table row cites it (absent on sheets saved before) */
  sources?: string[];
}

/** A post or footing group on the job's load path, as the sheet lists it (absent on sheets saved before). */
export interface SheetLoadPathRow {
  id: string;
  label: string;
  kindLabel: string;
  headline: string;
  pass: boolean;
  ratio: number;
  facts: string[];
  problems: string[];
}

export interface SheetSkipped {
  id: string;
  label: string;
  reason: string;
}

export interface SheetSnapshot {
  format: typeof SNAPSHOT_FORMAT;
  /** ISO 8601 */
  savedAt: string;
  job: { id: string; name: string; siteAddress: string; notes: string };
  preparedBy: { name: string; company: string | null };
  /** the tables version's id (a reprint could load it with getTablesVersion; a sheet never needs to) */
  tablesVersion: string;
  /** the same version as people read it, e.g. "version 3, published 1 Dec 2026" */
  tablesLabel: string;
  method: "asd";
  members: SheetMember[];
  skipped: SheetSkipped[];
  /** posts and footings, worked out on the job's load path */
  loadPath?: SheetLoadPathRow[];
  caution: { title: string; text: string; notChecked: string[] };
}

/** One member as it comes from the job: its inputs and the size chosen for it (null: not sized yet). */
export interface SheetMemberSource {
  id: string;
  label: string;
  kind: MemberKind;
  flowState: FlowState;
  chosenMember: MemberSpec | null;
  /** tables version of the answer saved with the member, if any */
  savedTables: string | null;
  /** the answer saved with the member (Member.resultSummary), to say on the sheet when it has changed since */
  savedAnswer?: { headline: string; ratio: number } | null;
  /** loads other members of the job put on this one (lib/jobs/load-path.ts), and their words */
  carried?: DesignLoad[];
  carriedWords?: string[];
}

export interface SheetSource {
  job: { id: string; name: string; siteAddress: string; notes: string };
  preparedBy: { name: string; company: string | null };
  members: SheetMemberSource[];
  /** posts and footings as the job's load path worked them out */
  loadPath?: SheetLoadPathRow[];
  tables: MaterialTables;
  /** how the tables version reads on the sheet; its id when not given */
  tablesLabel?: string;
  now: Date;
}

function fmtNumber(v: number): string {
  if (!Number.isFinite(v)) return "—";
  const abs = Math.abs(v);
  const digits = abs >= 1000 ? 0 : abs >= 100 ? 1 : abs >= 1 ? 2 : 3;
  return v.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: 0 });
}

function widthWords(state: FlowState): string {
  return state.width.mode === "spacing" ? `${fmtNumber(state.width.spacingIn)} in on center` : `${fmtNumber(state.width.tributaryFt)} ft tributary width`;
}

function materialWords(state: FlowState): string {
  const m = state.material;
  switch (m.family) {
    case "any":
      return "Any material (best found)";
    case "sawn":
      return `Sawn lumber, ${m.species} ${m.grade}`;
    case "built-up":
      return `Built-up plies, ${m.species} ${m.grade}${m.plies > 0 ? `, ${m.plies} plies` : ""}`;
    case "engineered":
      return m.product ? `Engineered, ${m.product}` : "Engineered lumber (any product)";
    case "ijoist":
      return m.product ? `Wood I-joists, ${m.product}` : "Wood I-joists (any series)";
    case "steel":
      return "Steel W-shape, A992";
    case "cfs":
      return Number(m.product) > 0 ? `Cold-formed steel C-sections, ${m.product} in flanges` : "Cold-formed steel C-sections (any flange)";
  }
}

function inputRows(state: FlowState): [string, string][] {
  const supports = sortedSupports(state.supports)
    .map((s) => `${SUPPORT_WORDS[s.type].short} at ${formatFeetInches(s.x)}`)
    .join(", ");
  const rows: [string, string][] = [
    ["Member", KIND_LABELS[state.kind]],
    ["Length", formatFeetInches(state.lengthFt)],
    ["Supports", supports],
    [state.width.mode === "spacing" ? "Spacing" : "Tributary width", widthWords(state)],
  ];
  for (const a of state.areaLoads) if (a.psf > 0) rows.push([`Area load (${a.case})`, `${a.label || a.preset}: ${fmtNumber(a.psf)} psf`]);
  if (state.snow.on && state.snow.groundPsf > 0) {
    const exposure = EXPOSURE_WORDS[state.snow.exposure].toLowerCase();
    const heat = THERMAL_WORDS[state.snow.thermal].toLowerCase();
    rows.push([
      "Snow (S)",
      `ground snow ${fmtNumber(state.snow.groundPsf)} psf; roof ${exposure} (Ce ${EXPOSURE_CE[state.snow.exposure]}); building ${heat} (Ct ${THERMAL_CT[state.snow.thermal]})`,
    ]);
  }
  if (state.snow.on || [...state.pointLoads, ...state.lineLoads, ...state.areaLoads].some((l) => l.case === "S")) {
    rows.push(["Ground snow map", LOAD_STANDARD_WORDS[state.loadStandard ?? "ASCE 7-16"]]);
  }
  if (state.kind === "header" && state.roughOpeningFt) rows.push(["Rough opening", formatFeetInches(state.roughOpeningFt)]);
  const wall = wallOf(state);
  if (wall) rows.push(["Wall framing", `${wall} wall`]);
  if (conditionQuestions(state).incised !== "no" && (state.incised === true || state.incised === false))
    rows.push(["Treated lumber incised", state.incised ? "yes (as given)" : "no (as given)"]);
  for (const p of state.pointLoads) rows.push([`Point load (${p.case})`, `${p.label ? `${p.label}: ` : ""}${fmtNumber(p.P)} lb at ${formatFeetInches(p.x)}`]);
  for (const l of state.lineLoads) {
    rows.push([`Line load (${l.case})`, `${l.label ? `${l.label}: ` : ""}${fmtNumber(l.w)} plf from ${formatFeetInches(l.from)} to ${formatFeetInches(l.to)}`]);
  }
  rows.push(
    ["Material", materialWords(state)],
    ["Bearing length", formatInches(state.bearingIn)],
    ["Deflection limits", `live L/${state.limits.live}, total L/${state.limits.total}`],
    ...serviceRows(state),
    ["Top edge braced every", state.unbracedFt === 0 ? "0 (braced along its length)" : formatFeetInches(state.unbracedFt)],
    ["Bottom edge braced", state.bottomBraced ? "along its length (ceiling fastened to it)" : "at the supports only"],
    ["Own weight counted", state.selfWeight ? "yes" : "no"],
  );
  return rows;
}

/** Wet service and repetitive members, only where they apply to the material (lib/flow/conditions.ts). */
function serviceRows(state: FlowState): [string, string][] {
  const asked = conditionQuestions(state);
  const rows: [string, string][] = [];
  if (asked.wet !== "no") rows.push([asked.wet === "wood" ? "Service (wood)" : "Service", state.wet ? "wet (exposed)" : "dry"]);
  if (asked.repetitive !== "no")
    rows.push([asked.repetitive === "wood" ? "Repetitive members (sawn lumber)" : "Repetitive members", state.repetitive ? "yes" : "no"]);
  return rows;
}

const FACTOR_NAMES: Record<string, string> = {
  FcPerp: "Fc⊥",
  FcPerpPrime: "Fc⊥′",
  shearLoadsNearSupportsIgnored: "Loads within d of supports left out of shear",
  CrBasis: "Cr, why",
  incised: "Incised (Ci)",
  incisedBasis: "Incised, why",
  longTermDeflection: "Long-term deflection, in (Kcr × ΔD + Δrest)",
  flexureLimitState: "Flexure limit state",
  shearClause: "Shear clause",
  omegaB: "Ωb",
  phiB: "φb",
  omegaV: "Ωv",
  phiV: "φv",
  lambda: "λ",
  phi: "φ",
  Fy: "Fy, ksi",
  Mp: "Mp, kip-ft",
  Mn: "Mn, kip-ft",
  Vn: "Vn, kip",
  Lp: "Lp, ft",
  Lr: "Lr, ft",
  Lb: "Lb, ft",
  EKsi: "E, ksi",
  CbLtb: "Cb, moment gradient",
  Fn: "Fn, ksi",
  Se: "Se, in³",
  Ieff: "I effective at service, in⁴",
  bearingStiffeners: "Bearing stiffeners at supports",
  pieces: "C-sections",
  standard: "Standard",
};

function factorName(key: string): string {
  if (key in FACTOR_NAMES) return FACTOR_NAMES[key];
  if (key.endsWith("Prime")) return `${factorName(key.slice(0, -5))}′`;
  return key;
}

/** Factor objects flattened to [symbol, value] rows ("CM.Fb" → "CM (Fb)", "FbPrime" → "Fb′"). */
export function factorRows(factors: object): [string, string][] {
  const rows: [string, string][] = [];
  const walk = (prefix: string, key: string, value: unknown) => {
    if (value === null || value === undefined || key === "method") return;
    const name = prefix ? `${prefix} (${factorName(key)})` : factorName(key);
    if (typeof value === "object") {
      for (const [k, v] of Object.entries(value)) walk(prefix ? name : factorName(key), k, v);
      return;
    }
    if (typeof value === "number") rows.push([name, fmtNumber(value)]);
    else if (typeof value === "boolean") rows.push([name, value ? "yes" : "no"]);
    else rows.push([name, String(value)]);
  };
  for (const [k, v] of Object.entries(factors)) walk("", k, v);
  return rows;
}

/** The diagrams the check carries, as the sheet keeps them: shear and moment under the strength combination, deflection under the service one. */
function diagramsFor(check: CheckOutput): SheetDiagram[] {
  const d = check.diagrams;
  if (!d) return [];
  const strength = d.strength.combination.name;
  return [
    { quantity: "V", title: "Shear", unit: "lb", combination: strength, segments: d.strength.segments, extremes: d.strength.shear },
    { quantity: "M", title: "Moment", unit: "lb-ft", combination: strength, segments: d.strength.segments, extremes: d.strength.moment },
    {
      quantity: "deflection",
      title: "Deflection",
      unit: "in",
      combination: d.service.combination.name,
      segments: d.service.segments,
      extremes: d.service.deflection,
    },
  ];
}

/**
 * The sheet's appendix: every source behind its members' design values, each once, the ones no
 * readable copy of the table confirmed ("from memory — verify") last and flagged.
 */
export function sheetSources(snapshot: Pick<SheetSnapshot, "members">): { source: string; fromMemory: boolean }[] {
  return distinctSources(snapshot.members.flatMap((m) => m.sources ?? []));
}

/** Works one member out for the sheet; throws the design's input error when its inputs no longer check. */
export function sheetMember(source: SheetMemberSource, spec: MemberSpec, tables: MaterialTables): SheetMember {
  const state = source.flowState;
  const check = checkMember(checkRequest(state, spec, source.carried ?? []), tables);
  const studs = jackStudsUnder(state);
  const reactions = check.reactions.map((r) => ({ ...r, jackStuds: studs ? r.jackStuds : null }));
  const headline = check.answer;
  const saved = source.savedAnswer;
  const changed = saved && (saved.headline !== headline || Math.abs(saved.ratio - check.ratio) > 0.005);
  const note = changed
    ? `Worked out again for this sheet with the current tables; when the member was saved${source.savedTables ? ` (tables ${source.savedTables})` : ""} it read "${saved.headline}" at ${ratioPercent(saved.ratio)}.`
    : null;
  return {
    id: source.id,
    label: source.label,
    kind: state.kind,
    kindLabel: KIND_LABELS[state.kind],
    headline,
    memberLabel: check.member.label,
    pass: check.pass,
    governing: check.governing,
    ratio: check.ratio,
    spanFt: mainSpanFt(state),
    lengthFt: state.lengthFt,
    supports: sortedSupports(state.supports).map((s) => ({ x: s.x, type: s.type })),
    inputs: inputRows(state),
    flowState: state,
    loads: check.loads,
    checks: check.checks.map((c) => ({ ...c, combination: c.combination?.name ?? null })),
    reactions,
    factors: factorRows(check.factors),
    limits: check.limits,
    assumptions: check.assumptions,
    facts: [...answerFacts(check), ...(source.carriedWords ?? []).map((w) => `Carries: ${w}`)],
    diagrams: diagramsFor(check),
    note,
    sources: check.member.sources,
  };
}

/** The whole snapshot; members without a chosen size, or whose inputs no longer check, are listed as skipped. */
export function buildSheetSnapshot(source: SheetSource): SheetSnapshot {
  const members: SheetMember[] = [];
  const skipped: SheetSkipped[] = [];
  for (const m of source.members) {
    if (!m.chosenMember) {
      skipped.push({ id: m.id, label: m.label, reason: "no size chosen yet" });
      continue;
    }
    try {
      members.push(sheetMember(m, m.chosenMember, source.tables));
    } catch (err) {
      skipped.push({ id: m.id, label: m.label, reason: err instanceof Error ? err.message : "could not be checked" });
    }
  }
  return {
    format: SNAPSHOT_FORMAT,
    savedAt: source.now.toISOString(),
    job: source.job,
    preparedBy: source.preparedBy,
    tablesVersion: source.tables.version,
    tablesLabel: source.tablesLabel ?? source.tables.version,
    method: "asd",
    members,
    skipped,
    ...(source.loadPath && source.loadPath.length > 0 ? { loadPath: source.loadPath } : {}),
    caution: { title: CAUTION_TITLE, text: CAUTION, notChecked: [...notCheckedFor(source.members.map((m) => m.chosenMember?.material))] },
  };
}
