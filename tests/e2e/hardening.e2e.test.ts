// What the attack tests tried from outside, against the built app over HTTP: rotating X-Forwarded-For to
// escape the per-client limits, a return path that a browser takes off-site, and a body too large to read.
import { randomUUID } from "node:crypto";
import { request } from "node:http";
import { describe, expect, test } from "vitest";
import { baseUrl, setupBrowser } from "./support/browser";

const session = setupBrowser();

/** A loopback source address of this run's own (Linux routes all of 127.0.0.0/8 to the loopback interface). */
function ownLoopbackAddress(): string {
  const b = () => Math.floor(Math.random() * 250) + 2;
  return `127.${b()}.${b()}.${b()}`;
}

type Sent = { status: number; body: string; bytesSent: number };

/** POSTs from `localAddress`; a body of `streamBytes` is streamed in 64 KB chunks until the answer arrives. */
function post(path: string, options: { localAddress?: string; headers?: Record<string, string>; json?: unknown; streamBytes?: number }): Promise<Sent> {
  const url = new URL(path, baseUrl());
  return new Promise((resolve, reject) => {
    let bytesSent = 0;
    let answered = false;
    const req = request(
      {
        host: url.hostname,
        port: url.port,
        path: url.pathname + url.search,
        method: "POST",
        localAddress: options.localAddress,
        headers: { "content-type": "application/json", ...options.headers },
      },
      (res) => {
        answered = true;
        let body = "";
        res.setEncoding("utf8");
        res.on("data", (d: string) => (body += d));
        res.on("end", () => {
          resolve({ status: res.statusCode ?? 0, body, bytesSent });
          req.destroy();
        });
      },
    );
    req.on("error", (err) => (answered ? undefined : reject(err)));
    if (options.streamBytes === undefined) {
      req.end(JSON.stringify(options.json ?? {}));
      return;
    }
    const total = options.streamBytes;
    const chunk = Buffer.alloc(64 * 1024, 0x20);
    const pump = () => {
      while (!answered && bytesSent < total) {
        bytesSent += chunk.length;
        if (!req.write(chunk)) return void req.once("drain", pump);
      }
      if (!answered) req.end();
    };
    pump();
  });
}

