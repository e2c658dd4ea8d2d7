/**
 * The counting rules of an order list, one small pure function each, so each can be checked by hand.
 * Rules of the trade are marked "common practice"; none of them is an engineering check (the caution
 * says which posts and footings are not checked, and fasteners never are). Lengths in ft unless the name says in.
 */

/** Sawn lumber stock lengths when the tables hold none: 8 to 24 ft in 2 ft steps (common practice at lumber yards). */
export const DEFAULT_SAWN_STOCK_FT: readonly number[] = [8, 10, 12, 14, 16, 18, 20, 22, 24];

/** The saw's kerf lost at each cut, in (a 1/8 in blade, common practice). */
export const KERF_IN = 1 / 8;

/** King studs beside each end of a header, full height from plate to plate (common practice: two per end). */
export const KING_STUDS_PER_END = 2;

/** Extra concrete ordered over the footing holes' volume for spillage and ragged holes (common practice: 10 %). */
export const CONCRETE_EXTRA = 0.1;

/** The longest gap between rows of blocking or bridging, ft (IRC 2021 R502.7.1 for joists deeper than 2x12; common practice for every floor and deck joist). */
export const BLOCKING_INTERVAL_FT = 8;

/** A plywood or OSB sheet, in (4 ft x 8 ft). */
export const SHEET_WIDTH_IN = 48;
export const SHEET_LENGTH_FT = 8;

/** The thickness of the spacer between the two plies of a 2x header, in: 3 in of lumber + 1/2 in = a 2x4 wall's 3-1/2 in (common practice). */
export const SPACER_IN = 0.5;

export interface StockChoice {
  /** the length of each piece to order, ft */
  pieceFt: number;
  /** pieces needed to make up the length (more than one when it is longer than the longest stock length) */
  pieces: number;
  /** false when no stock length was given for the material: the piece is cut to length, rounded up to the foot */
  stocked: boolean;
}

/**
 * The stock length to order for a piece `neededFt` long: the shortest stock length at least that long. Longer
 * than the longest stock length: the fewest pieces of the longest lengths that make it up, each the
 * shortest stock length at least neededFt / pieces (they must be joined over a support). Without stock
 * lengths, one piece cut to length, rounded up to the next whole foot.
 * Example: 9.5 ft in 8–24 ft stock → one 10 ft piece; 30 ft → two 16 ft pieces.
 */
export function stockLengthFor(neededFt: number, stockFt: readonly number[]): StockChoice {
  const lengths = [...stockFt].filter((l) => l > 0).sort((a, b) => a - b);
  const need = Math.max(0, neededFt) - 1e-9;
  if (lengths.length === 0) return { pieceFt: Math.max(1, Math.ceil(need)), pieces: 1, stocked: false };
  const longest = lengths[lengths.length - 1];
  const pieces = Math.max(1, Math.ceil(need / longest));
  const each = need / pieces;
  const pieceFt = lengths.find((l) => l >= each) ?? longest;
  return { pieceFt, pieces, stocked: true };
}

/**
 * Joists (or rafters) across a run of `widthFt` at `spacingIn` on center: one at each end and one at every
 * spacing between, the last space short where the width is not a whole number of spaces (common practice).
 * Example: 16 ft at 16 in → 192 / 16 = 12 spaces → 13 joists.
 */
export function joistCount(widthFt: number, spacingIn: number): number {
  if (!(widthFt > 0) || !(spacingIn > 0)) return 0;
  return Math.ceil((widthFt * 12) / spacingIn - 1e-9) + 1;
}

/**
 * Rows of blocking in one span: enough that no gap between rows, ends (held by the rim) or supports is longer
 * than BLOCKING_INTERVAL_FT. Example: 13.5 ft → 1 row (two gaps of 6.75 ft); 8 ft → none; 17 ft → 2.
 */
export function blockingRows(spanFt: number, intervalFt: number = BLOCKING_INTERVAL_FT): number {
  if (!(spanFt > 0)) return 0;
  return Math.max(0, Math.ceil(spanFt / intervalFt - 1e-9) - 1);
}

/** Blocks in one row: one between each pair of neighbouring joists. */
export function blocksPerRow(joists: number): number {
  return Math.max(0, joists - 1);
}

/** How many blocks `blockIn` long come out of one piece `pieceFt` long, a kerf lost at each cut. Example: 14.5 in from 8 ft → floor(96.125 / 14.625) = 6. */
export function blocksPerPiece(blockIn: number, pieceFt: number, kerfIn: number = KERF_IN): number {
  if (!(blockIn > 0)) return 0;
  return Math.floor((pieceFt * 12 + kerfIn) / (blockIn + kerfIn) + 1e-9);
}

/** Strips `depthIn` wide ripped from a 48 in sheet, a kerf lost at each cut. Example: 9-1/4 in → floor(48.125 / 9.375) = 5. */
export function stripsPerSheet(depthIn: number, kerfIn: number = KERF_IN): number {
  if (!(depthIn > 0)) return 0;
  return Math.floor((SHEET_WIDTH_IN + kerfIn) / (depthIn + kerfIn) + 1e-9);
}

/** 8 ft strips needed for a spacer `lengthFt` long. */
export function spacerStrips(lengthFt: number): number {
  return Math.max(1, Math.ceil(lengthFt / SHEET_LENGTH_FT - 1e-9));
}

/** Volume of one round footing, cubic yards: π (D/2)² H, with D and H in inches and 46,656 in³ to the yd³. */
export function footingCubicYards(diameterIn: number, depthIn: number): number {
  if (!(diameterIn > 0) || !(depthIn > 0)) return 0;
  return (Math.PI * (diameterIn / 2) ** 2 * depthIn) / 46_656;
}

/**
 * Volume of one footing pad as the load path designs it, cubic yards: a round pad is the cylinder of
 * footingCubicYards (diameter, thickness); a square pad is side² × thickness / 46,656 in³ to the yd³.
 * Example: 18 in round × 10 in → π × 9² × 10 / 46,656 = 0.0545 yd³; 24 in square × 12 in → 6,912 / 46,656 = 0.148 yd³.
 */
export function padCubicYards(shape: "round" | "square", sizeIn: number, thicknessIn: number): number {
  if (shape === "round") return footingCubicYards(sizeIn, thicknessIn);
  if (!(sizeIn > 0) || !(thicknessIn > 0)) return 0;
  return (sizeIn * sizeIn * thicknessIn) / 46_656;
}

/** Concrete to order for the holes' volume, with CONCRETE_EXTRA more, rounded up to the next 0.01 yd³. */
export function concreteToOrder(volumeYd3: number, extra: number = CONCRETE_EXTRA): number {
  return Math.ceil(volumeYd3 * (1 + extra) * 100 - 1e-9) / 100;
}

/** The stud a wall takes for a header `thicknessIn` thick: 2x4 up to 3-1/2 in, 2x6 up to 5-1/2 in, else 2x8 (common practice: the header fills the wall's depth). */
export function studSizeFor(thicknessIn: number): "2x4" | "2x6" | "2x8" {
  if (thicknessIn <= 3.5 + 1e-9) return "2x4";
  if (thicknessIn <= 5.5 + 1e-9) return "2x6";
  return "2x8";
}
