// HTTP throughput of the health route (GET /api/health: the app answers and asks PostgreSQL "SELECT 1") with one
// server process and with SPANLARK_WORKERS processes (scripts/serve.mjs, one per core by default), beside a bare
// node:http server on the same machine as the ceiling. `npm run bench http`; needs the built app (`npx next build`)
// and a PostgreSQL: DATABASE_URL, or the local cluster (scripts/pg.sh, SPANLARK_PG_PORT) which it starts.
// Every run is bounded (BENCH_HTTP_SECONDS, default 10 s, 50 connections) and on 127.0.0.1 only.
import { execFileSync, spawn, spawnSync, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import autocannon from "autocannon";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const SECONDS = Number(process.env.BENCH_HTTP_SECONDS ?? "10");
const CONNECTIONS = 50;
const PORT = Number(process.env.BENCH_HTTP_PORT ?? String(Number(process.env.E2E_PORT ?? "3100") + 20));

interface Figures {
  label: string;
  requestsPerSecond: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
}

/** Set when this benchmark started the local cluster, so it stops it again. */
let startedCluster = false;

function databaseUrl(): string {
  if (process.env.DATABASE_URL) return process.env.DATABASE_URL;
  const started = spawnSync("bash", ["scripts/pg.sh", "start"], { cwd: ROOT, encoding: "utf8" });
  if (started.status !== 0) throw new Error(`scripts/pg.sh start failed: ${started.stderr}`);
  startedCluster = /started on/.test(started.stderr);
  execFileSync("bash", ["scripts/pg.sh", "ensure-db", "spanlark_bench"], { cwd: ROOT, stdio: "ignore" });
  return execFileSync("bash", ["scripts/pg.sh", "url", "spanlark_bench"], { cwd: ROOT }).toString().trim();
}

async function waitFor(url: string, child: ChildProcess): Promise<void> {
  const deadline = Date.now() + 120_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the server exited (${child.exitCode}) before answering ${url}`);
    try {
      if ((await fetch(url, { signal: AbortSignal.timeout(2_000) })).status === 200) return;
    } catch {
      // not yet
    }
    if (Date.now() > deadline) throw new Error(`no answer from ${url} in 120 s`);
    await new Promise((r) => setTimeout(r, 300));
  }
}

async function stop(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return;
  const exited = new Promise((resolve) => child.once("exit", resolve));
  child.kill("SIGTERM");
  const timer = setTimeout(() => child.kill("SIGKILL"), 10_000);
  await exited;
  clearTimeout(timer);
}

async function measure(label: string, url: string): Promise<Figures> {
  await autocannon({ url, connections: 10, duration: 2 }); // warm-up: compiled routes, pooled connections
  const result = await autocannon({ url, connections: CONNECTIONS, duration: SECONDS });
  return {
    label,
    requestsPerSecond: result.requests.average,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
  };
}

async function bareNode(): Promise<Figures> {
  const child = spawn(
    process.execPath,
    [
      "-e",
      `require("node:http").createServer((q, s) => { s.setHeader("content-type", "application/json"); s.end('{"ok":true}'); }).listen(${PORT}, "127.0.0.1")`,
    ],
    { stdio: "ignore" },
  );
  try {
    await waitFor(`http://127.0.0.1:${PORT}/`, child);
    return await measure("bare node:http server (ceiling)", `http://127.0.0.1:${PORT}/`);
  } finally {
    await stop(child);
  }
}

async function spanlark(workers: number, dbUrl: string): Promise<Figures> {
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    LOG_LEVEL: "warn",
    DATABASE_URL: dbUrl,
    APP_URL: `http://127.0.0.1:${PORT}`,
    NEXTAUTH_URL: `http://127.0.0.1:${PORT}`,
    NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET ?? randomBytes(24).toString("hex"),
    SPANLARK_WORKERS: String(workers),
  };
  const child = spawn(process.execPath, ["scripts/serve.mjs", "-H", "127.0.0.1", "-p", String(PORT)], { cwd: ROOT, env, stdio: "ignore" });
  try {
    const url = `http://127.0.0.1:${PORT}/api/health`;
    await waitFor(url, child);
    // With several processes, every one must be up before measuring: the primary hands connections out in turn.
    for (let i = 0; i < workers * 3; i += 1) await waitFor(url, child);
    return await measure(`Spanlark, ${workers} process${workers === 1 ? "" : "es"} (SPANLARK_WORKERS=${workers})`, url);
  } finally {
    await stop(child);
  }
}

export async function run(): Promise<void> {
  if (!existsSync(path.join(ROOT, ".next", "BUILD_ID"))) {
    console.log("\nHTTP throughput: skipped — build the app first (npx next build).");
    return;
  }
  const cores = availableParallelism();
  const dbUrl = databaseUrl();
  console.log(`\nHTTP throughput, GET /api/health (answers after a "SELECT 1"): ${CONNECTIONS} connections, ${SECONDS} s each, ${cores} cores`);
  console.log(`load average before: ${loadavg()[0]!.toFixed(1)}`);
  const rows = [await bareNode()];
  try {
    rows.push(await spanlark(1, dbUrl));
    if (cores > 1) rows.push(await spanlark(cores, dbUrl));
  } finally {
    if (startedCluster) execFileSync("bash", ["scripts/pg.sh", "stop"], { cwd: ROOT, stdio: "ignore" });
  }
  console.log("| server | requests/s | p50 | p99 | errors | non-2xx |");
  console.log("|---|---|---|---|---|---|");
  for (const r of rows) {
    console.log(`| ${r.label} | ${Math.round(r.requestsPerSecond).toLocaleString("en-US")} | ${r.p50Ms} ms | ${r.p99Ms} ms | ${r.errors} | ${r.non2xx} |`);
  }
  const [, one, many] = rows;
  if (one && many) console.log(`${many.label.split(",")[1]!.trim()} / 1 process: ×${(many.requestsPerSecond / one.requestsPerSecond).toFixed(2)}`);
  console.log(`load average after: ${loadavg()[0]!.toFixed(1)}`);
}
