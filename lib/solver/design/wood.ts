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
  repetitiveMemberFactorCr,
  referenceFbStar,
  RESISTANCE_PHI,
  slendernessRatioRB,
  temperatureFactorCt,
  volumeFactorCV,
  wetServiceFactorCM,
} from "../nds/nds-2018";
import { deflectionCheck, factoredReaction, reactionsFor, round } from "./common";
import type { DesignContext } from "./context";
import { momentNoise, peakAbs, peakOnEdge } from "./load-model";
import { DECK_KINDS, REPETITIVE_KINDS, type MemberKind } from "./kinds";
import type { WoodMember } from "./member";
import type { NamedCheck, SupportReaction } from "./types";

/** Width of one jack stud, in (a 2x stud's dressed thickness). */
export const JACK_STUD_IN = 1.5;

/**
 * Bearing length needed on wood, in (NDS 2018 §3.10.2: fc⊥ = R / (b·lb) ≤ Fc⊥′), with R in lb, the
 * contact width b in in, and Fc⊥ adjusted by every factor but Cb, psi. Away from the end (3 in or more)
 * and under 6 in, Cb = (lb + 0.375)/lb (§3.10.4), so lb = R/(b·Fc⊥) − 0.375.
 * Example: 3,000 lb on a 3 in wide member with Fc⊥ 625 psi at its end needs 3000/(3·625) = 1.6 in.
 */
export function requiredBearingIn(RLb: number, widthIn: number, FcPerpPsi: number, fromEndIn: number): number {
  const plain = RLb / (widthIn * FcPerpPsi);
  return fromEndIn >= 3 && plain < 6 ? Math.max(plain - 0.375, 0) : plain;
}

/**
 * Jack studs (1-1/2 in each) under a member's end: enough for the bearing the check used and for the
 * bearing needed, so the count and the check read the same numbers; at least one. Null away from the
 * member's ends: an interior support is a post or wall, not counted in studs here.
 */
export function jackStudsUnder(requiredIn: number, bearingIn: number, fromEndIn: number): number | null {
  return fromEndIn <= 1e-6 ? Math.max(1, Math.ceil(Math.max(requiredIn, bearingIn) / JACK_STUD_IN - 1e-9)) : null;
}

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
  /** why Cr is what it is, in words with the clause */
  CrBasis: string;
  /** whether the lumber was taken as incised (Ci), and why */
  incised: boolean;
  incisedBasis: string;
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
  /** NDS 2018 §3.4.3.1: uniform loads within d of each support face left out, point loads there taken at x/d */
  shearLoadsNearSupportsIgnored: boolean;
  /** long-term deflection Kcr·ΔD + Δrest at the governing total-deflection point, in (NDS 2018 Eq. 3.5-1) */
  longTermDeflection: number | null;
}

/** Species whose treated lumber is usually incised so the preservative enters (NDS 2018 §4.3.8; common practice). */
export const INCISED_SPECIES: readonly string[] = ["Douglas Fir-Larch", "Hem-Fir", "Spruce-Pine-Fir"];

/**
 * Incised or not (NDS 2018 §4.3.8): as the input says; not said, incised for treated Douglas
 * Fir-Larch, Hem-Fir and Spruce-Pine-Fir dimension lumber in wet service or on a deck member (the
 * residential deck tables, IRC 2021 Table R507.6, assume it), not incised otherwise.
 */
export function resolveIncised(m: WoodMember, given: boolean | undefined, wet: boolean, kind: MemberKind | undefined): { incised: boolean; basis: string } {
  if (!m.dimensionLumber) return { incised: false, basis: "Ci does not apply (not sawn dimension lumber)" };
  if (given === true) return { incised: true, basis: "incised, as given: Ci 0.80 on Fb and Fv, 0.95 on E (NDS 2018 §4.3.8)" };
  if (given === false) return { incised: false, basis: "not incised, as given" };
  const species = m.spec.material === "sawn" ? m.spec.species : "";
  const treated = wet || (kind !== undefined && DECK_KINDS.includes(kind));
  if (treated && INCISED_SPECIES.includes(species)) {
    return { incised: true, basis: `treated ${species} assumed incised (usual for this species): Ci 0.80 on Fb and Fv, 0.95 on E (NDS 2018 §4.3.8)` };
  }
  if (treated && species === "Southern Pine") return { incised: false, basis: "treated Southern Pine assumed not incised (it takes the preservative without)" };
  return { incised: false, basis: "not incised (untreated lumber assumed)" };
}

/**
 * Cr (NDS 2018 §4.3.9) and why: false is honored for every member; built-up members of 3 or more
 * plies qualify by themselves (plies through-nailed); joists and rafters at 24 in or less qualify in a
 * repetitive system (said, or the floor-joist, deck-joist or rafter kind); two plies never by the built-up rule.
 */
