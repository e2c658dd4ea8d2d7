import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { getSequelize } from "@/lib/db";
import { isDatabaseUnavailable } from "@/lib/db/unavailable";
import { env } from "@/lib/env";
import { accountForTicket, authenticate } from "./accounts";
import { readSignInTicket } from "./ticket";
import { clientIp } from "./client-ip";
import { sameOriginRedirect } from "./return-path";
import { SignInSchema } from "./schemas";
import { User } from "@/models/user";

/**
 * Whether the app has ended a session signed in at `authAt` (ms): the account is gone, or its password changed
 * after that sign-in. A database that cannot answer ends nothing here (getSessionUser asks again and says the
 * database is down), so a short outage signs nobody out.
 */
export async function sessionEnded(userId: string | undefined, authAt: number | undefined): Promise<boolean> {
  if (!userId) return true;
  try {
    getSequelize();
    const user = await User.findByPk(userId, { attributes: ["id", "passwordChangedAt"] });
    if (!user) return true;
    return Boolean(user.passwordChangedAt && (authAt ?? 0) < user.passwordChangedAt.getTime());
  } catch (err) {
    if (isDatabaseUnavailable(err)) return false;
    throw err;
  }
}

/** A session lasts 14 days from sign-in; it is not extended by use. */
export const SESSION_MAX_AGE_SECONDS = 14 * 24 * 60 * 60;

/** Error codes the sign-in page turns into words (next-auth passes a thrown message as `error`). */
export const SIGN_IN_ERRORS = {
  invalid: "CredentialsSignin",
  unverified: "EmailNotVerified",
  rateLimited: "TooManyTries",
  busy: "TooBusy",
  unavailable: "DatabaseUnavailable",
} as const;

let cached: NextAuthOptions | undefined;

export function authOptions(): NextAuthOptions {
  if (cached) return cached;
  const config = env();
  // next-auth builds its callback and redirect addresses from NEXTAUTH_URL.
  process.env.NEXTAUTH_URL ??= config.APP_URL;
  cached = {
    secret: config.NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS, updateAge: SESSION_MAX_AGE_SECONDS },
    jwt: { maxAge: SESSION_MAX_AGE_SECONDS },
    pages: { signIn: "/sign-in", error: "/sign-in" },
    providers: [
      CredentialsProvider({
        id: "credentials",
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(credentials, req) {
          const parsed = SignInSchema.safeParse(credentials ?? {});
          if (!parsed.success) return null;
          const result = await authenticate(parsed.data.email, parsed.data.password, clientIp(req.headers ?? {})).catch((err: unknown) => {
            if (isDatabaseUnavailable(err)) throw new Error(SIGN_IN_ERRORS.unavailable);
            throw err;
          });
          if (result.ok) return { id: result.user.id, email: result.user.email, name: result.user.name };
          if (result.reason === "unverified") throw new Error(SIGN_IN_ERRORS.unverified);
          if (result.reason === "rate-limited") throw new Error(SIGN_IN_ERRORS.rateLimited);
          if (result.reason === "busy") throw new Error(SIGN_IN_ERRORS.busy);
          return null;
        },
      }),
      // Right after a mailed link was spent in this browser (e-mail confirmed, password reset): see lib/auth/ticket.ts.
      CredentialsProvider({
        id: "ticket",
        name: "Mailed link",
        credentials: { ticket: { label: "Ticket", type: "text" } },
        async authorize(credentials) {
          const read = readSignInTicket(String(credentials?.ticket ?? ""), config.NEXTAUTH_SECRET);
          if (!read) return null;
          const user = await accountForTicket(read.userId);
          return user ? { id: user.id, email: user.email, name: user.name } : null;
        },
      }),
    ],
    callbacks: {
      // next-auth's own check passes any value starting with "/"; ours reads it as a browser would.
      redirect({ url, baseUrl }) {
        return sameOriginRedirect(url, baseUrl);
      },
      async jwt({ token, user }) {
        if (user) {
          token.sub = user.id;
          token.authAt = Date.now();
        }
        return token;
      },
      // next-auth's session endpoint (GET /api/auth/session) answers with what this returns: an ended session
      // answers as no session at all ({}), as it does for a visitor who never signed in.
      async session({ session, token }) {
        if (await sessionEnded(token.sub, token.authAt)) return {} as typeof session;
        session.user = { id: token.sub ?? "", email: token.email ?? null, name: token.name ?? null };
        session.authAt = token.authAt ?? 0;
        return session;
      },
    },
  };
  return cached;
}
