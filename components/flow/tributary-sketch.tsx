import { INK } from "@/lib/diagrams/palette";

export type TributarySketchProps = { mode: "spacing" | "tributary" };

/**
 * A small plan view: what the width means. For a beam, the shaded band reaches halfway to the next
 * support on each side; for joists, each joist carries the strip of floor from halfway to its
 * neighbors, i.e. its spacing.
 */
export function TributarySketch({ mode }: TributarySketchProps) {
  const W = 300;
  const H = 150;
  if (mode === "tributary") {
    return (
      <figure className="flex flex-col gap-1">
        <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full max-w-sm rounded-lg border-2 border-rule bg-paper-raised" aria-hidden="true">
          <rect x={20} y={40} width={260} height={62} fill={INK.amberLight} />
          <path d="M20 14H280M20 128H280" stroke={INK.ink} strokeWidth={4} />
          <rect x={20} y={66} width={260} height={10} fill={INK.amber} stroke={INK.amberDark} strokeWidth={2} />
          {[40, 80, 120, 160, 200, 240].map((x) => (
            <path key={x} d={`M${x} 14V128`} stroke={INK.graphite} strokeWidth={1.5} />
          ))}
          <path d="M292 40V102M286 40h12M286 102h12" stroke={INK.ink} strokeWidth={2} />
          <path d="M20 40H280M20 102H280" stroke={INK.amberDark} strokeWidth={1.5} strokeDasharray="5 4" />
          <g fontSize={13} fill={INK.ink} stroke={INK.paper} strokeWidth={4} paintOrder="stroke" textAnchor="middle">
            <text x={150} y={33}>
              joists: half their span
            </text>
            <text x={150} y={118}>
              joists: half their span
            </text>
            <text x={150} y={62} fontWeight={700}>
              beam or header
            </text>
            <text x={276} y={92} textAnchor="end" fontWeight={700}>
              width
            </text>
          </g>
          <text x={150} y={148} textAnchor="middle" fontSize={12} fill={INK.graphite}>
            walls or beams at the joists&apos; far ends
          </text>
        </svg>
        <figcaption className="text-sm text-ink-soft">
          Tributary width: the strip of floor or roof the beam holds up — half the joist span on each side, added together.
        </figcaption>
      </figure>
    );
  }
  return (
    <figure className="flex flex-col gap-1">
      <svg viewBox={`0 0 ${W} ${H - 22}`} className="h-auto w-full max-w-sm rounded-lg border-2 border-rule bg-paper-raised" aria-hidden="true">
        <rect x={110} y={22} width={80} height={86} fill={INK.amberLight} />
        {[70, 150, 230].map((x) => (
          <rect
            key={x}
            x={x - 5}
            y={22}
            width={10}
            height={86}
            fill={x === 150 ? INK.amber : INK.paper}
            stroke={x === 150 ? INK.amberDark : INK.graphite}
            strokeWidth={2}
          />
        ))}
        <path d="M110 118H190M110 112v12M190 112v12" stroke={INK.ink} strokeWidth={2} />
        <path d="M110 22V108M190 22V108" stroke={INK.amberDark} strokeWidth={1.5} strokeDasharray="5 4" />
        <text x={150} y={15} textAnchor="middle" fontSize={13} fill={INK.ink}>
          one joist carries one spacing
        </text>
      </svg>
      <figcaption className="text-sm text-ink-soft">
        Joist spacing: center to center. Each joist holds the strip of floor from halfway to its neighbors.
      </figcaption>
    </figure>
  );
}
