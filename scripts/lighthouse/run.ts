// Lighthouse, mobile (its default: a mid-range phone on a slow 4G link, simulated), in Debian's Chromium, against
// a running Spanlark at the URL given: the home page, the sizing flow and a crew link (made for the demo
// subscriber's first job through the job page). Each page runs RUNS times (default 3); the median run by
// performance score is reported, with what held a page below its target. Exits 1 when a page misses
// performance >= 95 or best practices = 100. `npm run lighthouse` starts everything and calls this.
import { mkdirSync, writeFileSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import lighthouse from "lighthouse";
import { chromium, type Browser } from "playwright-core";

const base = (process.argv[2] ?? process.env.LIGHTHOUSE_BASE_URL ?? "http://127.0.0.1:3200").replace(/\/$/, "");
const RUNS = Math.max(1, Number(process.env.RUNS ?? 3));
const PORT = Number(process.env.LIGHTHOUSE_CDP_PORT ?? 9333);
const TARGET = { performance: 0.95, bestPractices: 1 };
// Lighthouse's throttling: its default (4x CPU slowdown), or CPU_SLOWDOWN=N. CALIBRATE=1 adds, after each page's
// default runs, RUNS more with the slowdown calibrated to this machine as Lighthouse's docs/throttling.md
// ("Calibrating the CPU slowdown") describes: the default 4x is meant for a host in the high-end desktop bracket
// (benchmarkIndex 1500-2000); a slower host gets a proportionally smaller multiplier, so the page is judged on the
// same emulated phone. Reported as a second, labelled table; the exit status follows the first.
const CPU_SLOWDOWN = process.env.CPU_SLOWDOWN ? Number(process.env.CPU_SLOWDOWN) : undefined;
const CALIBRATE = process.env.CALIBRATE === "1";
/** the middle of the high-end desktop bracket of benchmarkIndex, the host the default 4x slowdown is meant for */
const REFERENCE_INDEX = 1750;
const calibratedSlowdown = (benchmarkIndex: number) => Math.min(4, Math.max(1, Math.round((40 * benchmarkIndex) / REFERENCE_INDEX) / 10));
// Every run's full report is kept here (JSON) to read where the time goes.
const REPORTS = process.env.LIGHTHOUSE_REPORTS ?? ".data/lighthouse";
// the demo subscriber (seeders/20261201100000-demo-accounts.ts), whose jobs the demo seeder makes
const SAM = { email: "sam@hollisrowe.test", password: "subscriber-demo-pass" };

async function crewLinkPath(browser: Browser): Promise<string> {
  const context = await browser.newContext({ baseURL: base });
  try {
    const csrf = (await (await context.request.get("/api/auth/csrf")).json()) as { csrfToken: string };
    await context.request.post("/api/auth/callback/credentials", {
      form: { csrfToken: csrf.csrfToken, email: SAM.email, password: SAM.password, callbackUrl: `${base}/`, json: "true" },
    });
    const page = await context.newPage();
    await page.goto("/jobs");
    await page
      .getByRole("link", { name: /Marsh Lane addition/ })
      .first()
      .click();
    await page.getByRole("heading", { level: 1 }).waitFor();
    const rows = page.getByTestId("crew-link-row");
    if ((await rows.count()) === 0) {
      await page.getByTestId("crew-link-create").click();
      await rows.first().waitFor({ timeout: 15_000 });
    }
    return new URL(await rows.first().getByTestId("crew-link-url").inputValue()).pathname;
  } finally {
    await context.close();
  }
}

type Run = {
  benchmarkIndex: number;
  load: number;
  scriptMs: number;
  jsKb: number;
  performance: number;
  bestPractices: number;
  accessibility: number;
  metrics: Record<string, string>;
  misses: string[];
  /** Lighthouse's own failure to record the run (e.g. NO_NAVSTART, a trace it could not read), else null */
  failed: string | null;
};

const METRICS = [
  ["first-contentful-paint", "FCP"],
  ["largest-contentful-paint", "LCP"],
  ["total-blocking-time", "TBT"],
  ["cumulative-layout-shift", "CLS"],
  ["speed-index", "SI"],
] as const;

async function audit(url: string, name: string, cpuSlowdown: number | undefined): Promise<Run> {
  const load = loadavg()[0];
  const result = await lighthouse(
    url,
    { port: PORT, output: "json", logLevel: "error", onlyCategories: ["performance", "best-practices", "accessibility"] },
    cpuSlowdown === undefined ? undefined : { extends: "lighthouse:default", settings: { throttling: { cpuSlowdownMultiplier: cpuSlowdown } } },
  );
  if (!result) throw new Error(`Lighthouse gave no result for ${url}`);
  const { lhr } = result;
  mkdirSync(REPORTS, { recursive: true });
  writeFileSync(`${REPORTS}/${name.replace(/\W+/g, "-")}-${cpuSlowdown ?? 4}x-${Date.now()}.json`, String(result.report));
  type Items = { details?: { items?: Array<Record<string, unknown>> } };
  const breakdown = (lhr.audits["mainthread-work-breakdown"] as Items).details?.items ?? [];
  const scriptMs = breakdown.find((i) => i.group === "scriptEvaluation")?.duration as number | undefined;
  const requests = (lhr.audits["network-requests"] as Items).details?.items ?? [];
  const jsBytes = requests.filter((r) => r.resourceType === "Script").reduce((sum, r) => sum + Number(r.transferSize ?? 0), 0);
  const score = (id: string) => lhr.categories[id]?.score ?? 0;
  const misses: string[] = [];
  for (const category of ["performance", "best-practices"]) {
    for (const ref of lhr.categories[category]?.auditRefs ?? []) {
      const a = lhr.audits[ref.id];
      if (ref.weight > 0 && a.score !== null && a.score < 0.9) misses.push(`${category}: ${a.title}${a.displayValue ? ` (${a.displayValue})` : ""}`);
    }
  }
  return {
    benchmarkIndex: Math.round(lhr.environment.benchmarkIndex),
    load,
    scriptMs: Math.round(scriptMs ?? 0),
    jsKb: Math.round(jsBytes / 1024),
    performance: score("performance"),
    bestPractices: score("best-practices"),
    accessibility: score("accessibility"),
    metrics: Object.fromEntries(METRICS.map(([id, short]) => [short, lhr.audits[id]?.displayValue ?? "—"])),
    misses,
    failed: lhr.runtimeError?.code ?? null,
  };
}

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  args: ["--headless=new", "--no-sandbox", "--disable-gpu", `--remote-debugging-port=${PORT}`, "--no-first-run", "--disable-background-networking"],
});
let failed = false;
const median = <T>(values: T[], key: (v: T) => number): T => [...values].sort((x, y) => key(x) - key(y))[Math.floor(values.length / 2)];

