import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, test } from "vitest";
import { ensureCatalog } from "@/lib/payments/catalog";
import { PLANS } from "@/lib/payments/plans";
import { parseStripeForm } from "@/scripts/stripe-standin/form";
import { addInterval } from "@/scripts/stripe-standin/objects";
import type { StandinServer } from "@/scripts/stripe-standin/server";
import { signatureHeader } from "@/scripts/stripe-standin/webhooks";
import { pay, startReceiver, startTestStandin, stripeFor, WEBHOOK_SECRET, type Receiver } from "../../payments/support";

// The stand-in is checked against the official SDK (stripe 23.1.0): its request encoding, its error
// classes, its webhook signature check. Where these tests pass, the SDK accepts the stand-in as Stripe.

describe("Stripe's form encoding", () => {
  test.each([
    ["flat", "name=Spanlark&active=true", { name: "Spanlark", active: "true" }],
    ["nested hash", "recurring[interval]=month&recurring[interval_count]=1", { recurring: { interval: "month", interval_count: "1" } }],
    [
      "indexed array of hashes",
      "line_items[0][price]=price_a&line_items[0][quantity]=1&line_items[1][price]=price_b",
      { line_items: [{ price: "price_a", quantity: "1" }, { price: "price_b" }] },
    ],
    ["empty brackets array", "expand[]=subscription&expand[]=customer", { expand: ["subscription", "customer"] }],
    ["percent-encoded brackets", "metadata%5BuserId%5D=u%201", { metadata: { userId: "u 1" } }],
    ["three levels", "subscription_data[metadata][plan]=yearly", { subscription_data: { metadata: { plan: "yearly" } } }],
    ["sparse indices stay a hash", "a[1]=x&a[3]=y", { a: { "1": "x", "3": "y" } }],
  ])("%s", (_label, input, expected) => {
    expect(parseStripeForm(input)).toEqual(expected);
  });

  test("what the SDK sends for a checkout session parses back to the same parameters", () => {
    // The SDK's encoder, reached through a request it would make (arrays as a[0], hashes as a[b]).
    const params = {
      mode: "subscription",
      line_items: [{ price: "price_1", quantity: 1 }],
      subscription_data: { metadata: { userId: "abc", plan: "monthly" } },
      expand: ["subscription"],
    };
    const encoded = new URLSearchParams();
    const walk = (prefix: string, v: unknown) => {
      if (Array.isArray(v)) v.forEach((x, i) => walk(`${prefix}[${i}]`, x));
      else if (v && typeof v === "object") for (const [k, x] of Object.entries(v)) walk(prefix ? `${prefix}[${k}]` : k, x);
      else encoded.append(prefix, String(v));
    };
    walk("", params);
    expect(parseStripeForm(encoded.toString())).toEqual({
      mode: "subscription",
      line_items: [{ price: "price_1", quantity: "1" }],
      subscription_data: { metadata: { userId: "abc", plan: "monthly" } },
      expand: ["subscription"],
    });
  });

  test("a key that is both a value and a hash is a 400-style parse error", () => {
    expect(() => parseStripeForm("a=1&a[b]=2")).toThrow(/both a value and an object/);
  });
});

describe("billing periods", () => {
  // Calendar months in UTC, the day clamped to the month's last day (common practice for monthly billing).
  test.each([
    ["15 Jan + 1 month", Date.UTC(2026, 0, 15, 12), "month", Date.UTC(2026, 1, 15, 12)],
    ["31 Jan + 1 month -> 28 Feb", Date.UTC(2027, 0, 31), "month", Date.UTC(2027, 1, 28)],
    ["29 Feb 2028 + 1 year -> 28 Feb 2029", Date.UTC(2028, 1, 29), "year", Date.UTC(2029, 1, 28)],
    ["1 Dec + 1 month -> 1 Jan next year", Date.UTC(2026, 11, 1), "month", Date.UTC(2027, 0, 1)],
  ] as const)("%s", (_label, start, interval, end) => {
    expect(addInterval(start / 1000, interval, 1)).toBe(end / 1000);
  });
});

