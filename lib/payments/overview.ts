import "server-only";
import { getSequelize } from "@/lib/db";
import { env } from "@/lib/env";
import { User, type Role } from "@/models/user";
import { findCustomerId } from "./customers";
import { getPlanLimits, getSubscription, type PlanLimits, type SubscriptionSummary } from "./subscriptions";

export interface BillingOverview {
  role: Role;
  subscription: SubscriptionSummary | null;
  limits: PlanLimits;
  /** True once the user has a Stripe customer, so the billing portal can open. */
  hasCustomer: boolean;
  /** True when payments go to the local stand-in (test cards only, nothing is charged). */
  testMode: boolean;
}

/** What the billing page shows, read fresh (a webhook may have changed the role a moment ago). */
export async function getBillingOverview(userId: string): Promise<BillingOverview | null> {
  getSequelize();
  const user = await User.findByPk(userId);
  if (!user) return null;
  const [subscription, limits, customer] = await Promise.all([
    getSubscription(userId),
    getPlanLimits({ id: user.id, role: user.role }),
    findCustomerId(userId),
  ]);
  return { role: user.role, subscription, limits, hasCustomer: customer !== null, testMode: isTestMode() };
}

/** Payments run against the stand-in or a Stripe test key: the pages say so and name the test cards. */
export function isTestMode(): boolean {
  const e = env();
  return Boolean(e.STRIPE_API_HOST) || e.STRIPE_SECRET_KEY.startsWith("sk_test_");
}
