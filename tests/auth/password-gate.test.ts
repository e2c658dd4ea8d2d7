// The bound on bcrypt work per process (lib/auth/password-gate.ts): an attacker spread over many client
// addresses, each inside its own rate limit, cannot make the server run more than a few slow password checks at
// once; the surplus is answered at once as busy (no bcrypt), and the owner is not locked out by it.
import bcrypt from "bcryptjs";
import { afterEach, describe, expect, test, vi } from "vitest";
import { TEST_DB, makeUser, sendMailMock, uniqueEmail, uniqueIp } from "./support";

vi.mock("@/lib/mail", () => ({ sendMail: sendMailMock }));

const { createGate, passwordGate, PASSWORD_GATE, PasswordChecksBusyError } = await import("@/lib/auth/password-gate");
const { authenticate } = await import("@/lib/auth/accounts");

/** Work that ends when told to, so a test decides when a slot frees. */
function heldWork() {
  let finish!: () => void;
  const done = new Promise<void>((resolve) => (finish = resolve));
  return { work: () => done, finish };
}

afterEach(() => {
  vi.restoreAllMocks();
  vi.useRealTimers();
});

describe("the gate", () => {
  test("runs maxActive at once, queues maxWaiting, refuses the rest at once; a freed slot goes to the longest waiting", async () => {
    const gate = createGate({ maxActive: 2, maxWaiting: 3, maxWaitMs: 60_000 });
    const held = Array.from({ length: 5 }, heldWork);
    const started: number[] = [];
    const runs = held.map((h, i) =>
      gate.run(async () => {
        started.push(i);
        await h.work();
        return i;
      }),
    );
    const refused = await Promise.allSettled(Array.from({ length: 4 }, () => gate.run(async () => "never")));
    expect(refused.every((r) => r.status === "rejected" && r.reason instanceof PasswordChecksBusyError)).toBe(true);
    await Promise.resolve();
    expect(started).toEqual([0, 1]);
    expect(gate.state()).toEqual({ active: 2, waiting: 3, refused: 4 });

    held[0]!.finish();
    expect(await runs[0]).toBe(0);
    await new Promise((r) => setTimeout(r, 0));
    expect(started).toEqual([0, 1, 2]);
    for (const h of held) h.finish();
    expect(await Promise.all(runs)).toEqual([0, 1, 2, 3, 4]);
    expect(gate.state()).toMatchObject({ active: 0, waiting: 0 });
  });

  test("a wait longer than maxWaitMs is refused as busy; a failing check frees its slot", async () => {
    vi.useFakeTimers();
    const gate = createGate({ maxActive: 1, maxWaiting: 1, maxWaitMs: 3_000 });
    const held = heldWork();
    const first = gate.run(held.work);
    const waiting = gate.run(async () => "late");
    const waited = expect(waiting).rejects.toBeInstanceOf(PasswordChecksBusyError);
    await vi.advanceTimersByTimeAsync(3_001);
    await waited;
    held.finish();
    await first;
    await expect(gate.run(async () => Promise.reject(new Error("bcrypt failed")))).rejects.toThrow("bcrypt failed");
    expect(await gate.run(async () => "free again")).toBe("free again");
  });

  test("the busy answer is a 503 with a retry time in seconds", () => {
    const err = new PasswordChecksBusyError();
    expect(err.status).toBe(503);
    expect(err.details).toEqual({ retryAfterSeconds: 5 });
    expect(err.message).toMatch(/try again in 5 seconds/);
  });
});

describe.skipIf(!TEST_DB)("sign-in under a spread-out flood", () => {
  test("30 sign-ins at once from 30 client addresses for 30 addresses: never more than maxActive bcrypt checks run together", async () => {
    let running = 0;
    let most = 0;
    const compare = bcrypt.compare.bind(bcrypt);
    vi.spyOn(bcrypt, "compare").mockImplementation(async (password: string, hash: string) => {
      running += 1;
      most = Math.max(most, running);
      try {
        return await compare(password, hash);
      } finally {
        running -= 1;
      }
    });
    const results = await Promise.all(Array.from({ length: 30 }, () => authenticate(uniqueEmail("flood"), "guessing-123", uniqueIp())));
    expect(most).toBeGreaterThan(0);
    expect(most).toBeLessThanOrEqual(PASSWORD_GATE.maxActive);
    // Each answer is a plain "no" or "busy, try again in a few seconds": never an error, never a sign-in.
    for (const r of results) expect(r.ok === false && (r.reason === "invalid" || r.reason === "busy")).toBe(true);
  }, 60_000);

  test("while the gate is full every sign-in is answered busy with no bcrypt work; the owner's tries are given back, and the owner gets in once it frees", async () => {
    const owner = await makeUser({ password: "the-owners-password" });
    const gate = passwordGate();
    const holds = Array.from({ length: PASSWORD_GATE.maxActive + PASSWORD_GATE.maxWaiting }, heldWork);
    const hogs = holds.map((h) => gate.run(h.work));
    await Promise.resolve();
    expect(gate.state()).toMatchObject({ active: PASSWORD_GATE.maxActive, waiting: PASSWORD_GATE.maxWaiting });

    const spy = vi.spyOn(bcrypt, "compare");
    // Guessers from 40 addresses at the owner's account, and the owner too, while the gate is full.
    const guesses = await Promise.all(Array.from({ length: 40 }, () => authenticate(owner.email, "a-wrong-guess", uniqueIp())));
    const ownerIp = uniqueIp();
    const ownerTry = await authenticate(owner.email, "the-owners-password", ownerIp);
    expect(spy).not.toHaveBeenCalled();
    for (const r of [...guesses, ownerTry]) expect(r).toEqual({ ok: false, reason: "busy", retryAfterSeconds: 5 });

    for (const h of holds) h.finish();
    await Promise.all(hogs);
    // 41 refused tries on the address counted nothing (the address's limit is 10 in 15 minutes): the owner is in.
    const later = await authenticate(owner.email, "the-owners-password", ownerIp);
    expect(later.ok).toBe(true);
  }, 60_000);
});
