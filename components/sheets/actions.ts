"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
import { HttpError, zodIssues, type FieldIssue } from "@/lib/http";
import { logger } from "@/lib/logger";
import { saveJobSheet as saveSheet, type SheetListItem } from "@/lib/sheets/sheets";

export type SaveSheetResult = { ok: true; sheet: SheetListItem } | { ok: false; error: string; status?: number; issues?: FieldIssue[] } | ActionDenied;

const SaveSheetInput = z.object({ jobId: z.string().uuid("must be a job id") });

// saveJobSheet — freeze the job's members into a new job sheet, signed-in owner of the job with a subscription
export async function saveJobSheet(input: unknown): Promise<SaveSheetResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = SaveSheetInput.safeParse(input);
  if (!parsed.success) return { ok: false, error: "That is not a job.", status: 400, issues: zodIssues(parsed.error) };
  try {
    const sheet = await saveSheet(auth.user, parsed.data.jobId);
    revalidatePath(`/jobs/${parsed.data.jobId}`);
    revalidatePath("/sheets");
    return { ok: true, sheet };
  } catch (err) {
    if (err instanceof HttpError && err.status < 500) return { ok: false, error: err.message, status: err.status };
    logger.error({ err }, "job sheet save failed");
    return { ok: false, error: "The job sheet could not be saved. Try again in a minute.", status: 500 };
  }
}
