// A stand-in worker for tests/scripts/serve/cluster.test.ts: the supervisor of scripts/serve/cluster.mjs with a
// tiny server in each worker that answers with its process id, so the test sees which process answered.
import cluster from "node:cluster";
import { createServer } from "node:http";
import { superviseWorkers, workerCount } from "../../../scripts/serve/cluster.mjs";

const port = Number(process.argv[2]);
if (cluster.isPrimary) {
  superviseWorkers({ count: workerCount(process.env.SPANLARK_WORKERS) });
} else {
  const server = createServer((_req, res) => res.end(String(process.pid)));
  server.keepAliveTimeout = 1;
  server.listen(port, "127.0.0.1");
  process.on("SIGTERM", () => server.close(() => process.exit(0)));
}
