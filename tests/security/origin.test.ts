// The Origin and content-type rules that proxy.ts applies before every API route (tests/e2e/hardening checks the
// same over HTTP against the built app).
import { describe, expect, test } from "vitest";
import { appOrigins, contentTypeRefusal, originRefusal } from "@/lib/security/origin";

const origins = appOrigins({ APP_URL: "https://app.spanlark.test", NEXTAUTH_URL: "https://app.spanlark.test/" });
const h = (init: Record<string, string>) => new Headers(init);

describe("originRefusal", () => {
  test("the app's own origin passes on every state-changing method", () => {
    for (const m of ["POST", "PUT", "PATCH", "DELETE"])
      expect(originRefusal(m, "/api/admin/tables/lumber/rows", h({ origin: "https://app.spanlark.test" }), origins)).toBeNull();
  });

  test.each([
    ["another host", "https://evil.example"],
    ["the same host on another scheme", "http://app.spanlark.test"],
    ["the same host on another port", "https://app.spanlark.test:8443"],
    ["a sibling host", "https://evil.spanlark.test"],
    ["an opaque origin", "null"],
  ])("%s is refused with 403", (_label, origin) => {
    expect(originRefusal("POST", "/api/admin/tables/lumber/rows", h({ origin, "content-type": "text/plain" }), origins)?.status).toBe(403);
  });

  test("no Origin but a browser's Sec-Fetch-Site of cross-site or same-site is refused; same-origin or none passes", () => {
    expect(originRefusal("POST", "/api/auth/sign-up", h({ "sec-fetch-site": "cross-site" }), origins)?.status).toBe(403);
    expect(originRefusal("POST", "/api/auth/sign-up", h({ "sec-fetch-site": "same-site" }), origins)?.status).toBe(403);
    expect(originRefusal("POST", "/api/auth/sign-up", h({ "sec-fetch-site": "same-origin" }), origins)).toBeNull();
    // A client that is not a browser page carries no visitor's cookies; the route's own checks decide.
    expect(originRefusal("POST", "/api/auth/sign-up", h({}), origins)).toBeNull();
  });

  test("reads are never refused, and the signed Stripe webhook takes any origin", () => {
    expect(originRefusal("GET", "/api/jobs", h({ origin: "https://evil.example" }), origins)).toBeNull();
    expect(originRefusal("POST", "/api/stripe/webhook", h({ origin: "https://evil.example" }), origins)).toBeNull();
  });

  test("with neither APP_URL nor NEXTAUTH_URL set, the default local origin is the app's", () => {
    expect([...appOrigins({})]).toEqual(["http://127.0.0.1:3000"]);
  });
});

describe("contentTypeRefusal", () => {
  test.each(["/api/solve", "/api/check", "/api/size"])("%s answers 415 unless the body is declared JSON", (path) => {
    expect(contentTypeRefusal("POST", path, h({ "content-type": "text/plain" }))?.status).toBe(415);
    expect(contentTypeRefusal("POST", path, h({ "content-type": "application/x-www-form-urlencoded" }))?.status).toBe(415);
    expect(contentTypeRefusal("POST", path, h({}))?.status).toBe(415);
    expect(contentTypeRefusal("POST", path, h({ "content-type": "application/json; charset=utf-8" }))).toBeNull();
    expect(contentTypeRefusal("POST", path, h({ "content-type": "Application/JSON" }))).toBeNull();
  });

  test("other routes are not held to it here", () => {
    expect(contentTypeRefusal("POST", "/api/admin/tables/lumber/import", h({ "content-type": "multipart/form-data; boundary=x" }))).toBeNull();
  });
});

describe("the engine routes themselves", () => {
  test.each(["solve", "check", "size"])("/api/%s answers 415 to a text/plain body, before reading it", async (name) => {
    const { POST } = (await import(`@/app/api/${name}/route`)) as { POST: (req: Request) => Promise<Response> };
    const res = await POST(new Request(`http://localhost/api/${name}`, { method: "POST", headers: { "content-type": "text/plain" }, body: "{}" }));
    expect(res.status).toBe(415);
    expect(((await res.json()) as { error: string }).error).toMatch(/application\/json/);
  });
});
