// The material tables in the browser (issue 6): the demo admin changes a design value, sees the new version
// in the history and in the next sizing, uploads a CSV with a bad line and sees it refused with nothing
// changed, then restores the starter version (so the other browser tests size with the starter values).
import type { Page } from "playwright-core";
import { describe, expect, test } from "vitest";
import { setupBrowser, type OpenedPage } from "./support/browser";

const session = setupBrowser();

async function signInAsAdmin(opened: OpenedPage, callbackPath: string): Promise<void> {
  await opened.goto(`/sign-in?callbackUrl=${encodeURIComponent(callbackPath)}`);
  await opened.page.getByLabel("E-mail").fill("admin@spanlark.test");
  await opened.page.getByLabel("Password", { exact: true }).fill("admin-demo-pass");
  await opened.page.getByRole("button", { name: "Sign in" }).click();
  await opened.page.waitForURL((url) => url.pathname === callbackPath);
}

/** A Spruce-Pine-Fir No.3 2x10 floor joist, checked through the app's own sizing route. */
async function checkSpfNo3(page: Page): Promise<{ tables: string; bending: number }> {
  const res = await page.request.post("/api/check", {
    data: {
      member: { material: "sawn", species: "Spruce-Pine-Fir", grade: "No.3", size: "2x10", plies: 1 },
      lengthFt: 12,
      supports: [
        { x: 0, type: "pin" },
        { x: 12, type: "roller" },
      ],
      spacingIn: 16,
      loads: [
        { type: "area", case: "L", psf: 40 },
        { type: "area", case: "D", psf: 10 },
      ],
      bearingIn: 1.5,
      conditions: { wet: false, incised: false, repetitive: true, unbracedLengthFt: 0, selfWeight: true },
      limits: { live: 360, total: 240 },
      method: "asd",
    },
  });
  expect(res.status()).toBe(200);
  const body = (await res.json()) as { tables: string; checks: { name: string; ratio: number }[] };
  const bending = body.checks.find((c) => c.name === "bending");
  if (!bending) throw new Error("no bending check in the answer");
  return { tables: body.tables, bending: bending.ratio };
}

async function currentVersionNumber(page: Page): Promise<number> {
  const text = (await page.getByTestId("table-version").textContent()) ?? "";
  const match = /version (\d+)/.exec(text);
  if (!match) throw new Error(`no version number in "${text}"`);
  return Number(match[1]);
}

