"use server";

import { z } from "zod";
import { runAction, type ActionResult } from "@/lib/auth/action";
import { saveJobSheet as saveSheet, type SheetListItem } from "@/lib/sheets/sheets";

export type SaveSheetResult = ActionResult<{ sheet: SheetListItem }>;

const SaveSheetInput = z.object({ jobId: z.string().uuid("must be a job id") });

// saveJobSheet — freeze the job's members into a new job sheet, signed-in owner of the job with a subscription
export async function saveJobSheet(input: unknown): Promise<SaveSheetResult> {
  return runAction(input, {
    schema: SaveSheetInput,
    invalid: "That is not a job.",
    failed: "The job sheet could not be saved.",
    run: async (user, data) => ({ sheet: await saveSheet(user, data.jobId) }),
    refresh: (_done, data) => [`/jobs/${data.jobId}`, "/sheets"],
  });
}
