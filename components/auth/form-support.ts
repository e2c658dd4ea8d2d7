import * as yup from "yup";

// The client's copy of lib/auth/schemas.ts rules, in yup for formik; the server checks again with zod.

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 72;

export const emailRule = yup
  .string()
  .trim()
  .required("enter your e-mail address")
  .max(254, "an e-mail address has at most 254 characters")
  .email("enter an e-mail address like name@example.com");

export const newPasswordRule = yup
  .string()
  .required("choose a password")
  .min(PASSWORD_MIN, `use at least ${PASSWORD_MIN} characters`)
  .test("bytes", `use at most ${PASSWORD_MAX} characters`, (v) => !v || new TextEncoder().encode(v).length <= PASSWORD_MAX);

export const nameRule = yup.string().trim().required("enter your name").max(120, "use at most 120 characters");

export const companyRule = yup.string().trim().max(160, "use at most 160 characters");

export interface FieldIssue {
  path: string;
  message: string;
}

export type PostResult<T> = { ok: true; status: number; data: T } | { ok: false; status: number; error: string; issues: FieldIssue[] };

/** POSTs JSON to one of our routes; a refusal comes back as its message and field issues, never a throw. */
export async function postJson<T>(url: string, body: unknown): Promise<PostResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  } catch {
    return { ok: false, status: 0, error: "No connection. Check your signal and try again; nothing was lost.", issues: [] };
  }
  const data = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (res.ok) return { ok: true, status: res.status, data: data as T };
  const error = typeof data.error === "string" ? data.error : "something went wrong on our side; try again";
  const issues = Array.isArray(data.issues) ? (data.issues as FieldIssue[]) : [];
  return { ok: false, status: res.status, error: capitalize(error), issues };
}

/** Field issues from the server as formik errors: { email: "…" }. */
export function issuesToErrors(issues: FieldIssue[]): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of issues) if (!errors[issue.path]) errors[issue.path] = capitalize(issue.message);
  return errors;
}

export function capitalize(message: string): string {
  return message ? message[0].toUpperCase() + message.slice(1) : message;
}

/** Signs this browser in with the ticket a spent mailed link answered with; false when it did not take (then sign in as usual). */
export async function signInWithTicket(ticket: unknown): Promise<boolean> {
  if (typeof ticket !== "string" || !ticket) return false;
  const { signIn } = await import("next-auth/react");
  const result = await signIn("ticket", { ticket, redirect: false }).catch(() => undefined);
  return Boolean(result?.ok && !result.error);
}
