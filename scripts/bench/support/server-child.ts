// Runs one of these benchmarks' measurements in a child process with the react-server condition, as the app's
// route code runs on the server (lib modules that import "server-only" load only there), and prints its output.
import { execFileSync } from "node:child_process";
import path from "node:path";
import { fileURLToPath } from "node:url";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");

export function runServerChild(file: string): void {
  const out = execFileSync(process.execPath, ["--conditions=react-server", "--import", "tsx", `scripts/bench/support/${file}`], {
    cwd: ROOT,
    encoding: "utf8",
    env: { ...process.env, NODE_ENV: "production" },
  });
  process.stdout.write(out);
}
