import { beforeEach, describe, expect, test, vi } from "vitest";
import { TEST_DB, eventObject, fakeId, invoiceObject, outbox, sendMailMock, signedRequest, subscriptionObject, uniqueEmail } from "./support";

vi.mock("@/lib/mail", () => ({ sendMail: sendMailMock }));

const { POST } = await import("@/app/api/stripe/webhook/route");
const { getSequelize } = await import("@/lib/db");
const { getSubscription, hasActiveSubscription, getPlanLimits } = await import("@/lib/payments/subscriptions");
const { FREE_LIMITS } = await import("@/lib/payments/plans");
const { User } = await import("@/models/user");
const { StripeCustomer } = await import("@/models/stripe-customer");
const { StripeEvent } = await import("@/models/stripe-event");
const { Subscription } = await import("@/models/subscription");

type Role = "builder" | "subscriber" | "admin";

async function makeCustomer(role: Role = "builder"): Promise<{ userId: string; email: string; customer: string }> {
  getSequelize();
  const email = uniqueEmail(role);
  const user = await User.create({ email, passwordHash: "x".repeat(60), name: "Webhook Tester", company: null, role, emailVerifiedAt: new Date() });
  const customer = fakeId("cus");
  await StripeCustomer.create({ userId: user.id, stripeCustomerId: customer });
  return { userId: user.id, email, customer };
}

