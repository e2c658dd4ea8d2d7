import { cardDeclined, invalidParam, missingParam, noSuch, StandinApiError } from "./errors";
import { bool, int, list, metadata, obj, str, stringList, type FormObject, type FormValue } from "./form";
import {
  addInterval,
  newId,
  type CheckoutSessionObject,
  type CheckoutSessionPrivate,
  type CustomerObject,
  type EventObject,
  type Interval,
  type InvoiceObject,
  type PortalSessionObject,
  type PriceObject,
  type ProductObject,
  type StandinObject,
  type SubscriptionObject,
} from "./objects";

/** Test cards the checkout page knows, as in Stripe's test mode. */
export const TEST_CARDS: Record<string, { outcome: "paid" } | { outcome: "declined"; declineCode: string; message: string }> = {
  "4242424242424242": { outcome: "paid" },
  "4000000000000002": { outcome: "declined", declineCode: "generic_decline", message: "Your card was declined." },
  "4000000000009995": { outcome: "declined", declineCode: "insufficient_funds", message: "Your card has insufficient funds." },
};

export interface CardInput {
  number: string;
  expiry: string;
  cvc: string;
}

export interface ListResult<T> {
  object: "list";
  data: T[];
  has_more: boolean;
  url: string;
}

export interface StandinSnapshot {
  products: ProductObject[];
  prices: PriceObject[];
  customers: CustomerObject[];
  sessions: Array<{ session: CheckoutSessionObject; extra: CheckoutSessionPrivate }>;
  subscriptions: SubscriptionObject[];
  invoices: InvoiceObject[];
  portalSessions: PortalSessionObject[];
  events: EventObject[];
  clockOffsetSec: number;
}

export interface StandinOptions {
  /** Base URL of the stand-in's own pages (checkout, portal), e.g. http://127.0.0.1:12111. */
  publicUrl: string;
  /** Receives each event as it is created, in order. */
  onEvent?: (event: EventObject) => void;
}

const clone = <T>(value: T): T => structuredClone(value);

/**
 * The state and the rules of the part of Stripe that Spanlark uses. Every method takes parameters as
 * parsed from Stripe's form encoding and returns Stripe-shaped objects, or throws a StandinApiError.
 */
export class Standin {
  private products = new Map<string, ProductObject>();
  private prices = new Map<string, PriceObject>();
  private customers = new Map<string, CustomerObject>();
  private sessions = new Map<string, { session: CheckoutSessionObject; extra: CheckoutSessionPrivate }>();
  private subscriptions = new Map<string, SubscriptionObject>();
  private invoices = new Map<string, InvoiceObject>();
  private portalSessions = new Map<string, PortalSessionObject>();
  private events: EventObject[] = [];
  private clockOffsetSec = 0;
  private invoiceCounter = 0;
  apiVersion = "2026-10-28.endive";

  constructor(private readonly options: StandinOptions) {}

  /** The stand-in's clock in Unix seconds: real time, moved forward by /_control/advance. */
  now(): number {
    return Math.floor(Date.now() / 1000) + this.clockOffsetSec;
  }

  get publicUrl(): string {
    return this.options.publicUrl;
  }

  snapshot(): StandinSnapshot {
    return clone({
      products: [...this.products.values()],
      prices: [...this.prices.values()],
      customers: [...this.customers.values()],
      sessions: [...this.sessions.values()],
      subscriptions: [...this.subscriptions.values()],
      invoices: [...this.invoices.values()],
      portalSessions: [...this.portalSessions.values()],
      events: this.events,
      clockOffsetSec: this.clockOffsetSec,
    });
  }

  restore(s: StandinSnapshot): void {
    this.reset();
    for (const p of s.products) this.products.set(p.id, p);
    for (const p of s.prices) this.prices.set(p.id, p);
    for (const c of s.customers) this.customers.set(c.id, c);
    for (const x of s.sessions) this.sessions.set(x.session.id, x);
    for (const x of s.subscriptions) this.subscriptions.set(x.id, x);
    for (const x of s.invoices) this.invoices.set(x.id, x);
    for (const x of s.portalSessions) this.portalSessions.set(x.id, x);
    this.events = s.events;
    this.clockOffsetSec = s.clockOffsetSec;
    this.invoiceCounter = s.invoices.length;
  }

