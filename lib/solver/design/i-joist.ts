/**
 * Prefabricated wood I-joists (NDS 2018 Chapter 7, with the design properties of the I-joist's own
 * standard, APA PRI-400): the member is checked against its published capacities, not the sawn-lumber
 * stress formulas. ASD only, dry service, normal temperature.
 *
 *   moment     M ≤ M' = M · CD                       (NDS 2018 §7.3, Table 7.3.1; compression flange braced)
 *   shear      V ≤ V' = V · CD
 *   reactions  end: ER at the bearing given, straight line between 1-3/4 and 4 in, with or without web
 *              stiffeners; interior: IR at 3-1/2 in bearing or more, each × CD
 *   deflection bending plus shear: Δ = Δ_EI + M(x)/(K/8) measured from the line through the supports,
 *              which for a uniform load on a simple span is 5wL⁴/384EI + wL²/K (APA PRI-400; ICC-ES
 *              ESR-1405's equation)
 */
import type { IJoist } from "@/lib/tables/types";
import { deflectionCheck, reactionsFor, round } from "./common";
import type { DesignContext } from "./context";
import { DesignInputError } from "./errors";
import { E_REF, I_REF, peakAbs } from "./load-model";
import type { MemberSpec } from "./schema";
import type { NamedCheck, SupportReaction } from "./types";

export interface IJoistMember {
  kind: "ijoist";
  spec: MemberSpec;
  label: string;
  joist: IJoist;
  stiffeners: boolean;
  d: number;
  weightPlf: number;
  sources: string[];
  costPerFoot?: number;
}

export interface IJoistFactors {
  method: "asd";
  /** load duration factor of the governing moment combination */
  CD: number;
  M: number;
  MPrime: number;
  V: number;
  VPrime: number;
  /** bending stiffness EI, lbf-in² (dry service, normal temperature: EI' = EI) */
  EIPrime: number;
  K: number;
  webStiffeners: boolean;
}

/** Allowable end reaction at a bearing length, lbf: APA permits a straight line between 1-3/4 and 4 in; null under 1-3/4 in. */
export function endReactionCapacity(j: IJoist, bearingIn: number, stiffeners: boolean): number | null {
  const a = stiffeners ? j.ER175Stiffened : j.ER175;
  const b = stiffeners ? j.ER4Stiffened : j.ER4;
  if (bearingIn < 1.75 - 1e-9) return null;
  if (bearingIn >= 4) return b;
  return a + ((b - a) * (bearingIn - 1.75)) / (4 - 1.75);
}

/** Allowable intermediate reaction, lbf: the table gives it at 3-1/2 in bearing; null under that. */
export function intermediateReactionCapacity(j: IJoist, bearingIn: number): number | null {
  return bearingIn >= 3.5 - 1e-9 ? j.IR : null;
}

/** Uniform load on a simple span: bending plus shear deflection, in (APA PRI-400 / ESR-1405 form). w lb/ft, L ft. */
export function uniformDeflectionIn(wPlf: number, spanFt: number, EI: number, K: number): number {
  const w = wPlf / 12;
  const L = spanFt * 12;
  return (5 * w * L ** 4) / (384 * EI) + (w * L * L) / K;
}

/** Shear deflection along the member for one moment array: (M − the line through the supports) × 8/K, in. */
function shearDeflection(ctx: DesignContext, M: (i: number) => number, K: number): (i: number) => number {
  const { model } = ctx;
  const regions = model.regions;
  const line = (ri: number): ((x: number) => number) => {
    const r = regions[ri];
    if (r.kind === "span") {
      const m0 = M(r.i0);
      const m1 = M(r.i1);
      return (x) => m0 + ((m1 - m0) * (x - r.from)) / (r.to - r.from);
    }
    // an overhang takes the line of the span beside it, extended (no span beside it: the support's moment)
    const next = r.kind === "overhang-left" ? ri + 1 : ri - 1;
    if (regions[next]?.kind === "span") return line(next);
    const m = M(r.kind === "overhang-left" ? r.i1 : r.i0);
    return () => m;
  };
  const lines = regions.map((_, ri) => line(ri));
  const regionOf = (i: number) => regions.findIndex((r) => i >= r.i0 && i <= r.i1);
  return (i) => ((M(i) - lines[Math.max(0, regionOf(i))](model.xs[i])) * 12 * 8) / K;
}

