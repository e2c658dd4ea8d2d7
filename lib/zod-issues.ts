/**
 * A zod error as the field-level issues every boundary answers with (routes, server actions, the CLI):
 * `{ path, message }`, the path's parts joined with dots, "" for the whole body. Pure.
 */
import type { core } from "zod";

export interface FieldIssue {
  /** "loads.2.psf"; "" names the whole body */
  path: string;
  message: string;
}

export function zodIssues(error: core.$ZodError): FieldIssue[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message }));
}