async function deliver(
  payload: Record<string, unknown>,
  options?: Parameters<typeof signedRequest>[1],
): Promise<{ status: number; body: Record<string, unknown> }> {
  const res = await POST(signedRequest(payload, options), {});
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

const roleOf = async (userId: string) => (await User.findByPk(userId))?.role;
const now = () => Math.floor(Date.now() / 1000);
const DAY = 86_400;

beforeEach(() => {
  outbox.length = 0;
  sendMailMock.mockClear();
});

describe.skipIf(!TEST_DB)("POST /api/stripe/webhook", () => {
  test.each<[string, { secret?: string; signature?: string | null }]>([
    ["no Stripe-Signature header", { signature: null }],
    ["a signature made with another secret", { secret: "whsec_someone_else" }],
    ["a malformed header", { signature: "t=1,v1=deadbeef" }],
    ["a header signed five minutes and more ago", { signature: "stale" }],
  ])("%s is a 400 and changes nothing", async (_label, options) => {
    const { userId, customer } = await makeCustomer();
    const sub = subscriptionObject({ id: fakeId("sub"), customer, status: "active", periodStart: now(), periodEnd: now() + 30 * DAY });
    const event = eventObject("customer.subscription.created", sub, now());
    let opts = options;
    if (options.signature === "stale") {
      const { signatureHeader } = await import("@/scripts/stripe-standin/webhooks");
      opts = { signature: signatureHeader(JSON.stringify(event), process.env.STRIPE_WEBHOOK_SECRET ?? "", now() - 301) };
    }
    const res = await deliver(event, opts);
    expect(res.status).toBe(400);
    expect(String(res.body.error)).toMatch(/signature/i);
    expect(await StripeEvent.count({ where: { eventId: String(event.id) } })).toBe(0);
    expect(await Subscription.count({ where: { userId } })).toBe(0);
    expect(await roleOf(userId)).toBe("builder");
  });

  test.each<[string, unknown]>([
    ["a JSON array", [1, 2]],
    ["a bare number", 42],
    ["null", null],
    ["an object with no type", { id: "evt_x", created: 1, data: { object: { id: "sub_x" } } }],
    ["an event without data.object", { id: "evt_y", type: "customer.subscription.created", created: 1, data: {} }],
  ])("a correctly signed body that is not an event (%s) is a 400, not a 500, and records nothing", async (_label, payload) => {
    const before = await StripeEvent.count();
    const res = await deliver(payload as Record<string, unknown>);
    expect(res.status).toBe(400);
    expect(String(res.body.error)).toMatch(/not a Stripe event/);
    expect(await StripeEvent.count()).toBe(before);
  });

  test("a signed body that was changed after signing is a 400", async () => {
    const { customer } = await makeCustomer();
    const event = eventObject(
      "customer.subscription.created",
      subscriptionObject({ id: fakeId("sub"), customer, status: "active", periodStart: now(), periodEnd: now() + DAY }),
      now(),
    );
    const good = signedRequest(event);
    const tampered = new Request(good.url, {
      method: "POST",
      headers: good.headers,
      body: JSON.stringify({ ...event, type: "customer.subscription.deleted" }),
    });
    expect((await POST(tampered, {})).status).toBe(400);
  });

  test("customer.subscription.created sets the subscriber role and stores the plan and renewal date", async () => {
    const { userId, customer } = await makeCustomer();
    const periodEnd = now() + 30 * DAY;
    const res = await deliver(
      eventObject("customer.subscription.created", subscriptionObject({ id: fakeId("sub"), customer, status: "active", periodStart: now(), periodEnd }), now()),
    );
    expect(res).toMatchObject({ status: 200, body: { received: true, duplicate: false, outcome: "applied" } });
    expect(await roleOf(userId)).toBe("subscriber");
    expect(await hasActiveSubscription(userId)).toBe(true);
    const summary = await getSubscription(userId);
    expect(summary).toMatchObject({ plan: "monthly", status: "active", active: true, cancelAtPeriodEnd: false });
    expect(summary?.currentPeriodEnd?.getTime()).toBe(periodEnd * 1000);
  });

  test("the same event delivered twice has one effect: one record, one receipt", async () => {
    const { userId, email, customer } = await makeCustomer();
    const subId = fakeId("sub");
    await deliver(
      eventObject(
        "customer.subscription.created",
        subscriptionObject({ id: subId, customer, status: "active", periodStart: now(), periodEnd: now() + 30 * DAY }),
        now(),
      ),
    );
    const paid = eventObject("invoice.paid", invoiceObject({ customer, subscription: subId, periodStart: now(), periodEnd: now() + 30 * DAY }), now());
    const first = await deliver(paid);
    const second = await deliver(paid);
    expect(first.body).toMatchObject({ duplicate: false, outcome: "applied" });
    expect(second).toMatchObject({ status: 200, body: { duplicate: true } });
    expect(await StripeEvent.count({ where: { eventId: String(paid.id) } })).toBe(1);
    expect(sendMailMock).toHaveBeenCalledTimes(1);
    expect(outbox[0].to).toBe(email);
    expect(outbox[0].text).toContain("$12.00");
    expect(outbox[0].text).toContain("Spanlark Sheets, monthly");
    expect(await roleOf(userId)).toBe("subscriber");
  });

  test("the same event sent concurrently is handled once", async () => {
    const { customer } = await makeCustomer();
    const subId = fakeId("sub");
    await deliver(
      eventObject(
        "customer.subscription.created",
        subscriptionObject({ id: subId, customer, status: "active", periodStart: now(), periodEnd: now() + DAY }),
        now(),
      ),
    );
    const paid = eventObject("invoice.paid", invoiceObject({ customer, subscription: subId, periodStart: now(), periodEnd: now() + DAY }), now());
    const results = await Promise.all(Array.from({ length: 5 }, () => deliver(paid)));
    expect(results.every((r) => r.status === 200)).toBe(true);
    expect(results.filter((r) => r.body.duplicate === false)).toHaveLength(1);
    expect(sendMailMock).toHaveBeenCalledTimes(1);
  });

  test('"deleted" arriving before an older "updated" leaves the subscription ended and the role cleared', async () => {
    const { userId, customer } = await makeCustomer();
    const subId = fakeId("sub");
    const t0 = now() - 120;
    const base = { id: subId, customer, periodStart: t0, periodEnd: t0 + 30 * DAY };
    await deliver(eventObject("customer.subscription.created", subscriptionObject({ ...base, status: "active" }), t0));
    expect(await roleOf(userId)).toBe("subscriber");
    const updated = eventObject("customer.subscription.updated", subscriptionObject({ ...base, status: "active", cancelAtPeriodEnd: true }), t0 + 60);
    const deleted = eventObject("customer.subscription.deleted", subscriptionObject({ ...base, status: "canceled" }), t0 + 90);

    expect((await deliver(deleted)).body.outcome).toBe("applied");
    expect((await deliver(updated)).body.outcome).toBe("stale");
    const summary = await getSubscription(userId);
    expect(summary).toMatchObject({ status: "canceled", active: false });
    expect(await roleOf(userId)).toBe("builder");
    expect(await hasActiveSubscription(userId)).toBe(false);
  });

  test('"updated" events out of order: the newer state wins', async () => {
    const { userId, customer } = await makeCustomer();
    const subId = fakeId("sub");
    const t0 = now() - 300;
    const base = { id: subId, customer, status: "active", periodStart: t0, periodEnd: t0 + 30 * DAY };
    await deliver(eventObject("customer.subscription.created", subscriptionObject(base), t0));
    const canceled = eventObject("customer.subscription.updated", subscriptionObject({ ...base, cancelAtPeriodEnd: true }), t0 + 100);
    const resumed = eventObject("customer.subscription.updated", subscriptionObject({ ...base, cancelAtPeriodEnd: false }), t0 + 200);
    await deliver(resumed);
    expect((await deliver(canceled)).body.outcome).toBe("stale");
    expect(await getSubscription(userId)).toMatchObject({ cancelAtPeriodEnd: false, active: true });
  });

  test("the created event arriving after the deleted one does not revive the subscription", async () => {
    const { userId, customer } = await makeCustomer();
    const subId = fakeId("sub");
    const t0 = now() - 60;
    const base = { id: subId, customer, periodStart: t0, periodEnd: t0 + DAY };
    await deliver(eventObject("customer.subscription.deleted", subscriptionObject({ ...base, status: "canceled" }), t0 + 30));
    await deliver(eventObject("customer.subscription.created", subscriptionObject({ ...base, status: "active" }), t0));
    expect(await getSubscription(userId)).toMatchObject({ status: "canceled" });
    expect(await roleOf(userId)).toBe("builder");
  });

  test("canceling at period end keeps access until Stripe ends the subscription", async () => {
    const { userId, customer } = await makeCustomer();
    const subId = fakeId("sub");
    const t0 = now() - 100;
    const base = { id: subId, customer, periodStart: t0, periodEnd: t0 + 30 * DAY };
    await deliver(eventObject("customer.subscription.created", subscriptionObject({ ...base, status: "active" }), t0));
    await deliver(eventObject("customer.subscription.updated", subscriptionObject({ ...base, status: "active", cancelAtPeriodEnd: true }), t0 + 10));
    expect(await getSubscription(userId)).toMatchObject({ active: true, cancelAtPeriodEnd: true });
    expect(await roleOf(userId)).toBe("subscriber");
    await deliver(eventObject("customer.subscription.deleted", subscriptionObject({ ...base, status: "canceled", cancelAtPeriodEnd: true }), t0 + 20));
    expect(await roleOf(userId)).toBe("builder");
  });

  test("invoice.payment_failed marks the subscription past due and clears the role; a later renewal restores it", async () => {
    const { userId, customer } = await makeCustomer();
    const subId = fakeId("sub");
    const t0 = now() - 500;
    const base = { id: subId, customer, periodStart: t0, periodEnd: t0 + 30 * DAY };
    await deliver(eventObject("customer.subscription.created", subscriptionObject({ ...base, status: "active" }), t0));
    const failed = await deliver(
      eventObject("invoice.payment_failed", invoiceObject({ customer, subscription: subId, paid: false, periodStart: t0, periodEnd: t0 + DAY }), t0 + 100),
    );
    expect(failed.body.outcome).toBe("applied");
    expect(await getSubscription(userId)).toMatchObject({ status: "past_due", active: false });
    expect(await roleOf(userId)).toBe("builder");
    expect(sendMailMock).not.toHaveBeenCalled();
    await deliver(eventObject("customer.subscription.updated", subscriptionObject({ ...base, status: "active" }), t0 + 200));
    expect(await roleOf(userId)).toBe("subscriber");
  });

  test("an admin's role is never changed by subscription events", async () => {
    const { userId, customer } = await makeCustomer("admin");
    const subId = fakeId("sub");
    const base = { id: subId, customer, periodStart: now() - 10, periodEnd: now() + DAY };
    await deliver(eventObject("customer.subscription.created", subscriptionObject({ ...base, status: "active" }), now() - 10));
    expect(await roleOf(userId)).toBe("admin");
    await deliver(eventObject("customer.subscription.deleted", subscriptionObject({ ...base, status: "canceled" }), now()));
    expect(await roleOf(userId)).toBe("admin");
  });

  test("a subscription found only through its metadata links the customer to the user", async () => {
    getSequelize();
    const user = await User.create({
      email: uniqueEmail("meta"),
      passwordHash: "x".repeat(60),
      name: "Meta",
      company: null,
      role: "builder",
      emailVerifiedAt: null,
    });
    const customer = fakeId("cus");
    const sub = subscriptionObject({
      id: fakeId("sub"),
      customer,
      status: "active",
      periodStart: now(),
      periodEnd: now() + DAY,
      metadata: { userId: user.id, plan: "yearly" },
      lookupKey: "unknown_key",
    });
    expect((await deliver(eventObject("customer.subscription.created", sub, now()))).body.outcome).toBe("applied");
    expect((await StripeCustomer.findByPk(user.id))?.stripeCustomerId).toBe(customer);
    expect(await getSubscription(user.id)).toMatchObject({ plan: "yearly", planName: "Yearly" });
  });

  test("an event for an unknown customer is answered 200 and recorded as unmatched", async () => {
    const sub = subscriptionObject({ id: fakeId("sub"), customer: fakeId("cus"), status: "active", periodStart: now(), periodEnd: now() + DAY });
    const event = eventObject("customer.subscription.created", sub, now());
    expect(await deliver(event)).toMatchObject({ status: 200, body: { outcome: "unmatched" } });
    expect((await StripeEvent.findByPk(String(event.id)))?.outcome).toBe("unmatched");
  });

  test("an event type the app does not use is acknowledged and ignored", async () => {
    const event = eventObject("customer.created", { id: fakeId("cus"), object: "customer" }, now());
    expect(await deliver(event)).toMatchObject({ status: 200, body: { outcome: "ignored" } });
  });

  test("plan limits: free tier without a subscription, none with one", async () => {
    const { userId, customer } = await makeCustomer();
    expect(await getPlanLimits({ id: userId, role: "builder" })).toEqual({
      savedJobs: FREE_LIMITS.savedJobs,
      activeCrewLinks: FREE_LIMITS.activeCrewLinks,
      canSaveSheets: false,
    });
    await deliver(
      eventObject(
        "customer.subscription.created",
        subscriptionObject({ id: fakeId("sub"), customer, status: "active", periodStart: now(), periodEnd: now() + DAY }),
        now(),
      ),
    );
    expect(await getPlanLimits({ id: userId, role: "subscriber" })).toEqual({ savedJobs: null, activeCrewLinks: null, canSaveSheets: true });
  });
});
