// With no signal, in Chromium at 390x844 against the built app (the service worker only runs there): the demo
// subscriber opens Spanlark once, the network is cut (Playwright's offline mode, plus a refusal of every request
// the service worker itself would send, so nothing reaches the server), the app reopens from the phone, sizes
// a header with the tables kept on the phone, saves it to a new job; the signal comes back, the save is sent
// once and the server's recheck is shown; the job holds the member once. A save sent twice with one
// Idempotency-Key makes one member and gets the same answer. A crew link opened once reads with no signal, and
// its site-board PDF opens and downloads from the phone, with when it was last updated.
import { randomUUID } from "node:crypto";
import { readFile } from "node:fs/promises";
import type { Page } from "playwright-core";
import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { baseUrl, setupBrowser, type OpenedPage } from "./support/browser";
import { nextStep, typeLength, waitForAnswer } from "./support/flow";
import { OFFLINE_NOISE, goOffline, goOnline, waitUntilKept } from "./support/offline";
import { signIn } from "./support/payments";

const session = setupBrowser();

const SAM = { email: "sam@hollisrowe.test", password: "subscriber-demo-pass" };
async function membersNamed(page: Page, jobName: string, label: string): Promise<number> {
  await page.goto(`${baseUrl()}/jobs`, { waitUntil: "load" });
  await page
    .getByRole("link", { name: new RegExp(jobName) })
    .first()
    .click();
  await page.getByRole("heading", { level: 1, name: jobName }).waitFor();
  return page.getByText(label, { exact: true }).count();
}

