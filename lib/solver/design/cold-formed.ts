/**
 * Cold-formed steel C-section joists, rafters and headers, AISI S100-16 (ASD by default, LRFD on
 * request), one C-section or two (back to back, or boxed toe to toe) for a header:
 *
 *   flexure        Mnℓ = Se Fn (§F3.1, effective width at Fn), Fn from the lateral-torsional buckling
 *                  stress at the unbraced length given (§F2.1; 0 = compression flange sheathed)
 *   shear          Vn of each web (§G2.1, kv = 5.34)
 *   web crippling  Eq. G5-1 at each support and under each point load (Table G5-2, fastened, one- or
 *                  two-flange, end or interior); where it fails, or the web is too slender for it, a
 *                  bearing stiffener (Pn = 0.7(Pwc + Ae Fy) ≥ Pwc, NSR-10 Eq. F.4.3.3-72) and the answer
 *                  says "add a bearing stiffener"
 *   combined       bending and web crippling on an unreinforced web (§H3 Eq. H3-1)
 *   flange roll    distortional buckling of the compression flange (§F4.1, Mcrd by Appendix 2 §2.3.3.3):
                 see flangeRollCheck for which flange, Lm, kφ and β
  deflection     E = 29,500 ksi with the effective I at the service moment (AISI S100-16 §L: effective
 *                  section at the stress the service moment causes)
 *
 * Two C-sections are taken as two single-web members sharing the load equally (a conservative reading
 * for a back-to-back header, whose built-up web crippling coefficients are higher).
 */
import type { CfsSection } from "@/lib/tables/types";
import { cfsDimensions } from "@/lib/tables/cold-formed";
import {
  bearingStiffenerPn,
  bendingShearRatio,
  bendingCripplingRatio,
  distortionalStrength,
  E_CFS_KSI,
  effectiveAreaUniform,
  effectiveSection,
  elasticLtbStressFcre,
  flatWidths,
  globalBucklingStressFn,
  grossProperties,
  momentGradientCb,
  nominalShearVn,
  OMEGA_FLEXURE,
  OMEGA_SHEAR,
  OMEGA_STIFFENER,
  PHI_FLEXURE,
  PHI_SHEAR,
  PHI_STIFFENER,
  STIFFENER_MIN_BEARING_IN,
  WEB_CRIPPLING_C_FASTENED,
  webCripplingPn,
  type CfsDimensions,
  type CripplingCase,
  type DistortionalResult,
  type GrossProperties,
} from "../aisi/aisi-s100-16";
import { deflectionCheck, factoredReaction, reactionsFor, round } from "./common";
import type { DesignContext } from "./context";
import { momentNoise, peakAbs, peakOnEdge } from "./load-model";
import type { CfsAssembly, MemberSpec } from "./schema";
import type { NamedCheck, SupportReaction } from "./types";

/** The thinnest C-section Spanlark passes as a bending member, mils (see the scope check in evaluateCfs). */
export const MIN_CHECKED_MILS = 43;

export interface CfsMember {
  kind: "cfs";
  spec: MemberSpec;
  label: string;
  section: CfsSection;
  assembly: CfsAssembly;
  /** true: a bearing stiffener at every support; false: none; undefined: added where the web needs one */
  stiffeners: boolean | undefined;
  /** C-sections in the member (1, or 2 for a header) */
  pieces: number;
  d: number;
  /** gross Ix of the member, in⁴ */
  I: number;
  weightPlf: number;
  sources: string[];
  costPerFoot?: number;
}

export interface CfsFactors {
  method: "asd" | "lrfd";
  standard: "AISI S100-16";
  Fy: number;
  /** modulus of elasticity, ksi */
  EKsi: number;
  /** Ω or φ of flexure */
  omegaB: number | null;
  phiB: number | null;
  /** governing segment: unbraced length ft, Cb, Fn ksi, effective section modulus of the member at Fn in³, Mnℓ kip-ft */
  Lb: number;
  CbLtb: number;
  Fn: number;
  Se: number;
  Mn: number;
  /** shear strength of the member, kip */
  Vn: number;
  /** effective moment of inertia at the service moment, in⁴ (gross Ix when the whole section works) */
  Ieff: number;
  /** the supports (numbered from 1) that need a bearing stiffener, in words: "1, 2" or "none" */
  bearingStiffeners: string;
  pieces: number;
}

