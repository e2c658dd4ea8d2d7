import { logger } from "@/lib/logger";

// Mail for the public account flows goes out after the answer, so an address with an account and one
// without answer in the same time. Tests wait for it with settleBackground().
const pending = new Set<Promise<void>>();

export function runInBackground(label: string, task: () => Promise<unknown>): void {
  const p: Promise<void> = task()
    .then(() => undefined)
    .catch((err: unknown) => logger.error({ err, task: label }, "background task failed"))
    .finally(() => pending.delete(p));
  pending.add(p);
}

/** Resolves once every task started so far has finished. */
export async function settleBackground(): Promise<void> {
  while (pending.size > 0) await Promise.all([...pending]);
}

/** Runs `work` and answers no sooner than `ms` after it started, hiding how much work it did. */
export async function atLeast<T>(ms: number, work: () => Promise<T>): Promise<T> {
  const started = Date.now();
  try {
    return await work();
  } finally {
    const left = ms - (Date.now() - started);
    if (left > 0) await new Promise((resolve) => setTimeout(resolve, left));
  }
}
