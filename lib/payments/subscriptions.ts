import "server-only";
import { Op, type Transaction } from "sequelize";
import { getSequelize } from "@/lib/db";
import { HttpError } from "@/lib/http";
import { Subscription, type SubscriptionStatus } from "@/models/subscription";
import { User, type Role } from "@/models/user";
import { FREE_LIMITS, PLANS, type PlanId } from "./plans";

/** Statuses that give access. A past-due, unpaid, paused or ended subscription does not. */
export const ACCESS_STATUSES: readonly SubscriptionStatus[] = ["active", "trialing"];
/** Statuses a Stripe subscription never leaves; news saying otherwise is older news. */
export const FINAL_STATUSES: readonly SubscriptionStatus[] = ["canceled", "incomplete_expired"];

export interface SubscriptionSummary {
  plan: PlanId | null;
  planName: string;
  status: SubscriptionStatus;
  /** True while the subscription gives access (active or trialing). */
  active: boolean;
  /** Set when the subscriber has canceled: access continues until currentPeriodEnd, then it ends. */
  cancelAtPeriodEnd: boolean;
  currentPeriodEnd: Date | null;
  endedAt: Date | null;
}

function summarize(row: Subscription): SubscriptionSummary {
  const plan = row.plan === "monthly" || row.plan === "yearly" ? row.plan : null;
  return {
    plan,
    planName: plan ? PLANS[plan].name : "Subscription",
    status: row.status,
    active: ACCESS_STATUSES.includes(row.status),
    cancelAtPeriodEnd: row.cancelAtPeriodEnd,
    currentPeriodEnd: row.currentPeriodEnd,
    endedAt: row.endedAt,
  };
}

/** The user's subscription that matters: a live one if any, otherwise the most recent; null if never. */
export async function getSubscription(userId: string): Promise<SubscriptionSummary | null> {
  getSequelize();
  const rows = await Subscription.findAll({
    where: { userId },
    order: [
      ["stripeUpdatedAt", "DESC"],
      ["createdAt", "DESC"],
    ],
    limit: 20,
  });
  if (rows.length === 0) return null;
  const live = rows.find((r) => ACCESS_STATUSES.includes(r.status)) ?? rows.find((r) => !FINAL_STATUSES.includes(r.status));
  return summarize(live ?? rows[0]);
}

/** True when the user has a subscription that Stripe reports active (or trialing). */
export async function hasActiveSubscription(userId: string, transaction?: Transaction): Promise<boolean> {
  getSequelize();
  const count = await Subscription.count({ where: { userId, status: { [Op.in]: [...ACCESS_STATUSES] } }, transaction });
  return count > 0;
}

/**
 * Whether an account may use the paid features (saving and reprinting job sheets, no free limits):
 * an active subscription, or the subscriber or admin role (an administrator may grant the role by hand).
 */
export async function hasPaidAccess(user: { id: string; role: Role }): Promise<boolean> {
  if (user.role === "admin" || user.role === "subscriber") return true;
  return hasActiveSubscription(user.id);
}

/** Throws HttpError 402 naming what needs a subscription, for routes and actions that gate a feature. */
export async function requirePaidAccess(user: { id: string; role: Role }, what = "Saving and reprinting job sheets"): Promise<void> {
  if (!(await hasPaidAccess(user))) {
    throw new HttpError(402, `${what} needs a subscription. See the plans on the pricing page.`, { upgrade: "/pricing" });
  }
}

export interface PlanLimits {
  /** Saved jobs allowed; null is no limit. */
  savedJobs: number | null;
  /** Live crew links allowed at once; null is no limit. */
  activeCrewLinks: number | null;
  /** Whether new job sheets may be saved and old ones reprinted (reading saved ones is always allowed). */
  canSaveSheets: boolean;
}

/** The limits that apply to an account now: none with paid access, FREE_LIMITS without. */
export async function getPlanLimits(user: { id: string; role: Role }): Promise<PlanLimits> {
  if (await hasPaidAccess(user)) return { savedJobs: null, activeCrewLinks: null, canSaveSheets: true };
  return { savedJobs: FREE_LIMITS.savedJobs, activeCrewLinks: FREE_LIMITS.activeCrewLinks, canSaveSheets: false };
}

/**
 * Sets the role from the subscriptions: "subscriber" with an active one, "builder" without. An admin is
 * never changed. Returns the role after the change.
 */
export async function refreshSubscriberRole(userId: string, transaction: Transaction): Promise<Role | null> {
  const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!user) return null;
  if (user.role === "admin") return user.role;
  const role: Role = (await hasActiveSubscription(userId, transaction)) ? "subscriber" : "builder";
  if (user.role !== role) {
    user.role = role;
    await user.save({ transaction });
  }
  return role;
}
