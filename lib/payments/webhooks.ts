import "server-only";
import { QueryTypes, type Transaction } from "sequelize";
import type Stripe from "stripe";
import { getSequelize } from "@/lib/db";
import { env } from "@/lib/env";
import { HttpError } from "@/lib/http";
import { logger } from "@/lib/logger";
import { sendMail, type MailMessage } from "@/lib/mail";
import { paymentReceiptMail } from "@/lib/mail/templates/payment-receipt";
import { StripeCustomer } from "@/models/stripe-customer";
import { Subscription, type SubscriptionStatus } from "@/models/subscription";
import { User } from "@/models/user";
import { planByLookupKey, PLANS, PRODUCT } from "./plans";
import { getStripe } from "./stripe";
import { FINAL_STATUSES, refreshSubscriberRole } from "./subscriptions";

export interface WebhookDeps {
  stripe: Stripe;
  mail: (message: MailMessage) => Promise<unknown>;
}

export type EventOutcome = "applied" | "stale" | "ignored" | "unmatched";

export interface HandledEvent {
  duplicate: boolean;
  outcome: EventOutcome | null;
}

/**
 * Checks Stripe's signature on the raw body (header `Stripe-Signature`, secret STRIPE_WEBHOOK_SECRET) and
 * returns the event. A missing or wrong signature, or a timestamp over 5 minutes old, is a 400.
 */
export function verifyStripeEvent(rawBody: string, signature: string | null, stripe: Stripe = getStripe()): Stripe.Event {
  if (!signature) throw new HttpError(400, "missing Stripe-Signature header");
  let event: Stripe.Event;
  try {
    event = stripe.webhooks.constructEvent(rawBody, signature, env().STRIPE_WEBHOOK_SECRET);
  } catch {
    throw new HttpError(400, "the Stripe signature does not match this payload");
  }
  if (!isEventShaped(event)) throw new HttpError(400, "the signed body is not a Stripe event (it needs id, type, created and data.object)");
  return event;
}

/** A signed body is still checked for an event's envelope before any of it is read. */
function isEventShaped(value: unknown): value is Stripe.Event {
  if (typeof value !== "object" || value === null || Array.isArray(value)) return false;
  const e = value as Record<string, unknown>;
  if (typeof e.id !== "string" || e.id === "" || typeof e.type !== "string" || typeof e.created !== "number" || !Number.isFinite(e.created)) return false;
  const data = e.data as Record<string, unknown> | null | undefined;
  if (typeof data !== "object" || data === null) return false;
  const object = data.object as Record<string, unknown> | null | undefined;
  return typeof object === "object" && object !== null && !Array.isArray(object) && typeof object.id === "string";
}

const idOf = (v: string | { id: string } | null | undefined): string | null => (v == null ? null : typeof v === "string" ? v : v.id);

function periodEndOf(sub: Stripe.Subscription): Date | null {
  const ends = sub.items.data.map((i) => i.current_period_end).filter((n): n is number => typeof n === "number");
  return ends.length ? new Date(Math.min(...ends) * 1000) : null;
}

/**
 * State read from the API is stamped with the current whole second, the resolution of an event's `created`,
 * so an event from that same second still applies over it (ties go to the event).
 */
