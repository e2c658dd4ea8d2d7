import "server-only";
import type Stripe from "stripe";
import { env } from "@/lib/env";
import { HttpError } from "@/lib/http";
import { getOrCreateCustomer, type BillingUser } from "./customers";
import { PLANS, type PlanId } from "./plans";
import { getStripe } from "./stripe";
import { hasActiveSubscription } from "./subscriptions";

/**
 * Starts Stripe Checkout in subscription mode for one plan and returns the page to send the user to.
 * The price is found by lookup key, so the same code runs on the stand-in and on a Stripe account.
 * A user who already has an active subscription is sent to the billing page instead (409).
 */
export interface CheckoutReturn {
  /** the job whose sheet the builder asked to save: after paying they land back on it with the sheet saved */
  saveSheetForJobId?: string;
}

/** Where Billing sends the builder on after a paid checkout that started from "Save job sheet". */
export function saveSheetReturnPath(jobId: string): string {
  return `/jobs/${jobId}?saveSheet=1`;
}

export async function startCheckout(
  user: BillingUser,
  plan: PlanId,
  stripe: Stripe = getStripe(),
  back: CheckoutReturn = {},
): Promise<{ url: string; sessionId: string }> {
  if (await hasActiveSubscription(user.id)) {
    throw new HttpError(409, "You already have an active subscription. Manage it on the billing page.");
  }
  const { lookupKey } = PLANS[plan];
  const prices = await stripe.prices.list({ lookup_keys: [lookupKey], active: true, limit: 1 });
  const price = prices.data[0];
  if (!price) throw new HttpError(503, "Subscriptions are not set up yet (no price found). Try again later.");
  const customer = await getOrCreateCustomer(stripe, user);
  const appUrl = env().APP_URL.replace(/\/$/, "");
  const session = await stripe.checkout.sessions.create({
    mode: "subscription",
    customer,
    client_reference_id: user.id,
    line_items: [{ price: price.id, quantity: 1 }],
    success_url: back.saveSheetForJobId
      ? `${appUrl}/billing?checkout=success&session_id={CHECKOUT_SESSION_ID}&next=${encodeURIComponent(saveSheetReturnPath(back.saveSheetForJobId))}`
      : `${appUrl}/billing?checkout=success&session_id={CHECKOUT_SESSION_ID}`,
    cancel_url: back.saveSheetForJobId ? `${appUrl}/pricing?checkout=canceled&job=${back.saveSheetForJobId}` : `${appUrl}/pricing?checkout=canceled`,
    metadata: { userId: user.id, plan },
    subscription_data: { metadata: { userId: user.id, plan } },
  });
  if (!session.url) throw new HttpError(502, "The payment page could not be opened. Try again.");
  return { url: session.url, sessionId: session.id };
}
