// Material tables a builder can trust, in the browser: the admin sees each row's source and the rows that
// are from memory flagged; the I-joist table sits beside the others; and a floor framed with I-joists gets
// an answer a framer can order ("11-7/8 in PRI-40 at 16 in o.c.").
import { describe, expect, test } from "vitest";
import { setupBrowser, type OpenedPage } from "./support/browser";
import { nextStep as next, typeLength, waitForAnswer } from "./support/flow";

const session = setupBrowser();

async function signInAsAdmin(opened: OpenedPage, callbackPath: string): Promise<void> {
  await opened.goto(`/sign-in?callbackUrl=${encodeURIComponent(callbackPath)}`);
  await opened.page.getByLabel("E-mail").fill("admin@spanlark.test");
  await opened.page.getByLabel("Password", { exact: true }).fill("admin-demo-pass");
  await opened.page.getByRole("button", { name: "Sign in" }).click();
  await opened.page.waitForURL((url) => url.pathname === callbackPath);
}

describe("sources on the admin table screens", () => {
  test(
    "sawn design values: the Table 4D rows flagged from memory, the others citing where they were checked; I-joists listed",
    { timeout: 120_000 },
    async () => {
      for (const viewport of ["phone", "desktop"] as const) {
        const opened = await session.open(null, { viewport });
        const { page, goto, screenshot, consoleErrors } = opened;
        await signInAsAdmin(opened, "/admin/tables/sawn-values");
        const note = page.getByTestId("table-source");
        await note.waitFor();
        expect(await note.textContent()).toMatch(/\d+ of \d+ rows are from memory — verify/);
        await page.getByLabel("Filter").fill("beams-stringers");
        const list = viewport === "phone" ? page.getByTestId("table-cards") : page.getByTestId("table-grid");
        await list.waitFor();
        await expect.poll(() => list.getByText("from memory — verify", { exact: true }).count()).toBeGreaterThan(0);
        await screenshot(`tables-sources-4d-${viewport}`, { fullPage: false });
        await page.getByLabel("Filter").fill("Spruce-Pine-Fir Select Structural");
        await expect.poll(() => list.getByText(/Table 4A/).count()).toBeGreaterThan(0);
        expect(await list.getByText("from memory — verify", { exact: true }).count()).toBe(0);
        await screenshot(`tables-sources-spf-${viewport}`, { fullPage: false });

        await goto("/admin/tables/i-joists");
        await page.getByTestId("table-source").waitFor();
        await expect.poll(() => page.getByText(/PRI-40 11-7\/8/).count()).toBeGreaterThan(0);
        await screenshot(`tables-i-joists-${viewport}`, { fullPage: false });
        expect(consoleErrors).toEqual([]);
      }
    },
  );
});

describe("a floor framed with I-joists", () => {
  test("16 ft floor at 16 in o.c., material: wood I-joists → a PRI joist with its depth, spacing and bearing", { timeout: 120_000 }, async () => {
    const { page, goto, screenshot, consoleErrors, context } = await session.open(null, { viewport: "phone", allowConsole: [/401|Unauthorized/] });
    await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
    await goto("/size?kind=floor-joist");
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    await typeLength(page, /^Span \(between supports\)/, "16");
    await next(page, /Next: Loads/);
    await next(page, /Next: Material/);
    await page.getByText("Wood I-joists", { exact: true }).click();
    await page.getByLabel("I-joist series").waitFor();
    await screenshot("flow-ijoist-4-material", { fullPage: false });
    await next(page, /See the answer/);
    const answer = await waitForAnswer(page);
    expect(answer).toMatch(/^(9-1\/2|11-7\/8|14|16) in PRI-\d0 at 16 in o\.c\./);
    await screenshot("flow-ijoist-5-answer", { fullPage: false });
    await page
      .getByRole("button", { name: /Full check, every factor/ })
      .first()
      .click();
    const detail = page.getByRole("dialog");
    await detail.getByText(/EI = /).first().waitFor();
    expect(await detail.getByText(/APA PRI-400/).count()).toBeGreaterThan(0);
    expect(await detail.getByText(/from memory/).count()).toBe(0);
    await screenshot("flow-ijoist-5-member-check", { fullPage: false });
    expect(consoleErrors).toEqual([]);
  });
});
