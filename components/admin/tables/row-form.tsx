"use client";

import { useFormik } from "formik";
import { useState } from "react";
import { FormAlert } from "@/components/auth/form-alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { NumberWithUnitField, SelectField, TextField } from "@/components/ui/field";
import { call, sendJson, type CommitResponse, type FieldSpec, type FlatRow, type TableKey } from "./api";
import { rowFormSchema } from "./row-schema";

export type RowFormProps = {
  table: TableKey;
  title: string;
  fields: FieldSpec[];
  /** the version the rows on screen come from: a save against an older one is refused */
  baseVersionId: string;
  /** the row being edited, or null to add one */
  row: { key: string; values: FlatRow } | null;
  onClose: () => void;
  onSaved: (answer: CommitResponse) => void;
};

function blankRow(fields: FieldSpec[]): FlatRow {
  return Object.fromEntries(fields.map((f) => [f.name, ""]));
}

function GradesField({ field, value, onChange, error }: { field: FieldSpec; value: string; onChange: (v: string) => void; error?: string }) {
  const chosen = value
    .split(";")
    .map((v) => v.trim())
    .filter(Boolean);
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="font-bold text-ink">{field.label}</legend>
      <div className="flex flex-wrap gap-2">
        {(field.choices ?? []).map((choice) => (
          <label key={choice} className="inline-flex min-h-touch items-center gap-2 rounded-lg border-2 border-rule-strong bg-paper-raised px-3">
            <input
              type="checkbox"
              className="h-5 w-5"
              checked={chosen.includes(choice)}
              onChange={(e) => {
                const next = e.target.checked ? [...chosen, choice] : chosen.filter((c) => c !== choice);
                onChange((field.choices ?? []).filter((c) => next.includes(c)).join(";"));
              }}
            />
            {choice}
          </label>
        ))}
      </div>
      {error ? <p className="text-sm font-bold text-over-ink">{error}</p> : null}
    </fieldset>
  );
}

/** Adds or edits one row in a dialog: every column with its unit beside it, checked as typed. */
export function RowForm({ table, title, fields, baseVersionId, row, onClose, onSaved }: RowFormProps) {
  const [note, setNote] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const [removing, setRemoving] = useState(false);
  const url = `/api/admin/tables/${table}/rows`;

  const formik = useFormik<FlatRow>({
    initialValues: row ? { ...blankRow(fields), ...row.values } : blankRow(fields),
    validationSchema: rowFormSchema(fields),
    validateOnBlur: true,
    onSubmit: async (values, helpers) => {
      setProblem(null);
      const body = { baseVersionId, values, note: note.trim() || undefined, ...(row ? { originalKey: row.key } : {}) };
      const answer = await call<CommitResponse>(url, sendJson(row ? "PUT" : "POST", body));
      if (answer.ok) return onSaved(answer.body);
      const issues = answer.body.issues ?? [];
      const byField = Object.fromEntries(issues.filter((i) => i.path.startsWith("values.")).map((i) => [i.path.slice(7), i.message]));
      if (Object.keys(byField).length > 0) helpers.setErrors(byField);
      setProblem(
        answer.status === 409
          ? `Not saved: ${answer.body.error}`
          : Object.keys(byField).length > 0
            ? "Not saved: fix the fields marked below."
            : `Not saved: ${answer.body.error}`,
      );
    },
  });

  async function remove() {
    if (!row) return;
    setRemoving(true);
    const answer = await call<CommitResponse>(url, sendJson("DELETE", { baseVersionId, key: row.key, note: note.trim() || undefined }));
    setRemoving(false);
    setConfirmRemove(false);
    if (answer.ok) onSaved(answer.body);
    else setProblem(`Not removed: ${answer.body.error}`);
  }

  const error = (name: string) => (formik.touched[name] || formik.submitCount > 0 ? formik.errors[name] : undefined);

  return (
    <Dialog
      open
      onClose={onClose}
      title={row ? `Edit ${row.key.replaceAll("|", " · ")}` : `Add a row to ${title}`}
      description="Saving publishes a new version of the tables; the version before it stays in the history, and sheets made with it keep its numbers."
      actions={
        <>
          {row ? (
            <Button variant="danger" onClick={() => setConfirmRemove(true)} disabled={formik.isSubmitting}>
              Remove row
            </Button>
          ) : null}
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" form="row-form" loading={formik.isSubmitting}>
            Save as new version
          </Button>
        </>
      }
    >
      <form id="row-form" noValidate onSubmit={formik.handleSubmit} className="flex flex-col gap-4" aria-label={`${title} row`}>
        {problem ? <FormAlert tone="error">{problem}</FormAlert> : null}
        {confirmRemove ? (
          <FormAlert tone="error">
            <p>
              Remove {row?.key.replaceAll("|", " · ")} from {title}? This publishes a new version without it.
            </p>
            <div className="mt-2 flex flex-wrap gap-2">
              <Button variant="danger" loading={removing} onClick={remove}>
                Yes, remove it
              </Button>
              <Button variant="secondary" onClick={() => setConfirmRemove(false)}>
                Keep it
              </Button>
            </div>
          </FormAlert>
        ) : null}
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          {fields.map((f) => {
            const props = { ...formik.getFieldProps(f.name), label: f.label, hint: f.hint, error: error(f.name), required: !f.optional, id: `field-${f.name}` };
            if (f.kind === "choiceList") {
              return (
                <div key={f.name} className="sm:col-span-2">
                  <GradesField field={f} value={formik.values[f.name] ?? ""} onChange={(v) => formik.setFieldValue(f.name, v)} error={error(f.name)} />
                </div>
              );
            }
            if (f.kind === "choice") {
              return (
                <SelectField
                  key={f.name}
                  {...props}
                  options={(f.choices ?? []).map((c) => ({ value: c, label: c }))}
                  placeholder={f.optional ? "(none)" : "Choose"}
                />
              );
            }
            if (f.kind === "number" && f.unit) return <NumberWithUnitField key={f.name} {...props} unit={f.unit} />;
            if (f.kind === "number") return <TextField key={f.name} {...props} inputMode="decimal" autoComplete="off" />;
            if (f.kind === "numberList") {
              return <TextField key={f.name} {...props} label={`${f.label}${f.unit ? ` (${f.unit})` : ""}`} hint="separate values with ;" autoComplete="off" />;
            }
            return <TextField key={f.name} {...props} containerClassName={f.maxLength && f.maxLength > 80 ? "sm:col-span-2" : undefined} autoComplete="off" />;
          })}
        </div>
        <TextField
          label="Note for the history"
          hint="Why the change: a corrected value, a new product, the yard's prices…"
          name="note"
          value={note}
          onChange={(e) => setNote(e.target.value)}
          maxLength={500}
        />
      </form>
    </Dialog>
  );
}
