import bcrypt from "bcryptjs";
import { beforeEach, describe, expect, test, vi } from "vitest";
import { fromClient } from "../support/client-ip";
import { TEST_DB, lastMailTo, makeUser, outbox, sendMailMock, uniqueEmail, uniqueIp } from "./support";

vi.mock("@/lib/mail", () => ({ sendMail: sendMailMock }));

const { authenticate, PUBLIC_FLOW_MIN_MS } = await import("@/lib/auth/accounts");
const { settleBackground } = await import("@/lib/auth/background");
const forgotRoute = await import("@/app/api/auth/password/forgot/route");
const signUpRoute = await import("@/app/api/auth/sign-up/route");
const resendRoute = await import("@/app/api/auth/verify/resend/route");

const ctx = { params: Promise.resolve({}) };

function post(path: string, body: unknown, ip = uniqueIp()): Request {
  return new Request(`http://127.0.0.1:3100${path}`, {
    method: "POST",
    headers: { "content-type": "application/json", ...fromClient(ip) },
    body: JSON.stringify(body),
  });
}

async function timed<T>(work: () => Promise<T>): Promise<{ value: T; ms: number }> {
  const started = performance.now();
  const value = await work();
  return { value, ms: performance.now() - started };
}

beforeEach(() => {
  outbox.length = 0;
});

describe.skipIf(!TEST_DB)("no user enumeration", () => {
  test("forgot password: same status and body with or without an account; only the owner's mail differs", async () => {
    const user = await makeUser();
    const nobody = uniqueEmail("nobody");
    const a = await forgotRoute.POST(post("/api/auth/password/forgot", { email: user.email }), ctx);
    const b = await forgotRoute.POST(post("/api/auth/password/forgot", { email: nobody }), ctx);
    expect(a.status).toBe(202);
    expect(b.status).toBe(a.status);
    expect(await b.json()).toEqual(await a.json());
    await settleBackground();
    expect(lastMailTo(user.email)?.text).toMatch(/reset-password\?token=/);
    expect(lastMailTo(nobody)?.text).not.toMatch(/token=/);
  });

  // Equal times come from equal work, checked here as work, not as a stopwatch reading: a timed comparison flakes
  // on a busy 2-core CI machine, and the figures belong in `npm run bench`.
  test("forgot password: neither answer comes sooner than the floor, and neither waits for its mail", async () => {
    const user = await makeUser();
    for (const email of [user.email, uniqueEmail("nobody")]) {
      // The mail server hangs: the answer must not wait for it.
      let release = () => {};
      const held = new Promise<void>((resolve) => (release = resolve));
      sendMailMock.mockImplementationOnce(async (message) => {
        await held;
        outbox.push(message);
        return { messageId: "<held@test>" };
      });
      const { value, ms } = await timed(() => forgotRoute.POST(post("/api/auth/password/forgot", { email }), ctx));
      expect(value.status).toBe(202);
      // a lower bound only: a slow machine makes it longer, never shorter
      expect(ms).toBeGreaterThanOrEqual(PUBLIC_FLOW_MIN_MS - 5);
      expect(sendMailMock).toHaveBeenLastCalledWith(expect.objectContaining({ to: email.toLowerCase() }));
      expect(lastMailTo(email)).toBeUndefined();
      release();
      await settleBackground();
      expect(lastMailTo(email)).toBeDefined();
    }
  });

  test("sign-up: an address already in use gets the same answer; its owner gets a note, no second account", async () => {
    const user = await makeUser();
    const body = { password: "a-long-enough-pass", name: "Someone Else", company: "" };
    const a = await signUpRoute.POST(post("/api/auth/sign-up", { ...body, email: user.email.toUpperCase() }), ctx);
    const b = await signUpRoute.POST(post("/api/auth/sign-up", { ...body, email: uniqueEmail("fresh") }), ctx);
    expect(a.status).toBe(202);
    expect(b.status).toBe(a.status);
    expect(await a.json()).toEqual(await b.json());
    await settleBackground();
    expect(lastMailTo(user.email)?.subject).toMatch(/already have/i);
  });

  test("resend confirmation: same answer for unknown, unconfirmed and confirmed addresses", async () => {
    const unconfirmed = await makeUser({ verified: false });
    const confirmed = await makeUser();
    const answers = [];
    for (const email of [uniqueEmail("nobody"), unconfirmed.email, confirmed.email]) {
      const res = await resendRoute.POST(post("/api/auth/verify/resend", { email }), ctx);
      answers.push({ status: res.status, body: await res.json() });
    }
    expect(answers[1]).toEqual(answers[0]);
    expect(answers[2]).toEqual(answers[0]);
    await settleBackground();
    expect(outbox.map((m) => m.to)).toEqual([unconfirmed.email]);
  });

  test("sign-in: an unknown address and a wrong password give one answer after the same work: one bcrypt comparison at the same cost", async () => {
    const user = await makeUser({ password: "the-right-password" });
    // the stand-in hash for unknown addresses is made once per process; made here, outside the comparison below
    await authenticate(uniqueEmail("warm"), "not-the-password", uniqueIp());
    const compare = vi.spyOn(bcrypt, "compare");
    const hash = vi.spyOn(bcrypt, "hash");
    try {
      const wrong = await authenticate(user.email, "not-the-password", uniqueIp());
      const wrongHashes = compare.mock.calls.map((c) => c[1]);
      compare.mockClear();
      const unknown = await authenticate(uniqueEmail("nobody"), "not-the-password", uniqueIp());
      const unknownHashes = compare.mock.calls.map((c) => c[1]);
      expect(wrong).toEqual({ ok: false, reason: "invalid" });
      expect(unknown).toEqual(wrong);
      expect(wrongHashes).toHaveLength(1);
      expect(unknownHashes).toHaveLength(1);
      expect(bcrypt.getRounds(unknownHashes[0])).toBe(bcrypt.getRounds(wrongHashes[0]));
      expect(bcrypt.getRounds(wrongHashes[0])).toBe(12);
      expect(hash).not.toHaveBeenCalled();
    } finally {
      compare.mockRestore();
      hash.mockRestore();
    }
  }, 60_000);
});
