import { createHash } from "node:crypto";
import { beforeEach, describe, expect, test, vi } from "vitest";
import { TEST_DB, lastMailTo, makeUser, outbox, sendMailMock, tokenFrom, uniqueEmail, uniqueIp } from "./support";

vi.mock("@/lib/mail", () => ({ sendMail: sendMailMock }));

const { issueToken, consumeToken, TOKEN_LIFETIME_MS } = await import("@/lib/auth/tokens");
const { authenticate, changePassword, requestPasswordReset, resetPassword, signUp, verifyEmail } = await import("@/lib/auth/accounts");
const { settleBackground } = await import("@/lib/auth/background");
const { AuthToken } = await import("@/models/auth-token");
const { User } = await import("@/models/user");

const HOUR = 60 * 60 * 1000;

beforeEach(() => {
  outbox.length = 0;
});

describe.skipIf(!TEST_DB)("single-use, expiring tokens", () => {
  test("only the SHA-256 hash of the mailed secret is stored", async () => {
    const user = await makeUser();
    const secret = await issueToken(user.id, "reset-password");
    const rows = await AuthToken.findAll({ where: { userId: user.id } });
    expect(rows).toHaveLength(1);
    expect(rows[0].tokenHash).toBe(createHash("sha256").update(secret).digest("hex"));
    expect(JSON.stringify(rows[0].toJSON())).not.toContain(secret);
  });

  test("a token works once", async () => {
    const user = await makeUser();
    const secret = await issueToken(user.id, "verify-email");
    expect(await consumeToken(secret, "verify-email")).toBe(user.id);
    expect(await consumeToken(secret, "verify-email")).toBeNull();
  });

  test("two requests racing with one link: exactly one wins", async () => {
    const user = await makeUser();
    const secret = await issueToken(user.id, "reset-password");
    const results = await Promise.all(Array.from({ length: 6 }, () => consumeToken(secret, "reset-password")));
    expect(results.filter((r) => r === user.id)).toHaveLength(1);
  });

  test("a token for one purpose does not work for the other", async () => {
    const user = await makeUser();
    const secret = await issueToken(user.id, "verify-email");
    expect(await consumeToken(secret, "reset-password")).toBeNull();
    expect(await consumeToken(secret, "verify-email")).toBe(user.id);
  });

  test("a newer link replaces the older one", async () => {
    const user = await makeUser();
    const first = await issueToken(user.id, "reset-password");
    const second = await issueToken(user.id, "reset-password");
    expect(await consumeToken(first, "reset-password")).toBeNull();
    expect(await consumeToken(second, "reset-password")).toBe(user.id);
  });

  test.each([
    { purpose: "reset-password" as const, ageMs: 59 * 60 * 1000, works: true, label: "reset link 59 min old" },
    { purpose: "reset-password" as const, ageMs: 61 * 60 * 1000, works: false, label: "reset link 61 min old (1 h life)" },
    { purpose: "verify-email" as const, ageMs: 47 * HOUR, works: true, label: "confirmation link 47 h old" },
    { purpose: "verify-email" as const, ageMs: 49 * HOUR, works: false, label: "confirmation link 49 h old (48 h life)" },
  ])("$label works: $works", async ({ purpose, ageMs, works }) => {
    const user = await makeUser();
    const issuedAt = new Date(Date.now() - ageMs);
    const secret = await issueToken(user.id, purpose, issuedAt);
    expect(await consumeToken(secret, purpose)).toBe(works ? user.id : null);
  });

  test("lifetimes: reset 1 hour, confirmation 48 hours", () => {
    expect(TOKEN_LIFETIME_MS["reset-password"]).toBe(HOUR);
    expect(TOKEN_LIFETIME_MS["verify-email"]).toBe(48 * HOUR);
  });

  test("unknown, empty and over-long tokens are refused", async () => {
    expect(await consumeToken("x".repeat(43), "verify-email")).toBeNull();
    expect(await consumeToken("", "verify-email")).toBeNull();
    expect(await consumeToken("x".repeat(500), "verify-email")).toBeNull();
  });
});

describe.skipIf(!TEST_DB)("the flows that use them", () => {
  test("sign-up mails a confirmation link; sign-in waits for it; the link confirms once", async () => {
    const email = uniqueEmail("newcomer");
    await signUp({ email, password: "a-long-enough-pass", name: "Nell Carver", company: null }, uniqueIp());
    await settleBackground();
    const mail = lastMailTo(email);
    expect(mail?.subject).toMatch(/confirm/i);
    const user = await User.findOne({ where: { email } });
    expect(user?.role).toBe("builder");
    expect(user?.passwordHash.startsWith("$2b$12$")).toBe(true);

    expect(await authenticate(email, "a-long-enough-pass", uniqueIp())).toEqual({ ok: false, reason: "unverified" });
    const token = tokenFrom(mail!);
    expect(await verifyEmail(token)).toBe(true);
    expect(await verifyEmail(token)).toBe(false);
    const signedIn = await authenticate(email, "a-long-enough-pass", uniqueIp());
    expect(signedIn.ok && signedIn.user.email).toBe(email);
  });

  test("reset: the mailed link sets a new password once; the old password stops working", async () => {
    const user = await makeUser({ password: "the-old-password" });
    await requestPasswordReset(user.email, uniqueIp());
    await settleBackground();
    const token = tokenFrom(lastMailTo(user.email)!);

    expect(await resetPassword(token, "the-new-password")).toBe(true);
    expect(await resetPassword(token, "another-new-password")).toBe(false);
    expect(await authenticate(user.email, "the-old-password", uniqueIp())).toEqual({ ok: false, reason: "invalid" });
    expect((await authenticate(user.email, "the-new-password", uniqueIp())).ok).toBe(true);
    await user.reload();
    expect(user.passwordChangedAt).toBeInstanceOf(Date);
  });

  test("reset: an expired link changes nothing", async () => {
    const user = await makeUser({ password: "the-old-password" });
    const token = await issueToken(user.id, "reset-password", new Date(Date.now() - 2 * HOUR));
    expect(await resetPassword(token, "the-new-password")).toBe(false);
    expect((await authenticate(user.email, "the-old-password", uniqueIp())).ok).toBe(true);
  });

  test("change password while signed in: the current one is needed; afterwards only the new one works", async () => {
    const user = await makeUser({ password: "the-old-password" });
    expect(await changePassword(user.id, "not-the-old-one", "the-new-password", uniqueIp())).toBe("wrong-password");
    expect(await changePassword(user.id, "the-old-password", "the-new-password", uniqueIp())).toBe("changed");
    expect(await authenticate(user.email, "the-old-password", uniqueIp())).toEqual({ ok: false, reason: "invalid" });
    expect((await authenticate(user.email, "the-new-password", uniqueIp())).ok).toBe(true);
    await user.reload();
    expect(user.passwordChangedAt).toBeInstanceOf(Date);
  });
});
