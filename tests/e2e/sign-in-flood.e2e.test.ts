// A sign-in flood spread over many client addresses and many e-mail addresses (each try inside every per-client
// and per-address limit), from outside over HTTP: the server runs only a bounded number of password checks at once
// (lib/auth/password-gate.ts) and answers the rest at once as busy, never with an error, and the owner of an
// account signs in normally as soon as the flood has passed.
import { request } from "node:http";
import { randomUUID } from "node:crypto";
import { describe, expect, test } from "vitest";
import { baseUrl } from "./support/browser";
import { Client } from "./support/instances";

const BUILDER = { email: "dee@hollisrowe.test", password: "builder-demo-pass" }; // seeders/ demo account (invented)
const FLOOD = 60;

/** A loopback source address of its own (Linux routes all of 127.0.0.0/8 to the loopback interface). */
function ownLoopbackAddress(): string {
  const b = () => Math.floor(Math.random() * 250) + 2;
  return `127.${b()}.${b()}.${b()}`;
}

/** One credentials sign-in from `localAddress`; answers next-auth's error code ("" when it signed in). */
function signInFrom(localAddress: string, cookie: string, body: string): Promise<{ status: number; error: string }> {
  const url = new URL("/api/auth/callback/credentials", baseUrl());
  return new Promise((resolve, reject) => {
    const req = request(
      {
        host: url.hostname,
        port: url.port,
        path: url.pathname,
        method: "POST",
        localAddress,
        headers: { "content-type": "application/x-www-form-urlencoded", cookie },
      },
      (res) => {
        let text = "";
        res.setEncoding("utf8");
        res.on("data", (d: string) => (text += d));
        res.on("end", () => {
          const target = (JSON.parse(text || "{}") as { url?: string }).url ?? "";
          resolve({ status: res.statusCode ?? 0, error: new URL(target, baseUrl()).searchParams.get("error") ?? "" });
        });
      },
    );
    req.on("error", reject);
    req.end(body);
  });
}

describe("a sign-in flood from many addresses", () => {
  test(`${FLOOD} sign-ins at once: the surplus is answered busy at once, none fails with an error, and the owner gets in after`, async () => {
    const csrfRes = await fetch(`${baseUrl()}/api/auth/csrf`);
    const cookie = csrfRes.headers
      .getSetCookie()
      .map((c) => c.split(";")[0])
      .join("; ");
    const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
    const answers = await Promise.all(
      Array.from({ length: FLOOD }, () =>
        signInFrom(
          ownLoopbackAddress(),
          cookie,
          new URLSearchParams({ csrfToken, email: `flood-${randomUUID().slice(0, 8)}@flood-e2e.test`, password: "guessing-123456", json: "true" }).toString(),
        ),
      ),
    );
    const byError = new Map<string, number>();
    for (const a of answers) byError.set(a.error, (byError.get(a.error) ?? 0) + 1);
    // Every answer is "no such account or wrong password" or "busy, try again in a few seconds": no 5xx, no sign-in.
    expect([...byError.keys()].every((e) => e === "CredentialsSignin" || e === "TooBusy")).toBe(true);
    expect(answers.every((a) => a.status < 500)).toBe(true);
    // Checked at most what the gate lets through: 2 running and 8 waiting at a time, the rest refused without bcrypt.
    expect(byError.get("TooBusy")).toBeGreaterThan(0);
    console.info(`sign-in flood of ${FLOOD}: ${byError.get("CredentialsSignin") ?? 0} checked, ${byError.get("TooBusy") ?? 0} answered busy`);

    const owner = new Client();
    const user = await owner.signIn(baseUrl(), BUILDER.email, BUILDER.password);
    expect(user.email).toBe(BUILDER.email);
  }, 90_000);
});
