"use client";

import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from "react";
import { WarningIcon } from "./icons";
import { cx } from "./cx";

// Fields take the props formik's getFieldProps() returns (name, value, onChange, onBlur) as they are, plus
// a label that is always shown, an optional hint and an error. Pass `error={touched.x ? errors.x : undefined}`.

type FieldTextProps = {
  label: ReactNode;
  hint?: ReactNode;
  /** The message saying what is wrong with the value; falsy when nothing is. */
  error?: string | false | null;
  /** Keeps the label for screen readers only (use sparingly: labels are shown in Spanlark). */
  hideLabel?: boolean;
};

type FieldIds = { inputId: string; hintId: string; errorId: string; describedBy: string | undefined };

function useFieldIds(id: string | undefined, hint: ReactNode, error: FieldTextProps["error"], extra: string[] = []): FieldIds {
  const generated = useId();
  const inputId = id ?? `field-${generated}`;
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  const parts = [...extra, hint ? hintId : null, error ? errorId : null].filter((p): p is string => Boolean(p));
  return { inputId, hintId, errorId, describedBy: parts.length > 0 ? parts.join(" ") : undefined };
}

const controlClasses =
  "block w-full min-h-touch rounded-lg border-2 bg-paper-raised px-3 py-2 text-base text-ink placeholder:text-graphite " +
  "disabled:bg-paper-sunk disabled:text-graphite";

function controlBorder(error: FieldTextProps["error"]) {
  return error ? "border-over" : "border-rule-strong focus-visible:border-spruce";
}

function FieldFrame({
  ids,
  label,
  hint,
  error,
  hideLabel,
  required,
  className,
  children,
}: FieldTextProps & { ids: FieldIds; required?: boolean; className?: string; children: ReactNode }) {
  return (
    <div className={cx("flex flex-col gap-1", className)}>
      <label htmlFor={ids.inputId} className={cx("font-bold text-ink", hideLabel && "sr-only")}>
        {label}
        {required ? <span className="font-normal text-graphite"> (required)</span> : null}
      </label>
      {hint ? (
        <p id={ids.hintId} className="text-sm text-graphite">
          {hint}
        </p>
      ) : null}
      {children}
      {error ? (
        <p id={ids.errorId} className="flex items-start gap-1.5 text-sm font-bold text-over-ink">
          <WarningIcon className="mt-0.5 h-5 w-5 shrink-0" />
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}

export type TextFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, "size"> & FieldTextProps & { containerClassName?: string };

export function TextField({ label, hint, error, hideLabel, id, className, containerClassName, required, ...input }: TextFieldProps) {
  const ids = useFieldIds(id, hint, error);
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={error} hideLabel={hideLabel} required={required} className={containerClassName}>
      <input
        id={ids.inputId}
        className={cx(controlClasses, controlBorder(error), className)}
        aria-invalid={error ? true : undefined}
        aria-describedby={ids.describedBy}
        required={required}
        {...input}
      />
    </FieldFrame>
  );
}

export type SelectOption = { value: string; label: string; disabled?: boolean };

export type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, "size"> &
  FieldTextProps & {
    options: SelectOption[];
    /** A first, empty choice such as "Choose a species". */
    placeholder?: string;
    containerClassName?: string;
  };

export function SelectField({ label, hint, error, hideLabel, id, options, placeholder, className, containerClassName, required, ...select }: SelectFieldProps) {
  const ids = useFieldIds(id, hint, error);
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={error} hideLabel={hideLabel} required={required} className={containerClassName}>
      <div className="relative">
        <select
          id={ids.inputId}
          className={cx(controlClasses, controlBorder(error), "appearance-none pr-10", className)}
          aria-invalid={error ? true : undefined}
          aria-describedby={ids.describedBy}
          required={required}
          {...select}
        >
          {placeholder !== undefined ? <option value="">{placeholder}</option> : null}
          {options.map((option) => (
            <option key={option.value} value={option.value} disabled={option.disabled}>
              {option.label}
            </option>
          ))}
        </select>
        <svg
          viewBox="0 0 24 24"
          aria-hidden="true"
          focusable="false"
          className="pointer-events-none absolute right-3 top-1/2 h-5 w-5 -translate-y-1/2 text-ink"
          fill="none"
          stroke="currentColor"
          strokeWidth="2.5"
          strokeLinecap="round"
          strokeLinejoin="round"
        >
          <path d="M6 9.5l6 6 6-6" />
        </svg>
      </div>
    </FieldFrame>
  );
}

export type NumberWithUnitFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, "size" | "type"> &
  FieldTextProps & {
    /** The unit shown after the number and read out with it, e.g. "ft", "psf", "plf", "in". */
    unit: string;
    /** How the unit is read aloud when it differs from its abbreviation ("pounds per square foot"). */
    unitSpoken?: string;
    containerClassName?: string;
  };

/** A number typed with the phone's decimal keypad, its unit always in view beside it. */
export function NumberWithUnitField({
  label,
  hint,
  error,
  hideLabel,
  id,
  unit,
  unitSpoken,
  className,
  containerClassName,
  required,
  inputMode,
  ...input
}: NumberWithUnitFieldProps) {
  const unitIdBase = useId();
  const unitId = `unit-${unitIdBase}`;
  const ids = useFieldIds(id, hint, error, [unitId]);
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={error} hideLabel={hideLabel} required={required} className={containerClassName}>
      <div
        className={cx(
          "flex min-h-touch items-stretch overflow-hidden rounded-lg border-2 bg-paper-raised focus-within:outline-3 focus-within:outline-offset-2 focus-within:outline-focus",
          controlBorder(error),
        )}
      >
        <input
          id={ids.inputId}
          type="text"
          inputMode={inputMode ?? "decimal"}
          autoComplete="off"
          className={cx("figures min-h-touch min-w-0 flex-1 bg-transparent px-3 py-2 text-base text-ink outline-none", className)}
          aria-invalid={error ? true : undefined}
          aria-describedby={ids.describedBy}
          required={required}
          {...input}
        />
        <span id={unitId} className="figures flex items-center border-l-2 border-rule bg-paper-sunk px-3 font-bold text-ink-soft">
          <span aria-hidden={unitSpoken ? true : undefined}>{unit}</span>
          {unitSpoken ? <span className="sr-only">{unitSpoken}</span> : null}
        </span>
      </div>
    </FieldFrame>
  );
}
