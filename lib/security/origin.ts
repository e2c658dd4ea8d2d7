// Which requests may change state: the Origin check that route handlers share with server actions, and the
// content type the engine routes accept. Pure functions of the request's method, path and headers, so the proxy
// (proxy.ts) applies them to every route in one place and tests can call them directly.

/** Methods that change state; a GET, HEAD or OPTIONS is never refused here. */
const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/**
 * Routes that take requests from another origin by design. The Stripe webhook is server-to-server and its
 * signature on the raw body is its check (Stripe sends no Origin; the list keeps it working if a relay adds one).
 */
const CROSS_ORIGIN_ROUTES = new Set(["/api/stripe/webhook"]);

/** The engine routes, which answer 415 unless the body is declared JSON. */
const ENGINE_ROUTES = new Set(["/api/solve", "/api/check", "/api/size"]);

/** The app's own origins: APP_URL's, and NEXTAUTH_URL's when it differs. */
export function appOrigins(env: Record<string, string | undefined> = process.env): Set<string> {
  const origins = new Set<string>();
  for (const value of [env.APP_URL, env.NEXTAUTH_URL]) {
    if (!value) continue;
    try {
      origins.add(new URL(value).origin);
    } catch {
      // not a URL: lib/env refuses it at start-up
    }
  }
  if (origins.size === 0) origins.add("http://127.0.0.1:3000");
  return origins;
}

export type Refusal = { status: 403 | 415; error: string };

/**
 * Why a state-changing request from another origin is refused, or null to let it through.
 *  - An Origin header must be one of the app's own origins ("null", from a sandboxed frame or a data: page, is
 *    foreign too).
 *  - With no Origin, a browser's Sec-Fetch-Site must not say cross-site or same-site (a sibling host).
 *  - With neither, the request did not come from a browser page, so it cannot carry a visitor's cookies against
 *    their will (the attack this check stops); it goes on to the route's own session and role checks.
 */
export function originRefusal(method: string, pathname: string, headers: Headers, origins: Set<string>): Refusal | null {
  if (!STATE_CHANGING.has(method.toUpperCase())) return null;
  if (CROSS_ORIGIN_ROUTES.has(pathname)) return null;
  const origin = headers.get("origin");
  if (origin !== null) {
    if (origins.has(origin)) return null;
    return { status: 403, error: "this request came from another site; changes are accepted only from Spanlark's own pages" };
  }
  const site = headers.get("sec-fetch-site");
  if (site === "cross-site" || site === "same-site") {
    return { status: 403, error: "this request came from another site; changes are accepted only from Spanlark's own pages" };
  }
  return null;
}

/** 415 for an engine route whose body is not declared as JSON (Content-Type: application/json). */
export function contentTypeRefusal(method: string, pathname: string, headers: Headers): Refusal | null {
  if (method.toUpperCase() !== "POST" || !ENGINE_ROUTES.has(pathname)) return null;
  const type = (headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
  if (type === "application/json") return null;
  return { status: 415, error: "the body must be JSON, sent with Content-Type: application/json" };
}
