/**
 * Steel W-shape checks, AISC 360-16 (ASD by default, LRFD on request): flexure (yielding,
 * lateral-torsional buckling with Cb from each unbraced segment's moment diagram, compression
 * flange local buckling), shear (G2.1), deflection with E = 29,000 ksi, web local yielding and
 * web crippling at the supports (J10.2, J10.3).
 */
import {
  E_STEEL_KSI,
  limitingLengthLp,
  limitingLengthLr,
  ltbModifierCb,
  nominalFlexureFLB,
  nominalFlexureLTB,
  nominalShearVn,
  OMEGA_B,
  OMEGA_WCR,
  OMEGA_WLY,
  PHI_B,
  PHI_WCR,
  PHI_WLY,
  plasticMomentMp,
  webCompactLimit,
  webCripplingRn,
  webLocalYieldingRn,
} from "../aisc360/aisc360-16";
import { deflectionCheck, factoredReaction, reactionsFor, round } from "./common";
import type { DesignContext } from "./context";
import { momentNoise, peakAbs, peakOnEdge } from "./load-model";
import type { SteelMember } from "./member";
import type { NamedCheck, SupportReaction } from "./types";

export interface SteelFactors {
  method: "asd" | "lrfd";
  Fy: number;
  /** kip-ft */
  Mp: number;
  /** ft */
  Lp: number;
  Lr: number;
  /** unbraced length and Cb of the segment governing flexure */
  Lb: number;
  Cb: number;
  /** governing nominal flexural strength, kip-ft, and the limit state that sets it */
  Mn: number;
  flexureLimitState: "yielding" | "lateral-torsional buckling" | "flange local buckling";
  /** Ωb or φb */
  omegaB: number | null;
  phiB: number | null;
  /** kip */
  Vn: number;
  Cv1: number;
  omegaV: number | null;
  phiV: number | null;
  shearClause: string;
  /** ksi */
  E: number;
}

/**
 * Shortest bearing length (in) for which web local yielding (J10.2) and web crippling (J10.3) both
 * carry the reaction Rk (kip); both strengths grow with the bearing length, so bisection finds it.
 * Returns Infinity when even 48 in is not enough.
 */
