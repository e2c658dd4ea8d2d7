// Crew links and job sheets in Chromium at 390x844: the demo subscriber makes a crew link on the job page and
// e-mails it (read back from the mail sink),
// a crew member opens it signed out (schedule and caution, nothing to edit), the link is revoked (404); the
// subscriber saves a job sheet and downloads its PDF; a free builder is told what sheets need. Screenshots go
// to tests/artifacts/, with the PDF and, where poppler is installed, its first pages as PNG.
import { execFileSync } from "node:child_process";
import { readFile, writeFile } from "node:fs/promises";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { describe, expect, test } from "vitest";
import { CAUTION as CAUTION_TEXT } from "@/lib/caution";
import { ARTIFACTS_DIR, baseUrl, setupBrowser } from "./support/browser";
import { signIn, waitForMail } from "./support/payments";
import { hasPdftotext, isPdf, pdfStreamText } from "../sheets/pdf-text";

const session = setupBrowser();

// demo accounts seeded by the auth helper (FOUNDATION.md); their jobs by seeders/20261201120010-demo-jobs.ts
const SAM = { email: "sam@hollisrowe.test", password: "subscriber-demo-pass" };
const DEE = { email: "dee@hollisrowe.test", password: "builder-demo-pass" };
const JOB = "Marsh Lane addition";

async function openDemoJob(account: typeof SAM) {
  const opened = await session.open(null, { viewport: "phone" });
  await signIn(opened.context, account);
  await opened.goto("/jobs");
  await opened.page
    .getByRole("link", { name: new RegExp(JOB) })
    .first()
    .click();
  await opened.page.getByRole("heading", { level: 1, name: JOB }).waitFor();
  return opened;
}

describe("crew link at 390x844", () => {
  test("made on the job page, opened signed out with the schedule and the caution, then revoked (404)", async () => {
    const owner = await openDemoJob(SAM);
    const panel = owner.page.getByRole("region", { name: "Crew link" });
    await panel.getByLabel("Who it is for (optional)").fill("Framing crew");
    const rows = owner.page.getByTestId("crew-link-row");
    const before = await rows.count();
    await panel.getByTestId("crew-link-create").click();
    // the list refreshes with the new link first (newest first)
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(before + 1);
    const link = await rows.first().getByTestId("crew-link-url").inputValue();
    expect(link).toMatch(/\/crew\/[A-Za-z0-9_-]{43}$/);
    // e-mail it (template job-shared, through the local mail sink)
    const framer = `framer-${randomUUID().slice(0, 8)}@larkfield-crew.test`;
    await rows.first().getByRole("button", { name: "E-mail it" }).click();
    await rows.first().getByLabel("Send to").fill(framer);
    await rows.first().getByLabel("Note (optional)").fill("Headers go in Monday.");
    await rows.first().getByRole("button", { name: "Send" }).click();
    await owner.page.getByText(`Crew link sent to ${framer}.`).waitFor();
    const mail = await waitForMail(framer, /Marsh Lane addition/);
    expect(mail.text).toContain(link);
    expect(mail.text).toContain("Headers go in Monday.");
    await rows.first().scrollIntoViewIfNeeded();
    await owner.screenshot("crew-sheets-1-job-page-crew-link", { fullPage: false });

    // the crew: a fresh browser, no account
    const crewPath = new URL(link).pathname;
    const crew = await session.open(null, { viewport: "phone" });
    const response = await crew.page.goto(`${baseUrl()}${crewPath}`, { waitUntil: "load" });
    expect(response?.status()).toBe(200);
    await crew.page.getByRole("heading", { level: 1, name: JOB }).waitFor();
    expect(await crew.page.locator('meta[name="robots"]').getAttribute("content")).toMatch(/noindex/);
    const members = crew.page.getByTestId("crew-member");
    expect(await members.count()).toBeGreaterThanOrEqual(2);
    const headlines = await crew.page.getByTestId("crew-headline").allTextContents();
    expect(headlines.some((h) => /jack stud/.test(h))).toBe(true);
    const caution = crew.page.getByRole("main").getByRole("complementary", { name: "Safety caution" });
    expect(await caution.count()).toBe(1);
    expect(await caution.textContent()).toContain(CAUTION_TEXT);
    // read only: nothing to type into or submit in the page's content
    expect(await crew.page.locator("main form, main input, main textarea, main select, main button").count()).toBe(0);
    await crew.screenshot("crew-sheets-2-crew-page-phone", { fullPage: false });
    await crew.screenshot("crew-sheets-2-crew-page-phone-full", { fullPage: true });
    expect(crew.consoleErrors).toEqual([]);

    // revoked: the same address answers 404 with a plain page
    owner.page.once("dialog", (d) => void d.accept());
    await rows.first().getByRole("button", { name: "Revoke" }).click();
    await owner.page.getByText("Crew link revoked. It stopped working at once.").waitFor();
    const gone = await crew.page.goto(`${baseUrl()}${crewPath}`, { waitUntil: "load" });
    expect(gone?.status()).toBe(404);
    await crew.page.getByRole("heading", { level: 1, name: "This link is no longer active" }).waitFor();
    await crew.screenshot("crew-sheets-3-crew-link-revoked", { fullPage: false });
  });
});

