import type { ReactNode } from "react";
import { BlankSheetIcon } from "./icons";
import { cx } from "./cx";

export type EmptyStateProps = {
  title: string;
  /** What the user can do to fill this place. */
  body?: ReactNode;
  /** Usually one ButtonLink or Button. */
  action?: ReactNode;
  icon?: ReactNode;
  className?: string;
};

/** Said where a list has nothing yet: what belongs here and how to add it. */
export function EmptyState({ title, body, action, icon, className }: EmptyStateProps) {
  return (
    <div className={cx("flex flex-col items-center gap-3 rounded-card border-2 border-dashed border-rule-strong px-4 py-8 text-center", className)}>
      <span className="text-graphite">{icon ?? <BlankSheetIcon className="h-12 w-12" />}</span>
      <h2 className="text-xl font-bold text-ink">{title}</h2>
      {body ? <p className="max-w-prose text-ink-soft">{body}</p> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
