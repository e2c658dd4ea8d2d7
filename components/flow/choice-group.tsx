"use client";

import { useId, type ReactNode } from "react";
import { CheckIcon } from "@/components/ui/icons";
import { cx } from "@/components/ui/cx";

export type Choice<T extends string> = { value: T; label: ReactNode; detail?: ReactNode; media?: ReactNode };

export type ChoiceGroupProps<T extends string> = {
  legend: ReactNode;
  name: string;
  value: T;
  choices: readonly Choice<T>[];
  onChange: (value: T) => void;
  /** "cards" for big choices with a line of detail, "segments" for a row of short words */
  look?: "cards" | "segments";
  hint?: ReactNode;
  className?: string;
};

/** Radio buttons drawn as big targets; the chosen one carries a check mark as well as a color. */
export function ChoiceGroup<T extends string>({ legend, name, value, choices, onChange, look = "cards", hint, className }: ChoiceGroupProps<T>) {
  const hintId = useId();
  return (
    <fieldset className={cx("flex flex-col gap-2", className)} aria-describedby={hint ? hintId : undefined}>
      <legend className="mb-1 font-bold text-ink">{legend}</legend>
      {hint ? (
        <p id={hintId} className="-mt-1 mb-1 text-sm text-graphite">
          {hint}
        </p>
      ) : null}
      <div className={look === "segments" ? "flex flex-wrap gap-2" : "grid gap-2 sm:grid-cols-2"}>
        {choices.map((choice) => {
          const checked = choice.value === value;
          return (
            <label
              key={choice.value}
              className={cx(
                "relative flex min-h-touch cursor-pointer items-center gap-3 rounded-lg border-2 bg-paper-raised px-3 py-2 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus",
                checked ? "border-spruce bg-spruce-light" : "border-rule-strong hover:border-spruce",
                look === "segments" && "flex-1 justify-center whitespace-nowrap",
              )}
            >
              <input type="radio" name={name} value={choice.value} checked={checked} onChange={() => onChange(choice.value)} className="sr-only" />
              {look === "cards" ? (
                <span
                  aria-hidden="true"
                  className={cx(
                    "flex h-6 w-6 shrink-0 items-center justify-center rounded-full border-2",
                    checked ? "border-spruce bg-spruce text-white" : "border-rule-strong bg-paper-raised",
                  )}
                >
                  {checked ? <CheckIcon className="h-4 w-4" /> : null}
                </span>
              ) : checked ? (
                <CheckIcon aria-hidden="true" className="h-5 w-5 shrink-0 text-spruce" />
              ) : null}
              {choice.media ? <span className="shrink-0">{choice.media}</span> : null}
              <span className="flex min-w-0 flex-col">
                <span className="font-bold text-ink">{choice.label}</span>
                {choice.detail ? <span className="text-sm text-ink-soft">{choice.detail}</span> : null}
              </span>
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
