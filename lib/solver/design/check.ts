/**
 * Checks one member against its loads: `npm run check` and POST /api/check.
 * Pure: the caller passes the material tables (starter data in the CLI, the published version in the app).
 */
import { DESIGN_RULES } from "./rules";
import { hogsAnywhere } from "./load-model";
import { pointBearings, type PointBearing } from "./point-bearing";
import type { MaterialTables } from "@/lib/tables/types";
import { ratioPercent } from "./ratio-percent";
import { checkWords } from "./check-words";
import { CAUTION, NOT_CHECKED, notCheckedFor } from "@/lib/caution";
import { BeamInputError, BeamInstabilityError } from "../beam";
import type { ZodError } from "zod";
import type { LoadStandard } from "../asce7/standard";
import { LRFD_SNOW_COMPANION_22 } from "../asce7/combinations";
import { zodIssues } from "@/lib/zod-issues";
import { assemblyFor, wallFor, type Assembly } from "./assembly";
import { formatInches } from "../lengths";
import { buildContext, type DesignContext } from "./context";
import type { MemberKind } from "./kinds";
import { DesignInputError } from "./errors";
import { resolveMember, type DesignMember } from "./member";
import { checkInputSchema, type CheckInput, type MemberSpec } from "./schema";
import { evaluateIJoist, type IJoistFactors } from "./i-joist";
import { evaluateCfs, type CfsFactors } from "./cold-formed";
import { evaluateSteel, type SteelFactors } from "./steel";
import { E_STEEL_KSI } from "../aisc360/aisc360-16";
import { answerLine, shortLabel } from "./answer-line";
import { memberDiagrams, type MemberDiagrams } from "./diagrams";
import type { CheckName, CombinationRef, DesignCheck, SupportReaction } from "./types";
import { studBearingWords, studsUnderSteel, studWallFor } from "./studs-under-steel";
import { evaluateWood, resolveCr, resolveIncised, type WoodFactors } from "./wood";

export { CAUTION, NOT_CHECKED };

export interface MemberSummary {
  spec: MemberSpec;
  label: string;
  /** lb/ft, counted as dead load when selfWeight is on */
  weightPlf: number;
  /** dressed or nominal section, in units of in */
  section: { b: number | null; d: number; A: number | null; S: number | null; I: number; EI?: number };
  sources: string[];
  note: string | null;
}

export interface CheckOutput {
  /** what to build, for the crew, in one line, e.g. "3-ply 2x12 No.2 — 2 jack studs each end" (a member that does not work says so) */
  answer: string;
  /** e.g. "OK 99% (bending)" */
  verdict: string;
  pass: boolean;
  /** the check with the largest ratio */
  governing: CheckName | null;
  ratio: number;
  method: "asd" | "lrfd";
  member: MemberSummary;
  checks: DesignCheck[];
  reactions: SupportReaction[];
  factors: WoodFactors | SteelFactors | IJoistFactors | CfsFactors;
  /** the line loads the member carries, by case, and how each was derived */
  loads: { case: string; type: string; w: number | null; note: string }[];
  limits: { live: number | null; total: number | null; source: string };
  assumptions: string[];
  notChecked: readonly string[];
  caution: string;
  /** version of the material tables used */
  tables: string;
  /** the edition of the design rules the answer was worked out on (./rules.ts) */
  rules: string;
  /** loads, shear, moment, deflection and reactions as drawn, with their combinations; null when nothing names a combination */
  diagrams: MemberDiagrams | null;
  /** the ASCE 7 edition the loads were combined in (and the snow map it reads) */
  loadStandard: LoadStandard;
  /** what the member is in the building, when given */
  kind: MemberKind | null;
  /** plies, spacers and the wall it sits in (for the answer: "2-ply 2x10 with 1/2 in spacer") */
  assembly: Assembly;
  /** the unbraced length checked and, when the member needs braces closer, how close (an instruction, never assumed) */
  bracing: Bracing;
  /** a header given by its rough opening: how the span was found */
  roughOpening: RoughOpening | null;
  /** what each point load needs to bear on this member, with the words for the crew (absent in answers worked out before it was added) */
  pointBearing?: PointBearingLine[];
}

export interface PointBearingLine extends PointBearing {
  /** e.g. "the point load at 6' 0" (4,200 lb, D+L) needs 6.7 in² of bearing on this member: …" */
  words: string;
}

