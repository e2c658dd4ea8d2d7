// Spanlark's production server: Next.js's request handler behind a plain node:http server that stamps every
// request with the address of the socket it came on (lib/auth/client-ip.ts explains why: Next.js gives route
// handlers no socket address). Any copy of the stamp header a client sends is replaced.
//   NODE_ENV=production node scripts/serve.mjs [-H 127.0.0.1] [-p 3000]
// Plain JavaScript so it runs with node alone; it loads nothing of the app but the built .next folder.
import { randomBytes } from "node:crypto";
import { createServer } from "node:http";
import next from "next";

const PEER_HEADER = "x-spanlark-peer"; // lib/auth/client-ip.ts PEER_HEADER
const PEER_TOKEN_ENV = "SPANLARK_PEER_TOKEN"; // lib/auth/client-ip.ts PEER_TOKEN_ENV

function option(flag, fallback) {
  const i = process.argv.indexOf(flag);
  return i >= 0 && process.argv[i + 1] ? process.argv[i + 1] : fallback;
}

const hostname = option("-H", process.env.HOSTNAME || "127.0.0.1");
const port = Number(option("-p", process.env.PORT || "3000"));

// Made fresh at every start and known only inside this process: a stamp without it is ignored.
const token = randomBytes(24).toString("base64url");
process.env[PEER_TOKEN_ENV] = token;

const app = next({ dev: false, hostname, port });
await app.prepare();
const handle = app.getRequestHandler();

const server = createServer((req, res) => {
  req.headers[PEER_HEADER] = `${token} ${req.socket.remoteAddress ?? ""}`;
  handle(req, res).catch((err) => {
    console.error(err);
    if (!res.headersSent) res.writeHead(500, { "content-type": "text/plain; charset=utf-8" });
    res.end("Something went wrong on our side; try again.");
  });
});
server.on("upgrade", app.getUpgradeHandler());
server.listen(port, hostname, () => {
  console.log(`Spanlark serving on http://${hostname}:${port}`);
});

for (const signal of ["SIGINT", "SIGTERM"]) {
  process.on(signal, () => {
    server.close(() => process.exit(0));
    setTimeout(() => process.exit(0), 5_000).unref();
  });
}
