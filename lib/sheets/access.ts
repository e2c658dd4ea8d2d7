import "server-only";
import { hasPaidAccess } from "@/lib/payments/subscriptions";
import type { SessionUser } from "@/lib/auth/session";

/**
 * What an account may do with job sheets.
 * - With a subscription (or the subscriber or admin role): save new sheets, open them, print them and
 *   download their PDF.
 * - Without one (never subscribed, or lapsed): every sheet already saved stays in the list and opens on
 *   screen to read; saving a new sheet, printing and the PDF download are refused (403) until the account
 *   subscribes again. Nothing is ever deleted when a subscription lapses.
 */
export interface SheetAccess {
  canCreate: boolean;
  canReprint: boolean;
}

export async function sheetAccess(user: Pick<SessionUser, "id" | "role">): Promise<SheetAccess> {
  const paid = await hasPaidAccess(user);
  return { canCreate: paid, canReprint: paid };
}

export const SHEET_CREATE_DENIED =
  "Saving a job sheet needs a subscription. Sheets you saved before stay here to read; subscribe to save new ones and to print or download them.";
export const SHEET_REPRINT_DENIED =
  "Printing and downloading a job sheet need a subscription. You can still read this sheet on screen; subscribe to print or download it.";

/** Words for the sheet list and the job page, so the screen says what a lapsed account can do. */
export const SHEET_LAPSED_WORDS =
  "Without a subscription you can open and read every sheet you saved, but not save new sheets, print them or download their PDF.";
