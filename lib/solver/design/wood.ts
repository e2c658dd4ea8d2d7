/**
 * Wood member checks, NDS 2018 (ASD, or LRFD with KF, φ and λ from Appendix N): bending with every
 * adjustment factor and the beam stability factor per unbraced length, shear, deflection (live and
 * total, creep factor reported), bearing at every support with the required length and jack studs.
 */
import {
  adjustedE,
  adjustedEmin,
  adjustedFcPerp,
  adjustedFv,
  bearingAreaFactorCb,
  beamStabilityFactorCL,
  creepFactorKcr,
  criticalBucklingFbE,
  effectiveLengthLe,
  flatUseFactorCfu,
  FORMAT_CONVERSION_KF,
  incisingFactorCi,
  loadDurationFactorCD,
  repetitiveMemberFactorCr,
  RESISTANCE_PHI,
  slendernessRatioRB,
  temperatureFactorCt,
  timeEffectFactorLambda,
  volumeFactorCV,
  wetServiceFactorCM,
} from "../nds/nds-2018";
import { deflectionCheck, factoredReaction, reactionsFor, round } from "./common";
import type { DesignContext } from "./context";
import { peakAbs, type ComboEnvelope } from "./load-model";
import type { WoodMember } from "./member";
import type { DesignCheck, SupportReaction } from "./types";

/** Width of one jack stud, in (a 2x stud's dressed thickness). */
export const JACK_STUD_IN = 1.5;

export interface WoodFactors {
  method: "asd" | "lrfd";
  /** CD (ASD) or λ (LRFD) of the combination governing bending */
  CD: number | null;
  lambda: number | null;
  CM: { Fb: number; Fv: number; FcPerp: number; E: number };
  Ct: { Fb: number; Fv: number; FcPerp: number; E: number };
  CL: number;
  CF: number;
  CV: number | null;
  Cfu: number;
  Ci: { Fb: number; Fv: number; FcPerp: number; E: number };
  Cr: number;
  /** bearing area factor at the governing support */
  Cb: number;
  Kcr: number;
  KF: { Fb: number; Fv: number; FcPerp: number; Emin: number } | null;
  phi: { Fb: number; Fv: number; FcPerp: number; Emin: number } | null;
  /** reference and adjusted values, psi (Fb' and Fv' in the combination governing bending and shear) */
  Fb: number;
  FbPrime: number;
  Fv: number;
  FvPrime: number;
  FcPerp: number;
  FcPerpPrime: number;
  E: number;
  EPrime: number;
  Emin: number;
  EminPrime: number;
  /** NDS 2018 §3.4.3.1(a): uniform loads within d of each support left out of the shear check */
  shearLoadsNearSupportsIgnored: boolean;
  /** long-term deflection Kcr·ΔD + Δrest at the governing total-deflection point, in (NDS 2018 Eq. 3.5-1) */
  longTermDeflection: number | null;
}

export interface MemberEvaluation {
  checks: DesignCheck[];
  reactions: SupportReaction[];
  factors: WoodFactors;
}

function durationFactor(ctx: DesignContext, env: ComboEnvelope): number {
  return ctx.method === "lrfd" ? timeEffectFactorLambda(env.factors) : loadDurationFactorCD(env.factors);
}

