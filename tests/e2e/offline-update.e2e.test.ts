// A new release while a builder is mid-flow, in Chromium against the built app: release A is served, the
// builder starts sizing a header, then release B replaces it at the same address. B is this build with one
// precache entry's revision changed (the /offline page's, which every build makes anew: app/serwist/[path]/route.ts),
// so its service worker script differs byte for byte, as a new deploy's does. The browser finds it when the app
// comes back to the screen (the shell calls Serwist's update() on visibilitychange; a page load does the same),
// installs it and leaves it waiting (skipWaiting is off): the prompt shows, the page, its step and the typed span
// stay as they were. Reload activates the new worker (its precache replaces A's) and the flow reopens where it was.
import { execFile } from "node:child_process";
import { randomUUID } from "node:crypto";
import { mkdtemp, readdir, readFile, rm, symlink, unlink, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, test } from "vitest";
import { setupBrowser } from "./support/browser";
import { nextStep, typeLength } from "./support/flow";
import { extraPort, startApp, type AppProcess } from "./support/instances";
import { appDatabaseUrl } from "./support/offline";

const run = promisify(execFile);
const ROOT = path.resolve(__dirname, "../..");
const session = setupBrowser();
const SW_BODY = ".next/server/app/serwist/sw.js.body";
const OFFLINE_ENTRY = /revision:"([0-9a-f-]{36})",url:"\/offline"/;

/** Release B: a folder beside the worktree with this build hard-linked in and the worker's /offline revision made new. */
async function releaseB(): Promise<{ dir: string; revision: string }> {
  const dir = await mkdtemp(path.join(os.tmpdir(), "spanlark-release-b-"));
  for (const name of await readdir(ROOT)) {
    if (name !== ".next") await symlink(path.join(ROOT, name), path.join(dir, name));
  }
  await run("cp", ["-al", path.join(ROOT, ".next"), path.join(dir, ".next")]);
  // the server's own cache is not shared between releases (and a hard link would write through to A's)
  await rm(path.join(dir, ".next/cache"), { recursive: true, force: true });
  const body = await readFile(path.join(dir, SW_BODY), "utf8");
  const entry = OFFLINE_ENTRY.exec(body);
  if (!entry) throw new Error(`no /offline precache entry in ${SW_BODY}`);
  const revision = randomUUID();
  // the prerendered worker and the copy Next serves it from (.next/server/route-cache/…), its source map too
  const { stdout } = await run("grep", ["-rlF", entry[1]!, path.join(dir, ".next/server")]);
  const files = stdout.split("\n").filter(Boolean);
  expect(files.length).toBeGreaterThanOrEqual(2);
  for (const file of files) {
    const text = await readFile(file, "utf8");
    await unlink(file); // a new file, not a write through the hard link into A's build
    await writeFile(file, text.replaceAll(entry[1]!, revision));
  }
  return { dir, revision };
}

/** The revision of /offline in the service worker's precache (the active worker's, after it cleaned up). */
async function precachedOfflineRevisions(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const found: string[] = [];
    for (const name of await caches.keys()) {
      if (!name.includes("precache")) continue;
      for (const req of await (await caches.open(name)).keys()) {
        const url = new URL(req.url);
        if (url.pathname === "/offline") found.push(url.searchParams.get("__WB_REVISION__") ?? "");
      }
    }
    return found;
  });
}

async function workers(page: Page): Promise<{ active: string | null; waiting: string | null }> {
  return page.evaluate(async () => {
    const r = await navigator.serviceWorker.getRegistration();
    return { active: r?.active?.state ?? null, waiting: r?.waiting?.state ?? null };
  });
}

let app: AppProcess | null = null;
let dirB: string | null = null;
afterAll(async () => {
  await app?.stop();
  if (dirB) await rm(dirB, { recursive: true, force: true });
});

describe("a newer Spanlark while sizing", () => {
  test("offered, not forced: the flow in progress carries on; Reload activates the new worker", async () => {
    const port = extraPort(5);
    const url = `http://127.0.0.1:${port}`;
    const env = { DATABASE_URL: await appDatabaseUrl(), APP_URL: url, NEXTAUTH_URL: url };
    const b = await releaseB();
    dirB = b.dir;
    const revisionA = OFFLINE_ENTRY.exec(await readFile(path.join(ROOT, SW_BODY), "utf8"))![1]!;

    app = await startApp(port, env);
    const opened = await session.open(null, { viewport: "phone", allowConsole: [/ERR_CONNECTION_REFUSED/, /Failed to (load resource|fetch)/] });
    const { page } = opened;
    await opened.goto(`${url}/size`);
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null, null, { timeout: 30_000 });
    await expect.poll(() => precachedOfflineRevisions(page), { timeout: 30_000 }).toEqual([revisionA]);

    // mid-flow: a header, its span typed
    await page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
    await page.getByText("Header", { exact: true }).click();
    await nextStep(page, /Next: Span and supports/);
    await typeLength(page, /^Span \(between supports\)/, "7'");
    await page.evaluate(() => {
      (window as unknown as { sameDocument: boolean }).sameDocument = true;
    });
    const address = page.url();

    // release B at the same address
    await app.stop();
    app = await startApp(port, env, b.dir);
    await page.evaluate(() => document.dispatchEvent(new Event("visibilitychange")));
    const prompt = page.getByRole("status").filter({ hasText: "A newer Spanlark is ready." });
    await prompt.waitFor({ timeout: 60_000 });
    await opened.screenshot("offline-8-update-offered", { fullPage: false });

    // not forced: the same document, step and typed span; the new worker waits behind the old one
    await page.waitForTimeout(3_000);
    expect(await page.evaluate(() => (window as unknown as { sameDocument?: boolean }).sameDocument)).toBe(true);
    expect(page.url()).toBe(address);
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    expect(
      await page
        .getByLabel(/^Span \(between supports\)/)
        .first()
        .inputValue(),
    ).toMatch(/^7' 0"?$/);
    expect(await workers(page)).toEqual({ active: "activated", waiting: "installed" });
    expect(await precachedOfflineRevisions(page)).toEqual(expect.arrayContaining([revisionA, b.revision]));

    // Reload: B's worker takes over, the page reloads and the flow is where it was
    await Promise.all([page.waitForEvent("load", { timeout: 30_000 }), prompt.getByRole("button", { name: "Reload" }).click()]);
    await page.getByRole("heading", { name: /Step 2 of 5/ }).waitFor();
    expect(await page.evaluate(() => (window as unknown as { sameDocument?: boolean }).sameDocument)).toBeUndefined();
    expect(
      await page
        .getByLabel(/^Span \(between supports\)/)
        .first()
        .inputValue(),
    ).toMatch(/^7' 0"?$/);
    await expect.poll(() => workers(page), { timeout: 15_000 }).toEqual({ active: "activated", waiting: null });
    // A's precache was cleaned up by B's worker on activation: only B's revision is left
    await expect.poll(() => precachedOfflineRevisions(page), { timeout: 15_000 }).toEqual([b.revision]);
    expect(await page.getByText("A newer Spanlark is ready.").count()).toBe(0);
  }, 240_000);
});
