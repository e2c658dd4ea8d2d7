import { cx } from "@/components/ui/cx";

export type SpanMarkProps = { className?: string };

/**
 * Spanlark's mark: an amber beam on two bearing wedges, with the arc of a lark's flight from one support to the other
 * above it, on a spruce tile.
 */
export function SpanMark({ className }: SpanMarkProps) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" focusable="false" className={cx("h-8 w-8 shrink-0", className)}>
      <rect width="32" height="32" rx="7" fill="#1E5B4F" />
      <path d="M6 13.5 Q16 3.5 26 13.5" fill="none" stroke="#F7F5EF" strokeWidth="1.8" strokeLinecap="round" />
      <rect x="3.5" y="15.5" width="25" height="4.5" rx="1" fill="#E9A53A" />
      <path d="M6.5 20 L9.5 25.5 H3.5 Z" fill="#F7F5EF" />
      <path d="M25.5 20 L28.5 25.5 H22.5 Z" fill="#F7F5EF" />
    </svg>
  );
}

export type WordmarkProps = { className?: string };

/** The mark with the name beside it, as the header's home link shows it. */
export function Wordmark({ className }: WordmarkProps) {
  return (
    <span className={cx("inline-flex items-center gap-2", className)}>
      <SpanMark />
      <span className="text-xl font-bold tracking-tight text-ink">
        Span<span className="text-spruce">lark</span>
      </span>
    </span>
  );
}
