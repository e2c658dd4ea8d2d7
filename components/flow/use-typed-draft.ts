"use client";

import { useState, type ChangeEvent } from "react";

export type TypedDraft = {
  /** what the input shows: the text being typed, or the value itself when the field is not being edited */
  text: string;
  editing: boolean;
  /** value and focus, change and blur handlers for the input */
  inputProps: {
    value: string;
    onFocus: () => void;
    onChange: (event: ChangeEvent<HTMLInputElement>) => void;
    onBlur: () => void;
  };
};

/**
 * The typing rules the flow's fields share: on focus the field holds the value as text, every keystroke is
 * checked quietly (a good value is used at once), and leaving the field checks aloud and shows the value again.
 * `check(text, showError)` does the field's own parsing and committing.
 */
export function useTypedDraft(shown: string, check: (text: string, showError: boolean) => void): TypedDraft {
  // what is being typed; null when the field is not being edited
  const [draft, setDraft] = useState<string | null>(null);
  const text = draft ?? shown;
  return {
    text,
    editing: draft !== null,
    inputProps: {
      value: text,
      onFocus: () => setDraft(shown),
      onChange: (event) => {
        setDraft(event.target.value);
        check(event.target.value, false);
      },
      onBlur: () => {
        check(text, true);
        setDraft(null);
      },
    },
  };
}
