import { cx } from "@/components/ui/cx";

export type SpanMarkProps = { className?: string };

/**
 * Spanlark's mark: an amber beam bowing a touch under its load, resting on a square bearing block at one
 * end and a round roller at the other, on a spruce tile.
 */
export function SpanMark({ className }: SpanMarkProps) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" focusable="false" className={cx("h-8 w-8 shrink-0", className)}>
      <rect width="32" height="32" rx="7" fill="#1E5B4F" />
      <path d="M4.5 12.5 Q16 16.2 27.5 12.5 L27.5 16 Q16 19.7 4.5 16 Z" fill="#E9A53A" />
      <rect x="5" y="17.6" width="5" height="5" rx="0.8" fill="#F7F5EF" />
      <circle cx="24.5" cy="20.3" r="2.7" fill="#F7F5EF" />
      <path d="M3.5 25.5h25" stroke="#F7F5EF" strokeWidth="1.6" strokeLinecap="round" />
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
