"use client";

import { Formik, Form, type FormikProps } from "formik";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { NumberWithUnitField, SelectField, TextField } from "@/components/ui/field";
import { LOAD_CASE_LABELS, lineLoadSchema, pointLoadSchema, type LineLoadForm, type PointLoadForm } from "@/lib/flow/forms";
import { formatFeetInches, parseLength } from "@/lib/flow/length";
import { newLoadId, type FlowLineLoad, type FlowPointLoad } from "@/lib/flow/state";
import { LOAD_CASES } from "@/lib/solver/types";

const caseOptions = LOAD_CASES.map((c) => ({ value: c, label: LOAD_CASE_LABELS[c] }));

function fieldError<T>(form: FormikProps<T>, name: keyof T & string): string | undefined {
  const touched = (form.touched as Record<string, unknown>)[name];
  const error = (form.errors as Record<string, unknown>)[name];
  return touched && typeof error === "string" ? error : undefined;
}

const num = (text: string) => Number(text.replace(/,/g, ""));

export type PointLoadDialogProps = {
  open: boolean;
  lengthFt: number;
  initial: FlowPointLoad | null;
  onClose: () => void;
  onSave: (load: FlowPointLoad) => void;
};

/** Add or change a point load (a post, a girder truss). */
export function PointLoadDialog({ open, lengthFt, initial, onClose, onSave }: PointLoadDialogProps) {
  const start: PointLoadForm = initial
    ? { label: initial.label, x: formatFeetInches(initial.x), P: String(initial.P), case: initial.case }
    : { label: "Post", x: formatFeetInches(lengthFt / 2), P: "", case: "D" };
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={initial ? "Change the point load" : "Add a point load"}
      description="A post or a girder bearing on the member, at one place."
    >
      {open ? (
        <Formik<PointLoadForm>
          initialValues={start}
          validationSchema={pointLoadSchema(lengthFt)}
          onSubmit={(values) => {
            const x = parseLength(values.x);
            if (!x.ok) return;
            onSave({ id: initial?.id ?? newLoadId("p"), label: values.label.trim() || "Point load", x: x.feet, P: num(values.P), case: values.case });
          }}
        >
          {(form) => (
            <Form noValidate className="flex flex-col gap-4">
              <TextField label="Name" {...form.getFieldProps("label")} error={fieldError(form, "label")} />
              <TextField
                label="Position from the left end"
                hint={`0 to ${formatFeetInches(lengthFt)}`}
                {...form.getFieldProps("x")}
                error={fieldError(form, "x")}
                className="figures"
                autoComplete="off"
              />
              <NumberWithUnitField label="Load" unit="lb" unitSpoken="pounds" {...form.getFieldProps("P")} error={fieldError(form, "P")} />
              <SelectField label="Load case" options={caseOptions} {...form.getFieldProps("case")} error={fieldError(form, "case")} />
              <LoadFormActions editing={initial !== null} onCancel={onClose} />
            </Form>
          )}
        </Formik>
      ) : null}
    </Dialog>
  );
}

export type LineLoadDialogProps = {
  open: boolean;
  lengthFt: number;
  initial: FlowLineLoad | null;
  onClose: () => void;
  onSave: (load: FlowLineLoad) => void;
};

/** Add or change a line load over all or part of the member (a wall standing on it, a partial load). */
export function LineLoadDialog({ open, lengthFt, initial, onClose, onSave }: LineLoadDialogProps) {
  const start: LineLoadForm = initial
    ? { label: initial.label, from: formatFeetInches(initial.from), to: formatFeetInches(initial.to), w: String(initial.w), case: initial.case }
    : { label: "Wall", from: formatFeetInches(0), to: formatFeetInches(lengthFt), w: "", case: "D" };
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={initial ? "Change the line load" : "Add a line load"}
      description="A load spread along the member, such as a wall on it. Set where it starts and ends for a partial load."
    >
      {open ? (
        <Formik<LineLoadForm>
          initialValues={start}
          validationSchema={lineLoadSchema(lengthFt)}
          onSubmit={(values) => {
            const from = parseLength(values.from);
            const to = parseLength(values.to);
            if (!from.ok || !to.ok) return;
            onSave({
              id: initial?.id ?? newLoadId("l"),
              label: values.label.trim() || "Line load",
              from: from.feet,
              to: to.feet,
              w: num(values.w),
              case: values.case,
            });
          }}
        >
          {(form) => (
            <Form noValidate className="flex flex-col gap-4">
              <TextField label="Name" {...form.getFieldProps("label")} error={fieldError(form, "label")} />
              <div className="grid grid-cols-2 gap-3">
                <TextField label="Starts at" {...form.getFieldProps("from")} error={fieldError(form, "from")} className="figures" autoComplete="off" />
                <TextField label="Ends at" {...form.getFieldProps("to")} error={fieldError(form, "to")} className="figures" autoComplete="off" />
              </div>
              <NumberWithUnitField
                label="Load"
                unit="plf"
                unitSpoken="pounds per foot"
                hint="Pounds per foot of member"
                {...form.getFieldProps("w")}
                error={fieldError(form, "w")}
              />
              <SelectField label="Load case" options={caseOptions} {...form.getFieldProps("case")} error={fieldError(form, "case")} />
              <LoadFormActions editing={initial !== null} onCancel={onClose} />
            </Form>
          )}
        </Formik>
      ) : null}
    </Dialog>
  );
}

/** Cancel and Save/Add at the foot of both load forms. */
function LoadFormActions({ editing, onCancel }: { editing: boolean; onCancel: () => void }) {
  return (
    <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
      <Button variant="secondary" onClick={onCancel}>
        Cancel
      </Button>
      <Button type="submit">{editing ? "Save the load" : "Add the load"}</Button>
    </div>
  );
}