export interface Bracing {
  /** the unbraced length given, ft (0 = braced along its length) */
  givenFt: number;
  /** the largest brace spacing at which the member passes, ft (to the inch), when closer bracing would make it pass */
  neededFt: number | null;
  /** the instruction, e.g. "brace the top flange at 7 ft 0 in or closer" */
  instruction: string | null;
  /** where the member hogs and the bottom edge was given as braced along its length, or an I-joist hogs: what the crew must build for it */
  bottomEdge: string | null;
}

export interface RoughOpening {
  openingFt: number;
  bearingIn: number;
  /** span = opening + half the bearing at each end, ft */
  spanFt: number;
  note: string;
}

export interface Evaluation {
  checks: DesignCheck[];
  reactions: SupportReaction[];
  factors: WoodFactors | SteelFactors | IJoistFactors | CfsFactors;
  governing: CheckName | null;
  ratio: number;
  pass: boolean;
}

/** A ratio as a percentage (lib/solver/design/ratio-percent.ts): a pass never reads 100 % unless it is exactly at it, a failure never 100 % or less. */
export function percent(ratio: number, pass: boolean): string {
  return ratioPercent(ratio, pass);
}

/** "OK 77% (bending)" or "Over 113% (shear)": the verdict with the largest ratio and the check it is in. */
export function verdictWords(ev: { pass: boolean; ratio: number; governing: CheckName | null }): string {
  return `${ev.pass ? "OK" : "Over"} ${percent(ev.ratio, ev.pass)}%${ev.governing ? ` (${checkWords(ev.governing)})` : ""}`;
}

/**
 * The answer for the crew in one line (lib/solver/design/answer-line.ts); a member that does not
 * work says so instead: "Over 130% (live load deflection): do not build 2x8 No.2".
 */
export function answerFor(
  input: Pick<CheckInput, "kind" | "spacingIn" | "wallFraming">,
  member: Pick<DesignMember, "spec" | "label">,
  ev: Pick<Evaluation, "pass" | "ratio" | "governing" | "reactions">,
  assembly?: Pick<Assembly, "plies" | "spacers" | "spacerIn">,
): string {
  if (!ev.pass) return `${verdictWords(ev)}: do not build ${shortLabel(member.spec, member.label)}`;
  return answerLine({
    spec: member.spec,
    label: member.label,
    kind: input.kind,
    spacingIn: input.spacingIn,
    inStudWall: input.wallFraming !== undefined,
    assembly: assembly && assembly.spacers > 0 ? { plies: assembly.plies, spacerIn: assembly.spacerIn, spacers: assembly.spacers } : null,
    supports: ev.reactions,
  });
}

/** Runs every check of one resolved member in a shared context. */
export function evaluateMember(member: DesignMember, ctx: DesignContext): Evaluation {
  const r =
    member.kind === "steel"
      ? evaluateSteel(member, ctx)
      : member.kind === "ijoist"
        ? evaluateIJoist(member, ctx)
        : member.kind === "cfs"
          ? evaluateCfs(member, ctx)
          : evaluateWood(member, ctx);
  if ((member.kind === "steel" || member.kind === "cfs") && ctx.studWall) r.reactions = studsUnderSteel(member, r.reactions, ctx, ctx.studWall);
  let governing: CheckName | null = null;
  let ratio = 0;
  for (const c of r.checks) {
    if (c.ratio > ratio) {
      ratio = c.ratio;
      governing = c.name;
    }
  }
  const named = (name: string | null): CombinationRef | null => (name === null ? null : { name, factors: ctx.combinations.get(name) ?? {} });
  const checks: DesignCheck[] = r.checks.map((c) => ({ ...c, ratio: Math.round(c.ratio * 1e4) / 1e4, combination: named(c.combination) }));
  return { ...r, checks, governing, ratio: Math.round(ratio * 1e4) / 1e4, pass: ratio <= 1 };
}

/** Parses with a schema; a failure becomes a DesignInputError naming every field. */
export function parseWith<T>(schema: { safeParse(v: unknown): { success: true; data: T } | { success: false; error: ZodError } }, json: unknown): T {
  const r = schema.safeParse(json);
  if (!r.success) throw new DesignInputError(zodIssues(r.error));
  return r.data;
}

