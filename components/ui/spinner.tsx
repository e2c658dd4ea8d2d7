import { cx } from "./cx";

export type SpinnerProps = {
  size?: "sm" | "md" | "lg";
  /** Read out to screen readers; shown nowhere. */
  label?: string;
  className?: string;
};

const spinnerSizes = { sm: "h-5 w-5", md: "h-8 w-8", lg: "h-12 w-12" } as const;

/** A turning ring of a fixed size, so nothing moves when it appears or goes. */
export function Spinner({ size = "md", label = "Loading", className }: SpinnerProps) {
  return (
    <span role="status" className={cx("inline-flex shrink-0", spinnerSizes[size], className)}>
      <svg viewBox="0 0 24 24" className="h-full w-full animate-spin" aria-hidden="true" focusable="false">
        <circle cx="12" cy="12" r="9.5" fill="none" stroke="currentColor" strokeOpacity="0.25" strokeWidth="3" />
        <path d="M12 2.5a9.5 9.5 0 0 1 9.5 9.5" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      </svg>
      <span className="sr-only">{label}</span>
    </span>
  );
}

export type SkeletonProps = {
  /** CSS width, e.g. "100%" or "12rem"; fixed so the real content takes exactly this place. */
  width: string;
  /** CSS height, e.g. "1.5rem". */
  height: string;
  className?: string;
  rounded?: boolean;
};

/** A gray block holding the place of content still on its way (no layout shift when it arrives). */
export function Skeleton({ width, height, className, rounded = true }: SkeletonProps) {
  return <span aria-hidden="true" className={cx("block animate-pulse bg-rule", rounded && "rounded-md", className)} style={{ width, height }} />;
}
