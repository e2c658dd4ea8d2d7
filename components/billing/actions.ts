"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { runAction, type ActionDenied, type ActionFailure } from "@/lib/auth/action";
import { startCheckout } from "@/lib/payments/checkout";
import { PLAN_IDS } from "@/lib/payments/plans";
import { openBillingPortal } from "@/lib/payments/portal";

export type BillingActionResult = ActionFailure | ActionDenied | null;

const CheckoutInput = z.object({
  plan: z.enum(["monthly", "yearly"] satisfies typeof PLAN_IDS, { message: "choose the monthly or the yearly plan" }),
  /** the job whose sheet the builder was saving when they chose to subscribe (they come back to it) */
  job: z.string().uuid("job must be a job id").optional(),
});

// startCheckoutAction — open Stripe Checkout for a plan, signed-in builder or subscriber
export async function startCheckoutAction(_previous: BillingActionResult, form: FormData): Promise<BillingActionResult> {
  const result = await runAction(
    { plan: form.get("plan"), job: form.get("job") || undefined },
    {
      roles: ["builder", "subscriber"],
      schema: CheckoutInput,
      invalid: "Choose a plan.",
      failed: "The payment page could not be opened.",
      failedStatus: 502,
      run: (user, data) => startCheckout(user, data.plan, undefined, { saveSheetForJobId: data.job }),
    },
  );
  if (!result.ok) return result;
  redirect(result.url);
}

// openPortalAction — open Stripe's billing portal to cancel or resume, any signed-in account with a customer
export async function openPortalAction(_previous: BillingActionResult, _form: FormData): Promise<BillingActionResult> {
  const result = await runAction(
    {},
    { schema: z.object({}), failed: "The subscription settings could not be opened.", failedStatus: 502, run: (user) => openBillingPortal(user) },
  );
  if (!result.ok) return result;
  redirect(result.url);
}