describe("material tables admin", () => {
  // A long journey: several pages and saves, so more time than the default minute.
  test("change a design value, see it in the history and the next sizing, refuse a bad CSV, restore", { timeout: 240_000 }, async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const { page, goto, screenshot, consoleErrors } = opened;
    await signInAsAdmin(opened, "/admin/tables");
    await page.getByTestId("current-version").waitFor();
    await screenshot("admin-tables-overview-phone");

    const before = await checkSpfNo3(page);

    await goto("/admin/tables/sawn-values");
    await page.getByTestId("table-cards").waitFor();
    const startNumber = await currentVersionNumber(page);
    await page.getByLabel("Filter").fill("Spruce-Pine-Fir No.3 dimension");
    await expect.poll(() => page.getByTestId("table-cards").getByRole("listitem").count()).toBe(1);
    await screenshot("admin-tables-sawn-values-phone");

    // Edit Fb (500 psi in the starter tables; 400 psi, or 450 where it is already 400). The field
    // carries its unit; an absurd value is refused in the form first.
    await page.getByTestId("table-cards").getByRole("button").click();
    const fb = page.locator("#field-Fb_psi");
    const oldFb = Number(await fb.inputValue());
    const newFb = oldFb === 400 ? 450 : 400;
    expect(await page.getByRole("dialog").getByText("psi", { exact: true }).first().isVisible()).toBe(true);
    await fb.fill("90000");
    await page.getByLabel("Note for the history").fill("Yard check: lower Fb for No.3 stock");
    await page.getByRole("button", { name: "Save as new version" }).click();
    await page.getByText("Fb must be at most 10,000 psi").waitFor();
    await screenshot("admin-tables-edit-refused-phone", { fullPage: false });
    await fb.fill(String(newFb));
    await page.getByRole("button", { name: "Save as new version" }).click();
    await page.getByText(`Saved: version ${startNumber + 1} published`).waitFor();
    await expect.poll(() => currentVersionNumber(page)).toBe(startNumber + 1);

    // The next sizing reads the new value: same member, bending ratio = M/(Fb'·S) scales by old Fb / new Fb
    // (every adjustment factor unchanged).
    const after = await checkSpfNo3(page);
    expect(after.tables).not.toBe(before.tables);
    expect(after.bending / before.bending).toBeCloseTo(oldFb / newFb, 3);

    await goto("/admin/tables/history");
    const newest = page.getByTestId(`version-${startNumber + 1}`);
    await newest.waitFor();
    expect(await newest.textContent()).toContain("Current");
    expect(await newest.textContent()).toContain("Yard check: lower Fb for No.3 stock");
    expect(await newest.textContent()).toContain("admin@spanlark.test");
    await newest.getByRole("button", { name: "What changed" }).click();
    // in words: the row by species, grade and size class, the column by its label and unit (not "Fb_psi")
    const changes = newest.getByTestId("version-changes");
    await changes.getByText(`Fb (psi) ${oldFb} → ${newFb}`).waitFor();
    expect(await changes.textContent()).not.toMatch(/\||Fb_psi/);
    await screenshot("admin-tables-history-phone");

    // A CSV with one bad line: checked, every bad line named, nothing applied.
    await goto("/admin/tables/sawn-values");
    await page.getByTestId("csv-import").waitFor();
    const csv = [
      "species,grade,size_class,nominal_depth_in,Fb_psi,Ft_psi,Fv_psi,FcPerp_psi,Fc_psi,E_psi,Emin_psi,G,source",
      "Hem-Fir,No.2,dimension,,850,525,150,405,1300,1300000,470000,0.43,Yard sheet",
      "Hem-Fir,No.1,dimension,,90000,625,150,405,1350,1500000,550000,0.43,Yard sheet",
    ].join("\n");
    await page.getByLabel("Upload a CSV file").setInputFiles({ name: "yard-values.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await page.getByRole("button", { name: "Check the file" }).click();
    const rejected = page.getByTestId("csv-rejected");
    await rejected.waitFor();
    expect(await rejected.textContent()).toContain("Line 3");
    expect(await rejected.textContent()).toContain("Fb must be at most 10,000 psi (got 90000)");
    expect(await page.getByRole("button", { name: "Apply as a new version" }).count()).toBe(0);
    await page.getByTestId("csv-preview").scrollIntoViewIfNeeded();
    await screenshot("admin-tables-csv-rejected-phone", { fullPage: false });
    await page.reload();
    await page.getByTestId("table-cards").waitFor();
    expect(await currentVersionNumber(page)).toBe(startNumber + 1);

    // Restore the version we started from, as a new version, after confirming.
    await goto("/admin/tables/history");
    const start = page.getByTestId(`version-${startNumber}`);
    await start.getByRole("button", { name: "Restore" }).click();
    await page
      .getByRole("dialog")
      .getByText(`publishes version ${startNumber + 2}, a copy of version ${startNumber}`)
      .waitFor();
    await page.getByRole("dialog").getByLabel("Note for the history").fill("Back to the starter values");
    await page.getByRole("button", { name: "Restore as a new version" }).click();
    await page.getByTestId(`version-${startNumber + 2}`).waitFor();
    expect(await page.getByTestId(`version-${startNumber + 2}`).textContent()).toContain(`Restored from version ${startNumber}`);
    const restored = await checkSpfNo3(page);
    expect(restored.bending).toBeCloseTo(before.bending, 6);
    expect(consoleErrors).toEqual([]);
  });

  test("the pages at desktop size", async () => {
    const opened = await session.open(null, { viewport: "desktop" });
    const { page, goto, screenshot, consoleErrors } = opened;
    await signInAsAdmin(opened, "/admin/tables");
    await screenshot("admin-tables-overview-desktop");
    await goto("/admin/tables/steel-shapes");
    await page.getByTestId("table-grid").waitFor();
    await page.getByRole("button", { name: /^Weight W/ }).click();
    const firstShape = await page.getByTestId("table-grid").locator("tbody tr").first().locator("td").nth(1).textContent();
    expect(firstShape).toBe("W6x9");
    await screenshot("admin-tables-steel-desktop");
    await page.getByRole("button", { name: "Edit W8x18" }).click();
    await page.getByRole("dialog").waitFor();
    await screenshot("admin-tables-edit-desktop", { fullPage: false });
    await page.keyboard.press("Escape");
    await goto("/admin/tables/history");
    await page.getByTestId("version-history").waitFor();
    await screenshot("admin-tables-history-desktop");
    expect(consoleErrors).toEqual([]);
  });
});