/** The least bearing stiffener IRC 2021 R505.3.4 allows: a 33 mil C-shape or track; taken as a 362T125-33 track piece (common practice). */
export const STIFFENER_SECTION: CfsDimensions = { style: "T", D: 3.625 + 2 * 0.0346, B: 1.25, lip: 0, t: 0.0346, R: 0.0764 };
export const STIFFENER_FY = 33;
/** How the stiffener is built, as the provision's limits ask (NSR-10 §F.4.3.3.7.2, see bearingStiffenerPn). */
const STIFFENER_WORDS = "362T125-33 track, joist depth less 3/8 in long, at least 3 screws to the web, the first d/8 from the flanges";

const KIP = 1000;

interface SectionData {
  dims: CfsDimensions;
  g: GrossProperties;
  h: number;
  Fy: number;
  /** effective section modulus of one C at Fy (in³) and the local buckling strength with Fn = Fy (kip-in) */
  SeFy: number;
  Mnlo: number;
}

// Effective properties depend only on the section and the stress: kept per section (the search tries each often).
const sectionCache = new Map<string, SectionData>();
function sectionData(s: CfsSection): SectionData {
  const key = `${s.name}|${s.t}|${s.R}|${s.lip}|${s.Fy}|${s.depth}|${s.flange}`;
  let v = sectionCache.get(key);
  if (!v) {
    const dims = cfsDimensions(s);
    const g = grossProperties(dims);
    const SeFy = effectiveSection(dims, s.Fy).Se;
    v = { dims, g, h: flatWidths(dims).h, Fy: s.Fy, SeFy, Mnlo: SeFy * s.Fy };
    if (sectionCache.size > 2000) sectionCache.clear();
    sectionCache.set(key, v);
  }
  return v;
}

/** Effective I of one C at the stress a moment (kip-in) causes, found by iteration (AISI S100-16 §L, effective section at service stress). */
export function effectiveIAt(s: CfsSection, MkipIn: number): number {
  const d = sectionData(s);
  if (MkipIn <= 0) return d.g.Ix;
  let f = Math.min(d.Fy, MkipIn / d.g.Sx);
  let Ie = d.g.Ix;
  for (let k = 0; k < 8; k++) {
    const e = effectiveSection(d.dims, f);
    Ie = e.Ie;
    const next = Math.min(d.Fy, MkipIn / e.Se);
    if (Math.abs(next - f) < 1e-4 * d.Fy) break;
    f = next;
  }
  return Ie;
}

/** Nominal flexural strength of one C (kip-in) at an unbraced length (in) and Cb: §F2.1 then §F3.1. */
export function cfsNominalMoment(s: CfsSection, assembly: CfsAssembly, LbIn: number, Cb: number): { Mn: number; Fn: number; Se: number } {
  const d = sectionData(s);
  let Fn = d.Fy;
  if (LbIn > 0 && assembly !== "box") {
    // back to back: two channels make a doubly symmetric I (xo = 0); Fcre by §F2.1.1 with the pair's properties
    const g =
      assembly === "back-to-back"
        ? (() => {
            const A = 2 * d.g.A;
            const Ix = 2 * d.g.Ix;
            const Iy = 2 * (d.g.Iy + d.g.A * d.g.xc ** 2);
            const rx = Math.sqrt(Ix / A);
            const ry = Math.sqrt(Iy / A);
            const ho = d.dims.D - d.dims.t;
            return { ...d.g, A, Ix, Iy, rx, ry, J: 2 * d.g.J, Cw: (Iy * ho * ho) / 4, xo: 0, r0: Math.sqrt(rx * rx + ry * ry), Sx: 2 * d.g.Sx };
          })()
        : d.g;
    const Fcre = elasticLtbStressFcre(g, g.Sx, LbIn, Cb);
    Fn = globalBucklingStressFn(Fcre, d.Fy);
  }
  const Se = Fn >= d.Fy - 1e-9 ? d.SeFy : effectiveSection(d.dims, Fn).Se;
  return { Mn: Se * Fn, Fn, Se };
}

interface CrippleAt {
  x: number;
  /** required strength, kip, per C-section */
  P: number;
  /** moment at the same place and combination, kip-in, per C-section */
  M: number;
  combination: string;
  where: string;
  case: CripplingCase;
  /** support index, null for a point load */
  support: number | null;
}

