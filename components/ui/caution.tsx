import { CAUTION, CAUTION_TITLE, NOT_CHECKED } from "@/lib/caution";
import { WarningIcon } from "./icons";
import { cx } from "./cx";

export type CautionProps = {
  /** "short" on screens (the caution in one paragraph); "full" on sheets and the crew link (with the list). */
  variant?: "short" | "full";
  className?: string;
  /** the not-checked list for what is shown (default the common list; notCheckedFor adds material items) */
  notChecked?: readonly string[];
  /** items to say even in the short variant (e.g. what is not checked for a cold-formed steel answer) */
  also?: readonly string[];
};

/** The safety caution with its warning triangle, on every answer, crew link and job sheet. */
export function Caution({ variant = "short", className, notChecked = NOT_CHECKED, also }: CautionProps) {
  return (
    <aside aria-label="Safety caution" className={cx("rounded-card border-2 border-caution border-l-8 bg-caution-bg p-4 text-ink", className)}>
      <p className="flex items-center gap-2 font-bold text-caution-ink">
        <WarningIcon className="h-6 w-6 shrink-0" />
        <span>{CAUTION_TITLE}</span>
      </p>
      <p className="mt-2">{CAUTION}</p>
      {variant === "full" ? (
        <>
          <p className="mt-3 font-bold">Spanlark does not check:</p>
          <ul className="mt-1 list-disc space-y-0.5 pl-6">
            {notChecked.map((item) => (
              <li key={item}>{item}</li>
            ))}
          </ul>
        </>
      ) : also && also.length > 0 ? (
        <>
          <p className="mt-3 font-bold">Not checked here:</p>
          <ul className="mt-1 list-disc space-y-0.5 pl-6">
            {also.map((item) => (
              <li key={item}>{item}</li>
            ))}
          </ul>
        </>
      ) : null}
    </aside>
  );
}
