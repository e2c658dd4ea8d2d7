// Subscriptions end to end in Chromium, through the app, the Stripe stand-in's checkout page and portal,
// and the signed webhooks between them (issue 8). The job-sheet part is added with the sheets journey.
import { describe, expect, test } from "vitest";
import { mkdir } from "node:fs/promises";
import path from "node:path";
import type { Page } from "playwright-core";
import { ARTIFACTS_DIR, setupBrowser, type OpenedPage } from "./support/browser";
import { endBillingPeriod, payWithCard, signUpBuilder, standinUrl, subscribe, TEST_CARDS, waitForMail } from "./support/payments";

const session = setupBrowser();

/**
 * A full-page screenshot that leaves the text caret alone: Playwright hides it with an inline style, which
 * React reports as a hydration mismatch when the shot lands before the page has hydrated.
 */
async function shoot(page: Page, name: string): Promise<void> {
  await mkdir(ARTIFACTS_DIR, { recursive: true });
  await page.screenshot({ path: path.join(ARTIFACTS_DIR, `${name}.png`), fullPage: true, caret: "initial" });
}

async function roleShown(opened: OpenedPage): Promise<string | null> {
  return opened.page.getByTestId("billing-role").getAttribute("data-role");
}

describe("subscriptions", () => {
  test("a free builder subscribes with the success card; the role shows on the billing page and a receipt is mailed", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const { page, context, goto, consoleErrors } = opened;
    const account = await signUpBuilder(context, "subscribes");

    await goto("/billing");
    expect(await roleShown(opened)).toBe("builder");
    expect(await page.getByTestId("billing-role").textContent()).toContain("Free account");
    await shoot(page, "payments-billing-free-phone");

    await goto("/pricing");
    expect(await page.getByRole("heading", { level: 1, name: "Plans" }).isVisible()).toBe(true);
    expect(await page.getByText("Keep up to 3 saved jobs").isVisible()).toBe(true);
    await shoot(page, "payments-pricing-phone");

    await Promise.all([
      page.waitForURL((url) => url.href.startsWith(`${standinUrl()}/checkout/`)),
      page.getByRole("button", { name: "Subscribe monthly" }).click(),
    ]);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toContain("$12.00");
    await shoot(page, "payments-checkout-phone");

    await Promise.all([page.waitForURL(/\/billing\?checkout=success/), payWithCard(page, TEST_CARDS.pays)]);
    expect(await roleShown(opened)).toBe("subscriber");
    expect(await page.getByTestId("checkout-result").textContent()).toContain("Your subscription is active");
    expect(await page.getByTestId("billing-plan").textContent()).toContain("Monthly");
    expect(await page.getByTestId("billing-status").textContent()).toMatch(/^Active\. Renews on [A-Z][a-z]+ \d{1,2}, \d{4}\.$/);
    await shoot(page, "payments-billing-subscribed-phone");

    const receipt = await waitForMail(account.email, /receipt/i);
    expect(receipt.text).toContain("$12.00");

    await goto("/pricing");
    expect(await page.getByText("Your account already has every paid feature.").isVisible()).toBe(true);
    expect(await page.getByRole("button", { name: "Subscribe monthly" }).count()).toBe(0);
    expect(consoleErrors).toEqual([]);
  });

  test("a declined card shows the decline, lets the builder try again, and leaves the account free", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const { page, context, goto, consoleErrors } = opened;
    await signUpBuilder(context, "declined");

    await goto("/pricing");
    await Promise.all([
      page.waitForURL((url) => url.href.startsWith(`${standinUrl()}/checkout/`)),
      page.getByRole("button", { name: "Subscribe yearly" }).click(),
    ]);
    const checkoutUrl = page.url();
    await payWithCard(page, TEST_CARDS.declined);
    const alert = page.getByRole("alert");
    await alert.waitFor();
    expect(await alert.textContent()).toContain("Your card was declined.");
    expect(page.url().startsWith(checkoutUrl)).toBe(true);
    expect(await page.getByLabel("Card number").inputValue()).toBe(TEST_CARDS.declined);
    await shoot(page, "payments-checkout-declined-phone");

    await Promise.all([page.waitForURL(/\/pricing\?checkout=cancelled/), page.getByRole("link", { name: "Cancel and return" }).click()]);
    expect(await page.getByText("Checkout cancelled. Nothing was charged.").isVisible()).toBe(true);

    await goto("/billing");
    expect(await roleShown(opened)).toBe("builder");
    expect(await page.getByTestId("billing-plan").count()).toBe(0);
    expect(consoleErrors).toEqual([]);
  });

  test("cancelling in the portal keeps the paid features until the period ends, then the account is free again", async () => {
    const opened = await session.open(null, { viewport: "desktop" });
    const { page, context, goto, consoleErrors } = opened;
    await signUpBuilder(context, "cancels");
    await subscribe(page, "yearly");
    expect(await page.getByTestId("billing-plan").textContent()).toContain("Yearly");
    await shoot(page, "payments-billing-subscribed-desktop");

    await Promise.all([
      page.waitForURL((url) => url.href.startsWith(`${standinUrl()}/portal/`)),
      page.getByRole("button", { name: "Manage subscription" }).click(),
    ]);
    const subscriptionId = await page.locator("[data-subscription]").first().getAttribute("data-subscription");
    expect(subscriptionId).toMatch(/^sub_/);
    await page.getByRole("button", { name: "Cancel at end of period" }).click();
    await page.getByRole("status").waitFor();
    expect(await page.getByRole("status").textContent()).toContain("end at the close of the current period");
    await shoot(page, "payments-portal-cancelled-desktop");

    await Promise.all([page.waitForURL(/\/billing$/), page.getByRole("link", { name: "Return to the site" }).click()]);
    expect(await roleShown(opened)).toBe("subscriber");
    expect(await page.getByTestId("billing-status").textContent()).toMatch(/^Cancelled\. You keep every paid feature until [A-Z][a-z]+ \d{1,2}, \d{4}/);
    await shoot(page, "payments-billing-cancelling-desktop");

    expect(await endBillingPeriod(subscriptionId ?? "")).toEqual(["customer.subscription.deleted"]);
    await goto("/billing");
    expect(await roleShown(opened)).toBe("builder");
    expect(await page.getByTestId("billing-status").textContent()).toMatch(/^Ended on /);
    expect(await page.getByRole("link", { name: "See plans" }).isVisible()).toBe(true);
    await shoot(page, "payments-billing-ended-desktop");

    await goto("/pricing");
    await shoot(page, "payments-pricing-desktop");
    expect(consoleErrors).toEqual([]);
  });
});
