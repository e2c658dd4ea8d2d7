// Cold-formed steel in the browser: a builder framing a steel floor sizes its C-joists from a phone and gets
// the answer the trade writes ("800S162-54 at 16 in o.c."), with what is not checked for steel joists; the
// admin sees the cold-formed table beside the others, its computed properties flagged "from memory — verify".
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

describe("a steel floor framed with C-joists", () => {
  test(
    "14 ft floor at 16 in o.c., material: cold-formed steel → a C-joist by its designation, with the steel items not checked",
    { timeout: 120_000 },
    async () => {
      for (const viewport of ["phone", "desktop"] as const) {
        const { page, goto, screenshot, consoleErrors, context } = await session.open(null, { viewport, allowConsole: [/401|Unauthorized/] });
        await context.route("**/favicon.ico", (route) => route.fulfill({ status: 204 }));
        await goto("/size?kind=floor-joist");
        await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
        await typeLength(page, /^Span \(between supports\)/, "14");
        await next(page, /Next: Loads/);
        await next(page, /Next: Material/);
        await page.getByText("Cold-formed steel", { exact: true }).click();
        await page.getByLabel("Flange width").waitFor();
        await screenshot(`flow-cfs-4-material-${viewport}`, { fullPage: false });
        await next(page, /See the answer/);
        const answer = await waitForAnswer(page);
        expect(answer).toMatch(/^\d{3,4}S\d{3}-\d{2,3} at 16 in o\.c\./);
        await expect.poll(() => page.getByText(/Cold-formed steel: web holes beyond the standard punchouts/).count()).toBeGreaterThan(0);
        await screenshot(`flow-cfs-5-answer-${viewport}`, { fullPage: false });
        await page
          .getByRole("button", { name: /Full check, every factor/ })
          .first()
          .click();
        const detail = page.getByRole("dialog");
        await detail
          .getByText(/AISI S100-16/)
          .first()
          .waitFor();
        expect(await detail.getByText(/Eq\. G5-1/).count()).toBeGreaterThan(0);
        await screenshot(`flow-cfs-5-member-check-${viewport}`, { fullPage: false });
        // flange roll (AISI S100-16 §F4) is its own row, with the flange and the restraint taken in its note
        const roll = detail.getByText(/Flange roll \(distortional buckling, AISI S100-16 §F4\)/);
        await roll.first().scrollIntoViewIfNeeded();
        expect(await detail.getByText(/top flange in compression \(sheathing not credited: kφ = 0\)/).count()).toBeGreaterThan(0);
        await screenshot(`flow-cfs-5-flange-roll-${viewport}`, { fullPage: false });
        expect(consoleErrors).toEqual([]);
      }
    },
  );
});

describe("the cold-formed steel table on the admin screens", () => {
  test("listed with the other tables, each row's source shown and the computed properties flagged", { timeout: 120_000 }, async () => {
    for (const viewport of ["phone", "desktop"] as const) {
      const opened = await session.open(null, { viewport });
      const { page, screenshot, consoleErrors } = opened;
      await signInAsAdmin(opened, "/admin/tables/cold-formed");
      const note = page.getByTestId("table-source");
      await note.waitFor();
      expect(await note.textContent()).toMatch(/from memory — verify/);
      await page.getByLabel("Filter").fill("800S162");
      const list = viewport === "phone" ? page.getByTestId("table-cards") : page.getByTestId("table-grid");
      await list.waitFor();
      await expect.poll(() => list.getByText("800S162-54").count()).toBeGreaterThan(0);
      await screenshot(`tables-cold-formed-${viewport}`, { fullPage: false });
      expect(consoleErrors).toEqual([]);
    }
  });
});
