// A thumb in sunlight, and the weight of the flow, in Chromium: the length fields' keypad and mark keys, a bad
// entry that holds the step, an automated accessibility scan (axe-core, WCAG 2.2 A/AA and 7:1 text contrast) and
// 44 px tap targets on the pages builders and crews use, no Content-Security-Policy violation on /size, and the
// JavaScript the first load of /size carries against the home page's. Screenshots at 390x844 and 1280x800 go to
// tests/artifacts/sunlight-*.png.
import { createRequire } from "node:module";
import { readFileSync } from "node:fs";
import type { Page } from "playwright-core";
import { describe, expect, test } from "vitest";
import { measurePageScripts } from "../../scripts/bench/weight";
import { baseUrl, setupBrowser, type OpenedPage } from "./support/browser";
import { nextStep, waitForAnswer, waitForHydrated } from "./support/flow";
import { signIn } from "./support/payments";

const session = setupBrowser();

// demo subscriber and job, seeded by seeders/20261201100000-demo-accounts.ts and 20261201120010-demo-jobs.ts
const SAM = { email: "sam@hollisrowe.test", password: "subscriber-demo-pass" };
const JOB = "Marsh Lane addition";

const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

type AxeFinding = { id: string; impact: string | null; help: string; nodes: { target: string[]; failureSummary?: string }[] };

/**
 * Runs axe-core in the page: WCAG 2.0/2.1/2.2 A and AA and axe's best practices, plus the enhanced (AAA, 7:1)
 * text contrast rule. Injected through the browser's debugging channel, which the page's CSP does not govern.
 * Returns the serious and critical findings, one line each.
 */
async function seriousFindings(page: Page): Promise<string[]> {
  await page.evaluate(AXE_SOURCE);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: AxeFinding[] }> } }).axe;
    const result = await axe.run(document, {
      runOnly: { type: "tag", values: ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa", "best-practice"] },
      rules: { "color-contrast-enhanced": { enabled: true } },
      resultTypes: ["violations"],
    });
    return result.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      nodes: v.nodes.map((n) => ({ target: n.target, failureSummary: n.failureSummary })),
    }));
  });
  return violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .flatMap((v) => v.nodes.map((n) => `${v.id} (${v.impact}): ${v.help} — ${n.target.join(" ")} ${n.failureSummary?.split("\n").slice(1, 2).join("") ?? ""}`));
}

/**
 * Every visible control a finger aims at, smaller than 44 x 44 CSS px. A radio button or checkbox counts by its
 * label (the whole label takes the tap); a link inside a sentence is exempt (WCAG 2.2 SC 2.5.8's inline
 * exception), as are controls the page hides.
 */
async function smallTargets(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const MIN = 44;
    const found: string[] = [];
    const selector = 'a[href], button, input:not([type="hidden"]), select, textarea, summary, [role="button"], [role="link"], [tabindex="0"]';
    const describe = (el: Element) =>
      `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""} "${(el.getAttribute("aria-label") ?? el.textContent ?? "").trim().slice(0, 40)}"`;
    for (const el of Array.from(document.querySelectorAll(selector))) {
      let target: Element = el;
      if (el instanceof HTMLInputElement && (el.type === "checkbox" || el.type === "radio")) target = el.closest("label") ?? el;
      const box = target.getBoundingClientRect();
      const style = getComputedStyle(target);
      if (box.width === 0 || box.height === 0 || style.visibility === "hidden") continue;
      // screen-reader-only controls (a radio inside its drawn label) are measured through their label above
      if (box.width <= 1 && box.height <= 1) continue;
      if (el.tagName === "A" && style.display === "inline") {
        const block = el.closest("p, li, dd, td, span");
        const around = (block?.textContent ?? "").replace(el.textContent ?? "", "").trim();
        if (around.length > 2) continue;
      }
      if (box.width < MIN - 0.5 || box.height < MIN - 0.5) found.push(`${describe(el)}: ${Math.round(box.width)} x ${Math.round(box.height)}`);
    }
    return found;
  });
}

async function audit(opened: OpenedPage, name: string): Promise<{ page: string; findings: string[]; small: string[] }> {
  await opened.page.evaluate(async () => {
    await document.fonts.ready;
  });
  await opened.screenshot(`sunlight-${name}`, { fullPage: false });
  return { page: name, findings: await seriousFindings(opened.page), small: await smallTargets(opened.page) };
}