export function evaluateWood(m: WoodMember, ctx: DesignContext): MemberEvaluation {
  const { model, conditions: cond } = ctx;
  const lrfd = ctx.method === "lrfd";
  const xs = model.xs;
  const sw = cond.selfWeight ? m.weightPlf : 0;

  const CM = m.wetTable === "scl" ? { Fb: 1, Fv: 1, FcPerp: 1, E: 1 } : wetServiceFactorCM(m.wetTable, cond.wet, m.Fb * m.CF);
  const Ct = temperatureFactorCt(cond.temperatureF, cond.wet);
  const Ci = m.dimensionLumber ? incisingFactorCi(cond.incised) : { Fb: 1, Fv: 1, FcPerp: 1, E: 1 };
  const Cr = repetitiveMemberFactorCr({ dimensionLumber: m.dimensionLumber, plies: m.plies, repetitiveSystem: cond.repetitive, spacingIn: ctx.spacingIn });
  const Cfu = m.material === "sawn" && m.dimensionLumber ? flatUseFactorCfu(m.nominalDepth, m.nominalThickness, cond.flat) : 1.0;
  const KF = lrfd ? FORMAT_CONVERSION_KF : null;
  const phi = lrfd ? RESISTANCE_PHI : null;
  const EPrime = adjustedE(m.E, { CM: CM.E, Ct: Ct.E, Ci: Ci.E });
  const EminPrime = adjustedEmin(m.Emin, { CM: CM.E, Ct: Ct.E, Ci: Ci.E }) * (lrfd ? FORMAT_CONVERSION_KF.Emin * RESISTANCE_PHI.Emin : 1);
  const longest = Math.max(...model.regions.map((r) => r.length));
  const CV = m.volumeX !== undefined ? volumeFactorCV(longest, m.d, m.plyWidth, m.volumeX) : null;
  const checks: DesignCheck[] = [];

  // Bending, per unbraced segment and combination (NDS 2018 §3.3).
  const fbBase = m.Fb * CM.Fb * Ct.Fb * m.CF * Ci.Fb * Cr * (lrfd ? FORMAT_CONVERSION_KF.Fb * RESISTANCE_PHI.Fb : 1);
  let bend: DesignCheck | null = null;
  let bendCD = 1;
  let bendCL = 1;
  let bendFbPrime = 0;
  let worstRB = 0;
  for (const seg of model.segments) {
    const luIn = seg.luFt * 12;
    const RB = luIn > 0 ? slendernessRatioRB(effectiveLengthLe(luIn, m.d), m.d, m.b) : 0;
    if (RB > worstRB) worstRB = RB;
    for (const env of ctx.strength) {
      const p = peakAbs(xs, env.Mmax, env.Mmin, model.selfWeight.M, env.fD * sw, seg.i0, seg.i1);
      const fb = (p.value * 12) / m.S;
      const CD = durationFactor(ctx, env);
      const FbStar = fbBase * CD;
      const CL = RB > 0 ? beamStabilityFactorCL(FbStar, criticalBucklingFbE(EminPrime, RB)) : 1.0;
      const stability = CV === null ? CL : Math.min(CL, CV);
      const FbPrime = FbStar * stability * Cfu;
      const ratio = fb / FbPrime;
      if (!bend || ratio > bend.ratio) {
        bend = {
          name: "bending",
          demand: round(fb, 1),
          capacity: round(FbPrime, 1),
          unit: "psi",
          ratio,
          combination: env.name,
          x: round(p.x, 3),
          note: `fb = M/S = ${round(p.value, 0)} lb-ft × 12 / ${round(m.S, 2)} in³; Fb' with ${lrfd ? "λ" : "CD"} = ${CD}, CL = ${round(CL, 3)}${seg.luFt > 0 ? ` (lu = ${round(seg.luFt, 2)} ft)` : " (compression edge braced)"}`,
        };
        bendCD = CD;
        bendCL = CL;
        bendFbPrime = FbPrime;
      }
    }
  }
  if (bend) checks.push(bend);
  if (worstRB > 0) {
    checks.push({
      name: "stability",
      demand: round(worstRB, 2),
      capacity: 50,
      unit: "RB",
      ratio: worstRB / 50,
      combination: null,
      x: null,
      note: "slenderness ratio RB = √(le d / b²) must not exceed 50 (NDS 2018 §3.3.3.7)",
    });
  }

  // Shear, fv = 3V/2A (NDS 2018 §3.4.2), optionally at d from each support (§3.4.3.1(a)).
  const dFt = m.d / 12;
  const excluded = (x: number) => cond.shearIgnoreLoadsNearSupports && model.supports.some((s) => Math.abs(x - s.x) < dFt);
  const fvBase = m.Fv * CM.Fv * Ct.Fv * Ci.Fv * (lrfd ? FORMAT_CONVERSION_KF.Fv * RESISTANCE_PHI.Fv : 1);
  let shear: DesignCheck | null = null;
  let shearFvPrime = 0;
  for (const env of ctx.strength) {
    const k = env.fD * sw;
    let V = 0;
    let at = 0;
    for (let i = 0; i < xs.length; i++) {
      if (excluded(xs[i])) continue;
      const v = Math.max(env.Vmax[i] + k * model.selfWeight.V[i], -(env.Vmin[i] + k * model.selfWeight.V[i]));
      if (v > V) {
        V = v;
        at = xs[i];
      }
    }
    if (cond.shearIgnoreLoadsNearSupports) {
      for (const s of model.supports) {
        for (const x of [s.x - dFt, s.x + dFt]) {
          if (x <= 0 || x >= model.length || excluded(x)) continue;
          const v = interpolatedAbs(xs, env.Vmax, env.Vmin, model.selfWeight.V, k, x);
          if (v > V) {
            V = v;
            at = x;
          }
        }
      }
    }
    const fv = (1.5 * V) / m.A;
    const FvPrime = fvBase * durationFactor(ctx, env);
    const ratio = fv / FvPrime;
    if (!shear || ratio > shear.ratio) {
      shear = {
        name: "shear",
        demand: round(fv, 1),
        capacity: round(FvPrime, 1),
        unit: "psi",
        ratio,
        combination: env.name,
        x: round(at, 3),
        note: `fv = 3V/2A with V = ${round(V, 0)} lb; ${cond.shearIgnoreLoadsNearSupports ? "uniform loads within d of each support left out (NDS 2018 §3.4.3.1(a))" : "all loads counted, including those within d of the supports"}`,
      };
      shearFvPrime = FvPrime;
    }
  }
  if (shear) checks.push(shear);

  // Deflection (NDS 2018 §3.5), service loads, E'.
  const live = deflectionCheck(ctx, ctx.live, "deflection-live", ctx.limits.live, sw, EPrime, m.I);
  if (live.check) checks.push(live.check);
  const total = deflectionCheck(ctx, ctx.service, "deflection-total", ctx.limits.total, sw, EPrime, m.I);
  const Kcr = creepFactorKcr(cond.wet);
  let longTerm: number | null = null;
  if (total.check) {
    longTerm = round(total.check.demand + (Kcr - 1) * total.deadPartIn, 4);
    total.check.note += `; long-term with Kcr = ${Kcr}: ${longTerm} in (NDS 2018 §3.5.2, reported, not limited)`;
    checks.push(total.check);
  }

  // Bearing at each support (NDS 2018 §3.10), and what the crew needs under it.
  const FcBase = m.FcPerp * CM.FcPerp * Ct.FcPerp * Ci.FcPerp * (lrfd ? FORMAT_CONVERSION_KF.FcPerp * RESISTANCE_PHI.FcPerp : 1);
  const service = reactionsFor(ctx, sw);
  const reactions: SupportReaction[] = [];
  let bearing: DesignCheck | null = null;
  let bearingCb = 1;
  let bearingFc = FcBase;
  model.supports.forEach((s, j) => {
    const { R, combination } = lrfd ? factoredReaction(ctx, ctx.strength, j, sw) : { R: service[j].maxDown, combination: service[j].maxDownCombination };
    const fromEndIn = Math.min(s.x, model.length - s.x) * 12;
    const Cb = bearingAreaFactorCb(ctx.bearingIn, fromEndIn);
    const FcPrime = adjustedFcPerp(FcBase, { CM: 1, Ct: 1, Ci: 1, Cb });
    const fc = R / (m.b * ctx.bearingIn);
    const ratio = fc / FcPrime;
    let required = R / (m.b * FcBase);
    if (fromEndIn >= 3 && required < 6) required = Math.max(R / (m.b * FcBase) - 0.375, 0);
    if (!bearing || ratio > bearing.ratio) {
      bearing = {
        name: "bearing",
        demand: round(fc, 1),
        capacity: round(FcPrime, 1),
        unit: "psi",
        ratio,
        combination,
        x: s.x,
        note: `fc⊥ = R / (b × lb) = ${round(R, 0)} lb / (${round(m.b, 3)} in × ${ctx.bearingIn} in), Cb = ${round(Cb, 3)}; bearing on this member only`,
      };
      bearingCb = Cb;
      bearingFc = FcPrime;
    }
    reactions.push({
      ...service[j],
      bearing: ctx.bearingIn,
      requiredBearing: round(required, 2),
      jackStuds: Math.max(1, Math.ceil(required / JACK_STUD_IN - 1e-9)),
    });
  });
  if (bearing) checks.push(bearing);

  const factors: WoodFactors = {
    method: ctx.method,
    CD: lrfd ? null : bendCD,
    lambda: lrfd ? bendCD : null,
    CM,
    Ct,
    CL: round(bendCL, 4),
    CF: round(m.CF, 4),
    CV: CV === null ? null : round(CV, 4),
    Cfu,
    Ci,
    Cr,
    Cb: round(bearingCb, 4),
    Kcr,
    KF: KF ? { ...KF } : null,
    phi: phi ? { ...phi } : null,
    Fb: m.Fb,
    FbPrime: round(bendFbPrime, 1),
    Fv: m.Fv,
    FvPrime: round(shearFvPrime, 1),
    FcPerp: m.FcPerp,
    FcPerpPrime: round(bearingFc, 1),
    E: m.E,
    EPrime: round(EPrime, 0),
    Emin: m.Emin,
    EminPrime: round(EminPrime, 0),
    shearLoadsNearSupportsIgnored: cond.shearIgnoreLoadsNearSupports,
    longTermDeflection: longTerm,
  };
  return { checks, reactions, factors };
}

/** |value| at x by linear interpolation between the neighbouring stations (V is linear under uniform load). */
function interpolatedAbs(xs: Float64Array, hi: Float64Array, lo: Float64Array, unit: Float64Array, k: number, x: number): number {
  let j = 1;
  while (j < xs.length - 1 && xs[j] < x) j++;
  const t = (x - xs[j - 1]) / (xs[j] - xs[j - 1]);
  const at = (a: Float64Array) => a[j - 1] + t * (a[j] - a[j - 1]);
  const u = at(unit) * k;
  return Math.max(at(hi) + u, -(at(lo) + u));
}
