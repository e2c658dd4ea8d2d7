// The questions behind a trustworthy answer, on a phone (390x844): which map the ground snow number comes
// from (older by default) with roof snow beside roof live load; a header by its rough opening in a 2x4 wall,
// answered as plies with a spacer and the basis named; treated deck lumber with slits (incised).
// Screenshots go to tests/artifacts/.
import { describe, expect, test } from "vitest";
import { setupBrowser } from "./support/browser";
import { nextStep as next, typeLength, waitForAnswer } from "./support/flow";

const session = setupBrowser();

describe("snow basis, header wall and incised lumber at 390x844", () => {
  test("a header by its 5 ft rough opening: snow map asked, 2x4 wall, the answer names the basis and the spacer", async () => {
    const { page, screenshot, consoleErrors, goto } = await session.open(null, { viewport: "phone" });
    await goto("/size");
    await page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
    await page.getByText("Header", { exact: true }).click();
    await next(page, /Next: Span and supports/);

    await page.getByText("Rough opening", { exact: true }).click();
    await typeLength(page, /^Rough opening \(between/, "5'");
    await page.getByText(/Span 5' 3" = rough opening 5' 0" \+ half of the 3 in bearing at each end/).waitFor();
    await screenshot("trust-1-header-rough-opening", { fullPage: false });
    await next(page, /Next: Loads/);

    const map = page.getByRole("group", { name: "Which map is your ground snow number from?" });
    await map.scrollIntoViewIfNeeded();
    expect(await map.getByRole("radio", { name: /The map in the 2021 code or older/ }).isChecked()).toBe(true);
    await page.getByLabel("Roof loads on this member").getByText("Roof live load").waitFor();
    expect(await page.getByLabel("Roof loads on this member").textContent()).toMatch(/Roof snow21 psf → 273 plf.*Roof live load20 psf → 260 plf/);
    await screenshot("trust-2-snow-map-question", { fullPage: false });
    await next(page, /Next: Material/);

    const wall = page.getByRole("group", { name: "Wall framing" });
    await wall.scrollIntoViewIfNeeded();
    expect(await wall.getByRole("radio", { name: "2x4 wall" }).isChecked()).toBe(true);
    await screenshot("trust-3-header-wall-framing", { fullPage: false });
    await next(page, /See the answer/);

    const headline = await waitForAnswer(page);
    expect(headline).toMatch(/^2-ply 2x\d+ No\.2/);
    const facts = (await page.getByTestId("answer-facts").textContent()) ?? "";
    expect(facts).toContain("Snow basis: ASCE 7-16");
    expect(facts).toMatch(/fills a 2x4 wall/);
    expect(facts).toContain("Span: span 5 ft 3 in = rough opening 5 ft 0 in");
    await screenshot("trust-4-header-answer", { fullPage: false });
    expect(consoleErrors).toEqual([]);
  });

  test("a Hem-Fir deck joist: the flow asks about slits in treated lumber and the answer says what it assumed", async () => {
    const { page, screenshot, consoleErrors, goto } = await session.open(null, { viewport: "phone" });
    await goto("/size");
    await page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
    await page.getByText("Deck joist", { exact: true }).click();
    await next(page, /Next: Span and supports/);
    await typeLength(page, /^Span \(between supports\)/, "10'");
    await next(page, /Next: Loads/);
    await next(page, /Next: Material/);
    await page.getByLabel("Species").selectOption("Hem-Fir");
    const slits = page.getByRole("group", { name: "Treated lumber with small slits in its faces?" });
    await slits.scrollIntoViewIfNeeded();
    expect(await slits.getByRole("radio", { name: "Yes, slits" }).isChecked()).toBe(true);
    expect(await slits.textContent()).toContain("Most treated fir and spruce is");
    await screenshot("trust-5-incised-question", { fullPage: false });
    await next(page, /See the answer/);
    await waitForAnswer(page);
    expect(await page.getByTestId("answer-facts").textContent()).toMatch(/Lumber: treated Hem-Fir assumed incised/);
    await screenshot("trust-6-deck-answer", { fullPage: false });
    expect(consoleErrors).toEqual([]);
  });
});
