// On the job, in Chromium at 390x844 and at desktop size: the demo subscriber's deck job gives an order list
// (checked by hand against the job's members), which follows a changed width, downloads as CSV and PDF and is
// e-mailed to a yard (read back from the mail sink); a crew link shows as a QR code on the job page that
// decodes back to the link, goes out as a text message, and prints as a one-page crew PDF whose QR code
// decodes too; the crew page has none of the signed-in tabs. A free builder presses "Save job sheet", pays
// on the stand-in's checkout and lands back on the job with the sheet saved; signing in returns to the page
// that asked. Screenshots, PDFs and their PNGs go to tests/artifacts/.
import { execFileSync } from "node:child_process";
import { readFile } from "node:fs/promises";
import path from "node:path";
import { randomUUID } from "node:crypto";
import jsQR from "jsqr";
import Papa from "papaparse";
import { PNG } from "pngjs";
import { describe, expect, test } from "vitest";
import { joistCount, concreteToOrder, footingCubicYards } from "@/lib/orders/rules";
import { ARTIFACTS_DIR, baseUrl, setupBrowser } from "./support/browser";
import { sizeAndSaveMember } from "./support/flow";
import { payWithCard, signIn, signUpBuilder, standinUrl, TEST_CARDS, waitForMail } from "./support/payments";
import { hasPdftotext, isPdf } from "../sheets/pdf-text";

const session = setupBrowser();

// the demo subscriber and the deck job seeded for them (seeders/20261201120010-demo-jobs.ts): DB1 on two 4 ft
// posts over 12 in x 36 in footings, DJ1 deck joists at 16 in across a 12 ft width
const SAM = { email: "sam@hollisrowe.test", password: "subscriber-demo-pass" };
const DECK = "Orchard Row deck";

function decodeQr(png: Buffer): string | null {
  const image = PNG.sync.read(png);
  return jsQR(new Uint8ClampedArray(image.data.buffer, image.data.byteOffset, image.data.length), image.width, image.height)?.data ?? null;
}

async function openDeck(viewport: "phone" | "desktop" = "phone") {
  const opened = await session.open(null, { viewport });
  await signIn(opened.context, SAM);
  await opened.goto("/jobs");
  await opened.page
    .getByRole("link", { name: new RegExp(DECK) })
    .first()
    .click();
  await opened.page.getByRole("heading", { level: 1, name: DECK }).waitFor();
  return opened;
}

function lineOf(rows: string[][], item: string, length: string): string[] | undefined {
  return rows.find((r) => r[1] === item && r[2] === length);
}

