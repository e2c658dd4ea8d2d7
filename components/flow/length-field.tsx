"use client";

import { useId, useState } from "react";
import { TextField } from "@/components/ui/field";
import { formatFeetInches, parseLength } from "@/lib/flow/length";
import { useTypedDraft } from "./use-typed-draft";

export type LengthFieldProps = {
  label: string;
  /** the current value, ft */
  valueFt: number;
  /** called with every value that parses and fits, as it is typed */
  onCommit: (feet: number) => void;
  hint?: string;
  minFt?: number;
  maxFt?: number;
  /** a value of exactly min is refused (spans, lengths) */
  exclusiveMin?: boolean;
  id?: string;
  containerClassName?: string;
};

/** Checks a typed length against the field's range; the message names the field. */
export function lengthProblem(
  label: string,
  text: string,
  opts: { minFt?: number; maxFt?: number; exclusiveMin?: boolean },
): { feet: number } | { message: string } {
  const parsed = parseLength(text);
  if (!parsed.ok) return { message: `${label} ${parsed.message}` };
  const { minFt = 0, maxFt = 200, exclusiveMin = false } = opts;
  if (exclusiveMin ? parsed.feet <= minFt : parsed.feet < minFt) {
    const least = minFt === 0 ? "0" : formatFeetInches(minFt);
    return { message: exclusiveMin ? `${label} must be more than ${least}` : `${label} must be ${least} or more` };
  }
  if (parsed.feet > maxFt + 1e-9) return { message: `${label} must be ${formatFeetInches(maxFt)} or less` };
  return { feet: parsed.feet };
}

/**
 * A length typed the way it was measured (12' 6", 12-6, 12.5, 150", 3.8 m), echoed back in feet and
 * inches to 1/16 in. Every value that parses is used at once; a bad one keeps the last good value and says why.
 */
export const LENGTH_HINT = `As you measured it: 12' 6", 12-6, 12.5, 150" or 3.8 m`;

export function LengthField({ label, valueFt, onCommit, hint, minFt, maxFt, exclusiveMin, id, containerClassName }: LengthFieldProps) {
  const [error, setError] = useState<string | null>(null);
  const [echo, setEcho] = useState<string | null>(null);
  const echoId = useId();

  const check = (value: string, showError: boolean) => {
    const result = lengthProblem(label, value, { minFt, maxFt, exclusiveMin });
    if ("feet" in result) {
      setError(null);
      setEcho(formatFeetInches(result.feet));
      if (Math.abs(result.feet - valueFt) > 1e-12) onCommit(result.feet);
    } else {
      setEcho(null);
      if (showError) setError(result.message);
    }
  };
  // away from the field it shows the value in feet and inches
  const { text, editing: focused, inputProps } = useTypedDraft(formatFeetInches(valueFt), check);

  return (
    <div className={containerClassName}>
      <TextField
        id={id}
        label={label}
        hint={hint}
        error={error}
        autoComplete="off"
        autoCapitalize="off"
        autoCorrect="off"
        spellCheck={false}
        enterKeyHint="done"
        className="figures text-lg"
        {...inputProps}
        onKeyDown={(event) => {
          if (event.key === "Enter") {
            event.preventDefault();
            check(text, true);
          }
        }}
      />
      <p id={echoId} className="figures mt-1 min-h-6 text-sm text-ink-soft" aria-live="polite">
        {focused && echo && !error ? `Reads as ${echo}` : "\u00a0"}
      </p>
    </div>
  );
}
