import type { ReactNode } from "react";
import { CheckIcon, WarningIcon } from "@/components/ui/icons";
import { cx } from "@/components/ui/cx";

export type FormAlertProps = {
  tone: "error" | "done" | "info";
  children: ReactNode;
  className?: string;
};

/** A message about the whole form (not one field): a word and an icon as well as a color. */
export function FormAlert({ tone, children, className }: FormAlertProps) {
  const looks = {
    error: "border-over bg-over-bg text-over-ink",
    done: "border-sound bg-sound-bg text-sound-ink",
    info: "border-spruce bg-spruce-light text-ink",
  } as const;
  const Icon = tone === "done" ? CheckIcon : WarningIcon;
  return (
    <div role={tone === "error" ? "alert" : "status"} className={cx("flex items-start gap-2 rounded-card border-2 p-3 font-bold", looks[tone], className)}>
      {tone === "info" ? null : <Icon className="mt-0.5 h-5 w-5 shrink-0" />}
      <div className="min-w-0 flex-1">{children}</div>
    </div>
  );
}
