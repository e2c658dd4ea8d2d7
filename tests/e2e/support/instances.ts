// Helpers for tests that run app processes of their own (tests/e2e/instances.e2e.test.ts,
// tests/e2e/database-down.e2e.test.ts): a database of their own in the test PostgreSQL cluster, the built app
// started with scripts/serve.mjs on a port of its own, and a small HTTP client with a cookie jar.
import { execFile, spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";

const run = promisify(execFile);
const ROOT = path.resolve(__dirname, "../../..");

/**
 * Whether this run owns the test PostgreSQL cluster (scripts/test.sh started it, not a DATABASE_URL from outside),
 * so a test may create databases in it, or stop and start it.
 */
export function ownsTestCluster(): boolean {
  return process.env.E2E_OWNS_PG === "1";
}

/** A fresh, migrated and seeded database in the test cluster; answers its URL. */
export async function freshSeededDatabase(name: string): Promise<string> {
  await run("bash", ["scripts/pg.sh", "recreate-db", name], { cwd: ROOT });
  const { stdout } = await run("bash", ["scripts/pg.sh", "url", name], { cwd: ROOT });
  const url = stdout.trim();
  const env = { ...process.env, DATABASE_URL: url };
  await run("node_modules/.bin/tsx", ["scripts/db.ts", "migrate"], { cwd: ROOT, env });
  await run("node_modules/.bin/tsx", ["scripts/db.ts", "seed"], { cwd: ROOT, env });
  return url;
}

export async function stopTestCluster(): Promise<void> {
  await run("bash", ["scripts/pg.sh", "stop"], { cwd: ROOT });
}

export async function startTestCluster(): Promise<void> {
  await run("bash", ["scripts/pg.sh", "start"], { cwd: ROOT });
}

/** The first port for app processes of a test's own: E2E_PORT + 10 (the main app is on E2E_PORT). */
export function extraPort(offset: number): number {
  return Number(process.env.E2E_PORT ?? "3100") + 10 + offset;
}

export interface AppProcess {
  url: string;
  child: ChildProcess;
  log: () => string;
  stop: () => Promise<void>;
}

/**
 * Starts the built app (scripts/serve.mjs, one process) on `port` with `env` over this process's environment,
 * from `cwd` (the worktree; another folder holding a build of its own for a second release).
 */
export async function startApp(port: number, env: Record<string, string>, cwd: string = ROOT): Promise<AppProcess> {
  const child = spawn(process.execPath, ["scripts/serve.mjs", "-H", "127.0.0.1", "-p", String(port)], {
    cwd,
    env: { ...process.env, NODE_ENV: "production", LOG_LEVEL: "warn", SPANLARK_WORKERS: "1", ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  child.stdout?.on("data", (d: Buffer) => (output = (output + d.toString()).slice(-20_000)));
  child.stderr?.on("data", (d: Buffer) => (output = (output + d.toString()).slice(-20_000)));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app on ${port} exited (${child.exitCode}):\n${output}`);
    try {
      const res = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(2_000) });
      if (res.status === 200) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      child.kill("SIGKILL");
      throw new Error(`the app on ${port} did not answer in 90 s:\n${output}`);
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  return {
    url,
    child,
    log: () => output,
    stop: async () => {
      if (child.exitCode !== null) return;
      const exited = new Promise((resolve) => child.once("exit", resolve));
      child.kill("SIGTERM");
      const timer = setTimeout(() => child.kill("SIGKILL"), 8_000);
      await exited;
      clearTimeout(timer);
    },
  };
}

/**
 * A cookie jar for one client. Cookies belong to a host, not a port (RFC 6265 §8.5), so one jar talking to two
 * instances on 127.0.0.1 carries the same session to both, as one browser behind a load balancer would.
 */
export class Client {
  readonly cookies = new Map<string, string>();

  constructor(readonly headers: Record<string, string> = {}) {}

  private keep(res: Response): void {
    for (const line of res.headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(";");
      const eq = pair!.indexOf("=");
      const name = pair!.slice(0, eq).trim();
      const value = pair!.slice(eq + 1).trim();
      const gone = attrs.some((a) => /^\s*max-age=0\s*$/i.test(a) || (/^\s*expires=/i.test(a) && Date.parse(a.split("=")[1]!) < Date.now()));
      if (gone || value === "") this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  async fetch(url: string, init: RequestInit = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    for (const [k, v] of Object.entries(this.headers)) if (!headers.has(k)) headers.set(k, v);
    if (this.cookies.size > 0) headers.set("cookie", this.cookieHeader());
    const res = await fetch(url, { ...init, headers, redirect: "manual" });
    this.keep(res);
    return res;
  }

  json(url: string, method: string, body: unknown, headers: Record<string, string> = {}): Promise<Response> {
    return this.fetch(url, { method, headers: { "content-type": "application/json", ...headers }, body: JSON.stringify(body) });
  }

  /** Signs in through next-auth's credentials endpoint at `base`; answers the session's user (or throws). */
  async signIn(base: string, email: string, password: string): Promise<{ id: string; email: string }> {
    const csrf = (await (await this.fetch(`${base}/api/auth/csrf`)).json()) as { csrfToken: string };
    await this.fetch(`${base}/api/auth/callback/credentials`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ csrfToken: csrf.csrfToken, email, password, callbackUrl: `${base}/`, json: "true" }).toString(),
    });
    const user = await this.sessionUser(base);
    if (user?.email !== email.toLowerCase()) throw new Error(`sign-in as ${email} at ${base} did not take`);
    return user;
  }

  async signOut(base: string): Promise<void> {
    const csrf = (await (await this.fetch(`${base}/api/auth/csrf`)).json()) as { csrfToken: string };
    await this.fetch(`${base}/api/auth/signout`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ csrfToken: csrf.csrfToken, callbackUrl: `${base}/`, json: "true" }).toString(),
    });
  }

  /** The user next-auth's session endpoint at `base` answers with, or null. */
  async sessionUser(base: string): Promise<{ id: string; email: string } | null> {
    const session = (await (await this.fetch(`${base}/api/auth/session`)).json()) as { user?: { id: string; email: string } };
    return session.user ?? null;
  }
}

/** Tries `what` until `ok` holds or `ms` pass; answers the last value and how long it took. */
export async function until<T>(what: () => Promise<T>, ok: (value: T) => boolean, ms: number, everyMs = 200): Promise<{ value: T; ms: number }> {
  const start = Date.now();
  let value = await what();
  while (!ok(value) && Date.now() - start < ms) {
    await new Promise((r) => setTimeout(r, everyMs));
    value = await what();
  }
  return { value, ms: Date.now() - start };
}

/** A Hem-Fir No.2 2x10 floor joist, 13 ft at 16 in, 40 psf live and 10 psf dead (our own example): a check request both processes answer. */
export const JOIST_REQUEST = {
  kind: "floor-joist",
  member: { material: "sawn", species: "Hem-Fir", grade: "No.2", size: "2x10" },
  lengthFt: 13,
  supports: [
    { x: 0, type: "pin" },
    { x: 13, type: "roller" },
  ],
  spacingIn: 16,
  loads: [
    { type: "area", case: "L", psf: 40 },
    { type: "area", case: "D", psf: 10 },
  ],
};
