// Page weight (issue: a flow for a phone on a weak signal): the JavaScript the first load of a page carries,
// summed from what Chromium fetches, as bytes over the wire (compressed) and as code (decoded). Sizes, not
// times. `npm run bench weight` measures a running app at WEIGHT_BASE_URL or E2E_BASE_URL (default
// http://127.0.0.1:3000, what `npm start` serves), plus the paths in WEIGHT_PATHS; tests/e2e/sunlight.e2e.test.ts
// holds /size to 1.3x the home page.
import { chromium, type Browser } from "playwright-core";

export type ScriptWeight = { url: string; transferBytes: number; decodedBytes: number; afterLoad: boolean };
export type PageWeight = { path: string; scripts: ScriptWeight[]; transferBytes: number; decodedBytes: number; afterLoadTransferBytes: number };

/**
 * The scripts a fresh visit (empty cache, phone screen) fetches up to the page's load event and a second of
 * quiet after it: what the page needs to start, not what a later tap asks for.
 */
export async function measurePageScripts(browser: Browser, baseUrl: string, path: string): Promise<PageWeight> {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true });
  try {
    const page = await context.newPage();
    const pending: Promise<ScriptWeight | null>[] = [];
    let loaded = false;
    page.on("load", () => (loaded = true));
    page.on("requestfinished", (request) => {
      if (request.resourceType() !== "script") return;
      // requested once the page had loaded: code deferred until then (the offline shell), not needed to start
      const afterLoad = loaded;
      pending.push(
        (async () => {
          const [sizes, response] = await Promise.all([request.sizes(), request.response()]);
          const body = response ? await response.body().catch(() => null) : null;
          return { url: request.url().replace(baseUrl, ""), transferBytes: sizes.responseBodySize, decodedBytes: body?.length ?? 0, afterLoad };
        })(),
      );
    });
    await page.goto(`${baseUrl}${path}`, { waitUntil: "load" });
    await page.waitForTimeout(1000);
    const scripts = (await Promise.all(pending)).filter((s): s is ScriptWeight => s !== null).sort((a, b) => b.decodedBytes - a.decodedBytes);
    return {
      path,
      scripts,
      transferBytes: scripts.reduce((sum, s) => sum + s.transferBytes, 0),
      decodedBytes: scripts.reduce((sum, s) => sum + s.decodedBytes, 0),
      afterLoadTransferBytes: scripts.filter((s) => s.afterLoad).reduce((sum, s) => sum + s.transferBytes, 0),
    };
  } finally {
    await context.close();
  }
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;

export async function run(): Promise<void> {
  const baseUrl = (process.env.WEIGHT_BASE_URL ?? process.env.E2E_BASE_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
  const alive = await fetch(`${baseUrl}/api/health`).then(
    (r) => r.ok,
    () => false,
  );
  console.log(`\nPage weight: JavaScript of a first load at ${baseUrl} (phone, empty cache)`);
  if (!alive) {
    console.log(`  skipped: no app answers at ${baseUrl} (start it with npm start, or set WEIGHT_BASE_URL)`);
    return;
  }
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: ["--headless", "--no-sandbox"] });
  try {
    const home = await measurePageScripts(browser, baseUrl, "/");
    const rows = [home];
    // WEIGHT_PATHS adds pages (comma-separated paths), e.g. a crew link made for the demo job
    const extra = (process.env.WEIGHT_PATHS ?? "").split(",").filter((p) => p.startsWith("/"));
    for (const path of ["/size", "/size?kind=header", "/pricing", ...extra]) rows.push(await measurePageScripts(browser, baseUrl, path));
    console.log("| page | scripts | over the wire | of which after the load event | code | × home (wire) | target |");
    console.log("|---|---|---|---|---|---|---|");
    for (const row of rows) {
      const ratio = row.transferBytes / home.transferBytes;
      console.log(
        `| ${row.path} | ${row.scripts.length} | ${kb(row.transferBytes)} | ${kb(row.afterLoadTransferBytes)} | ${kb(row.decodedBytes)} | ${ratio.toFixed(2)} | ${row.path === "/size" ? "≤ 1.30" : "—"} |`,
      );
    }
  } finally {
    await browser.close();
  }
}
