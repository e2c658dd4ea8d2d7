// `npm run bench`: runs every benchmark in scripts/bench/ in turn and prints its figures.
// Each module exports `run(): Promise<void> | void` and prints its own table.
import { readdir } from "node:fs/promises";
import { fileURLToPath } from "node:url";

const dir = fileURLToPath(new URL("./bench/", import.meta.url));
const only = process.argv[2];
const files = (await readdir(dir)).filter((f) => f.endsWith(".ts") && (!only || f.startsWith(only))).sort();
for (const file of files) {
  const mod = (await import(`./bench/${file}`)) as { run(): Promise<void> | void };
  await mod.run();
}
