import * as yup from "yup";
import { formatBound, type FieldSpec, type FlatRow } from "@/lib/tables/schemas";

/**
 * The edit form's yup schema, built from the same field specs (labels, units, bounds) as the server's zod
 * row schemas, so the form refuses what the server would refuse before it is sent. Cross-field rules
 * (A = b·d, Emin < E…) are left to the server, whose answer names the field.
 */

const NUMBER_TEXT = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

function bound(f: FieldSpec, value: number): string {
  return f.unit ? `${formatBound(value)} ${f.unit}` : formatBound(value);
}

function numberChecks(f: FieldSpec, s: yup.StringSchema<string | undefined>, list: boolean): yup.StringSchema<string | undefined> {
  const parts = (v: string | undefined) =>
    list
      ? (v ?? "")
          .split(/[;,]/)
          .map((p) => p.trim())
          .filter(Boolean)
      : v
        ? [v.trim()]
        : [];
  let out = s.test("number", `${f.label} must be a plain number${list ? " list, separated by ;" : ""}`, (v) => parts(v).every((p) => NUMBER_TEXT.test(p)));
  if (f.min !== undefined) {
    const min = f.min;
    out = out.test("min", `${f.label} must be at least ${bound(f, min)}`, (v) => parts(v).every((p) => !NUMBER_TEXT.test(p) || Number(p) >= min));
  }
  if (f.max !== undefined) {
    const max = f.max;
    out = out.test("max", `${f.label} must be at most ${bound(f, max)}`, (v) => parts(v).every((p) => !NUMBER_TEXT.test(p) || Number(p) <= max));
  }
  return out;
}

export function rowFormSchema(fields: FieldSpec[]): yup.ObjectSchema<FlatRow> {
  const shape: Record<string, yup.StringSchema<string | undefined>> = {};
  for (const f of fields) {
    let s = yup.string().trim();
    if (!f.optional) s = s.required(`${f.label} is required`);
    if (f.kind === "number") s = numberChecks(f, s, false);
    if (f.kind === "numberList") s = numberChecks(f, s, true);
    if (f.kind === "choice" && f.choices) {
      const choices = f.choices;
      s = s.test("choice", `${f.label} must be one of: ${choices.join(", ")}`, (v) => !v || choices.includes(v));
    }
    if (f.kind === "text") s = s.max(f.maxLength ?? 200, `${f.label} must be at most ${f.maxLength ?? 200} characters`);
    shape[f.name] = s;
  }
  return yup.object(shape) as yup.ObjectSchema<FlatRow>;
}
