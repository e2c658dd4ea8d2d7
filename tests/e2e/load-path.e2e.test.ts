// The load path as a builder builds it in Chromium at 390x844: deck joists and a deck beam sized in the flow and
// saved to one job; on the job page the joists are put on the beam (their reactions become its load, saying where
// they come from), posts are added under the beam and footings under the posts; the crew link, opened signed out,
// reads the whole chain. Screenshots go to tests/artifacts/.
import { randomUUID } from "node:crypto";
import type { Page } from "playwright-core";
import { describe, expect, test } from "vitest";
import { baseUrl, setupBrowser } from "./support/browser";
import { nextStep, sizeAndSaveMember, waitForAnswer } from "./support/flow";
import { signIn } from "./support/payments";

const session = setupBrowser();
const SAM = { email: "sam@hollisrowe.test", password: "subscriber-demo-pass" };

function card(page: Page, label: string) {
  return page.getByRole("listitem").filter({ has: page.getByRole("heading", { level: 3, name: label, exact: true }) });
}

describe("the load path of a deck at 390x844", () => {
  test("joists onto a beam onto posts onto footings, read on the crew link", async () => {
    const jobName = `Wrenfield deck ${randomUUID().slice(0, 6)}`;
    const owner = await session.open(null, { viewport: "phone" });
    await signIn(owner.context, SAM);
    const page = owner.page;
    await sizeAndSaveMember(page, { kind: "deck-joist", span: "12'", label: "J1 deck joists", newJob: { name: jobName, siteAddress: "4 Wrenfield Road" } });

    // the deck beam, as the flow starts it, saved to the same job
    await page.goto(`${baseUrl()}/size?kind=deck-beam`, { waitUntil: "load" });
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    await nextStep(page, /Next: Loads/);
    await nextStep(page, /Next: Material/);
    await nextStep(page, /See the answer/);
    await waitForAnswer(page);
    await page.getByRole("button", { name: "Save to a job" }).click();
    const dialog = page.getByRole("dialog", { name: "Save to a job" });
    await dialog.getByLabel("Job", { exact: true }).selectOption({ label: jobName });
    await dialog.getByLabel(/Member name/).fill("B1 deck beam");
    await dialog.getByRole("button", { name: "Save" }).click();
    await page.getByText(`B1 deck beam saved to ${jobName}`).waitFor({ timeout: 15_000 });

    await page.goto(`${baseUrl()}/jobs`, { waitUntil: "load" });
    await page
      .getByRole("link", { name: new RegExp(jobName) })
      .first()
      .click();
    await page.getByRole("heading", { level: 1, name: jobName }).waitFor();

    // the joists bear on the beam: the beam now carries their reactions and says where they come from
    await card(page, "J1 deck joists").getByLabel("Bears on").selectOption({ label: "B1 deck beam" });
    const beamLoads = card(page, "B1 deck beam").getByTestId("member-carried");
    await beamLoads.waitFor({ timeout: 20_000 });
    expect(await beamLoads.textContent()).toMatch(/from J1 deck joists @ 16 in, 0' 0" to 10' 0"/);

    // posts under the beam, footings under the posts
    await card(page, "B1 deck beam").getByRole("button", { name: "Add posts under" }).click();
    const posts = page.getByRole("dialog", { name: /Posts under B1 deck beam/ });
    await posts.getByLabel("Name").fill("P1 deck posts");
    await owner.screenshot("load-path-1-add-posts", { fullPage: false });
    await posts.getByRole("button", { name: "Add posts" }).click();
    await card(page, "P1 deck posts").waitFor({ timeout: 20_000 });
    await card(page, "P1 deck posts").getByRole("button", { name: "Add footings under" }).click();
    const footings = page.getByRole("dialog", { name: /Footings under P1 deck posts/ });
    await footings.getByLabel("Name").fill("F1 footings");
    await footings.getByRole("button", { name: "Add footings" }).click();
    await card(page, "F1 footings").waitFor({ timeout: 20_000 });
    expect(await card(page, "P1 deck posts").textContent()).toMatch(/2 × 6x6 posts No\.2, 8' 0" tall — OK \d+%/);
    expect(await card(page, "F1 footings").textContent()).toMatch(/2 × \d+ in round × 10 in thick, bottom 36 in below grade — OK \d+%/);

    // the picture: joists → beam → posts → footings
    const picture = page.getByTestId("load-path");
    const rows = await picture.locator("ol > li").allTextContents();
    expect(rows).toHaveLength(4);
    expect(rows[0]).toContain("J1 deck joists");
    expect(rows[1]).toContain("B1 deck beam");
    expect(rows[2]).toContain("P1 deck posts");
    expect(rows[3]).toContain("F1 footings");
    await picture.scrollIntoViewIfNeeded();
    await owner.screenshot("load-path-2-job-page-phone", { fullPage: false });
    await owner.screenshot("load-path-2-job-page-phone-full", { fullPage: true });
    await page.setViewportSize({ width: 1280, height: 800 });
    await owner.screenshot("load-path-3-job-page-desktop", { fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });

    // the crew link, opened signed out, reads the same chain
    const panel = page.getByRole("region", { name: "Crew link" });
    await panel.getByTestId("crew-link-create").click();
    const link = page.getByTestId("crew-link-row").first().getByTestId("crew-link-url");
    await link.waitFor({ timeout: 15_000 });
    const crewPath = new URL(await link.inputValue()).pathname;
    const crew = await session.open(null, { viewport: "phone" });
    await crew.page.goto(`${baseUrl()}${crewPath}`, { waitUntil: "load" });
    await crew.page.getByRole("heading", { level: 1, name: jobName }).waitFor();
    const members = crew.page.getByTestId("crew-member");
    expect(await members.count()).toBe(4);
    const named = (label: string) => members.filter({ has: crew.page.getByRole("heading", { level: 2, name: label, exact: true }) });
    const beamCard = named("B1 deck beam");
    expect(await beamCard.getByTestId("crew-carried").textContent()).toContain("from J1 deck joists @ 16 in");
    expect(await named("P1 deck posts").textContent()).toMatch(/Posts.*6x6 posts.*Post 1.*Post 2/s);
    expect(await named("F1 footings").getByTestId("crew-headline").textContent()).toMatch(/in round × 10 in thick/);
    await crew.screenshot("load-path-4-crew-link-phone-full", { fullPage: true });
    expect(crew.consoleErrors).toEqual([]);
    expect(owner.consoleErrors).toEqual([]);
    // the longest walk of the browser tests (four members, posts, footings, a crew link): ~17 s on an idle
    // machine, past the 60 s default on a loaded one
  }, 150_000);
});