describe("job sheet at 390x844", () => {
  test("the demo subscriber saves a sheet, reads it, and downloads its PDF", async () => {
    const owner = await openDemoJob(SAM);
    await owner.page.getByTestId("sheet-save").click();
    await owner.page.waitForURL(/\/sheets\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await owner.page.getByRole("heading", { level: 1, name: JOB }).waitFor();
    const memberCount = await owner.page.getByTestId("sheet-member").count();
    expect(memberCount).toBeGreaterThanOrEqual(2);
    await owner.screenshot("crew-sheets-4-sheet-page-phone", { fullPage: false });
    await owner.screenshot("crew-sheets-4-sheet-page-phone-full", { fullPage: true });

    // the print stylesheet: no navigation, no buttons
    await owner.page.emulateMedia({ media: "print" });
    expect(await owner.page.getByRole("navigation", { name: "Main" }).isVisible()).toBe(false);
    expect(await owner.page.getByTestId("sheet-pdf-letter").isVisible()).toBe(false);
    await owner.page.emulateMedia({ media: "screen" });

    const [download] = await Promise.all([owner.page.waitForEvent("download"), owner.page.getByTestId("sheet-pdf-letter").click()]);
    expect(download.suggestedFilename()).toMatch(/^Marsh-Lane-addition-.*\.pdf$/);
    const file = path.join(ARTIFACTS_DIR, "crew-sheets-5-sheet.pdf");
    await download.saveAs(file);
    const pdf = await readFile(file);
    expect(isPdf(pdf)).toBe(true);
    const text = pdfStreamText(pdf);
    const labels = await owner.page.locator('[data-testid="sheet-member"] h2').allTextContents();
    for (const label of labels) expect(text).toContain(label);
    expect(text).toContain("Check before you build");
    expect(text).toContain("Hollis & Rowe Framing");
    if (hasPdftotext()) {
      execFileSync("pdftoppm", ["-r", "70", "-png", "-f", "1", "-l", "3", file, path.join(ARTIFACTS_DIR, "crew-sheets-5-sheet-pdf")]);
    }
    expect(owner.consoleErrors).toEqual([]);
  });

  test("a free builder sees what sheets need and no save button; the PDF route answers 403 or 404", async () => {
    const dee = await openDemoJob(DEE);
    const locked = dee.page.getByTestId("sheet-locked");
    await locked.waitFor();
    expect(await locked.textContent()).toMatch(/Without a subscription you can open and read every sheet you saved/);
    expect(await dee.page.getByTestId("sheet-save").count()).toBe(0);
    await locked.scrollIntoViewIfNeeded();
    await dee.screenshot("crew-sheets-6-free-builder-sheet-locked", { fullPage: false });
    const res = await dee.context.request.get(`${baseUrl()}/api/sheets/00000000-0000-4000-8000-000000000000/pdf`);
    expect([403, 404]).toContain(res.status());
    await writeFile(path.join(ARTIFACTS_DIR, "crew-sheets-6-free-builder-pdf-status.txt"), String(res.status()));
  });
});