/** Turns the solver's own input errors (instability, geometry) into design input errors. */
export function asDesignError(err: unknown): unknown {
  if (err instanceof BeamInstabilityError) return new DesignInputError([{ path: "supports", message: err.message }]);
  // the beam names the member's length "length"; the design input, "lengthFt"
  if (err instanceof BeamInputError) return new DesignInputError(err.issues.map((i) => (i.path === "length" ? { ...i, path: "lengthFt" } : i)));
  return err;
}

/** The shared context of a design input; with the tables, the stud wall a steel member bears on (jack studs under steel). */
export function contextFor(input: Omit<CheckInput, "member">, tables?: MaterialTables): DesignContext {
  try {
    const ctx = buildContext(input);
    return tables ? { ...ctx, studWall: studWallFor(input.kind, input.wallFraming, tables) } : ctx;
  } catch (err) {
    throw asDesignError(err);
  }
}

export function summarizeMember(m: DesignMember): MemberSummary {
  if (m.kind === "steel") {
    return {
      spec: m.spec,
      label: m.label,
      weightPlf: m.weightPlf,
      section: { b: m.shape.bf, d: m.shape.d, A: m.shape.A, S: m.shape.Sx, I: m.shape.Ix },
      sources: m.sources,
      note: null,
    };
  }
  if (m.kind === "cfs") {
    // the deflection drawn with E = 29,500 ksi and the gross I (the check reads the effective I at the service moment)
    return {
      spec: m.spec,
      label: m.label,
      weightPlf: Math.round(m.weightPlf * 1000) / 1000,
      section: { b: m.section.flange * m.pieces, d: m.section.depth, A: m.section.A * m.pieces, S: m.section.Sxe * m.pieces, I: m.I, EI: 29_500_000 * m.I },
      sources: m.sources,
      note: `${m.section.name}: ${m.section.mils} mil (design thickness ${m.section.t} in), Fy ${m.section.Fy} ksi — order ${m.section.Fy} ksi steel; S is the effective section modulus at Fy`,
    };
  }
  if (m.kind === "ijoist") {
    // an I-joist is checked by its EI, not by a section: I = 0 here and EI given
    return {
      spec: m.spec,
      label: m.label,
      weightPlf: m.weightPlf,
      section: { b: m.joist.flangeWidth, d: m.joist.d, A: null, S: null, I: 0, EI: m.joist.EI },
      sources: m.sources,
      note: "a generic APA PRI-400 joist: the maker's own joist series carries its own values, which govern",
    };
  }
  const r = (v: number) => Math.round(v * 1000) / 1000;
  return {
    spec: m.spec,
    label: m.label,
    weightPlf: r(m.weightPlf),
    section: { b: r(m.b), d: r(m.d), A: r(m.A), S: r(m.S), I: r(m.I) },
    sources: m.sources,
    note: m.note ?? null,
  };
}

/** Feet and inches to the nearest 1/16 in, as a tape reads: 5.25 → "5 ft 3 in". */
export function feetInches(ft: number): string {
  const sixteenths = Math.round(ft * 12 * 16);
  const feet = Math.floor(sixteenths / (12 * 16));
  const rest = sixteenths - feet * 12 * 16;
  const whole = Math.floor(rest / 16);
  const frac = rest % 16;
  const g = (a: number, b: number): number => (b === 0 ? a : g(b, a % b));
  const fracText = frac === 0 ? "" : `${whole > 0 ? "-" : ""}${frac / g(frac, 16)}/${16 / g(frac, 16)}`;
  return `${feet} ft ${whole > 0 || frac === 0 ? whole : ""}${fracText} in`;
}

export function roughOpeningOf(input: Omit<CheckInput, "member">): RoughOpening | null {
  if (input.roughOpeningFt === undefined) return null;
  const spanFt = input.roughOpeningFt + input.bearingIn / 12;
  return {
    openingFt: input.roughOpeningFt,
    bearingIn: input.bearingIn,
    spanFt,
    note: `span ${feetInches(spanFt)} = rough opening ${feetInches(input.roughOpeningFt)} + half of the ${input.bearingIn} in bearing at each end`,
  };
}