  reset(): void {
    this.products.clear();
    this.prices.clear();
    this.customers.clear();
    this.sessions.clear();
    this.subscriptions.clear();
    this.invoices.clear();
    this.portalSessions.clear();
    this.events = [];
    this.clockOffsetSec = 0;
    this.invoiceCounter = 0;
  }

  // ---- products ----

  createProduct(p: FormObject): ProductObject {
    const name = str(p, "name");
    if (!name) throw missingParam("name");
    const now = this.now();
    const product: ProductObject = {
      id: str(p, "id") ?? newId("prod"),
      object: "product",
      active: bool(p, "active") ?? true,
      created: now,
      updated: now,
      default_price: null,
      description: str(p, "description") ?? null,
      images: [],
      livemode: false,
      marketing_features: [],
      metadata: metadata(p) ?? {},
      name,
      package_dimensions: null,
      shippable: null,
      statement_descriptor: str(p, "statement_descriptor") ?? null,
      tax_code: null,
      type: "service",
      unit_label: str(p, "unit_label") ?? null,
      url: null,
    };
    if (this.products.has(product.id)) throw invalidParam("id", `Product already exists.`);
    this.products.set(product.id, product);
    return clone(product);
  }

  retrieveProduct(id: string): ProductObject {
    const product = this.products.get(id);
    if (!product) throw noSuch("product", id);
    return clone(product);
  }

  listProducts(p: FormObject): ListResult<ProductObject> {
    const active = bool(p, "active");
    const ids = stringList(p, "ids");
    const items = [...this.products.values()].filter((x) => (active === undefined || x.active === active) && (!ids || ids.includes(x.id)));
    return this.page(items, p, "/v1/products");
  }

  // ---- prices ----

  createPrice(p: FormObject): PriceObject {
    const currency = str(p, "currency");
    if (!currency) throw missingParam("currency");
    const productId = str(p, "product");
    let product: ProductObject;
    if (productId) {
      product = this.products.get(productId) ?? (() => { throw noSuch("product", productId, "product"); })();
    } else {
      const productData = obj(p, "product_data");
      if (!productData) throw missingParam("product");
      product = this.createProduct(productData);
    }
    const unitAmount = int(p, "unit_amount");
    if (unitAmount === undefined) throw missingParam("unit_amount");
    if (unitAmount < 0) throw invalidParam("unit_amount", "This value must be greater than or equal to 0.");
    const recurringParams = obj(p, "recurring");
    let recurring: PriceObject["recurring"] = null;
    if (recurringParams) {
      const interval = str(recurringParams, "interval");
      if (!interval) throw missingParam("recurring[interval]");
      if (!["day", "week", "month", "year"].includes(interval)) {
        throw invalidParam("recurring[interval]", `Invalid recurring[interval]: must be one of day, week, month, or year`);
      }
      recurring = {
        interval: interval as Interval,
        interval_count: int(recurringParams, "interval_count") ?? 1,
        meter: null,
        trial_period_days: null,
        usage_type: "licensed",
      };
    }
    const lookupKey = str(p, "lookup_key") ?? null;
    if (lookupKey) {
      const holder = [...this.prices.values()].find((x) => x.lookup_key === lookupKey);
      if (holder) {
        if (bool(p, "transfer_lookup_key") !== true) {
          throw invalidParam("lookup_key", `A price (\`${holder.id}\`) already uses that lookup key.`);
        }
        holder.lookup_key = null;
      }
    }
    const price: PriceObject = {
      id: newId("price"),
      object: "price",
      active: bool(p, "active") ?? true,
      billing_scheme: "per_unit",
      created: this.now(),
      currency: currency.toLowerCase(),
      custom_unit_amount: null,
      livemode: false,
      lookup_key: lookupKey,
      metadata: metadata(p) ?? {},
      nickname: str(p, "nickname") ?? null,
      product: product.id,
      recurring,
      tax_behavior: "unspecified",
      tiers_mode: null,
      transform_quantity: null,
      type: recurring ? "recurring" : "one_time",
      unit_amount: unitAmount,
      unit_amount_decimal: String(unitAmount),
    };
    this.prices.set(price.id, price);
    return clone(price);
  }

