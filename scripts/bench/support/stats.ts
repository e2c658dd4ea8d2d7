// Shared by the benchmarks: the median of a run's figures and the wall time of one piece of async work.
import { performance } from "node:perf_hooks";

/** The middle value (the upper one of the two middles for an even count). */
export function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/** Milliseconds `work` took, wall time. */
export async function timed(work: () => Promise<unknown>): Promise<number> {
  const start = performance.now();
  await work();
  return performance.now() - start;
}
