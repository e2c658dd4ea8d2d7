/** The Stripe stand-in: subscriptions and their invoices (/v1/subscriptions, /v1/invoices), and the end of a billing period. */
import { noSuch, StandinApiError } from "./errors";
import { bool, type FormObject, metadata, str } from "./form";
import { mergeMetadata, periodEndOf } from "./helpers";
import { addInterval, type CustomerObject, type InvoiceObject, newId, type SubscriptionObject } from "./objects";
import { clone, type ListResult, type StandinStore } from "./store";

export function retrieveSubscription(store: StandinStore, id: string): SubscriptionObject {
  const sub = store.subscriptions.get(id);
  if (!sub) throw noSuch("subscription", id);
  return clone(sub);
}

export function listSubscriptions(store: StandinStore, p: FormObject): ListResult<SubscriptionObject> {
  const customer = str(p, "customer");
  const price = str(p, "price");
  const status = str(p, "status");
  const items = [...store.subscriptions.values()].filter(
    (s) =>
      (!customer || s.customer === customer) &&
      (!price || s.items.data.some((i) => i.price.id === price)) &&
      (status === "all" || (status ? s.status === status : s.status !== "canceled" && s.status !== "incomplete_expired")),
  );
  return store.page(items, p, "/v1/subscriptions");
}

export function updateSubscription(store: StandinStore, id: string, p: FormObject): SubscriptionObject {
  const sub = store.subscriptions.get(id);
  if (!sub) throw noSuch("subscription", id);
  const cancelAtPeriodEnd = bool(p, "cancel_at_period_end");
  const meta = metadata(p);
  if (sub.status === "canceled" && cancelAtPeriodEnd !== undefined) {
    throw new StandinApiError(
      400,
      "invalid_request_error",
      "A canceled subscription can only update its cancellation_details and metadata.",
      undefined,
      "cancel_at_period_end",
    );
  }
  const previous: Record<string, unknown> = {};
  if (cancelAtPeriodEnd !== undefined && cancelAtPeriodEnd !== sub.cancel_at_period_end) {
    previous.cancel_at_period_end = sub.cancel_at_period_end;
    previous.cancel_at = sub.cancel_at;
    previous.canceled_at = sub.canceled_at;
    sub.cancel_at_period_end = cancelAtPeriodEnd;
    sub.cancel_at = cancelAtPeriodEnd ? periodEndOf(sub) : null;
    sub.canceled_at = cancelAtPeriodEnd ? store.now() : null;
    sub.cancellation_details.reason = cancelAtPeriodEnd ? "cancellation_requested" : null;
  }
  if (meta) {
    previous.metadata = { ...sub.metadata };
    sub.metadata = mergeMetadata(sub.metadata, meta);
  }
  if (Object.keys(previous).length > 0) store.emit("customer.subscription.updated", sub, previous);
  return clone(sub);
}

/** DELETE /v1/subscriptions/:id — ends the subscription now. */
export function cancelSubscription(store: StandinStore, id: string): SubscriptionObject {
  const sub = store.subscriptions.get(id);
  if (!sub) throw noSuch("subscription", id);
  if (sub.status === "canceled") {
    throw new StandinApiError(400, "invalid_request_error", `No such subscription: '${id}' is already canceled.`, "resource_missing", "id");
  }
  const now = store.now();
  sub.status = "canceled";
  sub.canceled_at = sub.canceled_at ?? now;
  sub.ended_at = now;
  sub.cancellation_details.reason = "cancellation_requested";
  store.emit("customer.subscription.deleted", sub);
  return clone(sub);
}

export function retrieveInvoice(store: StandinStore, id: string): InvoiceObject {
  const invoice = store.invoices.get(id);
  if (!invoice) throw noSuch("invoice", id);
  return clone(invoice);
}

export function endPeriod(store: StandinStore, sub: SubscriptionObject, fail: boolean): void {
  const end = periodEndOf(sub);
  if (sub.cancel_at_period_end) {
    sub.status = "canceled";
    sub.ended_at = end;
    store.emit("customer.subscription.deleted", sub);
    return;
  }
  const customer = store.customers.get(sub.customer);
  if (!customer) throw noSuch("customer", sub.customer);
  const recurring = sub.items.data[0].price.recurring;
  if (!recurring) throw noSuch("price", sub.items.data[0].price.id);
  const nextEnd = addInterval(end, recurring.interval, recurring.interval_count);
  const previous = {
    items: clone(sub.items),
    latest_invoice: sub.latest_invoice,
    status: sub.status,
  };
  for (const item of sub.items.data) {
    item.current_period_start = end;
    item.current_period_end = nextEnd;
  }
  const invoice = makeInvoice(store, sub, customer, "subscription_cycle", end, nextEnd, !fail);
  sub.latest_invoice = invoice.id;
  if (fail) {
    sub.status = "past_due";
    store.emit("invoice.payment_failed", invoice);
  } else {
    sub.status = "active";
    store.emit("invoice.paid", invoice);
    store.emit("invoice.payment_succeeded", invoice);
  }
  store.emit("customer.subscription.updated", sub, previous);
}

export function makeInvoice(
  store: StandinStore,
  sub: SubscriptionObject,
  customer: CustomerObject,
  reason: InvoiceObject["billing_reason"],
  periodStart: number,
  periodEnd: number,
  paid: boolean,
): InvoiceObject {
  const now = store.now();
  store.invoiceCounter += 1;
  const lines = sub.items.data.map((item) => {
    const product = store.products.get(item.price.product);
    const amount = item.price.unit_amount * item.quantity;
    return {
      id: newId("il"),
      object: "line_item" as const,
      amount,
      currency: item.price.currency,
      description: `${item.quantity} × ${product?.name ?? "Subscription"}`,
      metadata: {},
      period: { start: periodStart, end: periodEnd },
      pricing: {
        price_details: { price: item.price.id, product: item.price.product },
        type: "price_details" as const,
        unit_amount_decimal: item.price.unit_amount_decimal,
      },
      quantity: item.quantity,
    };
  });
  const total = lines.reduce((sum, l) => sum + l.amount, 0);
  const invoice: InvoiceObject = {
    id: newId("in"),
    object: "invoice",
    amount_due: total,
    amount_paid: paid ? total : 0,
    amount_remaining: paid ? 0 : total,
    attempt_count: 1,
    attempted: true,
    billing_reason: reason,
    collection_method: "charge_automatically",
    created: now,
    currency: sub.currency,
    customer: customer.id,
    customer_email: customer.email,
    customer_name: customer.name,
    hosted_invoice_url: null,
    lines: { object: "list", data: lines, has_more: false, url: `/v1/invoices/upcoming/lines` },
    livemode: false,
    metadata: {},
    number: `${customer.invoice_prefix}-${String(store.invoiceCounter).padStart(4, "0")}`,
    parent: { quote_details: null, subscription_details: { metadata: { ...sub.metadata }, subscription: sub.id }, type: "subscription_details" },
    period_end: periodStart,
    period_start: periodStart,
    status: paid ? "paid" : "open",
    status_transitions: { finalized_at: now, marked_uncollectible_at: null, paid_at: paid ? now : null, voided_at: null },
    subtotal: total,
    total,
  };
  store.invoices.set(invoice.id, invoice);
  return invoice;
}
