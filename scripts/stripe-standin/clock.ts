/** The Stripe stand-in: the test control that moves the clock to the end of a billing period (/_control/advance). */
import { noSuch } from "./errors";
import { bool, type FormObject, str } from "./form";
import { periodEndOf } from "./helpers";
import { type StandinStore } from "./store";
import { endPeriod } from "./subscriptions";

/**
 * Moves the clock to the end of the current period of one subscription (or the earliest-ending live one)
 * and runs what Stripe would then: a subscription set to cancel ends (customer.subscription.deleted); any
 * other renews with a new invoice — paid (invoice.paid) or, with `fail`, unpaid (invoice.payment_failed,
 * status past_due). Returns the events sent.
 */
export function advance(store: StandinStore, p: FormObject): { now: number; events: string[] } {
  const subscriptionId = str(p, "subscription");
  const fail = bool(p, "fail") ?? false;
  const live = [...store.subscriptions.values()].filter((s) => ["active", "trialing", "past_due"].includes(s.status));
  const target = subscriptionId ? store.subscriptions.get(subscriptionId) : live.sort((a, b) => periodEndOf(a) - periodEndOf(b))[0];
  if (subscriptionId && !target) throw noSuch("subscription", subscriptionId, "subscription");
  const before = store.events.length;
  if (target) {
    const end = periodEndOf(target);
    if (end >= store.now()) store.clockOffsetSec += end - store.now() + 1;
    const due = live.filter((s) => periodEndOf(s) <= store.now() && (!subscriptionId || s.id === subscriptionId));
    for (const sub of due) endPeriod(store, sub, fail);
  }
  return { now: store.now(), events: store.events.slice(before).map((e) => e.type) };
}
