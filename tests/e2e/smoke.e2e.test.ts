// Smoke test (issue 2): the home page renders on a phone and a desktop with no console errors and shows the
// safety caution; the health route reports the database up.
import { describe, expect, test } from "vitest";
import { CAUTION as CAUTION_TEXT } from "@/lib/caution";
import { baseUrl, setupBrowser } from "./support/browser";

const session = setupBrowser();

describe("home page", () => {
  test.each([
    { name: "phone 390x844", viewport: "phone" as const, shot: "smoke-home-phone", navLabel: "Size a member" },
    { name: "desktop 1280x800", viewport: "desktop" as const, shot: "smoke-home-desktop", navLabel: "Size a member" },
  ])("renders at $name with the caution and no console errors", async ({ viewport, shot, navLabel }) => {
    const { page, consoleErrors, screenshot } = await session.open("/", { viewport });

    await expect(page.title()).resolves.toMatch(/Spanlark/);
    const heading = page.getByRole("heading", { level: 1 });
    expect(await heading.count()).toBe(1);
    expect(await heading.isVisible()).toBe(true);

    const primary = page.getByRole("main").getByRole("link", { name: "Size a member" });
    expect(await primary.getAttribute("href")).toBe("/size");

    // Exactly one main navigation is visible: the bottom bar on a phone, the top bar on a desktop.
    const nav = page.getByRole("navigation", { name: "Main" });
    expect(await nav.count()).toBe(1);
    const navBox = await nav.boundingBox();
    const size = page.viewportSize();
    expect(navBox).not.toBeNull();
    expect(size).not.toBeNull();
    if (navBox && size) {
      if (viewport === "phone") expect(navBox.y + navBox.height).toBeCloseTo(size.height, 0);
      else expect(navBox.y).toBeLessThan(80);
    }
    expect(await nav.getByRole("link", { name: navLabel }).isVisible()).toBe(true);

    const caution = page.getByRole("complementary", { name: "Safety caution" });
    expect(await caution.first().textContent()).toContain(CAUTION_TEXT);

    await screenshot(shot, { fullPage: false });
    await screenshot(`${shot}-full`);
    expect(consoleErrors).toEqual([]);
  });

  test("member kind cards lead into sizing with their kind", async () => {
    const { page, consoleErrors } = await session.open("/");
    const hrefs = await page
      .getByRole("main")
      .locator('a[href^="/size?kind="]')
      .evaluateAll((links) => links.map((link) => link.getAttribute("href")));
    expect(hrefs).toEqual([
      "/size?kind=floor-joist",
      "/size?kind=header",
      "/size?kind=beam",
      "/size?kind=deck-joist",
      "/size?kind=deck-beam",
      "/size?kind=rafter",
    ]);
    expect(consoleErrors).toEqual([]);
  });

  test("starting, the page fetches no other page; a finger on a link fetches that one (the link fetches when reached for)", async () => {
    const opened = await session.open(null, { viewport: "phone" });
    const fetchedAhead: string[] = [];
    opened.page.on("request", (request) => {
      if (request.headers()["next-router-prefetch"]) fetchedAhead.push(new URL(request.url()).pathname);
    });
    await opened.goto("/");
    // the framework's default would have fetched every link on screen by now (the kind cards, the bottom bar)
    await opened.page.waitForTimeout(2_500);
    expect(fetchedAhead).toEqual([]);
    await opened.page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Jobs" }).dispatchEvent("touchstart");
    await expect.poll(() => fetchedAhead, { timeout: 10_000 }).toContain("/jobs");
    expect(opened.consoleErrors).toEqual([]);
  });

  test("touch targets on the phone are at least 44 px tall", async () => {
    const { page } = await session.open("/", { viewport: "phone" });
    const small = await page.evaluate(() =>
      Array.from(document.querySelectorAll<HTMLElement>("main a, main button, nav a, nav button"))
        .filter((element) => element.offsetParent !== null)
        .map((element) => ({ text: (element.textContent ?? "").trim(), height: element.getBoundingClientRect().height }))
        .filter((target) => target.height < 44),
    );
    expect(small).toEqual([]);
  });
});

describe("GET /api/health", () => {
  test("answers ok with the database up", async () => {
    const response = await fetch(`${baseUrl()}/api/health`);
    expect(response.status).toBe(200);
    const body: unknown = await response.json();
    expect(body).toMatchObject({ ok: true, db: "up" });
  });
});
