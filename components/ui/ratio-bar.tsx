import { ratioPercent } from "@/lib/solver/design/ratio-percent";
import { CheckIcon, CrossIcon } from "./icons";
import { cx } from "./cx";

/** The bar's right end, as a ratio: 100% sits at two thirds of the width, so "over" has room to show. */
export const RATIO_BAR_MAX = 1.5;

export type RatioVerdict = { pass: boolean; percent: number; text: string };

/**
 * The words for a demand-to-capacity ratio (lib/solver/design/ratio-percent.ts): whole percents, with a tenth
 * where rounding would cross the 100% line, so a pass just under it reads "OK 99.6%", never "OK 100%", and
 * "Over" never sits beside a number of 100% or less.
 */
export function ratioVerdict(ratio: number): RatioVerdict {
  if (!Number.isFinite(ratio) || ratio < 0) {
    return { pass: false, percent: Number.NaN, text: "Not checked" };
  }
  const pass = ratio <= 1;
  const shown = ratioPercent(ratio, pass);
  return { pass, percent: Number(shown), text: `${pass ? "OK" : "Over"} ${shown}%` };
}

export type RatioBarProps = {
  /** Demand over capacity (0.82 means 82% used). */
  ratio: number;
  /** The check's plain name, e.g. "Bending" or "Deflection (live, L/360)". */
  label: string;
  /** A short line under the bar, e.g. "fb 1,210 psi of Fb' 1,476 psi". */
  detail?: string;
  /** Marks the check that governs the member. */
  governing?: boolean;
  /** Writes "100%" under the limit line; pass false on all but the first of a stack of bars. */
  showScale?: boolean;
  className?: string;
};

/** One check as a bar: the fill stops at the ratio, a dark line marks 100%, and the words say OK or Over. */
export function RatioBar({ ratio, label, detail, governing = false, showScale = true, className }: RatioBarProps) {
  const verdict = ratioVerdict(ratio);
  const shown = Number.isFinite(ratio) && ratio > 0 ? Math.min(ratio, RATIO_BAR_MAX) : 0;
  const fillPercent = (shown / RATIO_BAR_MAX) * 100;
  const limitPercent = (1 / RATIO_BAR_MAX) * 100;
  const Icon = verdict.pass ? CheckIcon : CrossIcon;

  return (
    <div className={cx("flex flex-col gap-1", className)}>
      <div className="flex items-baseline justify-between gap-3">
        <span className="font-bold text-ink">
          {label}
          {governing ? <span className="ml-2 rounded bg-amber-light px-1.5 py-0.5 text-sm font-bold text-ink">governs</span> : null}
        </span>
        <span className={cx("inline-flex items-center gap-1 font-bold whitespace-nowrap", verdict.pass ? "text-sound-ink" : "text-over-ink")}>
          <Icon className="h-5 w-5" />
          <span>{verdict.text}</span>
        </span>
      </div>
      <div className="relative h-4 w-full rounded-sm border border-ink-soft bg-paper-raised" aria-hidden="true">
        <div
          className={cx("absolute inset-y-0 left-0 rounded-l-sm", verdict.pass ? "bg-sound" : "bg-over")}
          style={{
            width: `${fillPercent}%`,
            backgroundImage: verdict.pass ? undefined : "repeating-linear-gradient(135deg, transparent 0 5px, rgba(255,255,255,0.35) 5px 9px)",
          }}
        />
        <div className="absolute -top-1 -bottom-1 w-0.5 bg-ink" style={{ left: `calc(${limitPercent}% - 1px)` }} />
        {ratio > RATIO_BAR_MAX ? <div className="absolute inset-y-0 right-0 w-1.5 bg-ink" /> : null}
      </div>
      {showScale ? (
        <div className="relative h-5 text-sm leading-5 text-graphite" aria-hidden="true">
          <span className="absolute -translate-x-1/2" style={{ left: `${limitPercent}%` }}>
            100%
          </span>
        </div>
      ) : null}
      {detail ? <p className="text-sm text-ink-soft">{detail}</p> : null}
    </div>
  );
}
