/**
 * Sizing: every candidate in the tables (or one family) checked against the same loads, passing
 * members ranked by weight, depth or the table's cost, with the nearest failures and why they fail;
 * and the largest span a given member passes, by bisection on the length (as span tables give it).
 */
import { TableLookupError } from "@/lib/tables";
import type { MaterialTables, SawnGrade, Species } from "@/lib/tables/types";
import { CAUTION, notCheckedFor } from "@/lib/caution";
import type { LoadStandard } from "../asce7/standard";
import { assemblyFor, pliesNailed, wallFor, type Assembly } from "./assembly";
import {
  answerFor,
  percent,
  verdictWords,
  assumptionsFor,
  checkMember,
  contextFor,
  evaluateMember,
  fullCheck,
  parseWith,
  roughOpeningOf,
  summarizeMember,
  type CheckOutput,
  type RoughOpening,
} from "./check";
import type { MemberKind, WallFraming } from "./kinds";
import type { DesignContext } from "./context";
import { DesignInputError } from "./errors";
import { resolveMember, resolveMemberUnchecked, withPlies, type DesignMember } from "./member";
import { resolveCr, resolveIncised } from "./wood";
import { sizeInputSchema, spanInputSchema, type MemberSpec, type SizeFamily, type SizeInput, type SpanInput } from "./schema";
import type { CheckName, DesignCheck } from "./types";

export interface SizeCandidateResult {
  /** one line for the crew, as in the check output */
  answer: string;
  /** e.g. "OK 77% (bending)" */
  verdict: string;
  member: MemberSpec;
  label: string;
  governing: CheckName | null;
  ratio: number;
  weightPlf: number;
  /** in */
  depth: number;
  /** from the table's cost column, per foot of the whole member; null where the table has none */
  costPerFoot: number | null;
  /** jack studs per support (wood) and bearing needed, for the answer line */
  supports: { x: number; maxDown: number; uplift: number; requiredBearing: number; jackStuds: number | null; bearingStiffener?: boolean }[];
  /** plies, spacers and the wall it fills */
  assembly: Assembly;
  /** the whole check, for the first `fullChecks` passing members */
  check?: CheckOutput;
}

export interface SizeFailure extends SizeCandidateResult {
  /** plain words, e.g. "bending 112% in D+L at 7 ft" */
  reason: string;
}

export interface SizeOutput {
  passing: SizeCandidateResult[];
  failing: SizeFailure[];
  rank: "weight" | "depth" | "cost";
  method: "asd" | "lrfd";
  /** how many members were checked and how many passed */
  candidates: number;
  passingCount: number;
  assumptions: string[];
  notChecked: readonly string[];
  caution: string;
  tables: string;
  loadStandard: LoadStandard;
  kind: MemberKind | null;
  /** the wall the members must fill (headers), null when not in a wall */
  wallFraming: WallFraming | null;
  /** how many members the tables hold that do not fit that wall (left out) */
  notFittingWall: number;
  roughOpening: RoughOpening | null;
}

const ALL_PLIES = [1, 2, 3, 4];

