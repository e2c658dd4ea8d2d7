import { scaleLinear } from "d3-scale";
import { formatFeetInches } from "@/lib/flow/length";
import type { Load, Support } from "@/lib/solver/types";
import { DIAGRAM_WIDTH } from "./beam-diagram";
import { INK } from "@/lib/diagrams/palette";

export type LoadDiagramProps = {
  title: string;
  lengthFt: number;
  supports: readonly Support[];
  /** the member's loads as the solver takes them (plf, lb), with their cases */
  loads: readonly Load[];
  /** reactions to label under the supports, lb (positive up) */
  reactions?: readonly { x: number; F: number }[];
  subtitle?: string;
  className?: string;
};

const H = 200;
const BEAM_Y = 112;
const BAND = 19;

/** The loads on the member: line loads as bands stacked by case (each labeled), point loads as arrows, the supports and their reactions. */
export function LoadDiagram({ title, lengthFt, supports, loads, reactions, subtitle, className }: LoadDiagramProps) {
  const x = scaleLinear()
    .domain([0, lengthFt])
    .range([14, DIAGRAM_WIDTH - 14]);
  const bands = loads.filter((l): l is Extract<Load, { type: "udl" }> => l.type === "udl");
  const linear = loads.filter((l): l is Extract<Load, { type: "linear" }> => l.type === "linear");
  const points = loads.filter((l): l is Extract<Load, { type: "point" }> => l.type === "point");
  const lines = [
    ...bands.map((b) => ({ from: b.from, to: b.to, w1: b.w, w2: b.w, case: b.case ?? "D" })),
    ...linear.map((b) => ({ from: b.from, to: b.to, w1: b.w1, w2: b.w2, case: b.case ?? "D" })),
  ];
  const r0 = (v: number) => Math.round(v).toLocaleString("en-US");
  const summary = [
    ...lines.map((l) => `${l.case} ${r0(l.w1)}${l.w2 !== l.w1 ? ` to ${r0(l.w2)}` : ""} plf from ${formatFeetInches(l.from)} to ${formatFeetInches(l.to)}`),
    ...points.map((p) => `${p.case ?? "D"} ${r0(p.P)} lb at ${formatFeetInches(p.x)}`),
  ].join("; ");
  const stackTop = BEAM_Y - 4 - Math.min(lines.length, 4) * (BAND + 2);

  return (
    <figure className={className}>
      <figcaption className="mb-1 flex flex-wrap items-baseline justify-between gap-x-3">
        <span className="font-bold text-ink">{title}</span>
        {subtitle ? <span className="text-sm text-graphite">{subtitle}</span> : null}
      </figcaption>
      <svg
        viewBox={`0 0 ${DIAGRAM_WIDTH} ${H}`}
        role="img"
        aria-label={`${title}. ${summary || "No loads."}`}
        className="block h-auto w-full rounded-lg border-2 border-rule bg-paper-raised"
      >
        <rect width={DIAGRAM_WIDTH} height={H} fill={INK.paper} />
        {lines.slice(0, 4).map((l, i) => {
          const y = BEAM_Y - 4 - (i + 1) * (BAND + 2);
          const x0 = x(l.from);
          const x1 = x(l.to);
          return (
            <g key={`l${i}`}>
              <rect
                x={x0}
                y={y}
                width={Math.max(2, x1 - x0)}
                height={BAND}
                fill={i % 2 === 0 ? INK.grid : INK.spruceLight}
                stroke={INK.graphite}
                strokeWidth={1.25}
              />
              <text x={(x0 + x1) / 2} y={y + BAND - 3} textAnchor="middle" fontSize={15} fontWeight={700} fill={INK.ink}>
                {`${l.case} ${r0(l.w1)}${l.w2 !== l.w1 ? `–${r0(l.w2)}` : ""} plf`}
              </text>
            </g>
          );
        })}
        {lines.length > 4 ? (
          <text x={DIAGRAM_WIDTH - 16} y={stackTop - 4} textAnchor="end" fontSize={13} fill={INK.graphite}>{`+${lines.length - 4} more line loads`}</text>
        ) : null}
        {points.map((p, i) => {
          const px = x(p.x);
          const top = Math.min(stackTop - 26, 40);
          return (
            <g key={`p${i}`}>
              <path d={`M${px} ${top}V${BEAM_Y - 8}`} stroke={INK.ink} strokeWidth={3} />
              <path d={`M${px} ${BEAM_Y - 2}l-7 -12h14z`} fill={INK.ink} />
              <text
                x={px}
                y={top - 6}
                textAnchor={px < 80 ? "start" : px > DIAGRAM_WIDTH - 80 ? "end" : "middle"}
                fontSize={16}
                fontWeight={700}
                fill={INK.ink}
                stroke={INK.paper}
                strokeWidth={4}
                paintOrder="stroke"
              >
                {`${p.case ?? "D"} ${r0(p.P)} lb`}
              </text>
            </g>
          );
        })}
        <rect x={x(0)} y={BEAM_Y} width={x(lengthFt) - x(0)} height={12} fill={INK.amber} stroke={INK.amberDark} strokeWidth={2} />
        {supports.map((s, i) => {
          const px = x(s.x);
          const reaction = reactions?.[i];
          return (
            <g key={`s${i}`}>
              {s.type === "fixed" ? (
                <path d={`M${px} ${BEAM_Y - 14}V${BEAM_Y + 26}`} stroke={INK.ink} strokeWidth={4} />
              ) : (
                <path d={`M${px} ${BEAM_Y + 12}l-11 18h22z`} fill={INK.paper} stroke={INK.ink} strokeWidth={2.5} />
              )}
              {reaction ? (
                <text
                  x={px}
                  y={BEAM_Y + 50}
                  textAnchor={px < 80 ? "start" : px > DIAGRAM_WIDTH - 80 ? "end" : "middle"}
                  fontSize={16}
                  fontWeight={700}
                  fill={INK.ink}
                >
                  {`R ${r0(reaction.F)} lb`}
                </text>
              ) : null}
            </g>
          );
        })}
        <text x={DIAGRAM_WIDTH / 2} y={H - 8} textAnchor="middle" fontSize={13} fill={INK.graphite}>
          {formatFeetInches(lengthFt)}
        </text>
      </svg>
    </figure>
  );
}
