"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
import { HttpError, zodIssues, type FieldIssue } from "@/lib/http";
import { logger } from "@/lib/logger";
import { startCheckout } from "@/lib/payments/checkout";
import { PLAN_IDS } from "@/lib/payments/plans";
import { openBillingPortal } from "@/lib/payments/portal";

export type BillingActionResult = { ok: false; error: string; status?: number; issues?: FieldIssue[] } | ActionDenied | null;

const CheckoutInput = z.object({
  plan: z.enum(["monthly", "yearly"] satisfies typeof PLAN_IDS, { message: "choose the monthly or the yearly plan" }),
  /** the job whose sheet the builder was saving when they chose to subscribe (they come back to it) */
  job: z.string().uuid("job must be a job id").optional(),
});

function failure(err: unknown, fallback: string): BillingActionResult {
  if (err instanceof HttpError && err.status < 500) return { ok: false, error: err.message, status: err.status };
  logger.error({ err }, fallback);
  return { ok: false, error: `${fallback} Try again in a minute.`, status: 502 };
}

// startCheckoutAction — open Stripe Checkout for a plan, signed-in builder or subscriber
export async function startCheckoutAction(_previous: BillingActionResult, form: FormData): Promise<BillingActionResult> {
  const auth = await authorizeAction("builder", "subscriber");
  if (!auth.ok) return auth;
  const parsed = CheckoutInput.safeParse({ plan: form.get("plan"), job: form.get("job") || undefined });
  if (!parsed.success) return { ok: false, error: "Choose a plan.", status: 400, issues: zodIssues(parsed.error) };
  let url: string;
  try {
    ({ url } = await startCheckout(auth.user, parsed.data.plan, undefined, { saveSheetForJobId: parsed.data.job }));
  } catch (err) {
    return failure(err, "The payment page could not be opened.");
  }
  redirect(url);
}

// openPortalAction — open Stripe's billing portal to cancel or resume, any signed-in account with a customer
export async function openPortalAction(_previous: BillingActionResult, _form: FormData): Promise<BillingActionResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  let url: string;
  try {
    ({ url } = await openBillingPortal(auth.user));
  } catch (err) {
    return failure(err, "The subscription settings could not be opened.");
  }
  redirect(url);
}
