// The database going away under the running app, from outside: the test PostgreSQL cluster is stopped, the app
// is asked for pages and routes, and the cluster is started again. Pages that need saved records answer 503 with
// a plain "try again in a minute" page (never a 500); sizing and checking keep answering from the tables the app
// last read; routes that need the database answer a JSON 503; once the database is back everything answers as
// before without restarting the app.
import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, test } from "vitest";
import { baseUrl, setupBrowser } from "./support/browser";
import { Client, ownsTestCluster, startTestCluster, stopTestCluster, until, JOIST_REQUEST as joist } from "./support/instances";

const session = setupBrowser();
/** A crew link token of the right shape (43 URL-safe base64 characters) that names no link: only the database can say so. */
const UNKNOWN_CREW_TOKEN = randomBytes(32).toString("base64url");
const BUILDER = { email: "dee@hollisrowe.test", password: "builder-demo-pass" }; // seeders/ demo account (invented)

const postJson = (path: string, body: unknown) =>
  fetch(`${baseUrl()}${path}`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

let stopped = false;
afterAll(async () => {
  if (stopped) await startTestCluster(); // never leave the other tests without their database
});

describe.skipIf(!ownsTestCluster())("the database stops under the running app, then comes back", () => {
  test("pages answer 503 with a plain try-again page, sizing keeps working from the cached tables, and it all recovers by itself", async () => {
    const builder = new Client();
    await builder.signIn(baseUrl(), BUILDER.email, BUILDER.password);
    const jobsBefore = await builder.fetch(`${baseUrl()}/jobs`);
    expect(jobsBefore.status).toBe(200);
    const jobsPage = await jobsBefore.text(); // the whole page arrives and the response ends
    expect(jobsPage).toContain("</html>");
    const checked = await postJson("/api/check", joist); // the app now holds the current tables in memory
    expect(checked.status).toBe(200);
    const version = ((await checked.json()) as { tables: string }).tables;

    await stopTestCluster();
    stopped = true;

    // A page that needs saved records: 503, Retry-After, the plain page (no stack, no reference to look up).
    for (const path of ["/jobs", "/account"]) {
      const res = await builder.fetch(`${baseUrl()}${path}`);
      expect(res.status, path).toBe(503);
      expect(res.headers.get("retry-after")).toBe("60");
      expect(res.headers.get("content-type")).toMatch(/^text\/html/);
      const html = await res.text();
      expect(html).toContain("<h1>Try again in a minute</h1>");
      expect(html).toContain("cannot reach its saved records");
      expect(html).toMatch(/<meta http-equiv="refresh" content="\d+">/);
    }
    // A public page that reads the database (a crew link) is the same; with the database up it is a 404.
    const crew = await fetch(`${baseUrl()}/crew/${UNKNOWN_CREW_TOKEN}`);
    expect(crew.status).toBe(503);

    // Sizing and checking answer from the tables read before the database went.
    const check = await postJson("/api/check", joist);
    expect(check.status).toBe(200);
    expect(((await check.json()) as { tables: string }).tables).toBe(version);
    const size = await postJson("/api/size", { ...joist, member: { material: "sawn" } });
    expect(size.status).toBe(200);
    expect(((await size.json()) as { tables: string }).tables).toBe(version);
    // The sizing steps are a page that needs no database: it still opens.
    expect((await fetch(`${baseUrl()}/size`)).status).toBe(200);
    // A route that needs the database: JSON 503 with words.
    const health = await fetch(`${baseUrl()}/api/health`);
    expect(health.status).toBe(503);
    expect(await health.json()).toMatchObject({ db: "down" });

    // What a builder's phone shows (and the desktop).
    for (const viewport of ["phone", "desktop"] as const) {
      const opened = await session.open(null, { viewport, allowConsole: [/503/] });
      await opened.goto(`/crew/${UNKNOWN_CREW_TOKEN}`);
      await expect(opened.page.getByRole("heading", { name: "Try again in a minute" }).isVisible()).resolves.toBe(true);
      await expect(opened.page.getByRole("link", { name: "Size a member" }).isVisible()).resolves.toBe(true);
      await opened.screenshot(`database-down-page-${viewport}`);
      await opened.close();
    }

    await startTestCluster();
    stopped = false;

    // Back by itself: the same session's pages answer again within seconds, no restart.
    const back = await until(
      async () => (await builder.fetch(`${baseUrl()}/jobs`)).status,
      (status) => status === 200,
      30_000,
      500,
    );
    expect(back.value).toBe(200);
    expect(await (await builder.fetch(`${baseUrl()}/jobs`)).text()).toContain("</html>");
    expect((await fetch(`${baseUrl()}/api/health`)).status).toBe(200);
    expect((await postJson("/api/check", joist)).status).toBe(200);
  }, 120_000);
});
