/** The Stripe stand-in: billing portal sessions (/v1/billing_portal/sessions) and the portal page's actions. */
import { missingParam, noSuch } from "./errors";
import { type FormObject, str } from "./form";
import { assertUrl } from "./helpers";
import { type CustomerObject, newId, type PortalSessionObject, type ProductObject, type SubscriptionObject } from "./objects";
import { clone, type StandinStore } from "./store";
import { cancelSubscription, updateSubscription } from "./subscriptions";

export function createPortalSession(store: StandinStore, p: FormObject): PortalSessionObject {
  const customer = str(p, "customer");
  if (!customer) throw missingParam("customer");
  if (!store.customers.has(customer)) throw noSuch("customer", customer, "customer");
  const returnUrl = str(p, "return_url") ?? null;
  if (returnUrl) assertUrl(returnUrl, "return_url");
  const id = newId("bps");
  const session: PortalSessionObject = {
    id,
    object: "billing_portal.session",
    configuration: "bpc_standin_default",
    created: store.now(),
    customer,
    flow: null,
    livemode: false,
    locale: null,
    on_behalf_of: null,
    return_url: returnUrl,
    url: `${store.publicUrl}/portal/${id}`,
  };
  store.portalSessions.set(id, session);
  return clone(session);
}

/** What the portal page shows: the session and the customer's subscriptions, newest first. */
export function portalView(
  store: StandinStore,
  id: string,
): { session: PortalSessionObject; customer: CustomerObject; subscriptions: SubscriptionObject[]; products: Map<string, ProductObject> } {
  const session = store.portalSessions.get(id);
  if (!session) throw noSuch("billing_portal.session", id, "session");
  const customer = store.customers.get(session.customer);
  if (!customer) throw noSuch("customer", session.customer);
  const subscriptions = [...store.subscriptions.values()].filter((s) => s.customer === customer.id).sort((a, b) => b.created - a.created);
  return { session: clone(session), customer: clone(customer), subscriptions: clone(subscriptions), products: new Map(store.products) };
}

/** A portal action on one of the session customer's subscriptions. */
export function portalAction(store: StandinStore, id: string, subscriptionId: string, action: "cancel" | "resume" | "cancel_now"): SubscriptionObject {
  const session = store.portalSessions.get(id);
  if (!session) throw noSuch("billing_portal.session", id, "session");
  const sub = store.subscriptions.get(subscriptionId);
  if (!sub || sub.customer !== session.customer) throw noSuch("subscription", subscriptionId, "subscription");
  if (action === "cancel_now") return cancelSubscription(store, subscriptionId);
  return updateSubscription(store, subscriptionId, { cancel_at_period_end: action === "cancel" ? "true" : "false" });
}
