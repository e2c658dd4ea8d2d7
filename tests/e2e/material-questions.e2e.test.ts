// A builder on a phone picks steel for a header: the material step asks only what applies to steel (no wet
// service, no repetitive joists), and the answer counts jack studs under the W-shape as it does under wood.
// A deck joist in sawn lumber still asks wood's questions; under "any material" they are named as wood's.
// Trade fractions in the answer ("1-1/2"") stay on one line at 390 px.
import { describe, expect, test } from "vitest";
import { setupBrowser } from "./support/browser";
import { nextStep as next, typeLength, waitForAnswer } from "./support/flow";

const session = setupBrowser();

describe("the material step asks what applies to the material", () => {
  test("a W-shape header in a 2x6 wall: no wood questions, and the answer in jack studs", { timeout: 120_000 }, async () => {
    for (const viewport of ["phone", "desktop"] as const) {
      const { page, goto, screenshot, consoleErrors, context } = await session.open(null, { viewport, allowConsole: [/401|Unauthorized/] });
      await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
      await goto("/size?kind=header");
      await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
      await next(page, /Next: Loads/);
      await next(page, /Next: Material/);
      // sawn first: wood's wet service question is there
      await page.getByText("Sawn lumber", { exact: true }).click();
      await page.getByText("Wet service", { exact: true }).waitFor();
      await page.getByText("Steel", { exact: true }).click();
      await page.getByText("2x6 wall", { exact: true }).click();
      await expect.poll(() => page.getByText("Wet service", { exact: true }).count()).toBe(0);
      expect(await page.getByText(/share the load/).count()).toBe(0);
      expect(await page.getByText(/small slits/).count()).toBe(0);
      await screenshot(`flow-steel-header-material-${viewport}`, { fullPage: true });
      await next(page, /See the answer/);
      const answer = await waitForAnswer(page);
      expect(answer).toMatch(/^W\d+x\d+ — \d jack studs? each end$/);
      await screenshot(`flow-steel-header-answer-${viewport}`, { fullPage: false });
      expect(consoleErrors).toEqual([]);
    }
  });

  test("any material for deck joists: wood's questions named as wood's", { timeout: 120_000 }, async () => {
    const { page, goto, screenshot, consoleErrors, context } = await session.open(null, { viewport: "phone", allowConsole: [/401|Unauthorized/] });
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await goto("/size?kind=deck-joist");
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    await next(page, /Next: Loads/);
    await next(page, /Next: Material/);
    await page.getByText("Any", { exact: true }).click();
    await page.getByText("Wood in wet service", { exact: true }).waitFor();
    await page.getByText("Wood joists share the load", { exact: true }).waitFor();
    await page.getByText(/^If it is sawn lumber: treated/).waitFor();
    await screenshot("flow-any-deck-material-phone", { fullPage: true });
    expect(consoleErrors).toEqual([]);
  });
});

describe("trade fractions on a phone", () => {
  test('"1-1/2"" never breaks after its hyphen in the answer', { timeout: 120_000 }, async () => {
    const { page, goto, screenshot, context } = await session.open(null, { viewport: "phone", allowConsole: [/401|Unauthorized/] });
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await goto("/size?kind=floor-joist");
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    await typeLength(page, /^Span \(between supports\)/, "13");
    await next(page, /Next: Loads/);
    await next(page, /Next: Material/);
    await next(page, /See the answer/);
    const answer = await waitForAnswer(page);
    expect(answer).toMatch(/1-1\/2" bearing/);
    // every fraction in the headline sits on one line: its characters share one top
    const split = await page.getByTestId("answer-headline").evaluate((el) => {
      const broken: string[] = [];
      for (const span of el.querySelectorAll("span")) {
        const text = span.firstChild;
        if (!text || text.nodeType !== Node.TEXT_NODE) continue;
        const range = document.createRange();
        range.selectNodeContents(span);
        if (range.getClientRects().length > 1) broken.push(span.textContent ?? "");
      }
      return { broken, kept: el.querySelectorAll("span.whitespace-nowrap").length };
    });
    expect(split.kept).toBeGreaterThan(0);
    expect(split.broken).toEqual([]);
    await screenshot("flow-joist-answer-fractions-phone", { fullPage: false });
  });
});
