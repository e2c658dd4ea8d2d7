// Runs before every page and browser-sent API request: refuses a state-changing request from another origin
// (403), in one place for every route handler, and sets the Content-Security-Policy with a fresh nonce. A
// server action (a POST to a page) from another origin gets the same 403 here, before Next.js's own check would answer it with a 500;
// next-auth's own POSTs come from our pages and pass.
import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy, makeNonce } from "@/lib/security/csp";
import { appOrigins, originRefusal } from "@/lib/security/origin";

const origins = appOrigins();

export function proxy(req: NextRequest): NextResponse {
  const { pathname } = req.nextUrl;
  const refusal = originRefusal(req.method, pathname, req.headers, origins);
  const nonce = makeNonce();
  const csp = contentSecurityPolicy(nonce);
  if (refusal) {
    const res = NextResponse.json({ error: refusal.error }, { status: refusal.status });
    res.headers.set("Content-Security-Policy", csp);
    return res;
  }
  // Next.js reads the nonce from the request's CSP header and puts it on its own scripts (app/layout.tsx renders
  // every page per request, so each page gets its own nonce).
  const requestHeaders = new Headers(req.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  const res = NextResponse.next({ request: { headers: requestHeaders } });
  res.headers.set("Content-Security-Policy", csp);
  return res;
}

// Pages (CSP nonce; server actions), and API requests only when they say where they come from (Origin or
// Sec-Fetch-Site): Next.js reads a request's body before the proxy sees it, so an API request without them must
// not pass through here, or a 100 MB POST would be read in full before the route's 413 (lib/http.ts). Without
// either header originRefusal lets a request through anyway. The engine routes' 415 is in readJsonBody.
export const config = {
  matcher: [
    "/((?!api/|_next/static|_next/image|favicon.ico|icon.svg).*)",
    { source: "/api/:path*", has: [{ type: "header", key: "origin" }] },
    { source: "/api/:path*", has: [{ type: "header", key: "sec-fetch-site" }] },
  ],
};
