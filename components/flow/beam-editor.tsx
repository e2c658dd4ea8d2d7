"use client";

import { useRef, type KeyboardEvent, type PointerEvent } from "react";
import { INK } from "@/lib/diagrams/palette";
import { formatFeetInches } from "@/lib/flow/length";
import { clamp, overhangs, snapFt, sortedSupports, SUPPORT_WORDS, type FlowState, type FlowSupport } from "@/lib/flow/state";
import { spanWords } from "@/lib/flow/summary";

export type BeamEditorProps = {
  state: FlowState;
  /** index into state.supports of the support being edited, or null */
  selected: number | null;
  onSelect: (index: number | null) => void;
  /** a tap on the beam away from the supports: add one there */
  onAdd: (x: number) => void;
  onMove: (index: number, x: number) => void;
  onSetType: (index: number, type: FlowSupport["type"]) => void;
  onRemove: (index: number) => void;
};

const W = 400;
const H = 168;
const LEFT = 22;
const RIGHT = W - 22;
const BEAM_Y = 62;
const BEAM_H = 14;
const DIM_Y = 142;

/** One support symbol: pin (triangle), roller (triangle on wheels) or fixed (a hatched wall). */
function SupportSymbol({ type, px, selected }: { type: FlowSupport["type"]; px: number; selected: boolean }) {
  const stroke = selected ? INK.amberDark : INK.ink;
  const top = BEAM_Y + BEAM_H;
  if (type === "fixed") {
    return (
      <g stroke={stroke} strokeWidth={selected ? 4 : 3} fill="none">
        <path d={`M${px} ${BEAM_Y - 22}V${top + 22}`} />
        {[-18, -8, 2, 12, 22].map((dy) => (
          <path key={dy} d={`M${px} ${BEAM_Y + dy}l-9 9`} strokeWidth={2} />
        ))}
      </g>
    );
  }
  return (
    <g stroke={stroke} strokeWidth={selected ? 4 : 3} fill={selected ? INK.amberLight : INK.paper}>
      <path d={`M${px} ${top}l-13 22h26z`} strokeLinejoin="round" />
      {type === "roller" ? (
        <>
          <circle cx={px - 7} cy={top + 28} r={4.5} />
          <circle cx={px + 7} cy={top + 28} r={4.5} />
        </>
      ) : (
        <path d={`M${px - 18} ${top + 23}h36`} strokeWidth={2.5} />
      )}
    </g>
  );
}

/**
 * The member drawn to scale with its supports, loads and spans. Tap the beam to add a support, tap a
 * support to pick it, drag it (or use the arrow keys: 1 in, with Shift 1 ft) to move it.
 */