export function evaluateCfs(m: CfsMember, ctx: DesignContext): { checks: NamedCheck[]; reactions: SupportReaction[]; factors: CfsFactors } {
  const { model } = ctx;
  const lrfd = ctx.method === "lrfd";
  const s = m.section;
  const d = sectionData(s);
  const n = m.pieces;
  const sw = ctx.conditions.selfWeight ? m.weightPlf : 0;
  const xs = model.xs;
  const checks: NamedCheck[] = [];
  const avail = (Rn: number, omega: number, phi: number) => (lrfd ? phi * Rn : Rn / omega);

  // Scope: the published prescriptive span tables (tests/solver/design/cold-formed.test.ts) give shorter
  // spans for 33 mil joists than these checks do, and the difference is not explained. Rather than pass a
  // member a published table would not, sections thinner than 43 mil are outside what Spanlark checks.
  if (s.mils < MIN_CHECKED_MILS) {
    checks.push({
      name: "thickness-scope",
      demand: MIN_CHECKED_MILS,
      capacity: s.mils,
      unit: "mil",
      ratio: MIN_CHECKED_MILS / s.mils,
      combination: null,
      x: null,
      note: `${s.mils} mil is thinner than Spanlark checks (${MIN_CHECKED_MILS} mil and heavier): published prescriptive span tables give shorter spans for ${s.mils} mil joists than AISI S100-16 computes here — choose ${MIN_CHECKED_MILS} mil or heavier, or have an engineer check it`,
    });
  }

  // Flexure, each unbraced segment and strength combination (lb-ft demand against kip-in strength).
  let bend: NamedCheck | null = null;
  let gov = { Lb: 0, Cb: 1, Fn: d.Fy, Se: d.SeFy * n, Mn: d.Mnlo * n };
  const strengthAt = new Map<string, { Mn: number; Fn: number; Se: number }>();
  // The top flange against moment that sags (Lb from the top edge's braces), the bottom flange against
  // moment that hogs (braced at the supports only unless given otherwise), §F2.1 for each; Cb by
  // Eq. F2.1.1-2 for the top flange, 1.0 for the bottom flange (the top flange braced: the equation's
  // case is not this one) and on a cantilever.
  const noise = momentNoise(model, ctx.strength, sw);
  for (const seg of model.segments) {
    const LbIn = seg.luFt * 12;
    const bottom = seg.edge === "bottom";
    for (const env of ctx.strength) {
      const k = env.fD * sw;
      const p = peakOnEdge(model, env, k, seg);
      if (bottom && !(p.value > noise)) continue;
      const absAt = (i: number) => Math.max(Math.abs(env.Mmax[i] + k * model.selfWeight.M[i]), Math.abs(env.Mmin[i] + k * model.selfWeight.M[i]));
      const Mabs = bottom ? p.value : peakAbs(xs, env.Mmax, env.Mmin, model.selfWeight.M, k, seg.i0, seg.i1).value;
      const Cb = bottom || seg.cantilever || LbIn === 0 ? 1 : momentGradientCb(Mabs, absAt(seg.iA), absAt(seg.iB), absAt(seg.iC));
      const key = `${LbIn}|${round(Cb, 4)}`;
      let one = strengthAt.get(key);
      if (!one) {
        one = cfsNominalMoment(s, m.assembly, LbIn, Cb);
        strengthAt.set(key, one);
      }
      const capacity = (avail(one.Mn * n, OMEGA_FLEXURE, PHI_FLEXURE) * KIP) / 12; // lb-ft
      const ratio = p.value / capacity;
      if (!bend || ratio > bend.ratio) {
        const flange = bottom
          ? `moment that hogs: bottom flange in compression, ${LbIn > 0 ? `braced only at the supports, Lb = ${round(seg.luFt, 2)} ft, Cb = 1.0` : "braced along its length, as given"}`
          : `moment that sags: top flange in compression, ${LbIn > 0 ? `Lb = ${round(seg.luFt, 2)} ft, Cb = ${round(Cb, 3)}` : "braced by the sheathing"}`;
        bend = {
          name: "bending",
          demand: round(p.value, 0),
          capacity: round(capacity, 0),
          unit: "lb-ft",
          ratio,
          combination: env.name,
          x: round(p.x, 3),
          note: ctx.notes
            ? `${lrfd ? "φb Mnℓ" : "Mnℓ/Ωb"}, Mnℓ = Se Fn (AISI S100-16 §F3.1, effective width) with Fn = ${round(one.Fn, 2)} ksi (§F2.1; ${flange}), Se = ${round(one.Se * n, 3)} in³${n > 1 ? ` (${n} C-sections)` : ""}`
            : "",
        };
        gov = { Lb: seg.luFt, Cb, Fn: one.Fn, Se: one.Se * n, Mn: one.Mn * n };
      }
    }
  }
  if (bend) checks.push(bend);
  const roll = flangeRollCheck(m, ctx, sw);
  if (roll) checks.push(roll);

  // Shear, each web (§G2.1).
  const shearN = nominalShearVn(d.h, d.dims.t, d.Fy);
  const Va = (avail(shearN.Vn * n, OMEGA_SHEAR, PHI_SHEAR) * KIP) as number;
  let shear: NamedCheck | null = null;
  for (const env of ctx.strength) {
    const p = peakAbs(xs, env.Vmax, env.Vmin, model.selfWeight.V, env.fD * sw, 0, xs.length - 1, false);
    const ratio = p.value / Va;
    if (!shear || ratio > shear.ratio) {
      shear = {
        name: "shear",
        demand: round(p.value, 0),
        capacity: round(Va, 0),
        unit: "lb",
        ratio,
        combination: env.name,
        x: round(p.x, 3),
        note: ctx.notes
          ? `Vn = ${round(shearN.Vn, 3)} kip per web, λv = ${round(shearN.lambdaV, 3)}, h/t = ${round(d.h / d.dims.t, 1)} (AISI S100-16 §G2.1, no transverse stiffeners)`
          : "",
      };
    }
  }
  if (shear) checks.push(shear);

  // Bending with shear at the same place (§H2 Eq. H2-1), station by station in each combination: it
  // governs over the interior support of a continuous joist, where both peak.
  const Malo = (avail(d.Mnlo * n, OMEGA_FLEXURE, PHI_FLEXURE) * KIP) / 12; // lb-ft, local buckling strength with Fn = Fy
  let mv: NamedCheck | null = null;
  for (const env of ctx.strength) {
    const k = env.fD * sw;
    for (let i = 0; i < xs.length; i++) {
      const M = Math.max(Math.abs(env.Mmax[i] + k * model.selfWeight.M[i]), Math.abs(env.Mmin[i] + k * model.selfWeight.M[i]));
      const V = Math.max(Math.abs(env.Vmax[i] + k * model.selfWeight.V[i]), Math.abs(env.Vmin[i] + k * model.selfWeight.V[i]));
      const ratio = bendingShearRatio(M, Malo, V, Va);
      if (!mv || ratio > mv.ratio) {
        mv = {
          name: "bending-shear",
          demand: round(ratio, 3),
          capacity: 1,
          unit: "",
          ratio,
          combination: env.name,
          x: round(xs[i], 3),
          note: ctx.notes ? `√((M/Maℓo)² + (V/Va)²) with M = ${round(M, 0)} lb-ft, V = ${round(V, 0)} lb (AISI S100-16 §H2 Eq. H2-1, unreinforced web)` : "",
        };
      }
    }
  }
  if (mv) checks.push(mv);

  // Deflection with the effective I at the largest service moment.
  let Ms = 0;
  for (const env of ctx.service) Ms = Math.max(Ms, peakAbs(xs, env.Mmax, env.Mmin, model.selfWeight.M, env.fD * sw, 0, xs.length - 1).value);
  const Ieff = effectiveIAt(s, (Ms * 12) / KIP / n) * n;
  const EPsi = E_CFS_KSI * 1000;
  const live = deflectionCheck(ctx, ctx.live, "deflection-live", ctx.limits.live, sw, EPsi, Ieff);
  const total = deflectionCheck(ctx, ctx.service, "deflection-total", ctx.limits.total, sw, EPsi, Ieff);
  const ieffWords = `E = 29,500 ksi, effective I = ${round(Ieff, 3)} in⁴ at the service moment (gross ${round(d.g.Ix * n, 3)} in⁴)`;
  if (live.check) checks.push({ ...live.check, note: ctx.notes ? `${live.check.note}; ${ieffWords}` : "" });
  if (total.check) checks.push({ ...total.check, note: ctx.notes ? `${total.check.note}; ${ieffWords}` : "" });

  // Web crippling at each support and under each point load; combined with bending (§H3).
  const service = reactionsFor(ctx, sw);
  const reactions: SupportReaction[] = [];
  const N = ctx.bearingIn;
  const L = model.length;
  const h = d.h;
  const nearestI = (x: number) => {
    let best = 0;
    for (let i = 1; i < xs.length; i++) if (Math.abs(xs[i] - x) < Math.abs(xs[best] - x)) best = i;
    return best;
  };
  const places: CrippleAt[] = [];
  model.supports.forEach((sup, j) => {
    const { R, combination } = lrfd ? factoredReaction(ctx, ctx.strength, j, sw) : { R: service[j].maxDown, combination: service[j].maxDownCombination };
    const i = nearestI(sup.x);
    const env = ctx.strength.find((e) => e.name === combination) ?? ctx.strength[0];
    const M = env ? Math.max(Math.abs(env.Mmax[i] + env.fD * sw * model.selfWeight.M[i]), Math.abs(env.Mmin[i] + env.fD * sw * model.selfWeight.M[i])) : 0;
    // end: the bearing's edge within 1.5h of the member's end (AISI S100-16 §G5 definitions)
    const edgeToEndIn = Math.min(sup.x, L - sup.x) * 12 - N / 2;
    const end = edgeToEndIn <= 1.5 * h;
    places.push({
      x: sup.x,
      P: R / KIP / n,
      M: (M * 12) / KIP / n,
      combination,
      where: `support ${j + 1}`,
      case: end ? "end-one-flange" : "interior-one-flange",
      support: j,
    });
  });
  ctx.loads.forEach((tl) => {
    const l = tl.load;
    if (l.type !== "point" || l.P <= 0) return;
    if (model.supports.some((sp) => Math.abs(sp.x - l.x) * 12 <= N)) return; // over a support: the support's check
    let best: { P: number; M: number; combination: string } | null = null;
    ctx.strength.forEach((env) => {
      const f = env.factors[l.case] ?? 0;
      const P = f * l.P;
      if (P <= 0) return;
      const i = nearestI(l.x);
      const M = Math.max(Math.abs(env.Mmax[i] + env.fD * sw * model.selfWeight.M[i]), Math.abs(env.Mmin[i] + env.fD * sw * model.selfWeight.M[i]));
      if (!best || P > best.P) best = { P, M, combination: env.name };
    });
    if (!best) return;
    const b = best as { P: number; M: number; combination: string };
    // two-flange loading when a support lies under it within 1.5h; end loading when the member's end is within 1.5h
    const nearSupport = model.supports.some((sp) => Math.abs(sp.x - l.x) * 12 - N < 1.5 * h);
    const nearEnd = Math.min(l.x, L - l.x) * 12 - N / 2 <= 1.5 * h;
    const c: CripplingCase = nearSupport ? (nearEnd ? "end-two-flange" : "interior-two-flange") : nearEnd ? "end-one-flange" : "interior-one-flange";
    places.push({
      x: l.x,
      P: b.P / KIP / n,
      M: (b.M * 12) / KIP / n,
      combination: b.combination,
      where: `the ${round(l.P, 0)} lb point load at ${round(l.x, 2)} ft`,
      case: c,
      support: null,
    });
  });

  const stiffenerAe = effectiveAreaUniform(STIFFENER_SECTION, STIFFENER_FY);
  const needs = new Set<number>();
  let crip: NamedCheck | null = null;
  let combo: NamedCheck | null = null;
  const caseWords = (c: CripplingCase) => c.replaceAll("-", " ");
  for (const p of places) {
    const PnWeb = webCripplingPn(d.dims, d.Fy, N, p.case);
    const k = WEB_CRIPPLING_C_FASTENED[p.case];
    const bare = PnWeb === null ? 0 : avail(PnWeb, k.omega, k.phi);
    // the stiffener provision asks for at least 1-1/2 in of bearing: no stiffener credit on less
    const stiff = N >= STIFFENER_MIN_BEARING_IN ? avail(bearingStiffenerPn(PnWeb ?? 0, stiffenerAe, STIFFENER_FY), OMEGA_STIFFENER, PHI_STIFFENER) : 0;
    const bareOk = PnWeb !== null && p.P <= bare;
    // a stiffener where asked for; where not said, only where the bare web does not carry the load
    const useStiffener = m.stiffeners === true || (m.stiffeners === undefined && !bareOk && stiff > bare);
    const cap = useStiffener ? stiff : bare;
    // no stiffener allowed and a web past Eq. G5-1's limits: nothing carries the load (shown as 999 %)
    const ratio = cap > 0 ? p.P / cap : 9.99;
    if (useStiffener && p.support !== null) needs.add(p.support);
    const slender = PnWeb === null ? `h/t = ${round(h / d.dims.t, 0)} is past Eq. G5-1's limit of 200: the web needs a bearing stiffener` : "";
    let note = "";
    if (ctx.notes) {
      if (useStiffener)
        note =
          stiff > 0
            ? `${p.where}: bearing stiffener (${STIFFENER_WORDS}; Pn = 0.7(Pwc + Ae Fy) ≥ Pwc, the AISI S100 provision as NSR-10 Eq. F.4.3.3-72 gives it, stated for two-flange loading and applied here with this place's own Pwc; Ω = 1.70 from memory — verify) carries ${round(stiff * n * KIP, 0)} lb${PnWeb !== null ? `; the bare web ${round(bare * n * KIP, 0)} lb (Eq. G5-1, ${caseWords(p.case)}, N = ${N} in)` : `; ${slender}`}`
            : `${p.where}: a bearing stiffener needs at least ${STIFFENER_MIN_BEARING_IN} in of bearing (N = ${N} in given)${PnWeb === null ? `; ${slender}` : ""}`;
      else if (PnWeb === null) note = `${p.where}: ${slender} — add a bearing stiffener`;
      else
        note = `${p.where}: AISI S100-16 Eq. G5-1, ${caseWords(p.case)}, fastened, N = ${N} in, ${lrfd ? `φ = ${k.phi}` : `Ω = ${k.omega}`}${!bareOk && p.P <= stiff ? " — add a bearing stiffener" : ""}`;
    }
    if (!crip || ratio > crip.ratio) {
      crip = {
        name: "web-crippling",
        demand: round(p.P * n * KIP, 0),
        capacity: round(cap * n * KIP, 0),
        unit: "lb",
        ratio,
        combination: p.combination,
        x: round(p.x, 3),
        note,
      };
    }
    // §H3 on an unreinforced web (a bearing stiffener reinforces it)
    if (!useStiffener && PnWeb !== null) {
      const r = bendingCripplingRatio(p.P, PnWeb, p.M, d.Mnlo, lrfd);
      if (!combo || r > combo.ratio) {
        combo = {
          name: "bending-crippling",
          demand: round(0.91 * (p.P / PnWeb) + p.M / d.Mnlo, 3),
          capacity: round(lrfd ? 1.33 * 0.9 : 1.33 / 1.7, 3),
          unit: "",
          ratio: r,
          combination: p.combination,
          x: round(p.x, 3),
          note: ctx.notes ? `${p.where}: 0.91 P/Pn + M/Mnℓo (AISI S100-16 §H3 Eq. H3-1), ${lrfd ? "≤ 1.33φ" : "≤ 1.33/Ω, Ω = 1.70"}` : "",
        };
      }
    }
  }
  if (crip) checks.push(crip);
  if (combo) checks.push(combo);

  model.supports.forEach((_, j) => {
    reactions.push({ ...service[j], bearing: N, requiredBearing: N, jackStuds: null, bearingStiffener: needs.has(j) });
  });

  return {
    checks,
    reactions,
    factors: {
      method: ctx.method,
      standard: "AISI S100-16",
      Fy: d.Fy,
      EKsi: E_CFS_KSI,
      omegaB: lrfd ? null : OMEGA_FLEXURE,
      phiB: lrfd ? PHI_FLEXURE : null,
      Lb: round(gov.Lb, 3),
      CbLtb: round(gov.Cb, 3),
      Fn: round(gov.Fn, 3),
      Se: round(gov.Se, 4),
      Mn: round(gov.Mn / 12, 3),
      Vn: round(shearN.Vn * n, 3),
      Ieff: round(Ieff, 4),
      bearingStiffeners:
        needs.size === 0
          ? "none"
          : [...needs]
              .sort((a, b) => a - b)
              .map((j) => j + 1)
              .join(", "),
      pieces: n,
    },
  };
}