export function resolveCr(
  m: WoodMember,
  given: boolean | undefined,
  kind: MemberKind | undefined,
  spacingIn: number | undefined,
): { Cr: number; basis: string } {
  if (!m.dimensionLumber) return { Cr: 1.0, basis: "Cr = 1.0 (applies to dimension lumber only)" };
  if (given === false) return { Cr: 1.0, basis: "Cr = 1.0 (not a repetitive member, as given)" };
  if (m.plies >= 3) {
    const Cr = repetitiveMemberFactorCr({ dimensionLumber: true, plies: m.plies, repetitiveSystem: false });
    return { Cr, basis: `Cr = ${Cr}: ${m.plies} plies through-nailed, each ply sharing the load (NDS 2018 §4.3.9)` };
  }
  const system = given === true || (given === undefined && kind !== undefined && REPETITIVE_KINDS.includes(kind));
  const Cr = repetitiveMemberFactorCr({ dimensionLumber: true, plies: m.plies, repetitiveSystem: system, spacingIn });
  if (Cr > 1) return { Cr, basis: `Cr = ${Cr}: joists or rafters at ${spacingIn} in, three or more sheathed together (NDS 2018 §4.3.9)` };
  if (system && spacingIn === undefined) return { Cr, basis: "Cr = 1.0: a member without a joist spacing is not in a repetitive system (NDS 2018 §4.3.9)" };
  if (system) return { Cr, basis: `Cr = 1.0: spacing ${spacingIn} in is over 24 in (NDS 2018 §4.3.9)` };
  return { Cr, basis: m.plies === 2 ? "Cr = 1.0: two plies are not three members (NDS 2018 §4.3.9)" : "Cr = 1.0 (not a repetitive member)" };
}

export interface MemberEvaluation {
  checks: NamedCheck[];
  reactions: SupportReaction[];
  factors: WoodFactors;
}

