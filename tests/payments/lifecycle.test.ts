import type Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, test, vi } from "vitest";
import type { StandinServer } from "@/scripts/stripe-standin/server";
import { TEST_DB, outbox, pay, sendMailMock, startReceiver, startTestStandin, stripeFor, uniqueEmail, type Receiver } from "./support";

vi.mock("@/lib/mail", () => ({ sendMail: sendMailMock }));

const { POST } = await import("@/app/api/stripe/webhook/route");
const { getSequelize } = await import("@/lib/db");
const { ensureCatalog } = await import("@/lib/payments/catalog");
const { startCheckout } = await import("@/lib/payments/checkout");
const { openBillingPortal } = await import("@/lib/payments/portal");
const { setStripeForTests } = await import("@/lib/payments/stripe");
const { getSubscription, hasActiveSubscription } = await import("@/lib/payments/subscriptions");
const { syncCheckoutSession } = await import("@/lib/payments/webhooks");
const { HttpError } = await import("@/lib/http");
const { User } = await import("@/models/user");
const { Subscription } = await import("@/models/subscription");

// The whole life cycle through the official SDK and the stand-in: the app's own checkout code opens the
// session, the stand-in's pay endpoint takes the card, the stand-in signs and sends the events, and the
// webhook route (called by a small server standing in for the app) sets the role.
describe.skipIf(!TEST_DB)("subscription life cycle against the stand-in", () => {
  let standin: StandinServer;
  let receiver: Receiver;
  let stripe: Stripe;

  beforeAll(async () => {
    receiver = await startReceiver((req) => POST(req, {}));
    standin = await startTestStandin(receiver.url);
    stripe = stripeFor(standin.url);
    setStripeForTests(stripe);
    await ensureCatalog(stripe);
  });

  afterAll(async () => {
    setStripeForTests(undefined);
    await standin?.close();
    await receiver?.close();
  });

  beforeEach(() => {
    outbox.length = 0;
    sendMailMock.mockClear();
  });

  async function builder() {
    getSequelize();
    const user = await User.create({
      email: uniqueEmail("cycle"),
      passwordHash: "x".repeat(60),
      name: "Dee Tester",
      company: "Tester Framing",
      role: "builder",
      emailVerifiedAt: new Date(),
    });
    return { id: user.id, email: user.email, name: user.name, company: user.company };
  }

  const roleOf = async (id: string) => (await User.findByPk(id))?.role;
  const sessionIdOf = (url: string) => url.split("/").pop() ?? "";

  test("checkout paid with 4242: webhooks received by the route, role set, receipt sent once", async () => {
    const user = await builder();
    const { url, sessionId } = await startCheckout(user, "monthly");
    expect(url).toBe(`${standin.url}/checkout/${sessionId}`);
    const session = await stripe.checkout.sessions.retrieve(sessionId);
    expect(session).toMatchObject({ client_reference_id: user.id, mode: "subscription", amount_total: 1200 });
    expect(session.success_url).toBe("http://127.0.0.1:3100/billing?checkout=success&session_id={CHECKOUT_SESSION_ID}");

    const paid = await pay(standin.url, sessionId);
    expect(paid.status).toBe(200);
    await standin.settled();

    expect(receiver.requests.filter((r) => r.status !== 200)).toEqual([]);
    expect(await roleOf(user.id)).toBe("subscriber");
    expect(await hasActiveSubscription(user.id)).toBe(true);
    const summary = await getSubscription(user.id);
    expect(summary).toMatchObject({ plan: "monthly", status: "active", cancelAtPeriodEnd: false });
    const sub = await stripe.subscriptions.retrieve((await Subscription.findOne({ where: { userId: user.id } }))?.stripeSubscriptionId ?? "");
    expect(summary?.currentPeriodEnd?.getTime()).toBe(sub.items.data[0].current_period_end * 1000);
    expect(sendMailMock).toHaveBeenCalledTimes(1);
    expect(outbox[0]).toMatchObject({ to: user.email });
    expect(outbox[0].subject).toMatch(/receipt/i);
  });

  test("a declined card leaves the account free; trying again with 4242 subscribes", async () => {
    const user = await builder();
    const { sessionId } = await startCheckout(user, "yearly");
    const declined = await pay(standin.url, sessionId, "4000 0000 0000 0002");
    expect(declined.status).toBe(402);
    await standin.settled();
    expect(await roleOf(user.id)).toBe("builder");
    expect(await getSubscription(user.id)).toBeNull();
    expect(sendMailMock).not.toHaveBeenCalled();

    expect((await pay(standin.url, sessionId)).status).toBe(200);
    await standin.settled();
    expect(await roleOf(user.id)).toBe("subscriber");
    expect(await getSubscription(user.id)).toMatchObject({ plan: "yearly" });
  });

  test("a second checkout while subscribed is refused with 409", async () => {
    const user = await builder();
    const { sessionId } = await startCheckout(user, "monthly");
    await pay(standin.url, sessionId);
    await standin.settled();
    await expect(startCheckout(user, "yearly")).rejects.toMatchObject({ status: 409 });
  });

  test("canceling in the portal keeps access until the period ends, then the role is cleared", async () => {
    const user = await builder();
    const { sessionId } = await startCheckout(user, "monthly");
    await pay(standin.url, sessionId);
    await standin.settled();
    const { url: portalUrl } = await openBillingPortal(user);
    expect(portalUrl).toMatch(new RegExp(`^${standin.url}/portal/bps_`));
    const subId = (await Subscription.findOne({ where: { userId: user.id } }))?.stripeSubscriptionId ?? "";

    const cancel = await fetch(`${portalUrl}/cancel`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: `subscription=${subId}`,
      redirect: "manual",
    });
    expect(cancel.status).toBe(303);
    await standin.settled();
    expect(await getSubscription(user.id)).toMatchObject({ active: true, cancelAtPeriodEnd: true });
    expect(await roleOf(user.id)).toBe("subscriber");

    const advanced = await fetch(`${standin.url}/_control/advance`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ subscription: subId }),
    });
    expect(((await advanced.json()) as { events: string[] }).events).toEqual(["customer.subscription.deleted"]);
    await standin.settled();
    expect(await getSubscription(user.id)).toMatchObject({ status: "canceled", active: false });
    expect(await roleOf(user.id)).toBe("builder");
  });

  test("a failed renewal clears the role until a renewal is paid", async () => {
    const user = await builder();
    const { sessionId } = await startCheckout(user, "monthly");
    await pay(standin.url, sessionId);
    await standin.settled();
    const subId = (await Subscription.findOne({ where: { userId: user.id } }))?.stripeSubscriptionId ?? "";
    const advance = (body: Record<string, unknown>) =>
      fetch(`${standin.url}/_control/advance`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
    await advance({ subscription: subId, fail: true });
    await standin.settled();
    expect(await getSubscription(user.id)).toMatchObject({ status: "past_due", active: false });
    expect(await roleOf(user.id)).toBe("builder");
    await advance({ subscription: subId });
    await standin.settled();
    expect(await roleOf(user.id)).toBe("subscriber");
  });

  test("the billing portal before any checkout is a 404 with a message", async () => {
    const user = await builder();
    const err = await openBillingPortal(user).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(HttpError);
    expect(err).toMatchObject({ status: 404 });
  });

  test("a customer the stand-in no longer knows is replaced at the next checkout", async () => {
    const user = await builder();
    await startCheckout(user, "monthly");
    const fresh = await startTestStandin("");
    try {
      const other = stripeFor(fresh.url);
      await ensureCatalog(other);
      const { url } = await startCheckout(user, "monthly", other);
      expect(url.startsWith(fresh.url)).toBe(true);
    } finally {
      await fresh.close();
    }
  });

  test("with no webhooks at all, the return to the billing page syncs the subscription from the API", async () => {
    const quiet = await startTestStandin("");
    const other = stripeFor(quiet.url);
    try {
      await ensureCatalog(other);
      const user = await builder();
      const someoneElse = await builder();
      const { url } = await startCheckout(user, "monthly", other);
      await pay(quiet.url, sessionIdOf(url));
      expect(await roleOf(user.id)).toBe("builder");
      expect(await syncCheckoutSession(someoneElse.id, sessionIdOf(url), other)).toBe(false);
      expect(await syncCheckoutSession(user.id, sessionIdOf(url), other)).toBe(true);
      expect(await roleOf(user.id)).toBe("subscriber");
      expect(await roleOf(someoneElse.id)).toBe("builder");
      expect(await syncCheckoutSession(user.id, "cs_test_nope", other)).toBe(false);
    } finally {
      await quiet.close();
    }
  });
});
