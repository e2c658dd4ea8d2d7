// A builder sent to sign up from a page (a job's "Save job sheet" → the plans, with ?callbackUrl=) comes back to
// that page after confirming the address: the return page rides in the confirmation link, checked the way
// lib/auth/return-path.ts checks every return path.
import { beforeEach, describe, expect, test, vi } from "vitest";
import { SignUpSchema, ResendVerificationSchema } from "@/lib/auth/schemas";
import { TEST_DB, lastMailTo, outbox, sendMailMock, uniqueEmail, uniqueIp } from "./support";

vi.mock("@/lib/mail", () => ({ sendMail: sendMailMock }));

const { signUp, resendVerification } = await import("@/lib/auth/accounts");
const { settleBackground } = await import("@/lib/auth/background");

const base = { password: "a-long-enough-pass", name: "Nell Carver", company: null };

/** The confirmation link in a mail, parsed. */
function verifyLink(text: string): URL {
  const match = /https?:\/\/\S+\/verify\?\S+/.exec(text);
  if (!match) throw new Error("no confirmation link in the mail");
  return new URL(match[0]);
}

beforeEach(() => {
  outbox.length = 0;
});

describe("the return page in the sign-up body", () => {
  test.each([
    ["/pricing?job=5d0c7a4e-1f7b-4c55-9d0e-2b1b5a0f4a11", "/pricing?job=5d0c7a4e-1f7b-4c55-9d0e-2b1b5a0f4a11"],
    ["/jobs/abc#sheets", "/jobs/abc#sheets"],
    ["/\t/evil.example/", null],
    ["//evil.example", null],
    ["https://evil.example/jobs", null],
    ["/account", null], // the usual page anyway: nothing to carry
    ["", null],
  ])("%j is kept as %j", (given, kept) => {
    const parsed = SignUpSchema.parse({ email: "a@b.test", ...base, returnTo: given });
    expect(parsed.returnTo).toBe(kept);
  });

  test("no return page is fine; a too-long one is a 400 naming the field", () => {
    expect(SignUpSchema.parse({ email: "a@b.test", ...base }).returnTo).toBeNull();
    const bad = SignUpSchema.safeParse({ email: "a@b.test", ...base, returnTo: `/${"x".repeat(2100)}` });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.path).toEqual(["returnTo"]);
  });
});

describe.skipIf(!TEST_DB)("the confirmation e-mail carries the return page", () => {
  test("sign-up and send-again both put it in the link as ?next=; without one the link is the plain one", async () => {
    const email = uniqueEmail("returner");
    const input = SignUpSchema.parse({ email, ...base, returnTo: "/pricing?job=5d0c7a4e-1f7b-4c55-9d0e-2b1b5a0f4a11" });
    await signUp(input, uniqueIp());
    await settleBackground();
    const link = verifyLink(lastMailTo(email)!.text);
    expect(link.pathname).toBe("/verify");
    expect(link.searchParams.get("token")).toMatch(/^[A-Za-z0-9_-]{20,}$/);
    expect(link.searchParams.get("next")).toBe("/pricing?job=5d0c7a4e-1f7b-4c55-9d0e-2b1b5a0f4a11");

    const again = ResendVerificationSchema.parse({ email, returnTo: "/jobs/abc" });
    await resendVerification(again.email, uniqueIp(), again.returnTo);
    await settleBackground();
    expect(verifyLink(lastMailTo(email)!.text).searchParams.get("next")).toBe("/jobs/abc");

    const plain = uniqueEmail("plain");
    await signUp(SignUpSchema.parse({ email: plain, ...base, returnTo: "//evil.example" }), uniqueIp());
    await settleBackground();
    const plainLink = verifyLink(lastMailTo(plain)!.text);
    expect(plainLink.searchParams.has("next")).toBe(false);
  });
});
