import type { ReactNode } from "react";
import { cx } from "@/components/ui/cx";
import type { MemberKind } from "@/lib/flow/state";

// Small line sketches of each member in its place, drawn in spruce with the member itself in amber.
const sketches: Record<MemberKind, ReactNode> = {
  "floor-joist": (
    <>
      <path d="M4 26h40" />
      <path d="M6 26v4M42 26v4" />
      <rect x="6" y="17" width="36" height="5" className="fill-amber stroke-amber-dark" />
      <path d="M4 15h40" strokeDasharray="3 2" />
    </>
  ),
  header: (
    <>
      <path d="M6 6v26M42 6v26" />
      <path d="M12 14v18M36 14v18" />
      <rect x="10" y="9" width="28" height="5" className="fill-amber stroke-amber-dark" />
      <path d="M6 6h36" />
    </>
  ),
  beam: (
    <>
      <path d="M4 9h40" strokeDasharray="3 2" />
      <rect x="4" y="12" width="40" height="7" className="fill-amber stroke-amber-dark" />
      <path d="M9 19v11M39 19v11M5 30h8M35 30h8" />
    </>
  ),
  "deck-joist": (
    <>
      <path d="M3 6v26" />
      <rect x="3" y="13" width="42" height="4" className="fill-amber stroke-amber-dark" />
      <path d="M30 17v4h6v-4M33 21v11" />
      <path d="M3 11h42" strokeDasharray="2 2" />
    </>
  ),
  "deck-beam": (
    <>
      <path d="M4 10h40" strokeDasharray="2 2" />
      <rect x="4" y="13" width="40" height="6" className="fill-amber stroke-amber-dark" />
      <path d="M10 19v13M38 19v13" />
      <path d="M7 32h6M35 32h6" />
    </>
  ),
  rafter: (
    <>
      <path d="M4 28h40" />
      <path d="M4 28L24 8" className="stroke-amber-dark" strokeWidth={4} />
      <path d="M44 28L24 8" />
      <path d="M24 8v20" strokeDasharray="2 2" />
    </>
  ),
};

export type MemberKindSketchProps = { kind: MemberKind; className?: string };

/** A sketch of where the member sits, so the choice can be made by eye. Decorative: the card's words name it. */
export function MemberKindSketch({ kind, className }: MemberKindSketchProps) {
  return (
    <svg
      viewBox="0 0 48 36"
      aria-hidden="true"
      focusable="false"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      className={cx("h-12 w-16 text-spruce", className)}
    >
      {sketches[kind]}
    </svg>
  );
}
