// Runs before every route and page: refuses a state-changing request from another origin (403) and an engine
// request whose body is not declared JSON (415), in one place for every route handler. A server action (a POST
// to a page) from another origin gets the same 403 here, before Next.js's own check would answer it with a 500;
// next-auth's own POSTs come from our pages and pass.
import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy, makeNonce } from "@/lib/security/csp";
import { appOrigins, contentTypeRefusal, originRefusal } from "@/lib/security/origin";

const origins = appOrigins();

export function proxy(req: NextRequest): NextResponse {
  const { pathname } = req.nextUrl;
  const refusal = originRefusal(req.method, pathname, req.headers, origins) ?? contentTypeRefusal(req.method, pathname, req.headers);
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

// Everything but the build's static files, which are only ever read.
export const config = { matcher: ["/((?!_next/static|_next/image|favicon.ico|icon.svg).*)"] };
