import type { DefaultSession } from "next-auth";

// The session and token carry only the account id and when it signed in; the role and profile are read
// from the database on every request (lib/auth/session.ts), so a change applies at once.
declare module "next-auth" {
  interface Session {
    user: DefaultSession["user"] & { id: string };
    /** Milliseconds since the epoch when this session signed in. */
    authAt: number;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    authAt?: number;
  }
}
