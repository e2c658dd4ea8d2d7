/**
 * Loads for the shear check of a wood member with loads near supports left out, NDS 2018 §3.4.3.1:
 * (a) uniformly distributed loads within d of the support may be ignored; (b) a concentrated load
 * within d may be multiplied by x/d, x measured from the support face to the load. The face lies half
 * the bearing length from the support's center line. Nothing is dropped otherwise: a point load on the
 * bearing itself (x ≤ 0) goes straight into the support and counts 0; linearly varying loads and
 * couples are kept whole (the conservative reading).
 *
 * With those loads, the shear next to the support equals the shear at exactly d from the face (no
 * load lies between), so the largest |V| over the member is the design shear at every support.
 * Units: ft for positions, in for d and bearing.
 */
import type { Load, LoadCase, Support } from "../types";

export interface ShearZone {
  /** index of the support */
  support: number;
  /** support center, face and the section at d past the face, ft */
  x: number;
  faceX: number;
  sectionX: number;
  /** +1: towards the right of the support; −1: towards the left */
  side: 1 | -1;
}

/** The zones between each support's center and d past its face, on each side where the member goes on. */
export function shearZones(supports: Support[], lengthFt: number, bearingIn: number, dIn: number): ShearZone[] {
  const zones: ShearZone[] = [];
  const halfBearingFt = bearingIn / 24;
  const dFt = dIn / 12;
  supports.forEach((s, j) => {
    for (const side of [1, -1] as const) {
      if ((side === 1 && s.x >= lengthFt) || (side === -1 && s.x <= 0)) continue;
      const faceX = s.x + side * halfBearingFt;
      const sectionX = faceX + side * dFt;
      zones.push({ support: j, x: s.x, faceX, sectionX: Math.min(lengthFt, Math.max(0, sectionX)), side });
    }
  });
  return zones;
}

function inZone(z: ShearZone, a: number): boolean {
  return z.side === 1 ? a >= z.x && a <= z.sectionX : a <= z.x && a >= z.sectionX;
}

/** Merged [from, to] intervals the zones cover, ft. */
function covered(zones: ShearZone[]): [number, number][] {
  const iv = zones.map((z): [number, number] => (z.side === 1 ? [z.x, z.sectionX] : [z.sectionX, z.x])).sort((a, b) => a[0] - b[0]);
  const out: [number, number][] = [];
  for (const [a, b] of iv) {
    const last = out[out.length - 1];
    if (last && a <= last[1]) last[1] = Math.max(last[1], b);
    else out.push([a, b]);
  }
  return out;
}

/** [from, to] minus the intervals. */
function outside(from: number, to: number, gaps: [number, number][]): [number, number][] {
  const parts: [number, number][] = [];
  let at = from;
  for (const [a, b] of gaps) {
    if (b <= at || a >= to) continue;
    if (a > at) parts.push([at, a]);
    at = Math.max(at, b);
  }
  if (to > at) parts.push([at, to]);
  return parts.filter(([a, b]) => b - a > 1e-9);
}

/**
 * Concentrated-load multiplier NDS 2018 §3.4.3.1(b): x/d for a load within d of a support face, the
 * largest over the zones it lies in (1 outside every zone).
 */
export function nearSupportMultiplier(zones: ShearZone[], a: number, dIn: number): number {
  const hits = zones.filter((z) => inZone(z, a));
  if (hits.length === 0) return 1;
  const dFt = dIn / 12;
  return Math.max(...hits.map((z) => Math.min(1, Math.max(0, ((a - z.faceX) * z.side) / dFt))));
}

export interface ShearLoads {
  loads: (Load & { case: LoadCase })[];
  /** where the member's own weight still counts, ft */
  selfWeightSpans: [number, number][];
  /** the sections at d from each face, ft (evaluated exactly) */
  sections: number[];
}

/** The loads the shear check sees: uniform loads cut out of the zones, point loads in them scaled by x/d. */
export function loadsForShear(loads: (Load & { case: LoadCase })[], zones: ShearZone[], lengthFt: number, dIn: number): ShearLoads {
  const gaps = covered(zones);
  const out: (Load & { case: LoadCase })[] = [];
  for (const l of loads) {
    if (l.type === "udl") {
      for (const [from, to] of outside(l.from, l.to, gaps)) out.push({ ...l, from, to });
    } else if (l.type === "point") {
      const k = nearSupportMultiplier(zones, l.x, dIn);
      if (k > 0) out.push({ ...l, P: l.P * k });
    } else {
      out.push(l);
    }
  }
  return { loads: out, selfWeightSpans: outside(0, lengthFt, gaps), sections: zones.map((z) => z.sectionX) };
}