export function requiredSteelBearing(
  s: { d: number; tw: number; tf: number; kdes: number },
  Fy: number,
  Rk: number,
  nearEndWly: boolean,
  nearEndWcr: boolean,
  lrfd: boolean,
): number {
  const ok = (lb: number) => {
    const wly = webLocalYieldingRn(s, Fy, lb, nearEndWly);
    const wcr = webCripplingRn(s, Fy, lb, nearEndWcr);
    return lrfd ? PHI_WLY * wly >= Rk && PHI_WCR * wcr >= Rk : wly / OMEGA_WLY >= Rk && wcr / OMEGA_WCR >= Rk;
  };
  if (ok(0)) return 0;
  let hi = 48;
  if (!ok(hi)) return Infinity;
  let lo = 0;
  while (hi - lo > 1 / 64) {
    const mid = (lo + hi) / 2;
    if (ok(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

export function evaluateSteel(m: SteelMember, ctx: DesignContext): { checks: NamedCheck[]; reactions: SupportReaction[]; factors: SteelFactors } {
  const { model, conditions: cond } = ctx;
  const lrfd = ctx.method === "lrfd";
  const s = m.shape;
  const Fy = m.grade.Fy;
  const sw = cond.selfWeight ? m.weightPlf : 0;
  const xs = model.xs;
  const checks: NamedCheck[] = [];
  const avail = (Rn: number, omega: number, phi: number) => (lrfd ? phi * Rn : Rn / omega);

  const webLimit = webCompactLimit(Fy);
  if (s.h_tw > webLimit) {
    checks.push({
      name: "web-compactness",
      demand: s.h_tw,
      capacity: round(webLimit, 2),
      unit: "h/tw",
      ratio: s.h_tw / webLimit,
      combination: null,
      x: null,
      note: "noncompact or slender web for flexure: AISC 360-16 §F4/F5 are not covered here",
    });
  }

  const Mp = plasticMomentMp(Fy, s.Zx);
  const MnFLB = nominalFlexureFLB(s, Fy);
  let bend: NamedCheck | null = null;
  let gov = { Lb: 0, Cb: 1, Mn: Mp, state: "yielding" as SteelFactors["flexureLimitState"] };
  // Each edge against the moment that puts it in compression: the top flange where the member sags
  // (Lb from the top edge's braces), the bottom flange where it hogs (braced at the supports only unless
  // given otherwise). Cb from the segment's moment diagram (Eq. F1-1) for the top flange; 1.0 for the
  // bottom flange: with the top flange braced, Eq. F1-1 does not apply and the Commentary's method for
  // that case was not found in a published copy, so the conservative 1.0 is used (and 1.0 on a
  // cantilever's free end, §F1).
  const noise = momentNoise(model, ctx.strength, sw);
  for (const seg of model.segments) {
    const LbIn = seg.luFt * 12;
    for (const env of ctx.strength) {
      const k = env.fD * sw;
      const p = peakOnEdge(model, env, k, seg);
      if (seg.edge === "bottom" && !(p.value > noise)) continue;
      const absAt = (i: number) => Math.max(Math.abs(env.Mmax[i] + k * model.selfWeight.M[i]), Math.abs(env.Mmin[i] + k * model.selfWeight.M[i]));
      const bottom = seg.edge === "bottom";
      const Mabs = bottom ? p.value : peakAbs(xs, env.Mmax, env.Mmin, model.selfWeight.M, k, seg.i0, seg.i1).value;
      const Cb = bottom || seg.cantilever || LbIn === 0 ? 1.0 : ltbModifierCb(Mabs, absAt(seg.iA), absAt(seg.iB), absAt(seg.iC));
      const MnLTB = LbIn === 0 ? Mp : nominalFlexureLTB(s, Fy, LbIn, Cb);
      const Mn = Math.min(MnLTB, MnFLB);
      const capacity = avail(Mn, OMEGA_B, PHI_B) / 12; // kip-ft
      const demand = p.value / 1000; // kip-ft
      const ratio = demand / capacity;
      if (!bend || ratio > bend.ratio) {
        const state: SteelFactors["flexureLimitState"] = MnFLB < MnLTB ? "flange local buckling" : MnLTB < Mp ? "lateral-torsional buckling" : "yielding";
        const flange = bottom
          ? `moment that hogs: bottom flange in compression, ${LbIn > 0 ? `braced only at the supports, Lb = ${round(seg.luFt, 2)} ft, Cb = 1.0 (taken conservatively with the top flange braced)` : "braced along its length, as given"}`
          : `moment that sags: top flange in compression, Lb = ${round(seg.luFt, 2)} ft, Cb = ${round(Cb, 3)}`;
        bend = {
          name: "bending",
          demand: round(demand, 3),
          capacity: round(capacity, 3),
          unit: "kip-ft",
          ratio,
          combination: env.name,
          x: round(p.x, 3),
          note: !ctx.notes ? "" : `${lrfd ? "φb Mn" : "Mn/Ωb"} with Mn by ${state} (AISC 360-16 ${state === "flange local buckling" ? "F3" : "F2"}); ${flange}`,
        };
        gov = { Lb: seg.luFt, Cb, Mn, state };
      }
    }
  }
  if (bend) checks.push(bend);

  const shearStrength = nominalShearVn(s, Fy);
  let shear: NamedCheck | null = null;
  const Va = avail(shearStrength.Vn, shearStrength.omega, shearStrength.phi);
  for (const env of ctx.strength) {
    const k = env.fD * sw;
    const p = peakAbs(xs, env.Vmax, env.Vmin, model.selfWeight.V, k, 0, xs.length - 1, false);
    const demand = p.value / 1000;
    const ratio = demand / Va;
    if (!shear || ratio > shear.ratio) {
      shear = {
        name: "shear",
        demand: round(demand, 3),
        capacity: round(Va, 3),
        unit: "kip",
        ratio,
        combination: env.name,
        x: round(p.x, 3),
        note: !ctx.notes ? "" : `Vn = 0.6 Fy Aw Cv1, Cv1 = ${round(shearStrength.Cv1, 3)} (AISC 360-16 ${shearStrength.clause})`,
      };
    }
  }
  if (shear) checks.push(shear);

  const EPsi = E_STEEL_KSI * 1000;
  const live = deflectionCheck(ctx, ctx.live, "deflection-live", ctx.limits.live, sw, EPsi, s.Ix);
  if (live.check) checks.push(live.check);
  const total = deflectionCheck(ctx, ctx.service, "deflection-total", ctx.limits.total, sw, EPsi, s.Ix);
  if (total.check) checks.push(total.check);

  const service = reactionsFor(ctx, sw);
  const reactions: SupportReaction[] = [];
  let wly: NamedCheck | null = null;
  let wcr: NamedCheck | null = null;
  model.supports.forEach((sup, j) => {
    const { R, combination } = lrfd ? factoredReaction(ctx, ctx.strength, j, sw) : { R: service[j].maxDown, combination: service[j].maxDownCombination };
    const Rk = R / 1000;
    const fromEndIn = Math.min(sup.x, model.length - sup.x) * 12;
    // J10.2: within d of the end; J10.3: less than d/2 from the end
    const nearEnd = fromEndIn <= s.d;
    const lb = ctx.bearingIn;
    const yieldCap = avail(webLocalYieldingRn(s, Fy, lb, nearEnd), OMEGA_WLY, PHI_WLY);
    const crippleCap = avail(webCripplingRn(s, Fy, lb, fromEndIn < s.d / 2), OMEGA_WCR, PHI_WCR);
    if (!wly || Rk / yieldCap > wly.ratio) {
      wly = {
        name: "web-yielding",
        demand: round(Rk, 3),
        capacity: round(yieldCap, 3),
        unit: "kip",
        ratio: Rk / yieldCap,
        combination,
        x: sup.x,
        note: `web local yielding at the support, lb = ${lb} in (AISC 360-16 §J10.2)`,
      };
    }
    if (!wcr || Rk / crippleCap > wcr.ratio) {
      wcr = {
        name: "web-crippling",
        demand: round(Rk, 3),
        capacity: round(crippleCap, 3),
        unit: "kip",
        ratio: Rk / crippleCap,
        combination,
        x: sup.x,
        note: `web crippling at the support, lb = ${lb} in (AISC 360-16 §J10.3)`,
      };
    }
    const required = requiredSteelBearing(s, Fy, Rk, nearEnd, fromEndIn < s.d / 2, lrfd);
    reactions.push({ ...service[j], bearing: lb, requiredBearing: Number.isFinite(required) ? round(required, 2) : 48, jackStuds: null });
  });
  if (wly) checks.push(wly);
  if (wcr) checks.push(wcr);

  const factors: SteelFactors = {
    method: ctx.method,
    Fy,
    Mp: round(Mp / 12, 2),
    Lp: round(limitingLengthLp(s.ry, Fy) / 12, 3),
    Lr: round(limitingLengthLr(s, Fy) / 12, 3),
    Lb: round(gov.Lb, 3),
    Cb: round(gov.Cb, 3),
    Mn: round(gov.Mn / 12, 2),
    flexureLimitState: gov.state,
    omegaB: lrfd ? null : OMEGA_B,
    phiB: lrfd ? PHI_B : null,
    Vn: round(shearStrength.Vn, 2),
    Cv1: shearStrength.Cv1,
    omegaV: lrfd ? null : shearStrength.omega,
    phiV: lrfd ? shearStrength.phi : null,
    shearClause: shearStrength.clause,
    E: E_STEEL_KSI,
  };
  return { checks, reactions, factors };
}