/** Rounded up to the next 1/4 in, in words: "2-1/4 in" (the fraction as lib/solver/lengths.ts writes it). */
function quarterInches(inches: number): string {
  return `${formatInches(Math.ceil(inches * 4 - 1e-9) / 4).replace(/"$/, "")} in`;
}

/** Square posts as sawn: nominal name and dressed side, in (NDS Supplement 2018 Table 1B). */
const POST_ENDS: readonly (readonly [string, number])[] = [
  ["4x4", 3.5],
  ["6x6", 5.5],
];

/** The crew's words for what a point load needs to bear on this member. */
export function pointBearingWords(b: PointBearing): string {
  const load = `the point load at ${feetInches(b.x)} (${Math.round(b.P).toLocaleString("en-US")} lb, ${b.combination})`;
  if (b.on === "ijoist")
    return `${load} bears on the I-joist's top flange: web stiffeners under it, or blocking or a beam that carries it, as ${b.basis} asks (the flange and web under it are not checked here)`;
  if (b.areaIn2 !== null && b.widthIn !== null && b.FcPerpPrime !== null) {
    const width = b.widthIn;
    const need = b.areaIn2;
    // a square post end bears on min(its side, the member's width) × its side (dressed sizes, NDS Supplement Table 1B)
    const posts = POST_ENDS.map(([name, side]) => {
      const area = Math.min(side, width) * side;
      return `a ${name} post's end gives ${Math.floor(area * 10) / 10} in²${area >= need ? "" : ", too little"}`;
    });
    return (
      `${load} needs ${Math.ceil(need * 10 - 1e-9) / 10} in² of contact on this member (${posts.join("; ")}), ` +
      `Fc⊥′ = ${Math.round(b.FcPerpPrime)} psi, ${b.basis}; the post or beam bearing on it is not checked`
    );
  }
  if (b.lengthIn === null)
    return `${load} needs web stiffeners under it: the web cannot take it in bearing alone (${b.basis}); stiffeners are not designed here`;
  return b.lengthIn <= 0
    ? `${load}: the web takes it at any bearing length (${b.basis}); the post or beam bearing on it is not checked`
    : `${load} needs at least ${quarterInches(b.lengthIn)} of bearing along the flange (${b.basis}); the post or beam bearing on it is not checked`;
}

/** More than one span or an overhang: somewhere the member hogs under gravity load. */
function hogsGeometrically(input: Pick<CheckInput, "supports" | "lengthFt">): boolean {
  return input.supports.length !== 2 || input.supports.some((s) => s.x > 1e-9 && s.x < input.lengthFt - 1e-9);
}

