/**
 * Envelopes over load combinations, with pattern (skip) live loading on continuous beams.
 *
 * Every run is a linear superposition of unit responses computed once per layout: one per load
 * case, and for the patterned cases one per case and span (overhangs count as spans here), so a
 * run costs a weighted sum of coefficient arrays plus the root finding of its extremes.
 *
 * Patterns (common practice for continuous beams): live load on all spans, on alternate spans
 * (odd, even), and on the two spans beside each interior support. A pattern that loads the same
 * spans as another (because some spans carry no patterned load) is analyzed once.
 */
import type { BeamInput, Extreme, LoadCase, NamedCombination } from "./types";
import { makeAnalysis, type BeamAnalysis } from "./beam/analysis";
import { combineResponses, prepareBeam, respond, type PreparedBeam, type Region, type Response } from "./beam/prepare";

export interface EnvelopeRun {
  combination: NamedCombination;
  /** which spans carry the patterned cases: "all spans", "spans 1,3", "spans 2-3", "span 1 + right overhang" */
  pattern: string;
  analysis: BeamAnalysis;
}

export type RunExtreme = Extreme & { run: number };

export interface EnvelopeReaction {
  x: number;
  /** the largest bearing: F (lb, up on the member) at its largest, and the run that gives it */
  maxDown: { F: number; run: number };
  /** the largest uplift: F at its smallest (negative when the member must be held down) */
  maxUp: { F: number; run: number };
}

export interface Envelope {
  runs: EnvelopeRun[];
  /** largest M over all runs (lb-ft) */
  Mmax: RunExtreme;
  /** smallest M over all runs (lb-ft) */
  Mmin: RunExtreme;
  /** largest |V|, sign kept (lb) */
  Vabs: RunExtreme;
  /** largest downward deflection (in) */
  deflDown: RunExtreme;
  /** largest upward deflection, as the smallest deflection (in) */
  deflUp: RunExtreme;
  /** in the order of input.supports */
  reactions: EnvelopeReaction[];
}

export interface EnvelopeOptions {
  /** pattern the live load (default true) */
  pattern?: boolean;
  /** cases to pattern (default ["L"]) */
  patternCases?: LoadCase[];
}

function regionLabel(regions: Region[], chosen: boolean[], loaded: boolean[]): string {
  const all = regions.every((_, r) => chosen[r] === loaded[r]);
  if (all) return "all spans";
  const spans = regions.filter((r, i) => chosen[i] && r.kind === "span").map((r) => r.spanNo);
  const parts: string[] = [];
  if (chosen[0] && regions[0].kind === "overhang-left") parts.push("left overhang");
  if (spans.length) {
    const runs: string[] = [];
    let i = 0;
    while (i < spans.length) {
      let j = i;
      while (j + 1 < spans.length && spans[j + 1] === spans[j] + 1) j++;
      if (j - i >= 1) {
        runs.push(`${spans[i]}-${spans[j]}`);
        i = j + 1;
      } else {
        runs.push(String(spans[i]));
        i++;
      }
    }
    parts.push(`${spans.length === 1 ? "span" : "spans"} ${runs.join(",")}`);
  }
  const last = regions.length - 1;
  if (chosen[last] && regions[last].kind === "overhang-right") parts.push("right overhang");
  return parts.join(" + ");
}

/** The region subsets to load: all, alternate, and the pair beside each interior support. */
function patternSets(n: number): boolean[][] {
  const sets: boolean[][] = [Array.from({ length: n }, () => true)];
  sets.push(Array.from({ length: n }, (_, i) => i % 2 === 0));
  sets.push(Array.from({ length: n }, (_, i) => i % 2 === 1));
  for (let b = 0; b + 1 < n; b++) sets.push(Array.from({ length: n }, (_, i) => i === b || i === b + 1));
  return sets;
}

