// Browser-test helpers for accounts and payments: open a fresh builder account through the app's own
// sign-up and e-mail confirmation, sign a browser context in, and subscribe it through the Stripe stand-in's
// checkout page. Other journeys (job sheets) reuse `signUpBuilder` and `subscribe`.
import { randomUUID } from "node:crypto";
import type { BrowserContext, Page } from "playwright-core";
import { baseUrl } from "./browser";

/** maildev's web API (scripts/test.sh starts it on 1080). */
export function mailApiUrl(): string {
  return (process.env.MAILDEV_URL ?? "http://127.0.0.1:1080").replace(/\/$/, "");
}

/** The Stripe stand-in (scripts/stripe-standin/), for its test controls. */
export function standinUrl(): string {
  return (process.env.STRIPE_STANDIN_URL ?? `http://127.0.0.1:${process.env.STRIPE_STANDIN_PORT ?? "12111"}`).replace(/\/$/, "");
}

export const TEST_CARDS = { pays: "4242 4242 4242 4242", declined: "4000 0000 0000 0002" } as const;

export interface TestAccount {
  email: string;
  password: string;
  name: string;
}

interface MaildevMail {
  subject: string;
  text: string;
  to: Array<{ address: string }>;
}

/** Waits for a mail to `to` whose subject matches, from maildev; fails after `timeoutMs`. */
export async function waitForMail(to: string, subject: RegExp, timeoutMs = 15_000): Promise<MaildevMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await fetch(`${mailApiUrl()}/api/email`);
    if (res.ok) {
      const mails = (await res.json()) as MaildevMail[];
      const found = mails.reverse().find((m) => m.to.some((t) => t.address.toLowerCase() === to.toLowerCase()) && subject.test(m.subject));
      if (found) return found;
    }
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** Signs the context in through next-auth's credentials endpoint (its cookies then go with every page). */
export async function signIn(context: BrowserContext, account: Pick<TestAccount, "email" | "password">): Promise<void> {
  const csrf = await context.request.get(`${baseUrl()}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  await context.request.post(`${baseUrl()}/api/auth/callback/credentials`, {
    form: { csrfToken, email: account.email, password: account.password, callbackUrl: `${baseUrl()}/`, json: "true" },
  });
  const session = (await (await context.request.get(`${baseUrl()}/api/auth/session`)).json()) as { user?: { email?: string } };
  if (session.user?.email?.toLowerCase() !== account.email.toLowerCase()) throw new Error(`sign-in as ${account.email} did not take`);
}

/** A new builder account (free), confirmed through the mailed link and signed in on `context`. */
export async function signUpBuilder(context: BrowserContext, tag = "builder"): Promise<TestAccount> {
  const account: TestAccount = {
    email: `${tag}-${randomUUID().slice(0, 8)}@e2e-payments.test`,
    password: `Larkfield-${randomUUID().slice(0, 12)}`,
    name: "Robin Ashdown",
  };
  const signUp = await context.request.post(`${baseUrl()}/api/auth/sign-up`, {
    data: { email: account.email, password: account.password, name: account.name, company: "Ashdown Decks" },
  });
  if (signUp.status() !== 202) throw new Error(`sign-up answered ${signUp.status()}: ${await signUp.text()}`);
  const mail = await waitForMail(account.email, /confirm/i);
  const token = /[?&]token=([A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
  if (!token) throw new Error("the confirmation mail has no link with a token");
  const verify = await context.request.post(`${baseUrl()}/api/auth/verify`, { data: { token } });
  if (!verify.ok()) throw new Error(`verify answered ${verify.status()}`);
  await signIn(context, account);
  return account;
}

/** Fills the stand-in's checkout form with a card and presses Pay. */
export async function payWithCard(page: Page, card: string): Promise<void> {
  await page.getByLabel("Card number").fill(card);
  await page.getByLabel("Expiry (MM/YY)").fill("12/34");
  await page.getByLabel("Security code").fill("123");
  await page.getByLabel("Name on card").fill("Robin Ashdown");
  await page.getByRole("button", { name: /^Pay / }).click();
}

/**
 * Subscribes the signed-in page's account: Plans → "Subscribe monthly|yearly" → the stand-in's checkout
 * page → the success card → back on Billing with the subscriber role shown.
 */
export async function subscribe(page: Page, plan: "monthly" | "yearly" = "monthly"): Promise<void> {
  await page.goto(`${baseUrl()}/pricing`);
  await Promise.all([
    page.waitForURL((url) => url.href.startsWith(`${standinUrl()}/checkout/`), { timeout: 30_000 }),
    page.getByRole("button", { name: `Subscribe ${plan}` }).click(),
  ]);
  await Promise.all([page.waitForURL(/\/billing\?checkout=success/, { timeout: 30_000 }), payWithCard(page, TEST_CARDS.pays)]);
  await page.locator('[data-testid="billing-role"][data-role="subscriber"]').waitFor({ timeout: 15_000 });
}

/**
 * Ends the current period of one subscription on the stand-in (a canceled one then ends, another renews)
 * and waits until its webhooks are delivered.
 */
export async function endBillingPeriod(subscriptionId: string): Promise<string[]> {
  const res = await fetch(`${standinUrl()}/_control/advance`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ subscription: subscriptionId }),
  });
  if (!res.ok) throw new Error(`advance answered ${res.status}: ${await res.text()}`);
  return ((await res.json()) as { events: string[] }).events;
}
