/** The Stripe stand-in: checkout sessions (/v1/checkout/sessions) and the test checkout page's payment. */
import { createCustomer } from "./customers";
import { cardDeclined, invalidParam, missingParam, noSuch, StandinApiError } from "./errors";
import { type FormObject, list, metadata, obj, str } from "./form";
import { assertUrl, checkExpiry, readLineItem } from "./helpers";
import { addInterval, type CheckoutSessionObject, newId, type PriceObject, type ProductObject, type SubscriptionObject } from "./objects";
import { clone, type StandinStore } from "./store";
import { makeInvoice } from "./subscriptions";

export const TEST_CARDS: Record<string, { outcome: "paid" } | { outcome: "declined"; declineCode: string; message: string }> = {
  "4242424242424242": { outcome: "paid" },
  "4000000000000002": { outcome: "declined", declineCode: "generic_decline", message: "Your card was declined." },
  "4000000000009995": { outcome: "declined", declineCode: "insufficient_funds", message: "Your card has insufficient funds." },
};

interface CardInput {
  number: string;
  expiry: string;
  cvc: string;
}

export function createCheckoutSession(store: StandinStore, p: FormObject): CheckoutSessionObject {
  const mode = str(p, "mode");
  if (!mode) throw missingParam("mode");
  if (mode !== "subscription") throw invalidParam("mode", "This stand-in supports Checkout in `subscription` mode only.");
  const successUrl = str(p, "success_url");
  if (!successUrl) throw missingParam("success_url");
  assertUrl(successUrl, "success_url");
  const cancelUrl = str(p, "cancel_url") ?? null;
  if (cancelUrl) assertUrl(cancelUrl, "cancel_url");
  const rawItems = list(p, "line_items");
  if (!rawItems || rawItems.length === 0) throw missingParam("line_items");
  const lineItems = rawItems.map((item, i) => readLineItem(item, i));
  let currency: string | null = null;
  let amount = 0;
  for (const [i, item] of lineItems.entries()) {
    const price = store.prices.get(item.price);
    if (!price) throw noSuch("price", item.price, `line_items[${i}][price]`);
    if (!price.active) throw invalidParam(`line_items[${i}][price]`, `The price specified is inactive. This field only accepts active prices.`);
    if (!price.recurring) {
      throw invalidParam(`line_items[${i}][price]`, "You must provide at least one recurring price in `subscription` mode when using prices.");
    }
    if (currency && currency !== price.currency) throw invalidParam(`line_items[${i}][price]`, "All prices must be in the same currency.");
    currency = price.currency;
    amount += price.unit_amount * item.quantity;
  }
  const customerId = str(p, "customer") ?? null;
  if (customerId && !store.customers.has(customerId)) throw noSuch("customer", customerId, "customer");
  const customerEmail = str(p, "customer_email") ?? null;
  if (customerId && customerEmail) throw invalidParam("customer_email", "You may only specify one of these parameters: customer, customer_email.");
  const subscriptionData = obj(p, "subscription_data");
  const now = store.now();
  const id = newId("cs_test");
  const session: CheckoutSessionObject = {
    id,
    object: "checkout.session",
    amount_subtotal: amount,
    amount_total: amount,
    cancel_url: cancelUrl,
    client_reference_id: str(p, "client_reference_id") ?? null,
    created: now,
    currency: currency ?? "usd",
    customer: customerId,
    customer_email: customerEmail,
    expires_at: now + 24 * 3600,
    invoice: null,
    livemode: false,
    metadata: metadata(p) ?? {},
    mode: "subscription",
    payment_method_types: ["card"],
    payment_status: "unpaid",
    status: "open",
    subscription: null,
    success_url: successUrl,
    ui_mode: "hosted",
    url: `${store.publicUrl}/checkout/${id}`,
  };
  store.sessions.set(id, {
    session,
    extra: { lineItems, subscriptionMetadata: subscriptionData ? (metadata(subscriptionData) ?? {}) : {}, declines: 0 },
  });
  return clone(session);
}

export function retrieveCheckoutSession(store: StandinStore, id: string): CheckoutSessionObject {
  const entry = store.sessions.get(id);
  if (!entry) throw noSuch("checkout.session", id, "session");
  expireIfDue(store, entry.session);
  return clone(entry.session);
}

/** What the checkout page shows: the session, its prices and products, and the customer's e-mail. */
export function checkoutView(
  store: StandinStore,
  id: string,
): {
  session: CheckoutSessionObject;
  lines: Array<{ price: PriceObject; product: ProductObject; quantity: number }>;
  email: string | null;
} {
  const entry = store.sessions.get(id);
  if (!entry) throw noSuch("checkout.session", id, "session");
  expireIfDue(store, entry.session);
  const lines = entry.extra.lineItems.map((item) => {
    const price = store.prices.get(item.price);
    if (!price) throw noSuch("price", item.price);
    const product = store.products.get(price.product);
    if (!product) throw noSuch("product", price.product);
    return { price: clone(price), product: clone(product), quantity: item.quantity };
  });
  const email = entry.session.customer ? (store.customers.get(entry.session.customer)?.email ?? null) : entry.session.customer_email;
  return { session: clone(entry.session), lines, email };
}