/** Bending plus shear deflection against the limit, each region, each combination. */
function deflectionWithShear(ctx: DesignContext, name: "deflection-live" | "deflection-total", limit: number | null, sw: number, j: IJoist): NamedCheck | null {
  const envs = name === "deflection-live" ? ctx.live : ctx.service;
  const bending = deflectionCheck(ctx, envs, name, limit, sw, j.EI / I_REF, I_REF);
  if (!bending.check || limit === null) return null;
  const { model } = ctx;
  const scale = (E_REF * I_REF) / j.EI;
  let best = { ratio: -1, demand: 0, allowed: 0, x: 0, combination: "", bend: 0, shear: 0 };
  for (const r of model.regions) {
    const allowed = ((r.kind === "span" ? r.length : 2 * r.length) * 12) / limit;
    for (const env of envs) {
      const k = env.fD * sw;
      const hi = shearDeflection(ctx, (i) => env.Mmax[i] + k * model.selfWeight.M[i], j.K);
      const lo = shearDeflection(ctx, (i) => env.Mmin[i] + k * model.selfWeight.M[i], j.K);
      for (let i = r.i0; i <= r.i1; i++) {
        const bend = Math.max(Math.abs(env.Dmax[i] + k * model.selfWeight.D[i]), Math.abs(env.Dmin[i] + k * model.selfWeight.D[i])) * scale;
        const shear = Math.max(Math.abs(hi(i)), Math.abs(lo(i)));
        const demand = bend + shear;
        if (demand / allowed > best.ratio) best = { ratio: demand / allowed, demand, allowed, x: model.xs[i], combination: env.name, bend, shear };
      }
    }
  }
  // the bending part alone, found with the refined peak, may sit a hair higher than the station value
  const check = bending.check;
  if (check.demand > best.bend && best.ratio < check.ratio) return check;
  return {
    name,
    demand: round(best.demand, 4),
    capacity: round(best.allowed, 4),
    unit: "in",
    ratio: best.ratio,
    combination: best.combination,
    x: round(best.x, 3),
    note: ctx.notes
      ? `bending ${round(best.bend, 3)} in (EI = ${round(j.EI / 1e6, 1)} × 10⁶ lbf-in²) + shear ${round(best.shear, 3)} in (K = ${round(j.K / 1e6, 2)} × 10⁶ lbf), each at its worst loading; L/${limit} = ${round(best.allowed, 3)} in`
      : "",
  };
}