export function assumptionsFor(input: Omit<CheckInput, "member">, member: DesignMember, ctx: DesignContext): string[] {
  const a: string[] = [];
  const c = input.conditions;
  const std = input.loadStandard;
  const lrfd = input.method === "lrfd";
  const snowWords = !ctx.model.cases.includes("S")
    ? ""
    : std === "ASCE 7-22"
      ? lrfd
        ? `, snow at 1.0S leading and ${LRFD_SNOW_COMPANION_22}S as a companion (strength-level map)`
        : ", snow as 0.7S (strength-level map)"
      : lrfd
        ? ", snow at 1.6S leading, 0.5S as a companion (allowable-stress map)"
        : ", snow at full value, D + S (allowable-stress map)";
  a.push(
    `load combinations: ${std} ${lrfd ? "§2.3.1 (strength)" : "§2.4.1 (allowable stress)"}${snowWords}; deflection and reactions at service level (§2.4.1)`,
  );
  const ro = roughOpeningOf(input);
  if (ro) a.push(ro.note);
  a.push(c.selfWeight ? `member's own weight counted as dead load: ${Math.round(member.weightPlf * 10) / 10} plf` : "member's own weight not counted");
  a.push(
    c.unbracedLengthFt > 0
      ? `top edge braced at the supports and every ${c.unbracedLengthFt} ft between; that spacing is checked wherever along the span it is worst`
      : "top edge braced continuously (sheathing or decking fastened along it)",
  );
  if (member.kind !== "ijoist" && hogsAnywhere(ctx.model, ctx.strength, c.selfWeight ? member.weightPlf : 0)) {
    a.push(
      c.bottomEdgeBraced
        ? "bottom edge braced along its length, as given (a ceiling fastened directly to it): where the member hogs it is taken as braced"
        : `where the member hogs (over an interior support, on an overhang, under uplift) the bottom edge is in compression and is taken as braced only at the supports${c.unbracedLengthFt > 0 ? ", not at the top edge's braces" : ""}: its stability is checked over the whole span or overhang (${member.kind === "wood" ? "NDS 2018 §3.3.3" : member.kind === "steel" ? "AISC 360-16 §F2, Cb = 1.0" : "AISI S100-16 §F2.1, Cb = 1.0"})`,
    );
  }
  if (ctx.model.patterned) a.push(`live load placed span by span for the worst effect (pattern loading, ${std} §4.3.3)`);
  a.push(`bearing length ${input.bearingIn} in at every support`);
  if (member.kind === "wood") {
    a.push(c.wet ? "wet service" : "dry service (moisture content 19 % or less for sawn lumber, 16 % for glulam)");
    a.push(`temperature up to ${c.temperatureF} °F`);
    a.push(
      c.shearIgnoreLoadsNearSupports
        ? "shear read at d from each support face: uniform loads within d left out, point loads within d taken at x/d, x from the face (NDS 2018 §3.4.3.1)"
        : "shear: every load counted, none left out near the supports",
    );
    if (member.dimensionLumber) {
      const inc = resolveIncised(member, c.incised, c.wet, input.kind);
      a.push(inc.basis);
      a.push(resolveCr(member, c.repetitive, input.kind, input.spacingIn).basis);
    }
    a.push("span taken center to center of the supports as given (NDS 2018 §3.2.1 permits face to face plus half the required bearing)");
  }
  if (member.kind === "wood" && member.volumeX !== undefined && ctx.model.regions.length > 1) {
    a.push(
      "glulam: Fbx+ (tension zone stressed in tension) for moment that sags, Fbx− for moment that hogs over a support or on an overhang (the table's values, from memory — confirm both with the supplier)",
    );
  }
  if (member.kind === "wood" && member.note) a.push(`${member.label}: ${member.note}`);
  if (member.kind === "steel") a.push("W-shape bent about its major axis; both flanges braced at the supports");
  if ((member.kind === "steel" || member.kind === "cfs") && ctx.studWall) a.push(studBearingWords(member, ctx.studWall, input.method === "lrfd"));
  if (member.kind === "cfs") {
    a.push(
      `cold-formed steel ${member.section.name}${member.pieces > 1 ? ` (${member.assembly === "box" ? "two C-sections boxed, flanges toe to toe" : "two C-sections back to back"}, each taken as a single web sharing the load equally)` : ""}: AISI S100-16 ${input.method === "lrfd" ? "LRFD" : "ASD"}, Fy ${member.section.Fy} ksi (33 ksi below 54 mil, 50 ksi at 54 mil and above: common practice; order it so), E = 29,500 ksi`,
    );
    a.push(
      c.unbracedLengthFt > 0
        ? `top flange braced at the supports and every ${c.unbracedLengthFt} ft: lateral-torsional buckling by AISI S100-16 §F2.1${member.assembly === "box" ? " (a box header is taken as stable between braces)" : ""}`
        : `top flange braced continuously by the sheathing screwed to it (AISI S100-16 §F2 not limiting where the member sags)${member.assembly === "box" ? "; a box header is taken as stable between braces" : ""}`,
    );
    a.push(
      `flange roll (distortional buckling, AISI S100-16 §F4.1 with Appendix 2 §2.3.3.3) checked for the top flange under sagging moment and the bottom flange where the member hogs, with no rotational restraint credited from sheathing (kφ = 0) and β = 1.0${c.unbracedLengthFt > 0 ? `; braces every ${c.unbracedLengthFt} ft taken as restraints of the top flange only (L = Lcrd for the bottom flange)` : "; no bridging or blocking credited (L = Lcrd)"}${member.pieces > 1 ? "; each C-section of the header taken alone" : ""}`,
    );
    a.push(
      `web crippling at each support and point load by AISI S100-16 §G5 (flanges screwed to the support, bearing ${input.bearingIn} in); bearing stiffeners: ${member.stiffeners === true ? "at every support, as given" : member.stiffeners === false ? "none, as given" : "added only where the web needs one"} (33 mil C-shape or track, IRC 2021 R505.3.4)`,
    );
    a.push("standard web punchouts only, away from the supports; deflection with the effective moment of inertia at the service moment");
  }
  if (member.kind === "ijoist") {
    a.push(
      `wood I-joist checked against its published capacities (moment, shear, end and intermediate reactions) and its EI and K; dry service, normal temperature; CL = 1.0: top flange braced by the sheathing${hogsAnywhere(ctx.model, ctx.strength, c.selfWeight ? member.weightPlf : 0) ? "; the bottom flange, in compression where the joist hogs, taken as braced as the answer's bracing line asks (its lateral stability is not worked out here)" : ""}`,
    );
    a.push(
      "deflection includes shear deflection (K); no holes, notches or cut flanges in the joist; squash blocks, rim and blocking as the joist's installation guide shows",
    );
  }
  return a;
}

