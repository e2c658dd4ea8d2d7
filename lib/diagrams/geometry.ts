/**
 * Exact drawing geometry for the shear, moment and deflection diagrams, from the solver's
 * polynomial segments (coefficients in ξ = x − x0, ascending powers). Pure: no React.
 *
 * Each piece becomes a cubic Bézier in data coordinates. A polynomial of degree ≤ 3 (V, M) is a
 * cubic Bézier exactly when x runs linearly with the parameter: with t = ξ/h and power-basis
 * coefficients a_k = c_k h^k, the control values are a0, a0 + a1/3, a0 + 2a1/3 + a2/3 and
 * a0 + a1 + a2 + a3. Deflection (degree 5) is split into short pieces, each a cubic Hermite curve
 * through the exact end values and slopes (error far below a pixel). Pieces are also split at the
 * requested points (the extremes), so the drawn curve passes exactly through every labeled value.
 * Where V or M jumps between segments (a point load, a couple, a reaction), a vertical line joins
 * the two values: the step is drawn, not smoothed.
 */

export type DiagramQuantity = "V" | "M" | "deflection";

/** The solver's segment, as lib/solver/beam returns it. */
export interface DiagramSegment {
  x0: number;
  x1: number;
  V: number[];
  M: number[];
  slope: number[];
  deflection: number[];
}

export type Point = readonly [x: number, y: number];

/** A chain of cubic Béziers: the start point, then (control 1, control 2, end) for each piece. */
export interface BezierChain {
  start: Point;
  pieces: Array<readonly [Point, Point, Point]>;
}

export function polyValue(c: readonly number[], xi: number): number {
  let v = 0;
  for (let k = c.length - 1; k >= 0; k--) v = v * xi + c[k];
  return v;
}

export function polyDerivative(c: readonly number[]): number[] {
  const d: number[] = [];
  for (let k = 1; k < c.length; k++) d.push(k * c[k]);
  return d.length > 0 ? d : [0];
}

function coefficients(segment: DiagramSegment, quantity: DiagramQuantity): number[] {
  return quantity === "V" ? segment.V : quantity === "M" ? segment.M : segment.deflection;
}

/** Value of the quantity at x inside a segment. */
export function valueIn(segment: DiagramSegment, quantity: DiagramQuantity, x: number): number {
  return polyValue(coefficients(segment, quantity), x - segment.x0);
}

/** Bézier controls of a polynomial of degree ≤ 3 over ξ ∈ [a, b] of a segment starting at x0. */
function exactCubic(c: readonly number[], x0: number, a: number, b: number): readonly [Point, Point, Point] {
  // re-center the polynomial at ξ = a: p(a + s) = Σ d_k s^k (Taylor shift)
  const c0 = c[0] ?? 0;
  const c1 = c[1] ?? 0;
  const c2 = c[2] ?? 0;
  const c3 = c[3] ?? 0;
  const d0 = c0 + c1 * a + c2 * a * a + c3 * a * a * a;
  const d1 = c1 + 2 * c2 * a + 3 * c3 * a * a;
  const d2 = c2 + 3 * c3 * a;
  const d3 = c3;
  const h = b - a;
  const a1 = d1 * h;
  const a2 = d2 * h * h;
  const a3 = d3 * h * h * h;
  const xs = x0 + a;
  return [
    [xs + h / 3, d0 + a1 / 3],
    [xs + (2 * h) / 3, d0 + (2 * a1) / 3 + a2 / 3],
    [xs + h, d0 + a1 + a2 + a3],
  ];
}

/** Cubic Hermite piece through the exact values and slopes at both ends. */
function hermite(c: readonly number[], dc: readonly number[], x0: number, a: number, b: number): readonly [Point, Point, Point] {
  const h = b - a;
  const y0 = polyValue(c, a);
  const y1 = polyValue(c, b);
  const m0 = polyValue(dc, a);
  const m1 = polyValue(dc, b);
  return [
    [x0 + a + h / 3, y0 + (m0 * h) / 3],
    [x0 + b - h / 3, y1 - (m1 * h) / 3],
    [x0 + b, y1],
  ];
}