export function BeamEditor({ state, selected, onSelect, onAdd, onMove, onSetType, onRemove }: BeamEditorProps) {
  const svgRef = useRef<SVGSVGElement>(null);
  const dragging = useRef<{ index: number; moved: boolean } | null>(null);
  const L = state.lengthFt;
  const px = (x: number) => LEFT + ((RIGHT - LEFT) * x) / L;

  const xFromEvent = (event: PointerEvent<Element>): number => {
    const svg = svgRef.current;
    if (!svg) return 0;
    const rect = svg.getBoundingClientRect();
    const u = ((event.clientX - rect.left) / rect.width) * W;
    return clamp(snapFt(Math.round(((u - LEFT) / (RIGHT - LEFT)) * L * 12) / 12), 0, L);
  };

  const sorted = sortedSupports(state.supports);
  const hang = overhangs(state);
  const dims: { from: number; to: number }[] = [];
  const marks = [0, ...sorted.map((s) => s.x), L].filter((x, i, all) => i === 0 || x - all[i - 1] > 1e-9);
  for (let i = 1; i < marks.length; i++) dims.push({ from: marks[i - 1], to: marks[i] });

  const onKey = (index: number) => (event: KeyboardEvent<SVGGElement>) => {
    const step = event.shiftKey ? 1 : 1 / 12;
    const x = state.supports[index].x;
    if (event.key === "ArrowLeft" || event.key === "ArrowRight") {
      event.preventDefault();
      onMove(index, clamp(snapFt(x + (event.key === "ArrowLeft" ? -step : step)), 0, L));
    } else if (event.key === "Delete" || event.key === "Backspace") {
      event.preventDefault();
      onRemove(index);
    } else if (event.key === "p" || event.key === "r" || event.key === "f") {
      onSetType(index, event.key === "p" ? "pin" : event.key === "r" ? "roller" : "fixed");
    } else if (event.key === "Enter" || event.key === " ") {
      event.preventDefault();
      onSelect(index);
    }
  };

  return (
    <svg
      ref={svgRef}
      viewBox={`0 0 ${W} ${H}`}
      className="block h-auto w-full touch-none rounded-lg border-2 border-rule bg-paper-raised select-none"
      aria-label={`The member, ${formatFeetInches(L)} long: ${spanWords(state)}, on ${state.supports.length} support${state.supports.length === 1 ? "" : "s"}. Tap the beam to add a support.`}
      role="group"
    >
      {/* posts and other point loads, where they stand on the member */}
      {state.pointLoads.map((p) => (
        <g key={p.id} stroke={INK.graphite} strokeWidth={3} fill={INK.graphite}>
          <path d={`M${px(p.x)} ${BEAM_Y - 46}V${BEAM_Y - 6}`} />
          <path d={`M${px(p.x)} ${BEAM_Y - 2}l-6 -10h12z`} strokeWidth={1} />
        </g>
      ))}

      {/* the beam: a wide band you can tap */}
      <rect x={px(0)} y={BEAM_Y} width={RIGHT - LEFT} height={BEAM_H} rx={2} fill={INK.amber} stroke={INK.amberDark} strokeWidth={2} />
      <rect
        x={0}
        y={BEAM_Y - 30}
        width={W}
        height={BEAM_H + 60}
        fill="transparent"
        onPointerUp={(event) => {
          if (dragging.current) return;
          const x = xFromEvent(event);
          const near = state.supports.findIndex((s) => Math.abs(px(s.x) - px(x)) < 18);
          if (near >= 0) onSelect(near);
          else onAdd(x);
        }}
      />

      {state.supports.map((s, index) => {
        const isSelected = index === selected;
        return (
          <g
            key={index}
            role="button"
            tabIndex={0}
            aria-pressed={isSelected}
            aria-label={`Support ${sorted.indexOf(s) + 1}: ${SUPPORT_WORDS[s.type].short} at ${formatFeetInches(s.x)}. Arrow keys move it, Delete removes it.`}
            onKeyDown={onKey(index)}
            onFocus={() => onSelect(index)}
            onPointerDown={(event) => {
              event.stopPropagation();
              (event.currentTarget as Element).setPointerCapture(event.pointerId);
              dragging.current = { index, moved: false };
              onSelect(index);
            }}
            onPointerMove={(event) => {
              if (!dragging.current || dragging.current.index !== index) return;
              const x = xFromEvent(event);
              if (Math.abs(x - s.x) > 1e-9) {
                dragging.current.moved = true;
                onMove(index, x);
              }
            }}
            onPointerUp={(event) => {
              event.stopPropagation();
              dragging.current = null;
            }}
            onPointerCancel={() => {
              dragging.current = null;
            }}
            className="cursor-grab outline-none focus-visible:[&>circle:first-child]:stroke-focus"
          >
            <circle
              cx={px(s.x)}
              cy={BEAM_Y + BEAM_H + 14}
              r={26}
              fill="transparent"
              stroke={isSelected ? INK.amberDark : "transparent"}
              strokeWidth={2}
              strokeDasharray="4 3"
            />
            <SupportSymbol type={s.type} px={px(s.x)} selected={isSelected} />
          </g>
        );
      })}

      {/* dimension chain */}
      <g stroke={INK.ink} strokeWidth={1.5}>
        {marks.map((x, i) => (
          <path key={i} d={`M${px(x)} ${DIM_Y - 8}v16`} />
        ))}
        <path d={`M${px(0)} ${DIM_Y}H${px(L)}`} />
      </g>
      {dims.map((d, i) => {
        const mid = (px(d.from) + px(d.to)) / 2;
        const narrow = px(d.to) - px(d.from) < 70;
        const isOverhang = (i === 0 && hang.left > 1e-9 && sorted.length > 1) || (i === dims.length - 1 && hang.right > 1e-9 && sorted.length > 1);
        return (
          <g key={i}>
            <text
              x={mid}
              y={narrow ? DIM_Y + 22 : DIM_Y - 6}
              textAnchor="middle"
              fontSize={15}
              fontWeight={700}
              fill={INK.ink}
              stroke={INK.paper}
              strokeWidth={4}
              paintOrder="stroke"
            >
              {formatFeetInches(d.to - d.from)}
            </text>
            {isOverhang ? (
              <text
                x={mid}
                y={narrow ? DIM_Y - 6 : DIM_Y + 20}
                textAnchor="middle"
                fontSize={14}
                fill={INK.graphite}
                stroke={INK.paper}
                strokeWidth={4}
                paintOrder="stroke"
              >
                overhang
              </text>
            ) : null}
          </g>
        );
      })}
    </svg>
  );
}