  retrievePrice(id: string): PriceObject {
    const price = this.prices.get(id);
    if (!price) throw noSuch("price", id);
    return clone(price);
  }

  listPrices(p: FormObject): ListResult<PriceObject> {
    const active = bool(p, "active");
    const product = str(p, "product");
    const type = str(p, "type");
    const lookupKeys = stringList(p, "lookup_keys");
    const items = [...this.prices.values()].filter(
      (x) =>
        (active === undefined || x.active === active) &&
        (!product || x.product === product) &&
        (!type || x.type === type) &&
        (!lookupKeys || (x.lookup_key !== null && lookupKeys.includes(x.lookup_key))),
    );
    return this.page(items, p, "/v1/prices");
  }

  // ---- customers ----

  createCustomer(p: FormObject): CustomerObject {
    const customer: CustomerObject = {
      id: newId("cus"),
      object: "customer",
      address: null,
      balance: 0,
      created: this.now(),
      currency: null,
      default_source: null,
      delinquent: false,
      description: str(p, "description") ?? null,
      email: str(p, "email") ?? null,
      invoice_prefix: newId("x").slice(2, 10).toUpperCase(),
      invoice_settings: { custom_fields: null, default_payment_method: null, footer: null, rendering_options: null },
      livemode: false,
      metadata: metadata(p) ?? {},
      name: str(p, "name") ?? null,
      phone: str(p, "phone") ?? null,
      preferred_locales: [],
      shipping: null,
      tax_exempt: "none",
      test_clock: null,
    };
    this.customers.set(customer.id, customer);
    this.emit("customer.created", customer);
    return clone(customer);
  }

  retrieveCustomer(id: string): CustomerObject {
    const customer = this.customers.get(id);
    if (!customer) throw noSuch("customer", id);
    return clone(customer);
  }

  updateCustomer(id: string, p: FormObject): CustomerObject {
    const customer = this.customers.get(id);
    if (!customer) throw noSuch("customer", id);
    const previous: Record<string, unknown> = {};
    for (const key of ["email", "name", "description", "phone"] as const) {
      const v = str(p, key);
      if (v !== undefined) {
        previous[key] = customer[key];
        customer[key] = v === "" ? null : v;
      }
    }
    const meta = metadata(p);
    if (meta) {
      previous.metadata = { ...customer.metadata };
      customer.metadata = mergeMetadata(customer.metadata, meta);
    }
    this.emit("customer.updated", customer, previous);
    return clone(customer);
  }

  // ---- checkout sessions ----

