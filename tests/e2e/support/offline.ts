// Helpers for the browser tests with no signal (tests/e2e/offline*.e2e.test.ts): cutting and restoring the
// network for a context (the page's own requests and the service worker's), waiting until the worker has kept
// pages and tables on the phone, and reading what reached the app's database.
import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import pg from "pg";
import type { BrowserContext, Page, Route } from "playwright-core";
import { expect } from "vitest";

const run = promisify(execFile);
const ROOT = path.resolve(__dirname, "../../..");

// requests refused while offline, and the prefetches the router tries then
export const OFFLINE_NOISE = [/ERR_INTERNET_DISCONNECTED/, /ERR_FAILED/, /Failed to fetch/, /favicon\.ico/];

/** Cuts the network: the page's own requests (setOffline) and any the service worker sends for it. */
export async function goOffline(context: BrowserContext): Promise<void> {
  await context.setOffline(true);
  await context.route("**/*", refuseFromWorker);
}

export async function goOnline(context: BrowserContext): Promise<void> {
  await context.unroute("**/*", refuseFromWorker);
  await context.setOffline(false);
}

function refuseFromWorker(route: Route): Promise<void> {
  return route.request().serviceWorker() ? route.abort("internetdisconnected") : route.fallback();
}

/** Waits until the service worker controls the page and has kept `paths` and the material tables on the phone. */
export async function waitUntilKept(page: Page, paths: string[]): Promise<void> {
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, null, { timeout: 30_000 });
  await expect
    .poll(
      () =>
        page.evaluate(async (wanted) => {
          const cache = await caches.open("spanlark-pages");
          const kept = (await cache.keys()).map((r) => new URL(r.url).pathname);
          const tables = await new Promise<boolean>((resolve) => {
            const open = indexedDB.open("spanlark-tables");
            open.onsuccess = () => {
              const db = open.result;
              if (!db.objectStoreNames.contains("tables")) return resolve(false);
              const get = db.transaction("tables").objectStore("tables").get("current");
              get.onsuccess = () => resolve(Boolean(get.result));
              get.onerror = () => resolve(false);
            };
            open.onerror = () => resolve(false);
          });
          return tables && wanted.every((p) => kept.includes(p));
        }, paths),
      { timeout: 30_000, interval: 500 },
    )
    .toBe(true);
}

/** The database the app under test uses: E2E_DATABASE_URL, or the test cluster's spanlark_e2e (scripts/test.sh). */
export async function appDatabaseUrl(): Promise<string> {
  if (process.env.E2E_DATABASE_URL) return process.env.E2E_DATABASE_URL;
  const { stdout } = await run("bash", ["scripts/pg.sh", "url", "spanlark_e2e"], { cwd: ROOT });
  return stdout.trim();
}

/** Rows in the app's database: how many live members named `label` live in live jobs named `jobName`. */
export async function membersInDatabase(jobName: string, label: string): Promise<number> {
  const client = new pg.Client({ connectionString: await appDatabaseUrl() });
  await client.connect();
  try {
    const res = await client.query(
      `SELECT count(*)::int AS n FROM members m JOIN jobs j ON j.id = m.job_id
        WHERE j.name = $1 AND m.label = $2 AND m.deleted_at IS NULL AND j.deleted_at IS NULL`,
      [jobName, label],
    );
    return (res.rows[0] as { n: number }).n;
  } finally {
    await client.end();
  }
}

/** A member's span and name as the app's database holds them. */
export async function memberInDatabase(memberId: string): Promise<{ label: string; lengthFt: number } | null> {
  const client = new pg.Client({ connectionString: await appDatabaseUrl() });
  await client.connect();
  try {
    const res = await client.query(`SELECT label, (flow_state->>'lengthFt')::float AS "lengthFt" FROM members WHERE id = $1`, [memberId]);
    return (res.rows[0] as { label: string; lengthFt: number } | undefined) ?? null;
  } finally {
    await client.end();
  }
}

/** On /size (from the phone's copy or the server), sizes a header of `span` and saves it to a new job; waits for the queued-save note. */
export async function sizeHeaderAndSaveOffline(page: Page, jobName: string, label: string, span = "6'"): Promise<void> {
  const { nextStep, typeLength, waitForAnswer } = await import("./flow");
  await page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
  await page.getByText("Header", { exact: true }).click();
  await nextStep(page, /Next: Span and supports/);
  await typeLength(page, /^Span \(between supports\)/, span);
  await nextStep(page, /Next: Loads/);
  await nextStep(page, /Next: Material/);
  await nextStep(page, /See the answer/);
  await waitForAnswer(page);
  await page.getByRole("button", { name: "Save to a job" }).click();
  const dialog = page.getByRole("dialog", { name: "Save to a job" });
  await dialog.getByLabel("Job", { exact: true }).selectOption({ value: "new" });
  await dialog.getByLabel("New job's name").fill(jobName);
  await dialog.getByLabel(/Member name/).fill(label);
  await dialog.getByRole("button", { name: "Save" }).click();
  await page.getByText(`No signal: ${label} is saved on this phone and goes to ${jobName} when the signal is back.`).waitFor();
}

/** Waits until the service worker has kept the page at `pathAndQuery` (its cache key) on the phone. */
export async function waitUntilPageKept(page: Page, pathAndQuery: string): Promise<void> {
  await expect
    .poll(
      () =>
        page.evaluate(async (p) => {
          const keys = await (await caches.open("spanlark-pages")).keys();
          return keys.some((r) => {
            const u = new URL(r.url);
            return u.pathname + u.search === p;
          });
        }, pathAndQuery),
      { timeout: 30_000, interval: 500 },
    )
    .toBe(true);
}

/** The records of what this phone sent (lib/offline/queue.ts, IndexedDB "spanlark-sent"). */
export async function sentOnPhone(page: Page): Promise<{ key: string; by: string; label: string; kind: string }[]> {
  return page.evaluate(
    () =>
      new Promise((resolve) => {
        const open = indexedDB.open("spanlark-sent");
        open.onsuccess = () => {
          const db = open.result;
          if (!db.objectStoreNames.contains("sent")) return resolve([]);
          const all = db.transaction("sent").objectStore("sent").getAll();
          all.onsuccess = () => resolve(all.result as { key: string; by: string; label: string; kind: string }[]);
          all.onerror = () => resolve([]);
        };
        open.onerror = () => resolve([]);
      }),
  );
}
