// Subscriptions through Stripe (or the local stand-in): what other parts of Spanlark use.
export { FREE_LIMITS, PLANS, PLAN_IDS, PRODUCT, formatMoney, type FreeLimits, type Plan, type PlanId } from "./plans";
export {
  getSubscription,
  hasActiveSubscription,
  hasPaidAccess,
  requirePaidAccess,
  getPlanLimits,
  type PlanLimits,
  type SubscriptionSummary,
} from "./subscriptions";
export { startCheckout } from "./checkout";
export { openBillingPortal } from "./portal";
export { verifyStripeEvent, handleStripeEvent, syncCheckoutSession } from "./webhooks";
