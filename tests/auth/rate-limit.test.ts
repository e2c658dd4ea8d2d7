import { randomUUID } from "node:crypto";
import { describe, expect, test, vi } from "vitest";
import { TEST_DB, makeUser, sendMailMock, uniqueEmail, uniqueIp } from "./support";

vi.mock("@/lib/mail", () => ({ sendMail: sendMailMock }));

const { hit, hitAll } = await import("@/lib/auth/rate-limit");
const { authenticate, requestPasswordReset, limitsFor, LIMITS, RateLimitedError } = await import("@/lib/auth/accounts");

const MINUTE = 60_000;

describe.skipIf(!TEST_DB)("rate limits kept in PostgreSQL", () => {
  test("allows `max` attempts in a window, then blocks with the time left", async () => {
    const key = `test:${randomUUID()}`;
    const t0 = new Date("2026-12-01T10:00:00Z");
    const results = [];
    for (let i = 0; i < 4; i++) results.push(await hit({ key, max: 3, windowMs: 10 * MINUTE }, new Date(t0.getTime() + i * MINUTE)));
    expect(results.map((r) => r.allowed)).toEqual([true, true, true, false]);
    expect(results.map((r) => r.count)).toEqual([1, 2, 3, 4]);
    // The window opened at t0 and lasts 10 min; the 4th try came at t0 + 3 min, so 7 min are left.
    expect(results[3].retryAfterSeconds).toBe(7 * 60);
  });

  test("a new window starts once the old one has passed", async () => {
    const key = `test:${randomUUID()}`;
    const t0 = new Date("2026-12-01T10:00:00Z");
    for (let i = 0; i < 5; i++) await hit({ key, max: 2, windowMs: 10 * MINUTE }, t0);
    const later = await hit({ key, max: 2, windowMs: 10 * MINUTE }, new Date(t0.getTime() + 10 * MINUTE));
    expect(later).toEqual({ allowed: true, count: 1, retryAfterSeconds: 0 });
  });

  test("concurrent attempts are each counted once (atomic upsert)", async () => {
    const key = `test:${randomUUID()}`;
    const now = new Date();
    const results = await Promise.all(Array.from({ length: 25 }, () => hit({ key, max: 10, windowMs: MINUTE }, now)));
    expect(results.map((r) => r.count).sort((a, b) => a - b)).toEqual(Array.from({ length: 25 }, (_, i) => i + 1));
    expect(results.filter((r) => r.allowed)).toHaveLength(10);
  });

  test("hitAll blocks when any one limit is over", async () => {
    const a = { key: `test:${randomUUID()}`, max: 1, windowMs: MINUTE };
    const b = { key: `test:${randomUUID()}`, max: 5, windowMs: MINUTE };
    expect((await hitAll([a, b])).allowed).toBe(true);
    expect((await hitAll([a, b])).allowed).toBe(false);
  });

  test("sign-in: ten wrong passwords do not lock the owner out; the right one gets in at once", async () => {
    const user = await makeUser({ password: "the-right-password" });
    const attacker = uniqueIp();
    for (let i = 0; i < LIMITS.signInPerEmail.max; i++) {
      expect(await authenticate(user.email, "a-wrong-password", attacker)).toEqual({ ok: false, reason: "invalid" });
    }
    // The owner, on their own device, with the right password: in, without waiting 15 minutes.
    expect((await authenticate(user.email.toUpperCase(), "the-right-password", uniqueIp())).ok).toBe(true);
    // Even from the address that made the ten wrong tries, the right password is checked once.
    expect((await authenticate(user.email, "the-right-password", attacker)).ok).toBe(true);
  });

  test("sign-in: past the per-address limit a guesser gets one check per client per 2 minutes, and 30 in all", async () => {
    const user = await makeUser({ password: "the-right-password" });
    const attacker = uniqueIp();
    for (let i = 0; i < LIMITS.signInPerEmail.max; i++) await authenticate(user.email, "a-wrong-password", attacker);
    // The slow check: one more guess from this client is checked, the next is refused, even when it is right.
    expect(await authenticate(user.email, "another-wrong-password", attacker)).toEqual({ ok: false, reason: "invalid" });
    const blocked = await authenticate(user.email, "the-right-password", attacker);
    expect(blocked.ok === false && blocked.reason).toBe("rate-limited");
    expect(blocked.ok === false && blocked.reason === "rate-limited" && blocked.retryAfterSeconds).toBeGreaterThan(60);
    // Many clients together: 30 slow checks, then every client is refused (the owner too, until the window ends).
    // (The refused try above counted too: two of the 30 are spent.)
    for (let i = 2; i < LIMITS.signInLockedPerEmail.max; i++) {
      expect(await authenticate(user.email, "a-wrong-password", uniqueIp())).toEqual({ ok: false, reason: "invalid" });
    }
    const spent = await authenticate(user.email, "a-wrong-password", uniqueIp());
    expect(spent.ok === false && spent.reason).toBe("rate-limited");
  }, 90_000); // 40 bcrypt checks in a row: slow on a busy 2-core machine

  test("sign-in: right passwords give their attempt back; only failures use up the allowance", async () => {
    const user = await makeUser({ password: "the-right-password" });
    const ip = uniqueIp();
    const [perEmail, perIp] = limitsFor("sign-in", user.email, ip);
    for (let i = 0; i < LIMITS.signInPerEmail.max - 1; i++) await hit(perEmail);
    // One try left on the address's counter: three right passwords in a row all get in.
    for (let i = 0; i < 3; i++) expect((await authenticate(user.email, "the-right-password", ip)).ok).toBe(true);
    expect(await authenticate(user.email, "a-wrong-password", ip)).toEqual({ ok: false, reason: "invalid" });
    const ipCount = await hit({ ...perIp, max: 1000 });
    // The per-client counter holds the one failure and this probe.
    expect(ipCount.count).toBe(2);
  });

  test("sign-in: one client address trying many addresses is stopped by the per-client limit", async () => {
    const ip = uniqueIp();
    const [, perIp] = limitsFor("sign-in", uniqueEmail("spray"), ip);
    for (let i = 0; i < LIMITS.signInPerIp.max - 1; i++) await hit(perIp);
    expect(await authenticate(uniqueEmail("spray"), "whatever-password", ip)).toEqual({ ok: false, reason: "invalid" });
    const blocked = await authenticate(uniqueEmail("spray"), "whatever-password", ip);
    expect(blocked.ok === false && blocked.reason).toBe("rate-limited");
    // Another client is not affected.
    expect(await authenticate(uniqueEmail("spray"), "whatever-password", uniqueIp())).toEqual({ ok: false, reason: "invalid" });
  });

  test("password reset: the per-address limit answers 429, the same for an address with or without an account", async () => {
    const user = await makeUser();
    const nobody = uniqueEmail("nobody");
    for (const address of [user.email, nobody]) {
      for (let i = 0; i < LIMITS.resetPerEmail.max; i++) await requestPasswordReset(address, uniqueIp());
      const error = await requestPasswordReset(address, uniqueIp()).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(RateLimitedError);
      expect((error as InstanceType<typeof RateLimitedError>).status).toBe(429);
    }
  }, 60_000);
});