describe("no signal at 390x844", () => {
  test("reopened offline after one visit: sizes a header on the phone, saves it, sends it once when back online, rechecked", async () => {
    const first: OpenedPage = await session.open(null, { viewport: "phone", allowConsole: OFFLINE_NOISE });
    await signIn(first.context, SAM);
    await first.goto("/");
    await waitUntilKept(first.page, ["/", "/size"]);
    // the installable app: manifest with our icons
    const manifest = (await (await first.context.request.get(`${baseUrl()}/manifest.webmanifest`)).json()) as { icons: { purpose: string; sizes: string }[] };
    expect(manifest.icons.some((i) => i.purpose === "maskable" && i.sizes === "512x512")).toBe(true);
    expect(manifest.icons.some((i) => i.purpose === "any" && i.sizes === "192x192")).toBe(true);

    // the basement: no signal, and the app opened again from the home screen
    // the tab is closed and the app opened again from the home screen (one page: a second tab left open in
    // the background can stall a screenshot in headless Chromium on a busy machine)
    const { context } = first;
    await first.page.close();
    await goOffline(context);
    const page = await context.newPage();
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));
    await page.goto(`${baseUrl()}/size`, { waitUntil: "load" });
    expect(
      await page.evaluate(() =>
        fetch("/api/health").then(
          () => "reached",
          () => "no signal",
        ),
      ),
    ).toBe("no signal");
    await page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
    await page.getByTestId("offline-bar").waitFor();
    await page.getByText("Header", { exact: true }).click();
    await nextStep(page, /Next: Span and supports/);
    await typeLength(page, /^Span \(between supports\)/, "6'");
    await nextStep(page, /Next: Loads/);
    await nextStep(page, /Next: Material/);
    await nextStep(page, /See the answer/);
    const headline = await waitForAnswer(page);
    expect(headline).toMatch(/jack stud/);
    const onPhone = page.getByTestId("answer-on-phone");
    await onPhone.waitFor();
    expect(await onPhone.textContent()).toMatch(/worked out on this phone with tables v\d+ of \d{1,2} [A-Z][a-z]{2}; the server rechecks it/);
    await page.screenshot({ path: "tests/artifacts/offline-1-answer-on-phone.png" });

    const jobName = `Basement header ${randomUUID().slice(0, 6)}`;
    const label = `H1 basement stair header ${randomUUID().slice(0, 4)}`;
    await page.getByRole("button", { name: "Save to a job" }).click();
    const dialog = page.getByRole("dialog", { name: "Save to a job" });
    await dialog.getByLabel("Job", { exact: true }).selectOption({ value: "new" });
    await dialog.getByLabel("New job's name").fill(jobName);
    await dialog.getByLabel(/Member name/).fill(label);
    await dialog.getByRole("button", { name: "Save" }).click();
    await page.getByText(`No signal: ${label} is saved on this phone and goes to ${jobName} when the signal is back.`).waitFor();
    await expect.poll(() => page.getByTestId("offline-bar").textContent()).toMatch(/1 change waiting to send/);
    await page.screenshot({ path: "tests/artifacts/offline-2-saved-on-phone.png" });

    // walking back out: the save is sent once, and the server's recheck is shown
    await goOnline(context);
    const sent = page.getByTestId("sent-save");
    await sent.waitFor({ timeout: 45_000 });
    expect(await sent.textContent()).toContain(`${label} saved to ${jobName} from this phone.`);
    expect(await sent.textContent()).toContain("Rechecked by the server: the same answer as worked out on this phone.");
    // the note that it waits on the phone goes once it is sent
    await expect.poll(() => page.getByText(`No signal: ${label} is saved on this phone`).count(), { timeout: 5_000 }).toBe(0);
    const rechecked = page.getByTestId("answer-rechecked");
    await rechecked.waitFor({ timeout: 45_000 });
    expect(await rechecked.textContent()).toContain("the same answer");
    expect(await page.getByTestId("answer-headline").textContent()).toBe(headline);
    await page.screenshot({ path: "tests/artifacts/offline-3-back-online-rechecked.png" });
    // the page reloaded (the router reloads a page itself at times as the signal returns): the recheck still shows
    // (opened again by address; a load the router started itself meanwhile makes the first try fail)
    const reopen = () => page.goto(page.url(), { waitUntil: "load" });
    await reopen().catch(async () => {
      await page.waitForLoadState("load");
      await reopen();
    });
    await page.getByTestId("answer-rechecked").waitFor({ timeout: 30_000 });
    expect(await page.getByTestId("answer-headline").textContent()).toBe(headline);
    expect(errors).toEqual([]);

    expect(await membersNamed(page, jobName, label)).toBe(1);
  }, 180_000);

  test("a save sent twice with one Idempotency-Key (the first answer lost) makes one member and answers the same", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    await signIn(opened.context, SAM);
    const key = randomUUID();
    const jobName = `Retry porch ${randomUUID().slice(0, 6)}`;
    const label = `B1 porch beam ${randomUUID().slice(0, 4)}`;
    const body = { newJob: { name: jobName, siteAddress: "", notes: "" }, label, flowState: defaultFlowState("beam"), chosenMember: null };
    const send = () =>
      opened.context.request.post(`${baseUrl()}/api/members`, {
        headers: { "idempotency-key": key, "content-type": "application/json", origin: baseUrl() },
        data: body,
      });
    const a = await send();
    const b = await send();
    expect(a.status()).toBe(201);
    expect(b.status()).toBe(201);
    expect(b.headers()["idempotent-replayed"]).toBe("true");
    expect(await b.json()).toEqual(await a.json());
    // the same key with a different save is refused, naming the header
    const other = await opened.context.request.post(`${baseUrl()}/api/members`, {
      headers: { "idempotency-key": key, "content-type": "application/json", origin: baseUrl() },
      data: { ...body, label: `${label} again` },
    });
    expect(other.status()).toBe(422);
    expect(JSON.stringify(await other.json())).toContain("Idempotency-Key");
    expect(await membersNamed(opened.page, jobName, label)).toBe(1);
  });

  test("a crew link opened once reads with no signal, with when it was last updated", async () => {
    const owner = await session.open(null, { viewport: "phone" });
    await signIn(owner.context, SAM);
    await owner.goto("/jobs");
    await owner.page
      .getByRole("link", { name: /Marsh Lane addition/ })
      .first()
      .click();
    const panel = owner.page.getByRole("region", { name: "Crew link" });
    await panel.waitFor();
    const rows = owner.page.getByTestId("crew-link-row");
    const before = await rows.count();
    await panel.getByTestId("crew-link-create").click();
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(before + 1);
    const link = await rows.first().getByTestId("crew-link-url").inputValue();
    const crewPath = new URL(link).pathname;

    const crew = await session.open(null, { viewport: "phone", allowConsole: OFFLINE_NOISE });
    await crew.goto(crewPath);
    await crew.page.getByRole("heading", { level: 1, name: "Marsh Lane addition" }).waitFor();
    await crew.page.waitForFunction(() => navigator.serviceWorker.controller !== null, null, { timeout: 30_000 });
    await expect
      .poll(() => crew.page.evaluate(async (p) => (await (await caches.open("spanlark-pages")).keys()).some((r) => new URL(r.url).pathname === p), crewPath), {
        timeout: 30_000,
      })
      .toBe(true);
    const headlinesOnline = await crew.page.getByTestId("crew-headline").allTextContents();
    // the site-board PDF is kept beside the page
    const pdfPath = `/api/crew/${crewPath.split("/crew/")[1]}/pdf`;
    await expect
      .poll(() => crew.page.evaluate(async (p) => Boolean(await (await caches.open("spanlark-crew-pdf")).match(new URL(p, location.origin).href)), pdfPath), {
        timeout: 30_000,
      })
      .toBe(true);

    await crew.page.close();
    await goOffline(crew.context);
    const again = await crew.context.newPage();
    await again.goto(`${baseUrl()}${crewPath}`, { waitUntil: "load" });
    await again.getByRole("heading", { level: 1, name: "Marsh Lane addition" }).waitFor();
    const note = again.getByTestId("copy-offline");
    await note.waitFor();
    expect(await note.textContent()).toMatch(
      /No signal: this is the copy kept on this phone, last updated [A-Z][a-z]{2}, [A-Z][a-z]{2} \d{1,2}, \d{1,2}:\d{2}/,
    );
    expect(await again.getByTestId("crew-headline").allTextContents()).toEqual(headlinesOnline);
    expect(await again.getByRole("main").getByRole("complementary", { name: "Safety caution" }).count()).toBe(1);
    // the PDF with no signal: from the phone, with when it was last updated
    const kept = again.getByTestId("crew-pdf-kept");
    await kept.waitFor();
    expect(await kept.textContent()).toMatch(
      /^No signal: the PDF kept on this phone, last updated [A-Z][a-z]{2}, [A-Z][a-z]{2} \d{1,2}, \d{1,2}:\d{2} [AP]M\.$/,
    );
    const pdf = await again.evaluate(async (p) => {
      const res = await fetch(p);
      const bytes = new Uint8Array(await res.arrayBuffer());
      return { status: res.status, type: res.headers.get("content-type"), head: String.fromCharCode(...bytes.slice(0, 5)), size: bytes.length };
    }, pdfPath);
    expect(pdf).toMatchObject({ status: 200, type: "application/pdf", head: "%PDF-" });
    expect(pdf.size).toBeGreaterThan(5_000);
    const [download] = await Promise.all([again.waitForEvent("download"), again.getByTestId("crew-board-pdf").click()]);
    expect(await download.failure()).toBeNull();
    const file = await download.path();
    expect((await readFile(file)).subarray(0, 5).toString("latin1")).toBe("%PDF-");
    await again.getByTestId("crew-board-pdf").scrollIntoViewIfNeeded();
    await again.screenshot({ path: "tests/artifacts/offline-4-crew-link-no-signal.png" });
    await goOnline(crew.context);
  }, 120_000);
});
