// scripts/serve/cluster.mjs: the server processes `npm start` runs (SPANLARK_WORKERS), sharing one port, each
// restarted when it dies. Run against a stand-in worker that answers with its process id.
import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import path from "node:path";
import { afterEach, describe, expect, test } from "vitest";
import { workerCount } from "@/scripts/serve/cluster.mjs";

const APP = path.resolve(__dirname, "cluster-app.mjs");

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const address = server.address();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  if (address === null || typeof address === "string") throw new Error("no port");
  return address.port;
}

async function answeringPid(port: number): Promise<number | null> {
  try {
    const res = await fetch(`http://127.0.0.1:${port}/`, { headers: { connection: "close" }, signal: AbortSignal.timeout(2_000) });
    return Number(await res.text());
  } catch {
    return null;
  }
}

/** The worker ids answering over `tries` requests (the primary hands connections out in turn). */
async function answering(port: number, tries = 12): Promise<Set<number>> {
  const pids = new Set<number>();
  for (let i = 0; i < tries; i += 1) {
    const pid = await answeringPid(port);
    if (pid) pids.add(pid);
  }
  return pids;
}

async function until<T>(what: () => Promise<T>, ok: (value: T) => boolean, ms = 20_000): Promise<T> {
  const end = Date.now() + ms;
  let value = await what();
  while (!ok(value) && Date.now() < end) {
    await new Promise((r) => setTimeout(r, 100));
    value = await what();
  }
  return value;
}

const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

let primary: ChildProcess | undefined;
afterEach(() => {
  if (primary?.exitCode === null) primary.kill("SIGKILL");
});

describe("workerCount (SPANLARK_WORKERS)", () => {
  test("unset or auto is one per core; a number is taken as it is; anything else names the variable", () => {
    expect(workerCount(undefined, 4)).toBe(4);
    expect(workerCount("auto", 2)).toBe(2);
    expect(workerCount(" 3 ", 2)).toBe(3);
    expect(workerCount("1", 8)).toBe(1);
    for (const bad of ["0", "-1", "two", "1.5", "999"]) expect(() => workerCount(bad, 2)).toThrow(/SPANLARK_WORKERS/);
  });
});

describe("several server processes on one port", () => {
  test("three workers share the port; one killed is replaced and the port keeps answering; SIGTERM stops them all", async () => {
    const port = await freePort();
    primary = spawn(process.execPath, [APP, String(port)], { env: { ...process.env, SPANLARK_WORKERS: "3" }, stdio: ["ignore", "pipe", "pipe"] });
    let output = "";
    primary.stdout?.on("data", (d: Buffer) => (output += d.toString()));

    const first = await until(
      () => answering(port),
      (pids) => pids.size === 3,
    );
    expect(first.size).toBe(3);
    expect(first.has(primary.pid!)).toBe(false); // the primary only supervises

    const [victim] = [...first];
    process.kill(victim!, "SIGKILL");
    // Requests during and after the loss are answered by the others, then by the replacement too (a connection
    // handed to the dying worker in the instant before the primary hears of its end may be cut: try again).
    expect(
      await until(
        () => answeringPid(port),
        (pid) => pid !== null && pid !== victim,
        5_000,
      ),
    ).not.toBeNull();
    const after = await until(
      () => answering(port),
      (pids) => pids.size === 3 && !pids.has(victim!),
    );
    expect(after.size).toBe(3);
    expect(after.has(victim!)).toBe(false);
    expect(output).toMatch(new RegExp(`worker ${victim} stopped \\(SIGKILL\\); starting another`));

    const exited = new Promise<number | null>((resolve) => primary!.once("exit", (code) => resolve(code)));
    primary.kill("SIGTERM");
    expect(await exited).toBe(0);
    await until(
      async () => [...after].some(alive),
      (any) => !any,
      5_000,
    );
    expect([...after].some(alive)).toBe(false);
    expect(await answeringPid(port)).toBeNull();
  }, 60_000);
});
