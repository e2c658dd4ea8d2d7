import { CheckIcon, CrossIcon, WarningIcon } from "./icons";
import { cx } from "./cx";

export type Status = "pass" | "fail" | "caution";

export type StatusBadgeProps = {
  status: Status;
  /** The word shown; defaults to "OK", "Over" or "Check". */
  label?: string;
  size?: "md" | "lg";
  className?: string;
};

const looks: Record<Status, { classes: string; word: string; Icon: typeof CheckIcon }> = {
  pass: { classes: "bg-sound-bg text-sound-ink border-sound", word: "OK", Icon: CheckIcon },
  fail: { classes: "bg-over-bg text-over-ink border-over", word: "Over", Icon: CrossIcon },
  caution: { classes: "bg-caution-bg text-caution-ink border-caution", word: "Check", Icon: WarningIcon },
};

/** Pass or fail as a word and an icon as well as a color, so it reads in sunlight and in grayscale print. */
export function StatusBadge({ status, label, size = "md", className }: StatusBadgeProps) {
  const { classes, word, Icon } = looks[status];
  return (
    <span
      className={cx(
        "inline-flex items-center gap-1.5 rounded-full border-2 font-bold whitespace-nowrap",
        size === "lg" ? "px-3 py-1 text-lg" : "px-2.5 py-0.5 text-sm",
        classes,
        className,
      )}
    >
      <Icon className={size === "lg" ? "h-5 w-5" : "h-4 w-4"} />
      <span>{label ?? word}</span>
    </span>
  );
}
