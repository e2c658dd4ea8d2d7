// Two separate app processes on one database, as a deployment behind a load balancer runs them, tried from
// outside over HTTP: whatever one process does, the other knows at once, because nothing a request needs is kept
// only in a process's memory (sessions are signed cookies checked against the accounts table, rate limits and
// webhook event ids are rows, the material tables cache follows the published version by LISTEN/NOTIFY).
// Both processes have the one public address (APP_URL) a load balancer would give them.
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { mailApiUrl, waitForMail } from "./support/payments";
import { Client, extraPort, freshSeededDatabase, ownsTestCluster, startApp, until, type AppProcess, JOIST_REQUEST as joist } from "./support/instances";
import { signatureHeader } from "@/scripts/stripe-standin/webhooks";

const WEBHOOK_SECRET = `whsec_instances_${randomUUID().slice(0, 8)}`;
const ADMIN = { email: "admin@spanlark.test", password: "admin-demo-pass" }; // seeders/ demo account (invented)

let a: AppProcess;
let b: AppProcess;

type CheckAnswer = { tables: string; checks: Array<{ name: string; capacity: number }> };

async function checkAt(app: AppProcess): Promise<CheckAnswer> {
  const res = await fetch(`${app.url}/api/check`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(joist) });
  expect(res.status).toBe(200);
  return (await res.json()) as CheckAnswer;
}

const bendingCapacity = (answer: CheckAnswer) => answer.checks.find((c) => c.name === "bending")!.capacity;

async function mailsTo(address: string, subject: RegExp): Promise<number> {
  const mails = (await (await fetch(`${mailApiUrl()}/api/email`)).json()) as Array<{ subject: string; to: Array<{ address: string }> }>;
  return mails.filter((m) => subject.test(m.subject) && m.to.some((t) => t.address.toLowerCase() === address.toLowerCase())).length;
}

/** A loopback source address of this test's own (Linux routes all of 127.0.0.0/8 to the loopback interface). */
function ownLoopbackAddress(): string {
  const b = () => Math.floor(Math.random() * 250) + 2;
  return `127.${b()}.${b()}.${b()}`;
}

/** POSTs JSON from a chosen source address (node:http: fetch cannot choose one). */
async function postFrom(localAddress: string, url: string, body: unknown): Promise<number> {
  const { request } = await import("node:http");
  const target = new URL(url);
  return new Promise((resolve, reject) => {
    const req = request(
      { host: target.hostname, port: target.port, path: target.pathname, method: "POST", localAddress, headers: { "content-type": "application/json" } },
      (res) => {
        res.resume();
        res.on("end", () => resolve(res.statusCode ?? 0));
      },
    );
    req.on("error", reject);
    req.end(JSON.stringify(body));
  });
}

