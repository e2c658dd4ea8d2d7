import { scaleLinear } from "d3-scale";
import { line, type CurveFactory } from "d3-shape";
import { formatFeetInches } from "@/lib/flow/length";
import { INK } from "@/lib/diagrams/palette";
import { diagramChain, valueRange, type BezierChain, type DiagramQuantity, type DiagramSegment, type Point } from "@/lib/diagrams/geometry";

export type DiagramExtreme = { x: number; value: number; label: string };

export type BeamDiagramProps = {
  title: string;
  quantity: DiagramQuantity;
  segments: readonly DiagramSegment[];
  /** labeled points (largest positive, largest negative…), computed by the solver from the polynomials */
  extremes: readonly DiagramExtreme[];
  /** the value's unit, e.g. "lb", "lb-ft", "in" */
  unit: string;
  supports: readonly { x: number }[];
  /** how a value is written, e.g. 4375 → "4,375" */
  format?: (value: number) => string;
  /** a line under the title, e.g. the load combination */
  subtitle?: string;
  className?: string;
};

export const DIAGRAM_WIDTH = 420;
export const DIAGRAM_HEIGHT = 200;
const PAD = { left: 14, right: 14, top: 38, bottom: 38 };

const TONES: Record<DiagramQuantity, { stroke: string; fill: string; dash?: string }> = {
  V: { stroke: INK.spruce, fill: INK.spruceLight },
  M: { stroke: INK.amberDark, fill: INK.amberLight },
  deflection: { stroke: INK.ink, fill: "transparent", dash: "7 5" },
};

/**
 * A d3-shape curve that reads the points as a Bézier chain: the start, then three points per
 * cubic piece (control, control, end). The geometry module makes the chain exact.
 */
const bezierChainCurve: CurveFactory = (context) => {
  let buffer: Point[] = [];
  let started = false;
  return {
    areaStart() {},
    areaEnd() {},
    lineStart() {
      buffer = [];
      started = false;
    },
    lineEnd() {
      buffer = [];
    },
    point(x: number, y: number) {
      if (!started) {
        context.moveTo(x, y);
        started = true;
        return;
      }
      buffer.push([x, y]);
      if (buffer.length === 3) {
        const [c1, c2, end] = buffer;
        context.bezierCurveTo(c1[0], c1[1], c2[0], c2[1], end[0], end[1]);
        buffer = [];
      }
    },
  };
};

export function chainPoints(chain: BezierChain): Point[] {
  return [chain.start, ...chain.pieces.flatMap((p) => [p[0], p[1], p[2]])];
}

export type DiagramScales = { x: (ft: number) => number; y: (value: number) => number };

/** The scales of one diagram: x over the member, y over the values (deflection drawn downward, as the beam bends). */
export function diagramScales(
  lengthFt: number,
  range: { min: number; max: number },
  quantity: DiagramQuantity,
  width = DIAGRAM_WIDTH,
  height = DIAGRAM_HEIGHT,
): DiagramScales {
  const x = scaleLinear()
    .domain([0, lengthFt])
    .range([PAD.left, width - PAD.right]);
  const span = Math.max(range.max - range.min, 1e-12);
  const lo = range.min - span * 0.04;
  const hi = range.max + span * 0.04;
  const y = scaleLinear()
    .domain(quantity === "deflection" ? [hi, lo] : [lo, hi])
    .range([height - PAD.bottom, PAD.top]);
  return { x: (v: number) => x(v), y: (v: number) => y(v) };
}

/** The SVG path of a diagram in screen coordinates. */
export function diagramPath(chain: BezierChain, scales: DiagramScales): string {
  const generator = line<Point>()
    .x((p) => scales.x(p[0]))
    .y((p) => scales.y(p[1]))
    .curve(bezierChainCurve);
  return generator(chainPoints(chain)) ?? "";
}

