// Main-thread work of a first load (issue: Lighthouse mobile performance), as the CPU time Chromium's own trace
// records for the page's main thread (each event's thread time, `tdur`), not wall time: on a shared machine wall
// time follows the load average, while the thread's CPU time stays within about 10% from run to run. Times are
// unthrottled; Lighthouse's mobile audit multiplies what it observes by 4 (its default CPU slowdown), so a task of
// more than 12.5 ms here is a "long task" (over 50 ms) there and counts toward Total Blocking Time.
//
// `npm run bench main-thread` measures a running app at WEIGHT_BASE_URL or E2E_BASE_URL (default
// http://127.0.0.1:3000, what `npm start` serves): /, /size, and the paths in WEIGHT_PATHS (e.g. a crew link),
// MAIN_THREAD_RUNS fresh visits each (default 5), reporting the median.
import { chromium, type Browser } from "playwright-core";
import { median } from "./support/stats";

type TraceEvent = { name: string; ph: string; pid: number; tid: number; ts: number; dur?: number; tdur?: number; args?: Record<string, unknown> };

export type MainThreadRun = {
  /** CPU ms of every top-level task on the page's main thread, from navigation to 3 s after load */
  totalMs: number;
  /** CPU ms in script: evaluation, calls, microtasks (hydration runs there), compiling */
  scriptMs: number;
  /** CPU ms in style, layout and paint */
  renderMs: number;
  /** tasks over 12.5 ms of CPU (over 50 ms at Lighthouse's 4x), and the CPU beyond 12.5 ms summed over them */
  longTasks: number;
  blockingMs: number;
};

const SCRIPT = new Set([
  "EvaluateScript",
  "FunctionCall",
  "RunMicrotasks",
  "v8.compile",
  "v8.compileModule",
  "v8.evaluateModule",
  "TimerFire",
  "FireIdleCallback",
  "FireAnimationFrame",
]);
const RENDER = new Set(["UpdateLayoutTree", "Layout", "Paint", "PrePaint", "Layerize", "Commit", "ParseAuthorStyleSheet", "RecalculateStyles"]);
const TASKS = new Set(["RunTask", "ThreadControllerImpl::RunTask"]);
const LONG_CPU_US = 12_500;

/** One fresh visit (empty cache, phone screen) traced until 3 s after its load event. */
export async function traceFirstLoad(browser: Browser, url: string): Promise<MainThreadRun> {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true });
  try {
    const page = await context.newPage();
    await browser.startTracing(page, { categories: ["devtools.timeline", "disabled-by-default-devtools.timeline", "v8.execute", "loading"] });
    await page.goto(url, { waitUntil: "load" });
    await page.waitForTimeout(3000);
    const { traceEvents } = JSON.parse((await browser.stopTracing()).toString()) as { traceEvents: TraceEvent[] };
    // the renderer main thread that parsed this page (the browser may keep other renderers, e.g. a new-tab page)
    const host = new URL(url).host;
    const parsed = traceEvents.find((e) => e.name === "ParseHTML" && JSON.stringify(e.args ?? {}).includes(host));
    if (!parsed) throw new Error(`no trace of ${url} being parsed`);
    const own = traceEvents.filter((e) => e.pid === parsed.pid && e.tid === parsed.tid && e.ph === "X" && e.tdur !== undefined);
    const tasks = own.filter((e) => TASKS.has(e.name));
    // sum each kind's outermost events only, so nested events of the same kind are not counted twice
    const outermost = (kinds: Set<string>) => {
      const xs = own.filter((e) => kinds.has(e.name)).sort((a, b) => a.ts - b.ts);
      let end = -Infinity;
      let sum = 0;
      for (const e of xs) {
        if (e.ts < end) continue;
        sum += e.tdur ?? 0;
        end = e.ts + (e.dur ?? 0);
      }
      return sum / 1000;
    };
    const topLevel = tasks.filter((t) => !tasks.some((p) => p !== t && p.ts <= t.ts && p.ts + (p.dur ?? 0) >= t.ts + (t.dur ?? 0)));
    const long = topLevel.filter((t) => (t.tdur ?? 0) > LONG_CPU_US);
    return {
      totalMs: topLevel.reduce((sum, t) => sum + (t.tdur ?? 0), 0) / 1000,
      scriptMs: outermost(SCRIPT),
      renderMs: outermost(RENDER),
      longTasks: long.length,
      blockingMs: long.reduce((sum, t) => sum + (t.tdur ?? 0) - LONG_CPU_US, 0) / 1000,
    };
  } finally {
    await context.close();
  }
}

export async function run(): Promise<void> {
  const baseUrl = (process.env.WEIGHT_BASE_URL ?? process.env.E2E_BASE_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
  const runs = Math.max(1, Number(process.env.MAIN_THREAD_RUNS ?? 5));
  const alive = await fetch(`${baseUrl}/api/health`).then(
    (r) => r.ok,
    () => false,
  );
  console.log(`\nMain-thread CPU of a first load at ${baseUrl} (phone, empty cache, unthrottled; median of ${runs})`);
  if (!alive) {
    console.log(`  skipped: no app answers at ${baseUrl} (start it with npm start, or set WEIGHT_BASE_URL)`);
    return;
  }
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: ["--headless=new", "--no-sandbox"] });
  try {
    const extra = (process.env.WEIGHT_PATHS ?? "").split(",").filter((p) => p.startsWith("/"));
    console.log("| page | main thread | script | style, layout, paint | tasks over 12.5 ms (50 ms at 4x) | CPU beyond 12.5 ms in them (× 4 ≈ TBT) |");
    console.log("|---|---|---|---|---|---|");
    for (const path of ["/", "/size", ...extra]) {
      const all: MainThreadRun[] = [];
      for (let i = 0; i < runs; i++) all.push(await traceFirstLoad(browser, `${baseUrl}${path}`));
      const m = (key: keyof MainThreadRun) => median(all.map((r) => r[key]));
      console.log(
        `| ${path} | ${m("totalMs").toFixed(0)} ms | ${m("scriptMs").toFixed(0)} ms | ${m("renderMs").toFixed(0)} ms | ${m("longTasks")} | ${m("blockingMs").toFixed(0)} ms |`,
      );
    }
  } finally {
    await browser.close();
  }
}