describe.skipIf(!ownsTestCluster())("two app processes on one database", () => {
  beforeAll(async () => {
    const databaseUrl = await freshSeededDatabase("spanlark_instances");
    const publicUrl = `http://127.0.0.1:${extraPort(0)}`; // the address a load balancer would give both
    const env = { DATABASE_URL: databaseUrl, APP_URL: publicUrl, NEXTAUTH_URL: publicUrl, STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET };
    [a, b] = await Promise.all([startApp(extraPort(0), env), startApp(extraPort(1), env)]);
  }, 180_000);

  afterAll(async () => {
    await Promise.all([a?.stop(), b?.stop()]);
  });

  test("tables published through A are used by B within seconds (B's cache follows the published version)", async () => {
    const before = await checkAt(b); // B now holds the current version in memory
    expect((await checkAt(a)).tables).toBe(before.tables);

    const admin = new Client({ origin: a.url });
    await admin.signIn(a.url, ADMIN.email, ADMIN.password);
    const table = (await (await admin.fetch(`${a.url}/api/admin/tables/sawn-values`)).json()) as {
      version: { id: string };
      rows: Array<{ key: string; values: Record<string, string> }>;
    };
    expect(table.version.id).toBe(before.tables);
    const row = table.rows.find((r) => r.values.species === "Hem-Fir" && r.values.grade === "No.2" && /dimension/i.test(r.values.size_class ?? ""));
    expect(row, "a Hem-Fir No.2 dimension lumber row in the seeded tables").toBeTruthy();
    const fb = Number(row!.values.Fb_psi);
    const edited = await admin.json(`${a.url}/api/admin/tables/sawn-values/rows`, "PUT", {
      originalKey: row!.key,
      baseVersionId: table.version.id,
      values: { ...row!.values, Fb_psi: String(Math.round(fb * 0.9)) },
      note: "Two-instance test: Fb lowered 10% to see the other process pick it up",
    });
    expect(edited.status).toBe(200);
    const published = ((await edited.json()) as { version: { id: string } }).version.id;
    expect(published).not.toBe(before.tables);

    const seen = await until(
      () => checkAt(b),
      (answer) => answer.tables === published,
      10_000,
    );
    expect(seen.value.tables).toBe(published);
    // The new value is what B sizes with: bending capacity scales with Fb (NDS 2018 §4.3: Fb' = Fb × factors).
    expect(bendingCapacity(seen.value) / bendingCapacity(before)).toBeCloseTo(Math.round(fb * 0.9) / fb, 3);
    console.info(`B used the version published through A after ${seen.ms} ms`);
  }, 60_000);

  test("rate limits are shared: tries through A count at B (password-reset requests, 20 per client address an hour)", async () => {
    const from = ownLoopbackAddress();
    const statuses: string[] = [];
    for (let i = 0; i < 20; i += 1) {
      const app = i % 2 === 0 ? a : b;
      statuses.push(`${app === a ? "A" : "B"}${await postFrom(from, `${app.url}/api/auth/password/forgot`, { email: `nobody-${i}@instances-e2e.test` })}`);
    }
    expect(statuses).toEqual(Array.from({ length: 20 }, (_, i) => `${i % 2 === 0 ? "A" : "B"}202`));
    expect(await postFrom(from, `${a.url}/api/auth/password/forgot`, { email: "one-more@instances-e2e.test" })).toBe(429);
    expect(await postFrom(from, `${b.url}/api/auth/password/forgot`, { email: "one-more@instances-e2e.test" })).toBe(429);
    // Another client address is not held back by that one.
    expect(await postFrom(ownLoopbackAddress(), `${b.url}/api/auth/password/forgot`, { email: "other@instances-e2e.test" })).toBe(202);
  }, 90_000);

  test("sessions are shared: signed up at A, confirmed at B, signed in at A works at B; signing out at A and a password reset at A end them at B", async () => {
    const email = `two-${randomUUID().slice(0, 8)}@instances-e2e.test`;
    const password = `Larkfield-${randomUUID().slice(0, 10)}`;
    const phone = new Client({ origin: a.url });
    expect((await phone.json(`${a.url}/api/auth/sign-up`, "POST", { email, password, name: "Robin Ashdown" })).status).toBe(202);
    const confirm = await waitForMail(email, /confirm/i);
    const token = /[?&]token=([A-Za-z0-9_-]+)/.exec(confirm.text)![1];
    expect((await phone.json(`${b.url}/api/auth/verify`, "POST", { token })).status).toBe(200);

    const user = await phone.signIn(a.url, email, password);
    expect(await phone.sessionUser(b.url)).toMatchObject({ id: user.id, email });
    const account = await phone.fetch(`${b.url}/account`);
    expect(account.status).toBe(200);
    expect(await account.text()).toContain("Robin Ashdown");

    // A second device signed in too (its own cookie), kept for after the reset.
    const laptop = new Client({ origin: a.url });
    await laptop.signIn(b.url, email, password);

    await phone.signOut(a.url);
    expect(await phone.sessionUser(b.url)).toBeNull();
    const signedOut = await phone.fetch(`${b.url}/account`);
    expect([303, 307]).toContain(signedOut.status);
    expect(signedOut.headers.get("location")).toMatch(/\/sign-in/);

    // A password reset through A ends every session signed in before it, the laptop's at B too.
    expect(await laptop.sessionUser(b.url)).toMatchObject({ email });
    expect((await phone.json(`${a.url}/api/auth/password/forgot`, "POST", { email })).status).toBe(202);
    const reset = await waitForMail(email, /new .*password/i);
    const resetToken = /[?&]token=([A-Za-z0-9_-]+)/.exec(reset.text)![1];
    await new Promise((r) => setTimeout(r, 1_100)); // the session's sign-in time and the change are whole milliseconds apart at least
    expect((await phone.json(`${a.url}/api/auth/password/reset`, "POST", { token: resetToken, password: `${password}-new` })).status).toBe(200);
    expect(await laptop.sessionUser(b.url)).toBeNull();
    const ended = await laptop.fetch(`${b.url}/account`);
    expect([303, 307]).toContain(ended.status);
  }, 90_000);

  test("a webhook delivered to both processes at once takes effect once (one receipt mail, one applied, one duplicate)", async () => {
    const email = `paid-${randomUUID().slice(0, 8)}@instances-e2e.test`;
    const password = `Larkfield-${randomUUID().slice(0, 10)}`;
    const client = new Client();
    expect((await client.json(`${a.url}/api/auth/sign-up`, "POST", { email, password, name: "Sasha Penrose" })).status).toBe(202);
    const token = /[?&]token=([A-Za-z0-9_-]+)/.exec((await waitForMail(email, /confirm/i)).text)![1];
    expect((await client.json(`${a.url}/api/auth/verify`, "POST", { token })).status).toBe(200);
    const { id: userId } = await client.signIn(a.url, email, password);

    const now = Math.floor(Date.now() / 1000);
    const customer = `cus_inst${randomUUID().slice(0, 10)}`;
    const subscription = `sub_inst${randomUUID().slice(0, 10)}`;
    const event = (type: string, object: Record<string, unknown>) => ({
      id: `evt_inst${randomUUID().replace(/-/g, "").slice(0, 16)}`,
      object: "event",
      api_version: "2026-10-28.endive",
      created: now,
      data: { object },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    });
    const deliver = (app: AppProcess, payload: unknown) => {
      const body = JSON.stringify(payload);
      return fetch(`${app.url}/api/stripe/webhook`, {
        method: "POST",
        headers: { "content-type": "application/json", "stripe-signature": signatureHeader(body, WEBHOOK_SECRET, Math.floor(Date.now() / 1000)) },
        body,
      });
    };

    const created = event("customer.subscription.created", {
      id: subscription,
      object: "subscription",
      cancel_at_period_end: false,
      canceled_at: null,
      created: now,
      currency: "usd",
      customer,
      ended_at: null,
      items: {
        object: "list",
        data: [
          {
            id: `si_inst${randomUUID().slice(0, 8)}`,
            object: "subscription_item",
            current_period_start: now,
            current_period_end: now + 30 * 86_400,
            price: { id: "price_inst", object: "price", currency: "usd", lookup_key: "spanlark_sheets_monthly", unit_amount: 1200, product: "prod_inst" },
            quantity: 1,
          },
        ],
      },
      metadata: { userId, plan: "monthly" },
      status: "active",
    });
    const paid = event("invoice.paid", {
      id: `in_inst${randomUUID().slice(0, 8)}`,
      object: "invoice",
      amount_due: 1200,
      amount_paid: 1200,
      created: now,
      currency: "usd",
      customer,
      lines: { object: "list", data: [{ id: "il_inst", amount: 1200, currency: "usd", period: { start: now, end: now + 30 * 86_400 }, quantity: 1 }] },
      number: `INST-${randomUUID().slice(0, 6)}`,
      parent: { type: "subscription_details", quote_details: null, subscription_details: { subscription, metadata: {} } },
      status: "paid",
      status_transitions: { paid_at: now },
    });

    // Both processes get each event at the same moment (a retry racing the first delivery, through two instances).
    for (const payload of [created, paid]) {
      const answers = await Promise.all([deliver(a, payload), deliver(b, payload)]);
      expect(answers.map((r) => r.status)).toEqual([200, 200]);
      const bodies = (await Promise.all(answers.map((r) => r.json()))) as Array<{ duplicate: boolean; outcome: string | null }>;
      expect(bodies.filter((x) => !x.duplicate)).toEqual([expect.objectContaining({ outcome: "applied" })]);
      expect(bodies.filter((x) => x.duplicate)).toHaveLength(1);
    }
    await waitForMail(email, /receipt/i);
    await new Promise((r) => setTimeout(r, 2_000)); // time for a second receipt, if one were coming
    expect(await mailsTo(email, /receipt/i)).toBe(1);
    // The subscription took: the account is a subscriber at both processes (the billing page says so).
    for (const app of [a, b]) {
      const billing = await client.fetch(`${app.url}/billing`);
      expect(billing.status).toBe(200);
      expect(await billing.text()).toMatch(/monthly/i);
    }
  }, 90_000);
});