/**
 * Flange roll: distortional buckling of the compression flange and its lip (AISI S100-16 §F4.1, Mcrd by
 * the closed-form method of Appendix 2 §2.3.3.3), each bending segment and strength combination, for
 * the flange each sign of moment puts in compression:
 *
 *  - sagging moment: the top flange. Sheathing screwed to it does brace it, but AISI S100-16 gives no
 *    rotational stiffness kφ for sheathing (the provision that does is in another AISI framing standard,
 *    not adopted here), so kφ = 0: the conservative reading.
 *  - hogging moment (over an interior support, along an overhang): the bottom flange; kφ = 0.
 *
 * Lm, the distance between discrete restraints of the compression flange: for the top flange the top
 * edge's brace spacing where one is given (the segment's length), and none (L = Lcrd) where it is braced
 * continuously (sheathing is not a discrete restraint); for the bottom flange none (L = Lcrd): the top
 * edge's braces are not taken to hold it, and bridging at an unknown spacing is not credited.
 * β (the moment gradient factor of Eq. 2.3.3.3-3) is taken as 1.0, which the standard permits.
 *
 * Headers of two C-sections: each C is checked as a single lipped C carrying half the moment. Back to back,
 * each C's flanges and lips are free as a single C's are; boxed toe to toe, the lips face each other with
 * nothing here holding them (no track is modelled), so no restraint is credited either: the conservative
 * reading in both.
 */
