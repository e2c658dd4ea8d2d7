import "server-only";
import type Stripe from "stripe";
import { getSequelize } from "@/lib/db";
import { StripeCustomer } from "@/models/stripe-customer";

export interface BillingUser {
  id: string;
  email: string;
  name: string;
  company: string | null;
}

function isMissing(err: unknown): boolean {
  return (err as { code?: string }).code === "resource_missing";
}

/** The user's Stripe customer id, or null when they never started a checkout. */
export async function findCustomerId(userId: string): Promise<string | null> {
  getSequelize();
  return (await StripeCustomer.findByPk(userId))?.stripeCustomerId ?? null;
}

/** The user whose Stripe customer this is, or null. */
export async function findUserIdByCustomer(stripeCustomerId: string): Promise<string | null> {
  getSequelize();
  return (await StripeCustomer.findOne({ where: { stripeCustomerId } }))?.userId ?? null;
}

/**
 * The user's Stripe customer, made on first use. A customer that Stripe no longer knows (deleted, or a
 * stand-in restarted without its state) is replaced by a new one.
 */
export async function getOrCreateCustomer(stripe: Stripe, user: BillingUser): Promise<string> {
  getSequelize();
  const row = await StripeCustomer.findByPk(user.id);
  if (row) {
    try {
      const customer = await stripe.customers.retrieve(row.stripeCustomerId);
      if (!("deleted" in customer && customer.deleted)) return customer.id;
    } catch (err) {
      if (!isMissing(err)) throw err;
    }
  }
  const customer = await stripe.customers.create({
    email: user.email,
    name: user.name,
    description: user.company ?? undefined,
    metadata: { userId: user.id },
  });
  if (row) {
    row.stripeCustomerId = customer.id;
    await row.save();
  } else {
    await StripeCustomer.create({ userId: user.id, stripeCustomerId: customer.id });
  }
  return customer.id;
}
