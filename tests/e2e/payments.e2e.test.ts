// Subscriptions end to end in Chromium, through the app, the Stripe stand-in's checkout page and portal,
// and the signed webhooks between them (issue 8), and what they pay for: a new builder is told job sheets
// need a subscription, subscribes, sizes a member, saves a job sheet and downloads its PDF.
import { describe, expect, test } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdir, readFile } from "node:fs/promises";
import path from "node:path";
import type { Page } from "playwright-core";
import { ARTIFACTS_DIR, setupBrowser, type OpenedPage } from "./support/browser";
import { sizeAndSaveMember } from "./support/flow";
import { endBillingPeriod, payWithCard, signUpBuilder, standinUrl, subscribe, TEST_CARDS, waitForMail } from "./support/payments";
import { hasPdftotext, isPdf, pdfStreamText } from "../sheets/pdf-text";

const session = setupBrowser();

/**
 * A full-page screenshot that leaves the text caret alone: Playwright hides it with an inline style, which
 * React reports as a hydration mismatch when the shot lands before the page has hydrated.
 */
async function shoot(page: Page, name: string, fullPage = true): Promise<void> {
  await mkdir(ARTIFACTS_DIR, { recursive: true });
  await page.screenshot({ path: path.join(ARTIFACTS_DIR, `${name}.png`), fullPage, caret: "initial" });
}

// Windows-1252's characters at 0x80-0x9F, where Latin-1 has control codes (Windows-1252 code page, as published by Microsoft)
const WIN_ANSI_80_9F =
  "\u20ac\u0081\u201a\u0192\u201e\u2026\u2020\u2021\u02c6\u2030\u0160\u2039\u0152\u008d\u017d\u008f\u0090\u2018\u2019\u201c\u201d\u2022\u2013\u2014\u02dc\u2122\u0161\u203a\u0153\u009d\u017e\u0178";

/**
 * pdfkit writes the standard fonts' text in WinAnsi (Windows-1252), which the stream reader gives back byte
 * for byte as Latin-1: an answer line's dash is byte 0x97. This turns those bytes into the characters drawn.
 */