function wholeSecondNow(): number {
  return Math.floor(Date.now() / 1000) * 1000;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Finds the Spanlark user a Stripe customer or subscription belongs to. */
async function resolveUser(
  t: Transaction,
  { customerId, metadataUserId, existingUserId }: { customerId: string | null; metadataUserId?: string | null; existingUserId?: string | null },
): Promise<string | null> {
  if (existingUserId) return existingUserId;
  if (customerId) {
    const link = await StripeCustomer.findOne({ where: { stripeCustomerId: customerId }, transaction: t });
    if (link) return link.userId;
  }
  if (metadataUserId && UUID.test(metadataUserId)) {
    const user = await User.findByPk(metadataUserId, { transaction: t });
    if (user) return user.id;
  }
  return null;
}

async function linkCustomer(t: Transaction, userId: string, customerId: string): Promise<void> {
  const existing = await StripeCustomer.findByPk(userId, { transaction: t });
  if (!existing) {
    const taken = await StripeCustomer.findOne({ where: { stripeCustomerId: customerId }, transaction: t });
    if (!taken) await StripeCustomer.create({ userId, stripeCustomerId: customerId }, { transaction: t });
  } else if (existing.stripeCustomerId !== customerId) {
    existing.stripeCustomerId = customerId;
    await existing.save({ transaction: t });
  }
}

/**
 * Stores a subscription as Stripe reports it at `at`, unless what is stored is newer: a subscription that
 * has ended stays ended (Stripe never revives one), and news older than the stored state is skipped. So
 * "deleted" then a late "updated" leaves it ended; the role is then set from what is stored.
 */
export async function applySubscription(t: Transaction, sub: Stripe.Subscription, at: Date): Promise<EventOutcome> {
  const existing = await Subscription.findOne({ where: { stripeSubscriptionId: sub.id }, transaction: t, lock: t.LOCK.UPDATE });
  const customerId = idOf(sub.customer);
  const userId = await resolveUser(t, { customerId, metadataUserId: sub.metadata?.userId, existingUserId: existing?.userId });
  if (!userId || !customerId) {
    logger.warn({ subscription: sub.id, customer: customerId }, "stripe subscription for no known user");
    return "unmatched";
  }
  const status = sub.status as SubscriptionStatus;
  if (existing) {
    const endedAlready = FINAL_STATUSES.includes(existing.status) && !FINAL_STATUSES.includes(status);
    if (endedAlready || at.getTime() < existing.stripeUpdatedAt.getTime()) return "stale";
  }
  const item = sub.items.data[0];
  const price = item?.price;
  const plan = planByLookupKey(price?.lookup_key)?.id ?? (sub.metadata?.plan === "monthly" || sub.metadata?.plan === "yearly" ? sub.metadata.plan : null);
  const values = {
    userId,
    stripeSubscriptionId: sub.id,
    stripeCustomerId: customerId,
    stripePriceId: price?.id ?? null,
    plan,
    status,
    cancelAtPeriodEnd: sub.cancel_at_period_end,
    currentPeriodEnd: periodEndOf(sub),
    canceledAt: sub.canceled_at ? new Date(sub.canceled_at * 1000) : null,
    endedAt: sub.ended_at ? new Date(sub.ended_at * 1000) : null,
    stripeUpdatedAt: at,
  };
  if (existing) await existing.update(values, { transaction: t });
  else await Subscription.create(values, { transaction: t });
  await linkCustomer(t, userId, customerId);
  await refreshSubscriberRole(userId, t);
  return "applied";
}

/** Records the event id; false when it was already recorded (the insert waits for a concurrent twin). */
async function recordEvent(t: Transaction, event: Stripe.Event): Promise<boolean> {
  const rows = await getSequelize().query<{ event_id: string }>(
    `INSERT INTO stripe_events (event_id, type, stripe_created_at, outcome, created_at)
     VALUES (:id, :type, :created, 'pending', now()) ON CONFLICT (event_id) DO NOTHING RETURNING event_id`,
    { replacements: { id: event.id, type: event.type, created: new Date(event.created * 1000) }, type: QueryTypes.SELECT, transaction: t },
  );
  return rows.length === 1;
}

function invoiceSubscriptionId(invoice: Stripe.Invoice): string | null {
  return idOf(invoice.parent?.subscription_details?.subscription ?? null);
}

async function receiptFor(t: Transaction, invoice: Stripe.Invoice): Promise<MailMessage | null> {
  if (!invoice.amount_paid) return null;
  const customerId = idOf(invoice.customer);
  const subscriptionId = invoiceSubscriptionId(invoice);
  const row = subscriptionId ? await Subscription.findOne({ where: { stripeSubscriptionId: subscriptionId }, transaction: t }) : null;
  const userId = await resolveUser(t, {
    customerId,
    metadataUserId: invoice.parent?.subscription_details?.metadata?.userId,
    existingUserId: row?.userId,
  });
  if (!userId) return null;
  const user = await User.findByPk(userId, { transaction: t });
  if (!user) return null;
  const line = invoice.lines.data[0];
  const planId = row?.plan === "monthly" || row?.plan === "yearly" ? row.plan : invoice.parent?.subscription_details?.metadata?.plan;
  const plan = planId === "monthly" || planId === "yearly" ? PLANS[planId] : null;
  const paidAt = invoice.status_transitions?.paid_at ?? invoice.created;
  const mail = paymentReceiptMail({
    name: user.name,
    description: plan ? `${PRODUCT.name}, ${plan.name.toLowerCase()}` : PRODUCT.name,
    amountCents: invoice.amount_paid,
    currency: invoice.currency,
    paidAt: new Date(paidAt * 1000),
    periodEnd: line?.period?.end ? new Date(line.period.end * 1000) : null,
    reference: invoice.number ?? invoice.id,
    billingLink: `${env().APP_URL.replace(/\/$/, "")}/billing`,
  });
  return { to: user.email, ...mail };
}

/**
 * Handles one verified event once. The event id is recorded in the same transaction as its effect, so a
 * repeat changes nothing and a failure leaves nothing recorded (Stripe sends it again). Mail goes out
 * after the commit.
 */
export async function handleStripeEvent(event: Stripe.Event, deps?: Partial<WebhookDeps>): Promise<HandledEvent> {
  const stripe = deps?.stripe ?? getStripe();
  const mail = deps?.mail ?? sendMail;
  const at = new Date(event.created * 1000);
  const outbox: MailMessage[] = [];

  const result = await getSequelize().transaction(async (t): Promise<HandledEvent> => {
    if (!(await recordEvent(t, event))) return { duplicate: true, outcome: null };
    let outcome: EventOutcome = "ignored";
    switch (event.type) {
      case "checkout.session.completed": {
        const session = event.data.object;
        if (session.mode !== "subscription") break;
        const customerId = idOf(session.customer);
        const userId = await resolveUser(t, { customerId, metadataUserId: session.client_reference_id ?? session.metadata?.userId });
        if (!userId || !customerId) {
          outcome = "unmatched";
          break;
        }
        await linkCustomer(t, userId, customerId);
        const subscriptionId = idOf(session.subscription);
        if (subscriptionId) {
          // The session carries only the id: read the subscription as it is now.
          const sub = await stripe.subscriptions.retrieve(subscriptionId);
          outcome = await applySubscription(t, sub, new Date(Math.max(wholeSecondNow(), at.getTime())));
        } else {
          outcome = "applied";
        }
        break;
      }
      case "customer.subscription.created":
      case "customer.subscription.updated":
      case "customer.subscription.deleted":
        outcome = await applySubscription(t, event.data.object, at);
        break;
      case "invoice.paid": {
        const receipt = await receiptFor(t, event.data.object);
        if (receipt) outbox.push(receipt);
        outcome = receipt ? "applied" : "unmatched";
        break;
      }
      case "invoice.payment_failed": {
        const subscriptionId = invoiceSubscriptionId(event.data.object);
        const row = subscriptionId
          ? await Subscription.findOne({ where: { stripeSubscriptionId: subscriptionId }, transaction: t, lock: t.LOCK.UPDATE })
          : null;
        if (!row) {
          outcome = "unmatched";
          break;
        }
        if (FINAL_STATUSES.includes(row.status) || at.getTime() < row.stripeUpdatedAt.getTime()) {
          outcome = "stale";
          break;
        }
        await row.update({ status: "past_due", stripeUpdatedAt: at }, { transaction: t });
        await refreshSubscriberRole(row.userId, t);
        outcome = "applied";
        break;
      }
      default:
        outcome = "ignored";
    }
    await getSequelize().query("UPDATE stripe_events SET outcome = :outcome WHERE event_id = :id", {
      replacements: { outcome, id: event.id },
      transaction: t,
    });
    return { duplicate: false, outcome };
  });

  for (const message of outbox) {
    try {
      await mail(message);
    } catch (err) {
      logger.error({ err, event: event.id }, "payment receipt not sent");
    }
  }
  return result;
}

/**
 * After Checkout sends the user back (`/billing?session_id=…`), reads the session and its subscription
 * from Stripe and stores them, so the billing page is right even before the webhooks arrive. A session
 * that belongs to another user is ignored.
 */
export async function syncCheckoutSession(userId: string, sessionId: string, stripe: Stripe = getStripe()): Promise<boolean> {
  let session: Stripe.Checkout.Session;
  try {
    session = await stripe.checkout.sessions.retrieve(sessionId, { expand: ["subscription"] });
  } catch (err) {
    if ((err as { code?: string }).code === "resource_missing") return false;
    throw err;
  }
  if (session.client_reference_id !== userId || session.status !== "complete") return false;
  const sub = session.subscription;
  const customerId = idOf(session.customer);
  if (!sub || typeof sub === "string" || !customerId) return false;
  return getSequelize().transaction(async (t) => {
    await linkCustomer(t, userId, customerId);
    return (await applySubscription(t, sub, new Date(wholeSecondNow()))) === "applied";
  });
}
