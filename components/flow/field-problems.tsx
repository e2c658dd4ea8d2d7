"use client";

import { createContext, useContext } from "react";

/**
 * The flow's fields tell the step which of them hold an entry that cannot be used, so the step can refuse to
 * go on with the value from before (the typed text stays in the field, with its message). Keyed by the
 * input's id; `null` clears the field's problem.
 */
export type ReportFieldProblem = (fieldId: string, message: string | null) => void;

export const FieldProblemsContext = createContext<ReportFieldProblem | null>(null);

export function useReportFieldProblem(): ReportFieldProblem | null {
  return useContext(FieldProblemsContext);
}
