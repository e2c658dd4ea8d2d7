/**
 * yup schemas of the flow's small forms (a point load, a line load, saving to a job). Lengths are
 * typed text parsed by lib/flow/length; every message names its field. Pure.
 */
import * as yup from "yup";
import { LOAD_CASES, type LoadCase } from "@/lib/solver/types";
import { parseLength } from "./length";

function lengthText(label: string, maxFt: () => number) {
  return yup
    .string()
    .required(`${label} is empty: type a length such as 4' 6"`)
    .test("length", "", function check(value) {
      const parsed = parseLength(value ?? "");
      if (!parsed.ok) return this.createError({ message: `${label} ${parsed.message}` });
      if (parsed.feet > maxFt() + 1e-9) return this.createError({ message: `${label} is past the end of the member` });
      return true;
    });
}

const caseField = yup
  .mixed<LoadCase>()
  .oneOf([...LOAD_CASES], "Load case must be D, L, Lr, S or W")
  .required("Load case is required");

export interface PointLoadForm {
  label: string;
  x: string;
  P: string;
  case: LoadCase;
}

export function pointLoadSchema(lengthFt: number): yup.ObjectSchema<PointLoadForm> {
  return yup.object({
    label: yup.string().trim().max(80, "Name must be 80 characters or fewer").default(""),
    x: lengthText("Position", () => lengthFt),
    P: yup
      .string()
      .required("Load is empty: type the load in lb")
      .test(
        "number",
        "Load must be a number of lb more than 0",
        (v) => Number.isFinite(Number((v ?? "").replace(/,/g, ""))) && Number((v ?? "").replace(/,/g, "")) > 0,
      )
      .test("max", "Load must be 1,000,000 lb or less", (v) => Number((v ?? "").replace(/,/g, "")) <= 1_000_000),
    case: caseField,
  });
}

export interface LineLoadForm {
  label: string;
  from: string;
  to: string;
  w: string;
  case: LoadCase;
}

export function lineLoadSchema(lengthFt: number): yup.ObjectSchema<LineLoadForm> {
  return yup.object({
    label: yup.string().trim().max(80, "Name must be 80 characters or fewer").default(""),
    from: lengthText("Starts at", () => lengthFt),
    to: lengthText("Ends at", () => lengthFt).test("after", "Ends at must be after Starts at", function after(value) {
      const a = parseLength(String(this.parent.from ?? ""));
      const b = parseLength(value ?? "");
      return !a.ok || !b.ok || b.feet > a.feet;
    }),
    w: yup
      .string()
      .required("Load is empty: type the load in plf")
      .test(
        "number",
        "Load must be a number of plf more than 0",
        (v) => Number.isFinite(Number((v ?? "").replace(/,/g, ""))) && Number((v ?? "").replace(/,/g, "")) > 0,
      )
      .test("max", "Load must be 100,000 plf or less", (v) => Number((v ?? "").replace(/,/g, "")) <= 100_000),
    case: caseField,
  });
}

export interface SaveMemberForm {
  /** an existing job id, or "new" */
  jobId: string;
  newJobName: string;
  newJobAddress: string;
  label: string;
}

export const saveMemberSchema: yup.ObjectSchema<SaveMemberForm> = yup.object({
  jobId: yup.string().required("Job is required: pick one or start a new job"),
  newJobName: yup
    .string()
    .trim()
    .max(120, "Job name must be 120 characters or fewer")
    .when("jobId", { is: "new", then: (s) => s.required("Job name is required for a new job"), otherwise: (s) => s })
    .default(""),
  newJobAddress: yup.string().trim().max(240, "Site address must be 240 characters or fewer").default(""),
  label: yup.string().trim().required("Member name is required, e.g. H1 kitchen header").max(120, "Member name must be 120 characters or fewer"),
});

export interface JobForm {
  name: string;
  siteAddress: string;
  notes: string;
}

export const jobFormSchema: yup.ObjectSchema<JobForm> = yup.object({
  name: yup.string().trim().required("Job name is required").max(120, "Job name must be 120 characters or fewer"),
  siteAddress: yup.string().trim().max(240, "Site address must be 240 characters or fewer").default(""),
  notes: yup.string().trim().max(4000, "Notes must be 4,000 characters or fewer").default(""),
});

export const LOAD_CASE_LABELS: Readonly<Record<LoadCase, string>> = {
  D: "D — dead (the building's own weight)",
  L: "L — live (people, furniture)",
  Lr: "Lr — roof live (workers, equipment)",
  S: "S — snow",
  W: "W — wind",
};