/** Checks one member. Throws DesignInputError (field and reason) on bad input or unknown names. */
export function checkMember(json: unknown, tables: MaterialTables): CheckOutput {
  const input = parseWith<CheckInput>(checkInputSchema, json);
  const member = resolveMember(input.member, tables);
  if (member.kind === "wood" && member.wetTable === "scl" && input.conditions.wet) {
    throw new DesignInputError([
      {
        path: "conditions.wet",
        message: "LVL and PSL are for dry service only here; use sawn lumber or glulam in wet service, or the maker's published wet-use values",
      },
    ]);
  }
  return fullCheck(input, member, contextFor(input, tables), tables);
}

/** The whole check of one resolved member in a built context (notes on): what /api/check answers and /api/size gives its top members. */
export function fullCheck(input: Omit<CheckInput, "member">, member: DesignMember, ctx: DesignContext, tables: MaterialTables): CheckOutput {
  const ev = evaluateMember(member, ctx);
  const sw = input.conditions.selfWeight ? member.weightPlf : 0;
  const assembly = assemblyFor(member, wallFor(input.kind, input.wallFraming));
  const assumptions = assumptionsFor(input, member, ctx);
  if (assembly.fits === false)
    assumptions.push(
      `${assembly.words} is ${assembly.widthIn} in wide and does not fill a ${assembly.wallFraming} wall (${assembly.wallFraming === "2x6" ? "5-1/2" : "3-1/2"} in)`,
    );
  const summary = summarizeMember(member);
  const factors = ev.factors as { EPrime?: number };
  const diagrams = memberDiagrams({
    lengthFt: ctx.model.length,
    supports: ctx.model.supports,
    loads: ctx.loads.map((l) => l.load),
    selfWeightPlf: sw,
    // an I-joist gives its EI, not a section: its bending deflection drawn from EI (shear deflection is in the check)
    // cold-formed steel: drawn with the effective I the deflection check used
    EPsi:
      member.kind === "cfs"
        ? 29_500_000
        : summary.section.EI !== undefined && summary.section.EI > 0
          ? summary.section.EI
          : member.kind === "wood" && typeof factors.EPrime === "number" && factors.EPrime > 0
            ? factors.EPrime
            : E_STEEL_KSI * 1000,
    IIn4: member.kind === "cfs" ? (ev.factors as CfsFactors).Ieff : summary.section.EI !== undefined && summary.section.EI > 0 ? 1 : summary.section.I,
    checks: ev.checks,
    reactions: ev.reactions,
    combinations: ctx.combinations,
  });
  return {
    answer: answerFor(input, member, ev, assembly),
    verdict: verdictWords(ev),
    pass: ev.pass,
    governing: ev.governing,
    ratio: ev.ratio,
    method: input.method,
    member: summary,
    checks: ev.checks,
    reactions: ev.reactions,
    factors: ev.factors,
    loads: [
      ...ctx.loads.map((l) => ({ case: l.load.case, type: l.load.type, w: l.load.type === "udl" ? Math.round(l.load.w * 100) / 100 : null, note: l.note })),
      ...(sw > 0 ? [{ case: "D", type: "udl", w: Math.round(sw * 100) / 100, note: "D member's own weight" }] : []),
    ],
    limits: ctx.limits,
    assumptions,
    notChecked: notCheckedFor([member.spec.material]),
    caution: CAUTION,
    tables: tables.version,
    rules: DESIGN_RULES,
    loadStandard: input.loadStandard,
    kind: input.kind ?? null,
    assembly,
    bracing: bracingFor(input, member, ev, member.kind === "ijoist" && hogsAnywhere(ctx.model, ctx.strength, sw)),
    roughOpening: roughOpeningOf(input),
    pointBearing: pointBearings(member, ctx, ev.factors).map((b) => ({ ...b, words: pointBearingWords(b) })),
    diagrams,
  };
}

