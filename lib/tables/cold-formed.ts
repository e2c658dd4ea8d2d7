import { effectiveSection, grossProperties, type CfsDimensions } from "@/lib/solver/aisi/aisi-s100-16";
import type { CfsSection } from "./types";

/**
 * Cold-formed steel C-sections (S) and tracks (T) by the industry's standard designation, the sizes
 * houses are framed with: depths 5-1/2 to 12 in, flanges 1-5/8, 2 and 2-1/2 in (tracks 1-1/4 and 2 in),
 * 33 to 97 mil.
 *
 * Dimensions: design thickness (the minimum base steel thickness is 95 % of it), inside corner radius
 * (the larger of 3/32 − t/2 and 1.5t) and the lip of each flange width, as the Steel Stud Manufacturers
 * Association's product catalog tabulates them (its "Steel Thickness Table" and "Stiffening Lip Length
 * Table", page 5); checked against a published copy of that page at
 * publicdocs.santa-ana.org/BuildingWeblink/0/doc/402229/Page143.aspx.
 *
 * Yield strength: 33 ksi below 54 mil, 50 ksi at 54 mil and above, as commonly specified for
 * structural framing (common practice; the order must name 50 ksi where it is used).
 *
 * Properties are computed from the dimensions by AISI S100-16 (lib/solver/aisi): gross by the linear
 * method with corner arcs, effective section at Fy by Appendix 1. Checked against the SSMA Technical
 * Guide (2024 edition) structural stud/joist property table, read in a published copy (a public
 * repository's data file of that table, found with search): Ix and Sx within 0.5 %, Sxe within 2 % in
 * 20 rows from 550S162 to 1200S250 (tests/solver/design/cold-formed-sources.test.ts). The Ixe
 * held here is at Fy, below the guide's Ixe for deflection (the checks take the effective I at the
 * service moment, not this column). Tracks (T) were not compared.
 *
 * Sections whose web is more slender than AISI S100-16 allows with bearing stiffeners (h/t over 260)
 * are left out (e.g. 1000S162-33); h/t over 200 needs bearing stiffeners (the checks ask for them).
 */
const THICKNESS: readonly { mils: number; t: number; R: number }[] = [
  { mils: 33, t: 0.0346, R: 0.0764 },
  { mils: 43, t: 0.0451, R: 0.0712 },
  { mils: 54, t: 0.0566, R: 0.0849 },
  { mils: 68, t: 0.0713, R: 0.1069 },
  { mils: 97, t: 0.1017, R: 0.1525 },
];
/** lip length by flange (SSMA stiffening lip length table) */
const LIP: Readonly<Record<number, number>> = { 162: 0.5, 200: 0.625, 250: 0.625 };
const DEPTHS = [550, 600, 800, 1000, 1200];
const S_FLANGES = [162, 200, 250];
const T_FLANGES = [125, 200];

export const CFS_SOURCE =
  "SSMA product catalog steel thickness and lip tables (t, R, lip) checked against a published copy (publicdocs.santa-ana.org, doc 402229 p. 143); Ix, Sx, Sxe by AISI S100-16, checked against a published copy of the SSMA Technical Guide (2024) property table; Fy 33/50 ksi common practice";

/** Tracks: their properties were not compared with a published table. */
export const CFS_TRACK_SOURCE =
  "SSMA product catalog steel thickness and lip tables (t, R) checked against a published copy (publicdocs.santa-ana.org, doc 402229 p. 143); track properties by AISI S100-16, from memory — verify against a maker's table; Fy 33/50 ksi common practice";

/** Steel weighs 490 lb/ft³ (common practice). */
const STEEL_PCF = 490;

/** The out-to-out dimensions the AISI checks read (a track's designation depth is inside to inside). */
export function cfsDimensions(s: Pick<CfsSection, "style" | "depth" | "flange" | "lip" | "t" | "R">): CfsDimensions {
  return { style: s.style, D: s.style === "T" ? s.depth + 2 * s.t : s.depth, B: s.flange, lip: s.style === "S" ? s.lip : 0, t: s.t, R: s.R };
}

const r4 = (v: number, n = 4) => Number(v.toPrecision(n));

/** The computed properties of a section from its dimensions and Fy (what the starter rows hold). */
export function cfsProperties(
  s: Pick<CfsSection, "style" | "depth" | "flange" | "lip" | "t" | "R" | "Fy">,
): Pick<CfsSection, "A" | "Ix" | "Sx" | "Iy" | "Sxe" | "Ixe" | "J" | "Cw" | "weightPlf"> {
  const dims = cfsDimensions(s);
  const g = grossProperties(dims);
  const e = effectiveSection(dims, s.Fy);
  return {
    A: r4(g.A),
    Ix: r4(g.Ix),
    Sx: r4(g.Sx),
    Iy: r4(g.Iy),
    Sxe: r4(e.Se),
    Ixe: r4(e.Ie),
    J: r4(g.J, 3),
    Cw: r4(g.Cw),
    weightPlf: r4((g.A / 144) * STEEL_PCF, 3),
  };
}

/** Web flat depth over thickness, h/t. */
export function webSlenderness(s: Pick<CfsSection, "style" | "depth" | "flange" | "lip" | "t" | "R">): number {
  const d = cfsDimensions(s);
  return (d.D - 2 * (d.R + d.t)) / d.t;
}

/** AISI S100-16: the largest web h/t with bearing stiffeners (200 without). */
export const MAX_WEB_SLENDERNESS = 260;

function build(): CfsSection[] {
  const out: CfsSection[] = [];
  for (const style of ["S", "T"] as const) {
    for (const depth of DEPTHS) {
      for (const flange of style === "S" ? S_FLANGES : T_FLANGES) {
        for (const th of THICKNESS) {
          const base = { style, depth: depth / 100, flange: flange / 100, lip: style === "S" ? LIP[flange] : 0, t: th.t, R: th.R, Fy: th.mils >= 54 ? 50 : 33 };
          if (webSlenderness(base) > MAX_WEB_SLENDERNESS) continue;
          out.push({
            name: `${depth}${style}${flange}-${th.mils}`,
            mils: th.mils,
            ...base,
            ...cfsProperties(base),
            source: style === "S" ? CFS_SOURCE : CFS_TRACK_SOURCE,
          });
        }
      }
    }
  }
  return out;
}

export const COLD_FORMED: CfsSection[] = build();

/** "800S162-54" → its parts; null when the name is not a designation. */
export function parseDesignation(name: string): { depth: number; style: "S" | "T"; flange: number; mils: number } | null {
  const m = /^(\d{3,4})([ST])(\d{3})-(\d{2,3})$/.exec(name.trim().toUpperCase());
  if (!m) return null;
  return { depth: Number(m[1]) / 100, style: m[2] as "S" | "T", flange: Number(m[3]) / 100, mils: Number(m[4]) };
}
