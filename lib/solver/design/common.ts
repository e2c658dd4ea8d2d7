/** Checks and reports shared by every material: deflection against the limits, reactions for the crew. */
import type { DesignContext } from "./context";
import { peakAbs, E_REF, I_REF, type ComboEnvelope } from "./load-model";
import type { NamedCheck, SupportReaction } from "./types";

const round = (v: number, n = 3) => Math.round(v * 10 ** n) / 10 ** n;

export interface DeflectionResult {
  check: NamedCheck | null;
  /** for total: dead-load part at the governing station (in) */
  deadPartIn: number;
}

/**
 * Largest deflection ratio over the regions and the given combinations: a span against
 * span/limit, an overhang's tip against 2 × overhang / limit (IRC 2021 Table R301.7 note).
 */
export function deflectionCheck(
  ctx: DesignContext,
  envs: ComboEnvelope[],
  name: "deflection-live" | "deflection-total",
  limit: number | null,
  swPlf: number,
  EPsi: number,
  IIn4: number,
): DeflectionResult {
  if (limit === null || envs.length === 0) return { check: null, deadPartIn: 0 };
  const { model } = ctx;
  const scale = (E_REF * I_REF) / (EPsi * IIn4);
  let best = { ratio: -1, demand: 0, allowed: 0, x: 0, i: 0, fD: 0, region: 0, combination: "" };
  for (let ri = 0; ri < model.regions.length; ri++) {
    const r = model.regions[ri];
    const ref = r.kind === "span" ? r.length : 2 * r.length;
    const allowed = (ref * 12) / limit;
    for (const env of envs) {
      const p = peakAbs(model.xs, env.Dmax, env.Dmin, model.selfWeight.D, env.fD * swPlf, r.i0, r.i1);
      const demand = p.value * scale;
      const ratio = demand / allowed;
      if (ratio > best.ratio) best = { ratio, demand, allowed, x: p.x, i: p.i, fD: env.fD, region: ri, combination: env.name };
    }
  }
  const r = model.regions[best.region];
  const where = !ctx.notes
    ? ""
    : r.kind === "span"
      ? `span ${round(r.from, 2)}–${round(r.to, 2)} ft`
      : `overhang ${round(r.from, 2)}–${round(r.to, 2)} ft, tip against 2 × its length`;
  const check: NamedCheck = {
    name,
    demand: round(best.demand, 4),
    capacity: round(best.allowed, 4),
    unit: "in",
    ratio: best.ratio,
    combination: best.combination,
    x: round(best.x, 3),
    note: ctx.notes ? `${where}, L/${limit} = ${round(best.allowed, 3)} in` : "",
  };
  const bestI = best.i;
  const bestFd = best.fD;
  const dead = model.perCase.D;
  const deadPartIn = dead && bestFd !== 0 ? (dead.D[bestI] + swPlf * model.selfWeight.D[bestI]) * scale : 0;
  return { check, deadPartIn };
}

/** Per support: largest downward reaction and any uplift over the service combinations, with the case breakdown. */
export function reactionsFor(ctx: DesignContext, swPlf: number): Omit<SupportReaction, "requiredBearing" | "jackStuds" | "bearing">[] {
  const { model } = ctx;
  return model.supports.map((s, j) => {
    let maxDown = -Infinity;
    let maxDownCombination = "";
    let minUp = Infinity;
    let upliftCombination: string | null = null;
    for (const env of ctx.service) {
      const hi = env.Rmax[j] + env.fD * swPlf * model.selfWeight.R[j];
      const lo = env.Rmin[j] + env.fD * swPlf * model.selfWeight.R[j];
      if (hi > maxDown) {
        maxDown = hi;
        maxDownCombination = env.name;
      }
      if (lo < minUp) {
        minUp = lo;
        upliftCombination = env.name;
      }
    }
    const byCase: SupportReaction["byCase"] = {};
    for (const c of model.cases) {
      const a = model.perCase[c];
      if (!a) continue;
      byCase[c] = Math.round(a.R[j] + (c === "D" ? swPlf * model.selfWeight.R[j] : 0));
    }
    // live load placed span by span (ASCE 7 §4.3.3): the largest live reaction here, from the D+L envelope less the dead part
    const dl = model.patterned ? ctx.service.find((e) => e.factors.L === 1 && e.factors.D === 1 && Object.keys(e.factors).length === 2) : undefined;
    const liveMax = dl ? Math.round(dl.Rmax[j] + dl.fD * swPlf * model.selfWeight.R[j] - (byCase.D ?? 0)) : undefined;
    return {
      x: s.x,
      type: s.type,
      ...(liveMax !== undefined && liveMax > (byCase.L ?? 0) ? { liveMax } : {}),
      maxDown: Math.round(Math.max(maxDown, 0)),
      maxDownCombination,
      uplift: minUp < 0 ? Math.round(-minUp) : 0,
      upliftCombination: minUp < 0 ? upliftCombination : null,
      byCase,
    };
  });
}

/** Largest factored downward reaction at support j over the given envelopes, lb. */
export function factoredReaction(ctx: DesignContext, envs: ComboEnvelope[], j: number, swPlf: number): { R: number; combination: string } {
  let R = 0;
  let combination = envs[0]?.name ?? "";
  for (const env of envs) {
    const v = env.Rmax[j] + env.fD * swPlf * ctx.model.selfWeight.R[j];
    if (v > R) {
      R = v;
      combination = env.name;
    }
  }
  return { R, combination };
}

export { round };
