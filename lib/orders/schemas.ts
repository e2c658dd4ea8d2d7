import { z } from "zod";

/** E-mail a job's order list to an address the builder types (a yard's orders desk). */
export const emailOrderSchema = z.object({
  jobId: z.string().uuid("Job is not a valid id"),
  to: z.string().trim().toLowerCase().email("Send to: must be an e-mail address like orders@yard.example").max(254, "Send to: must be 254 characters or fewer"),
  note: z.string().trim().max(500, "Note: must be 500 characters or fewer").optional().default(""),
});
export type EmailOrderInput = z.infer<typeof emailOrderSchema>;

/** ?format= of the order download route. */
export const orderFormatSchema = z.enum(["csv", "pdf"], { error: "format must be csv or pdf" });
export const paperSchema = z.enum(["letter", "a4"], { error: "paper must be letter or a4" });

/** A file name from a job's name: letters, digits and dashes. */
export function orderFileName(jobName: string, ext: "csv" | "pdf"): string {
  const base = jobName
    .normalize("NFKD")
    .replace(/[^A-Za-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 80);
  return `${base || "job"}-order.${ext}`;
}
