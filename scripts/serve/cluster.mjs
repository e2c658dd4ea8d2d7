// Several server processes on one port: Node's cluster module. The primary process only supervises; it forks
// `count` workers (each a whole Spanlark server: scripts/serve.mjs run again by cluster.fork), which share the
// listening socket (the primary hands connections out in turn), and forks a new one when a worker dies.
// Nothing is kept in a worker's memory that another worker needs: sessions are signed cookies, rate limits and
// webhook event ids live in PostgreSQL, and each worker's material tables cache follows the published version
// through LISTEN/NOTIFY (lib/tables/current.ts). So any worker, or any process on another machine, can answer.
import cluster from "node:cluster";
import { availableParallelism } from "node:os";

/** SPANLARK_WORKERS: a whole number of processes, or "auto"/unset for one per core. */
export function workerCount(text, cores = availableParallelism()) {
  const value = (text ?? "").trim().toLowerCase();
  if (value === "" || value === "auto") return Math.max(1, cores);
  if (!/^\d+$/.test(value) || Number(value) < 1 || Number(value) > 256) {
    throw new Error(`SPANLARK_WORKERS must be a whole number from 1 to 256 or "auto" (got "${text}")`);
  }
  return Number(value);
}

/** A worker that dies sooner than this after it started counts as crashing: the next restart waits longer. */
const HEALTHY_AFTER_MS = 10_000;
const FIRST_RESTART_DELAY_MS = 250;
const MAX_RESTART_DELAY_MS = 30_000;
/** How long workers get to finish their requests on SIGTERM/SIGINT before they are killed. */
const STOP_GRACE_MS = 8_000;

/**
 * Runs in the primary: forks `count` workers and keeps that many running until SIGTERM or SIGINT, which
 * are passed on to the workers (each closes its server and finishes the requests it holds).
 */
export function superviseWorkers({ count, log = (message) => console.log(message) }) {
  let stopping = false;
  let restartDelay = FIRST_RESTART_DELAY_MS;
  const startedAt = new Map(); // worker id → ms

  const fork = () => {
    const worker = cluster.fork();
    startedAt.set(worker.id, Date.now());
  };

  cluster.on("exit", (worker, code, signal) => {
    const lived = Date.now() - (startedAt.get(worker.id) ?? 0);
    startedAt.delete(worker.id);
    if (stopping) {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
      return;
    }
    restartDelay = lived > HEALTHY_AFTER_MS ? FIRST_RESTART_DELAY_MS : Math.min(restartDelay * 2, MAX_RESTART_DELAY_MS);
    const delay = lived > HEALTHY_AFTER_MS ? 0 : restartDelay;
    log(`worker ${worker.process.pid} stopped (${signal ?? `exit code ${code}`}); starting another${delay ? ` in ${delay} ms` : ""}`);
    setTimeout(() => {
      if (!stopping) fork();
    }, delay);
  });

  for (const signal of ["SIGINT", "SIGTERM"]) {
    process.on(signal, () => {
      if (stopping) return;
      stopping = true;
      const workers = Object.values(cluster.workers ?? {});
      if (workers.length === 0) process.exit(0);
      for (const worker of workers) worker?.process.kill("SIGTERM");
      setTimeout(() => {
        for (const worker of Object.values(cluster.workers ?? {})) worker?.process.kill("SIGKILL");
        process.exit(0);
      }, STOP_GRACE_MS).unref();
    });
  }

  for (let i = 0; i < count; i += 1) fork();
  log(`Spanlark: ${count} server processes sharing one port (primary ${process.pid})`);
}