describe("order list", () => {
  test("counted from the deck's members, follows a changed width, downloads as CSV and PDF and is e-mailed to the yard", async () => {
    const owner = await openDeck("phone");
    const { page } = owner;
    const jobUrl = page.url();
    await page.getByTestId("open-order").click();
    await page.getByRole("heading", { level: 1, name: `Order list: ${DECK}` }).waitFor();
    await owner.screenshot("order-1-list-phone", { fullPage: false });
    await owner.screenshot("order-1-list-phone-full");

    // CSV: read back with a CSV parser; the lines a yard needs, counted by hand
    const csvRes = await owner.context.request.get(`${baseUrl()}${new URL(page.url()).pathname.replace(/^\/jobs\//, "/api/jobs/")}?format=csv`);
    expect(csvRes.status()).toBe(200);
    expect(csvRes.headers()["content-type"]).toMatch(/^text\/csv/);
    const rows = Papa.parse<string[]>((await csvRes.text()).trim()).data;
    expect(rows[0].slice(0, 5)).toEqual(["group", "item", "length_ft", "quantity", "unit"]);
    // DJ1: 12 ft at 16 in → 144 / 16 = 9 spaces + 1 = 10 joists, 11 ft + 1.5 ft overhang + 1-1/2 in bearing = 12.625 ft → 14 ft
    expect(lineOf(rows, "2x10", "14")?.[3] ?? lineOf(rows, "2x8", "14")?.[3]).toBe(String(joistCount(12, 16)));
    // DB1: a 6x6 post at each of its two supports, 4 ft → the shortest stock length, 8 ft
    expect(lineOf(rows, "6x6 post", "8")?.[3]).toBe("2");
    // two 12 in x 36 in footings: 2 × π × 6² × 36 / 46,656 yd³ + 10 % → 0.20
    expect(rows.find((r) => r[1] === "Footing concrete")?.[3]).toBe(String(concreteToOrder(2 * footingCubicYards(12, 36))));
    // an unpriced line says so
    expect(rows.find((r) => r[1] === "Footing concrete")?.[8]).toMatch(/no price in the cost table/);

    // the list follows the job: DJ1's width 12 → 16 ft on the job page gives 13 joists
    await page.goto(jobUrl, { waitUntil: "load" });
    const dj1 = page.getByRole("listitem").filter({ has: page.getByRole("heading", { name: "DJ1 deck joists" }) });
    await dj1.getByText("For the order list").click();
    const width = dj1.getByLabel(/Deck width/);
    expect(await width.inputValue()).toBe("12");
    await width.fill("16'");
    await dj1.getByRole("button", { name: "Save" }).click();
    await dj1.getByText("Saved").waitFor();
    await dj1.scrollIntoViewIfNeeded();
    await owner.screenshot("order-2-member-details-phone", { fullPage: false });
    await page.getByTestId("open-order").click();
    await page.getByRole("heading", { level: 1, name: `Order list: ${DECK}` }).waitFor();
    const joists = page.getByTestId("order-line").filter({ hasText: "10 joists" });
    expect(await joists.count()).toBe(0);
    expect(
      await page
        .getByTestId("order-line")
        .filter({ hasText: `${joistCount(16, 16)} joists` })
        .count(),
    ).toBe(1);
    // and back to the seeded 12 ft so other runs start from the same job
    await page.goto(jobUrl, { waitUntil: "load" });
    await dj1.getByText("For the order list").click();
    await dj1.getByLabel(/Deck width/).fill("12");
    await dj1.getByRole("button", { name: "Save" }).click();
    await dj1.getByText("Saved").waitFor();
    await page.getByTestId("open-order").click();
    await page.getByRole("heading", { level: 1, name: `Order list: ${DECK}` }).waitFor();

    // PDF: a whole file, and its pages as PNG to look at
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("order-pdf").click()]);
    expect(download.suggestedFilename()).toBe("Orchard-Row-deck-order.pdf");
    const pdfFile = path.join(ARTIFACTS_DIR, "order-3.pdf");
    await download.saveAs(pdfFile);
    expect(isPdf(await readFile(pdfFile))).toBe(true);
    if (hasPdftotext()) {
      execFileSync("pdftoppm", ["-r", "70", "-png", "-f", "1", "-l", "2", pdfFile, path.join(ARTIFACTS_DIR, "order-3-pdf")]);
      const text = execFileSync("pdftotext", ["-layout", pdfFile, "-"]).toString("utf8");
      expect(text).toMatch(/Footing concrete/);
      expect(text).toMatch(/Check before you build/);
    }

    // e-mailed to an address the builder types, through the mail sink
    const yard = `orders-${randomUUID().slice(0, 8)}@larkfield-yard.test`;
    await page.getByTestId("order-mail-to").fill(yard);
    await page.getByLabel("Note (optional)").fill("Deliver Tuesday morning.");
    await page.getByTestId("order-mail-send").click();
    await page.getByText(`Order list sent to ${yard}.`).waitFor({ timeout: 20_000 });
    const mail = await waitForMail(yard, /Lumber order: Orchard Row deck/);
    expect(mail.text).toContain("Deliver Tuesday morning.");
    expect(mail.text).toMatch(/6x6 post/);
    await owner.screenshot("order-4-sent-phone", { fullPage: false });
    expect(owner.consoleErrors).toEqual([]);

    const desk = await openDeck("desktop");
    await desk.page.getByTestId("open-order").click();
    await desk.page.getByRole("heading", { level: 1, name: `Order list: ${DECK}` }).waitFor();
    await desk.screenshot("order-5-list-desktop");
  });
});

describe("sharing on site", () => {
  test("the crew link as a QR code that decodes back to it, a text message, and a one-page crew PDF for the board", async () => {
    const owner = await openDeck("phone");
    const { page } = owner;
    const panel = page.getByRole("region", { name: "Crew link" });
    await panel.getByLabel("Who it is for (optional)").fill("Deck crew");
    const rows = page.getByTestId("crew-link-row");
    const before = await rows.count();
    await panel.getByTestId("crew-link-create").click();
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(before + 1);
    const row = rows.first();
    const link = await row.getByTestId("crew-link-url").inputValue();

    // the QR code on the job page, read back from a screenshot of it
    const qr = row.getByTestId("crew-link-qr");
    // to the middle of the screen: the phone's bottom bar must not cover the code in the picture
    await qr.evaluate((el) => el.scrollIntoView({ block: "center" }));
    expect(decodeQr(await qr.screenshot())).toBe(link);
    await owner.screenshot("order-6-job-qr-phone", { fullPage: false });

    // by text message: an sms: link with the crew link in its body
    const sms = await row.getByTestId("crew-link-sms").getAttribute("href");
    expect(sms).toMatch(/^sms:/);
    expect(decodeURIComponent((sms ?? "").split("body=")[1] ?? "")).toContain(link);

    // the crew's page: signed out, no tabs for signed-in builders, a PDF for the site board
    const crew = await session.open(null, { viewport: "phone" });
    await crew.goto(new URL(link).pathname);
    await crew.page.getByRole("heading", { level: 1, name: DECK }).waitFor();
    expect(await crew.page.getByRole("navigation", { name: "Main" }).count()).toBe(0);
    expect(await crew.page.getByRole("link", { name: "Jobs", exact: true }).count()).toBe(0);
    expect(await crew.page.getByRole("link", { name: "Account", exact: true }).count()).toBe(0);
    await crew.screenshot("order-7-crew-page-phone", { fullPage: false });
    const [download] = await Promise.all([crew.page.waitForEvent("download"), crew.page.getByTestId("crew-board-pdf").click()]);
    const pdfFile = path.join(ARTIFACTS_DIR, "order-8-crew.pdf");
    await download.saveAs(pdfFile);
    const pdf = await readFile(pdfFile);
    expect(isPdf(pdf)).toBe(true);
    expect((pdf.toString("latin1").match(/\/Type \/Page\b/g) ?? []).length).toBe(1);
    if (hasPdftotext()) {
      // rendered to PNG as a printer would, and its QR code read back from the picture
      execFileSync("pdftoppm", ["-r", "150", "-png", "-singlefile", pdfFile, path.join(ARTIFACTS_DIR, "order-8-crew-pdf")]);
      expect(decodeQr(await readFile(path.join(ARTIFACTS_DIR, "order-8-crew-pdf.png")))).toBe(link);
      const text = execFileSync("pdftotext", ["-layout", pdfFile, "-"]).toString("utf8");
      expect(text).toMatch(/DJ1 deck joists/);
      expect(text).toMatch(/Check before you build/);
    }
    expect(crew.consoleErrors).toEqual([]);

    owner.page.once("dialog", (d) => void d.accept());
    await row.getByRole("button", { name: "Revoke" }).click();
    await page.getByText("Crew link revoked. It stopped working at once.").waitFor();
  });
});