describe("webhook signature", () => {
  const sdk = new Stripe("sk_test_x");
  const payload = JSON.stringify({ id: "evt_1", object: "event", type: "invoice.paid", data: { object: {} } });

  test("the SDK's constructEvent accepts the stand-in's header", () => {
    const header = signatureHeader(payload, WEBHOOK_SECRET, Math.floor(Date.now() / 1000));
    expect(sdk.webhooks.constructEvent(payload, header, WEBHOOK_SECRET).id).toBe("evt_1");
  });

  test("the stand-in's header equals the SDK's own test header for the same time", () => {
    const t = Math.floor(Date.now() / 1000);
    expect(signatureHeader(payload, WEBHOOK_SECRET, t)).toBe(sdk.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET, timestamp: t }));
  });

  test.each([
    ["another secret", (t: number) => signatureHeader(payload, "whsec_other", t)],
    ["a changed body", (t: number) => signatureHeader(payload.replace("evt_1", "evt_2"), WEBHOOK_SECRET, t)],
    ["a stale timestamp (over 300 s)", (t: number) => signatureHeader(payload, WEBHOOK_SECRET, t - 301)],
  ])("the SDK rejects %s", (_label, header) => {
    expect(() => sdk.webhooks.constructEvent(payload, header(Math.floor(Date.now() / 1000)), WEBHOOK_SECRET)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
  });
});

