import { randomUUID } from "node:crypto";
import { createServer, type IncomingMessage, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { vi } from "vitest";
import type { MailMessage } from "@/lib/mail";
import { createStripeClient } from "@/lib/payments/client";
import { startStandinServer, type StandinServer } from "@/scripts/stripe-standin/server";
import { signatureHeader } from "@/scripts/stripe-standin/webhooks";

/**
 * Payments tests: integration ones run against TEST_DATABASE_URL (scripts/test.sh makes a fresh, migrated
 * database; locally `bash scripts/pg.sh recreate-db spanlark_h_payments`, migrate it, export its URL).
 */
export const TEST_DB = process.env.TEST_DATABASE_URL;
if (TEST_DB) process.env.DATABASE_URL = TEST_DB;
process.env.NEXTAUTH_SECRET ??= "test-secret-for-vitest-only-0123456789";
process.env.APP_URL = "http://127.0.0.1:3100";
export const WEBHOOK_SECRET = "whsec_payments_tests_secret";
process.env.STRIPE_WEBHOOK_SECRET = WEBHOOK_SECRET;
process.env.STRIPE_SECRET_KEY = "sk_test_payments_tests";

export const outbox: MailMessage[] = [];
export const sendMailMock = vi.fn(async (message: MailMessage) => {
  outbox.push(message);
  return { messageId: `<${randomUUID()}@test>` };
});

export function uniqueEmail(tag: string): string {
  return `${tag}-${randomUUID().slice(0, 8)}@payments-tests.test`;
}

/** A client of the stand-in at `url`, as the app makes one (host, port and protocol options). */
export function stripeFor(url: string, key = "sk_test_payments_tests"): Stripe {
  const u = new URL(url);
  return createStripeClient({ secretKey: key, host: u.hostname, port: Number(u.port), protocol: "http" });
}

export interface Receiver {
  url: string;
  requests: Array<{ body: string; signature: string | undefined; status: number }>;
  close(): Promise<void>;
}

function readAll(req: IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

/**
 * A small HTTP server standing in for the app's address: it hands each request to `handle` (a route's
 * POST, or a check of its own) as a web Request and writes back the Response.
 */
export async function startReceiver(handle: (req: Request) => Promise<Response>): Promise<Receiver> {
  const requests: Receiver["requests"] = [];
  const server: Server = createServer((req, res) => {
    void readAll(req).then(async (body) => {
      const headers = new Headers();
      for (const [k, v] of Object.entries(req.headers)) if (typeof v === "string") headers.set(k, v);
      const response = await handle(new Request(`http://127.0.0.1${req.url ?? "/"}`, { method: req.method, headers, body }));
      const text = await response.text();
      requests.push({ body, signature: req.headers["stripe-signature"] as string | undefined, status: response.status });
      res.writeHead(response.status, { "content-type": response.headers.get("content-type") ?? "text/plain" });
      res.end(text);
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", () => resolve()));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/api/stripe/webhook`,
    requests,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

export async function startTestStandin(webhookUrl: string, secret = WEBHOOK_SECRET): Promise<StandinServer> {
  return startStandinServer({ port: 0, webhookUrl, webhookSecret: secret, settleTimeoutMs: 10_000 });
}

/** Pays a checkout session through the stand-in's pay endpoint, as the checkout page's form does. */
export async function pay(standinUrl: string, sessionId: string, card = "4242 4242 4242 4242"): Promise<{ status: number; body: Record<string, unknown> }> {
  const res = await fetch(`${standinUrl}/checkout/${sessionId}/pay`, {
    method: "POST",
    headers: { "content-type": "application/x-www-form-urlencoded", accept: "application/json" },
    body: new URLSearchParams({ number: card, expiry: "12/34", cvc: "123", name: "Test Builder" }).toString(),
  });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

/** A Stripe-signed webhook request, as Stripe (and the stand-in) sends it. */
export function signedRequest(payload: unknown, { secret = WEBHOOK_SECRET, signature }: { secret?: string; signature?: string | null } = {}): Request {
  const body = JSON.stringify(payload);
  const headers: Record<string, string> = { "content-type": "application/json" };
  const header = signature === undefined ? signatureHeader(body, secret, Math.floor(Date.now() / 1000)) : signature;
  if (header !== null) headers["stripe-signature"] = header;
  return new Request("http://127.0.0.1/api/stripe/webhook", { method: "POST", headers, body });
}

let counter = 0;
/** An id like Stripe's, unique within the run. */
export function fakeId(prefix: string): string {
  counter += 1;
  return `${prefix}_test${Date.now().toString(36)}${counter}${randomUUID().slice(0, 6)}`;
}

export interface SubscriptionShape {
  id: string;
  customer: string;
  status: string;
  cancelAtPeriodEnd?: boolean;
  periodStart: number;
  periodEnd: number;
  lookupKey?: string;
  metadata?: Record<string, string>;
  endedAt?: number | null;
}

/** A subscription object in Stripe's shape (current period on the item), with the fields the app reads. */
export function subscriptionObject(s: SubscriptionShape): Record<string, unknown> {
  return {
    id: s.id,
    object: "subscription",
    cancel_at_period_end: s.cancelAtPeriodEnd ?? false,
    canceled_at: s.cancelAtPeriodEnd || s.status === "canceled" ? s.periodStart + 60 : null,
    created: s.periodStart,
    currency: "usd",
    customer: s.customer,
    ended_at: s.endedAt ?? (s.status === "canceled" ? s.periodStart + 120 : null),
    items: {
      object: "list",
      data: [
        {
          id: fakeId("si"),
          object: "subscription_item",
          current_period_start: s.periodStart,
          current_period_end: s.periodEnd,
          price: {
            id: fakeId("price"),
            object: "price",
            currency: "usd",
            lookup_key: s.lookupKey ?? "spanlark_sheets_monthly",
            unit_amount: 1200,
            recurring: { interval: "month", interval_count: 1 },
            product: "prod_test",
          },
          quantity: 1,
        },
      ],
    },
    metadata: s.metadata ?? {},
    status: s.status,
  };
}

export function eventObject(type: string, object: Record<string, unknown>, created: number, id = fakeId("evt")): Record<string, unknown> {
  return {
    id,
    object: "event",
    api_version: "2026-10-28.endive",
    created,
    data: { object },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
  };
}

export function invoiceObject({
  customer,
  subscription,
  amount = 1200,
  paid = true,
  periodStart,
  periodEnd,
}: {
  customer: string;
  subscription: string;
  amount?: number;
  paid?: boolean;
  periodStart: number;
  periodEnd: number;
}): Record<string, unknown> {
  return {
    id: fakeId("in"),
    object: "invoice",
    amount_due: amount,
    amount_paid: paid ? amount : 0,
    created: periodStart,
    currency: "usd",
    customer,
    lines: { object: "list", data: [{ id: fakeId("il"), amount, currency: "usd", period: { start: periodStart, end: periodEnd }, quantity: 1 }] },
    number: `TEST-${counter}`,
    parent: { type: "subscription_details", quote_details: null, subscription_details: { subscription, metadata: {} } },
    status: paid ? "paid" : "open",
    status_transitions: { paid_at: paid ? periodStart : null },
  };
}
