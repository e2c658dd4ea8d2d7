// With no signal, in Chromium against the built app: a save queued on the phone goes to the server by Background
// Sync with no Spanlark page open (the page closed before the signal came back), exactly once (counted in the
// app's database); and a change to a saved member made with no signal waits on the phone with the member's
// version, the job page saying so; changed meanwhile on another screen, the phone names what changed and keeps
// the builder's change until they send it over or discard it.
import { randomUUID } from "node:crypto";
import { describe, expect, test } from "vitest";
import { defaultFlowState } from "@/lib/flow/defaults";
import { withMainSpan } from "@/lib/flow/state";
import { DESKTOP, PHONE, baseUrl, saveScreenshot, setupBrowser } from "./support/browser";
import { nextStep, typeLength, waitForAnswer } from "./support/flow";
import {
  OFFLINE_NOISE,
  goOffline,
  goOnline,
  memberInDatabase,
  membersInDatabase,
  sentOnPhone,
  sizeHeaderAndSaveOffline,
  waitUntilKept,
  waitUntilPageKept,
} from "./support/offline";
import { signIn } from "./support/payments";

const session = setupBrowser();
const SAM = { email: "sam@hollisrowe.test", password: "subscriber-demo-pass" };

describe("Background Sync and changes made with no signal", () => {
  test("a save queued with no signal is sent by the service worker with no page open, once", async () => {
    const first = await session.open(null, { viewport: "phone", allowConsole: OFFLINE_NOISE });
    await signIn(first.context, SAM);
    await first.goto("/");
    await waitUntilKept(first.page, ["/", "/size"]);
    const { context } = first;

    await first.page.close();
    await goOffline(context);
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/size`, { waitUntil: "load" });
    const jobName = `Closed app ${randomUUID().slice(0, 6)}`;
    const label = `H1 cellar header ${randomUUID().slice(0, 4)}`;
    await sizeHeaderAndSaveOffline(page, jobName, label);
    // the page asked the worker to send it (Background Sync is there in Chromium)
    expect(await page.evaluate(async () => (await (await navigator.serviceWorker.ready).sync.getTags()) as string[])).toContain("spanlark-saves");
    expect(await membersInDatabase(jobName, label)).toBe(0);

    // the builder closes Spanlark, then walks back out into the signal
    for (const p of context.pages()) await p.close();
    expect(context.pages()).toHaveLength(0);
    await goOnline(context);
    await expect.poll(() => membersInDatabase(jobName, label), { timeout: 90_000, interval: 1_000 }).toBe(1);
    expect(context.pages()).toHaveLength(0);

    // opened again: the page has nothing left to send, the record says the worker sent it, and it is still one row
    const again = await context.newPage();
    await again.goto(`${baseUrl()}/jobs`, { waitUntil: "load" });
    const sent = (await sentOnPhone(again)).filter((r) => r.label === label);
    expect(sent).toHaveLength(1);
    expect(sent[0]!.by).toBe("background");
    await again.getByTestId("sent-save").filter({ hasText: label }).waitFor();
    expect(await again.getByTestId("sent-save").filter({ hasText: label }).textContent()).toContain("in the background, by this phone");
    await again.waitForTimeout(2_000);
    expect(await membersInDatabase(jobName, label)).toBe(1);
  }, 240_000);

  test("a change made with no signal waits with its base version; changed elsewhere meanwhile, the phone names what changed and keeps it", async () => {
    const phone = await session.open(null, { viewport: "phone", allowConsole: [...OFFLINE_NOISE, /409/] });
    await signIn(phone.context, SAM);
    // a header saved to a new job, online
    const jobName = `Stair opening ${randomUUID().slice(0, 6)}`;
    const label = `H2 stair header ${randomUUID().slice(0, 4)}`;
    const made = await phone.context.request.post(`${baseUrl()}/api/members`, {
      headers: { "idempotency-key": randomUUID(), "content-type": "application/json", origin: baseUrl() },
      data: { newJob: { name: jobName, siteAddress: "", notes: "" }, label, flowState: withMainSpan(defaultFlowState("header"), 6), chosenMember: null },
    });
    expect(made.status()).toBe(201);
    const { jobId, memberId } = (await made.json()) as { jobId: string; memberId: string };
    const editPath = `/size?job=${jobId}&member=${memberId}`;

    const { page, context } = phone;
    await phone.goto("/");
    await waitUntilKept(page, ["/", "/size"]);
    await phone.goto(`/jobs/${jobId}`);
    await page.getByRole("heading", { level: 1, name: jobName }).waitFor();
    await waitUntilPageKept(page, `/jobs/${jobId}`);
    await phone.goto(editPath);
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    await waitUntilPageKept(page, editPath);

    // in the basement: 7 ft instead of 6 ft
    await goOffline(context);
    await typeLength(page, /^Span \(between supports\)/, "7'");
    await nextStep(page, /Next: Loads/);
    await nextStep(page, /Next: Material/);
    await nextStep(page, /See the answer/);
    await waitForAnswer(page);
    await page.getByRole("button", { name: "Save the changes" }).click();
    const dialog = page.getByRole("dialog", { name: "Save the changes" });
    await dialog.getByRole("button", { name: "Save the changes" }).click();
    await page.getByText(`No signal: your change to ${label} is kept on this phone and goes to ${jobName} when the signal is back.`).waitFor();

    // the job page, read from the phone, says what waits
    await page.goto(`${baseUrl()}/jobs/${jobId}`, { waitUntil: "load" });
    const waiting = page.getByTestId("job-waiting");
    await waiting.waitFor();
    expect(await waiting.textContent()).toMatch(/^1 change waiting to send: .*when the signal is back\..*change to H2 stair header/);
    await page.getByTestId("job-on-phone").scrollIntoViewIfNeeded();
    await saveScreenshot(page, "offline-5-change-waiting-390", { fullPage: false });
    await page.setViewportSize(DESKTOP);
    await saveScreenshot(page, "offline-5-change-waiting-desktop", { fullPage: false });
    await page.setViewportSize(PHONE);

    // meanwhile the office makes it 8 ft on another screen, online
    const office = await session.open(null, { viewport: "phone" });
    await signIn(office.context, SAM);
    await office.goto(editPath);
    await office.page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    await typeLength(office.page, /^Span \(between supports\)/, "8'");
    await nextStep(office.page, /Next: Loads/);
    await nextStep(office.page, /Next: Material/);
    await nextStep(office.page, /See the answer/);
    await waitForAnswer(office.page);
    await office.page.getByRole("button", { name: "Save the changes" }).click();
    await office.page.getByRole("dialog", { name: "Save the changes" }).getByRole("button", { name: "Save the changes" }).click();
    await office.page.getByText(`${label} saved to ${jobName}`).waitFor();
    expect((await memberInDatabase(memberId))?.lengthFt).toBe(8);

    // the phone back in signal: its change is not applied over the office's; it says what changed and keeps it
    await goOnline(context);
    const conflict = page.getByTestId("job-on-phone").getByTestId("change-conflict");
    await conflict.waitFor({ timeout: 60_000 });
    const words = (await conflict.textContent()) ?? "";
    expect(words).toContain(`Your change to ${label} in ${jobName} was not sent: it was changed on another screen after this phone opened it.`);
    // the page under it now shows the member as it is (8 ft), not the phone's older copy
    await expect.poll(() => page.getByText("Header · 8' 0\" span").count(), { timeout: 30_000 }).toBe(1);
    expect(words).toContain(`span: was 6' 0", now 8' 0"`);
    // the kept-change line follows once the phone's copy is read back from its store: wait for it
    await expect
      .poll(async () => (await conflict.textContent()) ?? "", { timeout: 30_000 })
      .toContain(`Your change is kept on this phone (${label}, span 7' 0"). Nothing was overwritten.`);
    expect((await memberInDatabase(memberId))?.lengthFt).toBe(8);
    await page.getByTestId("job-on-phone").evaluate((el) => window.scrollTo(0, el.getBoundingClientRect().top + window.scrollY - 90));
    await saveScreenshot(page, "offline-6-change-conflict-390", { fullPage: false });
    await page.setViewportSize(DESKTOP);
    await page.getByTestId("job-on-phone").evaluate((el) => window.scrollTo(0, el.getBoundingClientRect().top + window.scrollY - 90));
    await saveScreenshot(page, "offline-6-change-conflict-desktop", { fullPage: false });
    await page.setViewportSize(PHONE);

    // the builder keeps theirs: sent over the office's version, once
    await conflict.getByRole("button", { name: "Send mine over it" }).click();
    await expect.poll(async () => (await memberInDatabase(memberId))?.lengthFt, { timeout: 60_000, interval: 1_000 }).toBe(7);
    const sentList = page.getByTestId("job-sent");
    await sentList.waitFor({ timeout: 30_000 });
    expect(await sentList.textContent()).toMatch(new RegExp(`change to ${label}: sent \\d{1,2}:\\d{2}`));
    expect(await page.getByTestId("change-conflict").count()).toBe(0);
    await page.getByTestId("job-on-phone").scrollIntoViewIfNeeded();
    await saveScreenshot(page, "offline-7-change-sent-390", { fullPage: false });
    expect(phone.consoleErrors.filter((e) => !/Failed to load resource/.test(e))).toEqual([]);
  }, 300_000);
});
