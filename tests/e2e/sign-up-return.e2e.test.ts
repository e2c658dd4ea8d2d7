// A visitor sent to sign in from the plans page of a job (a job's "Save job sheet" leads there) who opens an
// account instead comes back to that page once the address is confirmed: the return page rides in the mailed link.
import { randomUUID } from "node:crypto";
import { describe, expect, test } from "vitest";
import { baseUrl, setupBrowser } from "./support/browser";
import { waitForMail } from "./support/payments";

const session = setupBrowser();

describe("sign-up keeps the page it started from", () => {
  test("plans page of a job → sign in → open an account → confirm from the e-mail → back on that plans page, signed in", async () => {
    const jobId = randomUUID();
    const returnPath = `/pricing?job=${jobId}`;
    const email = `return-${randomUUID().slice(0, 8)}@e2e-return.test`;
    const opened = await session.open(returnPath, { allowConsole: [/401/, /Failed to load resource/] });
    const { page } = opened;

    await Promise.all([page.waitForURL(/\/sign-in\?callbackUrl=/), page.getByRole("link", { name: "Sign in to subscribe" }).first().click()]);
    await Promise.all([page.waitForURL(/\/sign-up\?callbackUrl=/), page.getByRole("link", { name: "No account yet? Open one" }).click()]);
    expect(new URL(page.url()).searchParams.get("callbackUrl")).toBe(returnPath);
    await page.getByLabel("Your name").fill("Marlow Finch");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(`Larkfield-${randomUUID().slice(0, 10)}`);
    await page.getByRole("button", { name: "Open my account" }).click();
    await page.getByTestId("sign-up-sent").waitFor();

    const mail = await waitForMail(email, /confirm/i);
    const link = new URL(/https?:\/\/\S+\/verify\?\S+/.exec(mail.text)![0]);
    expect(link.searchParams.get("next")).toBe(returnPath);
    await opened.goto(`${baseUrl()}${link.pathname}${link.search}`);
    await Promise.all([
      page.waitForURL((url) => url.pathname === "/pricing" && url.searchParams.get("job") === jobId, { timeout: 30_000 }),
      page.getByRole("button", { name: "Confirm my e-mail" }).click(),
    ]);
    // Signed in on the page it started from: the plan buttons now start checkout instead of leading to sign-in.
    await page.getByTestId("subscribe-monthly").waitFor();
    expect(await page.getByRole("link", { name: "Sign in to subscribe" }).count()).toBe(0);
    await opened.screenshot("sign-up-returned-to-plans-phone", { fullPage: false });
    expect(opened.consoleErrors).toEqual([]);
  }, 90_000);
});
