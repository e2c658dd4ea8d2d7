import type { ZodError } from "zod";

/** Bad input on the command line: exit status 2 with this message on standard error. */
export class CliInputError extends Error {}

/** One line per issue, each naming the field path and the reason. */
export function describeZodError(error: ZodError): string {
  return error.issues.map((i) => `${i.path.length ? i.path.join(".") : "(input)"}: ${i.message}`).join("\n");
}
