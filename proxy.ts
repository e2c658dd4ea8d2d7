// Runs before every route and page: refuses a state-changing request from another origin (403) and an engine
// request whose body is not declared JSON (415), in one place for every route handler. A server action (a POST
// to a page) from another origin gets the same 403 here, before Next.js's own check would answer it with a 500;
// next-auth's own POSTs come from our pages and pass.
import { NextResponse, type NextRequest } from "next/server";
import { appOrigins, contentTypeRefusal, originRefusal } from "@/lib/security/origin";

const origins = appOrigins();

export function proxy(req: NextRequest): NextResponse {
  const { pathname } = req.nextUrl;
  const refusal = originRefusal(req.method, pathname, req.headers, origins) ?? contentTypeRefusal(req.method, pathname, req.headers);
  if (refusal) return NextResponse.json({ error: refusal.error }, { status: refusal.status });
  return NextResponse.next();
}

// Everything but the build's static files, which are only ever read.
export const config = { matcher: ["/((?!_next/static|_next/image|favicon.ico|icon.svg).*)"] };
