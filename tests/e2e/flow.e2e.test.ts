// The sizing flow on a phone (390x844), from an empty browser: a 10 ft header under a bearing wall and a
// 13 ft floor joist at 16 in, both saved to a demo job. Screenshots of every step go to tests/artifacts/.
import { describe, expect, test } from "vitest";
import { setupBrowser } from "./support/browser";
import { nextStep as next, typeLength, waitForAnswer } from "./support/flow";

const session = setupBrowser();

// demo builder account seeded by the auth helper (FOUNDATION.md); the job is seeded by seeders/20261201120010-demo-jobs.ts
const DEMO = { email: "dee@hollisrowe.test", password: "builder-demo-pass" };
const DEMO_JOB = "Marsh Lane addition";

describe("sizing flow at 390x844", () => {
  test("a 10 ft header under a bearing wall and a 13 ft floor joist at 16 in, saved to a job", async () => {
    const { page, context, screenshot, consoleErrors, goto } = await session.open(null, { viewport: "phone", allowConsole: [/401|Unauthorized/] });
    // the browser asks for /favicon.ico on its own; the app's icon is app/icon.svg
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await goto("/size");

    // Step 1: the kind
    await page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
    await page.getByText("Header", { exact: true }).click();
    await screenshot("flow-header-1-kind", { fullPage: false });
    await next(page, /Next: Span and supports/);

    // Step 2: span, typed the way it was measured; echoed back in feet and inches
    await typeLength(page, /^Span \(between supports\)/, "10'");
    await expect.poll(() => page.getByText("Header · 10' 0\" span").count(), { timeout: 15_000 }).toBeGreaterThan(0);
    await screenshot("flow-header-2-span", { fullPage: false });
    await next(page, /Next: Loads/);

    // Step 3: the header's starting loads: roof over a tributary width, snow, the wall above
    await page.getByRole("heading", { name: "Posts, walls and partial loads" }).waitFor();
    expect(await page.getByText(/Wall above/).count()).toBeGreaterThan(0);
    await screenshot("flow-header-3-loads", { fullPage: false });
    await next(page, /Next: Material/);

    // Step 4: built-up sawn lumber by default; a 10 ft header under full snow needs three plies, so a 2x6 wall
    await page.getByText("2x6 wall", { exact: true }).click();
    await screenshot("flow-header-4-material", { fullPage: false });
    await next(page, /See the answer/);

    // Step 5: the answer first, with jack studs
    const headerAnswer = await waitForAnswer(page);
    expect(headerAnswer).toMatch(/2x\d+ .*jack stud/);
    await screenshot("flow-header-5-answer", { fullPage: false });
    await screenshot("flow-header-5-answer-full");

    // Tap a member for its full check: every check with its ratio, the factors, the loads
    await page
      .getByRole("button", { name: /Full check, every factor/ })
      .first()
      .click();
    const detail = page.getByRole("dialog");
    await detail.getByRole("heading", { name: "Factors and design values" }).waitFor();
    expect(await detail.getByText("CD, load duration").count()).toBe(1);
    expect(await detail.getByText(/^Bending/).count()).toBeGreaterThan(0);
    await screenshot("flow-header-5-member-check", { fullPage: false });
    await detail.getByRole("button", { name: "Close" }).last().click();

    // Signed out, saving asks for a sign-in and comes back with nothing lost
    await page.getByRole("link", { name: "Sign in to save" }).click();
    await page.getByLabel("E-mail").fill(DEMO.email);
    await page.getByLabel("Password", { exact: true }).fill(DEMO.password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL((url) => url.pathname === "/size", { timeout: 30_000, waitUntil: "commit" });
    const dialog = page.getByRole("dialog", { name: "Save to a job" });
    await dialog.waitFor({ timeout: 30_000 });
    expect(await waitForAnswer(page)).toBe(headerAnswer);
    await dialog.getByLabel("Job").selectOption({ label: DEMO_JOB });
    await dialog.getByLabel(/Member name/).fill("H1 kitchen header");
    await screenshot("flow-header-6-save", { fullPage: false });
    await dialog.getByRole("button", { name: "Save" }).click();
    await page.getByText(`H1 kitchen header saved to ${DEMO_JOB}`).waitFor();

    // The floor joist: from the home page's link
    await goto("/size?kind=floor-joist");
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    await typeLength(page, /^Span \(between supports\)/, "13");
    await screenshot("flow-joist-2-span", { fullPage: false });
    await next(page, /Next: Loads/);
    await expect.poll(() => page.getByRole("radio", { name: "16 in" }).isChecked(), { timeout: 15_000 }).toBe(true);
    await screenshot("flow-joist-3-loads", { fullPage: false });
    await next(page, /Next: Material/);
    await next(page, /See the answer/);
    const joistAnswer = await waitForAnswer(page);
    expect(joistAnswer).toMatch(/^2x\d+ No\.\d at 16 in o\.c\./);
    await screenshot("flow-joist-5-answer", { fullPage: false });
    await page.getByRole("button", { name: "Save to a job" }).click();
    const dialog2 = page.getByRole("dialog", { name: "Save to a job" });
    await dialog2.getByLabel("Job").selectOption({ label: DEMO_JOB });
    await dialog2.getByLabel(/Member name/).fill("J1 floor joists");
    await dialog2.getByRole("button", { name: "Save" }).click();
    await page.getByText(`J1 floor joists saved to ${DEMO_JOB}`).waitFor();

    // Both are on the job's page, with the answers the flow gave
    await goto("/jobs");
    await page
      .getByRole("link", { name: new RegExp(DEMO_JOB) })
      .first()
      .click();
    await page.getByRole("heading", { level: 1, name: DEMO_JOB }).waitFor();
    expect(await page.getByText("H1 kitchen header").count()).toBeGreaterThan(0);
    expect(await page.getByText("J1 floor joists").count()).toBeGreaterThan(0);
    expect(await page.getByText(headerAnswer).count()).toBeGreaterThan(0);
    await screenshot("flow-job-page", { fullPage: false });

    // Delete with Undo: the member goes, and comes back
    const deleteJoist = page.getByRole("button", { name: "Delete J1 floor joists" });
    const joists = await deleteJoist.count();
    await deleteJoist.last().click();
    await page.getByText("J1 floor joists deleted").waitFor();
    await expect.poll(() => deleteJoist.count(), { timeout: 15_000 }).toBe(joists - 1);
    await screenshot("flow-job-undo", { fullPage: false });
    await page.getByRole("button", { name: "Undo" }).click();
    await expect.poll(() => deleteJoist.count(), { timeout: 15_000 }).toBe(joists);

    // Edit reopens the flow with the member's inputs
    await page.getByRole("heading", { name: "H1 kitchen header" }).last().locator("xpath=ancestor::li").getByRole("link", { name: "Edit" }).click();
    await page.getByRole("heading", { level: 1, name: "Edit H1 kitchen header" }).waitFor();
    expect(await page.getByLabel(/^Span \(between supports\)/).inputValue()).toBe(`10' 0"`);
    await screenshot("flow-edit-member", { fullPage: false });

    expect(consoleErrors).toEqual([]);
  }, 180_000);

  test("every step side by side on a desktop (1280x800)", async () => {
    const { page, context, screenshot, consoleErrors, goto } = await session.open(null, { viewport: "desktop" });
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await goto("/size?kind=header");
    // 8 ft: two plies with a spacer carry it in the default 2x4 wall
    await typeLength(page, /^Span \(between supports\)/, "8-0");
    // the live answer sits beside the inputs
    await page.getByRole("complementary", { name: "Answer so far" }).getByTestId("answer-headline").waitFor({ timeout: 30_000 });
    await screenshot("flow-desktop-2-span", { fullPage: false });
    await page.getByRole("button", { name: /^3\s*Loads/ }).click();
    await screenshot("flow-desktop-3-loads", { fullPage: false });
    await page.getByRole("button", { name: /^4\s*Material/ }).click();
    await screenshot("flow-desktop-4-material", { fullPage: false });
    await page.getByRole("button", { name: /^5\s*Answer/ }).click();
    await waitForAnswer(page);
    await screenshot("flow-desktop-5-answer", { fullPage: false });
    await screenshot("flow-desktop-5-answer-full");
    // a reload loses nothing
    await page.reload();
    expect(await waitForAnswer(page)).toMatch(/jack stud/);
    expect(await page.getByText("Header, 8' 0\" span").count()).toBe(1);
    expect(consoleErrors).toEqual([]);
  }, 120_000);

  test("a deck joist: tap to add an overhang, type its length, move a support, and the answer names it", async () => {
    const { page, context, screenshot, consoleErrors, goto } = await session.open(null, { viewport: "phone" });
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await goto("/size?kind=deck-joist");
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    expect(await page.getByLabel("Overhang past the right support").count()).toBe(0);

    // a tap on the handle at the drawing's right end: 2 ft past the far support, its length field appears
    const add = page.getByRole("button", { name: "Add an overhang at the right end" });
    const box = await add.boundingBox();
    expect(box && box.height >= 44 && box.width >= 44).toBe(true);
    await add.tap();
    const overhang = page.getByLabel("Overhang past the right support");
    await expect.poll(() => overhang.inputValue(), { timeout: 15_000 }).toBe(`2' 0"`);
    await expect.poll(() => page.getByText(`Deck joist · 12' 0" span with 2' 0" overhang`).count(), { timeout: 15_000 }).toBeGreaterThan(0);

    // typed the way it was measured, echoed in feet and inches
    await overhang.fill('22-1/2"');
    expect(await page.getByText(`Reads as 1' 10-1/2"`).count()).toBe(1);
    await overhang.blur();
    expect(await overhang.inputValue()).toBe(`1' 10-1/2"`);

    // a support moved from its small editor by taps, then by the keyboard on the drawing
    await page.getByRole("button", { name: /^2: on rollers at 12' 0"/ }).tap();
    await page.getByRole("button", { name: "Move 1 in left" }).tap();
    expect(await page.getByLabel("Position from the left end").inputValue()).toBe(`11' 11"`);
    await page.getByRole("button", { name: /^Support 2: on rollers at 11' 11"/ }).focus();
    await page.keyboard.press("ArrowRight");
    expect(await page.getByLabel("Position from the left end").inputValue()).toBe(`12' 0"`);
    await page.getByRole("button", { name: "Done", exact: true }).tap();
    await screenshot("flow-overhang-2-span", { fullPage: false });
    await screenshot("flow-overhang-2-span-full");

    // removed and added back by taps, then on to the answer
    await page.getByRole("button", { name: "Remove the right overhang" }).tap();
    await expect.poll(() => page.getByText(`Deck joist · 12' 0" span`, { exact: true }).count(), { timeout: 15_000 }).toBeGreaterThan(0);
    await page.getByRole("button", { name: "Add an overhang at the right end" }).tap();
    await next(page, /Next: Loads/);
    await next(page, /Next: Material/);
    await next(page, /See the answer/);
    const answer = await waitForAnswer(page);
    expect(answer).toMatch(/^2x\d+ No\.\d at 16 in o\.c\./);
    expect(await page.getByText(`Deck joist, 12' 0" span with 2' 0" overhang`).count()).toBe(1);
    expect(await page.getByText(/Support 2 at 12' 0"/).count()).toBe(1);
    await screenshot("flow-overhang-5-answer", { fullPage: false });
    await screenshot("flow-overhang-5-answer-full");

    // the same inputs on a desktop, from the address bar
    const desk = await session.open(null, { viewport: "desktop" });
    await desk.context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await desk.goto(new URL(page.url()).pathname + new URL(page.url()).search.replace(/step=answer/, "step=span"));
    await desk.page.getByLabel("Overhang past the right support").waitFor();
    await desk.page.getByRole("complementary", { name: "Answer so far" }).getByTestId("answer-headline").waitFor({ timeout: 30_000 });
    await desk.screenshot("flow-overhang-desktop-2-span", { fullPage: false });
    await desk.page.getByRole("button", { name: /^5\s*Answer/ }).click();
    await waitForAnswer(desk.page);
    await desk.screenshot("flow-overhang-desktop-5-answer", { fullPage: false });

    expect(consoleErrors).toEqual([]);
    expect(desk.consoleErrors).toEqual([]);
  }, 120_000);
});
