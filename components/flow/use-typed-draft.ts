"use client";

import { useEffect, useState, type ChangeEvent } from "react";
import { useReportFieldProblem } from "./field-problems";

export type TypedDraft = {
  /** what the input shows: the text being typed, or the value itself when the field is not being edited */
  text: string;
  editing: boolean;
  /** the message to show under the field; null when the entry is good or not yet left */
  error: string | null;
  /** puts text in the field as if typed (the on-screen key row) */
  setText: (text: string) => void;
  /** value and focus, change and blur handlers for the input */
  inputProps: {
    value: string;
    onFocus: () => void;
    onChange: (event: ChangeEvent<HTMLInputElement>) => void;
    onBlur: () => void;
  };
  /** checks the text aloud (Enter) */
  checkNow: () => void;
};

/**
 * The typing rules the flow's fields share: on focus the field holds the value as text, every keystroke is
 * checked quietly (a good value is used at once), and leaving the field checks aloud. A good entry is shown
 * again as the value; a bad one stays in the field with its message, and the step is told, so the flow never
 * goes on with the value from before as if it were the one typed.
 * `check(text)` does the field's own parsing and committing and returns the problem, or null.
 */
export function useTypedDraft(fieldId: string, shown: string, check: (text: string) => string | null): TypedDraft {
  // what is being typed; null when the field is not being edited and holds no bad entry
  const [draft, setDraft] = useState<string | null>(null);
  const [focused, setFocused] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const report = useReportFieldProblem();
  const text = draft ?? shown;

  // a field that goes away takes its problem with it
  useEffect(() => () => report?.(fieldId, null), [report, fieldId]);

  const quiet = (value: string) => {
    const problem = check(value);
    report?.(fieldId, problem);
    if (problem === null) setError(null);
    return problem;
  };
  const aloud = (value: string) => {
    const problem = quiet(value);
    setError(problem);
    return problem;
  };

  return {
    text,
    editing: focused,
    error,
    setText: (value) => {
      setDraft(value);
      quiet(value);
    },
    checkNow: () => {
      aloud(text);
    },
    inputProps: {
      value: text,
      onFocus: () => {
        setFocused(true);
        setDraft((d) => d ?? shown);
      },
      onChange: (event) => {
        setDraft(event.target.value);
        quiet(event.target.value);
      },
      onBlur: () => {
        setFocused(false);
        if (aloud(text) === null) setDraft(null);
      },
    },
  };
}
