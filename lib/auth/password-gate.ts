import { HttpError } from "@/lib/http";

/**
 * A bound on the slow password work (bcrypt, about a quarter of a second of CPU each) a server process does at
 * once. The rate limits bound the tries per client address and per e-mail address, but an attacker with many
 * client addresses, each guessing at many e-mail addresses, stays inside every one of them and could still keep
 * the CPU busy hashing. So every bcrypt comparison and hash goes through this gate: a few run at a time, a few
 * more wait their turn (briefly), and the rest are answered at once with "busy, try again in a few seconds"
 * (503, Retry-After) without any bcrypt work. Nobody is locked out: the owner's next try, seconds later, gets a
 * turn as soon as one is free. The gate is per process (it protects this process's CPU); each instance behind
 * a load balancer has its own.
 */

export interface GateOptions {
  /** bcrypt operations running at once */
  maxActive: number;
  /** operations waiting for a turn; one more is refused at once */
  maxWaiting: number;
  /** how long an operation waits for a turn before it is refused */
  maxWaitMs: number;
}

/** bcryptjs runs on the event loop: two at a time keep the process answering other requests between their slices. */
export const PASSWORD_GATE: GateOptions = { maxActive: 2, maxWaiting: 8, maxWaitMs: 3_000 };

/** Seconds a refused sign-in is told to wait. */
export const PASSWORD_BUSY_RETRY_SECONDS = 5;

export class PasswordChecksBusyError extends HttpError {
  constructor() {
    super(503, `too many sign-ins at this moment; try again in ${PASSWORD_BUSY_RETRY_SECONDS} seconds`, {
      retryAfterSeconds: PASSWORD_BUSY_RETRY_SECONDS,
    });
    this.name = "PasswordChecksBusyError";
  }
}

interface Waiter {
  start: () => void;
  timer: ReturnType<typeof setTimeout>;
}

export interface Gate {
  run<T>(work: () => Promise<T>): Promise<T>;
  /** running and waiting now (tests, logs) */
  state(): { active: number; waiting: number; refused: number };
}

export function createGate(options: GateOptions): Gate {
  let active = 0;
  let refused = 0;
  const waiting: Waiter[] = [];

  const release = () => {
    active -= 1;
    const next = waiting.shift();
    if (next) {
      clearTimeout(next.timer);
      active += 1;
      next.start();
    }
  };

  const turn = (): Promise<void> => {
    if (active < options.maxActive) {
      active += 1;
      return Promise.resolve();
    }
    if (waiting.length >= options.maxWaiting) {
      refused += 1;
      return Promise.reject(new PasswordChecksBusyError());
    }
    return new Promise<void>((resolve, reject) => {
      const waiter: Waiter = {
        start: resolve,
        timer: setTimeout(() => {
          const i = waiting.indexOf(waiter);
          if (i >= 0) waiting.splice(i, 1);
          refused += 1;
          reject(new PasswordChecksBusyError());
        }, options.maxWaitMs),
      };
      waiting.push(waiter);
    });
  };

  return {
    async run(work) {
      await turn();
      try {
        return await work();
      } finally {
        release();
      }
    },
    state: () => ({ active, waiting: waiting.length, refused }),
  };
}

const holder = globalThis as unknown as { spanlarkPasswordGate?: Gate };

/** The process's gate (on globalThis: Next.js bundles route handlers and pages separately, and they share it). */
export function passwordGate(): Gate {
  holder.spanlarkPasswordGate ??= createGate(PASSWORD_GATE);
  return holder.spanlarkPasswordGate;
}
