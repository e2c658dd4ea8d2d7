import NextAuth from "next-auth";
import { NextRequest } from "next/server";
import { authOptions } from "@/lib/auth/options";
import { BODY_LIMITS, bodyTooLargeResponse, HttpError, readBodyBytes } from "@/lib/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type NextAuthContext = { params: Promise<{ nextauth: string[] }> };
type AppRouteHandler = (req: Request, ctx: NextAuthContext) => Promise<Response>;

let nextAuthHandler: AppRouteHandler | undefined;

// GET, POST /api/auth/* — next-auth's own endpoints (csrf, session, sign-in with e-mail and password, sign-out), no sign-in needed
async function handler(req: Request, ctx: NextAuthContext): Promise<Response> {
  // next-auth 4 types only the pages-router call; called with the options alone it returns a handler that
  // also serves the App Router. Built on first use so the configuration is read at run time, not at build.
  if (req.method === "POST") {
    // next-auth reads the whole body itself; its forms are a few hundred bytes, so cap it first (413 past the cap).
    let body: Uint8Array<ArrayBuffer>;
    try {
      body = await readBodyBytes(req, BODY_LIMITS.json);
    } catch (err) {
      if (err instanceof HttpError && err.status === 413) return bodyTooLargeResponse(err);
      throw err;
    }
    req = new NextRequest(req.url, { method: "POST", headers: req.headers, body });
  }
  nextAuthHandler ??= NextAuth(authOptions()) as unknown as AppRouteHandler;
  return nextAuthHandler(req, ctx);
}

export { handler as GET, handler as POST };