function fromWinAnsi(latin1: string): string {
  return latin1.replace(/[\u0080-\u009f]/g, (c) => WIN_ANSI_80_9F[c.charCodeAt(0) - 0x80]);
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

    await Promise.all([page.waitForURL(/\/pricing\?checkout=canceled/), page.getByRole("link", { name: "Cancel and return" }).click()]);
    expect(await page.getByText("Checkout canceled. Nothing was charged.").isVisible()).toBe(true);

    await goto("/billing");
    expect(await roleShown(opened)).toBe("builder");
    expect(await page.getByTestId("billing-plan").count()).toBe(0);
    expect(consoleErrors).toEqual([]);
  });

  test("canceling in the portal keeps the paid features until the period ends, then the account is free again", async () => {
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
    await shoot(page, "payments-portal-canceled-desktop");

    await Promise.all([page.waitForURL(/\/billing$/), page.getByRole("link", { name: "Return to the site" }).click()]);
    expect(await roleShown(opened)).toBe("subscriber");
    expect(await page.getByTestId("billing-status").textContent()).toMatch(/^Canceled\. You keep every paid feature until [A-Z][a-z]+ \d{1,2}, \d{4}/);
    await shoot(page, "payments-billing-canceling-desktop");

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

  test("a free builder is told sheets need a subscription, subscribes with the success card, then saves and downloads a sheet", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const { page, context, goto, consoleErrors } = opened;
    // the browser asks for /favicon.ico on its own; the app's icon is app/icon.svg
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await signUpBuilder(context, "sheet");

    // Free: a job of their own, whose sheet section says what saving a sheet needs, with no save button
    await goto("/jobs/new");
    await page.getByLabel("Job name").fill("Kestrel Way deck");
    await page.getByLabel("Site address").fill("22 Kestrel Way, Larkfield");
    await Promise.all([page.waitForURL(/\/jobs\/[0-9a-f-]{36}$/, { timeout: 30_000 }), page.getByRole("button", { name: "Make the job" }).click()]);
    await page.getByRole("heading", { level: 1, name: "Kestrel Way deck" }).waitFor();
    const locked = page.getByTestId("sheet-locked");
    await locked.waitFor();
    expect(await locked.textContent()).toContain("Saving job sheets needs a subscription.");
    expect(await page.getByTestId("sheet-save").count()).toBe(0);
    await locked.scrollIntoViewIfNeeded();
    await shoot(page, "payments-sheet-1-free-locked", false);

    // The plans (the way back to a job with its sheet saved is tests/e2e/order-subscribe.e2e.test.ts); the success card pays
    await goto("/pricing");
    await Promise.all([
      page.waitForURL((url) => url.href.startsWith(`${standinUrl()}/checkout/`), { timeout: 30_000 }),
      page.getByRole("button", { name: "Subscribe monthly" }).click(),
    ]);
    await Promise.all([page.waitForURL(/\/billing\?checkout=success/, { timeout: 30_000 }), payWithCard(page, TEST_CARDS.pays)]);
    expect(await roleShown(opened)).toBe("subscriber");
    await shoot(page, "payments-sheet-2-subscribed");

    // A deck joist sized through the flow at 390x844 and saved to a new job
    const member = {
      kind: "deck-joist",
      span: "11' 6\"",
      label: "DJ1 deck joists",
      newJob: { name: "Ashdown back deck", siteAddress: "9 Fenwick Close, Larkfield" },
    } as const;
    const headline = await sizeAndSaveMember(page, member, (step) => shoot(page, `payments-sheet-3-flow-${step}`, false));
    expect(headline).toMatch(/^2x\d+ .* at \d+ in o\.c\./);

    // The new job's page: the member with its answer, and now a button to save a sheet
    await goto("/jobs");
    await page
      .getByRole("link", { name: new RegExp(member.newJob.name) })
      .first()
      .click();
    await page.getByRole("heading", { level: 1, name: member.newJob.name }).waitFor();
    expect(await page.getByText(member.label).count()).toBeGreaterThan(0);
    expect(await page.getByText(headline).count()).toBeGreaterThan(0);
    expect(await page.getByTestId("sheet-locked").count()).toBe(0);
    await page.getByTestId("sheet-save").scrollIntoViewIfNeeded();
    await shoot(page, "payments-sheet-4-job-paid", false);
    await Promise.all([page.waitForURL(/\/sheets\/[0-9a-f-]{36}$/, { timeout: 30_000 }), page.getByTestId("sheet-save").click()]);

    // The sheet: one member, its answer line, the caution
    await page.getByRole("heading", { level: 1, name: member.newJob.name }).waitFor();
    const sheetMembers = page.getByTestId("sheet-member");
    expect(await sheetMembers.count()).toBe(1);
    expect(await sheetMembers.first().textContent()).toContain(headline);
    await shoot(page, "payments-sheet-5-sheet", false);
    await shoot(page, "payments-sheet-5-sheet-full");

    // The PDF: a whole file with the member's name, its answer line, the caution and the builder's company
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("sheet-pdf-letter").click()]);
    expect(download.suggestedFilename()).toMatch(/^Ashdown-back-deck-.*\.pdf$/);
    const file = path.join(ARTIFACTS_DIR, "payments-sheet-6.pdf");
    await download.saveAs(file);
    const pdf = await readFile(file);
    expect(pdf.subarray(0, 4).toString("latin1")).toBe("%PDF");
    expect(isPdf(pdf)).toBe(true);
    const text = fromWinAnsi(pdfStreamText(pdf));
    expect(text).toContain(member.label);
    expect(text).toContain(headline);
    expect(text).toContain(member.span);
    expect(text).toContain("Check before you build");
    expect(text).toContain("Ashdown Decks");
    if (hasPdftotext()) execFileSync("pdftoppm", ["-r", "70", "-png", "-f", "1", "-l", "2", file, path.join(ARTIFACTS_DIR, "payments-sheet-6-pdf")]);
    expect(consoleErrors).toEqual([]);
  }, 180_000);
});