export function evaluateWood(m: WoodMember, ctx: DesignContext): MemberEvaluation {
  const { model, conditions: cond } = ctx;
  const lrfd = ctx.method === "lrfd";
  const sw = cond.selfWeight ? m.weightPlf : 0;

  const CM = m.wetTable === "scl" ? { Fb: 1, Fv: 1, FcPerp: 1, E: 1 } : wetServiceFactorCM(m.wetTable, cond.wet, m.Fb * m.CF);
  const Ct = temperatureFactorCt(cond.temperatureF, cond.wet);
  const inc = resolveIncised(m, cond.incised, cond.wet, ctx.kind);
  const Ci = m.dimensionLumber ? incisingFactorCi(inc.incised) : { Fb: 1, Fv: 1, FcPerp: 1, E: 1 };
  const { Cr, basis: CrBasis } = resolveCr(m, cond.repetitive, ctx.kind, ctx.spacingIn);
  // members here bend edgewise (about the strong axis), so the flat use factor stays 1.0
  const Cfu = flatUseFactorCfu(m.nominalDepth, m.nominalThickness, false);
  const KF = lrfd ? FORMAT_CONVERSION_KF : null;
  const phi = lrfd ? RESISTANCE_PHI : null;
  const EPrime = adjustedE(m.E, { CM: CM.E, Ct: Ct.E, Ci: Ci.E });
  const EminPrime = adjustedEmin(m.Emin, { CM: CM.E, Ct: Ct.E, Ci: Ci.E }) * (lrfd ? FORMAT_CONVERSION_KF.Emin * RESISTANCE_PHI.Emin : 1);
  const longest = Math.max(...model.regions.map((r) => r.length));
  const CV = m.volumeX !== undefined ? volumeFactorCV(longest, m.d, m.plyWidth, m.volumeX) : null;
  const checks: NamedCheck[] = [];

  // Bending, per unbraced segment of each edge and combination (NDS 2018 §3.3): the top edge against
  // moment that sags, the bottom edge against moment that hogs, each with the CL of its own lu
  // (§3.3.3: le from Table 3.3.3, RB, FbE, CL). The bottom edge is braced at the supports only
  // unless the input says otherwise (see BendingSegment). The approximate lateral support rules of
  // §4.4.1 are not used in place of §3.3.3: they ask for the ends held in position and, from d/b over
  // 4, the compression edge held in line, which the input does not say.
  // Fb* without CD (applied per combination), NDS 2018 §3.3.3.8
  const fbBase = referenceFbStar(m.Fb, { CD: 1, CM: CM.Fb, Ct: Ct.Fb, CF: m.CF, Ci: Ci.Fb, Cr }) * (lrfd ? FORMAT_CONVERSION_KF.Fb * RESISTANCE_PHI.Fb : 1);
  let bestBend = { ratio: -1, fb: 0, FbPrime: 0, M: 0, x: 0, CD: 1, CL: 1, luFt: 0, combination: "", hogging: false };
  let worstRB = 0;
  // Unbalanced glulam (NDS Supplement 2018 Table 5A, Fbx− below Fbx+): moment that hogs (over a support,
  // on an overhang) is checked against Fbx−, moment that sags against Fbx+, each with the same adjustments.
  const negShare = m.FbNeg !== undefined && m.FbNeg < m.Fb ? m.FbNeg / m.Fb : null;
  const noise = momentNoise(model, ctx.strength, sw);
  for (const seg of model.segments) {
    const hogging = seg.edge === "bottom";
    const share = hogging && negShare !== null ? negShare : 1;
    const peaks = ctx.strength.map((env) => peakOnEdge(model, env, env.fD * sw, seg));
    // an edge that no combination puts in compression here needs no stability factor
    if (hogging && !peaks.some((p) => p.value > noise)) continue;
    const luIn = seg.luFt * 12;
    const RB = luIn > 0 ? slendernessRatioRB(effectiveLengthLe(luIn, m.d), m.d, m.b) : 0;
    if (RB > worstRB) worstRB = RB;
    for (let e = 0; e < ctx.strength.length; e++) {
      const env = ctx.strength[e];
      const CD = ctx.woodDuration[e];
      // Fb* of the edge in compression: from Fbx− where an unbalanced glulam hogs (§3.3.3.8)
      const FbStar = fbBase * CD * share;
      const CL = RB > 0 ? beamStabilityFactorCL(FbStar, criticalBucklingFbE(EminPrime, RB)) : 1.0;
      const stability = CV === null ? CL : Math.min(CL, CV);
      const FbPrime = FbStar * stability * Cfu;
      const p = peaks[e];
      const fb = (p.value * 12) / m.S;
      const ratio = fb / FbPrime;
      if (ratio > bestBend.ratio) bestBend = { ratio, fb, FbPrime, M: p.value, x: p.x, CD, CL, luFt: seg.luFt, combination: env.name, hogging };
    }
  }
  const bendCD = bestBend.CD;
  const bendCL = bestBend.CL;
  const bendFbPrime = bestBend.FbPrime;
  if (bestBend.ratio >= 0) {
    const edgeWords = bestBend.hogging
      ? `moment that hogs: bottom edge in compression, ${bestBend.luFt > 0 ? `braced only at the supports (lu = ${round(bestBend.luFt, 2)} ft)` : "braced along its length, as given"}`
      : `moment that sags: top edge in compression, ${bestBend.luFt > 0 ? `lu = ${round(bestBend.luFt, 2)} ft` : "braced along its length"}`;
    checks.push({
      name: "bending",
      demand: round(bestBend.fb, 1),
      capacity: round(bestBend.FbPrime, 1),
      unit: "psi",
      ratio: bestBend.ratio,
      combination: bestBend.combination,
      x: round(bestBend.x, 3),
      note: !ctx.notes
        ? ""
        : `fb = M/S = ${round(bestBend.M, 0)} lb-ft × 12 / ${round(m.S, 2)} in³ (${edgeWords}${negShare === null ? "" : bestBend.hogging ? `; Fbx− ${m.FbNeg} psi` : `; Fbx+ ${m.Fb} psi`}); Fb' with ${lrfd ? "λ" : "CD"} = ${bestBend.CD}, CL = ${round(bestBend.CL, 3)}${bestBend.luFt > 0 ? " (NDS 2018 §3.3.3, le by Table 3.3.3)" : ""}`,
    });
  }
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

  // Shear, fv = 3V/2A (NDS 2018 §3.4.2); with loads near supports left out, read on the loads of
  // §3.4.3.1 (uniform loads within d of each face cut out, point loads there at x/d), which give the
  // shear at exactly d from every support face.
  const near = cond.shearIgnoreLoadsNearSupports;
  const sm = near ? ctx.shearModel(m.d) : { model, strength: ctx.strength };
  const sxs = sm.model.xs;
  const fvBase = adjustedFv(m.Fv, { CD: 1, CM: CM.Fv, Ct: Ct.Fv, Ci: Ci.Fv }) * (lrfd ? FORMAT_CONVERSION_KF.Fv * RESISTANCE_PHI.Fv : 1);
  let bestShear = { ratio: -1, fv: 0, FvPrime: 0, V: 0, x: 0, combination: "" };
  for (let e = 0; e < sm.strength.length; e++) {
    const env = sm.strength[e];
    const p = peakAbs(sxs, env.Vmax, env.Vmin, sm.model.selfWeight.V, env.fD * sw, 0, sxs.length - 1, false);
    const fv = (1.5 * p.value) / m.A;
    const FvPrime = fvBase * ctx.woodDuration[e];
    const ratio = fv / FvPrime;
    if (ratio > bestShear.ratio)
      bestShear = {
        ratio,
        fv,
        FvPrime,
        V: p.value,
        x: near ? criticalSection(model.supports, model.length, ctx.bearingIn, m.d, p.x) : p.x,
        combination: env.name,
      };
  }
  const shearFvPrime = bestShear.FvPrime;
  if (bestShear.ratio >= 0) {
    checks.push({
      name: "shear",
      demand: round(bestShear.fv, 1),
      capacity: round(bestShear.FvPrime, 1),
      unit: "psi",
      ratio: bestShear.ratio,
      combination: bestShear.combination,
      x: round(bestShear.x, 3),
      note: !ctx.notes
        ? ""
        : `fv = 3V/2A with V = ${round(bestShear.V, 0)} lb; ${near ? `read at d = ${round(m.d, 3)} in from the support face: uniform loads within d left out, point loads within d taken at x/d (NDS 2018 §3.4.3.1)` : "all loads counted, including those within d of the supports"}`,
    });
  }

  // Deflection (NDS 2018 §3.5), service loads, E'.
  const live = deflectionCheck(ctx, ctx.live, "deflection-live", ctx.limits.live, sw, EPrime, m.I);
  if (live.check) checks.push(live.check);
  const total = deflectionCheck(ctx, ctx.service, "deflection-total", ctx.limits.total, sw, EPrime, m.I);
  const Kcr = creepFactorKcr(cond.wet);
  let longTerm: number | null = null;
  if (total.check) {
    longTerm = round(total.check.demand + (Kcr - 1) * total.deadPartIn, 4);
    if (ctx.notes) total.check.note += `; long-term with Kcr = ${Kcr}: ${longTerm} in (NDS 2018 §3.5.2, reported, not limited)`;
    checks.push(total.check);
  }

  // Bearing at each support (NDS 2018 §3.10), and what the crew needs under it.
  const FcBase = m.FcPerp * CM.FcPerp * Ct.FcPerp * Ci.FcPerp * (lrfd ? FORMAT_CONVERSION_KF.FcPerp * RESISTANCE_PHI.FcPerp : 1);
  const service = reactionsFor(ctx, sw);
  const reactions: SupportReaction[] = [];
  let bestBearing = { ratio: -1, fc: 0, FcPrime: FcBase, R: 0, x: 0, Cb: 1, combination: "" };
  for (let j = 0; j < model.supports.length; j++) {
    const s = model.supports[j];
    const { R, combination } = lrfd ? factoredReaction(ctx, ctx.strength, j, sw) : { R: service[j].maxDown, combination: service[j].maxDownCombination };
    const fromEndIn = Math.min(s.x, model.length - s.x) * 12;
    const Cb = bearingAreaFactorCb(ctx.bearingIn, fromEndIn);
    const FcPrime = adjustedFcPerp(FcBase, { CM: 1, Ct: 1, Ci: 1, Cb });
    const fc = R / (m.b * ctx.bearingIn);
    const ratio = fc / FcPrime;
    const required = requiredBearingIn(R, m.b, FcBase, fromEndIn);
    if (ratio > bestBearing.ratio) bestBearing = { ratio, fc, FcPrime, R, x: s.x, Cb, combination };
    reactions.push({
      ...service[j],
      bearing: ctx.bearingIn,
      requiredBearing: round(required, 2),
      jackStuds: jackStudsUnder(required, ctx.bearingIn, fromEndIn),
    });
  }
  const bearingCb = bestBearing.Cb;
  const bearingFc = bestBearing.FcPrime;
  if (bestBearing.ratio >= 0) {
    checks.push({
      name: "bearing",
      demand: round(bestBearing.fc, 1),
      capacity: round(bestBearing.FcPrime, 1),
      unit: "psi",
      ratio: bestBearing.ratio,
      combination: bestBearing.combination,
      x: bestBearing.x,
      note: !ctx.notes
        ? ""
        : `fc⊥ = R / (b × lb) = ${round(bestBearing.R, 0)} lb / (${round(m.b, 3)} in × ${ctx.bearingIn} in), Cb = ${round(bestBearing.Cb, 3)}; bearing on this member only`,
    });
  }

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
    CrBasis,
    incised: inc.incised,
    incisedBasis: inc.basis,
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

/**
 * Where the shear found at x is read: a point between a support's center and d past its face stands
 * for the section at d from the face (the loads of §3.4.3.1 leave nothing between), in ft.
 */
function criticalSection(supports: { x: number }[], lengthFt: number, bearingIn: number, dIn: number, x: number): number {
  const reach = (bearingIn / 2 + dIn) / 12;
  for (const s of supports) {
    if (x >= s.x && x <= s.x + reach && s.x < lengthFt) return Math.min(lengthFt, s.x + reach);
    if (x <= s.x && x >= s.x - reach && s.x > 0) return Math.max(0, s.x - reach);
  }
  return x;
}