describe("a thumb in sunlight", () => {
  test("a length field opens the decimal pad with a row of marks, reads 12 6 and 12 1/2, and a bad entry holds Next", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const { page, goto } = opened;
    await goto("/size?kind=header");
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    const span = page.getByLabel(/^Span \(between supports\)/);
    expect(await span.getAttribute("inputmode")).toBe("decimal");

    // the marks no phone keypad shows beside the digits, tapped in
    await span.tap();
    const keys = page.getByTestId("length-keys");
    await keys.waitFor();
    for (const key of await keys.getByRole("button").all()) {
      const box = await key.boundingBox();
      expect(box && box.width >= 44 && box.height >= 44).toBe(true);
    }
    await span.fill("");
    await page.keyboard.type("12");
    await keys.getByRole("button", { name: "Type a foot mark" }).tap();
    await keys.getByRole("button", { name: "Type a space" }).tap();
    await page.keyboard.type("6");
    await keys.getByRole("button", { name: "Type an inch mark" }).tap();
    expect(await span.inputValue()).toBe(`12' 6"`);
    // the field kept the focus (and the phone its keypad) through the taps
    expect(await span.evaluate((el) => el === document.activeElement)).toBe(true);
    await page.getByText(`Reads as 12' 6"`).waitFor();
    await opened.screenshot("sunlight-length-keys-phone", { fullPage: false });

    // a space for the dash, and a mixed number of feet
    await span.fill("12 6");
    await page.getByText(`Reads as 12' 6"`).waitFor();
    await span.fill("12 1/2");
    await page.getByText(`Reads as 12' 6"`).waitFor();
    await span.fill("9 3 1/2");
    await page.getByText(`Reads as 9' 3-1/2"`).waitFor();
    await span.blur();
    expect(await span.inputValue()).toBe(`9' 3-1/2"`);
    await expect.poll(() => page.getByText(`Header · 9' 3-1/2" span`).count()).toBeGreaterThan(0);

    // a bad entry stays in the field with its message, and Next does not carry on with 9' 3-1/2"
    await span.fill("12 6x");
    await span.blur();
    expect(await span.inputValue()).toBe("12 6x");
    expect(await span.getAttribute("aria-invalid")).toBe("true");
    await page.getByRole("button", { name: /Next: Loads/ }).tap();
    const held = page.getByTestId("step-held");
    await held.waitFor();
    expect(await held.textContent()).toMatch(/fix the field marked in red/);
    expect(await page.getByText(/^Span \(between supports\) "12 6x" has a unit or letters we do not read/).count()).toBe(1);
    expect(await page.getByText("Fix the field marked in red", { exact: true }).count()).toBe(1);
    expect(await page.getByRole("heading", { name: /Step 2 of 5/ }).count()).toBe(1);
    expect(await span.evaluate((el) => el === document.activeElement)).toBe(true);
    await span.blur();
    await opened.screenshot("sunlight-bad-entry-held-phone", { fullPage: false });
    // the step buttons at the top hold too
    await page.getByRole("button", { name: /^5/ }).tap();
    expect(await page.getByRole("heading", { name: /Step 2 of 5/ }).count()).toBe(1);

    // fixed, it goes on with the value typed
    await span.fill("14");
    await span.blur();
    expect(await held.count()).toBe(0);
    await nextStep(page, /Next: Loads/);
    await expect.poll(() => page.getByText(`Header · 14' 0" span`).count()).toBeGreaterThan(0);

    // a number field holds the step the same way
    const desk = await session.open("/size?kind=floor-joist", { viewport: "desktop" });
    const bearing = desk.page.getByLabel("Bearing length at each support");
    await waitForHydrated(bearing);
    await bearing.fill("");
    await bearing.blur();
    await desk.page.getByRole("button", { name: /Next: Loads/ }).click();
    await desk.page.getByTestId("step-held").waitFor();
    expect(await desk.page.getByText("Bearing length at each support is empty: type a number").count()).toBe(1);
    await desk.screenshot("sunlight-bad-entry-held-desktop", { fullPage: false });
  });

  test("axe finds nothing serious or critical and every tap target is at least 44 px: home, /size at each step and the answer, job, crew link, sheets", async () => {
    const results: { page: string; findings: string[]; small: string[] }[] = [];

    const home = await session.open("/", { viewport: "phone" });
    results.push(await audit(home, "home-phone"));

    const flow = await session.open("/size", { viewport: "phone" });
    await flow.page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
    results.push(await audit(flow, "size-1-kind-phone"));
    await flow.page.getByText("Header", { exact: true }).click();
    await nextStep(flow.page, /Next: Span and supports/);
    await flow.page.getByLabel(/^Span \(between supports\)/).waitFor();
    // a support open in its small editor, so its controls are scanned too
    await flow.page
      .getByRole("button", { name: /^2: on rollers at/ })
      .first()
      .click();
    await flow.page.getByRole("group", { name: "Move the support" }).waitFor();
    results.push(await audit(flow, "size-2-span-phone"));
    await nextStep(flow.page, /Next: Loads/);
    await flow.page.getByRole("heading", { name: "Posts, walls and partial loads" }).waitFor();
    results.push(await audit(flow, "size-3-loads-phone"));
    await nextStep(flow.page, /Next: Material/);
    await flow.page.getByText("2x6 wall", { exact: true }).waitFor();
    results.push(await audit(flow, "size-4-material-phone"));
    await nextStep(flow.page, /See the answer/);
    await waitForAnswer(flow.page);
    results.push(await audit(flow, "size-5-answer-phone"));

    const wide = await session.open("/size?kind=beam", { viewport: "desktop" });
    await wide.page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    results.push(await audit(wide, "size-2-span-desktop"));

    const owner = await session.open(null, { viewport: "phone" });
    await signIn(owner.context, SAM);
    await owner.goto("/jobs");
    await owner.page
      .getByRole("link", { name: new RegExp(JOB) })
      .first()
      .click();
    await owner.page.getByRole("heading", { level: 1, name: JOB }).waitFor();
    results.push(await audit(owner, "job-phone"));

    const panel = owner.page.getByRole("region", { name: "Crew link" });
    const rows = owner.page.getByTestId("crew-link-row");
    const before = await rows.count();
    await panel.getByTestId("crew-link-create").click();
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(before + 1);
    const link = await rows.first().getByTestId("crew-link-url").inputValue();
    const crew = await session.open(new URL(link).pathname, { viewport: "phone" });
    await crew.page.getByRole("heading", { level: 1, name: JOB }).waitFor();
    results.push(await audit(crew, "crew-link-phone"));
    const crewWide = await session.open(new URL(link).pathname, { viewport: "desktop" });
    await crewWide.page.getByRole("heading", { level: 1, name: JOB }).waitFor();
    results.push(await audit(crewWide, "crew-link-desktop"));

    await owner.page.getByTestId("sheet-save").click();
    await owner.page.waitForURL(/\/sheets\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await owner.page.getByTestId("sheet-member").first().waitFor();
    results.push(await audit(owner, "sheet-phone"));
    const sheetUrl = owner.page.url();
    const sheetWide = await session.open(null, { viewport: "desktop", storageState: await owner.context.storageState() });
    await sheetWide.goto(new URL(sheetUrl).pathname);
    await sheetWide.page.getByTestId("sheet-member").first().waitFor();
    results.push(await audit(sheetWide, "sheet-desktop"));
    await owner.goto("/sheets");
    results.push(await audit(owner, "sheets-list-phone"));

    expect(results.filter((r) => r.findings.length > 0).map((r) => ({ page: r.page, findings: r.findings }))).toEqual([]);
    expect(results.filter((r) => r.small.length > 0).map((r) => ({ page: r.page, small: r.small }))).toEqual([]);
  }, 240_000);

  test("/size through every step and the answer: no Content-Security-Policy violation, no console error", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const { page, context, consoleErrors, goto } = opened;
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    const violations: string[] = [];
    await page.exposeFunction("__reportCspViolation", (text: string) => violations.push(text));
    await page.addInitScript(() => {
      document.addEventListener("securitypolicyviolation", (event) => {
        (window as unknown as { __reportCspViolation: (t: string) => void }).__reportCspViolation(
          `${event.violatedDirective} blocked ${event.blockedURI || "(inline)"} at ${event.sourceFile}:${event.lineNumber}`,
        );
      });
    });
    await goto("/size");
    await page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
    await page.getByText("Floor joist", { exact: true }).click();
    await nextStep(page, /Next: Span and supports/);
    await page.getByLabel(/^Span \(between supports\)/).fill("13 6");
    await page.getByLabel(/^Span \(between supports\)/).blur();
    await nextStep(page, /Next: Loads/);
    await nextStep(page, /Next: Material/);
    await nextStep(page, /See the answer/);
    await waitForAnswer(page);
    // a reload resumes from the address bar, which reads the state back with the flow's schema (zod)
    await page.reload({ waitUntil: "load" });
    await waitForAnswer(page);
    // and a plain /size picks up the stored state (zod again, in the browser)
    await goto("/size");
    await page.getByText("Picked up where you left off.").waitFor();
    expect(violations).toEqual([]);
    expect(consoleErrors).toEqual([]);
  });

  test("weight: the first load of /size carries at most 1.3 times the JavaScript of the home page", async () => {
    const home = await measurePageScripts(session.browser(), baseUrl(), "/");
    const size = await measurePageScripts(session.browser(), baseUrl(), "/size");
    const ratio = size.transferBytes / home.transferBytes;
    console.log(
      `first-load JavaScript: home ${(home.transferBytes / 1024).toFixed(1)} KB over the wire (${(home.decodedBytes / 1024).toFixed(1)} KB code), ` +
        `/size ${(size.transferBytes / 1024).toFixed(1)} KB (${(size.decodedBytes / 1024).toFixed(1)} KB): ${ratio.toFixed(2)}x`,
    );
    expect(home.transferBytes).toBeGreaterThan(0);
    expect(ratio).toBeLessThanOrEqual(1.3);
    expect(size.decodedBytes / home.decodedBytes).toBeLessThanOrEqual(1.3);
  });
});