  createCheckoutSession(p: FormObject): CheckoutSessionObject {
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
      const price = this.prices.get(item.price);
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
    if (customerId && !this.customers.has(customerId)) throw noSuch("customer", customerId, "customer");
    const customerEmail = str(p, "customer_email") ?? null;
    if (customerId && customerEmail) throw invalidParam("customer_email", "You may only specify one of these parameters: customer, customer_email.");
    const subscriptionData = obj(p, "subscription_data");
    const now = this.now();
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
      url: `${this.publicUrl}/checkout/${id}`,
    };
    this.sessions.set(id, {
      session,
      extra: { lineItems, subscriptionMetadata: subscriptionData ? (metadata(subscriptionData) ?? {}) : {}, declines: 0 },
    });
    return clone(session);
  }

  retrieveCheckoutSession(id: string): CheckoutSessionObject {
    const entry = this.sessions.get(id);
    if (!entry) throw noSuch("checkout.session", id, "session");
    this.expireIfDue(entry.session);
    return clone(entry.session);
  }

  /** What the checkout page shows: the session, its prices and products, and the customer's e-mail. */
  checkoutView(id: string): {
    session: CheckoutSessionObject;
    lines: Array<{ price: PriceObject; product: ProductObject; quantity: number }>;
    email: string | null;
  } {
    const entry = this.sessions.get(id);
    if (!entry) throw noSuch("checkout.session", id, "session");
    this.expireIfDue(entry.session);
    const lines = entry.extra.lineItems.map((item) => {
      const price = this.prices.get(item.price);
      if (!price) throw noSuch("price", item.price);
      const product = this.products.get(price.product);
      if (!product) throw noSuch("product", price.product);
      return { price: clone(price), product: clone(product), quantity: item.quantity };
    });
    const email = entry.session.customer ? (this.customers.get(entry.session.customer)?.email ?? null) : entry.session.customer_email;
    return { session: clone(entry.session), lines, email };
  }

  /**
   * Pays an open session with a test card. A declined card changes nothing but the count of attempts and
   * sends no event (Checkout creates no subscription until the first payment succeeds). A paid session
   * gets a customer (when it had none), an active subscription and a paid invoice, then three events.
   */
  payCheckoutSession(id: string, card: CardInput): CheckoutSessionObject {
    const entry = this.sessions.get(id);
    if (!entry) throw noSuch("checkout.session", id, "session");
    const { session, extra } = entry;
    this.expireIfDue(session);
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
    checkExpiry(card.expiry, this.now());
    if (!/^\d{3,4}$/.test(card.cvc.trim())) {
      throw new StandinApiError(402, "card_error", "Your card's security code is incomplete.", "incomplete_cvc", "cvc");
    }
    if (known.outcome === "declined") {
      extra.declines += 1;
      throw cardDeclined(known.declineCode, known.message);
    }

    let customer = session.customer ? this.customers.get(session.customer) : undefined;
    if (!customer) {
      const created = this.createCustomer({ email: session.customer_email ?? "" });
      customer = this.customers.get(created.id);
      if (!customer) throw new StandinApiError(500, "api_error", "customer vanished");
      session.customer = customer.id;
    }
    const paymentMethod = newId("pm");
    customer.invoice_settings.default_payment_method = paymentMethod;

    const now = this.now();
    const subId = newId("sub");
    const prices = extra.lineItems.map((item) => {
      const price = this.prices.get(item.price);
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
    const invoice = this.makeInvoice(subscription, customer, "subscription_create", now, periodEnd, true);
    subscription.latest_invoice = invoice.id;
    this.subscriptions.set(subId, subscription);

    session.status = "complete";
    session.payment_status = "paid";
    session.subscription = subId;
    session.invoice = invoice.id;

    this.emit("checkout.session.completed", session);
    this.emit("customer.subscription.created", subscription);
    this.emit("invoice.paid", invoice);
    this.emit("invoice.payment_succeeded", invoice);
    return clone(session);
  }

  // ---- subscriptions ----

  retrieveSubscription(id: string): SubscriptionObject {
    const sub = this.subscriptions.get(id);
    if (!sub) throw noSuch("subscription", id);
    return clone(sub);
  }

  listSubscriptions(p: FormObject): ListResult<SubscriptionObject> {
    const customer = str(p, "customer");
    const price = str(p, "price");
    const status = str(p, "status");
    const items = [...this.subscriptions.values()].filter(
      (s) =>
        (!customer || s.customer === customer) &&
        (!price || s.items.data.some((i) => i.price.id === price)) &&
        (status === "all" || (status ? s.status === status : s.status !== "canceled" && s.status !== "incomplete_expired")),
    );
    return this.page(items, p, "/v1/subscriptions");
  }

  updateSubscription(id: string, p: FormObject): SubscriptionObject {
    const sub = this.subscriptions.get(id);
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
      sub.canceled_at = cancelAtPeriodEnd ? this.now() : null;
      sub.cancellation_details.reason = cancelAtPeriodEnd ? "cancellation_requested" : null;
    }
    if (meta) {
      previous.metadata = { ...sub.metadata };
      sub.metadata = mergeMetadata(sub.metadata, meta);
    }
    if (Object.keys(previous).length > 0) this.emit("customer.subscription.updated", sub, previous);
    return clone(sub);
  }

  /** DELETE /v1/subscriptions/:id — ends the subscription now. */
  cancelSubscription(id: string): SubscriptionObject {
    const sub = this.subscriptions.get(id);
    if (!sub) throw noSuch("subscription", id);
    if (sub.status === "canceled") {
      throw new StandinApiError(400, "invalid_request_error", `No such subscription: '${id}' is already canceled.`, "resource_missing", "id");
    }
    const now = this.now();
    sub.status = "canceled";
    sub.canceled_at = sub.canceled_at ?? now;
    sub.ended_at = now;
    sub.cancellation_details.reason = "cancellation_requested";
    this.emit("customer.subscription.deleted", sub);
    return clone(sub);
  }

  retrieveInvoice(id: string): InvoiceObject {
    const invoice = this.invoices.get(id);
    if (!invoice) throw noSuch("invoice", id);
    return clone(invoice);
  }

  // ---- billing portal ----

  createPortalSession(p: FormObject): PortalSessionObject {
    const customer = str(p, "customer");
    if (!customer) throw missingParam("customer");
    if (!this.customers.has(customer)) throw noSuch("customer", customer, "customer");
    const returnUrl = str(p, "return_url") ?? null;
    if (returnUrl) assertUrl(returnUrl, "return_url");
    const id = newId("bps");
    const session: PortalSessionObject = {
      id,
      object: "billing_portal.session",
      configuration: "bpc_standin_default",
      created: this.now(),
      customer,
      flow: null,
      livemode: false,
      locale: null,
      on_behalf_of: null,
      return_url: returnUrl,
      url: `${this.publicUrl}/portal/${id}`,
    };
    this.portalSessions.set(id, session);
    return clone(session);
  }

  /** What the portal page shows: the session and the customer's subscriptions, newest first. */
  portalView(id: string): { session: PortalSessionObject; customer: CustomerObject; subscriptions: SubscriptionObject[]; products: Map<string, ProductObject> } {
    const session = this.portalSessions.get(id);
    if (!session) throw noSuch("billing_portal.session", id, "session");
    const customer = this.customers.get(session.customer);
    if (!customer) throw noSuch("customer", session.customer);
    const subscriptions = [...this.subscriptions.values()].filter((s) => s.customer === customer.id).sort((a, b) => b.created - a.created);
    return { session: clone(session), customer: clone(customer), subscriptions: clone(subscriptions), products: new Map(this.products) };
  }

  /** A portal action on one of the session customer's subscriptions. */
  portalAction(id: string, subscriptionId: string, action: "cancel" | "resume" | "cancel_now"): SubscriptionObject {
    const session = this.portalSessions.get(id);
    if (!session) throw noSuch("billing_portal.session", id, "session");
    const sub = this.subscriptions.get(subscriptionId);
    if (!sub || sub.customer !== session.customer) throw noSuch("subscription", subscriptionId, "subscription");
    if (action === "cancel_now") return this.cancelSubscription(subscriptionId);
    return this.updateSubscription(subscriptionId, { cancel_at_period_end: action === "cancel" ? "true" : "false" });
  }

  // ---- events ----

  retrieveEvent(id: string): EventObject {
    const event = this.events.find((e) => e.id === id);
    if (!event) throw noSuch("event", id);
    return clone(event);
  }

  listEvents(p: FormObject): ListResult<EventObject> {
    const type = str(p, "type");
    const types = stringList(p, "types");
    const matches = (t: string) => {
      const one = (pattern: string) => (pattern.endsWith(".*") ? t.startsWith(pattern.slice(0, -1)) : t === pattern);
      return (!type || one(type)) && (!types || types.some(one));
    };
    const newestFirst = [...this.events].reverse().filter((e) => matches(e.type));
    return this.page(newestFirst, p, "/v1/events");
  }

  // ---- test controls ----

  /**
   * Moves the clock to the end of the current period of one subscription (or the earliest-ending live one)
   * and runs what Stripe would then: a subscription set to cancel ends (customer.subscription.deleted); any
   * other renews with a new invoice — paid (invoice.paid) or, with `fail`, unpaid (invoice.payment_failed,
   * status past_due). Returns the events sent.
   */
  advance(p: FormObject): { now: number; events: string[] } {
    const subscriptionId = str(p, "subscription");
    const fail = bool(p, "fail") ?? false;
    const live = [...this.subscriptions.values()].filter((s) => ["active", "trialing", "past_due"].includes(s.status));
    const target = subscriptionId ? this.subscriptions.get(subscriptionId) : live.sort((a, b) => periodEndOf(a) - periodEndOf(b))[0];
    if (subscriptionId && !target) throw noSuch("subscription", subscriptionId, "subscription");
    const before = this.events.length;
    if (target) {
      const end = periodEndOf(target);
      if (end >= this.now()) this.clockOffsetSec += end - this.now() + 1;
      const due = live.filter((s) => periodEndOf(s) <= this.now() && (!subscriptionId || s.id === subscriptionId));
      for (const sub of due) this.endPeriod(sub, fail);
    }
    return { now: this.now(), events: this.events.slice(before).map((e) => e.type) };
  }

  private endPeriod(sub: SubscriptionObject, fail: boolean): void {
    const end = periodEndOf(sub);
    if (sub.cancel_at_period_end) {
      sub.status = "canceled";
      sub.ended_at = end;
      this.emit("customer.subscription.deleted", sub);
      return;
    }
    const customer = this.customers.get(sub.customer);
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
    const invoice = this.makeInvoice(sub, customer, "subscription_cycle", end, nextEnd, !fail);
    sub.latest_invoice = invoice.id;
    if (fail) {
      sub.status = "past_due";
      this.emit("invoice.payment_failed", invoice);
    } else {
      sub.status = "active";
      this.emit("invoice.paid", invoice);
      this.emit("invoice.payment_succeeded", invoice);
    }
    this.emit("customer.subscription.updated", sub, previous);
  }

  // ---- helpers ----

  private makeInvoice(
    sub: SubscriptionObject,
    customer: CustomerObject,
    reason: InvoiceObject["billing_reason"],
    periodStart: number,
    periodEnd: number,
    paid: boolean,
  ): InvoiceObject {
    const now = this.now();
    this.invoiceCounter += 1;
    const lines = sub.items.data.map((item) => {
      const product = this.products.get(item.price.product);
      const amount = item.price.unit_amount * item.quantity;
      return {
        id: newId("il"),
        object: "line_item" as const,
        amount,
        currency: item.price.currency,
        description: `${item.quantity} × ${product?.name ?? "Subscription"}`,
        metadata: {},
        period: { start: periodStart, end: periodEnd },
        pricing: { price_details: { price: item.price.id, product: item.price.product }, type: "price_details" as const, unit_amount_decimal: item.price.unit_amount_decimal },
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
      number: `${customer.invoice_prefix}-${String(this.invoiceCounter).padStart(4, "0")}`,
      parent: { quote_details: null, subscription_details: { metadata: { ...sub.metadata }, subscription: sub.id }, type: "subscription_details" },
      period_end: periodStart,
      period_start: periodStart,
      status: paid ? "paid" : "open",
      status_transitions: { finalized_at: now, marked_uncollectible_at: null, paid_at: paid ? now : null, voided_at: null },
      subtotal: total,
      total,
    };
    this.invoices.set(invoice.id, invoice);
    return invoice;
  }

  private expireIfDue(session: CheckoutSessionObject): void {
    if (session.status === "open" && session.expires_at <= this.now()) {
      session.status = "expired";
      session.url = null;
      this.emit("checkout.session.expired", session);
    }
  }

  private emit(type: string, object: StandinObject, previous?: Record<string, unknown>): EventObject {
    const event: EventObject = {
      id: newId("evt"),
      object: "event",
      api_version: this.apiVersion,
      created: this.now(),
      data: previous ? { object: clone(object), previous_attributes: clone(previous) } : { object: clone(object) },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    };
    this.events.push(event);
    this.options.onEvent?.(clone(event));
    return event;
  }

  /** Stripe's cursor pagination: `limit` (1–100, default 10), `starting_after`, `ending_before`. */
  private page<T extends { id: string }>(items: T[], p: FormObject, url: string): ListResult<T> {
    const limit = int(p, "limit") ?? 10;
    if (limit < 1 || limit > 100) throw invalidParam("limit", "Invalid integer: limit must be between 1 and 100");
    const after = str(p, "starting_after");
    const before = str(p, "ending_before");
    let start = 0;
    let end = items.length;
    if (after) {
      const i = items.findIndex((x) => x.id === after);
      if (i === -1) throw noSuch("object", after, "starting_after");
      start = i + 1;
    } else if (before) {
      const i = items.findIndex((x) => x.id === before);
      if (i === -1) throw noSuch("object", before, "ending_before");
      end = i;
      start = Math.max(0, end - limit);
    }
    const data = items.slice(start, Math.min(end, start + limit));
    return { object: "list", data: clone(data), has_more: start + data.length < end, url };
  }

  /** Looks an id up in any collection, for `expand[]`. */
  find(id: string): StandinObject | undefined {
    const found =
      this.products.get(id) ??
      this.prices.get(id) ??
      this.customers.get(id) ??
      this.sessions.get(id)?.session ??
      this.subscriptions.get(id) ??
      this.invoices.get(id) ??
      this.portalSessions.get(id);
    return found ? clone(found) : undefined;
  }
}

function periodEndOf(sub: SubscriptionObject): number {
  return Math.min(...sub.items.data.map((i) => i.current_period_end));
}

function mergeMetadata(current: Record<string, string>, update: Record<string, string>): Record<string, string> {
  const out = { ...current };
  for (const [k, v] of Object.entries(update)) {
    if (v === "") delete out[k];
    else out[k] = v;
  }
  return out;
}

function assertUrl(value: string, param: string): void {
  try {
    const u = new URL(value.replace("{CHECKOUT_SESSION_ID}", "x"));
    if (u.protocol !== "http:" && u.protocol !== "https:") throw new Error("scheme");
  } catch {
    throw invalidParam(param, "Not a valid URL");
  }
}

function readLineItem(item: FormValue, i: number): { price: string; quantity: number } {
  if (typeof item !== "object" || Array.isArray(item)) throw invalidParam(`line_items[${i}]`, `Invalid hash: line_items[${i}]`);
  const price = str(item, "price");
  if (!price) throw missingParam(`line_items[${i}][price]`);
  const quantity = int(item, "quantity") ?? 1;
  if (quantity < 1) throw invalidParam(`line_items[${i}][quantity]`, "This value must be greater than or equal to 1.");
  return { price, quantity };
}

function checkExpiry(expiry: string, nowSec: number): void {
  const m = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(expiry);
  if (!m) throw new StandinApiError(402, "card_error", "Your card's expiration date is incomplete.", "incomplete_expiry", "exp");
  const month = Number(m[1]);
  const year = m[2].length === 2 ? 2000 + Number(m[2]) : Number(m[2]);
  if (month < 1 || month > 12) throw new StandinApiError(402, "card_error", "Your card's expiration month is invalid.", "invalid_expiry_month", "exp_month");
  const now = new Date(nowSec * 1000);
  const expired = year < now.getUTCFullYear() || (year === now.getUTCFullYear() && month < now.getUTCMonth() + 1);
  if (expired) throw new StandinApiError(402, "card_error", "Your card's expiration year is in the past.", "invalid_expiry_year", "exp_year");
}