/**
 * An I-joist's published moment capacity holds with its compression flange braced: NDS 2018 §7.3.5 (the beam
 * stability factor CL of I-joists; the clause number read in a published summary of NDS Chapter 7), and the
 * American Wood Council's ASD/LRFD Manual, M7.3 and Table M7.3-1: M′ = M·CD·CM·Ct·CL·Cr, reducing to M′ = M·CD
 * only "for fully laterally supported bending members" (read in a published copy, yumpu.com document 32600583,
 * p. 53; the manual's edition is not shown there). The check here uses CL = 1.0 and has no flange properties to
 * work out a lower one.
 * Where the joist hogs, the compression flange is the bottom one, which the sheathing does not brace: the
 * answer asks the crew to brace it, as the joist makers' installation guides do (common practice), and says
 * the check counts on it.
 */
export function iJoistBottomFlange(input: Pick<CheckInput, "supports" | "lengthFt">): string {
  const xs = input.supports.map((s) => s.x);
  const first = Math.min(...xs);
  const last = Math.max(...xs);
  const interior = xs.some((x) => x > first + 1e-9 && x < last - 1e-9);
  const overhangs = (first > 1e-9 ? 1 : 0) + (last < input.lengthFt - 1e-9 ? 1 : 0);
  const overhang = overhangs > 0;
  const at: string[] = [];
  if (interior) at.push(xs.length > 3 ? "every interior support" : "the interior support");
  if (overhang) at.push(overhangs > 1 ? "the supports next to the overhangs" : "the support next to the overhang");
  const where =
    at.length > 0
      ? `blocking panels or a rim at ${at.join(" and ")}${overhang ? `; along ${overhangs > 1 ? "each overhang" : "the overhang"}, a ceiling fastened to the bottom flange or the bracing the joist maker's guide shows` : ""}`
      : "along its length: a ceiling fastened to it, or the bracing the joist maker's guide shows";
  return `brace the I-joist's bottom flange where it hogs (it is in compression there, and the check counts on it braced): ${where}`;
}

/**
 * The unbraced length given is the one checked. When the member fails on lateral stability at that
 * length and passes with braces closer, the answer says how close (to the inch, rounded down), as an
 * instruction for the crew; nothing is assumed.
 */
function bracingFor(input: Omit<CheckInput, "member">, member: DesignMember, ev: Evaluation, iJoistHogs: boolean): Bracing {
  const givenFt = input.conditions.unbracedLengthFt;
  // the answer rests on the bottom edge's bracing only where the member hogs (more than one span, an overhang)
  const bottomEdge =
    member.kind === "ijoist"
      ? iJoistHogs
        ? iJoistBottomFlange(input)
        : null
      : input.conditions.bottomEdgeBraced && hogsGeometrically(input)
        ? "the bottom edge is taken as braced along its length: fasten the ceiling directly to it, over the supports and on any overhang"
        : null;
  const none: Bracing = { givenFt, neededFt: null, instruction: null, bottomEdge };
  if (givenFt <= 0 || ev.pass) return none;
  const passesAt = (lbFt: number) => evaluateMember(member, contextFor({ ...input, conditions: { ...input.conditions, unbracedLengthFt: lbFt } })).pass;
  const minFt = 1 / 12;
  if (!passesAt(minFt)) return none;
  let lo = minFt;
  let hi = givenFt;
  while ((hi - lo) * 12 > 0.25) {
    const mid = (lo + hi) / 2;
    if (passesAt(mid)) lo = mid;
    else hi = mid;
  }
  const neededFt = Math.floor(lo * 12) / 12;
  if (neededFt < minFt) return none;
  const edge = member.kind === "steel" ? "top flange" : "top edge";
  return { givenFt, neededFt, bottomEdge, instruction: `brace the ${edge} at ${feetInches(neededFt)} or closer (at ${feetInches(givenFt)} it does not pass)` };
}