export function evaluateIJoist(m: IJoistMember, ctx: DesignContext): { checks: NamedCheck[]; reactions: SupportReaction[]; factors: IJoistFactors } {
  if (ctx.method !== "asd")
    throw new DesignInputError([{ path: "method", message: "I-joists are checked in ASD here (their published values are allowable loads)" }]);
  if (ctx.conditions.wet)
    throw new DesignInputError([
      { path: "conditions.wet", message: "I-joists are for dry service only (APA PRI-400); use sawn lumber or glulam where it stays wet" },
    ]);
  if (ctx.conditions.temperatureF > 100)
    throw new DesignInputError([{ path: "conditions.temperatureF", message: "I-joists are checked at normal temperatures only here (up to 100 °F)" }]);
  const { model } = ctx;
  const j = m.joist;
  const sw = ctx.conditions.selfWeight ? m.weightPlf : 0;
  const checks: NamedCheck[] = [];

  // Moment and shear against the published capacities × CD.
  let bend = { ratio: -1, M: 0, cap: 0, x: 0, CD: 1, combination: "" };
  let shear = { ratio: -1, V: 0, cap: 0, x: 0, combination: "" };
  for (let e = 0; e < ctx.strength.length; e++) {
    const env = ctx.strength[e];
    const CD = ctx.woodDuration[e];
    const pm = peakAbs(model.xs, env.Mmax, env.Mmin, model.selfWeight.M, env.fD * sw, 0, model.xs.length - 1);
    const capM = j.M * CD;
    if (pm.value / capM > bend.ratio) bend = { ratio: pm.value / capM, M: pm.value, cap: capM, x: pm.x, CD, combination: env.name };
    const pv = peakAbs(model.xs, env.Vmax, env.Vmin, model.selfWeight.V, env.fD * sw, 0, model.xs.length - 1, false);
    const capV = j.V * CD;
    if (pv.value / capV > shear.ratio) shear = { ratio: pv.value / capV, V: pv.value, cap: capV, x: pv.x, combination: env.name };
  }
  checks.push({
    name: "bending",
    demand: round(bend.M, 0),
    capacity: round(bend.cap, 0),
    unit: "lb-ft",
    ratio: bend.ratio,
    combination: bend.combination,
    x: round(bend.x, 3),
    note: ctx.notes ? `M' = ${j.M} lbf-ft × CD ${bend.CD} (${j.name}, compression flange braced by the floor or roof sheathing)` : "",
  });
  checks.push({
    name: "shear",
    demand: round(shear.V, 0),
    capacity: round(shear.cap, 0),
    unit: "lb",
    ratio: shear.ratio,
    combination: shear.combination,
    x: round(shear.x, 3),
    note: ctx.notes ? `V' = ${j.V} lbf × CD; every load counted, none left out near the supports` : "",
  });

  const live = deflectionWithShear(ctx, "deflection-live", ctx.limits.live, sw, j);
  if (live) checks.push(live);
  const total = deflectionWithShear(ctx, "deflection-total", ctx.limits.total, sw, j);
  if (total) checks.push(total);

  // Reactions against the published end and intermediate reaction capacities × CD.
  const service = reactionsFor(ctx, sw);
  const reactions: SupportReaction[] = [];
  let worst = { ratio: -1, R: 0, cap: 0, x: 0, combination: "", words: "" };
  model.supports.forEach((s, jx) => {
    const end = Math.min(s.x, model.length - s.x) <= 1e-6;
    // the least bearing the table gives a capacity for: 1-3/4 in at an end, 3-1/2 in at an interior support;
    // a shorter bearing given is checked at that least length, and the answer asks for it (requiredBearing)
    const least = end ? 1.75 : 3.5;
    const bearing = Math.max(ctx.bearingIn, least);
    const base = end ? (endReactionCapacity(j, bearing, m.stiffeners) as number) : (intermediateReactionCapacity(j, bearing) as number);
    const words = end
      ? `end reaction at ${bearing} in bearing${m.stiffeners ? ", web stiffeners" : ", no web stiffeners"}`
      : "intermediate reaction at 3-1/2 in bearing or more";
    const shortWords =
      ctx.bearingIn < least ? `; ${ctx.bearingIn} in given is less than the ${least} in the table starts at, so the answer asks for ${least} in` : "";
    for (let e = 0; e < ctx.strength.length; e++) {
      const env = ctx.strength[e];
      const R = env.Rmax[jx] + env.fD * sw * model.selfWeight.R[jx];
      const cap = base * ctx.woodDuration[e];
      if (R / cap > worst.ratio) worst = { ratio: R / cap, R, cap, x: s.x, combination: env.name, words: words + shortWords };
    }
    reactions.push({ ...service[jx], bearing: ctx.bearingIn, requiredBearing: least, jackStuds: null });
  });
  if (worst.ratio >= 0) {
    checks.push({
      name: "bearing",
      demand: round(worst.R, 0),
      capacity: round(worst.cap, 0),
      unit: "lb",
      ratio: worst.ratio,
      combination: worst.combination,
      x: worst.x,
      note: ctx.notes ? `${worst.words} (${j.name}); the support under it is not checked` : "",
    });
  }

  return {
    checks,
    reactions,
    factors: {
      method: "asd",
      CD: bend.CD,
      M: j.M,
      MPrime: round(bend.cap, 0),
      V: j.V,
      VPrime: round(shear.cap, 0),
      EIPrime: j.EI,
      K: j.K,
      webStiffeners: m.stiffeners,
    },
  };
}
