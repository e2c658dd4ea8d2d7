// Accounts end to end (issue 5), in Chromium at phone size: sign up, read the confirmation mail from the
// mail sink, confirm, sign in, sign out, reset the password through the mailed link, sign in with the new
// one. Then the screens a builder meets, at 390x844 and 1280x800, with no console errors.
import { randomUUID } from "node:crypto";
import type { Page } from "playwright-core";
import { describe, expect, test } from "vitest";
import { baseUrl, setupBrowser } from "./support/browser";

const session = setupBrowser();
const MAIL_API = (process.env.MAILDEV_URL ?? "http://127.0.0.1:1080").replace(/\/$/, "");

type SinkMail = { id: string; subject: string; text: string; to: Array<{ address: string }>; time: string };

/** Waits for the newest mail to `address` whose subject matches, from maildev's REST API. */
async function waitForMail(address: string, subject: RegExp, after: number, timeoutMs = 20_000): Promise<SinkMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const res = await fetch(`${MAIL_API}/api/email`);
    const mails = (await res.json()) as SinkMail[];
    const found = mails.filter((m) => m.to.some((t) => t.address === address) && subject.test(m.subject) && Date.parse(m.time) >= after - 2000).at(-1);
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 300));
  }
  throw new Error(`no mail "${subject}" for ${address} within ${timeoutMs} ms`);
}

/** The app link in a mail, moved onto the base URL under test (the path and token are what matter). */
function linkIn(mail: SinkMail, pathname: string): string {
  const match = new RegExp(`https?://[^\\s]+${pathname}\\?token=[A-Za-z0-9_-]+`).exec(mail.text);
  if (!match) throw new Error(`no ${pathname} link in "${mail.subject}"`);
  const url = new URL(match[0]);
  return `${baseUrl()}${url.pathname}${url.search}`;
}

async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