// squared paper: a line every 16 units across the whole drawing
const GRID_PATH = [
  ...Array.from({ length: Math.floor(DIAGRAM_WIDTH / 14) + 1 }, (_, i) => `M${i * 14} 0V${DIAGRAM_HEIGHT}`),
  ...Array.from({ length: Math.floor(DIAGRAM_HEIGHT / 14) + 1 }, (_, i) => `M0 ${i * 14}H${DIAGRAM_WIDTH}`),
].join("");

const defaultFormat = (v: number) => Math.round(v).toLocaleString("en-US");

/** One exact diagram (shear, moment or deflection) on squared paper, with its extremes labeled. */
export function BeamDiagram({ title, quantity, segments, extremes, unit, supports, format = defaultFormat, subtitle, className }: BeamDiagramProps) {
  const lengthFt = segments.length > 0 ? segments[segments.length - 1].x1 : 1;
  const chain = diagramChain(
    segments,
    quantity,
    extremes.map((e) => e.x),
  );
  const range = valueRange(
    segments,
    quantity,
    extremes.map((e) => e.x),
  );
  const scales = diagramScales(lengthFt, range, quantity);
  const d = diagramPath(chain, scales);
  const tone = TONES[quantity];
  const axisY = scales.y(0);
  const summary = extremes.map((e) => `${e.label} ${format(e.value)} ${unit} at ${formatFeetInches(e.x)}`).join("; ");

  return (
    <figure className={className}>
      <figcaption className="mb-1 flex flex-wrap items-baseline justify-between gap-x-3">
        <span className="font-bold text-ink">{title}</span>
        {subtitle ? <span className="text-sm text-graphite">{subtitle}</span> : null}
      </figcaption>
      <svg
        viewBox={`0 0 ${DIAGRAM_WIDTH} ${DIAGRAM_HEIGHT}`}
        role="img"
        aria-label={`${title}. ${summary}`}
        className="block h-auto w-full rounded-lg border-2 border-rule bg-paper-raised"
        data-quantity={quantity}
      >
        <rect width={DIAGRAM_WIDTH} height={DIAGRAM_HEIGHT} fill={INK.paper} />
        <path d={GRID_PATH} stroke={INK.grid} strokeWidth={0.75} fill="none" />
        {supports.map((s, i) => (
          <line
            key={i}
            x1={scales.x(s.x)}
            x2={scales.x(s.x)}
            y1={PAD.top - 8}
            y2={DIAGRAM_HEIGHT - PAD.bottom + 8}
            stroke={INK.ruleStrong}
            strokeDasharray="3 4"
          />
        ))}
        <path
          d={d}
          fill={tone.fill}
          fillOpacity={quantity === "deflection" ? 0 : 0.85}
          stroke={tone.stroke}
          strokeWidth={2.5}
          strokeDasharray={tone.dash}
          data-testid={`diagram-path-${quantity}`}
        />
        <line x1={scales.x(0)} x2={scales.x(lengthFt)} y1={axisY} y2={axisY} stroke={INK.ink} strokeWidth={1.5} />
        {extremes.map((e, i) => {
          const px = scales.x(e.x);
          const py = scales.y(e.value);
          const above = quantity === "deflection" ? e.value < 0 : e.value >= 0;
          const anchor = px < DIAGRAM_WIDTH * 0.22 ? "start" : px > DIAGRAM_WIDTH * 0.78 ? "end" : "middle";
          const ty = above ? Math.max(18, py - 12) : Math.min(DIAGRAM_HEIGHT - 6, py + 26);
          return (
            <g key={i} aria-hidden="true">
              <circle cx={px} cy={py} r={4.5} fill={INK.ink} />
              <text x={px} y={ty} textAnchor={anchor} fontSize="18" fontWeight="700" fill={INK.ink} stroke={INK.paper} strokeWidth="4" paintOrder="stroke">
                {`${format(e.value)} ${unit} at ${formatFeetInches(e.x)}`}
              </text>
            </g>
          );
        })}
      </svg>
    </figure>
  );
}