describe("the stand-in through the official SDK", () => {
  let standin: StandinServer;
  let receiver: Receiver;
  let stripe: Stripe;
  const sdk = new Stripe("sk_test_x");
  const received: Stripe.Event[] = [];

  beforeAll(async () => {
    receiver = await startReceiver(async (req) => {
      try {
        received.push(sdk.webhooks.constructEvent(await req.text(), req.headers.get("stripe-signature") ?? "", WEBHOOK_SECRET));
        return new Response("ok");
      } catch {
        return new Response("bad signature", { status: 400 });
      }
    });
    standin = await startTestStandin(receiver.url);
    stripe = stripeFor(standin.url);
  });

  afterAll(async () => {
    await standin?.close();
    await receiver?.close();
  });

  beforeEach(async () => {
    await standin.settled();
    received.length = 0;
  });

  test("no key or a live-looking key is a 401 (StripeAuthenticationError)", async () => {
    await expect(stripeFor(standin.url, "sk_live_nope").products.list()).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    const res = await fetch(`${standin.url}/v1/products`);
    expect(res.status).toBe(401);
    expect(((await res.json()) as { error: { type: string } }).error.type).toBe("invalid_request_error");
  });

  test("an unknown id is a 404 with code resource_missing", async () => {
    const err = await stripe.prices.retrieve("price_nope").catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 404, code: "resource_missing", param: "id" });
  });

  test("a missing parameter is a 400 naming it", async () => {
    const err = await stripe.prices.create({ currency: "usd", product: "prod_x" }).catch((e: unknown) => e);
    expect(err).toMatchObject({ statusCode: 404, param: "product" });
    const missing = await stripe.checkout.sessions.create({ mode: "subscription", line_items: [] }).catch((e: unknown) => e);
    expect(missing).toMatchObject({ statusCode: 400, code: "parameter_missing", param: "success_url" });
  });

  test("setup creates the product and both prices once; a second run finds them by lookup key", async () => {
    const first = await ensureCatalog(stripe);
    expect(first.created).toHaveLength(3);
    const second = await ensureCatalog(stripe);
    expect(second.created).toEqual([]);
    expect(second.prices).toEqual(first.prices);
    const listed = await stripe.prices.list({ lookup_keys: [PLANS.yearly.lookupKey], expand: ["data.product"] });
    expect(listed.data).toHaveLength(1);
    expect(listed.data[0]).toMatchObject({ unit_amount: PLANS.yearly.amountCents, recurring: { interval: "year" }, product: { object: "product" } });
  });

  test("a price with a taken lookup key is refused unless it takes the key over", async () => {
    const product = await stripe.products.create({ name: "Lookup test" });
    await stripe.prices.create({ product: product.id, currency: "usd", unit_amount: 100, lookup_key: "lk_test_once" });
    await expect(stripe.prices.create({ product: product.id, currency: "usd", unit_amount: 200, lookup_key: "lk_test_once" })).rejects.toMatchObject({
      statusCode: 400,
      param: "lookup_key",
    });
    const moved = await stripe.prices.create({ product: product.id, currency: "usd", unit_amount: 200, lookup_key: "lk_test_once", transfer_lookup_key: true });
    const found = await stripe.prices.list({ lookup_keys: ["lk_test_once"] });
    expect(found.data.map((p) => p.id)).toEqual([moved.id]);
  });

  test("lists page with limit and starting_after", async () => {
    for (const name of ["P1", "P2", "P3"]) await stripe.products.create({ name });
    const page1 = await stripe.products.list({ limit: 2 });
    expect(page1.data).toHaveLength(2);
    expect(page1.has_more).toBe(true);
    const page2 = await stripe.products.list({ limit: 100, starting_after: page1.data[1].id });
    expect(page2.data.map((p) => p.id)).not.toContain(page1.data[0].id);
  });

  test("the same idempotency key answers the same object", async () => {
    const a = await stripe.customers.create({ email: "same@example.test" }, { idempotencyKey: "idem-1" });
    const b = await stripe.customers.create({ email: "same@example.test" }, { idempotencyKey: "idem-1" });
    expect(b.id).toBe(a.id);
  });

  async function openSession(email = "payer@example.test"): Promise<{ session: Stripe.Checkout.Session; customer: string }> {
    const { prices } = await ensureCatalog(stripe);
    const customer = await stripe.customers.create({ email, name: "Payer" });
    const session = await stripe.checkout.sessions.create({
      mode: "subscription",
      customer: customer.id,
      client_reference_id: "user-123",
      line_items: [{ price: prices.monthly.id, quantity: 1 }],
      success_url: "http://127.0.0.1:3100/billing?session_id={CHECKOUT_SESSION_ID}",
      cancel_url: "http://127.0.0.1:3100/pricing",
      metadata: { userId: "user-123" },
      subscription_data: { metadata: { userId: "user-123", plan: "monthly" } },
    });
    await standin.settled();
    return { session, customer: customer.id };
  }

  test("a checkout session paid with 4242 makes an active subscription and sends signed events the SDK accepts", async () => {
    const { session, customer } = await openSession();
    expect(session).toMatchObject({ object: "checkout.session", status: "open", mode: "subscription", amount_total: 1200, customer });
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.url).toBe(`${standin.url}/checkout/${session.id}`);
    received.length = 0;

    const paid = await pay(standin.url, session.id);
    expect(paid.status).toBe(200);
    expect(paid.body.redirect_url).toBe(`http://127.0.0.1:3100/billing?session_id=${session.id}`);
    await standin.settled();

    const types = received.map((e) => e.type);
    expect(types).toEqual(["checkout.session.completed", "customer.subscription.created", "invoice.paid", "invoice.payment_succeeded"]);
    expect(receiver.requests.every((r) => r.status === 200)).toBe(true);

    const done = await stripe.checkout.sessions.retrieve(session.id, { expand: ["subscription"] });
    expect(done).toMatchObject({ status: "complete", payment_status: "paid" });
    const sub = done.subscription as Stripe.Subscription;
    expect(sub).toMatchObject({
      object: "subscription",
      status: "active",
      customer,
      cancel_at_period_end: false,
      metadata: { userId: "user-123", plan: "monthly" },
    });
    const item = sub.items.data[0];
    expect(item.current_period_end).toBe(addInterval(item.current_period_start, "month", 1));

    const invoice = received.find((e) => e.type === "invoice.paid")?.data.object as Stripe.Invoice;
    expect(invoice).toMatchObject({ amount_paid: 1200, status: "paid", customer });
    expect(invoice.parent?.subscription_details?.subscription).toBe(sub.id);
    expect(invoice.id).toMatch(/^in_/);

    const events = await stripe.events.list({ type: "customer.subscription.*", limit: 5 });
    expect(events.data[0]).toMatchObject({ type: "customer.subscription.created", object: "event" });
    expect(events.data[0].id).toMatch(/^evt_/);
  });

  test("4000 0000 0000 0002 is declined (402 card_error) with no subscription and no event; the same session then pays", async () => {
    const { session } = await openSession("declined@example.test");
    received.length = 0;
    const declined = await pay(standin.url, session.id, "4000 0000 0000 0002");
    expect(declined.status).toBe(402);
    expect(declined.body).toMatchObject({ error: { type: "card_error", code: "card_declined", decline_code: "generic_decline" } });
    await standin.settled();
    expect(received).toEqual([]);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");

    const retried = await pay(standin.url, session.id);
    expect(retried.status).toBe(200);
    await expect(pay(standin.url, session.id)).resolves.toMatchObject({ status: 400, body: { error: { code: "checkout_session_inactive" } } });
  });

  test("the checkout page shows the amount, and a decline re-shows the form with the message", async () => {
    const { session } = await openSession("page@example.test");
    const page = await fetch(session.url ?? "");
    const html = await page.text();
    expect(page.status).toBe(200);
    expect(html).toContain("Pay $12.00");
    expect(html).toContain("Spanlark Sheets");
    const declined = await fetch(`${session.url}/pay`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: "number=4000000000000002&expiry=12%2F34&cvc=123",
      redirect: "manual",
    });
    expect(declined.status).toBe(200);
    expect(await declined.text()).toContain("Your card was declined.");
    const paid = await fetch(`${session.url}/pay`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: "number=4242+4242+4242+4242&expiry=12%2F34&cvc=123",
      redirect: "manual",
    });
    expect(paid.status).toBe(303);
    expect(paid.headers.get("location")).toBe(`http://127.0.0.1:3100/billing?session_id=${session.id}`);
  });

  test.each([
    ["an incomplete number", { number: "4242", expiry: "12/34", cvc: "123" }, "incomplete_number"],
    ["a past expiry", { number: "4242424242424242", expiry: "01/20", cvc: "123" }, "invalid_expiry_year"],
    ["no security code", { number: "4242424242424242", expiry: "12/34", cvc: "" }, "incomplete_cvc"],
  ])("%s is refused with a card error", async (_label, card, code) => {
    const { session } = await openSession("bad-card@example.test");
    const res = await fetch(`${standin.url}/checkout/${session.id}/pay`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded", accept: "application/json" },
      body: new URLSearchParams(card).toString(),
    });
    expect(res.status).toBe(402);
    expect(await res.json()).toMatchObject({ error: { type: "card_error", code } });
  });

  test("the portal cancels at period end, resumes, and cancels now, each with its event", async () => {
    const { session, customer } = await openSession("portal@example.test");
    await pay(standin.url, session.id);
    const sub = (await stripe.checkout.sessions.retrieve(session.id)).subscription as string;
    const portal = await stripe.billingPortal.sessions.create({ customer, return_url: "http://127.0.0.1:3100/billing" });
    expect(portal.id).toMatch(/^bps_/);
    const page = await (await fetch(portal.url)).text();
    expect(page).toContain("Cancel at end of period");
    await standin.settled();
    received.length = 0;

    const act = async (action: string) => {
      const res = await fetch(`${portal.url}/${action}`, {
        method: "POST",
        headers: { "content-type": "application/x-www-form-urlencoded" },
        body: `subscription=${sub}`,
        redirect: "manual",
      });
      expect(res.status).toBe(303);
      await standin.settled();
    };
    await act("cancel");
    expect(await stripe.subscriptions.retrieve(sub)).toMatchObject({ status: "active", cancel_at_period_end: true });
    await act("resume");
    expect(await stripe.subscriptions.retrieve(sub)).toMatchObject({ status: "active", cancel_at_period_end: false, cancel_at: null });
    await act("cancel-now");
    expect(await stripe.subscriptions.retrieve(sub)).toMatchObject({ status: "canceled" });
    expect(received.map((e) => e.type)).toEqual(["customer.subscription.updated", "customer.subscription.updated", "customer.subscription.deleted"]);
    const first = received[0] as Stripe.CustomerSubscriptionUpdatedEvent;
    expect(first.data.previous_attributes).toMatchObject({ cancel_at_period_end: false });
  });

  test("the SDK's update and cancel calls work on a subscription", async () => {
    const { session } = await openSession("sdk-cancel@example.test");
    await pay(standin.url, session.id);
    const subId = (await stripe.checkout.sessions.retrieve(session.id)).subscription as string;
    expect((await stripe.subscriptions.update(subId, { cancel_at_period_end: true })).cancel_at_period_end).toBe(true);
    expect((await stripe.subscriptions.cancel(subId)).status).toBe("canceled");
    await expect(stripe.subscriptions.update(subId, { cancel_at_period_end: false })).rejects.toMatchObject({ statusCode: 400 });
  });

  test("advancing the clock renews (invoice.paid), fails a renewal (payment_failed, past_due), and ends a canceled one", async () => {
    const { session } = await openSession("clock@example.test");
    await pay(standin.url, session.id);
    const subId = (await stripe.checkout.sessions.retrieve(session.id)).subscription as string;
    const before = await stripe.subscriptions.retrieve(subId);
    const control = async (body: Record<string, string>) => {
      const res = await fetch(`${standin.url}/_control/advance`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(body),
      });
      expect(res.status).toBe(200);
      return (await res.json()) as { events: string[] };
    };

    expect((await control({ subscription: subId })).events).toEqual(["invoice.paid", "invoice.payment_succeeded", "customer.subscription.updated"]);
    const renewed = await stripe.subscriptions.retrieve(subId);
    expect(renewed.items.data[0].current_period_start).toBe(before.items.data[0].current_period_end);

    expect((await control({ subscription: subId, fail: "true" })).events).toEqual(["invoice.payment_failed", "customer.subscription.updated"]);
    expect((await stripe.subscriptions.retrieve(subId)).status).toBe("past_due");

    await stripe.subscriptions.update(subId, { cancel_at_period_end: true });
    expect((await control({ subscription: subId })).events).toEqual(["customer.subscription.deleted"]);
    expect((await stripe.subscriptions.retrieve(subId)).status).toBe("canceled");
  });
});