/** RUNS audits of one page at one CPU slowdown (undefined: Lighthouse's default), as a table row and its runs. */
async function measure(name: string, path: string, cpuSlowdown: number | undefined): Promise<{ row: string; runs: Run[]; ok: boolean }> {
  const runs: Run[] = [];
  for (let i = 0; i < RUNS; i++) {
    // a run Lighthouse failed to record measures nothing: it is run again (twice at most) and left out of the median
    let run = await audit(`${base}${path}`, name, cpuSlowdown);
    for (let retry = 0; run.failed && retry < 2; retry++) {
      console.error(`${name}: Lighthouse could not record a run (${run.failed}); running it again`);
      run = await audit(`${base}${path}`, name, cpuSlowdown);
    }
    runs.push(run);
  }
  const recorded = runs.filter((r) => !r.failed);
  const mid = median(recorded.length > 0 ? recorded : runs, (r) => r.performance);
  const ok = mid.performance >= TARGET.performance && mid.bestPractices >= TARGET.bestPractices;
  if (mid.misses.length > 0) console.error(`${name}${cpuSlowdown === undefined ? "" : ` (calibrated, ${cpuSlowdown}x)`}:\n  ${mid.misses.join("\n  ")}`);
  const row =
    `| ${name} | ${Math.round(mid.performance * 100)} (runs ${runs.map((r) => (r.failed ? `not recorded: ${r.failed}` : Math.round(r.performance * 100))).join(", ")}) | ${Math.round(mid.bestPractices * 100)} | ${Math.round(mid.accessibility * 100)} | ` +
    `${METRICS.map(([, short]) => mid.metrics[short]).join(" · ")} | ${mid.scriptMs.toLocaleString("en-US")} ms | ${mid.jsKb} KB | ` +
    `${runs.map((r) => r.benchmarkIndex).join(", ")} | ${runs.map((r) => r.load.toFixed(1)).join(", ")} | ${cpuSlowdown ?? 4}x | ${ok ? "met" : "MISSED"} |`;
  return { row, runs, ok };
}

const HEADER = [
  "| page | performance (runs) | best practices | accessibility | FCP · LCP · TBT · CLS · SI | script evaluation | JS transferred | benchmarkIndex (runs) | load average (runs) | CPU slowdown | target (≥ 95, 100) |",
  "|---|---|---|---|---|---|---|---|---|---|---|",
];

try {
  const pages = [
    { name: "home", path: "/" },
    { name: "sizing flow", path: "/size" },
    { name: "crew link", path: await crewLinkPath(browser) },
  ];
  // Warm the server first: the first request each server process answers for a page is 3-10 times slower (100-330 ms
  // against 15-33 ms warm, measured with curl), and with one process per core behind node:cluster's round-robin,
  // two requests per core reach every process. The audits then measure the page, not the server's start-up.
  for (const p of pages) {
    for (let i = 0; i < 2 * availableParallelism(); i++) await (await fetch(base + p.path)).arrayBuffer();
  }
  const rows: string[] = [];
  const calibratedRows: string[] = [];
  for (const p of pages) {
    const measured = await measure(p.name, p.path, CPU_SLOWDOWN);
    rows.push(measured.row);
    // the exit status follows the default measurement (or the slowdown asked for with CPU_SLOWDOWN), never the calibrated one
    failed ||= !measured.ok;
    if (CALIBRATE) {
      const index = median(measured.runs, (r) => r.benchmarkIndex).benchmarkIndex;
      calibratedRows.push((await measure(p.name, p.path, calibratedSlowdown(index))).row);
    }
  }
  const version = (await import("lighthouse/package.json", { with: { type: "json" } })).default.version;
  const throttling =
    CPU_SLOWDOWN === undefined ? "Lighthouse's default throttling (4x CPU slowdown)" : `CPU slowdown set to ${CPU_SLOWDOWN}x (not the default)`;
  console.log(`\nLighthouse ${version}, mobile, ${throttling}, ${base}, median of ${RUNS} runs by performance score`);
  for (const line of [...HEADER, ...rows]) console.log(line);
  if (CALIBRATE) {
    console.log(
      `\nCALIBRATED (not the default): CPU slowdown = 4 × benchmarkIndex / ${REFERENCE_INDEX} (the median benchmarkIndex of the page's default runs; ` +
        'Lighthouse docs/throttling.md, "Calibrating the CPU slowdown"), median of ' +
        `${RUNS} runs`,
    );
    for (const line of [...HEADER, ...calibratedRows]) console.log(line);
  }
} finally {
  await browser.close();
}
process.exit(failed ? 1 : 0);