describe("subscription journey", () => {
  test("a free builder presses Save job sheet, pays, and lands back on the job with the sheet saved", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const { page, context, goto, consoleErrors } = opened;
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await signUpBuilder(context, "onjob");
    const member = {
      kind: "header",
      span: "6'",
      label: "H1 back door header",
      newJob: { name: "Fenwick Close porch", siteAddress: "3 Fenwick Close, Larkfield" },
    } as const;
    await sizeAndSaveMember(page, member);
    await goto("/jobs");
    await page
      .getByRole("link", { name: new RegExp(member.newJob.name) })
      .first()
      .click();
    await page.getByRole("heading", { level: 1, name: member.newJob.name }).waitFor();
    const jobPath = new URL(page.url()).pathname;

    // where a subscriber has "Save job sheet", so does a free builder; it leads to the plans
    const save = page.getByTestId("sheet-save-subscribe");
    await save.scrollIntoViewIfNeeded();
    expect(await save.textContent()).toBe("Save job sheet");
    await opened.screenshot("order-9-free-save-sheet-phone", { fullPage: false });
    await Promise.all([page.waitForURL(/\/pricing\?job=/), save.click()]);
    await page.getByTestId("pricing-for-sheet").waitFor();
    await opened.screenshot("order-10-pricing-for-sheet-phone", { fullPage: false });
    await Promise.all([
      page.waitForURL((url) => url.href.startsWith(`${standinUrl()}/checkout/`), { timeout: 30_000 }),
      page.getByRole("button", { name: "Subscribe monthly" }).click(),
    ]);
    // paid: back on the job with the sheet saved, not on Billing
    await Promise.all([
      page.waitForURL((url) => url.pathname === jobPath && /sheet=/.test(url.search), { timeout: 45_000 }),
      payWithCard(page, TEST_CARDS.pays),
    ]);
    const saved = page.getByTestId("sheet-saved-after-checkout");
    await saved.waitFor({ timeout: 20_000 });
    await saved.scrollIntoViewIfNeeded();
    await opened.screenshot("order-11-back-with-sheet-phone", { fullPage: false });
    expect(await page.getByRole("list", { name: "Saved sheets of this job" }).getByRole("listitem").count()).toBe(1);
    await Promise.all([page.waitForURL(/\/sheets\/[0-9a-f-]{36}$/), saved.getByRole("link", { name: "Open it" }).click()]);
    await page.getByRole("heading", { level: 1, name: member.newJob.name }).waitFor();
    expect(consoleErrors).toEqual([]);
  });

  test("signing in returns to the page that asked for it", async () => {
    const owner = await openDeck("phone");
    const orderPath = `${new URL(owner.page.url()).pathname}/order`;
    const visitor = await session.open(null, { viewport: "phone" });
    await visitor.goto(orderPath);
    await visitor.page.waitForURL(/\/sign-in\?callbackUrl=/);
    await visitor.page.getByLabel("E-mail").fill(SAM.email);
    await visitor.page.getByLabel("Password").fill(SAM.password);
    await Promise.all([
      visitor.page.waitForURL((url) => url.pathname === orderPath, { timeout: 30_000 }),
      visitor.page.getByRole("button", { name: "Sign in" }).click(),
    ]);
    await visitor.page.getByRole("heading", { level: 1, name: `Order list: ${DECK}` }).waitFor();
  });
});
