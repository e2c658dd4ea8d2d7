// Spanlark's production server: Next.js's request handler behind a plain node:http server that stamps every
// request with the address of the socket it came on (lib/auth/client-ip.ts explains why: Next.js gives route
// handlers no socket address). Any copy of the stamp header a client sends is replaced.
//   NODE_ENV=production node scripts/serve.mjs [-H 127.0.0.1] [-p 3000]
// SPANLARK_WORKERS sets how many server processes share the port (default: one per core; scripts/serve/cluster.mjs),
// each restarted if it dies. A page that fails while the database is down answers 503 with a plain "try again in
// a minute" page (scripts/serve/database-down.mjs).
// Plain JavaScript so it runs with node alone; it loads nothing of the app but the built .next folder.
import cluster from "node:cluster";
import { randomBytes } from "node:crypto";
import { createServer } from "node:http";
import { superviseWorkers, workerCount } from "./serve/cluster.mjs";
import { holdFailedPages } from "./serve/database-down.mjs";

const PEER_HEADER = "x-spanlark-peer"; // lib/auth/client-ip.ts PEER_HEADER
const PEER_TOKEN_ENV = "SPANLARK_PEER_TOKEN"; // lib/auth/client-ip.ts PEER_TOKEN_ENV

function option(flag, fallback) {
  const i = process.argv.indexOf(flag);
  return i >= 0 && process.argv[i + 1] ? process.argv[i + 1] : fallback;
}

const hostname = option("-H", process.env.HOSTNAME || "127.0.0.1");
const port = Number(option("-p", process.env.PORT || "3000"));
const workers = workerCount(process.env.SPANLARK_WORKERS);

if (workers > 1 && cluster.isPrimary) {
  superviseWorkers({ count: workers });
} else {
  await serve();
}

async function serve() {
  // Made fresh at every start and known only inside this process: a stamp without it is ignored.
  const token = randomBytes(24).toString("base64url");
  process.env[PEER_TOKEN_ENV] = token;

  const { default: next } = await import("next"); // not loaded by the primary, which only supervises
  const app = next({ dev: false, hostname, port });
  await app.prepare();
  const handle = app.getRequestHandler();

  const server = createServer((req, res) => {
    req.headers[PEER_HEADER] = `${token} ${req.socket.remoteAddress ?? ""}`;
    holdFailedPages(req, res);
    handle(req, res).catch((err) => {
      console.error(err);
      if (!res.headersSent) res.writeHead(500, { "content-type": "text/plain; charset=utf-8" });
      res.end("Something went wrong on our side; try again.");
    });
  });
  server.on("upgrade", app.getUpgradeHandler());
  server.listen(port, hostname, () => {
    console.log(`Spanlark serving on http://${hostname}:${port}${cluster.isWorker ? ` (process ${process.pid})` : ""}`);
  });

  for (const signal of ["SIGINT", "SIGTERM"]) {
    process.on(signal, () => {
      server.close(() => process.exit(0));
      server.closeIdleConnections?.();
      setTimeout(() => process.exit(0), 5_000).unref();
    });
  }
}
