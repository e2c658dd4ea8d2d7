// One answer, computed once, in Chromium at 390x844: an edit makes ONE request
// (POST /api/size with the best members' whole checks; no /api/check), and the answer screen, the crew link and
// the job sheet show the same answer line, the same ratio and the same combination for the member.
import { randomUUID } from "node:crypto";
import { writeFile } from "node:fs/promises";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { ARTIFACTS_DIR, baseUrl, setupBrowser } from "./support/browser";
import { nextStep, sizeAndSaveMember, typeLength, waitForAnswer } from "./support/flow";
import { signIn } from "./support/payments";

const session = setupBrowser();
const SAM = { email: "sam@hollisrowe.test", password: "subscriber-demo-pass" };

/** The moment diagram's caption: its title and the combination it is drawn under. */
async function momentCombination(page: import("playwright-core").Page, title: RegExp): Promise<string> {
  const caption = page.locator("figure figcaption", { has: page.getByText(title) }).first();
  return ((await caption.locator("span").nth(1).textContent()) ?? "").trim();
}

describe("one answer at 390x844", () => {
  test("one request per edit; the screen, the crew link and the sheet agree on the answer, the ratio and the combination", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const { page, context } = opened;
    await signIn(context, SAM);
    const calls: string[] = [];
    page.on("request", (r) => {
      const p = new URL(r.url()).pathname;
      if (r.method() === "POST" && p.startsWith("/api/")) calls.push(p);
    });

    const label = `H9 pantry header ${randomUUID().slice(0, 6)}`;
    const jobName = `Quill Street ${randomUUID().slice(0, 6)}`;
    const headline = await sizeAndSaveMember(page, { kind: "header", span: "6'", label, newJob: { name: jobName, siteAddress: "3 Quill Street, Larkfield" } });
    // each change of the inputs on the way (the wide screen's live answer is mounted at every step) is one
    // size request; no member is ever checked by a request of its own
    const toAnswer = [...calls];
    expect(toAnswer.filter((p) => p === "/api/size").length).toBeGreaterThanOrEqual(1);
    expect(toAnswer.filter((p) => p === "/api/check")).toHaveLength(0);

    // one edit: back to the span, a new length, the answer again
    calls.length = 0;
    await page
      .getByRole("navigation", { name: "Steps" })
      .getByRole("button", { name: /Span and supports/ })
      .click();
    await page
      .getByLabel(/^Span \(between supports\)/)
      .first()
      .waitFor();
    await typeLength(page, /^Span \(between supports\)/, "7' 6\"");
    await nextStep(page, /Next: Loads/);
    await nextStep(page, /Next: Material/);
    await nextStep(page, /See the answer/);
    const edited = await waitForAnswer(page);
    await page.waitForTimeout(1500);
    const afterEdit = calls.filter((p) => p === "/api/size" || p === "/api/check");
    await writeFile(path.join(ARTIFACTS_DIR, "one-answer-requests.txt"), `to the answer: ${toAnswer.join(", ")}\none edit: ${afterEdit.join(", ")}\n`);
    expect(afterEdit).toEqual(["/api/size"]);
    expect(edited).toMatch(/jack stud/);

    // back to the saved answer (6 ft) to read it as the screen shows it
    calls.length = 0;
    await page
      .getByRole("navigation", { name: "Steps" })
      .getByRole("button", { name: /Span and supports/ })
      .click();
    await typeLength(page, /^Span \(between supports\)/, "6'");
    await nextStep(page, /Next: Loads/);
    await nextStep(page, /Next: Material/);
    await nextStep(page, /See the answer/);
    expect(await waitForAnswer(page)).toBe(headline);
    const screenCombination = await momentCombination(page, /^Moment M/);
    const screenVerdict = ((await page.getByTestId("answer-headline").locator("xpath=following-sibling::p[1]").textContent()) ?? "").trim();
    expect(calls.filter((p) => p === "/api/check")).toHaveLength(0);
    await opened.screenshot("one-answer-1-screen", { fullPage: false });

    // the job: a crew link and a sheet
    await page.goto(`${baseUrl()}/jobs`, { waitUntil: "load" });
    await page
      .getByRole("link", { name: new RegExp(jobName) })
      .first()
      .click();
    await page.getByRole("heading", { level: 1, name: jobName }).waitFor();
    const rows = page.getByTestId("crew-link-row");
    const before = await rows.count();
    await page.getByTestId("crew-link-create").click();
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(before + 1);
    const link = await rows.first().getByTestId("crew-link-url").inputValue();
    const crew = await session.open(null, { viewport: "phone" });
    await crew.page.goto(`${baseUrl()}${new URL(link).pathname}`, { waitUntil: "load" });
    const crewHeadline = ((await crew.page.getByTestId("crew-headline").first().textContent()) ?? "").trim();
    await crew.screenshot("one-answer-2-crew", { fullPage: false });

    await page.getByTestId("sheet-save").click();
    await page.waitForURL(/\/sheets\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    const member = page.getByTestId("sheet-member").first();
    const sheetHeadline = ((await member.locator("header p").nth(1).textContent()) ?? "").trim();
    const sheetCombination = await momentCombination(page, /^Moment$/);
    await opened.screenshot("one-answer-3-sheet", { fullPage: false });
    await writeFile(
      path.join(ARTIFACTS_DIR, "one-answer-agreement.txt"),
      `screen: ${headline} | ${screenVerdict} | moment under ${screenCombination}\ncrew:   ${crewHeadline}\nsheet:  ${sheetHeadline} | moment under ${sheetCombination}\n`,
    );
    expect(crewHeadline).toBe(headline);
    expect(sheetHeadline).toBe(headline);
    expect(sheetCombination).toBe(screenCombination);
    expect(screenCombination).toMatch(/^D\+/);
    expect(opened.consoleErrors).toEqual([]);
  });
});