export function flangeRollCheck(m: CfsMember, ctx: DesignContext, sw: number): NamedCheck | null {
  const s = m.section;
  const d = sectionData(s);
  const n = m.pieces;
  const lrfd = ctx.method === "lrfd";
  const { model } = ctx;
  const byLm = new Map<number, DistortionalResult | null>();
  const strength = (Lm: number) => {
    if (!byLm.has(Lm)) byLm.set(Lm, distortionalStrength(d.dims, d.Fy, { Lm, kPhi: 0, beta: 1 }, d.g));
    return byLm.get(Lm) ?? null;
  };
  let out: NamedCheck | null = null;
  for (const seg of model.segments) {
    // braces given hold the top flange; the bottom flange has no discrete restraint credited between the supports
    const Lm = seg.edge === "top" && seg.luFt > 0 ? seg.luFt * 12 : Infinity;
    const r = strength(Lm);
    if (!r) return null; // a section without lips: §F4 is for flanges with edge stiffeners
    const Mnd = r.Mnd * n; // kip-in, the member
    const capacity = ((lrfd ? PHI_FLEXURE * Mnd : Mnd / OMEGA_FLEXURE) * KIP) / 12; // lb-ft; §F4.1 Ωb = 1.67, φb = 0.90
    for (const env of ctx.strength) {
      const k = env.fD * sw;
      for (let i = seg.i0; i <= seg.i1; i++) {
        const sag = env.Mmax[i] + k * model.selfWeight.M[i];
        const hog = -(env.Mmin[i] + k * model.selfWeight.M[i]);
        for (const [M, top] of [
          [sag, true],
          [hog, false],
        ] as const) {
          if (!(M > 0) || top !== (seg.edge === "top")) continue;
          const ratio = M / capacity;
          if (out && ratio <= out.ratio) continue;
          out = {
            name: "flange-roll",
            demand: round(M, 0),
            capacity: round(capacity, 0),
            unit: "lb-ft",
            ratio,
            combination: env.name,
            x: round(model.xs[i], 3),
            note: ctx.notes
              ? `${top ? "top flange in compression (sheathing not credited: kφ = 0)" : "bottom flange in compression where the joist hogs (over a support or an overhang; kφ = 0)"}, ${Lm === Infinity ? "no discrete brace credited (L = Lcrd)" : `braced every ${round(seg.luFt, 2)} ft (Lm = ${round(Lm, 1)} in)`}: ${lrfd ? "φb Mnd" : "Mnd/Ωb"}, Mnd = ${round(Mnd, 1)} kip-in (AISI S100-16 §F4.1, λd = ${round(r.lambdaD, 3)}, My = ${round(r.My * n, 1)} kip-in), Mcrd = ${round(r.Mcrd * n, 1)} kip-in (Appendix 2 §2.3.3.3, Lcrd = ${round(r.Lcrd, 1)} in, L = ${round(r.L, 1)} in, β = 1.0)${n > 1 ? ` (${n} C-sections, each taken alone)` : ""}`
              : "",
          };
        }
      }
    }
  }
  return out;
}
