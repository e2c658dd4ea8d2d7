// Types of cluster.mjs for the tests (the server itself runs as plain JavaScript).
export function workerCount(text: string | undefined, cores?: number): number;
export function superviseWorkers(options: { count: number; log?: (message: string) => void }): void;