export function envelope(input: BeamInput, combos: NamedCombination[], opts: EnvelopeOptions = {}): Envelope {
  if (combos.length === 0) throw new RangeError("envelope: give at least one combination");
  const prep: PreparedBeam = prepareBeam(input);
  const patterned = new Set<LoadCase>(opts.pattern === false ? [] : (opts.patternCases ?? ["L"]));
  const nreg = prep.regions.length;

  // Unit responses: one per case, or per (case, region) for patterned cases.
  interface Group {
    loadCase: LoadCase;
    region: number;
    resp: Response;
  }
  const groups: Group[] = [];
  const keyOf = (c: LoadCase, r: number) => `${c}:${patterned.has(c) ? r : -1}`;
  const keys = new Map<string, { loadCase: LoadCase; region: number; w: Float64Array }>();
  prep.pieces.forEach((p, i) => {
    const k = keyOf(p.loadCase, p.region);
    let g = keys.get(k);
    if (!g) {
      g = { loadCase: p.loadCase, region: patterned.has(p.loadCase) ? p.region : -1, w: new Float64Array(prep.pieces.length) };
      keys.set(k, g);
    }
    g.w[i] = 1;
  });
  for (const g of keys.values()) groups.push({ loadCase: g.loadCase, region: g.region, resp: respond(prep, g.w) });
  const parts = groups.map((g) => g.resp);
  if (parts.length === 0) parts.push(respond(prep, new Float64Array(prep.pieces.length)));

  const runs: EnvelopeRun[] = [];
  const coefs = new Float64Array(parts.length);
  for (const combo of combos) {
    const loaded = Array.from({ length: nreg }, (_, r) => groups.some((g) => g.region === r && (combo.factors[g.loadCase] ?? 0) !== 0));
    const seen = new Set<string>();
    for (const set of patternSets(nreg)) {
      const eff = set.map((v, r) => v && loaded[r]);
      const key = eff.map((v) => (v ? 1 : 0)).join("");
      if (seen.has(key)) continue;
      if (!eff.some(Boolean) && loaded.some(Boolean)) continue;
      seen.add(key);
      groups.forEach((g, i) => {
        const f = combo.factors[g.loadCase] ?? 0;
        coefs[i] = g.region < 0 || eff[g.region] ? f : 0;
      });
      const resp = groups.length ? combineResponses(parts, coefs) : parts[0];
      runs.push({ combination: combo, pattern: regionLabel(prep.regions, eff, loaded), analysis: makeAnalysis(prep, resp) });
    }
  }

  const pick = (get: (a: BeamAnalysis) => Extreme, better: (v: number, best: number) => boolean): RunExtreme => {
    let best: RunExtreme = { ...get(runs[0].analysis), run: 0 };
    for (let i = 1; i < runs.length; i++) {
      const e = get(runs[i].analysis);
      if (better(e.value, best.value)) best = { ...e, run: i };
    }
    return best;
  };
  const scale = (v: number) => 1e-12 * Math.max(1, Math.abs(v));
  const reactions: EnvelopeReaction[] = prep.supports.map((s, j) => {
    let maxDown = { F: runs[0].analysis.reactions[j].F, run: 0 };
    let maxUp = { F: maxDown.F, run: 0 };
    for (let i = 1; i < runs.length; i++) {
      const F = runs[i].analysis.reactions[j].F;
      if (F > maxDown.F + scale(maxDown.F)) maxDown = { F, run: i };
      if (F < maxUp.F - scale(maxUp.F)) maxUp = { F, run: i };
    }
    return { x: s.x, maxDown, maxUp };
  });
  return {
    runs,
    Mmax: pick(
      (a) => a.extremes.Mpos,
      (v, b) => v > b + scale(b),
    ),
    Mmin: pick(
      (a) => a.extremes.Mneg,
      (v, b) => v < b - scale(b),
    ),
    Vabs: pick(
      (a) => a.extremes.Vabs,
      (v, b) => Math.abs(v) > Math.abs(b) + scale(b),
    ),
    deflDown: pick(
      (a) => a.extremes.deflDown,
      (v, b) => v > b + scale(b),
    ),
    deflUp: pick(
      (a) => a.extremes.deflUp,
      (v, b) => v < b - scale(b),
    ),
    reactions,
  };
}