/** Every member of the family that the tables can build, in table order. */
export function candidateSpecs(family: SizeFamily, tables: MaterialTables, joists: boolean): MemberSpec[] {
  const out: MemberSpec[] = [];
  const mat = family.material;
  if (mat === "sawn" || mat === "any") {
    const f = family.material === "sawn" ? family : undefined;
    const speciesHeld = [...new Set(tables.sawnValues.map((v) => v.species))];
    let species: Species[] = speciesHeld;
    if (f?.species !== undefined) {
      const hit = speciesHeld.find((s) => s.toLowerCase() === f.species?.trim().toLowerCase());
      if (!hit)
        throw new DesignInputError([
          { path: "member.species", message: new TableLookupError("member.species", `unknown species "${f.species}"`, speciesHeld).message },
        ]);
      species = [hit];
    }
    const plies = f?.plies ?? (joists ? [1] : ALL_PLIES);
    for (const sp of species) {
      const gradesHeld = [...new Set(tables.sawnValues.filter((v) => v.species === sp).map((v) => v.grade))];
      let grades: SawnGrade[] = gradesHeld;
      if (f?.grade !== undefined) {
        const norm = (s: string) =>
          s
            .toLowerCase()
            .replace(/[\s.#]/g, "")
            .replace(/^no/, "");
        const hit = gradesHeld.find((g) => norm(g) === norm(f.grade as string));
        if (!hit)
          throw new DesignInputError([
            { path: "member.grade", message: new TableLookupError("member.grade", `unknown grade "${f.grade}" for ${sp}`, gradesHeld).message },
          ]);
        grades = [hit];
      }
      for (const grade of grades) {
        for (const size of tables.sawnSizes) {
          // built-up plies are nailed 2x (assembly.ts pliesNailed); a 3x or 4x is offered alone, and only where one
          // piece is asked for; asked for by name, thicker plies are still checked
          const pliesOf = size.sizeClass !== "dimension" ? [1] : pliesNailed(size.name) ? plies : plies.filter((n) => n === 1);
          for (const n of pliesOf) {
            out.push({ material: "sawn", species: sp, grade, size: size.name, plies: n });
          }
        }
      }
    }
  }
  if (mat === "engineered" || mat === "any") {
    const f = family.material === "engineered" ? family : undefined;
    let products = tables.engineered;
    if (f?.product !== undefined) {
      const hit = tables.engineered.find((p) => p.name.toLowerCase() === f.product?.trim().toLowerCase());
      if (!hit)
        throw new DesignInputError([
          {
            path: "member.product",
            message: new TableLookupError(
              "member.product",
              `unknown engineered product "${f.product}"`,
              tables.engineered.map((p) => p.name),
            ).message,
          },
        ]);
      products = [hit];
    }
    for (const p of products) {
      const plies = p.kind === "LVL" ? (f?.plies ?? (joists ? [1] : ALL_PLIES)) : [1];
      for (const width of p.widths)
        for (const depth of p.depths) for (const n of plies) out.push({ material: "engineered", product: p.name, width, depth, plies: n });
    }
  }
  if (mat === "ijoist" || (mat === "any" && joists)) {
    const f = family.material === "ijoist" ? family : undefined;
    let rows = tables.iJoists;
    if (f?.series !== undefined) {
      const wanted = f.series.trim().toLowerCase();
      rows = rows.filter((j) => j.series.toLowerCase() === wanted);
      if (rows.length === 0) {
        const held = [...new Set(tables.iJoists.map((j) => j.series))];
        throw new DesignInputError([
          { path: "member.series", message: new TableLookupError("member.series", `unknown I-joist series "${f.series}"`, held).message },
        ]);
      }
    }
    for (const j of rows) out.push({ material: "ijoist", joist: j.name, stiffeners: f?.stiffeners ?? false });
  }
  if (mat === "cfs" || mat === "any") {
    // cold-formed steel C-sections: one at a spacing for joists and rafters; two (back to back or boxed) for a header or beam
    const f = family.material === "cfs" ? family : undefined;
    const flanges = f?.flanges;
    const assemblies = joists ? (["single"] as const) : (f?.assemblies ?? (["back-to-back", "box"] as const));
    for (const s of tables.coldFormed ?? []) {
      if (s.style !== "S") continue;
      if (flanges && !flanges.some((w) => Math.abs(w - s.flange) < 0.02)) continue;
      for (const assembly of assemblies)
        out.push({ material: "cfs", section: s.name, assembly, ...(f?.stiffeners === undefined ? {} : { stiffeners: f.stiffeners }) });
    }
  }
  if (mat === "steel" || mat === "any") {
    const grade = family.material === "steel" ? family.grade : "A992";
    for (const s of tables.steel) out.push({ material: "steel", shape: s.name, grade });
  }
  return out;
}

function describe(input: SizeInput, member: DesignMember, ev: ReturnType<typeof evaluateMember>, assembly: Assembly): SizeCandidateResult {
  return {
    answer: answerFor(input, member, ev, assembly),
    verdict: verdictWords(ev),
    member: member.spec,
    label: member.label,
    governing: ev.governing,
    ratio: ev.ratio,
    weightPlf: Math.round(member.weightPlf * 100) / 100,
    depth: member.d,
    costPerFoot: member.costPerFoot === undefined ? null : Math.round(member.costPerFoot * 100) / 100,
    supports: ev.reactions.map((r) => ({
      x: r.x,
      maxDown: r.maxDown,
      uplift: r.uplift,
      requiredBearing: r.requiredBearing,
      jackStuds: r.jackStuds,
      ...(r.bearingStiffener === undefined ? {} : { bearingStiffener: r.bearingStiffener }),
    })),
    assembly,
  };
}

function reasonOf(c: DesignCheck | undefined): string {
  if (!c) return "no check ran";
  const where = c.x === null ? "" : ` at ${Math.round(c.x * 100) / 100} ft`;
  const combo = c.combination ? ` in ${c.combination.name}` : "";
  return `${c.name} ${percent(c.ratio, c.ratio <= 1)}%${combo}${where}: ${c.demand} ${c.unit} against ${c.capacity} ${c.unit}`;
}

const RANKERS: Record<SizeOutput["rank"], (a: SizeCandidateResult, b: SizeCandidateResult) => number> = {
  weight: (a, b) => a.weightPlf - b.weightPlf || a.depth - b.depth || a.ratio - b.ratio,
  depth: (a, b) => a.depth - b.depth || a.weightPlf - b.weightPlf || a.ratio - b.ratio,
  cost: (a, b) => (a.costPerFoot ?? Infinity) - (b.costPerFoot ?? Infinity) || a.weightPlf - b.weightPlf || a.ratio - b.ratio,
};

/** Sizes a member: `npm run size` and POST /api/size. Throws DesignInputError on bad input. */
export function sizeMember(json: unknown, tables: MaterialTables): SizeOutput {
  const input = parseWith<SizeInput>(sizeInputSchema, json);
  const specs = candidateSpecs(input.member, tables, input.spacingIn !== undefined);
  const ctx: DesignContext = { ...contextFor(input, tables), notes: false };
  const passing: SizeCandidateResult[] = [];
  const failing: SizeFailure[] = [];
  let checked = 0;
  let notFitting = 0;
  const wall = wallFor(input.kind, input.wallFraming);
  let lastMember: DesignMember | null = null;
  // one table lookup per size; other ply counts derive from it
  const onePly = new Map<string, DesignMember | null>();
  for (const spec of specs) {
    const plies = spec.material === "steel" || spec.material === "ijoist" || spec.material === "cfs" ? 1 : spec.plies;
    const key =
      spec.material === "sawn"
        ? `s|${spec.species}|${spec.grade}|${spec.size}`
        : spec.material === "engineered"
          ? `e|${spec.product}|${spec.width}|${spec.depth}`
          : "";
    let base = key ? onePly.get(key) : undefined;
    if (base === undefined) {
      try {
        base = resolveMemberUnchecked(
          spec.material === "steel" || spec.material === "ijoist" || spec.material === "cfs" ? spec : { ...spec, plies: 1 },
          tables,
        );
      } catch (err) {
        if (!(err instanceof TableLookupError || err instanceof DesignInputError)) throw err;
        base = null;
      }
      if (key) onePly.set(key, base);
    }
    if (base === null) continue;
    const member: DesignMember = base.kind === "wood" && plies !== 1 ? withPlies(base, plies) : base;
    if (member.kind === "wood" && member.wetTable === "scl" && input.conditions.wet) continue;
    // I-joists: dry service, normal temperature, ASD only (their published values are allowable loads)
    if (member.kind === "ijoist" && (input.conditions.wet || input.conditions.temperatureF > 100 || input.method !== "asd")) continue;
    const assembly = assemblyFor(member, wall);
    if (assembly.fits === false) {
      notFitting++;
      continue;
    }
    checked++;
    lastMember = member;
    const ev = evaluateMember(member, ctx);
    const row = describe(input, member, ev, assembly);
    if (ev.pass) passing.push(row);
    else failing.push({ ...row, reason: reasonOf(ev.checks.find((c) => c.name === ev.governing)) });
  }
  passing.sort(RANKERS[input.rank]);
  failing.sort((a, b) => a.ratio - b.ratio);
  const top = passing.slice(0, input.limit);
  const full: DesignContext = { ...ctx, notes: true };
  for (const row of top.slice(0, input.fullChecks)) row.check = fullCheck(input, resolveMember(row.member, tables), full, tables);
  return {
    passing: top,
    failing: failing.slice(0, input.failures),
    rank: input.rank,
    method: input.method,
    candidates: checked,
    passingCount: passing.length,
    assumptions: [
      `candidates: ${describeFamily(input)}`,
      ...(wall
        ? [
            `only members that fill a ${wall} wall (${wall === "2x6" ? "5-1/2" : "3-1/2"} in): sawn plies with 1/2 in spacers between them, or a solid member as wide`,
          ]
        : []),
      ...(lastMember
        ? assumptionsFor(input, lastMember, ctx).filter((a) => !a.startsWith("member's own weight counted") && !perMemberWords(input, lastMember).includes(a))
        : []),
      ...familyWoodWords(input),
      ...(input.conditions.selfWeight ? ["each member's own weight counted as dead load"] : []),
    ],
    notChecked: notCheckedFor([...passing.slice(0, input.limit), ...failing.slice(0, input.failures)].map((r) => r.member.material)),
    caution: CAUTION,
    tables: tables.version,
    loadStandard: input.loadStandard,
    kind: input.kind ?? null,
    wallFraming: wall,
    notFittingWall: notFitting,
    roughOpening: roughOpeningOf(input),
  };
}

/** The incised and Cr lines of one member (left out of a search's assumptions, which speak of the family). */
function perMemberWords(input: SizeInput, m: DesignMember): string[] {
  if (m.kind !== "wood" || !m.dimensionLumber) return [];
  return [
    resolveIncised(m, input.conditions.incised, input.conditions.wet, input.kind).basis,
    resolveCr(m, input.conditions.repetitive, input.kind, input.spacingIn).basis,
  ];
}

/** Incised and Cr as the search applied them to sawn lumber. */
function familyWoodWords(input: SizeInput): string[] {
  // incised and Cr are sawn dimension lumber's: nothing to say of a search without it
  if (input.member.material !== "sawn" && input.member.material !== "any") return [];
  const c = input.conditions;
  const treated = c.wet || input.kind === "deck-joist" || input.kind === "deck-beam";
  const incised =
    c.incised === true
      ? "sawn lumber incised, as given: Ci 0.80 on Fb and Fv, 0.95 on E (NDS 2018 §4.3.8)"
      : c.incised === false
        ? "sawn lumber not incised, as given"
        : treated
          ? "treated Douglas Fir-Larch, Hem-Fir and Spruce-Pine-Fir assumed incised (Ci, NDS 2018 §4.3.8); Southern Pine not incised"
          : "sawn lumber not incised (untreated lumber assumed)";
  const cr =
    c.repetitive === false
      ? "Cr = 1.0 for every member (not repetitive, as given)"
      : "Cr = 1.15 for built-up members of 3 or more plies (plies through-nailed) and for joists or rafters at 24 in or less in a repetitive system; 1.0 otherwise, and never for 2 plies by the built-up rule (NDS 2018 §4.3.9)";
  return [incised, cr];
}

function describeFamily(input: SizeInput): string {
  const m = input.member;
  const joists = input.spacingIn !== undefined;
  const plies = (given: number[] | undefined) => (given ?? (joists ? [1] : ALL_PLIES)).join(", ");
  switch (m.material) {
    case "sawn":
      return `sawn lumber, ${m.species ?? "every species"}, ${m.grade ?? "every grade"}, every size in the tables, plies ${plies(m.plies)} of 2x (3x, 4x and timbers 1 ply)`;
    case "engineered":
      return `${m.product ?? "every engineered product"}, every width and depth in the tables, LVL plies ${plies(m.plies)}`;
    case "steel":
      return `every W-shape in the tables, ${m.grade}`;
    case "ijoist":
      return `${m.series ?? "every"} wood I-joist${m.series ? "" : " series"} in the tables, every depth${m.stiffeners ? ", web stiffeners at the ends" : ""}`;
    case "cfs":
      return `every cold-formed steel C-section in the tables${m.flanges ? ` with ${m.flanges.join(" or ")} in flanges` : ""}, ${joists ? "one at the spacing" : (m.assemblies ?? ["back-to-back", "box"]).join(" and ") + " pairs"}, AISI S100-16${m.stiffeners === true ? ", bearing stiffeners at every support" : m.stiffeners === false ? ", no bearing stiffeners" : ", bearing stiffeners where the web needs them"}`;
    case "any":
      return `every sawn size, engineered product${joists ? ", wood I-joist" : ""}, cold-formed steel C-section${joists ? "" : " pair"} and W-shape in the tables, plies ${plies(undefined)} for dimension lumber and LVL`;
  }
}

export interface SpanOutput {
  member: MemberSpec;
  label: string;
  /** largest member length that passes, ft (rounded down to 1/100 ft); supports and loads scale with it */
  largestSpan: number | null;
  /** at that length: each span between supports and each overhang, ft */
  spans: { from: number; to: number; length: number }[];
  /** the same in inches, rounded down to 1/16 in */
  largestSpanIn: number | null;
  /** the check that fails just past the largest span */
  governing: CheckName | null;
  /** true when the member still passes at maxLength (the span is at least that) */
  atMaxLength: boolean;
  /** the full check at the largest span */
  check: CheckOutput | null;
  note: string;
}

/** Positions scaled with the length: supports and loads keep their place as a fraction of the member. */
function scaled(input: SpanInput, length: number): Record<string, unknown> {
  const k = length / input.lengthFt;
  const at = (x: number) => Math.min(length, Math.max(0, x * k));
  const loads = input.loads.map((l) => {
    switch (l.type) {
      case "area":
      case "snow":
        return { ...l, from: l.from === undefined ? undefined : at(l.from), to: l.to === undefined ? undefined : at(l.to) };
      case "point":
      case "moment":
        return { ...l, x: at(l.x) };
      default:
        return { ...l, from: at(l.from), to: at(l.to) };
    }
  });
  const { minLengthFt: _min, maxLengthFt: _max, toleranceIn: _tol, ...rest } = input;
  void _min;
  void _max;
  void _tol;
  return { ...rest, lengthFt: length, supports: input.supports.map((s) => ({ ...s, x: at(s.x) })), loads };
}

/**
 * Largest span that passes every check, by bisection on the length between minLength and maxLength
 * (supports and loads scaled with the length). Ratios grow with the span for the usual layouts.
 */
export function largestSpan(json: unknown, tables: MaterialTables): SpanOutput {
  const input = parseWith<SpanInput>(spanInputSchema, json);
  const member = resolveMember(input.member, tables);
  const run = (L: number) => checkMember(scaled(input, L), tables);
  const spansAt = (L: number) => {
    const xs = [0, ...input.supports.map((sp) => (sp.x * L) / input.lengthFt), L].sort((a, b) => a - b);
    const out: { from: number; to: number; length: number }[] = [];
    for (let i = 1; i < xs.length; i++) {
      if (xs[i] - xs[i - 1] > 1e-9)
        out.push({ from: Math.floor(xs[i - 1] * 100) / 100, to: Math.floor(xs[i] * 100) / 100, length: Math.floor((xs[i] - xs[i - 1]) * 100) / 100 });
    }
    return out;
  };
  const base = { member: member.spec, label: member.label };
  let lo = input.minLengthFt;
  let hi = input.maxLengthFt;
  const atLo = run(lo);
  if (!atLo.pass) {
    return {
      ...base,
      largestSpan: null,
      spans: [],
      largestSpanIn: null,
      governing: atLo.governing,
      atMaxLength: false,
      check: atLo,
      note: `fails even at ${lo} ft`,
    };
  }
  const atHi = run(hi);
  if (atHi.pass) {
    return {
      ...base,
      largestSpan: hi,
      spans: spansAt(hi),
      largestSpanIn: hi * 12,
      governing: null,
      atMaxLength: true,
      check: atHi,
      note: `passes at the search limit of ${hi} ft`,
    };
  }
  let best = atLo;
  let failGov = atHi.governing;
  while ((hi - lo) * 12 > input.toleranceIn) {
    const mid = (lo + hi) / 2;
    const r = run(mid);
    if (r.pass) {
      lo = mid;
      best = r;
    } else {
      hi = mid;
      failGov = r.governing;
    }
  }
  const inches = Math.floor(lo * 12 * 16) / 16;
  return {
    ...base,
    largestSpan: Math.floor(lo * 100) / 100,
    spans: spansAt(lo),
    largestSpanIn: inches,
    governing: failGov,
    atMaxLength: false,
    check: best,
    note: `${Math.floor(inches / 12)} ft ${Math.round((inches % 12) * 16) / 16} in ${input.supports.length === 2 && input.supports.every((sp) => sp.x === 0 || sp.x === input.lengthFt) ? "center to center of supports" : "member length, supports and loads scaled with it"}; ${failGov ?? "a check"} governs just beyond`,
  };
}

export { summarizeMember };
