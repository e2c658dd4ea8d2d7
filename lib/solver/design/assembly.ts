/**
 * How a member is put together and whether it fits its wall: plies, the 1/2 in spacers between sawn
 * plies that bring a header out to the wall's thickness, and the wall framing. A header must be
 * buildable in its wall: plies plus spacers filling a 3-1/2 in (2x4) or 5-1/2 in (2x6) wall, or a
 * solid member as wide (common practice). Widths in in.
 */
import { WALL_DEPTH_IN, WALL_KINDS, type MemberKind, type WallFraming } from "./kinds";
import type { DesignMember } from "./member";

/** Thickness of one spacer between sawn plies, in (1/2 in plywood or OSB, common practice). */
export const SPACER_IN = 0.5;
/** How much narrower than the wall a member may be and still count as filling it, in (common practice). */
export const WALL_FILL_TOLERANCE_IN = 0.5;

export interface Assembly {
  plies: number;
  /** spacers between the plies and the thickness of each, in */
  spacers: number;
  spacerIn: number;
  /** the whole assembly's width, in */
  widthIn: number;
  /** the wall it sits in; null when not in a wall */
  wallFraming: WallFraming | null;
  /** fills the wall (null when not in a wall) */
  fits: boolean | null;
  /** plain words, e.g. "2-ply 2x10 with 1/2 in spacer" */
  words: string;
}

/**
 * Whether sawn plies of this size are nailed together: 2x plies, 1-1/2 in thick, are (common practice: a 16d nail
 * joins two); a nail does not reach through two 3x or 4x plies, which are bolted or screwed instead. The search
 * offers multi-ply members in these sizes only; the answer names the fastening.
 */
export function pliesNailed(size: string): boolean {
  return size.startsWith("2x");
}

/** The wall a member must fit: the input's, or 2x4 for a header when not said; null otherwise. */
export function wallFor(kind: MemberKind | undefined, wallFraming: WallFraming | undefined): WallFraming | null {
  if (wallFraming !== undefined) return wallFraming;
  return kind !== undefined && WALL_KINDS.includes(kind) ? "2x4" : null;
}

const SPACER_WORDS = ["", "with 1/2 in spacer", "with two 1/2 in spacers", "with three 1/2 in spacers"];

/** The assembly of a member in a wall (or not), with the spacers that bring sawn plies out to the wall. */
export function assemblyFor(m: DesignMember, wall: WallFraming | null): Assembly {
  const name = m.kind === "wood" ? m.label.replace(/^\d+-ply /, "") : m.label;
  const size = m.kind === "wood" && m.material === "sawn" && m.spec.material === "sawn" ? m.spec.size : name;
  if (m.kind === "steel") {
    const fits = wall === null ? null : m.shape.bf <= WALL_DEPTH_IN[wall];
    return { plies: 1, spacers: 0, spacerIn: SPACER_IN, widthIn: m.shape.bf, wallFraming: wall, fits, words: m.label };
  }
  if (m.kind === "ijoist") {
    // an I-joist is a joist, not a header: it never fills a wall (its web cannot take the studs' load)
    return { plies: 1, spacers: 0, spacerIn: SPACER_IN, widthIn: m.joist.flangeWidth, wallFraming: wall, fits: wall === null ? null : false, words: m.label };
  }
  if (m.kind === "cfs") {
    // two C-sections side by side (back to back, or toe to toe as a box) are two flange widths wide
    const widthIn = m.section.flange * m.pieces;
    return {
      plies: m.pieces,
      spacers: 0,
      spacerIn: SPACER_IN,
      widthIn,
      wallFraming: wall,
      fits: wall === null ? null : widthIn <= WALL_DEPTH_IN[wall] + 1e-9,
      words: m.label,
    };
  }
  const solid = m.plies * m.plyWidth;
  let spacers = 0;
  if (wall !== null && m.material === "sawn" && m.plies > 1) {
    const depth = WALL_DEPTH_IN[wall];
    while (spacers < m.plies - 1 && solid + (spacers + 1) * SPACER_IN <= depth + 1e-9) spacers++;
  }
  const widthIn = solid + spacers * SPACER_IN;
  const fits = wall === null ? null : widthIn <= WALL_DEPTH_IN[wall] + 1e-9 && widthIn >= WALL_DEPTH_IN[wall] - WALL_FILL_TOLERANCE_IN - 1e-9;
  const head = m.plies > 1 ? `${m.plies}-ply ${size}` : size;
  return { plies: m.plies, spacers, spacerIn: SPACER_IN, widthIn, wallFraming: wall, fits, words: spacers > 0 ? `${head} ${SPACER_WORDS[spacers]}` : head };
}
