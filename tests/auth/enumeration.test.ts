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

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
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

  test("forgot password: both answers take about the same time (mail goes out after the answer)", async () => {
    const user = await makeUser();
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 3; i++) {
      known.push((await timed(() => forgotRoute.POST(post("/api/auth/password/forgot", { email: user.email }), ctx))).ms);
      unknown.push((await timed(() => forgotRoute.POST(post("/api/auth/password/forgot", { email: uniqueEmail("nobody") }), ctx))).ms);
    }
    expect(Math.min(...known, ...unknown)).toBeGreaterThanOrEqual(PUBLIC_FLOW_MIN_MS - 5);
    expect(Math.abs(median(known) - median(unknown))).toBeLessThan(250);
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

  test("sign-in: unknown address and wrong password give one answer in about the same time", async () => {
    const user = await makeUser({ password: "the-right-password" });
    const wrong: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 3; i++) {
      const w = await timed(() => authenticate(user.email, "not-the-password", uniqueIp()));
      const u = await timed(() => authenticate(uniqueEmail("nobody"), "not-the-password", uniqueIp()));
      expect(w.value).toEqual({ ok: false, reason: "invalid" });
      expect(u.value).toEqual(w.value);
      wrong.push(w.ms);
      unknown.push(u.ms);
    }
    // Both paths run one bcrypt comparison at cost 12; without the stand-in hash an unknown address would
    // answer in a few milliseconds against hundreds.
    const ratio = median(unknown) / median(wrong);
    expect(ratio).toBeGreaterThan(0.5);
    expect(ratio).toBeLessThan(2);
  }, 60_000);
});
