/**
 * A steel header (a W-shape, or cold-formed C-sections) set in a wood stud wall sits on jack studs like
 * a wood header, and the crew builds it from a count of studs. Each end needs the longer of two
 * bearings: the steel's own (web local yielding and crippling, AISC 360-16 §J10; web crippling, AISI
 * S100-16 §G5: the bearing its check used) and the wood's under the steel's bearing width
 * (compression perpendicular to grain, NDS 2018 §3.10.2, with Cb §3.10.4 where it applies), counted in
 * 1-1/2 in studs by the same rule as a wood header's (`jackStudsUnder`).
 *
 * The wood is taken as a plate over the studs, in compression perpendicular to grain: that also covers
 * the studs' end grain (Fc* parallel to grain, §3.10.1, is larger). The wall's species is not asked, so
 * its Fc⊥ is the least of the dimension lumber in the tables (Hem-Fir's 405 psi in the starter tables,
 * NDS Supplement 2018 Table 4A), in dry service at normal temperature (a stud wall indoors). Pure.
 */
import { FORMAT_CONVERSION_KF, RESISTANCE_PHI } from "../nds/nds-2018";
import type { MaterialTables } from "../../tables/types";
import { wallFor } from "./assembly";
import type { CfsMember } from "./cold-formed";
import { factoredReaction, round } from "./common";
import type { DesignContext } from "./context";
import { WALL_DEPTH_IN, type MemberKind, type WallFraming } from "./kinds";
import type { SteelMember } from "./member";
import type { SupportReaction } from "./types";
import { jackStudsUnder, requiredBearingIn } from "./wood";

/** The stud wall a steel member bears on, and the wood it bears on. */
export interface StudWall {
  wall: WallFraming;
  /** the studs' depth across the wall, in: 3-1/2 (2x4) or 5-1/2 (2x6) */
  depthIn: number;
  species: string;
  /** reference Fc⊥ of the studs, psi */
  FcPerpPsi: number;
  /** where Fc⊥ comes from (the table row's source) */
  source: string;
}

/** The wall a member of this kind sits in with the wood it bears on; null when not in a stud wall or the tables hold no dimension lumber. */
export function studWallFor(kind: MemberKind | undefined, wallFraming: WallFraming | undefined, tables: MaterialTables): StudWall | null {
  const wall = wallFor(kind, wallFraming);
  if (wall === null) return null;
  let least: MaterialTables["sawnValues"][number] | null = null;
  for (const v of tables.sawnValues) if (v.sizeClass === "dimension" && (least === null || v.FcPerp < least.FcPerp)) least = v;
  if (least === null) return null;
  return { wall, depthIn: WALL_DEPTH_IN[wall], species: least.species, FcPerpPsi: least.FcPerp, source: least.source };
}

/** The width the steel bears on the wood with, in: a W-shape's flange, or its C-sections' flanges side by side; never more than the wall. */
export function steelBearingWidthIn(m: SteelMember | CfsMember, wall: StudWall): number {
  const width = m.kind === "steel" ? m.shape.bf : m.section.flange * m.pieces;
  return Math.min(width, wall.depthIn);
}

/**
 * The steel member's reactions with the jack studs under its ends: the bearing needed is the steel's
 * own or the wood's, whichever is longer, and `studs` keeps both.
 */
export function studsUnderSteel(m: SteelMember | CfsMember, reactions: readonly SupportReaction[], ctx: DesignContext, wall: StudWall): SupportReaction[] {
  const lrfd = ctx.method === "lrfd";
  // Fc⊥ adjusted for dry service, normal temperature, not incised (CM = Ct = Ci = 1); LRFD: × KF × φ (NDS 2018 Table 2.3.5, §2.3.6)
  const FcPsi = wall.FcPerpPsi * (lrfd ? FORMAT_CONVERSION_KF.FcPerp * RESISTANCE_PHI.FcPerp : 1);
  const widthIn = steelBearingWidthIn(m, wall);
  const sw = ctx.conditions.selfWeight ? m.weightPlf : 0;
  const model = ctx.model;
  return reactions.map((r, j) => {
    const x = model.supports[j]?.x ?? r.x;
    const fromEndIn = Math.min(x, model.length - x) * 12;
    const R = lrfd ? factoredReaction(ctx, ctx.strength, j, sw).R : r.maxDown;
    const woodIn = requiredBearingIn(R, widthIn, FcPsi, fromEndIn);
    const steelIn = r.requiredBearing;
    const needed = Math.max(woodIn, steelIn);
    return {
      ...r,
      requiredBearing: round(needed, 2),
      jackStuds: jackStudsUnder(needed, ctx.bearingIn, fromEndIn),
      studs: { woodIn: round(woodIn, 2), steelIn, widthIn, FcPerpPsi: round(FcPsi, 1) },
    };
  });
}

/** The basis in words, for the member's assumptions. */
export function studBearingWords(m: SteelMember | CfsMember, wall: StudWall, lrfd: boolean): string {
  const width = steelBearingWidthIn(m, wall);
  const what = m.kind === "steel" ? "the W-shape's flange" : m.pieces > 1 ? "the two C-sections' flanges" : "the C-section's flange";
  return (
    `jack studs under a steel member in a ${wall.wall} wall: each end needs the longer of the steel's own bearing and the wood's under ${what} ` +
    `(${round(width, 3)} in wide), compression perpendicular to grain on a plate over the studs, NDS 2018 §3.10.2 with Cb §3.10.4, ` +
    `Fc⊥ = ${wall.FcPerpPsi} psi${lrfd ? " × KF 1.67 × φ 0.90" : ""} (${wall.species}, the least of the species in the tables: ${wall.source}; dry service, normal temperature); ` +
    "counted in 1-1/2 in studs as for a wood header"
  );
}
