import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

type NextAuthContext = { params: Promise<{ nextauth: string[] }> };
type AppRouteHandler = (req: Request, ctx: NextAuthContext) => Promise<Response>;

let nextAuthHandler: AppRouteHandler | undefined;

// GET, POST /api/auth/* — next-auth's own endpoints (csrf, session, sign-in with e-mail and password, sign-out), no sign-in needed
async function handler(req: Request, ctx: NextAuthContext): Promise<Response> {
  // next-auth 4 types only the pages-router call; called with the options alone it returns a handler that
  // also serves the App Router. Built on first use so the configuration is read at run time, not at build.
  nextAuthHandler ??= NextAuth(authOptions()) as unknown as AppRouteHandler;
  return nextAuthHandler(req, ctx);
}

export { handler as GET, handler as POST };
