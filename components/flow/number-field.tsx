"use client";

import { useId } from "react";
import { NumberWithUnitField } from "@/components/ui/field";
import { useTypedDraft } from "./use-typed-draft";

export type FlowNumberFieldProps = {
  label: string;
  value: number;
  unit: string;
  unitSpoken?: string;
  onCommit: (value: number) => void;
  min?: number;
  max?: number;
  /** a value of exactly min is refused */
  exclusiveMin?: boolean;
  hint?: string;
  integer?: boolean;
  containerClassName?: string;
};

/** A number with its unit; each good value is used as it is typed, a bad one stays, says why and holds the step. */
export function FlowNumberField({
  label,
  value,
  unit,
  unitSpoken,
  onCommit,
  min = 0,
  max = 1e9,
  exclusiveMin = false,
  hint,
  integer = false,
  containerClassName,
}: FlowNumberFieldProps) {
  const fieldId = `number-${useId()}`;

  const problem = (raw: string): string | null => {
    const t = raw.trim().replace(/,/g, "");
    if (t === "") return `${label} is empty: type a number`;
    const n = Number(t);
    if (!Number.isFinite(n)) return `${label} must be a number`;
    if (integer && !Number.isInteger(n)) return `${label} must be a whole number`;
    if (exclusiveMin ? n <= min : n < min) return `${label} must be ${exclusiveMin ? "more than" : "at least"} ${min.toLocaleString("en-US")} ${unit}`;
    if (n > max) return `${label} must be ${max.toLocaleString("en-US")} ${unit} or less`;
    return null;
  };

  const check = (raw: string): string | null => {
    const p = problem(raw);
    if (p === null) {
      const n = Number(raw.trim().replace(/,/g, ""));
      if (n !== value) onCommit(n);
    }
    return p;
  };
  const { error, inputProps, checkNow } = useTypedDraft(fieldId, String(value), check);

  return (
    <NumberWithUnitField
      id={fieldId}
      label={label}
      unit={unit}
      unitSpoken={unitSpoken}
      hint={hint}
      error={error}
      containerClassName={containerClassName}
      inputMode={integer ? "numeric" : "decimal"}
      enterKeyHint="done"
      {...inputProps}
      onKeyDown={(event) => {
        if (event.key === "Enter") checkNow();
      }}
    />
  );
}
