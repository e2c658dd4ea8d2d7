import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// Browser tests: tests/e2e/**/*.e2e.test.ts drive Debian's Chromium through playwright-core against a running
// app at E2E_BASE_URL (scripts/test.sh builds and starts it on 127.0.0.1:3100). One file at a time, so the
// files' journeys do not fight over the same server and database.
export default defineConfig({
  resolve: { alias: { "@": fileURLToPath(new URL("./", import.meta.url)) } },
  test: {
    include: ["tests/e2e/**/*.e2e.test.ts"],
    environment: "node",
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
    pool: "forks",
  },
});