describe("hardening, from outside", () => {
  test("a client that changes X-Forwarded-For on every try still meets the per-client sign-up limit (20 an hour)", async () => {
    const from = ownLoopbackAddress();
    const statuses: number[] = [];
    for (let i = 0; i < 21; i += 1) {
      const res = await post("/api/auth/sign-up", {
        localAddress: from,
        headers: { "x-forwarded-for": `198.51.100.${i + 1}`, "x-real-ip": `198.51.100.${i + 1}`, "x-spanlark-peer": `forged 198.51.100.${i + 1}` },
        json: { email: `rotating-${randomUUID().slice(0, 8)}@hardening-e2e.test`, password: `Larkfield-${randomUUID().slice(0, 10)}`, name: "Kit Rowan" },
      });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 20)).toEqual(Array(20).fill(202));
    expect(statuses[20]).toBe(429);
    // Another client is not held back by that one.
    const other = await post("/api/auth/sign-up", {
      localAddress: ownLoopbackAddress(),
      json: { email: `other-${randomUUID().slice(0, 8)}@hardening-e2e.test`, password: `Larkfield-${randomUUID().slice(0, 10)}`, name: "Kit Rowan" },
    });
    expect(other.status).toBe(202);
  }, 60_000);

  test.each(["/api/solve", "/api/check", "/api/size"])("%s answers 413 in JSON to a 10 MB body, before it is all sent", async (path) => {
    const tenMb = 10 * 1024 * 1024;
    const res = await post(path, { streamBytes: tenMb });
    expect(res.status).toBe(413);
    expect(JSON.parse(res.body)).toMatchObject({ error: expect.stringMatching(/too large.*64 KB/), limitBytes: 65_536 });
    expect(res.bytesSent).toBeLessThan(tenMb);
  });

  test("a stated Content-Length over the cap is refused at once", async () => {
    const res = await post("/api/solve", { headers: { "content-length": String(100 * 1024 * 1024) }, streamBytes: 100 * 1024 * 1024 });
    expect(res.status).toBe(413);
    expect(res.bytesSent).toBeLessThan(100 * 1024 * 1024);
  });

  test("signing in with a return path a browser would read as another host lands on the account page", async () => {
    const opened = await session.open(null);
    const { page } = opened;
    const offsite: string[] = [];
    await page.context().route(
      (url) => url.hostname.endsWith("evil.example"),
      (route) => {
        offsite.push(route.request().url());
        return route.abort();
      },
    );
    await opened.goto(`/sign-in?callbackUrl=${encodeURIComponent("/\t/evil.example/")}`);
    await page.getByLabel("E-mail").fill("dee@hollisrowe.test");
    await page.getByLabel("Password", { exact: true }).fill("builder-demo-pass");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => url.pathname === "/account", { timeout: 20_000 });
    expect(new URL(page.url()).origin).toBe(baseUrl());
    expect(offsite).toEqual([]);

    // Signed in, the sign-in page sends a return path on at once: the same check on the server.
    for (const attack of ["/\t/evil.example/", "//evil.example", "/\\evil.example", "https:evil.example", "/.//evil.example"]) {
      const res = await page.request.get(`/sign-in?callbackUrl=${encodeURIComponent(attack)}`, { maxRedirects: 0 });
      expect([303, 307, 308]).toContain(res.status());
      expect(res.headers().location).toMatch(/\/account$/);
      expect(new URL(res.headers().location, baseUrl()).origin).toBe(baseUrl());
    }
    const own = await page.request.get(`/sign-in?callbackUrl=${encodeURIComponent("/jobs?x=1")}`, { maxRedirects: 0 });
    expect(new URL(own.headers().location, baseUrl()).pathname + new URL(own.headers().location, baseUrl()).search).toBe("/jobs?x=1");
    expect(opened.consoleErrors).toEqual([]);
  }, 60_000);

  test("a signed-in admin's table edit from another origin is refused with 403 (text/plain body too); from our own origin it reaches the route", async () => {
    const opened = await session.open("/sign-in?callbackUrl=%2Fadmin");
    const { page } = opened;
    await page.getByLabel("E-mail").fill("admin@spanlark.test");
    await page.getByLabel("Password", { exact: true }).fill("admin-demo-pass");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => url.pathname.startsWith("/admin"), { timeout: 20_000 });
    const path = "/api/admin/tables/lumber/rows";
    for (const method of ["post", "put", "delete"] as const) {
      const foreign = await page.request[method](path, { headers: { origin: "https://evil.example", "content-type": "text/plain" }, data: "{}" });
      expect(foreign.status()).toBe(403);
      expect(((await foreign.json()) as { error: string }).error).toMatch(/another site/);
    }
    const fromFrame = await page.request.post(path, { headers: { origin: "null", "content-type": "text/plain" }, data: "{}" });
    expect(fromFrame.status()).toBe(403);
    // Our own origin passes the check and meets the route's own input check instead.
    const own = await page.request.post(path, { headers: { origin: baseUrl(), "content-type": "application/json" }, data: "{}" });
    expect(own.status()).toBeGreaterThanOrEqual(400);
    expect(own.status()).not.toBe(403);
    expect(own.status()).toBeLessThan(500);
  }, 60_000);

  test("a server action posted from another origin answers 403, not 500", async () => {
    const res = await post("/sign-in", {
      headers: { origin: "https://evil.example", "next-action": "0".repeat(42), "content-type": "text/plain;charset=UTF-8" },
      json: [],
    });
    expect(res.status).toBe(403);
  });

  test.each(["/api/solve", "/api/check", "/api/size"])("%s answers 415 unless the body is declared JSON", async (path) => {
    for (const type of ["text/plain", "application/x-www-form-urlencoded"]) {
      const res = await post(path, { headers: { "content-type": type }, json: {} });
      expect(res.status).toBe(415);
    }
    const json = await post(path, { json: {} });
    expect(json.status).toBe(400);
  });

  test("the Stripe webhook still takes a request from another origin (its signature is the check)", async () => {
    const res = await post("/api/stripe/webhook", { headers: { origin: "https://evil.example" }, json: {} });
    expect(res.status).toBe(400);
    expect(res.body).toMatch(/Stripe-Signature/);
  });
});
