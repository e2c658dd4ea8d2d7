/**
 * Bearing under the point loads on a member: a post, a beam or a girder truss that bears on it. The member's
 * own side of that contact is worked out here, as the bearing it needs; the thing bearing on it (its end
 * grain, its plate, its connection) is not.
 *
 *   wood    NDS 2018 §3.10.2: fc⊥ = P / Ab ≤ Fc⊥′, Fc⊥′ = Fc⊥ · CM · Ct · Ci (ASD; LRFD also KF · φc⊥), with
 *           Cb = 1.0: the §3.10.4 increase for short bearings is not taken, since the bearing's length is not
 *           known. The area needed, and the length along the member it takes at the member's full width.
 *   steel   AISC 360-16 §J10.2 (web local yielding) and §J10.3 (web crippling) under the load, with the end
 *           cases where the load is within d (J10.2) or d/2 (J10.3) of the member's end: the length of bearing
 *           needed along the flange; none where the web needs stiffeners at any length up to 48 in.
 *
 * The load is the largest sum of the point loads at one place over the combinations the support bearing
 * uses (ASD: ASCE 7 §2.4.1 at service level; LRFD: §2.3.1 factored), downward loads only.
 */
import type { DesignContext } from "./context";
import type { DesignMember } from "./member";
import { requiredSteelBearing, type SteelFactors } from "./steel";
import type { WoodFactors } from "./wood";

export interface PointBearing {
  /** which rule the line follows: wood bearing, a W-shape's web, or an I-joist (the maker's details, not worked out) */
  on: "wood" | "steel" | "ijoist";
  /** ft from the left end */
  x: number;
  /** lb, in the combination named */
  P: number;
  combination: string;
  /** wood: bearing area needed on the member, in²; null for steel */
  areaIn2: number | null;
  /** wood: length along the member at its full width; steel: bearing length along the flange, in; null: for steel no length will do (web stiffeners), for an I-joist not worked out */
  lengthIn: number | null;
  /** wood: the member's full width, in; null for steel */
  widthIn: number | null;
  /** wood: Fc⊥′ used, psi; null for steel */
  FcPerpPrime: number | null;
  basis: string;
}

/** The point loads at one place (within 0.01 in), summed per combination: the largest downward sum. */
function pointLoadsByPlace(ctx: DesignContext, lrfd: boolean): { x: number; P: number; combination: string }[] {
  const places: { x: number; loads: { P: number; case: string }[] }[] = [];
  for (const { load } of ctx.loads) {
    if (load.type !== "point" || !(load.P > 0)) continue;
    const at = places.find((p) => Math.abs(p.x - load.x) * 12 < 0.01);
    if (at) at.loads.push({ P: load.P, case: load.case });
    else places.push({ x: load.x, loads: [{ P: load.P, case: load.case }] });
  }
  const envs = lrfd ? ctx.strength : ctx.service;
  return places.map((place) => {
    let best = { P: 0, combination: "" };
    for (const env of envs) {
      const P = place.loads.reduce((sum, l) => sum + Math.max(0, env.factors[l.case as keyof typeof env.factors] ?? 0) * l.P, 0);
      if (P > best.P) best = { P, combination: env.name };
    }
    return { x: place.x, ...best };
  });
}

/**
 * The bearing each point load needs on this member. An I-joist gets a line naming the load, for the web stiffeners
 * or blocking its maker's guide asks under it (not worked out here); cold-formed steel none (its web crippling
 * under point loads is a check of its own).
 */
export function pointBearings(member: DesignMember, ctx: DesignContext, factors: unknown): PointBearing[] {
  if (member.kind === "cfs") return [];
  const lrfd = ctx.method === "lrfd";
  const loads = pointLoadsByPlace(ctx, lrfd).filter((p) => p.P > 0);
  if (loads.length === 0) return [];
  if (member.kind === "ijoist") {
    return loads.map((p) => ({
      on: "ijoist",
      ...p,
      areaIn2: null,
      lengthIn: null,
      widthIn: null,
      FcPerpPrime: null,
      basis: "the joist maker's installation guide",
    }));
  }
  if (member.kind === "wood") {
    const f = factors as WoodFactors;
    const FcPrime = f.FcPerp * f.CM.FcPerp * f.Ct.FcPerp * f.Ci.FcPerp * (lrfd && f.KF && f.phi ? f.KF.FcPerp * f.phi.FcPerp : 1);
    return loads.map((p) => {
      const areaIn2 = p.P / FcPrime;
      return {
        on: "wood",
        ...p,
        areaIn2,
        lengthIn: areaIn2 / member.b,
        widthIn: member.b,
        FcPerpPrime: FcPrime,
        basis: "NDS 2018 §3.10.2, Cb = 1.0",
      };
    });
  }
  const f = factors as SteelFactors;
  const s = member.shape;
  return loads.map((p) => {
    const fromEndIn = Math.min(p.x, ctx.model.length - p.x) * 12;
    const needed = requiredSteelBearing(s, f.Fy, p.P / 1000, fromEndIn <= s.d, fromEndIn < s.d / 2, lrfd);
    return {
      on: "steel",
      ...p,
      areaIn2: null,
      lengthIn: Number.isFinite(needed) ? needed : null,
      widthIn: null,
      FcPerpPrime: null,
      basis: "AISC 360-16 §J10.2 and §J10.3",
    };
  });
}
