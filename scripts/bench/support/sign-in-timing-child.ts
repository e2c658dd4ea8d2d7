// Sign-in timing: `npm run bench sign-in-timing`. A wrong password for a real account and any password for an
// address with no account must take the same time, or the time tells a guesser which addresses have accounts.
// tests/auth/enumeration.test.ts checks the cause (one bcrypt comparison at cost 12 on both paths); this prints
// the effect as medians over RUNS alternating pairs, which a timed test could not judge on a busy CI machine.
// No database: it calls lib/auth/password directly, in a child process (./server-child.ts).
import { loadavg } from "node:os";
import { BCRYPT_COST, hashPassword, verifyPassword } from "../../../lib/auth/password";
import { median, timed } from "./stats";

const RUNS = Number(process.env.BENCH_SIGN_IN_RUNS ?? "15");

async function run(): Promise<void> {
  const stored = await hashPassword("the-right-password-1");
  await verifyPassword("warm-up", null); // makes the stand-in hash once, as the first unknown address does
  const wrong: number[] = [];
  const unknown: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    wrong.push(await timed(() => verifyPassword("not-the-password", stored)));
    unknown.push(await timed(() => verifyPassword("not-the-password", null)));
  }
  const w = median(wrong);
  const u = median(unknown);
  console.log(`\nSign-in timing (bcrypt cost ${BCRYPT_COST}, ${RUNS} pairs, load average ${loadavg()[0].toFixed(1)})`);
  console.log("| path | median | min | max |");
  console.log("|---|---|---|---|");
  for (const [label, values] of [
    ["wrong password, real account", wrong],
    ["no such account (stand-in hash)", unknown],
  ] as const) {
    console.log(`| ${label} | ${median(values).toFixed(0)} ms | ${Math.min(...values).toFixed(0)} ms | ${Math.max(...values).toFixed(0)} ms |`);
  }
  console.log(`ratio of medians (no account / wrong password): ${(u / w).toFixed(2)} (target 0.9–1.1)`);
}

await run();
