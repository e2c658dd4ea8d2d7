"use client";

import { useId, useLayoutEffect, useRef, useState, type MouseEvent } from "react";
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

export const LENGTH_HINT = `As you measured it: 12' 6", 12 6, 12-1/2, 150" or 3.8 m`;

/**
 * The marks a length needs that no phone keypad shows beside the digits: the decimal pad (inputmode="decimal")
 * has digits and a point only, "numeric" digits only, "tel" adds * # +, and a text keyboard hides both the
 * digits and the marks behind a layer key. So the field opens the decimal pad and this row adds the rest.
 */
const KEYS = [
  { insert: "'", shown: "′ ft", say: "Type a foot mark" },
  { insert: '"', shown: "″ in", say: "Type an inch mark" },
  { insert: " ", shown: "space", say: "Type a space" },
  { insert: "/", shown: "/", say: "Type a slash, for a fraction" },
] as const;

/**
 * A length typed the way it was measured (12' 6", 12 6, 12-1/2, 150", 3.8 m), echoed back in feet and
 * inches to 1/16 in. Every value that parses is used at once; a bad one stays in the field, says why, and
 * holds the step until it is fixed.
 */
export function LengthField({ label, valueFt, onCommit, hint, minFt, maxFt, exclusiveMin, id, containerClassName }: LengthFieldProps) {
  const [echo, setEcho] = useState<string | null>(null);
  // the phone's full keyboard, for metric units or words ("3.8 m", "12 ft 6 in")
  const [letters, setLetters] = useState(false);
  const generated = useId();
  const inputId = id ?? `length-${generated}`;

  const check = (value: string): string | null => {
    const result = lengthProblem(label, value, { minFt, maxFt, exclusiveMin });
    if ("feet" in result) {
      setEcho(formatFeetInches(result.feet));
      if (Math.abs(result.feet - valueFt) > 1e-12) onCommit(result.feet);
      return null;
    }
    setEcho(null);
    return result.message;
  };
  const { text, editing: focused, error, setText, checkNow, inputProps } = useTypedDraft(inputId, formatFeetInches(valueFt), check);

  // where the caret goes once a key's mark is in the field (set as the field renders, before anything else is typed)
  const caret = useRef<number | null>(null);
  useLayoutEffect(() => {
    if (caret.current === null) return;
    const input = document.getElementById(inputId);
    if (input instanceof HTMLInputElement) input.setSelectionRange(caret.current, caret.current);
    caret.current = null;
  });
  const type = (insert: string) => {
    const input = document.getElementById(inputId);
    if (!(input instanceof HTMLInputElement)) return;
    const start = input.selectionStart ?? text.length;
    const end = input.selectionEnd ?? text.length;
    caret.current = start + insert.length;
    setText(text.slice(0, start) + insert + text.slice(end));
  };
  // the keys keep the focus (and the phone's keypad) in the field
  const keepFocus = (event: MouseEvent) => event.preventDefault();

  return (
    <div className={containerClassName}>
      <TextField
        id={inputId}
        label={label}
        hint={hint}
        error={error}
        inputMode={letters ? "text" : "decimal"}
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
            checkNow();
          }
        }}
      />
      {focused ? (
        <div role="group" aria-label="Length marks" className="mt-2 flex gap-1.5" data-testid="length-keys">
          {KEYS.map((key) => (
            <button
              key={key.shown}
              type="button"
              tabIndex={-1}
              aria-label={key.say}
              onMouseDown={keepFocus}
              onClick={() => type(key.insert)}
              className="figures min-h-touch min-w-touch flex-1 rounded-lg border-2 border-rule-strong bg-paper-sunk px-2 text-lg font-bold text-ink active:bg-rule"
            >
              {key.shown}
            </button>
          ))}
          <button
            type="button"
            tabIndex={-1}
            aria-pressed={letters}
            aria-label="Letters keyboard, for m, cm or ft"
            onMouseDown={keepFocus}
            onClick={() => setLetters((l) => !l)}
            className="min-h-touch min-w-touch rounded-lg border-2 border-rule-strong bg-paper-sunk px-2 font-bold text-ink aria-pressed:border-spruce aria-pressed:bg-spruce-light"
          >
            abc
          </button>
        </div>
      ) : null}
      <p className="figures mt-1 min-h-6 text-sm text-ink-soft" aria-live="polite">
        {focused && echo && !error ? `Reads as ${echo}` : "\u00a0"}
      </p>
    </div>
  );
}