describe("account journey", () => {
  test("sign up, confirm by mail, sign out, reset the password by mail, sign in with the new one", async () => {
    const email = `e2e-${randomUUID().slice(0, 8)}@larkfield-builders.test`;
    const firstPassword = "marsh lane joists";
    const newPassword = "orchard row ledger";
    const started = Date.now();
    const { page, consoleErrors, goto, screenshot } = await session.open("/sign-up", {
      allowConsole: [/401/, /Failed to load resource/],
    });

    // Errors beside the fields before anything is sent.
    await page.getByRole("button", { name: "Open my account" }).click();
    expect(await page.getByText("Enter your name", { exact: false }).count()).toBeGreaterThan(0);

    await page.getByLabel("Your name").fill("Wren Tallis");
    await page.getByLabel("Company").fill("Tallis Decks");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(firstPassword);
    await page.getByRole("button", { name: "Open my account" }).click();
    await page.getByTestId("sign-up-sent").waitFor();
    await screenshot("auth-sign-up-sent-phone");

    // Not confirmed yet: the right password is answered with a pointer to the mail (and no session).
    await goto("/sign-in");
    await signIn(page, email, firstPassword);
    await page.getByText("Confirm your e-mail first").waitFor();
    expect(await page.getByRole("button", { name: "Send the link again" }).isVisible()).toBe(true);

    const confirmMail = await waitForMail(email, /Confirm your e-mail/, started);
    await goto(linkIn(confirmMail, "/verify"));
    await page.getByRole("button", { name: "Confirm my e-mail" }).click();
    // Confirmed and signed in at once: no password to type again
    await page.getByTestId("verify-done").waitFor();
    expect(await page.getByTestId("verify-done").textContent()).toContain("you are signed in");
    await screenshot("auth-verified-signed-in-phone");
    await goto("/account");
    await page.waitForURL(/\/account$/);
    expect(await page.getByTestId("account-email").textContent()).toBe(email);
    expect(await page.getByTestId("account-role").textContent()).toMatch(/Builder/);

    await page.getByRole("main").getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL((url) => url.pathname === "/");
    await goto("/account");
    await page.waitForURL(/\/sign-in\?callbackUrl=%2Faccount/);

    const resetStarted = Date.now();
    await goto("/forgot-password");
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("button", { name: "Send me a link" }).click();
    await page.getByTestId("forgot-sent").waitFor();

    const resetMail = await waitForMail(email, /new Spanlark password/, resetStarted);
    const resetLink = linkIn(resetMail, "/reset-password");
    await goto(resetLink);
    await page.getByLabel("New password", { exact: true }).fill(newPassword);
    await page.getByLabel("New password again").fill(newPassword);
    await page.getByRole("button", { name: "Save the new password" }).click();
    await page.getByTestId("reset-done").waitFor();
    // Password changed and signed in with it; signed out again for the checks below
    expect(await page.getByTestId("reset-done").textContent()).toContain("You are signed in.");
    await goto("/account");
    expect(await page.getByTestId("account-email").textContent()).toBe(email);
    await page.getByRole("main").getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL((url) => url.pathname === "/");

    // The link worked once.
    await goto(resetLink);
    await page.getByLabel("New password", { exact: true }).fill("yet another password");
    await page.getByLabel("New password again").fill("yet another password");
    await page.getByRole("button", { name: "Save the new password" }).click();
    await page.getByText(/expired or was already used/i).waitFor();

    await goto("/sign-in?from=reset");
    await signIn(page, email, firstPassword);
    await page.getByText("That e-mail and password do not match an account").waitFor();
    await signIn(page, email, newPassword);
    await page.waitForURL(/\/account$/);
    expect(await page.getByTestId("account-email").textContent()).toBe(email);

    expect(consoleErrors).toEqual([]);
  });

  test("a builder is turned away from the admin area; the demo admin sees the accounts", async () => {
    const { page, goto } = await session.open("/sign-in?callbackUrl=%2Fadmin%2Fusers");
    await signIn(page, "dee@hollisrowe.test", "builder-demo-pass");
    await page.waitForURL(/\/admin\/users$/);
    await page.getByTestId("not-allowed").waitFor();
    // The page says so, and the status says so too: 403 on every admin page for a builder's session.
    for (const path of ["/admin", "/admin/users", "/admin/tables", "/admin/tables/history"]) {
      expect((await page.request.get(path, { maxRedirects: 0 })).status(), path).toBe(403);
    }

    const admin = await session.open("/sign-in?callbackUrl=%2Fadmin%2Fusers");
    await signIn(admin.page, "admin@spanlark.test", "admin-demo-pass");
    await admin.page.waitForURL(/\/admin\/users$/);
    await admin.page.getByTestId("user-list").waitFor();
    expect((await admin.page.request.get("/admin/users", { maxRedirects: 0 })).status()).toBe(200);
    await admin.goto("/admin/users?q=hollisrowe");
    expect(await admin.page.getByTestId("user-list").getByRole("listitem").count()).toBe(2);
    await goto("/account");
    expect(await page.getByTestId("account-role").textContent()).toMatch(/Builder/);
  });
});

describe("screens at phone and desktop size", () => {
  test.each([
    { viewport: "phone" as const, tag: "phone" },
    { viewport: "desktop" as const, tag: "desktop" },
  ])("sign-in, sign-up, forgot password, account and accounts list at $tag size", async ({ viewport, tag }) => {
    const visitor = await session.open("/sign-in", { viewport });
    await visitor.screenshot(`auth-sign-in-${tag}`);
    await visitor.goto("/sign-up");
    await visitor.screenshot(`auth-sign-up-${tag}`);
    await visitor.goto("/forgot-password");
    await visitor.screenshot(`auth-forgot-${tag}`);
    await visitor.goto("/reset-password?token=");
    await visitor.screenshot(`auth-reset-bad-link-${tag}`);
    expect(visitor.consoleErrors).toEqual([]);

    const admin = await session.open("/sign-in", { viewport });
    await signIn(admin.page, "admin@spanlark.test", "admin-demo-pass");
    await admin.page.waitForURL(/\/account$/);
    await admin.screenshot(`auth-account-${tag}`);
    await admin.goto("/admin");
    await admin.screenshot(`auth-admin-home-${tag}`);
    await admin.goto("/admin/users");
    await admin.screenshot(`auth-admin-users-${tag}`);
    await admin.page
      .getByRole("button", { name: /Make admin|Remove admin/ })
      .first()
      .click();
    await admin.page.getByRole("dialog").waitFor();
    await admin.screenshot(`auth-admin-confirm-${tag}`, { fullPage: false });
    await admin.page.getByRole("button", { name: "Keep as it is" }).click();
    // The tables pages belong to another part; a build without them answers their prefetch with a 404.
    expect(admin.consoleErrors.filter((e) => !e.includes("/admin/tables?_rsc="))).toEqual([]);
  });
});
