/**
 * The diagrams of one checked member, worked out once with its check so the answer screen, the crew
 * link and the job sheet draw the same curves under the same combinations: the loads by case, shear
 * and moment under the combination that governs strength, deflection and reactions under the service
 * combination that governs total-load deflection. Exact: the solver's polynomial segments.
 */
import { analyzeBeam, type Segment } from "../beam";
import type { Combination, Load, LoadCase, Reaction, Support } from "../types";
import type { CombinationRef, DesignCheck, SupportReaction } from "./types";

/** A labeled extreme of a diagram: value and where, ft. */
export interface DiagramExtreme {
  x: number;
  value: number;
  label: string;
}

export interface MemberDiagrams {
  lengthFt: number;
  supports: Support[];
  /** the loads the member carries, unfactored, by case (the member's own weight as D when counted); same-case bands over the same stretch added */
  loads: (Load & { case: LoadCase })[];
  /** E and I the deflection was drawn with: psi, in⁴ */
  EPsi: number;
  IIn4: number;
  /** shear (lb) and moment (lb-ft) under the combination that governs strength */
  strength: { combination: CombinationRef; segments: Segment[]; shear: DiagramExtreme[]; moment: DiagramExtreme[] };
  /** deflection (in, down positive) and reactions (lb, up positive) under the service combination that governs deflection */
  service: { combination: CombinationRef; segments: Segment[]; deflection: DiagramExtreme[]; reactions: Reaction[] };
}

export interface DiagramSource {
  lengthFt: number;
  supports: Support[];
  /** the taken-down loads */
  loads: (Load & { case: LoadCase })[];
  /** lb/ft of dead load for the member's own weight, 0 when not counted */
  selfWeightPlf: number;
  EPsi: number;
  IIn4: number;
  checks: readonly DesignCheck[];
  reactions: readonly SupportReaction[];
  /** name → factors of every combination the checks may name */
  combinations: ReadonlyMap<string, Combination>;
}

const STRENGTH_ORDER = ["bending", "shear", "stability"] as const;

/** The strength combination: bending's, else shear's, else any strength check's. */
export function strengthCombination(checks: readonly DesignCheck[]): CombinationRef | null {
  for (const name of STRENGTH_ORDER) {
    const c = checks.find((k) => k.name === name && k.combination);
    if (c?.combination) return c.combination;
  }
  return checks.find((k) => k.combination && !k.name.startsWith("deflection"))?.combination ?? null;
}

/** The service combination: total-load deflection's, else the one giving the largest downward reaction. */
export function serviceCombination(
  checks: readonly DesignCheck[],
  reactions: readonly SupportReaction[],
  combinations: ReadonlyMap<string, Combination>,
): CombinationRef | null {
  const total = checks.find((c) => c.name === "deflection-total" && c.combination)?.combination;
  if (total) return total;
  const largest = [...reactions].sort((a, b) => b.maxDown - a.maxDown)[0];
  const factors = largest ? combinations.get(largest.maxDownCombination) : undefined;
  return largest && factors ? { name: largest.maxDownCombination, factors } : null;
}

/** Same-case uniform loads over the same stretch drawn as one band. */
function mergeBands(loads: readonly (Load & { case: LoadCase })[]): (Load & { case: LoadCase })[] {
  const out: (Load & { case: LoadCase })[] = [];
  for (const l of loads) {
    if (l.type === "udl") {
      const same = out.find(
        (o): o is Extract<Load, { type: "udl" }> & { case: LoadCase } =>
          o.type === "udl" && o.case === l.case && Math.abs(o.from - l.from) < 1e-9 && Math.abs(o.to - l.to) < 1e-9,
      );
      if (same) {
        same.w += l.w;
        continue;
      }
    }
    out.push({ ...l });
  }
  return out;
}

// Coefficients keep 12 significant figures: far below what a drawing or a label can show, and the JSON stays small.
const sig = (v: number) => (v === 0 ? 0 : Number(v.toPrecision(12)));
const round6 = (v: number) => Math.round(v * 1e6) / 1e6;

function compact(segments: Segment[]): Segment[] {
  return segments.map((s) => ({ x0: s.x0, x1: s.x1, V: s.V.map(sig), M: s.M.map(sig), slope: s.slope.map(sig), deflection: s.deflection.map(sig) }));
}

const extreme = (x: number, value: number, label: string): DiagramExtreme => ({ x: round6(x), value: round6(value), label });

/** The member's diagrams; null when no check names a combination (nothing to draw). */
export function memberDiagrams(src: DiagramSource): MemberDiagrams | null {
  const strength = strengthCombination(src.checks);
  const service = serviceCombination(src.checks, src.reactions, src.combinations) ?? strength;
  if (!strength || !service) return null;
  const loads: (Load & { case: LoadCase })[] = src.loads.map((l) => ({ ...l }));
  if (src.selfWeightPlf > 0) loads.push({ type: "udl", case: "D", from: 0, to: src.lengthFt, w: src.selfWeightPlf });
  const beam = { length: src.lengthFt, E: src.EPsi, I: src.IIn4, supports: src.supports, loads };
  const own = src.selfWeightPlf > 0 ? 1 : 0;
  const a = analyzeBeam(beam, strength.factors, own);
  const d = service.name === strength.name ? a : analyzeBeam(beam, service.factors, own);
  const e = a.extremes;
  const moment: DiagramExtreme[] = [];
  if (e.Mpos.value > 1e-6) moment.push(extreme(e.Mpos.x, e.Mpos.value, "Largest moment"));
  if (e.Mneg.value < -1e-6) moment.push(extreme(e.Mneg.x, e.Mneg.value, "Largest hogging moment"));
  const deflection: DiagramExtreme[] = [];
  if (d.extremes.deflDown.value > 1e-9) deflection.push(extreme(d.extremes.deflDown.x, d.extremes.deflDown.value, "Largest sag"));
  if (d.extremes.deflUp.value < -1e-9) deflection.push(extreme(d.extremes.deflUp.x, d.extremes.deflUp.value, "Largest lift"));
  return {
    lengthFt: src.lengthFt,
    supports: src.supports.map((s) => ({ x: s.x, type: s.type })),
    loads: mergeBands(loads),
    EPsi: src.EPsi,
    IIn4: src.IIn4,
    strength: { combination: strength, segments: compact(a.segments), shear: [extreme(e.Vabs.x, e.Vabs.value, "Largest shear")], moment },
    service: {
      combination: service,
      segments: compact(d.segments),
      deflection,
      reactions: d.reactions.map((r) => ({ x: r.x, F: round6(r.F), M: round6(r.M) })),
    },
  };
}