/**
 * The diagram of one quantity as a Bézier chain in data coordinates (x in ft; y in lb, lb-ft or in),
 * starting and ending on the axis (y = 0) so the filled shape closes on the member.
 * `splitAt` lists x positions the curve must pass through as piece ends (the labeled extremes).
 */
export function diagramChain(
  segments: readonly DiagramSegment[],
  quantity: DiagramQuantity,
  splitAt: readonly number[] = [],
  deflectionPieces = 8,
): BezierChain {
  if (segments.length === 0) return { start: [0, 0], pieces: [] };
  const pieces: Array<readonly [Point, Point, Point]> = [];
  const start: Point = [segments[0].x0, 0];
  let last: Point = start;
  const lineTo = (p: Point) => {
    if (p[0] === last[0] && p[1] === last[1]) return;
    pieces.push([
      [last[0] + (p[0] - last[0]) / 3, last[1] + (p[1] - last[1]) / 3],
      [last[0] + (2 * (p[0] - last[0])) / 3, last[1] + (2 * (p[1] - last[1])) / 3],
      p,
    ]);
    last = p;
  };

  for (const seg of segments) {
    const c = coefficients(seg, quantity);
    const h = seg.x1 - seg.x0;
    if (!(h > 0)) continue;
    const y0 = polyValue(c, 0);
    // the step (or the rise from the axis at the start) into this segment
    lineTo([seg.x0, y0]);
    const cuts = new Set<number>([0, h]);
    for (const x of splitAt) if (x > seg.x0 && x < seg.x1) cuts.add(x - seg.x0);
    if (quantity === "deflection") for (let k = 1; k < deflectionPieces; k++) cuts.add((h * k) / deflectionPieces);
    const sorted = [...cuts].sort((p, q) => p - q);
    const dc = polyDerivative(c);
    for (let i = 1; i < sorted.length; i++) {
      const a = sorted[i - 1];
      const b = sorted[i];
      if (b - a <= 1e-12 * Math.max(1, h)) continue;
      const piece = c.length <= 4 ? exactCubic(c, seg.x0, a, b) : hermite(c, dc, seg.x0, a, b);
      pieces.push(piece);
      last = piece[2];
    }
  }
  lineTo([segments[segments.length - 1].x1, 0]);
  return { start, pieces };
}

/** Points of a chain at piece ends (the curve passes exactly through these). */
export function chainVertices(chain: BezierChain): Point[] {
  return [chain.start, ...chain.pieces.map((p) => p[2])];
}

/** Where the quantity jumps between neighbouring segments: x and the size of the jump. */
export function jumpsOf(segments: readonly DiagramSegment[], quantity: DiagramQuantity): Array<{ x: number; from: number; to: number }> {
  const jumps: Array<{ x: number; from: number; to: number }> = [];
  for (let i = 1; i < segments.length; i++) {
    const left = valueIn(segments[i - 1], quantity, segments[i - 1].x1);
    const right = valueIn(segments[i], quantity, segments[i].x0);
    const scale = Math.max(1e-9, Math.abs(left), Math.abs(right));
    if (Math.abs(right - left) > 1e-9 * scale) jumps.push({ x: segments[i].x0, from: left, to: right });
  }
  return jumps;
}

/** Largest and smallest value of the drawn quantity over all segments, sampling nothing: piece ends and derivative roots. */
export function valueRange(segments: readonly DiagramSegment[], quantity: DiagramQuantity, extraX: readonly number[] = []): { min: number; max: number } {
  let min = 0;
  let max = 0;
  for (const seg of segments) {
    for (const x of [seg.x0, seg.x1, ...extraX.filter((e) => e >= seg.x0 && e <= seg.x1)]) {
      const v = valueIn(seg, quantity, x);
      if (v < min) min = v;
      if (v > max) max = v;
    }
  }
  return { min, max };
}
