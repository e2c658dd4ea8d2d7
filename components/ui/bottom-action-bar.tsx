import type { ReactNode } from "react";
import { cx } from "./cx";

export type BottomActionBarProps = {
  /** The page's main actions, primary last (nearest the right thumb). */
  children: ReactNode;
  /** A short line above the buttons, e.g. the member chosen so far. */
  summary?: ReactNode;
  className?: string;
};

/**
 * The page's main actions within thumb reach: fixed just above the bottom navigation on phones, in the page's
 * flow on wide screens. It leaves a spacer of its own height so it never covers the page's last lines.
 */
export function BottomActionBar({ children, summary, className }: BottomActionBarProps) {
  return (
    <>
      <div aria-hidden="true" className={cx("md:hidden", summary ? "h-32" : "h-20")} />
      <div
        data-bottom-action-bar={summary ? "tall" : "short"}
        className={cx(
          "no-print fixed inset-x-0 z-30 border-t-2 border-rule bg-paper px-4 py-3 shadow-bar",
          "md:static md:z-auto md:mt-8 md:rounded-card md:border-2 md:shadow-none",
          className,
        )}
        style={{ bottom: "var(--bottom-nav-h)" }}
      >
        <div className="mx-auto flex max-w-3xl flex-col gap-2">
          {summary ? <div className="truncate text-ink-soft">{summary}</div> : null}
          <div className="flex gap-2 [&>*]:flex-1 md:justify-end md:[&>*]:flex-none">{children}</div>
        </div>
      </div>
    </>
  );
}
