import "server-only";
import type Stripe from "stripe";
import { env } from "@/lib/env";
import { HttpError } from "@/lib/http";
import { findCustomerId } from "./customers";
import { getStripe } from "./stripe";

/** Opens Stripe's billing portal (cancel, resume, card) for the user; 404 before their first checkout. */
export async function openBillingPortal(user: { id: string }, stripe: Stripe = getStripe()): Promise<{ url: string }> {
  const customer = await findCustomerId(user.id);
  if (!customer) throw new HttpError(404, "There is no subscription to manage yet. Choose a plan on the pricing page.");
  const session = await stripe.billingPortal.sessions.create({
    customer,
    return_url: `${env().APP_URL.replace(/\/$/, "")}/billing`,
  });
  return { url: session.url };
}