/**
 * Pays an open session with a test card. A declined card changes nothing but the count of attempts and
 * sends no event (Checkout creates no subscription until the first payment succeeds). A paid session
 * gets a customer (when it had none), an active subscription and a paid invoice, then three events.
 */
export function payCheckoutSession(store: StandinStore, id: string, card: CardInput): CheckoutSessionObject {
  const entry = store.sessions.get(id);
  if (!entry) throw noSuch("checkout.session", id, "session");
  const { session, extra } = entry;
  expireIfDue(store, session);
  if (session.status !== "open") {
    throw new StandinApiError(400, "invalid_request_error", "This Checkout Session is no longer active.", "checkout_session_inactive", "session");
  }
  const number = card.number.replace(/[\s-]/g, "");
  if (!/^\d{12,19}$/.test(number)) {
    throw new StandinApiError(402, "card_error", "Your card number is incomplete.", "incomplete_number", "number");
  }
  const known = TEST_CARDS[number];
  if (!known) {
    throw new StandinApiError(
      402,
      "card_error",
      "Your card was declined. This is a test stand-in: use 4242 4242 4242 4242 to pay or 4000 0000 0000 0002 for a decline.",
      "card_declined",
      "number",
      { decline_code: "test_mode_live_card" },
    );
  }
  checkExpiry(card.expiry, store.now());
  if (!/^\d{3,4}$/.test(card.cvc.trim())) {
    throw new StandinApiError(402, "card_error", "Your card's security code is incomplete.", "incomplete_cvc", "cvc");
  }
  if (known.outcome === "declined") {
    extra.declines += 1;
    throw cardDeclined(known.declineCode, known.message);
  }

  let customer = session.customer ? store.customers.get(session.customer) : undefined;
  if (!customer) {
    const created = createCustomer(store, { email: session.customer_email ?? "" });
    customer = store.customers.get(created.id);
    if (!customer) throw new StandinApiError(500, "api_error", "customer vanished");
    session.customer = customer.id;
  }
  const paymentMethod = newId("pm");
  customer.invoice_settings.default_payment_method = paymentMethod;

  const now = store.now();
  const subId = newId("sub");
  const prices = extra.lineItems.map((item) => {
    const price = store.prices.get(item.price);
    if (!price || !price.recurring) throw noSuch("price", item.price);
    return { price, quantity: item.quantity };
  });
  const first = prices[0].price.recurring;
  if (!first) throw noSuch("price", prices[0].price.id);
  const periodEnd = addInterval(now, first.interval, first.interval_count);
  const subscription: SubscriptionObject = {
    id: subId,
    object: "subscription",
    billing_cycle_anchor: now,
    cancel_at: null,
    cancel_at_period_end: false,
    canceled_at: null,
    cancellation_details: { comment: null, feedback: null, reason: null },
    collection_method: "charge_automatically",
    created: now,
    currency: session.currency,
    customer: customer.id,
    default_payment_method: paymentMethod,
    description: null,
    ended_at: null,
    items: {
      object: "list",
      data: prices.map(({ price, quantity }) => ({
        id: newId("si"),
        object: "subscription_item" as const,
        created: now,
        current_period_end: periodEnd,
        current_period_start: now,
        metadata: {},
        price: clone(price),
        quantity,
        subscription: subId,
      })),
      has_more: false,
      url: `/v1/subscription_items?subscription=${subId}`,
    },
    latest_invoice: null,
    livemode: false,
    metadata: { ...extra.subscriptionMetadata },
    start_date: now,
    status: "active",
    trial_end: null,
    trial_start: null,
  };
  const invoice = makeInvoice(store, subscription, customer, "subscription_create", now, periodEnd, true);
  subscription.latest_invoice = invoice.id;
  store.subscriptions.set(subId, subscription);

  session.status = "complete";
  session.payment_status = "paid";
  session.subscription = subId;
  session.invoice = invoice.id;

  store.emit("checkout.session.completed", session);
  store.emit("customer.subscription.created", subscription);
  store.emit("invoice.paid", invoice);
  store.emit("invoice.payment_succeeded", invoice);
  return clone(session);
}

function expireIfDue(store: StandinStore, session: CheckoutSessionObject): void {
  if (session.status === "open" && session.expires_at <= store.now()) {
    session.status = "expired";
    session.url = null;
    store.emit("checkout.session.expired", session);
  }
}
